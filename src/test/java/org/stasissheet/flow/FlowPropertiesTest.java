package org.stasissheet.flow;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.stasissheet.apheresis.ApheresisPlan;
import org.stasissheet.apheresis.EstimateFixtures;
import org.stasissheet.derived.ExchangeKinetics;
import org.stasissheet.apheresis.ExchangeRow;
import org.stasissheet.intake.Case;
import org.stasissheet.intake.Leukemia;
import org.stasissheet.intake.Paraprotein;
import org.stasissheet.intake.Sex;
import org.stasissheet.measure.Analyte;
import org.stasissheet.measure.Estimate;
import org.stasissheet.rules.RuleSet;
import org.stasissheet.worksheet.Assessor;
import org.stasissheet.worksheet.Worksheet;

/** Seeded random properties: fixed seeds, so a failure repeats exactly. */
@DisplayName("flow and exchange properties over random plausible inputs")
class FlowPropertiesTest {
    private static final int DRAWS = 300;
    private final RuleSet rules = EstimateFixtures.rules();

    @ParameterizedTest(name = "seed {0}")
    @DisplayName("flow falls as serum viscosity rises, at every series diameter")
    @ValueSource(longs = {1, 7, 42, 2026, 987654321})
    void flowFallsWithViscosity(long seed) {
        SplittableRandom random = new SplittableRandom(seed);
        for (int i = 0; i < DRAWS; i++) {
            double h = random.nextDouble(0.05, 0.8);
            double ratio = random.nextDouble(0.3, 18);
            double higher = ratio * random.nextDouble(1.001, 3);
            List<FlowPoint> a = FlowEstimator.inVitroSeries(h, ratio, 0.45);
            List<FlowPoint> b = FlowEstimator.inVitroSeries(h, higher, 0.45);
            for (int k = 0; k < a.size(); k++) {
                assertTrue(b.get(k).relativeFlow() < a.get(k).relativeFlow(),
                        "seed " + seed + ": H " + h + ", ratio " + ratio + " → " + higher + " at " + a.get(k));
            }
        }
    }

    @ParameterizedTest(name = "seed {0}")
    @DisplayName("flow falls as hematocrit rises, at every diameter ≥ 10 µm (in vitro and in vivo)")
    @ValueSource(longs = {1, 7, 42, 2026, 987654321})
    void flowFallsWithHematocrit(long seed) {
        SplittableRandom random = new SplittableRandom(seed);
        for (int i = 0; i < DRAWS; i++) {
            double h = random.nextDouble(0.05, 0.8);
            double higher = Math.min(0.95, h + random.nextDouble(0.005, 0.2));
            double ratio = random.nextDouble(0.3, 18);
            assertFallsAtTenAndAbove(FlowEstimator.inVitroSeries(h, ratio, 0.45),
                    FlowEstimator.inVitroSeries(higher, ratio, 0.45), seed);
            assertFallsAtTenAndAbove(FlowEstimator.inVivoSeries(h, ratio, 0.45),
                    FlowEstimator.inVivoSeries(higher, ratio, 0.45), seed);
        }
    }

    private static void assertFallsAtTenAndAbove(List<FlowPoint> lower, List<FlowPoint> higher, long seed) {
        for (int k = 0; k < lower.size(); k++) {
            if (lower.get(k).diameterUm() >= 10) {
                assertTrue(higher.get(k).relativeFlow() < lower.get(k).relativeFlow(),
                        "seed " + seed + " at " + lower.get(k) + " vs " + higher.get(k));
            }
        }
    }

    @ParameterizedTest(name = "seed {0}")
    @DisplayName("an exchange never raises a paraprotein or a serum viscosity")
    @ValueSource(longs = {1, 7, 42, 2026, 987654321})
    void exchangeNeverRaises(long seed) {
        SplittableRandom random = new SplittableRandom(seed);
        for (int i = 0; i < DRAWS; i++) {
            double f = random.nextDouble(0, 1);
            double v = random.nextDouble(0, 4);
            double r = ExchangeKinetics.paraproteinRemaining(f, v);
            assertTrue(r > 0 && r <= 1, "r " + r);
            double sv = random.nextDouble(0.5, 30);
            double after = ExchangeKinetics.projectedSerumViscosity(sv, 1.6, r);
            assertTrue(after <= sv, "SV " + sv + " → " + after);
        }
        for (int i = 0; i < DRAWS / 3; i++) {
            Case c = randomCase(random);
            ApheresisPlan plan = Assessor.assess(c, rules).apheresis();
            for (ExchangeRow row : plan.exchanges()) {
                row.paraproteinAfterGPerL().known().ifPresent(after ->
                        assertTrue(after <= plan.paraproteinGPerL().known().orElseThrow(), "seed " + seed));
            }
        }
    }

    @ParameterizedTest(name = "seed {0}")
    @DisplayName("every estimate is finite and positive for every plausible case; leukocrit never above plain")
    @ValueSource(longs = {1, 7, 42, 2026, 987654321})
    void finiteForPlausibleCases(long seed) {
        SplittableRandom random = new SplittableRandom(seed);
        for (int i = 0; i < DRAWS; i++) {
            Case c = randomCase(random);
            Worksheet w = Assessor.assess(c, rules);
            FlowEstimates f = w.flow();
            List<Double> numbers = new ArrayList<>();
            f.byDiameter().known().ifPresent(s -> s.forEach(p -> numbers.add(p.relativeFlow())));
            f.inVivo().known().ifPresent(s -> s.forEach(p -> numbers.add(p.relativeFlow())));
            f.leukocrit().known().ifPresent(l -> {
                numbers.add(l.leukocritLow());
                numbers.add(l.leukocritHigh());
                List<FlowPoint> plain = f.byDiameter().known().orElseThrow();
                for (int k = 0; k < plain.size(); k++) {
                    assertTrue(l.byDiameter().get(k).relativeFlow() <= plain.get(k).relativeFlow());
                }
            });
            for (WhatIf x : f.whatIf()) {
                x.byDiameter().known().ifPresent(s -> s.forEach(p -> numbers.add(p.relativeFlow())));
                x.leukocrit().known().ifPresent(s -> s.forEach(p -> numbers.add(p.relativeFlow())));
            }
            ApheresisPlan a = w.apheresis();
            addKnown(numbers, a.bloodVolumeL());
            addKnown(numbers, a.plasmaVolumeL());
            addKnown(numbers, a.plasmaVolumeFromBloodVolumeL());
            for (ExchangeRow row : a.exchanges()) {
                addKnown(numbers, row.volumeL());
                addKnown(numbers, row.paraproteinAfterGPerL());
                row.serumViscosity().known().ifPresent(p -> {
                    numbers.add(p.immediate());
                    numbers.add(p.afterRedistribution());
                });
            }
            for (double n : numbers) {
                assertTrue(Double.isFinite(n) && n >= 0, "seed " + seed + ": " + n + " in " + c);
            }
        }
    }

    private static void addKnown(List<Double> numbers, Estimate<Double> e) {
        e.known().ifPresent(numbers::add);
    }

    /** A random case inside the analyte catalogue's plausible ranges, any field possibly absent. */
    private static Case randomCase(SplittableRandom random) {
        EstimateFixtures.CaseBuilder b = EstimateFixtures.aCase().age(random.nextInt(18, 100));
        if (random.nextInt(5) > 0) {
            b.sex(random.nextBoolean() ? Sex.MALE : Sex.FEMALE);
        }
        if (random.nextInt(5) > 0) {
            b.heightCm(random.nextDouble(Analyte.HEIGHT.plausibleMin(), Analyte.HEIGHT.plausibleMax()));
        }
        if (random.nextInt(5) > 0) {
            b.weightKg(random.nextDouble(Analyte.WEIGHT.plausibleMin(), Analyte.WEIGHT.plausibleMax()));
        }
        Paraprotein[] isotypes = Paraprotein.values();
        b.paraprotein(isotypes[random.nextInt(isotypes.length)]);
        Leukemia[] leukemias = Leukemia.values();
        b.leukemia(leukemias[random.nextInt(leukemias.length)]);
        for (Analyte a : List.of(Analyte.HEMATOCRIT, Analyte.SERUM_VISCOSITY, Analyte.WBC, Analyte.IGM,
                Analyte.IGG, Analyte.IGA)) {
            if (random.nextInt(4) > 0) {
                b.lab(a, random.nextDouble(a.plausibleMin(), a.plausibleMax()), a.canonicalUnit());
            }
        }
        return b.build();
    }
}
