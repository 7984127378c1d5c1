package org.stasissheet.intake;

import java.math.BigDecimal;
import java.time.LocalDate;
import java.time.LocalDateTime;
import java.time.OffsetDateTime;
import java.time.format.DateTimeParseException;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.stream.Collectors;
import org.stasissheet.intake.CaseDocument.ConditionPart;
import org.stasissheet.intake.CaseDocument.FindingsPart;
import org.stasissheet.intake.CaseDocument.PatientPart;
import org.stasissheet.intake.CaseDocument.PlanPart;
import org.stasissheet.intake.CaseDocument.QuantityPart;
import org.stasissheet.measure.Analyte;
import org.stasissheet.measure.Numbers;
import org.stasissheet.measure.Quantity;
import org.stasissheet.measure.UnitOption;

/**
 * Step 3 of reading: transfer data to the domain {@link Case}. Checks what the JSON types cannot: the format
 * word, units, negative and implausible values (with a suggested unit), whole-number grades and ages,
 * vocabularies and ISO dates. Every problem is recorded; defaults stand in for refused values so that the rest
 * of the file is still checked, and the caller discards the case when any problem was found.
 */
final class CaseConversion {
    /** Age bounds accepted by {@link Patient}, whole years. */
    private static final int MAX_AGE_YEARS = 130;
    /** Organ grades 0–3 (Novotny 2005 grading as described in DOMAIN.md). */
    private static final int MAX_GRADE = 3;
    /**
     * Measuring temperature of a serum viscosity, °C, inclusive: viscometers run at 25 or 37 °C; 0–45 catches
     * typing slips only. Basis: common practice.
     */
    private static final double MIN_TEMPERATURE_CEL = 0;
    private static final double MAX_TEMPERATURE_CEL = 45;
    static final String TEMPERATURE_UNIT = "Cel";

    private final Problems problems;

    private CaseConversion(Problems problems) {
        this.problems = problems;
    }

    static Case toCase(CaseDocument doc, Problems problems) {
        return new CaseConversion(problems).convert(doc);
    }

    private Case convert(CaseDocument doc) {
        checkFormat(doc.format());
        Patient patient = doc.patient().map(this::patient).orElse(Patient.UNKNOWN);
        Condition condition = doc.condition().map(this::condition).orElse(Condition.UNKNOWN);
        Labs labs = labs(doc.labs());
        Labs baseline = labs(doc.baseline());
        Findings findings = doc.findings().map(this::findings).orElse(Findings.NOT_ASSESSED);
        Plan plan = doc.plan().map(CaseConversion::plan).orElse(Plan.NOTHING);
        Optional<OffsetDateTime> assessedAt = doc.assessedAt().flatMap(this::timestamp);
        return new Case(patient, condition, labs, baseline, findings, plan, assessedAt,
                doc.assessor().orElse(""), doc.extraJson());
    }

    private void checkFormat(Optional<String> format) {
        if (format.isEmpty()) {
            problems.add("format", "missing; a case file starts with \"format\": \"" + Case.FORMAT + "\"");
        } else if (!format.get().equals(Case.FORMAT)) {
            problems.add("format", "\"" + format.get() + "\" is not a format this version reads; expected \""
                    + Case.FORMAT + "\"");
        }
    }

    private Patient patient(PatientPart p) {
        Optional<Sex> sex = p.sex().flatMap(w -> word(Sex.class, w, "patient.sex"));
        Optional<Integer> age = p.ageYears().flatMap(a -> wholeNumber(a, 0, MAX_AGE_YEARS, "patient.ageYears",
                "years"));
        Optional<Measurement> height = p.height().flatMap(q -> measurement(Analyte.HEIGHT, q));
        Optional<Measurement> weight = p.weight().flatMap(q -> measurement(Analyte.WEIGHT, q));
        return new Patient(p.label().orElse(""), sex, age, height, weight);
    }

    private Condition condition(ConditionPart c) {
        Paraprotein paraprotein = c.paraprotein().flatMap(w -> word(Paraprotein.class, w, "condition.paraprotein"))
                .orElse(Paraprotein.NONE);
        Leukemia leukemia = c.leukemia().flatMap(w -> word(Leukemia.class, w, "condition.leukemia"))
                .orElse(Leukemia.NONE);
        Cryoglobulin cryoglobulin = c.cryoglobulin()
                .flatMap(w -> word(Cryoglobulin.class, w, "condition.cryoglobulin")).orElse(Cryoglobulin.UNKNOWN);
        Optional<LocalDate> therapyStarted = c.therapyStarted().flatMap(this::date);
        return new Condition(paraprotein, leukemia, c.monocytic().orElse(false), cryoglobulin, therapyStarted);
    }

    private Findings findings(FindingsPart f) {
        return new Findings(grade(f.pulmonaryGrade(), "findings.pulmonaryGrade"),
                grade(f.neurologicalGrade(), "findings.neurologicalGrade"),
                grade(f.otherOrganGrade(), "findings.otherOrganGrade"),
                observation(f.mucosalBleeding()), observation(f.visualDisturbance()),
                f.retinopathy().flatMap(w -> word(Retinopathy.class, w, "findings.retinopathy"))
                        .orElse(Retinopathy.NOT_EXAMINED),
                observation(f.heartFailure()), observation(f.arrhythmia()), observation(f.seizure()));
    }

    private static Plan plan(PlanPart p) {
        return new Plan(p.rituximabPlanned().orElse(false), p.transfusionPlanned().orElse(false));
    }

    private static Observation observation(Optional<Boolean> seen) {
        return seen.map(b -> b ? Observation.YES : Observation.NO).orElse(Observation.NOT_ASSESSED);
    }

    private Labs labs(Map<Analyte, QuantityPart> parts) {
        Map<Analyte, Measurement> values = new EnumMap<>(Analyte.class);
        parts.forEach((analyte, q) -> measurement(analyte, q).ifPresent(m -> values.put(analyte, m)));
        return new Labs(values);
    }

    private Optional<Integer> grade(Optional<BigDecimal> grade, String path) {
        return grade.flatMap(g -> wholeNumber(g, 0, MAX_GRADE, path, "(grades are 0 none, 1 slight, 2 marked,"
                + " 3 severe; leave it out if not assessed)"));
    }

    private Optional<Integer> wholeNumber(BigDecimal n, int min, int max, String path, String what) {
        String written = n.toPlainString();
        if (n.signum() != 0 && n.stripTrailingZeros().scale() > 0) {
            problems.add(path, written + " is not a whole number; expected a whole number " + min + "–" + max
                    + " " + what);
            return Optional.empty();
        }
        if (n.compareTo(BigDecimal.valueOf(min)) < 0 || n.compareTo(BigDecimal.valueOf(max)) > 0) {
            problems.add(path, written + " is outside " + min + "–" + max + " " + what);
            return Optional.empty();
        }
        return Optional.of(n.intValueExact());
    }

    private <E extends Enum<E> & Enums.Coded> Optional<E> word(Class<E> type, String word, String path) {
        Optional<E> parsed = Enums.parse(type, word);
        if (parsed.isEmpty()) {
            String hint = "";
            for (E e : type.getEnumConstants()) {
                if (e.code().equalsIgnoreCase(word)) {
                    hint = " (words are case-sensitive: write \"" + e.code() + "\")";
                }
            }
            problems.add(path, "\"" + word + "\" is not allowed; allowed: " + Enums.allowed(type) + hint);
        }
        return parsed;
    }

    private Optional<LocalDate> date(String text) {
        try {
            return Optional.of(LocalDate.parse(text));
        } catch (DateTimeParseException e) {
            problems.add("condition.therapyStarted", "\"" + text + "\" is not an ISO date; write year-month-day,"
                    + " e.g. 2026-03-04 (or null when therapy has not started)");
            return Optional.empty();
        }
    }

    private Optional<OffsetDateTime> timestamp(String text) {
        try {
            return Optional.of(OffsetDateTime.parse(text));
        } catch (DateTimeParseException e) {
            String why = hasNoOffset(text) ? " has no UTC offset" : " is not an ISO date and time";
            problems.add("assessedAt", "\"" + text + "\"" + why + "; write it with the offset, e.g."
                    + " 2026-03-05T02:40:00+01:00");
            return Optional.empty();
        }
    }

    private static boolean hasNoOffset(String text) {
        try {
            LocalDateTime.parse(text);
            return true;
        } catch (DateTimeParseException e) {
            return false;
        }
    }

    /** A checked measurement, or empty after reporting why not. */
    private Optional<Measurement> measurement(Analyte analyte, QuantityPart q) {
        Optional<Quantity> entered = checkedValue(analyte, q);
        Optional<Quantity> temperature = q.temperature().flatMap(this::temperature);
        boolean temperatureRefused = q.temperature().isPresent() && temperature.isEmpty();
        if (entered.isEmpty() || temperatureRefused) {
            return Optional.empty();
        }
        return Optional.of(new Measurement(analyte, entered.get(), temperature));
    }

    private Optional<Quantity> checkedValue(Analyte analyte, QuantityPart q) {
        String accepted = analyte.units().stream().map(UnitOption::ucum).collect(Collectors.joining(", "));
        Optional<UnitOption> unit = Optional.empty();
        if (q.unit().isEmpty()) {
            problems.add(q.path() + ".unit", "missing; accepted units for " + analyte.label() + ": " + accepted);
        } else {
            unit = analyte.unitOption(q.unit().get());
            if (unit.isEmpty()) {
                String value = q.value().map(v -> " (value " + v.toPlainString() + ")").orElse("");
                problems.add(q.path() + ".unit", "\"" + q.unit().get() + "\"" + value
                        + " is not an accepted unit for " + analyte.label() + "; accepted (UCUM codes): " + accepted);
            }
        }
        if (q.value().isEmpty()) {
            problems.add(q.path() + ".value", "missing; a measurement is {\"value\": number, \"unit\": \""
                    + analyte.canonicalUnit() + "\"}");
            return Optional.empty();
        }
        Optional<Double> value = finite(q.value().get(), q.path());
        if (value.isEmpty() || unit.isEmpty()) {
            return Optional.empty();
        }
        double v = value.get();
        UnitOption u = unit.get();
        if (v < 0) {
            problems.add(q.path(), Numbers.plain(v) + " " + u.ucum() + " is negative; " + analyte.label()
                    + " cannot be below 0");
            return Optional.empty();
        }
        if (!analyte.isPlausible(v * u.toCanonical())) {
            problems.add(q.path(), implausible(analyte, v, u));
            return Optional.empty();
        }
        return Optional.of(new Quantity(v, u.ucum()));
    }

    private Optional<Quantity> temperature(QuantityPart q) {
        boolean ok = true;
        if (q.unit().isEmpty()) {
            problems.add(q.path() + ".unit", "missing; the measuring temperature is in " + TEMPERATURE_UNIT
                    + " (degrees Celsius)");
            ok = false;
        } else if (!q.unit().get().equals(TEMPERATURE_UNIT)) {
            problems.add(q.path() + ".unit", "\"" + q.unit().get() + "\" is not accepted; the measuring"
                    + " temperature is in " + TEMPERATURE_UNIT + " (degrees Celsius) only");
            ok = false;
        }
        if (q.value().isEmpty()) {
            problems.add(q.path() + ".value", "missing; e.g. {\"value\": 37, \"unit\": \"Cel\"}");
            return Optional.empty();
        }
        Optional<Double> value = finite(q.value().get(), q.path());
        if (value.isEmpty() || !ok) {
            return Optional.empty();
        }
        double v = value.get();
        if (v < MIN_TEMPERATURE_CEL || v > MAX_TEMPERATURE_CEL) {
            problems.add(q.path(), Numbers.plain(v) + " Cel is not plausible for a measuring temperature;"
                    + " the plausible range is " + Numbers.plain(MIN_TEMPERATURE_CEL) + " to "
                    + Numbers.plain(MAX_TEMPERATURE_CEL) + " Cel");
            return Optional.empty();
        }
        return Optional.of(new Quantity(v, TEMPERATURE_UNIT));
    }

    private Optional<Double> finite(BigDecimal n, String path) {
        double v = Double.parseDouble(n.toString());
        if (!Double.isFinite(v)) {
            problems.add(path + ".value", n + " is too large to be a measured value");
            return Optional.empty();
        }
        return Optional.of(v);
    }

    /**
     * "150000 10*9/L is not plausible; did you mean /uL (= 150 10*9/L)?" — every other unit that would make
     * the number plausible, each once per distinct factor, shown converted into the unit as entered. When none
     * fits, the plausible range in the unit as entered (and in the canonical unit, if different).
     */
    static String implausible(Analyte analyte, double value, UnitOption entered) {
        String head = Numbers.plain(value) + " " + entered.ucum() + " is not plausible";
        List<String> alternatives = analyte.unitsMakingPlausible(value, entered).stream()
                .map(other -> other.ucum() + " (= " + Numbers.rounded(value * other.toCanonical()
                        / entered.toCanonical(), 6) + " " + entered.ucum() + ")")
                .toList();
        if (!alternatives.isEmpty()) {
            return head + "; did you mean " + String.join(" or ", alternatives) + "?";
        }
        String range = "; the plausible range for " + analyte.label() + " is "
                + Numbers.rounded(analyte.plausibleMin() / entered.toCanonical(), 6) + " to "
                + Numbers.rounded(analyte.plausibleMax() / entered.toCanonical(), 6) + " " + entered.ucum();
        if (!entered.ucum().equals(analyte.canonicalUnit())) {
            range += " (" + Numbers.plain(analyte.plausibleMin()) + " to " + Numbers.plain(analyte.plausibleMax())
                    + " " + analyte.canonicalUnit() + ")";
        }
        return head + range;
    }
}
