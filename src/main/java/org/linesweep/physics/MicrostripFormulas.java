package org.linesweep.physics;

/**
 * Closed forms for microstrip (width w, substrate height h, strip thickness t), quasi-TEM.
 *
 * <p>Static impedance and effective permittivity: E. Hammerstad and Ø. Jensen, "Accurate models for
 * microstrip computer-aided design", IEEE MTT-S International Microwave Symposium Digest, 1980,
 * pp. 407-409, including their thickness correction (widths in units of h, t_n = t/h). Stated accuracy:
 * Z0 of the air line better than 0.03 % for u ≤ 1000; ε_eff better than 0.2 % for εr ≤ 128 and
 * 0.01 ≤ u ≤ 100.
 *
 * <p>Dispersion: M. Kirschning and R. H. Jansen, "Accurate model for effective dielectric constant of
 * microstrip with validity up to millimetre-wave frequencies", Electronics Letters 18(6), 1982,
 * pp. 272-273; stated validity 0.1 ≤ u ≤ 100, εr ≤ 20, h/λ0 ≤ 0.13, accuracy 0.6 %. We feed it u = w/h
 * and the thickness-corrected static ε_eff.
 */
public final class MicrostripFormulas {

    private static final double ETA0 = PhysicalConstants.FREE_SPACE_IMPEDANCE_OHM;

    private MicrostripFormulas() {
    }

    /** Hammerstad-Jensen Z01(u): air-filled, zero-thickness impedance, Ω. */
    public static double airImpedanceZeroThickness(double u) {
        double f = 6.0 + (2.0 * Math.PI - 6.0) * Math.exp(-Math.pow(30.666 / u, 0.7528));
        return ETA0 / (2.0 * Math.PI) * Math.log(f / u + Math.sqrt(1.0 + 4.0 / (u * u)));
    }

    /** Hammerstad-Jensen zero-thickness effective permittivity ε_e(u, εr). */
    public static double effectivePermittivityZeroThickness(double u, double relativePermittivity) {
        double u4 = u * u * u * u;
        double a = 1.0 + Math.log((u4 + (u / 52.0) * (u / 52.0)) / (u4 + 0.432)) / 49.0
                + Math.log(1.0 + Math.pow(u / 18.1, 3)) / 18.7;
        double b = 0.564 * Math.pow((relativePermittivity - 0.9) / (relativePermittivity + 3.0), 0.053);
        return (relativePermittivity + 1.0) / 2.0
                + (relativePermittivity - 1.0) / 2.0 * Math.pow(1.0 + 10.0 / u, -a * b);
    }

    /** Hammerstad-Jensen width increment of the air line for normalised thickness t_n = t/h. */
    static double airWidthIncrement(double u, double normalisedThickness) {
        if (normalisedThickness <= 0) {
            return 0.0;
        }
        double coth = 1.0 / Math.tanh(Math.sqrt(6.517 * u));
        return normalisedThickness / Math.PI
                * Math.log(1.0 + 4.0 * Math.E / (normalisedThickness * coth * coth));
    }

    /**
     * Air-filled impedance with thickness, Z01(u + Δu1), Ω: the quantity Wheeler's incremental-inductance
     * rule differentiates for the conductor loss.
     */
    public static double airImpedance(double widthMetres, double heightMetres, double thicknessMetres) {
        double u = widthMetres / heightMetres;
        return airImpedanceZeroThickness(u + airWidthIncrement(u, thicknessMetres / heightMetres));
    }

    /**
     * Static (quasi-TEM) impedance and effective permittivity with the thickness correction.
     *
     * @return {Z0 in Ω, ε_eff}
     */
    public static double[] staticImpedanceAndPermittivity(double u, double normalisedThickness,
            double relativePermittivity) {
        double airIncrement = airWidthIncrement(u, normalisedThickness);
        double dielectricIncrement = 0.5 * (1.0 + 1.0 / Math.cosh(Math.sqrt(relativePermittivity - 1.0)))
                * airIncrement;
        double u1 = u + airIncrement;
        double ur = u + dielectricIncrement;
        double z1 = airImpedanceZeroThickness(u1);
        double zr = airImpedanceZeroThickness(ur);
        double effective = effectivePermittivityZeroThickness(ur, relativePermittivity) * (z1 / zr) * (z1 / zr);
        return new double[] {zr / Math.sqrt(effective), effective};
    }

    /**
     * Kirschning-Jansen ε_eff(f).
     *
     * @param staticEffective ε_eff(0)
     * @param u w/h
     * @param relativePermittivity εr
     * @param frequencyTimesHeight f·h in Hz·m
     */
    public static double dispersiveEffectivePermittivity(double staticEffective, double u,
            double relativePermittivity, double frequencyTimesHeight) {
        double fn = frequencyTimesHeight * 1e-6; // GHz·mm
        double p1 = 0.27488 + (0.6315 + 0.525 / Math.pow(1.0 + 0.0157 * fn, 20)) * u
                - 0.065683 * Math.exp(-8.7513 * u);
        double p2 = 0.33622 * (1.0 - Math.exp(-0.03442 * relativePermittivity));
        double p3 = 0.0363 * Math.exp(-4.6 * u) * (1.0 - Math.exp(-Math.pow(fn / 38.7, 4.97)));
        double p4 = 1.0 + 2.751 * (1.0 - Math.exp(-Math.pow(relativePermittivity / 15.916, 8)));
        double p = p1 * p2 * Math.pow((0.1844 + p3 * p4) * fn, 1.5763);
        return relativePermittivity - (relativePermittivity - staticEffective) / (1.0 + p);
    }
}
