package org.stasissheet.files;

import java.io.IOException;
import java.nio.ByteBuffer;
import java.nio.channels.FileChannel;
import java.nio.file.AccessDeniedException;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.FileAlreadyExistsException;
import java.nio.file.FileSystemException;
import java.nio.file.Files;
import java.nio.file.LinkOption;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.nio.file.StandardOpenOption;
import java.nio.file.attribute.FileAttribute;
import java.nio.file.attribute.PosixFileAttributeView;
import java.nio.file.attribute.PosixFilePermission;
import java.nio.file.attribute.PosixFilePermissions;
import java.security.SecureRandom;
import java.util.Objects;
import java.util.Set;

/**
 * Writes whole files so that a reader sees either the old content or the new, never half of one: the data goes
 * to a temporary file in the target's folder, is forced to disk, then moved over the target in one step
 * (atomic where the file system supports it, otherwise a replacing move). On any failure the temporary file is
 * removed and an existing target is left as it was.
 */
public final class AtomicFiles {
    /** Who may read the written file. */
    public enum Access {
        /** The folder's usual permissions (the user's umask); a replaced file keeps its permissions. */
        USUAL,
        /** Owner only, POSIX rw------- where the file system supports it (for drafts holding patient data). */
        OWNER_ONLY
    }

    private static final Set<PosixFilePermission> OWNER_READ_WRITE = PosixFilePermissions.fromString("rw-------");
    private static final SecureRandom RANDOM = new SecureRandom();

    /**
     * A temporary file older than this is a leftover of a write that never finished (a killed process, a power
     * cut): no whole-file write here takes more than seconds. Common practice, with a wide margin.
     */
    public static final java.time.Duration STALE_AFTER = java.time.Duration.ofMinutes(2);

    /**
     * The names {@link #createTemp} gives: a dot, the target's name (cut at 80), a dot, a random long as exactly 16
     * hex digits, ".tmp"; a person's ".notes.1.tmp" never matches.
     */
    private static final java.util.regex.Pattern TEMP_NAME =
            java.util.regex.Pattern.compile("\\..{1,80}\\.[0-9a-f]{16}\\.tmp");

    private AtomicFiles() {
    }

    /** True for a name this class gives its temporary files. */
    public static boolean isTempName(String fileName) {
        return TEMP_NAME.matcher(fileName).matches();
    }

    /**
     * Deletes this class's own temporary files in {@code folder} that are older than {@link #STALE_AFTER}:
     * they may hold patient data from a write that was killed half-way. Never follows links, never touches any
     * other file; a file that cannot be deleted is left. Returns how many were deleted.
     */
    public static int removeStaleTemps(Path folder, java.time.Instant now) {
        int removed = 0;
        try (java.nio.file.DirectoryStream<Path> entries = Files.newDirectoryStream(folder,
                p -> isTempName(p.getFileName().toString()))) {
            for (Path p : entries) {
                try {
                    java.nio.file.attribute.BasicFileAttributes a = Files.readAttributes(p,
                            java.nio.file.attribute.BasicFileAttributes.class, LinkOption.NOFOLLOW_LINKS);
                    if (a.isRegularFile() && a.lastModifiedTime().toInstant().isBefore(now.minus(STALE_AFTER))) {
                        Files.delete(p);
                        removed++;
                    }
                } catch (IOException e) {
                    // left for the next start; a leftover is no worse than before
                }
            }
        } catch (IOException e) {
            // an unlistable folder: nothing to clean that this process could reach
        }
        return removed;
    }

    public static void write(Path target, byte[] data) throws FileWriteException {
        write(target, data, Access.USUAL);
    }

    public static void write(Path target, byte[] data, Access access) throws FileWriteException {
        Objects.requireNonNull(target, "target");
        Objects.requireNonNull(data, "data");
        Objects.requireNonNull(access, "access");
        Path absolute = target.toAbsolutePath();
        Path folder = absolute.getParent();
        if (folder == null || !Files.exists(folder)) {
            throw failure(absolute, "folder does not exist", null);
        }
        if (!Files.isDirectory(folder)) {
            throw failure(absolute, folder + " is not a folder", null);
        }
        Path temp = null;
        try {
            temp = createTemp(folder, absolute.getFileName().toString(), permissionsFor(absolute, access));
            try (FileChannel channel = FileChannel.open(temp, StandardOpenOption.WRITE)) {
                ByteBuffer buffer = ByteBuffer.wrap(data);
                while (buffer.hasRemaining()) {
                    channel.write(buffer);
                }
                channel.force(true);
            }
            move(temp, absolute);
            temp = null;
            syncFolder(folder);
        } catch (IOException e) {
            // a folder in the target's place makes the final move fail; say so plainly
            String reason = Files.isDirectory(absolute, LinkOption.NOFOLLOW_LINKS) ? "it is a folder" : reason(e);
            throw failure(absolute, reason, e);
        } finally {
            if (temp != null) {
                try {
                    Files.deleteIfExists(temp);
                } catch (IOException ignored) {
                    // the write already failed and says so; a leftover hidden temp file is the lesser harm
                }
            }
        }
    }

    private static Set<PosixFilePermission> permissionsFor(Path target, Access access) throws IOException {
        if (!supportsPosix(target.getParent())) {
            return null;
        }
        if (access == Access.OWNER_ONLY) {
            return OWNER_READ_WRITE;
        }
        if (Files.exists(target)) {
            return Files.getPosixFilePermissions(target);
        }
        return null;
    }

    private static boolean supportsPosix(Path folder) {
        return Files.getFileAttributeView(folder, PosixFileAttributeView.class) != null;
    }

    private static Path createTemp(Path folder, String name, Set<PosixFilePermission> permissions)
            throws IOException {
        FileAttribute<?>[] attributes = permissions == null
                ? new FileAttribute<?>[0]
                : new FileAttribute<?>[] {PosixFilePermissions.asFileAttribute(permissions)};
        for (int attempt = 0; ; attempt++) {
            // keep the temporary name within the usual 255-byte limit even for a long target name
            String stem = name.length() > 80 ? name.substring(0, 80) : name;
            Path temp = folder.resolve("." + stem + "." + java.util.HexFormat.of().toHexDigits(RANDOM.nextLong()) + ".tmp");
            try {
                Path created = Files.createFile(temp, attributes);
                if (permissions != null) {
                    // createFile applies the umask on top of the attribute; set exactly what was asked
                    Files.setPosixFilePermissions(created, permissions);
                }
                return created;
            } catch (FileAlreadyExistsException e) {
                if (attempt > 10) {
                    throw e;
                }
            }
        }
    }

    private static void move(Path temp, Path target) throws IOException {
        try {
            Files.move(temp, target, StandardCopyOption.ATOMIC_MOVE);
        } catch (AtomicMoveNotSupportedException e) {
            Files.move(temp, target, StandardCopyOption.REPLACE_EXISTING);
        }
    }

    /** Makes the rename itself durable where the platform allows opening a folder; elsewhere nothing to do. */
    private static void syncFolder(Path folder) {
        try (FileChannel channel = FileChannel.open(folder, StandardOpenOption.READ)) {
            channel.force(true);
        } catch (IOException | UnsupportedOperationException e) {
            // not supported on every platform (e.g. Windows); the file itself is already on disk
        }
    }

    private static FileWriteException failure(Path target, String reason, Throwable cause) {
        return new FileWriteException("cannot write " + target + ": " + reason, cause);
    }

    /** A short, one-line reason for people, without Java class names. */
    static String reason(IOException e) {
        if (e instanceof NoSuchFileException) {
            return "folder does not exist";
        }
        if (e instanceof AccessDeniedException) {
            return "permission denied";
        }
        if (e instanceof FileSystemException fse && fse.getReason() != null) {
            return oneLine(fse.getReason());
        }
        return e.getMessage() == null ? "input/output error" : oneLine(e.getMessage());
    }

    private static String oneLine(String s) {
        String line = s.replaceAll("\\s*\\R\\s*", " ").trim();
        return line.isEmpty() ? "input/output error" : line.substring(0, 1).toLowerCase(java.util.Locale.ROOT)
                + line.substring(1);
    }
}
