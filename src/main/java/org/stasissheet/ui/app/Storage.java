package org.stasissheet.ui.app;

import java.io.IOException;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.FileSystems;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.nio.file.attribute.PosixFilePermission;
import java.nio.file.attribute.PosixFilePermissions;
import java.util.Set;

/** The form's file writes: atomic (a crash leaves the old file or the new one, never half of one). */
public final class Storage {
    private static final Set<PosixFilePermission> OWNER_ONLY = PosixFilePermissions.fromString("rw-------");
    private static final Set<PosixFilePermission> OWNER_ONLY_DIR = PosixFilePermissions.fromString("rwx------");

    private Storage() {
    }

    /** Writes a file readable by its owner only, creating the folder (owner-only too) if needed. */
    public static void writePrivately(Path file, byte[] bytes) throws IOException {
        write(file, bytes, true);
    }

    /** Writes a user's document (a case file, a PDF) with the folder's usual permissions. */
    public static void writeDocument(Path file, byte[] bytes) throws IOException {
        write(file, bytes, false);
    }

    private static void write(Path file, byte[] bytes, boolean ownerOnly) throws IOException {
        Path target = file.toAbsolutePath();
        Path dir = target.getParent();
        boolean posix = FileSystems.getDefault().supportedFileAttributeViews().contains("posix");
        if (!Files.isDirectory(dir)) {
            Files.createDirectories(dir);
            if (ownerOnly && posix) {
                Files.setPosixFilePermissions(dir, OWNER_ONLY_DIR);
            }
        }
        Path temp = Files.createTempFile(dir, "." + target.getFileName(), ".part");
        try {
            if (posix && ownerOnly) {
                Files.setPosixFilePermissions(temp, OWNER_ONLY);
            }
            Files.write(temp, bytes);
            try {
                Files.move(temp, target, StandardCopyOption.ATOMIC_MOVE, StandardCopyOption.REPLACE_EXISTING);
            } catch (AtomicMoveNotSupportedException e) {
                Files.move(temp, target, StandardCopyOption.REPLACE_EXISTING);
            }
        } finally {
            Files.deleteIfExists(temp);
        }
    }
}
