package org.stasissheet.flow;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

@DisplayName("Poiseuille's law")
class PoiseuilleTest {

    @Test
    @DisplayName("half the radius gives 16× the resistance (r⁴ in Poiseuille's law)")
    void radiusToTheFourth() {
        double wide = Poiseuille.resistance(1e-3, 1e-3, 10e-6);
        double narrow = Poiseuille.resistance(1e-3, 1e-3, 5e-6);
        // expected: 2⁴ = 16 from R = 8μL/(πr⁴), Poiseuille's law
        assertEquals(16.0, narrow / wide, 1e-12);
    }

    @Test
    @DisplayName("twice the length gives 2× the resistance; twice the viscosity too")
    void linearInLengthAndViscosity() {
        double base = Poiseuille.resistance(1e-3, 1e-3, 10e-6);
        // expected: R is linear in L and μ (Poiseuille's law)
        assertEquals(2.0, Poiseuille.resistance(1e-3, 2e-3, 10e-6) / base, 1e-12);
        assertEquals(2.0, Poiseuille.resistance(2e-3, 1e-3, 10e-6) / base, 1e-12);
    }

    @Test
    @DisplayName("worked example: water-like fluid, 1 m of 1 mm radius tube")
    void workedExample() {
        // by hand: R = 8 × 1e-3 Pa·s × 1 m / (π × (1e-3 m)⁴) = 8e-3 / (π × 1e-12) = 2.5465e9 Pa·s/m³
        assertEquals(2.5465e9, Poiseuille.resistance(1e-3, 1, 1e-3), 1e5);
        // Q = ΔP / R: 1000 Pa / 2.5465e9 = 3.927e-7 m³/s (by hand)
        assertEquals(3.927e-7, Poiseuille.flow(1000, 1e-3, 1, 1e-3), 1e-10);
    }

    @Test
    @DisplayName("relative flow at fixed pressure and geometry is μ_ref ÷ μ_patient")
    void relativeFlow() {
        // expected: the geometry terms cancel in Q_patient / Q_ref (Poiseuille's law)
        assertEquals(Poiseuille.flow(10, 3.5, 2, 3) / Poiseuille.flow(10, 1.0, 2, 3),
                Poiseuille.relativeFlow(1.0, 3.5), 1e-12);
    }

    @Test
    @DisplayName("non-positive geometry or viscosity is rejected with the value")
    void rejectsNonPositive() {
        assertThrows(IllegalArgumentException.class, () -> Poiseuille.resistance(0, 1, 1));
        assertThrows(IllegalArgumentException.class, () -> Poiseuille.resistance(1, -1, 1));
        assertThrows(IllegalArgumentException.class, () -> Poiseuille.resistance(1, 1, Double.NaN));
        assertThrows(IllegalArgumentException.class, () -> Poiseuille.flow(Double.NaN, 1, 1, 1));
    }
}
