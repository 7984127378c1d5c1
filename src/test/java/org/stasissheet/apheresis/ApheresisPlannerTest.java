package org.stasissheet.apheresis;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.stasissheet.apheresis.EstimateFixtures.aCase;

import java.util.List;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.stasissheet.intake.Case;
import org.stasissheet.intake.Leukemia;
import org.stasissheet.intake.Paraprotein;
import org.stasissheet.intake.Sex;
import org.stasissheet.measure.Analyte;
import org.stasissheet.rules.RuleSet;

@DisplayName("apheresis planning numbers")
class ApheresisPlannerTest {
    private final RuleSet rules = EstimateFixtures.rules();

    @Test
    @DisplayName("the CASE-FORMAT example: volumes, three exchange rows, IgM after each")
    void formatExample() {
        ApheresisPlan plan = ApheresisPlanner.plan(EstimateFixtures.formatExample(), rules);
        // by hand (Nadler 1962, female): 3.61591 L; Kaplan 1990: 0.065 × 58 × 0.71 = 2.6767 L
        assertEquals(3.61591, plan.bloodVolumeL().known().orElseThrow(), 1e-5);
        assertEquals(2.6767, plan.plasmaVolumeL().known().orElseThrow(), 1e-9);
        // by hand: 3.61591 × 0.71 = 2.567296 L
        assertEquals(2.567296, plan.plasmaVolumeFromBloodVolumeL().known().orElseThrow(), 1e-5);
        assertEquals(List.of(1.0, 1.5, 2.0), plan.exchanges().stream().map(ExchangeRow::plasmaVolumes).toList());

        ExchangeRow one = plan.exchanges().get(0);
        // by hand: 1.0 × 2.6767 L
        assertEquals(2.6767, one.volumeL().known().orElseThrow(), 1e-9);
        // e^−1 = 0.367879 (one-compartment model, DOMAIN.md §4)
        assertEquals(0.367879, one.intravascularRemaining(), 1e-6);
        // by hand, right after: IgM 59 g/L × e^−1 = 59 × 0.367879 = 21.7049 g/L
        assertEquals(21.7049, one.paraproteinGPerL().known().orElseThrow().immediate(), 1e-3);
        // by hand, after redistribution: 59 × (1 − 0.78 × 0.632121) = 59 × 0.506946 = 29.9098 g/L
        // (f = 0.78, Reverberi 2007 as quoted, DOMAIN.md §6)
        assertEquals(29.9098, one.paraproteinAfterGPerL().known().orElseThrow(), 1e-3);
        assertEquals(29.9098, one.paraproteinGPerL().known().orElseThrow().afterRedistribution(), 1e-3);
        // by hand: 1.6 × 3.5^0.367879 = 2.5367 cP right after; 1.6 × 3.5^0.506946 = 3.0195 cP after redistribution
        assertEquals(2.5367, one.serumViscosity().known().orElseThrow().immediate(), 1e-3);
        assertEquals(3.0195, one.serumViscosity().known().orElseThrow().afterRedistribution(), 1e-3);

        ExchangeRow oneAndHalf = plan.exchanges().get(1);
        // by hand: 1.5 × 2.6767 = 4.01505 L
        assertEquals(4.01505, oneAndHalf.volumeL().known().orElseThrow(), 1e-9);
        // larger exchanges leave less (monotone by e^−V)
        assertTrue(oneAndHalf.paraproteinAfterGPerL().known().orElseThrow()
                < one.paraproteinAfterGPerL().known().orElseThrow());
    }

    @Test
    @DisplayName("without weight: no plasma volume and no exchange volume, each with a reason naming weight")
    void missingWeight() {
        Case c = aCase().sex(Sex.MALE).heightCm(175).lab(Analyte.HEMATOCRIT, 0.4, "1").build();
        ApheresisPlan plan = ApheresisPlanner.plan(c, rules);
        assertTrue(plan.bloodVolumeL().whyUnknown().orElseThrow().contains("missing: weight"));
        assertTrue(plan.plasmaVolumeL().whyUnknown().orElseThrow().contains("weight"));
        assertFalse(plan.exchanges().get(0).volumeL().isKnown());
        // the kinetics do not need a volume: e^−1.5 = 0.223130
        assertEquals(0.223130, plan.exchanges().get(1).intravascularRemaining(), 1e-6);
    }

    @Test
    @DisplayName("without hematocrit: plasma volume says so; blood volume is still estimated")
    void missingHematocrit() {
        Case c = aCase().sex(Sex.MALE).heightCm(180).weightKg(80).build();
        ApheresisPlan plan = ApheresisPlanner.plan(c, rules);
        // by hand, Nadler male: 5.31906 L
        assertEquals(5.31906, plan.bloodVolumeL().known().orElseThrow(), 1e-5);
        assertTrue(plan.plasmaVolumeL().whyUnknown().orElseThrow().contains("hematocrit not measured"));
    }

    @Test
    @DisplayName("a child gets no adult formula estimate, with the reason")
    void child() {
        Case c = aCase().sex(Sex.FEMALE).age(9).heightCm(130).weightKg(28).lab(Analyte.HEMATOCRIT, 30, "%").build();
        ApheresisPlan plan = ApheresisPlanner.plan(c, rules);
        assertTrue(plan.bloodVolumeL().whyUnknown().orElseThrow().contains("under 18"));
        assertTrue(plan.plasmaVolumeL().whyUnknown().orElseThrow().contains("under 18"));
    }

    @Test
    @DisplayName("IgG3 uses IgG's intravascular fraction and the igg lab value")
    void igg3() {
        Case c = aCase().paraprotein(Paraprotein.IGG3).lab(Analyte.IGG, 40, "g/L").build();
        ApheresisPlan plan = ApheresisPlanner.plan(c, rules);
        // expected: IgG 0.45 (Reverberi 2007) stands in for IgG3
        assertEquals(0.45, plan.intravascularFraction().known().orElseThrow(), 0);
        // by hand: 40 × (1 − 0.45 × 0.632121) = 40 × 0.715546 = 28.6218 g/L
        assertEquals(28.6218, plan.exchanges().get(0).paraproteinAfterGPerL().known().orElseThrow(), 1e-3);
    }

    @Test
    @DisplayName("an isotype without its lab value: paraprotein after is absent with a reason naming the lab key")
    void isotypeWithoutValue() {
        Case c = aCase().paraprotein(Paraprotein.IGA).lab(Analyte.SERUM_VISCOSITY, 4, "cP").build();
        ExchangeRow row = ApheresisPlanner.plan(c, rules).exchanges().get(0);
        assertTrue(row.paraproteinAfterGPerL().whyUnknown().orElseThrow().contains("no IgA value"));
        // SV can still be projected from f and V alone (by hand): r = 1 − 0.42 × 0.632121 = 0.734509;
        // ln 2.5 × r = 0.916291 × 0.734509 = 0.673022; e^0.673022 = 1.960156; × 1.6 = 3.1362 cP
        assertEquals(3.1362, row.serumViscosity().known().orElseThrow().afterRedistribution(), 1e-3);
        // right after (by hand): 1.6 × 2.5^0.367879 = 2.2414 cP
        assertEquals(2.2414, row.serumViscosity().known().orElseThrow().immediate(), 1e-3);
    }

    @Test
    @DisplayName("no paraprotein: exchange projections absent with the reason")
    void noParaprotein() {
        ApheresisPlan plan = ApheresisPlanner.plan(aCase().lab(Analyte.SERUM_VISCOSITY, 3, "cP").build(), rules);
        assertTrue(plan.exchanges().get(0).serumViscosity().whyUnknown().orElseThrow()
                .contains("no paraprotein isotype"));
    }

    @Test
    @DisplayName("leukapheresis: 1.5–2 × TBV to process and WBC 20–50 % lower (common practice)")
    void leukapheresis() {
        Case c = aCase().sex(Sex.MALE).heightCm(180).weightKg(80).leukemia(Leukemia.AML)
                .lab(Analyte.WBC, 180, "10*9/L").build();
        LeukapheresisPlan plan = ApheresisPlanner.plan(c, rules).leukapheresis();
        // by hand: 1.5 × 5.31906 = 7.97859 L; 2.0 × 5.31906 = 10.63812 L
        assertEquals(7.97859, plan.processVolumeL().known().orElseThrow().low(), 1e-4);
        assertEquals(10.63812, plan.processVolumeL().known().orElseThrow().high(), 1e-4);
        // by hand: 180 × 0.5 = 90; 180 × 0.8 = 144 (×10⁹/L)
        assertEquals(90, plan.wbcAfter().known().orElseThrow().low(), 1e-9);
        assertEquals(144, plan.wbcAfter().known().orElseThrow().high(), 1e-9);
    }

    @Test
    @DisplayName("leukapheresis numbers are not offered without a leukemia")
    void leukapheresisWithoutLeukemia() {
        LeukapheresisPlan plan = ApheresisPlanner.plan(EstimateFixtures.formatExample(), rules).leukapheresis();
        assertTrue(plan.wbcAfter().whyUnknown().orElseThrow().contains("no leukemia"));
    }

    @Test
    @DisplayName("the test rule set carries every parameter the validator requires of a real rule set")
    void parametersComplete() {
        org.stasissheet.rules.RequiredParameters.ALL.forEach(required ->
                assertTrue(rules.parameters().containsKey(required.id()), required.id()));
    }
}
