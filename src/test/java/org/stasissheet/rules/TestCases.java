package org.stasissheet.rules;

import java.time.LocalDate;
import java.time.OffsetDateTime;
import java.util.Optional;
import org.stasissheet.files.RuleSources;
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
import org.stasissheet.measure.Analyte;

/** Invented cases for the rule tests, built up one field at a time from an empty case. */
final class TestCases {
    static final RuleSet SHIPPED = ((LoadResult.Loaded) RuleSources.shipped()).ruleSet();

    private Case c = Case.EMPTY;

    static TestCases a() {
        return new TestCases();
    }

    Case build() {
        return c;
    }

    Verdicts.Outcome assess() {
        return Verdicts.assess(c, SHIPPED);
    }

    boolean fires(String ruleId) {
        return assess().flags().stream().anyMatch(f -> f.id().equals(ruleId));
    }

    TestCases lab(Analyte a, double value, String unit) {
        c = with(c.labs().with(Measurement.of(a, value, unit)), c.baseline());
        return this;
    }

    /** A serum viscosity in cP read at {@code celsius} (null: no temperature recorded). */
    TestCases viscosityAt(double cp, Double celsius) {
        Measurement m = new Measurement(Analyte.SERUM_VISCOSITY, new org.stasissheet.measure.Quantity(cp, "cP"),
                Optional.ofNullable(celsius).map(t -> new org.stasissheet.measure.Quantity(t, "Cel")));
        c = with(c.labs().with(m), c.baseline());
        return this;
    }

    TestCases baseline(Analyte a, double value, String unit) {
        c = with(c.labs(), c.baseline().with(Measurement.of(a, value, unit)));
        return this;
    }

    private Case with(Labs labs, Labs baseline) {
        return new Case(c.patient(), c.condition(), labs, baseline, c.findings(), c.plan(), c.assessedAt(), "", "{}");
    }

    TestCases age(int years) {
        Patient p = c.patient();
        c = new Case(new Patient(p.label(), p.sex(), Optional.of(years), p.height(), p.weight()), c.condition(),
                c.labs(), c.baseline(), c.findings(), c.plan(), c.assessedAt(), "", "{}");
        return this;
    }

    TestCases paraprotein(Paraprotein type) {
        Condition k = c.condition();
        return condition(new Condition(type, k.leukemia(), k.monocytic(), k.cryoglobulin(), k.therapyStarted()));
    }

    TestCases leukemia(Leukemia type, boolean monocytic) {
        Condition k = c.condition();
        return condition(new Condition(k.paraprotein(), type, monocytic, k.cryoglobulin(), k.therapyStarted()));
    }

    TestCases cryoglobulin(Cryoglobulin cryo) {
        Condition k = c.condition();
        return condition(new Condition(k.paraprotein(), k.leukemia(), k.monocytic(), cryo, k.therapyStarted()));
    }

    TestCases therapyStarted(String isoDate) {
        Condition k = c.condition();
        return condition(new Condition(k.paraprotein(), k.leukemia(), k.monocytic(), k.cryoglobulin(),
                Optional.of(LocalDate.parse(isoDate))));
    }

    TestCases assessedAt(String isoDateTime) {
        c = new Case(c.patient(), c.condition(), c.labs(), c.baseline(), c.findings(), c.plan(),
                Optional.of(OffsetDateTime.parse(isoDateTime)), "", "{}");
        return this;
    }

    private TestCases condition(Condition k) {
        c = new Case(c.patient(), k, c.labs(), c.baseline(), c.findings(), c.plan(), c.assessedAt(), "", "{}");
        return this;
    }

    TestCases findings(Findings f) {
        c = new Case(c.patient(), c.condition(), c.labs(), c.baseline(), f, c.plan(), c.assessedAt(), "", "{}");
        return this;
    }

    /** Every sign looked for and absent, organ grades 0. */
    static Findings noSigns() {
        return new Findings(Optional.of(0), Optional.of(0), Optional.of(0), Observation.NO, Observation.NO,
                Retinopathy.NONE, Observation.NO, Observation.NO, Observation.NO);
    }

    TestCases grades(Integer pulmonary, Integer neurological, Integer other) {
        Findings f = c.findings();
        return findings(new Findings(Optional.ofNullable(pulmonary), Optional.ofNullable(neurological),
                Optional.ofNullable(other), f.mucosalBleeding(), f.visualDisturbance(), f.retinopathy(),
                f.heartFailure(), f.arrhythmia(), f.seizure()));
    }

    TestCases signs(Observation bleeding, Observation visual, Retinopathy retina, Observation heart) {
        Findings f = c.findings();
        return findings(new Findings(f.pulmonaryGrade(), f.neurologicalGrade(), f.otherOrganGrade(), bleeding,
                visual, retina, heart, f.arrhythmia(), f.seizure()));
    }

    TestCases arrhythmiaSeizure(Observation arrhythmia, Observation seizure) {
        Findings f = c.findings();
        return findings(new Findings(f.pulmonaryGrade(), f.neurologicalGrade(), f.otherOrganGrade(),
                f.mucosalBleeding(), f.visualDisturbance(), f.retinopathy(), f.heartFailure(), arrhythmia, seizure));
    }

    TestCases plan(boolean rituximab, boolean transfusion) {
        c = new Case(c.patient(), c.condition(), c.labs(), c.baseline(), c.findings(), new Plan(rituximab, transfusion),
                c.assessedAt(), "", "{}");
        return this;
    }
}
