package org.stasissheet.cli;

import org.stasissheet.load.InvalidInputException;
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

    /** True when both paths name one file (also through links or different spellings of the path). */
    static boolean sameFile(Path a, Path b) {
        try {
            if (java.nio.file.Files.exists(a) && java.nio.file.Files.exists(b)) {
                return java.nio.file.Files.isSameFile(a, b);
            }
        } catch (java.io.IOException e) {
            // fall through to comparing the spelled paths
        }
        return a.toAbsolutePath().normalize().equals(b.toAbsolutePath().normalize());
    }
}
