package org.stasissheet.apheresis;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.stasissheet.derived.BloodVolume;
import org.stasissheet.derived.ExchangeKinetics;
import org.stasissheet.flow.Poiseuille;
import org.stasissheet.intake.Sex;

/**
 * The argument contracts of the estimate formulas, at their edges: what each method's comment promises to
 * accept and to refuse. Refusing loudly matters here: a silently accepted zero weight would print a plan.
 */
class EstimateContractsTest {
    private static final double TOLERANCE = 1e-12;

    @ParameterizedTest(name = "hematocrit {0} is refused")
    @ValueSource(doubles = {0, 1, -0.1, 1.1, Double.NaN})
    @DisplayName("plasma from blood volume needs a hematocrit strictly between 0 and 1")
    void plasmaFromBloodVolume_refusesHematocritOutsideOpenInterval(double hematocrit) {
        assertThrows(IllegalArgumentException.class, () -> BloodVolume.plasmaFromBloodVolumeLitres(4.0, hematocrit));
    }

    @ParameterizedTest(name = "blood volume {0} is refused")
    @ValueSource(doubles = {0, -4, Double.NaN, Double.POSITIVE_INFINITY})
    void plasmaFromBloodVolume_refusesNonPositiveVolume(double litres) {
        assertThrows(IllegalArgumentException.class, () -> BloodVolume.plasmaFromBloodVolumeLitres(litres, 0.3));
    }

    @Test
    @DisplayName("Nadler refuses a zero or missing-looking height or weight, whichever sex")
    void nadler_refusesNonPositiveBodyMeasures() {
        for (Sex sex : Sex.values()) {
            assertThrows(IllegalArgumentException.class, () -> BloodVolume.nadlerLitres(sex, 0, 70));
            assertThrows(IllegalArgumentException.class, () -> BloodVolume.nadlerLitres(sex, 170, 0));
            assertThrows(IllegalArgumentException.class, () -> BloodVolume.nadlerLitres(sex, Double.NaN, 70));
        }
    }

    @Test
    @DisplayName("an exchange of zero plasma volumes leaves everything; the fraction bounds 0 and 1 are accepted")
    void exchangeKinetics_edges() {
        // e^0 = 1: nothing exchanged, nothing removed
        assertEquals(1, ExchangeKinetics.intravascularRemaining(0), TOLERANCE);
        // f = 0 (nothing intravascular): nothing removed whatever the exchange
        assertEquals(1, ExchangeKinetics.paraproteinRemaining(0, 1.5), TOLERANCE);
        // f = 1 (all intravascular): the one-compartment e^−V itself, e^−1 = 0.36787944117 (mathematical constant)
        assertEquals(0.36787944117144233, ExchangeKinetics.paraproteinRemaining(1, 1), TOLERANCE);
        assertThrows(IllegalArgumentException.class, () -> ExchangeKinetics.paraproteinRemaining(-0.01, 1));
        assertThrows(IllegalArgumentException.class, () -> ExchangeKinetics.intravascularRemaining(Double.NaN));
        assertThrows(IllegalArgumentException.class,
                () -> ExchangeKinetics.intravascularRemaining(Double.POSITIVE_INFINITY));
    }

    @Test
    @DisplayName("projected serum viscosity: r = 1 keeps the value, r = 0 gives the reference; r and SV are checked")
    void projectedSerumViscosity_edges() {
        // SV_ref × (SV/SV_ref)^1 = SV; SV_ref × (SV/SV_ref)^0 = SV_ref (the formula's own limits)
        assertEquals(5.6, ExchangeKinetics.projectedSerumViscosity(5.6, 1.6, 1), TOLERANCE);
        assertEquals(1.6, ExchangeKinetics.projectedSerumViscosity(5.6, 1.6, 0), TOLERANCE);
        // exactly at the reference there is no excess: the measured value is kept
        assertEquals(1.6, ExchangeKinetics.projectedSerumViscosity(1.6, 1.6, 0.3), TOLERANCE);
        assertThrows(IllegalArgumentException.class, () -> ExchangeKinetics.projectedSerumViscosity(5.6, 0, 0.5));
        assertThrows(IllegalArgumentException.class, () -> ExchangeKinetics.projectedSerumViscosity(5.6, 1.6, -0.1));
    }

    @Test
    @DisplayName("relative flow refuses a zero or non-finite viscosity on either side")
    void relativeFlow_refusesNonPositiveViscosity() {
        assertThrows(IllegalArgumentException.class, () -> Poiseuille.relativeFlow(0, 2));
        assertThrows(IllegalArgumentException.class, () -> Poiseuille.relativeFlow(2, 0));
        assertThrows(IllegalArgumentException.class, () -> Poiseuille.relativeFlow(Double.NaN, 2));
        assertThrows(IllegalArgumentException.class, () -> Poiseuille.relativeFlow(2, Double.POSITIVE_INFINITY));
        // Poiseuille: same pressure and geometry, flow ∝ 1/μ, so half the viscosity gives twice the flow
        assertEquals(2, Poiseuille.relativeFlow(2, 1), TOLERANCE);
    }
}
