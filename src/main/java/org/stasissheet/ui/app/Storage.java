package org.stasissheet.ui.app;

import java.io.IOException;
import java.nio.file.FileSystems;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.PosixFilePermissions;
import org.stasissheet.files.AtomicFiles;

/**
 * The form's file writes, all through {@link AtomicFiles} (a crash leaves the old file or the new one, never half
 * of one). Its own files (draft, preferences) are owner-only, in a folder created owner-only.
 */
public final class Storage {
    private Storage() {
    }

    /** Writes one of the form's own files: owner-only, its folder created (owner-only) when missing. */
    public static void writePrivately(Path file, byte[] bytes) throws IOException {
        Path dir = file.toAbsolutePath().getParent();
        if (!Files.isDirectory(dir)) {
            Files.createDirectories(dir);
            if (FileSystems.getDefault().supportedFileAttributeViews().contains("posix")) {
                Files.setPosixFilePermissions(dir, PosixFilePermissions.fromString("rwx------"));
            }
        }
        AtomicFiles.write(file, bytes, AtomicFiles.Access.OWNER_ONLY);
    }

    /** Writes a user's document (a case file, a PDF) with the folder's usual permissions. */
    public static void writeDocument(Path file, byte[] bytes) throws IOException {
        AtomicFiles.write(file, bytes, AtomicFiles.Access.USUAL);
    }
}
