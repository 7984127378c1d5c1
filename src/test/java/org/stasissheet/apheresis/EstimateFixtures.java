package org.stasissheet.apheresis;

import org.stasissheet.rules.EstimateParameters;

import java.util.LinkedHashMap;
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
import org.stasissheet.intake.Paraprotein;
import org.stasissheet.intake.Patient;
import org.stasissheet.intake.Plan;
import org.stasissheet.intake.Sex;
import org.stasissheet.measure.Analyte;
import org.stasissheet.measure.Quantity;
import org.stasissheet.rules.Basis;
import org.stasissheet.rules.LoadResult;
import org.stasissheet.rules.Parameter;
import org.stasissheet.rules.Provenance;
import org.stasissheet.rules.RuleSet;

/**
 * Test fixtures: the estimate parameters with the values and sources the rule files carry (issue "Estimates"),
 * and a small builder for invented cases (St. Alder Infirmary demo patients, not real people).
 */
public final class EstimateFixtures {
    private EstimateFixtures() {
    }

    /** A rule set holding exactly the estimate parameters, each with its source as the rule files give it. */
    public static RuleSet rules() {
        Map<String, Parameter> p = new LinkedHashMap<>();
        // CASE-FORMAT reference blood; common practice
        put(p, EstimateParameters.REFERENCE_HEMATOCRIT, 0.45, "1", "CASE-FORMAT reference", Basis.COMMON_PRACTICE);
        // middle of the 1.4–1.8 normal range, Mehta & Singhal 2003 (published, secondary)
        put(p, EstimateParameters.REFERENCE_SERUM_VISCOSITY, 1.6, "cP", "Mehta & Singhal 2003, middle of 1.4–1.8",
                Basis.PUBLISHED_SECONDARY);
        // mean cell volume ranges (DOMAIN.md §6): monocytic AML blasts 240–730 fL and ALL blasts about 82 fL
        // (one measured series, published, secondary); ALL upper end 250 fL from memory; CLL 154–244 fL
        // (Costello C et al., Br J Haematol 1980;45:209, abstract)
        put(p, EstimateParameters.VOLUME_MYELOBLAST_LOW, 240, "fL", "DOMAIN.md §6", Basis.PUBLISHED_SECONDARY);
        put(p, EstimateParameters.VOLUME_MYELOBLAST_HIGH, 730, "fL", "DOMAIN.md §6", Basis.PUBLISHED_SECONDARY);
        put(p, EstimateParameters.VOLUME_LYMPHOBLAST_LOW, 82, "fL", "DOMAIN.md §6", Basis.PUBLISHED_SECONDARY);
        put(p, EstimateParameters.VOLUME_LYMPHOBLAST_HIGH, 250, "fL", "DOMAIN.md §2", Basis.FROM_MEMORY);
        put(p, EstimateParameters.VOLUME_MATURE_LYMPHOCYTE_LOW, 154, "fL", "Costello 1980", Basis.PUBLISHED);
        put(p, EstimateParameters.VOLUME_MATURE_LYMPHOCYTE_HIGH, 244, "fL", "Costello 1980", Basis.PUBLISHED);
                // red cells in additive solution: 300–400 mL at hematocrit 55–65 % (Circular of Information, as quoted);
        // the middle, 0.35 L at 0.60
        put(p, EstimateParameters.TRANSFUSION_UNIT_VOLUME, 0.35, "L", "Circular of Information, as quoted",
                Basis.PUBLISHED_SECONDARY);
        put(p, EstimateParameters.TRANSFUSION_UNIT_RED_CELL_VOLUME, 0.21, "L", "Circular of Information, as quoted",
                Basis.PUBLISHED_SECONDARY);
        // intravascular fractions, Reverberi & Reverberi 2007 (IgM 78 % as quoted by a later review, DOMAIN.md §6)
        put(p, EstimateParameters.INTRAVASCULAR_FRACTION_IGM, 0.78, "1", "Reverberi 2007 as quoted",
                Basis.PUBLISHED_SECONDARY);
        put(p, EstimateParameters.INTRAVASCULAR_FRACTION_IGG, 0.45, "1", "Reverberi 2007", Basis.PUBLISHED);
        put(p, EstimateParameters.INTRAVASCULAR_FRACTION_IGA, 0.42, "1", "Reverberi 2007", Basis.PUBLISHED);
        // leukapheresis: common practice
        put(p, EstimateParameters.PROCESS_BLOOD_VOLUMES_LOW, 1.5, "1", "common practice", Basis.COMMON_PRACTICE);
        put(p, EstimateParameters.PROCESS_BLOOD_VOLUMES_HIGH, 2.0, "1", "common practice", Basis.COMMON_PRACTICE);
        put(p, EstimateParameters.WBC_REDUCTION_LOW, 0.2, "1", "common practice", Basis.COMMON_PRACTICE);
        put(p, EstimateParameters.WBC_REDUCTION_HIGH, 0.5, "1", "common practice", Basis.COMMON_PRACTICE);
        // the verdict code needs the rules' own parameters and rules too: take them from the shipped set, keeping
        // the estimate values above (merge of the rules work)
        RuleSet shipped = ((LoadResult.Loaded) RuleSources.shipped()).ruleSet();
        shipped.parameters().forEach(p::putIfAbsent);
        return new RuleSet(new Provenance("estimates-test", "0", "0".repeat(64), false), "test parameters", p,
                shipped.rules());
    }

    private static void put(Map<String, Parameter> p, String id, double value, String unit, String source,
                            Basis basis) {
        p.put(id, new Parameter(id, new Quantity(value, unit), source, basis, ""));
    }

    /** A builder for invented cases; every field starts absent. */
    public static final class CaseBuilder {
        private Optional<Sex> sex = Optional.empty();
        private Optional<Integer> age = Optional.of(60);
        private Optional<Measurement> height = Optional.empty();
        private Optional<Measurement> weight = Optional.empty();
        private Paraprotein paraprotein = Paraprotein.NONE;
        private Leukemia leukemia = Leukemia.NONE;
        private Labs labs = Labs.NONE;

        public CaseBuilder sex(Sex s) {
            sex = Optional.of(s);
            return this;
        }

        public CaseBuilder age(int years) {
            age = Optional.of(years);
            return this;
        }

        public CaseBuilder heightCm(double cm) {
            height = Optional.of(Measurement.of(Analyte.HEIGHT, cm, "cm"));
            return this;
        }

        public CaseBuilder weightKg(double kg) {
            weight = Optional.of(Measurement.of(Analyte.WEIGHT, kg, "kg"));
            return this;
        }

        public CaseBuilder paraprotein(Paraprotein p) {
            paraprotein = p;
            return this;
        }

        public CaseBuilder leukemia(Leukemia l) {
            leukemia = l;
            return this;
        }

        public CaseBuilder lab(Analyte a, double value, String unit) {
            labs = labs.with(Measurement.of(a, value, unit));
            return this;
        }

        public Case build() {
            return new Case(new Patient("Invented patient, St. Alder Infirmary", sex, age, height, weight),
                    new Condition(paraprotein, leukemia, false, Cryoglobulin.UNKNOWN, Optional.empty()),
                    labs, Labs.NONE, Findings.NOT_ASSESSED, Plan.NOTHING, Optional.empty(), "", "{}");
        }
    }

    public static CaseBuilder aCase() {
        return new CaseBuilder();
    }

    /** The CASE-FORMAT example patient (invented): woman, 162 cm, 58 kg, IgM 5.9 g/dL, SV 5.6 cP, Hct 29 %. */
    public static Case formatExample() {
        return aCase().sex(Sex.FEMALE).age(71).heightCm(162).weightKg(58).paraprotein(Paraprotein.IGM)
                .lab(Analyte.SERUM_VISCOSITY, 5.6, "cP").lab(Analyte.IGM, 5.9, "g/dL")
                .lab(Analyte.HEMATOCRIT, 29, "%").lab(Analyte.WBC, 7.2, "10*9/L").build();
    }
}
