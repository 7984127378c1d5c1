package org.stasissheet.cli;

import java.io.IOException;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;

/**
 * Writes command output atomically: a temporary file in the target folder, then a move over the target, so a
 * failed export leaves any existing file untouched. Failures become one-line invalid-input messages.
 */
final class OutputFiles {
    private OutputFiles() {
    }

    static void write(Path target, byte[] bytes) {
        Path absolute = target.toAbsolutePath();
        Path dir = absolute.getParent();
        if (dir == null || !Files.isDirectory(dir)) {
            throw new InvalidInputException(target + ": cannot write here (the folder " + dir + " does not exist)");
        }
        if (Files.isDirectory(absolute)) {
            throw new InvalidInputException(target + ": cannot write here (it is a folder)");
        }
        Path temp = null;
        try {
            temp = Files.createTempFile(dir, "." + absolute.getFileName() + ".", ".tmp");
            Files.write(temp, bytes);
            try {
                Files.move(temp, absolute, StandardCopyOption.REPLACE_EXISTING, StandardCopyOption.ATOMIC_MOVE);
            } catch (AtomicMoveNotSupportedException e) {
                Files.move(temp, absolute, StandardCopyOption.REPLACE_EXISTING);
            }
        } catch (IOException e) {
            deleteQuietly(temp);
            throw new InvalidInputException(target + ": cannot write here (" + e.getClass().getSimpleName() + ")");
        }
    }

    private static void deleteQuietly(Path temp) {
        if (temp == null) {
            return;
        }
        try {
            Files.deleteIfExists(temp);
        } catch (IOException ignored) {
            // the temporary file is hidden and harmless; the error about the target is what matters
        }
    }
}
