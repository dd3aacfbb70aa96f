package org.linesweep.physics;

/**
 * The regions practitioners reason in, along the frequency axis, found by root finding on the model:
 * <ul>
 *   <li>below {@code rcCornerHz}, ωL' &lt; R': the line behaves as a distributed RC network (diffusive,
 *       v_p ∝ √f, |Z0| with a phase near −45°);</li>
 *   <li>above {@code lossCrossoverHz}, the dielectric's share of the attenuation, G'|Z0|/2, exceeds the
 *       conductor's, R'/(2|Z0|).</li>
 * </ul>
 * Either is NaN where the crossing does not occur between 1 Hz and 10 THz.
 *
 * @param rcCornerHz where ωL' = R'
 * @param lossCrossoverHz where G'|Z0|² = R'
 */
public record LossRegions(double rcCornerHz, double lossCrossoverHz) {

    /** Finds both crossings for a line. */
    public static LossRegions of(LineModel model) {
        LineParameters p = new LineParameters();
        double[] solution = new double[Telegrapher.SIZE];
        double corner = LimitFinder.rootOnLogFrequency(f -> {
            model.evaluate(f, p);
            return Math.log(2 * Math.PI * f * p.inductanceHenryPerMetre / p.resistanceOhmPerMetre);
        });
        double crossover = LimitFinder.rootOnLogFrequency(f -> {
            model.evaluate(f, p);
            Telegrapher.solve(p.resistanceOhmPerMetre, p.inductanceHenryPerMetre, p.conductanceSiemensPerMetre,
                    p.capacitanceFaradPerMetre, 2 * Math.PI * f, solution);
            double z0Squared = solution[Telegrapher.Z0_RE] * solution[Telegrapher.Z0_RE]
                    + solution[Telegrapher.Z0_IM] * solution[Telegrapher.Z0_IM];
            return Math.log(p.conductanceSiemensPerMetre * z0Squared / p.resistanceOhmPerMetre);
        });
        return new LossRegions(corner, crossover);
    }
}
