package org.linesweep.physics;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.linesweep.physics.Tolerances.relativeError;

import org.apache.commons.math3.complex.Complex;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * Conductor models against the classical results. Copper is IEC 60028 annealed copper: σ = 58.0 MS/m at
 * 20 °C, α20 = 0.003 93 /K (from memory of the standard; widely reproduced).
 */
class ConductorModelTest {

    private static final Conductor COPPER = Conductor.of(ConductorMaterial.COPPER, Conductor.REFERENCE_TEMPERATURE_KELVIN);

    /** δ = 1/sqrt(π f μ0 σ) for σ = 5.8e7 S/m: 8.5316 mm, 66.085 µm, 2.0898 µm (the good-conductor formula). */
    @ParameterizedTest
    @CsvSource({"60, 8.5316e-3", "1e6, 66.085e-6", "1e9, 2.0898e-6", "1e10, 0.66085e-6"})
    void skinDepthOfCopper(double frequencyHz, double expectedMetres) {
        assertTrue(relativeError(COPPER.skinDepthMetres(frequencyHz), expectedMetres) < Tolerances.FIVE_DIGITS);
    }

    /** Rs = 1/(σδ) = 8.2502 mΩ at 1 GHz for copper. */
    @Test
    void surfaceResistanceOfCopperAtOneGigahertz() {
        assertTrue(relativeError(COPPER.surfaceResistanceOhm(1e9), 8.2502e-3) < Tolerances.FIVE_DIGITS);
    }

    /** DC resistance of 1 mm² of copper: 0.017 241 Ω/m at 20 °C and 0.020 968 Ω/m at 75 °C (IEC 60028 law). */
    @Test
    void temperatureLawOfCopper() {
        Conductor hot = Conductor.of(ConductorMaterial.COPPER, 75 + PhysicalConstants.ZERO_CELSIUS_KELVIN);
        assertTrue(relativeError(1e-6 * COPPER.conductivitySiemensPerMetre(), 1 / 0.017241) < Tolerances.FIVE_DIGITS);
        assertTrue(relativeError(1 / (1e-6 * hot.conductivitySiemensPerMetre()), 0.020968) < Tolerances.FIVE_DIGITS);
    }

    /**
     * Round wire R/R_dc from the exact Bessel (Kelvin-function) impedance. Reference values computed
     * independently from the Kelvin functions (shared physics sheet §3.3): a/δ = 1 → 1.0205,
     * 2 → 1.2646, 5 → 2.7681, 10 → 5.2593, 100 → 50.251; the last also equals the asymptotic
     * a/(2δ) + 1/4 + O(δ/a) (Schelkunoff 1934).
     */
    @ParameterizedTest
    @CsvSource({"1, 1.0205", "2, 1.2646", "5, 2.7681", "10, 5.2593", "100, 50.251"})
    void roundWireResistanceRatio(double radiusOverDelta, double expected) {
        double ratio = InternalImpedance.roundWireRatio(radiusOverDelta).getReal();
        assertTrue(relativeError(ratio, expected) < Tolerances.FOUR_DIGITS / 5, "ratio " + ratio);
    }

    /** At low frequency the internal inductance is μ0/8π = 50 nH/m whatever the radius (classical). */
    @Test
    void internalInductanceAtLowFrequency() {
        double radius = 0.5e-3;
        double f = 1.0;
        Complex z = InternalImpedance.roundWire(COPPER, radius, f);
        double inductance = z.getImaginary() / (2 * Math.PI * f);
        assertEquals(PhysicalConstants.VACUUM_PERMEABILITY_HENRY_PER_METRE / (8 * Math.PI), inductance, 1e-12);
        assertTrue(relativeError(z.getReal(), 1 / (COPPER.conductivitySiemensPerMetre() * Math.PI * radius * radius))
                < 1e-6);
    }

    /** At high frequency Z → (1 + j)·Rs/(2πa) + R_dc/4 (Schelkunoff 1934, asymptotic form). */
    @Test
    void roundWireHighFrequencyLimit() {
        double radius = 1e-3;
        double f = 1e10;
        Complex z = InternalImpedance.roundWire(COPPER, radius, f);
        double surface = COPPER.surfaceResistanceOhm(f) / (2 * Math.PI * radius);
        double dc = 1 / (COPPER.conductivitySiemensPerMetre() * Math.PI * radius * radius);
        assertTrue(relativeError(z.getReal(), surface + dc / 4) < 1e-5);
        assertTrue(relativeError(z.getImaginary(), surface) < 1e-5);
    }

    /**
     * R_ac = 2 R_dc at a/δ = 3.450 76, i.e. 11.9078 times the frequency where δ = a; for a = 0.25 mm copper
     * 69.877 kHz and 832.08 kHz (shared physics sheet §3.3, computed from the Kelvin functions).
     */
    @Test
    void resistanceDoublingPointOfARoundWire() {
        CoaxLine coax = new CoaxLine(0.5e-3, 3e-3, 0.2e-3, COPPER, Dielectric.lossless(1));
        FrequencyLimits limits = LimitFinder.find(coax, 1, 0.01, Double.NaN);
        assertTrue(relativeError(limits.skinDepthEqualsRadiusHz(), 69.877e3) < Tolerances.FIVE_DIGITS);
        assertTrue(relativeError(limits.resistanceDoublesHz(), 832.08e3) < Tolerances.FIVE_DIGITS);
        assertTrue(relativeError(limits.resistanceDoublesHz() / limits.skinDepthEqualsRadiusHz(), 11.9078)
                < Tolerances.FIVE_DIGITS);
    }

    /** Tube: DC limit 1/(σπ(c² − b²)) and high-frequency limit (1 + j)Rs/(2πb)·(1 − δ/(2b)) (Schelkunoff 1934). */
    @Test
    void tubeLimits() {
        double b = 2e-3;
        double c = 2.3e-3;
        Complex dc = InternalImpedance.tube(COPPER, b, c, 0.01);
        assertTrue(relativeError(dc.getReal(), 1 / (COPPER.conductivitySiemensPerMetre() * Math.PI * (c * c - b * b)))
                < 1e-6);
        double f = 1e10;
        double delta = COPPER.skinDepthMetres(f);
        Complex high = InternalImpedance.tube(COPPER, b, c, f);
        double surface = COPPER.surfaceResistanceOhm(f) / (2 * Math.PI * b);
        assertTrue(relativeError(high.getReal(), surface * (1 - delta / (2 * b))) < 1e-5);
    }

    /** A thin tube approaches the flat-sheet result Z = (g/(2πbσ))·coth(g t) as t/b → 0 (physics sheet §3.2). */
    @Test
    void thinTubeApproachesTheFlatSheet() {
        double b = 10e-3;
        double t = 10e-6;
        double f = 1e8;
        Complex tube = InternalImpedance.tube(COPPER, b, b + t, f);
        // the sheet uses the mean radius so its DC value is exact
        Complex sheet = InternalImpedance.flatSurface(COPPER, t, f).divide(2 * Math.PI * (b + t / 2));
        // they differ by the curvature, of relative order t/b = 1e-3
        assertTrue(tube.subtract(sheet).abs() < 1e-3 * tube.abs());
        assertTrue(tube.subtract(sheet).abs() > 0);
    }

    /** Flat conductor: Z_s → 1/(σt) at DC and (1 + j)Rs when t ≫ δ (Ramo, Whinnery and Van Duzer, plane conductor). */
    @Test
    void flatSurfaceLimits() {
        double t = 35e-6;
        assertTrue(relativeError(InternalImpedance.flatSurface(COPPER, t, 1.0).getReal(),
                1 / (COPPER.conductivitySiemensPerMetre() * t)) < 1e-9);
        Complex high = InternalImpedance.flatSurface(COPPER, t, 1e11);
        assertTrue(relativeError(high.getReal(), COPPER.surfaceResistanceOhm(1e11)) < 1e-9);
        assertTrue(relativeError(high.getImaginary(), COPPER.surfaceResistanceOhm(1e11)) < 1e-9);
    }

    /** Hammerstad roughness factor: 1 + (2/π)·atan(1.4) = 1.6051 at Δ = δ; 1.197 for Δ = 1 µm at 1 GHz (HJ 1980). */
    @Test
    void hammerstadRoughnessFactor() {
        double delta = COPPER.skinDepthMetres(1e9);
        Conductor rough = new Conductor(5.8e7, 0.00393, 1, delta, Conductor.REFERENCE_TEMPERATURE_KELVIN);
        assertTrue(relativeError(rough.roughnessFactor(1e9), 1.6051) < Tolerances.FIVE_DIGITS);
        Conductor micron = new Conductor(5.8e7, 0.00393, 1, 1e-6, Conductor.REFERENCE_TEMPERATURE_KELVIN);
        assertTrue(relativeError(micron.roughnessFactor(1e9), 1.197) < Tolerances.FOUR_DIGITS * 2);
        assertTrue(relativeError(micron.roughnessFactor(10e9), 1.807) < Tolerances.FOUR_DIGITS * 2);
    }
}
