package org.stasissheet.files;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.PosixFileAttributeView;
import java.nio.file.attribute.PosixFilePermissions;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class AtomicFilesTest {
    @TempDir
    Path folder;

    private List<String> names() throws IOException {
        try (Stream<Path> s = Files.list(folder)) {
            return s.map(p -> p.getFileName().toString()).sorted().toList();
        }
    }

    @Test
    @DisplayName("writes a new file and leaves no temporary file behind")
    void writesNewFile() throws IOException {
        Path target = folder.resolve("case.json");
        AtomicFiles.write(target, "{}".getBytes(StandardCharsets.UTF_8));
        assertEquals("{}", Files.readString(target));
        assertEquals(List.of("case.json"), names());
    }

    @Test
    @DisplayName("replaces an existing file completely, keeping its permissions")
    void replacesExisting() throws IOException {
        Path target = folder.resolve("sheet.pdf");
        Files.writeString(target, "old content that is longer than the new one");
        boolean posix = Files.getFileAttributeView(folder, PosixFileAttributeView.class) != null;
        if (posix) {
            Files.setPosixFilePermissions(target, PosixFilePermissions.fromString("rw-r-----"));
        }
        AtomicFiles.write(target, "new".getBytes(StandardCharsets.UTF_8));
        assertEquals("new", Files.readString(target));
        if (posix) {
            assertEquals("rw-r-----", PosixFilePermissions.toString(Files.getPosixFilePermissions(target)));
        }
        assertEquals(List.of("sheet.pdf"), names());
    }

    @Test
    @DisplayName("a missing folder gives a one-line message naming the file")
    void missingFolder() {
        Path target = folder.resolve("nowhere").resolve("y.pdf");
        FileWriteException e = assertThrows(FileWriteException.class,
                () -> AtomicFiles.write(target, new byte[] {1}));
        assertEquals("cannot write " + target.toAbsolutePath() + ": folder does not exist", e.getMessage());
    }

    @Test
    @DisplayName("a file in the folder's place is named in the message")
    void parentIsAFile() throws IOException {
        Path notAFolder = Files.writeString(folder.resolve("plain.txt"), "x");
        FileWriteException e = assertThrows(FileWriteException.class,
                () -> AtomicFiles.write(notAFolder.resolve("y.pdf"), new byte[] {1}));
        assertTrue(e.getMessage().endsWith(": " + notAFolder.toAbsolutePath() + " is not a folder"), e.getMessage());
    }

    @Test
    @DisplayName("when the final move fails, what was at the target is untouched and the temporary file is gone")
    void failureLeavesTargetUntouched() throws IOException {
        Path target = Files.createDirectory(folder.resolve("report.pdf"));
        Files.writeString(target.resolve("inside.txt"), "keep me");
        FileWriteException e = assertThrows(FileWriteException.class,
                () -> AtomicFiles.write(target, "data".getBytes(StandardCharsets.UTF_8)));
        assertEquals("cannot write " + target.toAbsolutePath() + ": it is a folder", e.getMessage());
        assertFalse(e.getMessage().contains("\n"));
        assertEquals("keep me", Files.readString(target.resolve("inside.txt")));
        assertEquals(List.of("report.pdf"), names(), "no temporary file left behind");
    }

    @Test
    @DisplayName("a long but valid file name still fits its temporary file name")
    void longName() throws IOException {
        Path target = folder.resolve("n".repeat(240) + ".json");
        AtomicFiles.write(target, new byte[] {42});
        assertArrayEquals(new byte[] {42}, Files.readAllBytes(target));
    }

    @Test
    @DisplayName("owner-only drafts are rw------- on POSIX file systems")
    void ownerOnly() throws IOException {
        assumeTrue(Files.getFileAttributeView(folder, PosixFileAttributeView.class) != null, "POSIX file system");
        Path target = folder.resolve("draft.json");
        Files.writeString(target, "old");
        Files.setPosixFilePermissions(target, PosixFilePermissions.fromString("rw-rw-r--"));
        AtomicFiles.write(target, "{}".getBytes(StandardCharsets.UTF_8), AtomicFiles.Access.OWNER_ONLY);
        assertEquals("rw-------", PosixFilePermissions.toString(Files.getPosixFilePermissions(target)));
    }
}
