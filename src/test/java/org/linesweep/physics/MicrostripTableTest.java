package org.linesweep.physics;

import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.linesweep.sweep.FrequencyGrid;
import org.linesweep.sweep.GridScale;
import org.linesweep.sweep.SweepEngine;
import org.linesweep.sweep.SweepResult;

/**
 * A microstrip on a wideband (dispersive) laminate swept with its tabulated static values and permittivity against the same
 * line evaluated exactly point by point: R', L', G', C' and ε_eff within 3e-10 (the permittivity table's
 * accuracy, see {@code DielectricTableTest}), the group velocity (which uses the slopes) within 1e-9.
 */
class MicrostripTableTest {

    @Test
    void tabulatedSweepMatchesExactPoints() {
        Dielectric laminate = Dielectric.of(DielectricMaterial.EPOXY_GLASS);
        Conductor copper = new Conductor(5.8e7, 0.00393, 1, 1e-6, 293.15);
        MicrostripLine swept = new MicrostripLine(0.38e-3, 0.2e-3, 35e-6, copper, laminate);
        MicrostripLine exact = new MicrostripLine(0.38e-3, 0.2e-3, 35e-6, copper, laminate);
        double[] frequencies = new FrequencyGrid(1e3, 40e9, 3001, GridScale.LOG).frequencies();
        SweepResult sweep = new SweepEngine().run(swept, frequencies, 0.15);
        double worst = 0;
        double worstGroup = 0;
        for (int i = 0; i < frequencies.length; i++) {
            LinePoint p = exact.at(frequencies[i]);
            worst = Math.max(worst, Tolerances.relativeError(sweep.resistanceOhmPerMetre(i), p.resistanceOhmPerMetre()));
            worst = Math.max(worst, Tolerances.relativeError(sweep.inductanceHenryPerMetre(i), p.inductanceHenryPerMetre()));
            worst = Math.max(worst, Tolerances.relativeError(sweep.capacitanceFaradPerMetre(i), p.capacitanceFaradPerMetre()));
            worst = Math.max(worst, Tolerances.relativeError(sweep.conductanceSiemensPerMetre(i),
                    p.conductanceSiemensPerMetre()));
            worst = Math.max(worst, Tolerances.relativeError(sweep.effectivePermittivity(i), p.effectivePermittivity()));
            worstGroup = Math.max(worstGroup, Tolerances.relativeError(sweep.groupVelocityMetresPerSecond(i),
                    p.groupVelocityMetresPerSecond()));
        }
        assertTrue(worst < 3e-10, "parameters " + worst);
        assertTrue(worstGroup < 1e-9, "group velocity " + worstGroup);
    }
}
