package org.linesweep.design;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.linesweep.io.Presets;
import org.linesweep.physics.ConductorMaterial;
import org.linesweep.physics.DielectricMaterial;
import org.linesweep.physics.LineType;
import org.linesweep.physics.PhysicalConstants;

class SynthesisTest {

    private static final double ETA0 = PhysicalConstants.FREE_SPACE_IMPEDANCE_OHM;
    /** Agreement of a solved dimension with a closed-form inverse: the solver's accuracy and a margin. */
    private static final double INVERSE_AGREEMENT = 1e-9;

    private static Design ideal(Geometry geometry, double permittivity) {
        return new Design("ideal", "", geometry, ConductorSpec.of(ConductorMaterial.PERFECT),
                new DielectricSpec(null, permittivity, 0, 1e9, 0, 1, org.linesweep.physics.DielectricModelKind.CONSTANT,
                        1e3, 1e12), 1.0, 293.15, SweepSettings.DEFAULT, 0.01, Double.NaN);
    }

    private static Synthesis.Target z0(double ohms) {
        return new Synthesis.Target(Synthesis.Quantity.Z0_MAGNITUDE, ohms, 1e9);
    }

    /** Round trip: solve a width for 50 Ω, analyse that width, get 50 Ω back to the solver's tolerance. */
    @ParameterizedTest
    @CsvSource({"board-trace-50-ohm, width", "board-trace-50-ohm, height", "buried-clock-stripline, width",
        "bench-patch-lead, innerDiameter", "bench-patch-lead, outerDiameter", "sensor-harness-run, spacing",
        "test-fixture-wire-over-plane, height", "motor-drive-bus-bar, separation"})
    void solvedDimensionsAnalyseBackToTheTarget(String preset, String field) {
        Design design = Presets.load(preset);
        for (double target : new double[] {25, 50, 75}) {
            Synthesis.Solution s = Synthesis.solve(design, field, z0(target));
            double analysed = s.design().toModel().at(1e9).z0MagnitudeOhm();
            assertEquals(target, analysed, target * 1e-9, preset + " " + field + " for " + target + " Ω");
        }
    }

    /**
     * Coax: the exact lossless Z0 = (η0/2π)·ln(b/a)/sqrt(εr) inverts to a = b·exp(−2π·Z0·sqrt(εr)/η0)
     * (Pozar, table of common lines).
     */
    @Test
    void coaxMatchesTheClosedFormInverse() {
        Design d = ideal(Geometry.of(LineType.COAX, 1e-3, 3.5e-3, 0.2e-3), 2.1);
        Synthesis.Solution s = Synthesis.solve(d, "innerDiameter", z0(50));
        double expected = 3.5e-3 * Math.exp(-2 * Math.PI * 50 * Math.sqrt(2.1) / ETA0);
        assertEquals(expected, s.valueMetres(), expected * INVERSE_AGREEMENT);
        // and b/a = 3.3483 for 50 Ω in εr = 2.1 (shared physics sheet §3.5)
        assertEquals(3.3483, 3.5e-3 / s.valueMetres(), 1e-4);
    }

    /** Two-wire in air: Z0 = (η0/π)·acosh(D/d) inverts to D = d·cosh(π·Z0/η0) (exact for ideal geometry). */
    @Test
    void twoWireMatchesTheClosedFormInverse() {
        Design d = ideal(Geometry.of(LineType.TWO_WIRE, 2e-3, 10e-3), 1.0);
        Synthesis.Solution s = Synthesis.solve(d, "spacing", z0(300));
        double expected = 2e-3 * Math.cosh(Math.PI * 300 / ETA0);
        assertEquals(expected, s.valueMetres(), expected * INVERSE_AGREEMENT);
    }

    @Test
    void impossibleTargetsSaySo() {
        Design trace = Presets.load("board-trace-50-ohm");
        Synthesis.NoSolutionException e = assertThrows(Synthesis.NoSolutionException.class,
                () -> Synthesis.solve(trace, "width", z0(1000)));
        assertTrue(e.getMessage().contains("width"), e.getMessage());
        assertThrows(InvalidInputException.class, () -> Synthesis.solve(trace, "spacing", z0(50)));
    }

    @Test
    void allowedRangeRespectsTheOtherFields() {
        Geometry coax = Geometry.of(LineType.COAX, 1e-3, 3e-3, 0.2e-3);
        double[] inner = Synthesis.allowedRange(coax, "innerDiameter");
        assertTrue(inner[1] < 3e-3);
        double[] outer = Synthesis.allowedRange(coax, "outerDiameter");
        assertTrue(outer[0] > 1e-3);
        assertEquals(DielectricMaterial.PTFE.key(), "ptfe");
    }

    /**
     * Differential targets of 85, 90 and 100 Ω (common practice for high-speed serial pairs): solving the
     * gap or the width of a pair lands on the target, and the solved design analyses back to it.
     */
    @org.junit.jupiter.params.ParameterizedTest
    @org.junit.jupiter.params.provider.CsvSource({"board-trace-50-ohm, width, 85", "board-trace-50-ohm, width, 100",
        "board-trace-50-ohm, gap, 90", "buried-clock-stripline, gap, 85", "buried-clock-stripline, width, 100"})
    void differentialTargets(String preset, String field, double targetOhm) {
        Design single = Presets.load(preset);
        Design pair = single.withGeometryValue("gap", single.geometry().value("width"));
        if (field.equals("gap") && preset.startsWith("board")) {
            pair = pair.withGeometryValue("width", 0.3e-3); // narrower strips so that 90 Ω is reachable
        }
        Synthesis.Solution solution = Synthesis.solve(pair, field,
                new Synthesis.Target(Synthesis.Quantity.DIFFERENTIAL_IMPEDANCE, targetOhm, 1e9));
        double achieved = solution.design().toPair().modes(1e9).differentialImpedanceOhm();
        assertEquals(targetOhm, achieved, 1e-9 * targetOhm);
    }

    @Test
    void differentialTargetNeedsAPair() {
        Design single = Presets.load("board-trace-50-ohm");
        InvalidInputException error = org.junit.jupiter.api.Assertions.assertThrows(InvalidInputException.class,
                () -> Synthesis.solve(single, "width",
                        new Synthesis.Target(Synthesis.Quantity.DIFFERENTIAL_IMPEDANCE, 100, 1e9)));
        assertTrue(error.getMessage().contains("line.gap"), error.getMessage());
    }
}
