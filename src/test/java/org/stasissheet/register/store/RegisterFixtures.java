package org.stasissheet.register.store;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import org.stasissheet.files.RuleSources;
import org.stasissheet.intake.CaseReader;
import org.stasissheet.register.NewReferral;
import org.stasissheet.register.Procedure;
import org.stasissheet.register.Snapshot;
import org.stasissheet.rules.LoadResult;
import org.stasissheet.rules.RuleSet;
import org.stasissheet.worksheet.Assessor;
import org.stasissheet.worksheet.Worksheet;

/** Referrals of the invented demo patients (samples/), as the register would receive them. */
final class RegisterFixtures {
    static final RuleSet SHIPPED = ((LoadResult.Loaded) RuleSources.shipped()).ruleSet();
    /** Flagged act now by the shipped rules (symptomatic IgM hyperviscosity). */
    static final String ACT_NOW_CASE = "igm-symptomatic.json";
    /** Flagged review (at most) by the shipped rules: an invented CLL case with a normal potassium (test resource). */
    static final String REVIEW_CASE = "cll-review.json";

    private RegisterFixtures() {
    }

    static String caseJson(String sample) {
        try {
            Path demo = Path.of("samples", sample);
            return Files.readString(Files.exists(demo) ? demo : Path.of("src/test/resources/cases", sample),
                    StandardCharsets.UTF_8);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    static Worksheet sheet(String sample) {
        CaseReader.Result r = CaseReader.read(caseJson(sample).getBytes(StandardCharsets.UTF_8));
        return Assessor.assess(((CaseReader.Accepted) r).c(), SHIPPED);
    }

    static NewReferral referral(String sample, Instant received) {
        return new NewReferral(received, "Invented registrar, bleep 4455", "Invented General, ward 7",
                Procedure.PLASMA_EXCHANGE, Snapshot.of(sheet(sample), caseJson(sample)), "Invented coordinator",
                received.plusSeconds(60));
    }
}
