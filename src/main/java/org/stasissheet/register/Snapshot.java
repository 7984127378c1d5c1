package org.stasissheet.register;

import java.util.Objects;
import java.util.Optional;
import org.stasissheet.report.VerdictWords;
import org.stasissheet.rules.Flag;
import org.stasissheet.rules.Level;
import org.stasissheet.rules.Provenance;
import org.stasissheet.worksheet.Worksheet;

/**
 * What a referral was assessed on and what the assessment said, kept with the referral so a decision can be
 * audited against what the team saw: the case JSON exactly as read, the rule set's name, version and SHA-256, the
 * highest level and the verdicts in the worksheet's own words.
 *
 * @param highestLevel the most urgent flag's level; empty when nothing was flagged
 */
public record Snapshot(String patientLabel, String caseJson, Provenance ruleSet, Optional<Level> highestLevel,
                       String hyperviscosity, String leukostasis, String tumorLysis, String topFlag) {
    public Snapshot {
        Objects.requireNonNull(patientLabel, "patientLabel");
        Objects.requireNonNull(caseJson, "caseJson");
        Objects.requireNonNull(ruleSet, "ruleSet");
        Objects.requireNonNull(highestLevel, "highestLevel");
        Objects.requireNonNull(hyperviscosity, "hyperviscosity");
        Objects.requireNonNull(leukostasis, "leukostasis");
        Objects.requireNonNull(tumorLysis, "tumorLysis");
        Objects.requireNonNull(topFlag, "topFlag");
        if (caseJson.isBlank()) {
            throw new IllegalArgumentException("a referral keeps the case it was assessed on; the case JSON is empty");
        }
    }

    /** The snapshot of one assessment; {@code caseJson} is the case file's text the worksheet was made from. */
    public static Snapshot of(Worksheet sheet, String caseJson) {
        return new Snapshot(sheet.source().patient().label(), caseJson, sheet.ruleSet(), sheet.highestLevel(),
                VerdictWords.hyperviscosity(sheet.hyperviscosity()), VerdictWords.leukostasis(sheet.leukostasis()),
                VerdictWords.tumorLysis(sheet.tumorLysis()),
                sheet.flags().stream().filter(f -> sheet.highestLevel().map(l -> l == f.level()).orElse(false))
                        .findFirst().map(Flag::title).orElse(""));
    }
}
