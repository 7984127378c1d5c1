package org.stasissheet.load;

import java.io.IOException;
import java.io.InputStream;
import java.nio.file.AccessDeniedException;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import java.util.Optional;
import org.stasissheet.course.Course;
import org.stasissheet.course.CourseReader;
import org.stasissheet.files.RuleSources;
import org.stasissheet.files.WorksheetPdfs;
import org.stasissheet.intake.Case;
import org.stasissheet.intake.CaseReader;
import org.stasissheet.rules.LoadResult;
import org.stasissheet.rules.RuleSet;

/**
 * Where the commands get their case and rule set from: the one place that turns files into core objects or
 * into an {@link InvalidInputException} naming every problem.
 */
public final class Inputs {
    private Inputs() {
    }

    /**
     * A case with the JSON it was read from: the bytes go into the PDF as the record, so they are the case file
     * itself (or, for a worksheet PDF, the case file embedded in it), read once.
     */
    public record LoadedCase(byte[] json, Case value, List<String> warnings) {
        public LoadedCase {
            Objects.requireNonNull(json, "json");
            Objects.requireNonNull(value, "value");
            json = json.clone();
            warnings = List.copyOf(warnings);
        }

        @Override
        public byte[] json() {
            return json.clone();
        }
    }

    /**
     * A case file (stasis-case/1 JSON) or a worksheet PDF (by its .pdf name or its %PDF start); warnings about a
     * read-back PDF go to {@code err} before anything else is printed.
     */
    public static Case readCase(Path file, java.io.PrintWriter err) {
        return parseCase(file, caseBytes(file, err));
    }

    public static LoadedCase loadCase(Path file) {
        LoadedRecord record = loadRecord(file);
        return new LoadedCase(record.json(), parseCase(file, record.json()), record.warnings());
    }

    /** As {@link #loadCase(Path)}, with the read-back warnings printed to {@code err} first. */
    public static LoadedCase loadCase(Path file, java.io.PrintWriter err) {
        LoadedCase loaded = loadCase(file);
        warn(file, loaded.warnings(), err);
        return loaded;
    }

    private static void warn(Path file, List<String> warnings, java.io.PrintWriter err) {
        warnings.forEach(w -> err.println("warning: " + file + ": " + w));
        err.flush();
    }

    /** The JSON record of a case or course file, or the one embedded in a worksheet or course PDF, with warnings. */
    public record LoadedRecord(byte[] json, List<String> warnings) {
        public LoadedRecord {
            json = json.clone();
            warnings = List.copyOf(warnings);
        }

        @Override
        public byte[] json() {
            return json.clone();
        }
    }

    /** Reads the record: a JSON file's bytes (1 MiB at most), or a PDF's embedded record through the checked read-back. */
    public static LoadedRecord loadRecord(Path file) {
        byte[] bytes = readLimited(file, WorksheetPdfs.MAX_PDF_BYTES);
        if (!WorksheetPdfs.looksLikePdf(file, bytes)) {
            if (bytes.length > CaseReader.MAX_BYTES) {
                throw unreadable(file, "it is larger than " + CaseReader.MAX_BYTES + " bytes (1 MiB), the most a "
                        + "case file may be");
            }
            return new LoadedRecord(bytes, List.of());
        }
        WorksheetPdfs.ReadBack back;
        try {
            back = WorksheetPdfs.read(bytes);
        } catch (IOException e) {
            throw unreadable(file, e.getMessage());
        }
        return new LoadedRecord(back.caseJson(), back.warnings());
    }

    /** The record's bytes; its warnings (a read-back without a digest) go to {@code err}. */
    public static byte[] caseBytes(Path file, java.io.PrintWriter err) {
        LoadedRecord record = loadRecord(file);
        warn(file, record.warnings(), err);
        return record.json();
    }

    /** The case in these bytes, or every problem with its path in the file. */
    public static Case parseCase(Path file, byte[] json) {
        return caseOrProblems(file, CaseReader.read(json));
    }

    /** As {@link #parseCase(Path, byte[])}, on bytes already parsed as JSON: the same case or the same problems. */
    public static Case parseCase(Path file, CaseReader.Parsed parsed) {
        return caseOrProblems(file, parsed.tree().map(CaseReader::read)
                .orElseGet(() -> new CaseReader.Rejected(parsed.problems())));
    }

    private static Case caseOrProblems(Path file, CaseReader.Result result) {
        if (result instanceof CaseReader.Accepted accepted) {
            return accepted.c();
        }
        List<String> lines = new ArrayList<>();
        lines.add(file + ": the case was not read; nothing was assessed.");
        ((CaseReader.Rejected) result).problems().forEach(p -> lines.add("  " + p));
        throw new InvalidInputException(lines);
    }

    /** Whether these case-or-course bytes are a course ({@code "format": "stasis-course/1"}). */
    public static boolean isCourse(byte[] json) {
        return CourseReader.claimsToBeCourse(json);
    }

    /** As {@link #isCourse(byte[])}, on bytes already parsed as JSON. */
    public static boolean isCourse(CaseReader.Parsed parsed) {
        return CourseReader.claimsToBeCourse(parsed);
    }

    /** The course in these bytes (a course file's, or the one embedded in a course PDF), or every problem. */
    public static Course parseCourse(Path file, byte[] json) {
        CourseReader.Result result = CourseReader.read(json);
        if (result instanceof CourseReader.Accepted accepted) {
            return accepted.course();
        }
        List<String> lines = new ArrayList<>();
        lines.add(file + ": the course was not read; nothing was assessed.");
        ((CourseReader.Rejected) result).problems().forEach(p -> lines.add("  " + p));
        throw new InvalidInputException(lines);
    }

    /** The shipped rule set, or the local protocol in {@code dir}; a refused set lists every problem. */
    public static RuleSet ruleSet(Optional<Path> dir) {
        LoadResult result = dir.map(RuleSources::folder).orElseGet(RuleSources::shipped);
        if (result instanceof LoadResult.Refused refused) {
            List<String> lines = new ArrayList<>();
            lines.add("The rule set " + dir.map(Path::toString).orElse("(shipped)")
                    + " was refused; nothing of it was used:");
            refused.problems().forEach(p -> lines.add("  " + p));
            throw new InvalidInputException(lines);
        }
        return ((LoadResult.Loaded) result).ruleSet();
    }

    /** At most {@code limit} bytes of a regular file; anything else (a FIFO would block for ever) is not opened. */
    public static byte[] readLimited(Path file, int limit) {
        if (Files.isDirectory(file)) {
            throw unreadable(file, "it is a folder, not a case file");
        }
        if (Files.exists(file) && !Files.isRegularFile(file)) {
            throw unreadable(file, "it is not a regular file (a pipe, device or socket); it was not opened");
        }
        try (InputStream in = Files.newInputStream(file)) {
            byte[] bytes = in.readNBytes(limit + 1);
            if (bytes.length > limit) {
                throw unreadable(file, "it is larger than " + limit + " bytes");
            }
            return bytes;
        } catch (NoSuchFileException e) {
            throw unreadable(file, "file does not exist");
        } catch (AccessDeniedException e) {
            throw unreadable(file, "permission denied");
        } catch (IOException e) {
            throw unreadable(file, e.getClass().getSimpleName());
        }
    }

    private static InvalidInputException unreadable(Path file, String why) {
        return new InvalidInputException("cannot read " + file + ": " + why);
    }
}
