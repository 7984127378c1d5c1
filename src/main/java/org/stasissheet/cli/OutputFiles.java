package org.stasissheet.cli;

import java.nio.file.Path;
import org.stasissheet.files.AtomicFiles;
import org.stasissheet.files.FileWriteException;

/** Command output goes through {@link AtomicFiles}; a failed write is invalid input: one line, exit 2. */
final class OutputFiles {
    private OutputFiles() {
    }

    static void write(Path target, byte[] bytes) {
        try {
            AtomicFiles.write(target, bytes);
        } catch (FileWriteException e) {
            throw new InvalidInputException(e.getMessage());
        }
    }
}
