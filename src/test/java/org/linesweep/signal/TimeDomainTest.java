package org.linesweep.signal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.apache.commons.math3.special.Erf;
import org.junit.jupiter.api.Test;
import org.linesweep.physics.CoaxLine;
import org.linesweep.physics.Conductor;
import org.linesweep.physics.ConductorMaterial;
import org.linesweep.physics.Dielectric;
import org.linesweep.physics.DielectricModelKind;
import org.linesweep.physics.LineModel;
import org.linesweep.physics.PhysicalConstants;

/** Time-domain responses against closed forms of transmission-line transients. */
class TimeDomainTest {

    private static final Conductor PERFECT = Conductor.of(ConductorMaterial.PERFECT, 293.15);
    private static final double ETA0 = PhysicalConstants.FREE_SPACE_IMPEDANCE_OHM;
    private static final double C0 = PhysicalConstants.SPEED_OF_LIGHT_METRES_PER_SECOND;

    /** A lossless coax in εr = 2.1 with diameter ratio 3.3483: Z0 = (η0/2π)·ln(3.3483)/sqrt(2.1) ≈ 50 Ω. */
    private static final LineModel LOSSLESS = new CoaxLine(1e-3, 3.3483e-3, 0.2e-3, PERFECT, Dielectric.lossless(2.1));
    private static final double LOSSLESS_Z0 = ETA0 / (2 * Math.PI) * Math.log(3.3483) / Math.sqrt(2.1);

    private static double delayOf(double lengthMetres, double permittivity) {
        return lengthMetres * Math.sqrt(permittivity) / C0;
    }

    private static double gaussianEdge(double t, double rise) {
        double sigma = rise / Stimulus.RISE_PER_SIGMA;
        return 0.5 * Erf.erfc(-t / (sigma * Math.sqrt(2)));
    }

    /**
     * A lossless line matched at both ends is a pure delay L/v_p with v_p = c/sqrt(εr) and halves the source
     * (textbook transmission-line theory, e.g. Pozar, Microwave Engineering, §2.1 and §2.3).
     */
    @Test
    void matchedLosslessLineIsAPureDelay() {
        double length = 2.0;
        double rise = 200e-12;
        Terminations matched = new Terminations(LOSSLESS_Z0, LOSSLESS_Z0, 0.0);
        Waveform waveform = TimeDomain.simulate(LOSSLESS, length, Stimulus.step(rise), matched, 40e-9);
        double delay = delayOf(length, 2.1);
        assertEquals(delay, waveform.delaySeconds(), 1e-4 * delay);
        assertEquals(0.5, waveform.settledVolts(), 1e-9);
        assertEquals(rise, waveform.outputRiseSeconds(), 1e-3 * rise);
        assertEquals(0.0, waveform.overshootPercent(), 1e-4);
        double edgeCentre = TimeDomain.EDGE_CENTRE_PER_RISE * rise;
        double worst = 0;
        for (int i = 0; i < waveform.size(); i++) {
            double t = waveform.timeSeconds()[i];
            worst = Math.max(worst, Math.abs(waveform.outputVolts()[i] - 0.5 * gaussianEdge(t - edgeCentre - delay, rise)));
            worst = Math.max(worst, Math.abs(waveform.inputVolts()[i] - 0.5 * gaussianEdge(t - edgeCentre, rise)));
        }
        assertTrue(worst < 1e-4, "largest departure from the delayed edge " + worst);
        assertTrue(waveform.warnings().isEmpty(), waveform.warnings().toString());
    }

    /**
     * Mismatched ends, lossless: the plateaus of the bounce (lattice) diagram. With Γs = (Rs − Z0)/(Rs + Z0),
     * ΓL = (RL − Z0)/(RL + Z0) and V1 = Z0/(Z0 + Rs), the far end after the n-th arrival (time (2n+1)τ) holds
     * V1·(1 + ΓL)·Σ_{k<=n} (ΓsΓL)^k and the near end after time 2nτ holds
     * V1·[1 + (1 + Γs)·ΓL·Σ_{k<n} (ΓsΓL)^k] (e.g. Bakoglu, Circuits, Interconnections and Packaging for VLSI,
     * 1990, the chapter on transmission-line effects, from memory; any lattice-diagram text).
     */
    @Test
    void mismatchedLosslessLineFollowsTheBounceDiagram() {
        double length = 1.0;
        double rise = 100e-12;
        double sourceOhm = 10.0;
        double loadOhm = 200.0;
        Terminations terminations = new Terminations(sourceOhm, loadOhm, 0.0);
        double tau = delayOf(length, 2.1);
        Waveform waveform = TimeDomain.simulate(LOSSLESS, length, Stimulus.step(rise), terminations, 12 * tau);
        double sourceReflection = (sourceOhm - LOSSLESS_Z0) / (sourceOhm + LOSSLESS_Z0);
        double loadReflection = (loadOhm - LOSSLESS_Z0) / (loadOhm + LOSSLESS_Z0);
        double launched = LOSSLESS_Z0 / (LOSSLESS_Z0 + sourceOhm);
        double edgeCentre = TimeDomain.EDGE_CENTRE_PER_RISE * rise;
        double farSum = 0;
        for (int n = 0; n < 5; n++) {
            farSum += Math.pow(sourceReflection * loadReflection, n);
            double expectedFar = launched * (1 + loadReflection) * farSum;
            // middle of the plateau that follows the n-th arrival at the load
            double t = edgeCentre + (2 * n + 2) * tau;
            assertEquals(expectedFar, sample(waveform.outputVolts(), waveform, t), 1e-5, "far end after arrival " + n);
            double nearSum = 0;
            for (int k = 0; k < n; k++) {
                nearSum += Math.pow(sourceReflection * loadReflection, k);
            }
            double expectedNear = launched * (1 + (1 + sourceReflection) * loadReflection * nearSum);
            double tNear = edgeCentre + (2 * n + 1) * tau;
            assertEquals(expectedNear, sample(waveform.inputVolts(), waveform, tNear), 1e-5, "near end, round trip " + n);
        }
        // DC division: RL/(Rs + RL)
        assertEquals(loadOhm / (sourceOhm + loadOhm), waveform.settledVolts(), 1e-9);
    }

    /**
     * Skin-effect-limited line: with the series impedance's internal part ∝ sqrt(jω) and the line matched to its
     * lossless Z0, the far-end step response is erfc(K/(2·sqrt(t − τ))), K = L·R_s'/(2 Z0·sqrt(ω)) in
     * sqrt(s) (R. L. Wigington and N. S. Nahman, "Transient analysis of coaxial cables considering skin effect",
     * Proc. IRE 45(2), 1957, pp. 166-174). Here a 30 m air-dielectric copper coax, where the response's
     * frequencies (about 300 MHz) put both conductors over a hundred skin depths thick, so the exact Bessel
     * impedance the model uses is within a percent of the sqrt(jω) asymptote. Measured agreement: 0.25 % or better from 25 % to 44 %.
     */
    @Test
    void skinEffectStepFollowsWigingtonNahman() {
        double inner = 1.8e-3;
        double outer = 6.6e-3;
        double length = 30.0;
        Conductor copper = new Conductor(5.8e7, 0.0, 1.0, 0.0, 293.15);
        CoaxLine coax = new CoaxLine(inner, outer, 0.5e-3, copper, Dielectric.lossless(1.0));
        double z0 = ETA0 / (2 * Math.PI) * Math.log(outer / inner);
        // R' = (Rs/2π)(1/a + 1/b) with Rs = sqrt(ωμ0/2σ): internal impedance (1+j)·R' = c·sqrt(jω)
        double perRootOmega = Math.sqrt(PhysicalConstants.VACUUM_PERMEABILITY_HENRY_PER_METRE / (2 * 5.8e7)) / (2 * Math.PI)
                * (2 / inner + 2 / outer) * Math.sqrt(2);
        double k = length * perRootOmega / (2 * z0);
        double tau = length / C0;
        double rise = 10e-12;
        Waveform waveform = TimeDomain.simulate(coax, length, Stimulus.step(rise),
                new Terminations(z0, z0, 0.0), tau + 4e-9);
        double edgeCentre = TimeDomain.EDGE_CENTRE_PER_RISE * rise;
        // Compare from 25 % to 40 % of the source (the response's body), where the erfc form is steep
        for (double fraction : new double[] {0.25, 0.3, 0.35, 0.4, 0.42, 0.44}) {
            // erfc(x) = 2·fraction → t − τ = (K/2x)²
            double x = Erf.erfcInv(2 * fraction);
            double time = edgeCentre + tau + Math.pow(k / (2 * x), 2);
            double volts = sample(waveform.outputVolts(), waveform, time);
            assertEquals(fraction, volts, 0.005 * fraction, "at " + fraction + " of the source");
        }
    }

    /** The constant loss tangent is flagged as not causal; the wideband Debye model is not. */
    @Test
    void causalityWarnings() {
        Dielectric constant = new Dielectric(4.2, 0.02, 1e9, 0, 1, DielectricModelKind.CONSTANT, 1e3, 1e12);
        Dielectric debye = new Dielectric(4.2, 0.02, 1e9, 0, 1, DielectricModelKind.WIDEBAND_DEBYE, 1e3, 1e12);
        Conductor copper = Conductor.of(ConductorMaterial.COPPER, 293.15);
        assertEquals(1, TimeDomain.causalityWarnings(new CoaxLine(1e-3, 3e-3, 0.2e-3, copper, constant)).size());
        assertTrue(TimeDomain.causalityWarnings(new CoaxLine(1e-3, 3e-3, 0.2e-3, copper, debye)).isEmpty());
    }

    /**
     * With the causal dielectric (Djordjevic-Sarkar) nothing arrives before the fastest front, L·sqrt(ε∞)/c;
     * with a constant loss tangent, which violates Kramers-Kronig, a percent-level precursor does.
     */
    @Test
    void causalModelGivesNoPrecursor() {
        Dielectric debye = new Dielectric(4.2, 0.02, 1e9, 0, 1, DielectricModelKind.WIDEBAND_DEBYE, 1e3, 1e12);
        Conductor copper = Conductor.of(ConductorMaterial.COPPER, 293.15);
        CoaxLine coax = new CoaxLine(0.5e-3, 3e-3, 0.2e-3, copper, debye);
        double rise = 50e-12;
        double length = 0.5;
        Waveform waveform = TimeDomain.simulate(coax, length, Stimulus.step(rise), new Terminations(50, 50, 0), 10e-9);
        double z0 = coax.at(1e9).z0MagnitudeOhm();
        // the fastest front travels at c/sqrt(ε at infinite frequency), which exceeds the 1 GHz value's speed
        double earliest = length * Math.sqrt(coax.dielectric().evaluator().real(1e13)) / C0;
        double edge = TimeDomain.EDGE_CENTRE_PER_RISE * rise;
        double before = sample(waveform.outputVolts(), waveform, edge + earliest - 4 * rise);
        // what is left is the record's finite length (a few microvolts), far below a non-causal model's precursor
        assertTrue(Math.abs(before) < 2e-5, "precursor " + before + " V (Z0 " + z0 + ")");
        Dielectric constant = new Dielectric(4.2, 0.02, 1e9, 0, 1, DielectricModelKind.CONSTANT, 1e3, 1e12);
        Waveform nonCausal = TimeDomain.simulate(new CoaxLine(0.5e-3, 3e-3, 0.2e-3, copper, constant), length,
                Stimulus.step(rise), new Terminations(50, 50, 0), 10e-9);
        double earliestConstant = length * Math.sqrt(4.2) / C0;
        double precursor = sample(nonCausal.outputVolts(), nonCausal, edge + earliestConstant - 4 * rise);
        assertTrue(precursor > 1e-3, "the constant loss tangent's precursor " + precursor);
    }

    private static double sample(double[] values, Waveform waveform, double time) {
        double step = waveform.timeSeconds()[1] - waveform.timeSeconds()[0];
        double index = time / step;
        int lower = (int) Math.floor(index);
        double fraction = index - lower;
        return values[lower] + fraction * (values[lower + 1] - values[lower]);
    }
}
