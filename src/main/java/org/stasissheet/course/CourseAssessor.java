package org.stasissheet.course;

import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import java.util.Optional;
import java.util.function.DoubleFunction;
import org.stasissheet.apheresis.ApheresisPlanner;
import org.stasissheet.derived.CaseQuantities;
import org.stasissheet.derived.ExchangeKinetics;
import org.stasissheet.derived.ExchangeProjection;
import org.stasissheet.intake.Case;
import org.stasissheet.intake.Leukemia;
import org.stasissheet.measure.Analyte;
import org.stasissheet.measure.Estimate;
import org.stasissheet.measure.Numbers;
import org.stasissheet.measure.Quantity;
import org.stasissheet.rules.EstimateParameters;
import org.stasissheet.rules.RuleSet;
import org.stasissheet.worksheet.Assessor;
import org.stasissheet.worksheet.Worksheet;

/**
 * Turns a course and a rule set into a {@link CourseReport}: the one entry point for a course, as
 * {@link Assessor#assess} is for a case. Pure.
 *
 * <p>Projections reuse {@link ExchangeKinetics} (exchanges) and the rule set's leukapheresis fall per procedure; the
 * plasma volume for an exchange written as a volume comes from the worksheet's Kaplan estimate of the assessment
 * before it. A projection is made only from a value with no other exchange or leukapheresis between it and the
 * procedure, and compared only with a value measured before the next one, so each comparison concerns one procedure.
 */
public final class CourseAssessor {
    private CourseAssessor() {
    }

    public static CourseReport assess(Course course, RuleSet rules) {
        Objects.requireNonNull(course, "course");
        Objects.requireNonNull(rules, "rules");
        List<Worksheet> sheets = new ArrayList<>();
        for (int i = 0; i < course.assessments().size(); i++) {
            sheets.add(Assessor.assess(course.caseAt(i), rules));
        }
        List<ProcedureReview> reviews = new ArrayList<>();
        List<CourseEntry> entries = course.entries();
        for (int i = 0; i < entries.size(); i++) {
            if (entries.get(i) instanceof Procedure p) {
                reviews.add(review(course, i, p, rules));
            }
        }
        return new CourseReport(course, sheets, reviews);
    }

    private static boolean removes(CourseEntry e) {
        return e instanceof Procedure.PlasmaExchange || e instanceof Procedure.Leukapheresis;
    }

    private static ProcedureReview review(Course course, int position, Procedure p, RuleSet rules) {
        List<String> notes = new ArrayList<>();
        if (!removes(p)) {
            return new ProcedureReview(p, Optional.empty(), List.of(), notes);
        }
        Optional<Case> before = lastAssessmentBefore(course, position);
        if (before.isEmpty()) {
            notes.add("No assessment before this procedure, so nothing was projected.");
            return new ProcedureReview(p, Optional.empty(), List.of(), notes);
        }
        List<AnalyteCheck> checks = new ArrayList<>();
        Optional<Double> volumes = Optional.empty();
        if (p instanceof Procedure.PlasmaExchange x) {
            Estimate<Double> v = plasmaVolumes(x, before.get(), rules);
            volumes = v.known();
            Estimate<Double> fraction = CaseQuantities.intravascularFraction(course.condition().paraprotein(), rules);
            double referenceSv = rules.value(EstimateParameters.REFERENCE_SERUM_VISCOSITY, "cP");
            Optional<Analyte> paraprotein = CaseQuantities.paraproteinLab(course.condition().paraprotein());
            if (paraprotein.isPresent()) {
                check(course, position, paraprotein.get(), start -> v.flatMap(vol -> fraction.map(f ->
                        exchange(ExchangeKinetics.project(start, f, vol))))).ifPresent(checks::add);
            }
            check(course, position, Analyte.SERUM_VISCOSITY, start -> v.flatMap(vol -> fraction.map(f ->
                    exchange(ExchangeKinetics.projectSerumViscosity(start, referenceSv, f, vol)))))
                    .ifPresent(checks::add);
            if (!checks.isEmpty()) {
                v.whyUnknown().ifPresent(why -> notes.add("Nothing projected: " + why + "."));
                fraction.whyUnknown().ifPresent(why -> notes.add("Nothing projected: " + why + "."));
            }
        } else {
            Procedure.Leukapheresis l = (Procedure.Leukapheresis) p;
            if (course.condition().leukemia() == Leukemia.APL) {
                notes.add(ApheresisPlanner.APL_NO_LEUKAPHERESIS + ".");
            }
            double fallLow = rules.value(EstimateParameters.WBC_REDUCTION_LOW, "1");
            double fallHigh = rules.value(EstimateParameters.WBC_REDUCTION_HIGH, "1");
            check(course, position, Analyte.WBC, start -> Estimate.known(new Projected(Projected.Kind.LEUKAPHERESIS,
                    start * (1 - fallHigh), start * (1 - fallLow)))).ifPresent(checks::add);
            notes.add("The white count after leukapheresis is projected from the rule set's fall per procedure ("
                    + Numbers.plain(100 * fallLow) + "–" + Numbers.plain(100 * fallHigh) + " %, common practice), "
                    + "whatever the blood volumes processed (" + Numbers.plain(l.bloodVolumesProcessed())
                    + " here); cytoreduction and the marrow's output also move it.");
        }
        if (checks.isEmpty()) {
            notes.add("None of the values this procedure lowers was measured before it with no other exchange or "
                    + "leukapheresis between, so nothing was projected.");
        }
        return new ProcedureReview(p, volumes, checks, notes);
    }

    private static Projected exchange(ExchangeProjection e) {
        return new Projected(Projected.Kind.EXCHANGE, e.immediate(), e.afterRedistribution());
    }

    /**
     * The check of one analyte: its last value before the procedure (none if another exchange or leukapheresis came
     * between), the projection from that value, and the first value after it (none once another one came).
     */
    private static Optional<AnalyteCheck> check(Course course, int position, Analyte a,
                                                DoubleFunction<Estimate<Projected>> projection) {
        List<CourseEntry> entries = course.entries();
        CourseEntry.Assessment start = null;
        for (int i = position - 1; i >= 0 && start == null; i--) {
            CourseEntry e = entries.get(i);
            if (removes(e)) {
                return Optional.empty();
            }
            if (e instanceof CourseEntry.Assessment s && s.moment().labs().has(a)) {
                start = s;
            }
        }
        if (start == null) {
            return Optional.empty();
        }
        double startValue = start.moment().labs().canonical(a).orElseThrow();
        Estimate<Projected> projected = projection.apply(startValue);
        Optional<AnalyteCheck.Comparison> next = Optional.empty();
        for (int i = position + 1; i < entries.size() && next.isEmpty(); i++) {
            CourseEntry e = entries.get(i);
            if (removes(e)) {
                break;
            }
            if (e instanceof CourseEntry.Assessment later && later.moment().labs().has(a)) {
                Quantity measured = new Quantity(later.moment().labs().canonical(a).orElseThrow(), a.canonicalUnit());
                next = Optional.of(AnalyteCheck.compare(startValue, projected.known(), measured, later.at()));
            }
        }
        return Optional.of(new AnalyteCheck(a, new Quantity(startValue, a.canonicalUnit()), start.at(), projected,
                next));
    }

    /** Plasma volumes as written, or the volume removed over the Kaplan plasma volume of the assessment before. */
    private static Estimate<Double> plasmaVolumes(Procedure.PlasmaExchange x, Case before, RuleSet rules) {
        if (x.plasmaVolumes().isPresent()) {
            return Estimate.known(x.plasmaVolumes().get());
        }
        double litres = x.volumeLitres().orElseThrow();
        return ApheresisPlanner.plan(before, rules).plasmaVolumeL().map(pv -> litres / pv);
    }

    private static Optional<Case> lastAssessmentBefore(Course course, int position) {
        for (int i = position - 1; i >= 0; i--) {
            if (course.entries().get(i) instanceof CourseEntry.Assessment a) {
                return Optional.of(a.moment());
            }
        }
        return Optional.empty();
    }
}
