package org.linesweep.physics;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.linesweep.physics.Tolerances.relativeError;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/** Characteristic impedance of each line type against its published closed form or table. */
class LineImpedanceTest {

    private static final Conductor PERFECT = Conductor.of(ConductorMaterial.PERFECT, 293.15);
    private static final double ETA0 = PhysicalConstants.FREE_SPACE_IMPEDANCE_OHM;

    /** η0 = μ0·c = 376.730 31 Ω (CODATA 2022 μ0, exact c). */
    @Test
    void freeSpaceImpedance() {
        assertTrue(relativeError(ETA0, 376.73031) < 1e-8);
    }

    /** Coax Z0 = (η0/2π)·sqrt(μr/εr)·ln(b/a) (Pozar, Microwave Engineering, table of common lines). */
    @ParameterizedTest
    @CsvSource({"1.0, 2.3023, 50.0", "2.1, 3.3483, 50.0", "2.25, 3.4934, 50.0", "1.0, 3.5911, 76.65"})
    void coaxImpedance(double permittivity, double radiusRatio, double expectedOhm) {
        CoaxLine coax = new CoaxLine(1e-3, radiusRatio * 1e-3, 0.1e-3, PERFECT, Dielectric.lossless(permittivity));
        double exact = ETA0 / (2 * Math.PI) * Math.log(radiusRatio) / Math.sqrt(permittivity);
        assertTrue(relativeError(coax.at(1e8).z0RealOhm(), exact) < Tolerances.EXACT);
        // 50 Ω geometries of the shared physics sheet §3.5, quoted to 5 digits
        assertTrue(relativeError(coax.at(1e8).z0RealOhm(), expectedOhm) < Tolerances.FOUR_DIGITS);
    }

    /** Two-wire Z0 = (η/π)·acosh(D/2a); wire over ground (η/2π)·acosh(h/a) by image theory. */
    @Test
    void openLineImpedances() {
        TwoWireLine twoWire = new TwoWireLine(2e-3, 25e-3, PERFECT, Dielectric.lossless(1));
        double acosh = Math.log(12.5 + Math.sqrt(12.5 * 12.5 - 1));
        assertTrue(relativeError(twoWire.at(1e6).z0RealOhm(), ETA0 / Math.PI * acosh) < Tolerances.EXACT);
        WireOverGroundLine overGround = new WireOverGroundLine(2e-3, 12.5e-3, PERFECT, Dielectric.lossless(2.25));
        assertTrue(relativeError(overGround.at(1e6).z0RealOhm(), ETA0 / (2 * Math.PI) * acosh / 1.5)
                < Tolerances.EXACT);
        assertTrue(relativeError(twoWire.proximityFactor(), 12.5 / Math.sqrt(12.5 * 12.5 - 1)) < Tolerances.EXACT);
        // proximity factor 1.809 at X = 1.2 (Wheeler 1942 via the incremental-inductance rule; sheet §4)
        assertTrue(relativeError(new TwoWireLine(1e-3, 1.2e-3, PERFECT, Dielectric.lossless(1)).proximityFactor(),
                1.809) < Tolerances.FOUR_DIGITS);
    }

    /** Parallel plate Z0 = η·d/w (Pozar, table of common lines). */
    @Test
    void parallelPlateImpedance() {
        ParallelPlateLine plates = new ParallelPlateLine(50e-3, 1e-3, 1e-3, PERFECT, Dielectric.lossless(4));
        assertTrue(relativeError(plates.at(1e6).z0RealOhm(), ETA0 / 2 * 1e-3 / 50e-3) < Tolerances.EXACT);
    }

    /**
     * Cohn's exact zero-thickness stripline, Z0 = (η/4)·K(k)/K(k′) (Cohn, IRE Trans. MTT-2, 1954); values
     * for εr = 1 and 2.5 from the shared physics sheet §7.1, computed from the same exact formula.
     */
    @ParameterizedTest
    @CsvSource({"0.25, 139.917, 88.491", "0.5, 100.432, 63.519", "1, 65.354, 41.333", "2, 38.579, 24.400"})
    void cohnStripline(double widthOverSpacing, double airOhm, double dielectricOhm) {
        double air = StriplineFormulas.cohnAirImpedance(widthOverSpacing, 1.0);
        assertTrue(relativeError(air, airOhm) < Tolerances.FIVE_DIGITS);
        assertTrue(relativeError(air / Math.sqrt(2.5), dielectricOhm) < Tolerances.FIVE_DIGITS);
    }

    /**
     * Wheeler (1978) against Cohn at t = 0: within 0.5 % (stated accuracy), −0.29 % at w/b = 1 (sheet §7.2); the
     * ratio form makes the line model continuous as t → 0.
     */
    @Test
    void striplineThicknessCorrectionIsContinuous() {
        double wheelerVsCohn = StriplineFormulas.wheelerAirImpedance(1, 1, 0) / StriplineFormulas.cohnAirImpedance(1, 1) - 1;
        assertEquals(-0.0029, wheelerVsCohn, 0.0001);
        double thin = StriplineFormulas.airImpedance(1e-3, 1e-3, 1e-12);
        assertTrue(relativeError(thin, StriplineFormulas.cohnAirImpedance(1e-3, 1e-3)) < 1e-6);
        // thickness lowers the impedance
        assertTrue(StriplineFormulas.airImpedance(1e-3, 1e-3, 0.05e-3) < StriplineFormulas.cohnAirImpedance(1e-3, 1e-3));
    }

    /**
     * Hammerstad-Jensen (1980), t = 0: Z0 and ε_eff for εr = 4.4 and 9.8 (shared physics sheet §8.1,
     * computed from the published formulas; e.g. u = 1, εr = 9.8 → 49.289 Ω, ε_eff = 6.579).
     */
    @ParameterizedTest
    @CsvSource({
        "0.1, 262.758, 153.947, 2.9132, 107.914, 5.9287",
        "0.5, 166.700, 95.453, 3.0499, 66.538, 6.2766",
        "1, 126.424, 71.031, 3.1678, 49.289, 6.5790",
        "2, 89.029, 48.686, 3.3439, 33.569, 7.0336",
        "5, 49.368, 25.888, 3.6366, 17.683, 7.7944",
        "10, 29.021, 14.764, 3.8639, 10.020, 8.3890"
    })
    void hammerstadJensenTable(double u, double air, double z44, double e44, double z98, double e98) {
        assertTrue(relativeError(MicrostripFormulas.airImpedanceZeroThickness(u), air) < Tolerances.FIVE_DIGITS);
        double[] fr4 = MicrostripFormulas.staticImpedanceAndPermittivity(u, 0, 4.4);
        double[] alumina = MicrostripFormulas.staticImpedanceAndPermittivity(u, 0, 9.8);
        assertTrue(relativeError(fr4[0], z44) < Tolerances.FIVE_DIGITS);
        assertTrue(relativeError(fr4[1], e44) < Tolerances.FIVE_DIGITS);
        assertTrue(relativeError(alumina[0], z98) < Tolerances.FIVE_DIGITS);
        assertTrue(relativeError(alumina[1], e98) < Tolerances.FIVE_DIGITS);
    }

    /**
     * Kirschning-Jansen dispersion: ε_eff(f) rises from the static value towards εr, and the microstrip model's
     * phase velocity follows it, v_p = c/sqrt(ε_eff(f)) (quasi-TEM mapping, low-loss).
     */
    @Test
    void microstripDispersion() {
        MicrostripLine line = new MicrostripLine(3e-3, 1.6e-3, 35e-6, PERFECT, Dielectric.lossless(4.4));
        double low = line.effectivePermittivity(1e6);
        double mid = line.effectivePermittivity(5e9);
        double high = line.effectivePermittivity(20e9);
        assertTrue(low < mid && mid < high && high < 4.4);
        double[] statics = line.staticImpedanceAndPermittivity(1e6);
        assertTrue(relativeError(low, statics[1]) < 1e-4);
        LinePoint point = line.at(5e9);
        assertTrue(relativeError(point.phaseVelocityMetresPerSecond(),
                PhysicalConstants.SPEED_OF_LIGHT_METRES_PER_SECOND / Math.sqrt(mid)) < Tolerances.EXACT);
        // group velocity below phase velocity on a normally dispersive line (sheet §8.2)
        assertTrue(point.groupVelocityMetresPerSecond() < point.phaseVelocityMetresPerSecond());
    }

    /**
     * The air-coax optima, found by optimising the model itself (Brent's method from Commons Math) at a fixed
     * outer radius: minimum conductor attenuation at b/a = 3.5911, Z0 = 76.65 Ω; maximum power at a fixed
     * breakdown field at b/a = sqrt(e) = 1.6487, Z0 = 29.98 Ω (classic textbook derivations; sheet §3.5).
     */
    @Test
    void airCoaxOptima() {
        Conductor copper = Conductor.of(ConductorMaterial.COPPER, Conductor.REFERENCE_TEMPERATURE_KELVIN);
        double outerRadius = 10e-3;
        double frequency = 100e9; // δ ≈ 0.2 µm ≪ a: the high-frequency regime the textbook result assumes
        var optimizer = new org.apache.commons.math3.optim.univariate.BrentOptimizer(1e-12, 1e-14);
        var attenuation = optimizer.optimize(new org.apache.commons.math3.optim.MaxEval(500),
                new org.apache.commons.math3.optim.univariate.UnivariateObjectiveFunction(ratio ->
                        new CoaxLine(2 * outerRadius / ratio, 2 * outerRadius, 1e-3, copper, Dielectric.lossless(1))
                                .at(frequency).alphaNepersPerMetre()),
                org.apache.commons.math3.optim.nonlinear.scalar.GoalType.MINIMIZE,
                new org.apache.commons.math3.optim.univariate.SearchInterval(1.5, 8));
        assertEquals(3.5911, attenuation.getPoint(), 0.002);
        double z0 = new CoaxLine(2 * outerRadius / attenuation.getPoint(), 2 * outerRadius, 1e-3, PERFECT,
                Dielectric.lossless(1)).at(frequency).z0RealOhm();
        assertEquals(76.65, z0, 0.05);
        // power at a fixed peak field E on the inner conductor: V = E·a·ln(b/a), P = V²/(2 Z0)
        var power = optimizer.optimize(new org.apache.commons.math3.optim.MaxEval(500),
                new org.apache.commons.math3.optim.univariate.UnivariateObjectiveFunction(ratio -> {
                    double a = outerRadius / ratio;
                    double volts = a * Math.log(ratio);
                    double impedance = new CoaxLine(2 * a, 2 * outerRadius, 1e-3, PERFECT, Dielectric.lossless(1))
                            .at(frequency).z0RealOhm();
                    return volts * volts / (2 * impedance);
                }),
                org.apache.commons.math3.optim.nonlinear.scalar.GoalType.MAXIMIZE,
                new org.apache.commons.math3.optim.univariate.SearchInterval(1.1, 4));
        assertEquals(Math.sqrt(Math.E), power.getPoint(), 1e-4);
        double z0Power = new CoaxLine(2 * outerRadius / power.getPoint(), 2 * outerRadius, 1e-3, PERFECT,
                Dielectric.lossless(1)).at(frequency).z0RealOhm();
        assertEquals(29.98, z0Power, 0.01);
    }
}
