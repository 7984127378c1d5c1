package org.stasissheet.report;

import java.util.Comparator;
import java.util.Objects;
import java.util.Optional;
import java.util.OptionalInt;
import org.stasissheet.rules.Flag;
import org.stasissheet.rules.Level;
import org.stasissheet.worksheet.Worksheet;

/**
 * One entry of a referral folder in a triage summary: a case that was assessed, a file that could not be, or an
 * entry that was deliberately not read (with the reason).
 *
 * @param file               the referral's file name inside the folder
 * @param patient            the patient label, empty when none or when identifiers are left out
 * @param highestLevel       the most urgent flag's level; empty when nothing was flagged or the file failed
 * @param leukostasisScore   0–3, empty when not assessable or the file failed (ranking key)
 * @param hyperviscosityRank 0 likely, 1 possible, 2 unlikely, 3 not assessable or failed (ranking key)
 * @param pdf                the worksheet written for it, empty when none was written
 * @param message            for a bad file, the problem naming the key or value; empty otherwise
 */
public record TriageRow(String file, String patient, Status status, Optional<Level> highestLevel,
                        String hyperviscosity, String leukostasis, String tumorLysis, String topFlag,
                        OptionalInt leukostasisScore, int hyperviscosityRank, String pdf, String message) {

    /** How far the batch got with this file. */
    public enum Status {
        OK("ok"), ERROR("error"), INTERNAL_ERROR("internal-error"),
        /** Not a referral to read (a folder, a hidden or other file, a duplicate of another referral). */
        SKIPPED("skipped");

        private final String code;

        Status(String code) {
            this.code = code;
        }

        public String code() {
            return code;
        }
    }

    public TriageRow {
        Objects.requireNonNull(file, "file");
        Objects.requireNonNull(patient, "patient");
        Objects.requireNonNull(status, "status");
        Objects.requireNonNull(highestLevel, "highestLevel");
        Objects.requireNonNull(hyperviscosity, "hyperviscosity");
        Objects.requireNonNull(leukostasis, "leukostasis");
        Objects.requireNonNull(tumorLysis, "tumorLysis");
        Objects.requireNonNull(topFlag, "topFlag");
        Objects.requireNonNull(leukostasisScore, "leukostasisScore");
        Objects.requireNonNull(pdf, "pdf");
        Objects.requireNonNull(message, "message");
        if (hyperviscosityRank < 0 || hyperviscosityRank > 3) {
            throw new IllegalArgumentException("hyperviscosityRank must be 0–3, was " + hyperviscosityRank);
        }
        if (status != Status.OK && message.isBlank()) {
            throw new IllegalArgumentException("a failed row must say why");
        }
    }

    /** A case that was assessed and whose worksheet PDF was written as {@code pdf}. */
    public static TriageRow assessed(String file, Worksheet sheet, String pdf, boolean withIdentifiers) {
        Optional<Level> highest = sheet.highestLevel();
        // flags come most urgent first; the first of the highest level is the top flag
        String top = sheet.flags().stream().min(Comparator.comparing(Flag::level)).map(Flag::title).orElse("");
        OptionalInt score = sheet.leukostasis().score().map(OptionalInt::of).orElse(OptionalInt.empty());
        return new TriageRow(file, withIdentifiers ? sheet.source().patient().label() : "", Status.OK, highest,
                VerdictWords.hyperviscosity(sheet.hyperviscosity()), VerdictWords.leukostasis(sheet.leukostasis()),
                VerdictWords.tumorLysis(sheet.tumorLysis()), top, score,
                VerdictWords.hyperviscosityRank(sheet.hyperviscosity()), pdf, "");
    }

    /** The same row with a note added to its message (a read-back warning, an unwritten PDF). */
    public TriageRow noting(String note) {
        return new TriageRow(file, patient, status, highestLevel, hyperviscosity, leukostasis, tumorLysis, topFlag,
                leukostasisScore, hyperviscosityRank, pdf, message.isEmpty() ? note : message + "; " + note);
    }

    /** The same assessed row, but its PDF could not be written: the verdicts stay, the reason is noted. */
    public TriageRow withoutPdf(String why) {
        return new TriageRow(file, patient, status, highestLevel, hyperviscosity, leukostasis, tumorLysis, topFlag,
                leukostasisScore, hyperviscosityRank, "", message).noting("the worksheet PDF was not written: " + why);
    }

    /** A file the batch could not assess, or an entry it did not read: it keeps its place with the reason. */
    public static TriageRow failed(String file, Status status, String message) {
        if (status == Status.OK) {
            throw new IllegalArgumentException("a failed row cannot be ok");
        }
        return new TriageRow(file, "", status, Optional.empty(), "", "", "", "", OptionalInt.empty(), 3, "",
                message);
    }
}
