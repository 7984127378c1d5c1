package org.stasissheet.intake;

import com.fasterxml.jackson.databind.node.ObjectNode;
import java.util.List;
import java.util.Objects;
import java.util.Optional;

/**
 * Reads a {@code stasis-case/1} file from its bytes. Pure: no file access, no clock, no locale.
 *
 * <p>Reading runs in three explicit steps, each reporting every problem it finds before the next runs:
 * <ol>
 *   <li>bytes → a JSON tree: size limit, strict UTF-8, syntax, nesting depth, string length, duplicate keys,
 *       NaN/Infinity ({@link JsonTree});</li>
 *   <li>tree → transfer data: known keys and JSON types only ({@link CaseDocument});</li>
 *   <li>transfer data → the domain {@link Case}: units, plausible ranges, vocabularies, dates
 *       ({@link CaseConversion}).</li>
 * </ol>
 * The result is either the case or the complete list of problems, never an exception.
 */
public final class CaseReader {
    /** Largest case file read, in bytes: 1 MiB. A real case is a few kilobytes. */
    public static final int MAX_BYTES = 1 << 20;
    /** Deepest JSON nesting accepted anywhere (including {@code extra}); a case needs four levels. */
    public static final int MAX_DEPTH = 64;
    /** Longest JSON string (or key) accepted, in characters. */
    public static final int MAX_STRING_CHARS = 10_000;
    /** Longest number accepted, in characters as written; real values need a dozen. */
    public static final int MAX_NUMBER_CHARS = 40;
    /**
     * Largest decimal exponent of a non-zero number written with a fraction or exponent, either way: 1e-15 to
     * 1e15 in magnitude (an integer is bounded by {@link #MAX_NUMBER_CHARS}). Refused before any conversion, so
     * {@code 1e999999999} costs nothing and {@code 1e-999999999} is never read as zero.
     */
    public static final int MAX_NUMBER_EXPONENT = 15;
    /** Most problems listed for one file; the rest are counted in a last line ("… and N more"). */
    public static final int MAX_PROBLEMS = 100;
    /** Longest problem message, in characters; a longer one is cut with "…". */
    public static final int MAX_MESSAGE_CHARS = 500;

    private CaseReader() {
    }

    /** The outcome of reading: a switch over it must handle both cases. */
    public sealed interface Result permits Accepted, Rejected {
    }

    /** The file was a valid case. */
    public record Accepted(Case c) implements Result {
        public Accepted {
            Objects.requireNonNull(c, "c");
        }
    }

    /** The file was refused; {@code problems} lists every problem found, in file order, never empty. */
    public record Rejected(List<Problem> problems) implements Result {
        public Rejected {
            problems = List.copyOf(problems);
            if (problems.isEmpty()) {
                throw new IllegalArgumentException("a rejection needs at least one problem");
            }
        }
    }

    /**
     * One thing wrong with a case file.
     *
     * @param path    where: dotted keys such as {@code labs.wbc} or {@code patient.height.unit}; {@code $} is the
     *                whole file
     * @param message what is wrong, naming the value and unit as written and, where possible, the fix
     */
    public record Problem(String path, String message) {
        public static final String WHOLE_FILE = "$";

        public Problem {
            Objects.requireNonNull(path, "path");
            Objects.requireNonNull(message, "message");
            if (path.isBlank() || message.isBlank()) {
                throw new IllegalArgumentException("path and message must not be blank");
            }
        }

        @Override
        public String toString() {
            return path + ": " + message;
        }
    }

    public static Result read(byte[] bytes) {
        Objects.requireNonNull(bytes, "bytes");
        Problems problems = new Problems();
        var tree = JsonTree.parse(bytes, problems);
        if (tree.isEmpty()) {
            return new Rejected(problems.list());
        }
        CaseDocument document = CaseDocument.from(tree.get(), problems);
        Case c = CaseConversion.toCase(document, problems);
        return problems.isEmpty() ? new Accepted(c) : new Rejected(problems.list());
    }

    /**
     * Step 1 alone, for documents that hold case parts (a course): the strict JSON tree or every problem found.
     * Exactly one of the two is present.
     */
    public record Parsed(Optional<ObjectNode> tree, List<Problem> problems) {
        public Parsed {
            Objects.requireNonNull(tree, "tree");
            problems = List.copyOf(problems);
        }
    }

    public static Parsed parse(byte[] bytes) {
        Objects.requireNonNull(bytes, "bytes");
        Problems problems = new Problems();
        Optional<ObjectNode> tree = JsonTree.parse(bytes, problems);
        return problems.isEmpty() ? new Parsed(tree, List.of()) : new Parsed(Optional.empty(), problems.list());
    }

    /** Steps 2 and 3 on a tree already read strictly by {@link #parse}; paths are relative to that tree. */
    public static Result read(ObjectNode tree) {
        Objects.requireNonNull(tree, "tree");
        Problems problems = new Problems();
        Case c = CaseConversion.toCase(CaseDocument.from(tree, problems), problems);
        return problems.isEmpty() ? new Accepted(c) : new Rejected(problems.list());
    }
}
