package org.stasissheet.report;

import java.nio.charset.StandardCharsets;
import java.time.OffsetDateTime;
import java.util.EnumMap;
import java.util.Map;
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
import org.stasissheet.intake.Sex;
import org.stasissheet.measure.Analyte;
import org.stasissheet.rules.LoadResult;
import org.stasissheet.rules.Provenance;
import org.stasissheet.rules.RuleSet;
import org.stasissheet.worksheet.Assessor;
import org.stasissheet.worksheet.Worksheet;

/** Invented demo cases (St. Alder Infirmary scenario) built in code for the renderer tests. */
final class Fixtures {
    static final String GREEK_LABEL = "Ελένη Παπαδοπούλου, κλίνη 4";
    static final String CYRILLIC_LABEL = "Анна Смирнова, палата 7";
    static final String SHA256 = "3f6c2a9d0b1e4c7a8f5d6e2b9c0a1d3e4f5a6b7c8d9e0f1a2b3c4d5e6f7a8b9c";
    static final Provenance SHIPPED = new Provenance("stasis-core", "1.0.0", SHA256, false);
    static final Provenance LOCAL = new Provenance("st-alder-local", "2.1", SHA256.replace('3', '7'), true);
    static final OffsetDateTime GENERATED = OffsetDateTime.parse("2026-03-05T03:05:00+01:00");

    private Fixtures() {
    }

    /** An invented IgM patient with hyperviscosity symptoms, labelled with the given text. */
    static Case igmCase(String label) {
        Map<Analyte, Measurement> labs = new EnumMap<>(Analyte.class);
        labs.put(Analyte.SERUM_VISCOSITY, Measurement.of(Analyte.SERUM_VISCOSITY, 5.6, "cP"));
        labs.put(Analyte.IGM, Measurement.of(Analyte.IGM, 5.9, "g/dL"));
        labs.put(Analyte.HEMATOCRIT, Measurement.of(Analyte.HEMATOCRIT, 29, "%"));
        labs.put(Analyte.WBC, Measurement.of(Analyte.WBC, 7.2, "10*9/L"));
        Patient patient = new Patient(label, Optional.of(Sex.FEMALE), Optional.of(71),
                Optional.of(Measurement.of(Analyte.HEIGHT, 162, "cm")),
                Optional.of(Measurement.of(Analyte.WEIGHT, 58, "kg")));
        Condition condition = new Condition(Paraprotein.IGM, Leukemia.NONE, false, Cryoglobulin.UNKNOWN,
                Optional.empty());
        Findings findings = new Findings(Optional.of(0), Optional.of(1), Optional.of(0), Observation.YES,
                Observation.YES, Retinopathy.VENOUS_DILATION, Observation.NO, Observation.NO, Observation.NO);
        return new Case(patient, condition, new Labs(labs), Labs.NONE, findings, new Plan(true, false),
                Optional.of(OffsetDateTime.parse("2026-03-05T02:40:00+01:00")), "Invented night resident", "{}");
    }

    /** A stand-in for the case file the case above was read from: only its bytes matter to the renderer. */
    static byte[] caseJson(String label) {
        return ("""
                {
                  "format": "stasis-case/1",
                  "patient": {"label": "%s", "sex": "female", "ageYears": 71,
                              "height": {"value": 162, "unit": "cm"}, "weight": {"value": 58, "unit": "kg"}},
                  "condition": {"paraprotein": "IgM", "leukemia": "none", "monocytic": false,
                                "cryoglobulin": "unknown", "therapyStarted": null},
                  "labs": {"serumViscosity": {"value": 5.6, "unit": "cP"}, "igm": {"value": 5.9, "unit": "g/dL"},
                           "hematocrit": {"value": 29, "unit": "%%"}, "wbc": {"value": 7.2, "unit": "10*9/L"}},
                  "assessedAt": "2026-03-05T02:40:00+01:00",
                  "assessor": "Invented night resident",
                  "extra": {"ward": "St. Alder Infirmary, haematology"}
                }
                """.formatted(label)).getBytes(StandardCharsets.UTF_8);
    }

    /** The worksheet of a case under a rule set with this provenance. */
    static Worksheet sheet(Case c, Provenance provenance) {
        return Assessor.assess(c, withProvenance(provenance));
    }

    /** The shipped rule set (real rules and parameters) under another provenance, e.g. a local one. */
    static RuleSet withProvenance(Provenance provenance) {
        RuleSet shipped = shipped();
        return new RuleSet(provenance, shipped.description(), shipped.parameters(), shipped.rules());
    }

    static RuleSet shipped() {
        return ((LoadResult.Loaded) RuleSources.shipped()).ruleSet();
    }
}
