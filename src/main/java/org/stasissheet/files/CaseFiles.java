package org.stasissheet.files;

import java.io.IOException;
import java.io.InputStream;
import java.nio.file.AccessDeniedException;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.util.List;
import java.util.Objects;
import org.stasissheet.intake.CaseReader;
import org.stasissheet.intake.CaseReader.Problem;

/**
 * Reads a case file from disk: the file adapter around the pure {@link CaseReader}. Never throws for a bad or
 * unreadable file: every failure, including I/O errors, comes back as a {@link CaseReader.Rejected} problem.
 */
public final class CaseFiles {
    private CaseFiles() {
    }

    public static CaseReader.Result read(Path file) {
        Objects.requireNonNull(file, "file");
        String name = file.toString();
        if (Files.isDirectory(file)) {
            return rejected("cannot read " + name + ": it is a folder, not a case file");
        }
        if (Files.exists(file) && !Files.isRegularFile(file)) {
            // a FIFO would block the reader for ever; a device never ends
            return rejected("cannot read " + name + ": it is not a regular file (a pipe, device or socket)");
        }
        byte[] bytes;
        try {
            long size = Files.size(file);
            if (size > CaseReader.MAX_BYTES) {
                return rejected(name + " is " + size + " bytes; a case file may be at most " + CaseReader.MAX_BYTES
                        + " bytes (1 MiB)");
            }
            // read at most one byte past the limit, in case the file grew since the size check
            try (InputStream in = Files.newInputStream(file)) {
                bytes = in.readNBytes(CaseReader.MAX_BYTES + 1);
            }
        } catch (NoSuchFileException e) {
            return rejected("cannot read " + name + ": file does not exist");
        } catch (AccessDeniedException e) {
            return rejected("cannot read " + name + ": permission denied");
        } catch (IOException e) {
            return rejected("cannot read " + name + ": " + AtomicFiles.reason(e));
        }
        CaseReader.Result result = CaseReader.read(bytes);
        if (result instanceof CaseReader.Rejected rejected) {
            // problems about the whole file name the file; the others point inside it by path
            return new CaseReader.Rejected(rejected.problems().stream()
                    .map(p -> p.path().equals(Problem.WHOLE_FILE) ? new Problem(p.path(), name + ": " + p.message()) : p)
                    .toList());
        }
        return result;
    }

    private static CaseReader.Result rejected(String message) {
        return new CaseReader.Rejected(List.of(new Problem(Problem.WHOLE_FILE, message)));
    }
}
