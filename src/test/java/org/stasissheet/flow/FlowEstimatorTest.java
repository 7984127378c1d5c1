package org.stasissheet.flow;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.stasissheet.apheresis.EstimateFixtures.aCase;

import java.util.List;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Nested;
import org.junit.jupiter.api.Test;
import org.stasissheet.apheresis.EstimateFixtures;
import org.stasissheet.intake.Case;
import org.stasissheet.intake.Leukemia;
import org.stasissheet.intake.Paraprotein;
import org.stasissheet.intake.Sex;
import org.stasissheet.measure.Analyte;
import org.stasissheet.rules.RuleSet;

@DisplayName("flow estimates of a case")
class FlowEstimatorTest {
    private final RuleSet rules = EstimateFixtures.rules();

    private FlowEstimates estimate(Case c) {
        return FlowEstimator.estimate(c, rules);
    }

    private static double at(List<FlowPoint> series, double diameter) {
        return series.stream().filter(p -> p.diameterUm() == diameter).findFirst().orElseThrow().relativeFlow();
    }

    @Test
    @DisplayName("the series holds the CASE-FORMAT diameters 5, 10, 20, 50, 100 µm, in order, 4 to 1000")
    void diameters() {
        List<Double> ds = estimate(EstimateFixtures.formatExample()).byDiameter().known().orElseThrow().stream()
                .map(FlowPoint::diameterUm).toList();
        assertEquals(FlowEstimator.DIAMETERS_UM, ds);
        assertTrue(ds.containsAll(List.of(5.0, 10.0, 20.0, 50.0, 100.0)));
        assertEquals(4.0, ds.get(0), 0);
        assertEquals(1000.0, ds.get(ds.size() - 1), 0);
    }

    @Test
    @DisplayName("reference blood (Hct 0.45, SV 1.6) flows exactly as the reference: 1 everywhere")
    void referenceIsOne() {
        Case c = aCase().lab(Analyte.HEMATOCRIT, 45, "%").lab(Analyte.SERUM_VISCOSITY, 1.6, "cP").build();
        FlowEstimates f = estimate(c);
        // expected: 1 by CASE-FORMAT's definition (reference ÷ itself)
        f.byDiameter().known().orElseThrow().forEach(p -> assertEquals(1.0, p.relativeFlow(), 1e-12));
        f.inVivo().known().orElseThrow().forEach(p -> assertEquals(1.0, p.relativeFlow(), 1e-12));
    }

    @Test
    @DisplayName("the CASE-FORMAT example at 10 µm: η_rel(10, 0.45) ÷ (3.5 × η_rel(10, 0.29))")
    void formatExampleAtTen() {
        FlowEstimates f = estimate(EstimateFixtures.formatExample());
        // plasma ratio 5.6 / 1.6 = 3.5 (CASE-FORMAT definition)
        assertEquals(3.5, f.plasmaRatio(), 1e-12);
        double expected = PriesViscosity.inVitroRelative(10, 0.45) / (3.5 * PriesViscosity.inVitroRelative(10, 0.29));
        // expected: the CASE-FORMAT formula with the Pries 1992 law (checked above against DOMAIN.md §5)
        assertEquals(expected, at(f.byDiameter().known().orElseThrow(), 10), 1e-12);
        // and a number worked by hand from the DOMAIN.md §5 formulas, so a slip in both would show:
        // C(10) = −1.06579; S = (0.71^C − 1)/(0.55^C − 1) = 0.44054/0.89117 = 0.49434;
        // η_rel(10, 0.29) = 1 + 0.32841 × 0.49434 = 1.16235; flow = 1.32841 / (3.5 × 1.16235) = 0.32653
        assertEquals(0.32653, at(f.byDiameter().known().orElseThrow(), 10), 1e-4);
    }

    @Test
    @DisplayName("no hematocrit: no estimate, a reason, no what-ifs; nothing is assumed")
    void noHematocrit() {
        FlowEstimates f = estimate(aCase().lab(Analyte.SERUM_VISCOSITY, 5, "cP").build());
        assertTrue(f.byDiameter().whyUnknown().orElseThrow().contains("hematocrit not measured"));
        assertFalse(f.inVivo().isKnown());
        assertFalse(f.leukocrit().isKnown());
        assertTrue(f.whatIf().isEmpty());
        assertEquals(FlowCaveats.ALL, f.caveats());
    }

    @Test
    @DisplayName("an impossible hematocrit is not used and the reason names the field and value")
    void impossibleHematocrit() {
        FlowEstimates f = estimate(aCase().lab(Analyte.HEMATOCRIT, 29, "1").build());
        assertTrue(f.byDiameter().whyUnknown().orElseThrow().contains("labs.hematocrit: 29"));
    }

    @Test
    @DisplayName("no serum viscosity: plasma ratio 1 and the basis says so")
    void noSerumViscosity() {
        FlowEstimates f = estimate(aCase().lab(Analyte.HEMATOCRIT, 0.30, "1").build());
        // expected: 1, CASE-FORMAT ("where the patient has no serum viscosity, the plasma ratio is 1")
        assertEquals(1.0, f.plasmaRatio(), 0);
        assertTrue(f.plasmaRatioBasis().contains("taken as 1"));
        // anaemic blood without a paraprotein flows better than reference at 100 µm
        assertTrue(at(f.byDiameter().known().orElseThrow(), 100) > 1);
    }

    @Test
    @DisplayName("every estimate carries the caveats")
    void caveats() {
        FlowEstimates f = estimate(EstimateFixtures.formatExample());
        assertEquals(FlowCaveats.ALL, f.caveats());
        assertTrue(FlowCaveats.ALL.stream().anyMatch(s -> s.contains("clump")));
        assertTrue(FlowCaveats.ALL.stream().anyMatch(s -> s.contains("plugging")));
        assertTrue(FlowCaveats.ALL.stream().anyMatch(s -> s.contains("Vessel tone")));
        assertTrue(FlowCaveats.ALL.stream().anyMatch(s -> s.contains("not a measurement")));
    }

    @Nested
    @DisplayName("leukocrit")
    class LeukocritEstimate {
        @Test
        @DisplayName("AML: a leukocrit range 200 × 240–730 fL × 10⁻⁶ = 0.048–0.146, drawn at the high end")
        void aml() {
            Case c = aCase().leukemia(Leukemia.AML).lab(Analyte.HEMATOCRIT, 0.25, "1")
                    .lab(Analyte.WBC, 200, "10*9/L").build();
            Leukocrit l = estimate(c).leukocrit().known().orElseThrow();
            assertEquals("AML blast", l.cellType());
            // by hand: 200 × 240 × 1e-6 = 0.048 and 200 × 730 × 1e-6 = 0.146 (Lichtman & Rowe 1982 definition;
            // 240–730 fL measured in monocytic AML blasts, DOMAIN.md §6)
            assertEquals(0.048, l.leukocritLow(), 1e-12);
            assertEquals(0.146, l.leukocritHigh(), 1e-12);
            // by hand: 0.25 + 0.146 = 0.396, the cautious end fed to the law
            assertEquals(0.396, l.combinedFraction(), 1e-12);
            // the high end (more cells by volume) never shows more flow than the low end
            for (int i = 0; i < l.byDiameter().size(); i++) {
                assertTrue(l.byDiameter().get(i).relativeFlow() <= l.byDiameterLowVolume().get(i).relativeFlow());
            }
        }

        @Test
        @DisplayName("volume ranges by type: ALL 82–250 fL, CLL 154–244 fL, APL as AML 240–730 fL")
        void lymphoid() {
            // expected: ALL blasts about 82 fL, monocytic AML blasts 240–730 fL (DOMAIN.md §6, one measured
            // series); B-CLL modal volumes 153.8–244.2 fL (Costello C et al., Br J Haematol 1980;45:209, abstract)
            FlowEstimator.CellVolume all = FlowEstimator.cellVolume(Leukemia.ALL, rules).known().orElseThrow();
            assertEquals(82, all.lowFl(), 0);
            assertEquals(250, all.highFl(), 0);
            FlowEstimator.CellVolume cll = FlowEstimator.cellVolume(Leukemia.CLL, rules).known().orElseThrow();
            assertEquals(153.8, cll.lowFl(), 0.5);
            assertEquals(244.2, cll.highFl(), 0.5);
            FlowEstimator.CellVolume apl = FlowEstimator.cellVolume(Leukemia.APL, rules).known().orElseThrow();
            assertEquals(240, apl.lowFl(), 0);
            assertEquals(730, apl.highFl(), 0);
        }

        @Test
        @DisplayName("a local rule set whose volume range runs backwards gives a reason, not a number")
        void backwardsRange() {
            java.util.Map<String, org.stasissheet.rules.Parameter> p = new java.util.LinkedHashMap<>(rules.parameters());
            String low = org.stasissheet.rules.EstimateParameters.VOLUME_LYMPHOBLAST_LOW;
            p.put(low, new org.stasissheet.rules.Parameter(low, new org.stasissheet.measure.Quantity(300, "fL"),
                    "invented local edit", org.stasissheet.rules.Basis.FROM_MEMORY, ""));
            RuleSet edited = new RuleSet(rules.provenance(), rules.description(), p, rules.rules());
            String why = FlowEstimator.cellVolume(Leukemia.ALL, edited).whyUnknown().orElseThrow();
            assertTrue(why.contains("300 fL") && why.contains("needs 0 < low ≤ high"), why);
        }

        @Test
        @DisplayName("CML: no leukocrit estimate, because our reference gives no cell volume")
        void cml() {
            Case c = aCase().leukemia(Leukemia.CML).lab(Analyte.HEMATOCRIT, 0.3, "1")
                    .lab(Analyte.WBC, 400, "10*9/L").build();
            assertTrue(estimate(c).leukocrit().whyUnknown().orElseThrow().contains("CML"));
        }

        @Test
        @DisplayName("a combined cell fraction ≥ 1 gives a reason, not an extrapolated number")
        void extremeFraction() {
            Case c = aCase().leukemia(Leukemia.AML).lab(Analyte.HEMATOCRIT, 0.5, "1")
                    .lab(Analyte.WBC, 1500, "10*9/L").build();
            assertTrue(estimate(c).leukocrit().whyUnknown().orElseThrow().contains("needs < 1"));
        }

        @Test
        @DisplayName("the leukocrit series is min(with, without) at every point: a higher candidate is cut down")
        void neverAboveEnforced() {
            List<FlowPoint> without = List.of(new FlowPoint(5, 0.8), new FlowPoint(10, 0.9), new FlowPoint(20, 1.0));
            List<FlowPoint> candidate = List.of(new FlowPoint(5, 0.7), new FlowPoint(10, 1.2), new FlowPoint(20, 1.0));
            List<FlowPoint> out = FlowEstimator.neverAbove(candidate, without);
            // expected: the point-wise minimum, by the rule that the leukocrit never lowers the risk
            assertEquals(0.7, out.get(0).relativeFlow(), 0);
            assertEquals(0.9, out.get(1).relativeFlow(), 0);
            assertEquals(1.0, out.get(2).relativeFlow(), 0);
        }

        @Test
        @DisplayName("with a real case the leukocrit series is never above the plain series")
        void neverAboveInCase() {
            Case c = aCase().leukemia(Leukemia.ALL).lab(Analyte.HEMATOCRIT, 0.22, "1")
                    .lab(Analyte.WBC, 600, "10*9/L").build();
            FlowEstimates f = estimate(c);
            List<FlowPoint> plain = f.byDiameter().known().orElseThrow();
            List<FlowPoint> with = f.leukocrit().known().orElseThrow().byDiameter();
            for (int i = 0; i < plain.size(); i++) {
                assertTrue(with.get(i).relativeFlow() <= plain.get(i).relativeFlow(), "at " + plain.get(i));
            }
        }
    }

    @Nested
    @DisplayName("what-ifs")
    class WhatIfs {
        private final Case leukemic = aCase().sex(Sex.MALE).heightCm(180).weightKg(80).leukemia(Leukemia.AML)
                .paraprotein(Paraprotein.NONE).lab(Analyte.HEMATOCRIT, 0.20, "1").lab(Analyte.WBC, 250, "10*9/L")
                .build();

        @Test
        @DisplayName("four scenarios in a fixed order without a leukemia (no leukapheresis), each with assumptions in words")
        void six() {
            List<WhatIf> w = estimate(EstimateFixtures.formatExample()).whatIf();
            assertEquals(List.of("transfusion-1-unit", "transfusion-2-units", "plasma-exchange-1-volumes",
                    "plasma-exchange-1.5-volumes"), w.stream().map(WhatIf::id).toList());
            w.forEach(x -> assertFalse(x.assumptions().isEmpty(), x.id()));
        }

        @Test
        @DisplayName("transfused hematocrit: 0.20 in 5 L plus one 0.3 L unit of 0.18 L red cells = 0.2226")
        void transfusedHematocrit() {
            // by hand: (0.20 × 5 + 0.18) / (5 + 0.3) = 1.18 / 5.3 = 0.222642 (volumes from memory)
            assertEquals(0.222642, FlowEstimator.transfusedHematocrit(0.20, 5, 1, 0.3, 0.18), 1e-6);
            // by hand: (1 + 0.36) / 5.6 = 0.242857
            assertEquals(0.242857, FlowEstimator.transfusedHematocrit(0.20, 5, 2, 0.3, 0.18), 1e-6);
        }

        @Test
        @DisplayName("transfusion lowers flow at every diameter, two units more than one")
        void transfusionLowersFlow() {
            FlowEstimates f = estimate(leukemic);
            List<FlowPoint> now = f.byDiameter().known().orElseThrow();
            List<FlowPoint> one = f.whatIf().get(0).byDiameter().known().orElseThrow();
            List<FlowPoint> two = f.whatIf().get(1).byDiameter().known().orElseThrow();
            for (int i = 0; i < now.size(); i++) {
                assertTrue(one.get(i).relativeFlow() < now.get(i).relativeFlow());
                assertTrue(two.get(i).relativeFlow() < one.get(i).relativeFlow());
            }
            assertTrue(f.whatIf().get(0).leukocrit().isKnown());
        }

        @Test
        @DisplayName("transfusion without a blood volume says why")
        void transfusionWithoutBloodVolume() {
            WhatIf w = estimate(EstimateFixtures.aCase().lab(Analyte.HEMATOCRIT, 0.3, "1").build()).whatIf().get(0);
            assertTrue(w.byDiameter().whyUnknown().orElseThrow().contains("blood volume"));
        }

        @Test
        @DisplayName("plasma exchange raises flow for the CASE-FORMAT example, 1.5 volumes more than 1.0")
        void exchangeRaisesFlow() {
            FlowEstimates f = estimate(EstimateFixtures.formatExample());
            double now = at(f.byDiameter().known().orElseThrow(), 10);
            double one = at(f.whatIf().get(2).byDiameter().known().orElseThrow(), 10);
            double oneAndHalf = at(f.whatIf().get(3).byDiameter().known().orElseThrow(), 10);
            assertTrue(now < one && one < oneAndHalf);
            // by hand: SV after redistribution at 1.0 volume = 3.0195 (see ApheresisPlannerTest); the series uses
            // that, the cautious value, so flow scales by 5.6 / 3.0195 = 1.8546
            assertEquals(1.8546, one / now, 1e-3);
            assertTrue(f.whatIf().get(2).assumptions().stream().anyMatch(s -> s.contains("right after the procedure")));
            assertTrue(f.whatIf().get(2).assumptions().stream().anyMatch(s -> s.contains("approximation")));
        }

        @Test
        @DisplayName("plasma exchange without a serum viscosity says why")
        void exchangeWithoutSv() {
            WhatIf w = estimate(leukemic).whatIf().get(2);
            assertTrue(w.byDiameter().whyUnknown().orElseThrow().contains("serum viscosity not measured"));
        }

        @Test
        @DisplayName("leukapheresis changes only the leukocrit series, and says so")
        void leukapheresisOnlyLeukocrit() {
            FlowEstimates f = estimate(leukemic);
            WhatIf thirty = f.whatIf().get(4);
            WhatIf fifty = f.whatIf().get(5);
            assertSame(f.byDiameter().known().orElseThrow(), thirty.byDiameter().known().orElseThrow());
            assertTrue(thirty.assumptions().stream().anyMatch(s -> s.contains("only the leukocrit series")));
            List<FlowPoint> before = f.leukocrit().known().orElseThrow().byDiameter();
            List<FlowPoint> after30 = thirty.leukocrit().known().orElseThrow();
            List<FlowPoint> after50 = fifty.leukocrit().known().orElseThrow();
            List<FlowPoint> plain = f.byDiameter().known().orElseThrow();
            for (int i = 0; i < before.size(); i++) {
                assertTrue(after30.get(i).relativeFlow() >= before.get(i).relativeFlow());
                assertTrue(after50.get(i).relativeFlow() >= after30.get(i).relativeFlow());
                assertTrue(after50.get(i).relativeFlow() <= plain.get(i).relativeFlow());
            }
        }
    }
}
