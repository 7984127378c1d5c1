package org.stasissheet.rules;

import static org.junit.jupiter.api.Assertions.*;

import java.time.LocalDate;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.Random;
import java.util.function.UnaryOperator;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.stasissheet.intake.Case;
import org.stasissheet.intake.Condition;
import org.stasissheet.intake.Cryoglobulin;
import org.stasissheet.intake.Findings;
import org.stasissheet.intake.Labs;
import org.stasissheet.intake.Leukemia;
import org.stasissheet.intake.Measurement;
import org.stasissheet.intake.Observation;
import org.stasissheet.intake.Paraprotein;
import org.stasissheet.intake.Patient;
import org.stasissheet.intake.Plan;
import org.stasissheet.intake.Retinopathy;
import org.stasissheet.intake.CaseWriter;
import org.stasissheet.measure.Analyte;
import org.stasissheet.measure.Quantity;
import org.stasissheet.rules.HyperviscosityVerdict.ViscosityTrust;
import org.stasissheet.rules.Threshold.Comparison;

/**
 * The safety properties of the verdicts, checked over generated cases from a fixed seed (5,000 per property in the
 * default build, 100,000 with {@code -Pfuzz}). A failure prints the case file that breaks the property, so it can
 * be replayed with {@code assess}. The value ranges are the analytes' plausible ranges, narrowed to where the
 * thresholds lie.
 */
public class SafetyPropertiesTest {
    static final int COUNT = Integer.getInteger("stasis.fuzz.count", 5_000);
    private static final RuleSet RULES = TestCases.SHIPPED;

    // ---- the generator -------------------------------------------------------------------------------------------

    private static <E> E pick(Random r, E[] values) {
        return values[r.nextInt(values.length)];
    }

    private static double between(Random r, double low, double high) {
        return Math.round((low + r.nextDouble() * (high - low)) * 100) / 100.0;
    }

    private static Labs maybe(Random r, Labs labs, Analyte a, double low, double high, String unit) {
        return r.nextInt(3) == 0 ? labs : labs.with(Measurement.of(a, between(r, low, high), unit));
    }

    private static Optional<Integer> grade(Random r) {
        return r.nextInt(4) == 0 ? Optional.empty() : Optional.of(r.nextInt(4));
    }

    public static Case randomCase(Random r) {
        Condition condition = new Condition(pick(r, Paraprotein.values()), pick(r, Leukemia.values()), r.nextBoolean(),
                pick(r, Cryoglobulin.values()), r.nextInt(3) == 0 ? Optional.of(LocalDate.of(2026, 6, 10))
                : Optional.empty());
        Labs labs = Labs.NONE;
        if (r.nextInt(3) != 0) {
            Double[] temperatures = {null, 22.0, 25.0, 36.0, 37.0};
            Double t = pick(r, temperatures);
            labs = labs.with(new Measurement(Analyte.SERUM_VISCOSITY, new Quantity(between(r, 1.0, 9.0), "cP"),
                    Optional.ofNullable(t).map(v -> new Quantity(v, "Cel"))));
        }
        labs = maybe(r, labs, Analyte.IGM, 5, 80, "g/L");
        labs = maybe(r, labs, Analyte.IGG, 10, 90, "g/L");
        labs = maybe(r, labs, Analyte.IGA, 10, 90, "g/L");
        labs = maybe(r, labs, Analyte.WBC, 2, 700, "10*9/L");
        labs = maybe(r, labs, Analyte.BLASTS, 0, 90, "%");
        labs = maybe(r, labs, Analyte.POTASSIUM, 3, 8, "mmol/L");
        labs = maybe(r, labs, Analyte.URIC_ACID, 200, 900, "umol/L");
        labs = maybe(r, labs, Analyte.PHOSPHATE, 0.8, 3, "mmol/L");
        labs = maybe(r, labs, Analyte.CALCIUM, 1.4, 2.6, "mmol/L");
        labs = maybe(r, labs, Analyte.FIBRINOGEN, 0.3, 5, "g/L");
        labs = maybe(r, labs, Analyte.PLATELETS, 5, 400, "10*9/L");
        labs = maybe(r, labs, Analyte.PAO2, 40, 100, "mm[Hg]");
        labs = maybe(r, labs, Analyte.SPO2, 80, 100, "%");
        labs = maybe(r, labs, Analyte.HEMATOCRIT, 15, 50, "%");
        Labs baseline = maybe(r, Labs.NONE, Analyte.POTASSIUM, 3.5, 5, "mmol/L");
        Findings findings = new Findings(grade(r), grade(r), grade(r), pick(r, Observation.values()),
                pick(r, Observation.values()), pick(r, Retinopathy.values()), pick(r, Observation.values()),
                pick(r, Observation.values()), pick(r, Observation.values()));
        return new Case(Patient.UNKNOWN, condition, labs, baseline, findings,
                new Plan(r.nextBoolean(), r.nextBoolean()), Optional.empty(), "", "{}");
    }

    // ---- worsening one value -----------------------------------------------------------------------------------

    private static Case withLabs(Case c, Labs labs) {
        return new Case(c.patient(), c.condition(), labs, c.baseline(), c.findings(), c.plan(), c.assessedAt(),
                c.assessor(), c.extraJson());
    }

    private static Case withFindings(Case c, Findings f) {
        return new Case(c.patient(), c.condition(), c.labs(), c.baseline(), f, c.plan(), c.assessedAt(),
                c.assessor(), c.extraJson());
    }

    /** The value times {@code factor}, keeping its unit and temperature; the case unchanged when it is absent. */
    private static Case scaled(Case c, Analyte a, double factor) {
        return c.labs().get(a).map(m -> withLabs(c, c.labs().with(new Measurement(a,
                new Quantity(m.entered().value() * factor, m.entered().unit()), m.temperature())))).orElse(c);
    }

    private static Observation worse(Observation o) {
        return Observation.YES;
    }

    private static Optional<Integer> worse(Optional<Integer> g) {
        return Optional.of(g.map(v -> Math.min(3, v + 1)).orElse(3));
    }

    /** Every way of making one value worse; each returns the case unchanged where it does not apply. */
    static List<UnaryOperator<Case>> worsenings(Random r) {
        double up = 1.05 + r.nextDouble();
        double down = 1 / up;
        List<UnaryOperator<Case>> list = new ArrayList<>();
        list.add(c -> scaled(c, Analyte.SERUM_VISCOSITY, up));
        list.add(c -> scaled(c, Analyte.IGM, up));
        list.add(c -> scaled(c, Analyte.IGG, up));
        list.add(c -> scaled(c, Analyte.IGA, up));
        list.add(c -> scaled(c, Analyte.WBC, up));
        list.add(c -> scaled(c, Analyte.POTASSIUM, up));
        list.add(c -> scaled(c, Analyte.FIBRINOGEN, down));
        list.add(c -> scaled(c, Analyte.PLATELETS, down));
        list.add(c -> scaled(c, Analyte.PAO2, down));
        list.add(c -> {
            Findings f = c.findings();
            return withFindings(c, new Findings(f.pulmonaryGrade(), f.neurologicalGrade(), f.otherOrganGrade(),
                    worse(f.mucosalBleeding()), f.visualDisturbance(), f.retinopathy(), f.heartFailure(),
                    f.arrhythmia(), f.seizure()));
        });
        list.add(c -> {
            Findings f = c.findings();
            return withFindings(c, new Findings(f.pulmonaryGrade(), f.neurologicalGrade(), f.otherOrganGrade(),
                    f.mucosalBleeding(), worse(f.visualDisturbance()), f.retinopathy(), f.heartFailure(),
                    f.arrhythmia(), f.seizure()));
        });
        list.add(c -> {
            Findings f = c.findings();
            return withFindings(c, new Findings(f.pulmonaryGrade(), f.neurologicalGrade(), f.otherOrganGrade(),
                    f.mucosalBleeding(), f.visualDisturbance(), f.retinopathy(), worse(f.heartFailure()),
                    f.arrhythmia(), f.seizure()));
        });
        list.add(c -> {
            Findings f = c.findings();
            Retinopathy next = f.retinopathy().compareTo(Retinopathy.VENOUS_DILATION) < 0 ? Retinopathy.VENOUS_DILATION
                    : Retinopathy.values()[Math.min(Retinopathy.values().length - 1, f.retinopathy().ordinal() + 1)];
            return withFindings(c, new Findings(f.pulmonaryGrade(), f.neurologicalGrade(), f.otherOrganGrade(),
                    f.mucosalBleeding(), f.visualDisturbance(), next, f.heartFailure(), f.arrhythmia(), f.seizure()));
        });
        list.add(c -> {
            Findings f = c.findings();
            return withFindings(c, new Findings(worse(f.pulmonaryGrade()), f.neurologicalGrade(), f.otherOrganGrade(),
                    f.mucosalBleeding(), f.visualDisturbance(), f.retinopathy(), f.heartFailure(), f.arrhythmia(),
                    f.seizure()));
        });
        list.add(c -> {
            Findings f = c.findings();
            return withFindings(c, new Findings(f.pulmonaryGrade(), worse(f.neurologicalGrade()), f.otherOrganGrade(),
                    f.mucosalBleeding(), f.visualDisturbance(), f.retinopathy(), f.heartFailure(), f.arrhythmia(),
                    f.seizure()));
        });
        list.add(c -> {
            Findings f = c.findings();
            return withFindings(c, new Findings(f.pulmonaryGrade(), f.neurologicalGrade(), worse(f.otherOrganGrade()),
                    f.mucosalBleeding(), f.visualDisturbance(), f.retinopathy(), f.heartFailure(), f.arrhythmia(),
                    f.seizure()));
        });
        return list;
    }

    // ---- measures of urgency -------------------------------------------------------------------------------------

    /** 3 with an act-now flag, 2 with review at most, 1 with notes only, 0 with no flag. */
    static int highestFlag(Verdicts.Outcome o) {
        return o.flags().stream().mapToInt(f -> Level.values().length - f.level().ordinal()).max().orElse(0);
    }

    private static String replay(Case c) {
        return "\n--- case to replay with `assess` ---\n" + CaseWriter.write(c);
    }

    private static boolean anySign(Case c) {
        Findings f = c.findings();
        return f.mucosalBleeding() == Observation.YES || f.visualDisturbance() == Observation.YES
                || f.heartFailure() == Observation.YES || f.retinopathy().compareTo(Retinopathy.VENOUS_DILATION) >= 0
                || f.neurologicalGrade().map(g -> g >= 1).orElse(false);
    }

    private static boolean trustedNormalViscosity(Case c) {
        return c.labs().get(Analyte.SERUM_VISCOSITY).map(m ->
                Verdicts.viscosityTrust(m, c.condition().cryoglobulin(), RULES) != ViscosityTrust.NOT_TRUSTED
                        && RULES.threshold(RequiredParameters.SV_NORMAL_UPPER).test(m, Comparison.AT_MOST))
                .orElse(false);
    }

    // ---- the properties ------------------------------------------------------------------------------------------

    @Test
    @DisplayName("monotone: worsening one value never lowers a verdict's alarm or the highest flag level")
    void monotone() {
        Random r = new Random(20261202L);
        for (int i = 0; i < COUNT; i++) {
            Case before = randomCase(r);
            Verdicts.Outcome a = Verdicts.assess(before, RULES);
            for (UnaryOperator<Case> worsen : worsenings(r)) {
                Case after = worsen.apply(before);
                Verdicts.Outcome b = Verdicts.assess(after, RULES);
                final int n = i;
                java.util.function.Supplier<String> where = () -> "case " + n + replay(before)
                        + "\n--- worsened ---\n" + CaseWriter.write(after);
                assertTrue(b.hyperviscosity().assessment().alarm() >= a.hyperviscosity().assessment().alarm(),
                        () -> "hyperviscosity dropped: " + a.hyperviscosity().assessment() + " -> "
                                + b.hyperviscosity().assessment() + where.get());
                assertTrue(b.leukostasis().probability().alarm() >= a.leukostasis().probability().alarm(),
                        () -> "leukostasis dropped: " + a.leukostasis().probability() + " -> "
                                + b.leukostasis().probability() + where.get());
                assertFalse(a.tumorLysis().laboratory().orElse(false) && !b.tumorLysis().laboratory().orElse(false),
                        () -> "laboratory tumor lysis dropped" + where.get());
                assertTrue(highestFlag(b) >= highestFlag(a), () -> "highest flag dropped: " + a.flags() + " -> "
                        + b.flags() + where.get());
            }
        }
    }

    @Test
    @DisplayName("no silent alarm: a sign with a known paraprotein or cryoglobulin is at least possible and act-now")
    void noSilentAlarm() {
        Random r = new Random(11L);
        int checked = 0;
        for (int i = 0; i < COUNT; i++) {
            Case c = randomCase(r);
            boolean known = c.condition().paraprotein() != Paraprotein.NONE
                    || c.condition().cryoglobulin() == Cryoglobulin.PRESENT;
            if (!known || !anySign(c) || trustedNormalViscosity(c)) {
                continue;
            }
            checked++;
            Verdicts.Outcome o = Verdicts.assess(c, RULES);
            assertTrue(o.hyperviscosity().assessment().alarm() >= 1, () -> o.hyperviscosity().reason() + replay(c));
            assertEquals(3, highestFlag(o), () -> "no act-now flag" + replay(c));
        }
        assertTrue(checked > COUNT / 10, "the generator reached the property only " + checked + " times");
    }

    @Test
    @DisplayName("gating: leukostasis is never probable below its leukemia type's level, or with no leukemia and no blasts")
    void gating() {
        Random r = new Random(12L);
        int checked = 0;
        for (int i = 0; i < COUNT; i++) {
            Case c = randomCase(r);
            Optional<Measurement> wbc = c.labs().get(Analyte.WBC);
            Leukemia type = c.condition().leukemia();
            boolean belowType = wbc.isPresent() && switch (type) {
                case ALL, CML, CLL -> !RULES.threshold(RequiredParameters.LEUKOSTASIS_GRADE_FROM_PREFIX + type.code())
                        .test(wbc.get(), Comparison.AT_LEAST);
                default -> false;
            };
            boolean untypedNoBlasts = type == Leukemia.NONE && !Verdicts.blastsPresent(c);
            if (!belowType && !untypedNoBlasts) {
                continue;
            }
            checked++;
            LeukostasisVerdict v = Verdicts.assess(c, RULES).leukostasis();
            Case gated = c;
            assertTrue(v.probability().alarm() < LeukostasisVerdict.Probability.PROBABLE.alarm(),
                    () -> v.probability() + ": " + v.reason() + replay(gated));
            assertTrue(v.score().isEmpty(), () -> "graded although gated" + replay(gated));
        }
        assertTrue(checked > COUNT / 10, "the generator reached the property only " + checked + " times");
    }

    @Test
    @DisplayName("untrusted measurement: a cold viscosity with a cryoglobulin never lowers a verdict")
    void coldViscosityNeverLowers() {
        Random r = new Random(13L);
        int checked = 0;
        for (int i = 0; i < COUNT; i++) {
            Case c = randomCase(r);
            Condition k = c.condition();
            c = new Case(c.patient(), new Condition(k.paraprotein(), k.leukemia(), k.monocytic(),
                    Cryoglobulin.PRESENT, k.therapyStarted()), c.labs(), c.baseline(), c.findings(), c.plan(),
                    c.assessedAt(), c.assessor(), c.extraJson());
            Double[] cold = {null, 4.0, 22.0, 25.0, 36.9};
            Double t = pick(r, cold);
            Case with = withLabs(c, c.labs().with(new Measurement(Analyte.SERUM_VISCOSITY,
                    new Quantity(between(r, 0.8, 9), "cP"), Optional.ofNullable(t).map(v -> new Quantity(v, "Cel")))));
            Case without = withLabs(c, c.labs().without(Analyte.SERUM_VISCOSITY));
            Verdicts.Outcome a = Verdicts.assess(without, RULES);
            Verdicts.Outcome b = Verdicts.assess(with, RULES);
            checked++;
            assertEquals(ViscosityTrust.NOT_TRUSTED, b.hyperviscosity().viscosity(), () -> replay(with));
            assertTrue(b.hyperviscosity().assessment().alarm() >= a.hyperviscosity().assessment().alarm(),
                    () -> a.hyperviscosity().assessment() + " -> " + b.hyperviscosity().assessment() + replay(with));
            assertFalse(b.hyperviscosity().assessment() == HyperviscosityVerdict.Assessment.UNLIKELY
                    && a.hyperviscosity().assessment() != HyperviscosityVerdict.Assessment.UNLIKELY,
                    () -> "the cold value made it unlikely" + replay(with));
            assertTrue(highestFlag(b) >= highestFlag(a), () -> replay(with));
        }
        assertEquals(COUNT, checked);
    }

    @Test
    @DisplayName("no reassurance without examination: 'unlikely' and 'none' only when the deciding signs were examined")
    void noReassuranceWithoutExamination() {
        Random r = new Random(14L);
        for (int i = 0; i < COUNT; i++) {
            Case c = randomCase(r);
            Verdicts.Outcome o = Verdicts.assess(c, RULES);
            if (o.hyperviscosity().assessment() == HyperviscosityVerdict.Assessment.UNLIKELY) {
                assertTrue(trustedNormalViscosity(c) || o.hyperviscosity().unassessed().isEmpty(),
                        () -> o.hyperviscosity().reason() + replay(c));
            }
            if (o.leukostasis().probability() == LeukostasisVerdict.Probability.NONE) {
                Findings f = c.findings();
                assertTrue(f.pulmonaryGrade().isPresent() && f.neurologicalGrade().isPresent()
                        && f.otherOrganGrade().isPresent(), () -> o.leukostasis().reason() + replay(c));
            }
        }
    }
}
