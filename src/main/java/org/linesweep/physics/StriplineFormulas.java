package org.linesweep.physics;

/**
 * Closed forms for a centred strip of width w and thickness t between ground planes spaced b.
 *
 * <p>Zero thickness, exact: Z0 = (η/4)·K(k)/K(k′), k = sech(πw/2b), k′ = tanh(πw/2b) (S. B. Cohn,
 * "Characteristic impedance of the shielded-strip transmission line", IRE Trans. MTT-2, 1954,
 * pp. 52-57).
 *
 * <p>Finite thickness: H. A. Wheeler, "Transmission-line properties of a strip line between parallel
 * planes", IEEE Trans. MTT-26, 1978, pp. 866-876 (stated accuracy about 0.5 % for W′/(b − t) &lt; 10),
 * applied as a ratio to Cohn's exact value so the result is continuous as t → 0:
 * Z0(w, b, t) = Z0_Cohn(w, b)·Z0_Wheeler(w, b, t)/Z0_Wheeler(w, b, 0).
 */
public final class StriplineFormulas {

    private static final double ETA0 = PhysicalConstants.FREE_SPACE_IMPEDANCE_OHM;

    private StriplineFormulas() {
    }

    /** Cohn's exact air-filled zero-thickness impedance, Ω. */
    public static double cohnAirImpedance(double widthMetres, double spacingMetres) {
        double argument = Math.PI * widthMetres / (2 * spacingMetres);
        double modulus = 1.0 / Math.cosh(argument);
        double complementary = Math.tanh(argument);
        return ETA0 / 4.0 * SpecialFunctions.ellipticKFromComplementaryModulus(complementary)
                / SpecialFunctions.ellipticKFromComplementaryModulus(modulus);
    }

    /** Wheeler's (1978) air-filled impedance with thickness, Ω. */
    public static double wheelerAirImpedance(double widthMetres, double spacingMetres, double thicknessMetres) {
        double q = 4.0 / (Math.PI * wheelerEffectiveWidthRatio(widthMetres, spacingMetres, thicknessMetres));
        return ETA0 / (4.0 * Math.PI) * Math.log(1.0 + q * (2.0 * q + Math.sqrt(4.0 * q * q + 6.27)));
    }

    /**
     * Wheeler's effective width ratio W′/(b − t) = w/(b − t) + ΔW/(b − t), with x = t/b,
     * m = 2/[1 + (2/3)·x/(1 − x)] and
     * ΔW/(b − t) = x/(π(1 − x))·{1 − ½·ln[(x/(2 − x))² + (0.0796x/(w/b + 1.1x))^m]}.
     */
    public static double wheelerEffectiveWidthRatio(double widthMetres, double spacingMetres,
            double thicknessMetres) {
        double x = thicknessMetres / spacingMetres;
        double increment = 0.0;
        if (x > 0) {
            double m = 2.0 / (1.0 + (2.0 / 3.0) * x / (1.0 - x));
            double ratio = x / (2.0 - x);
            double edge = 0.0796 * x / (widthMetres / spacingMetres + 1.1 * x);
            increment = x / (Math.PI * (1.0 - x))
                    * (1.0 - 0.5 * Math.log(ratio * ratio + Math.pow(edge, m)));
        }
        return widthMetres / (spacingMetres - thicknessMetres) + increment;
    }

    /** Air-filled impedance: Cohn's exact value with Wheeler's thickness correction as a ratio, Ω. */
    public static double airImpedance(double widthMetres, double spacingMetres, double thicknessMetres) {
        return cohnAirImpedance(widthMetres, spacingMetres)
                * wheelerAirImpedance(widthMetres, spacingMetres, thicknessMetres)
                / wheelerAirImpedance(widthMetres, spacingMetres, 0.0);
    }
}
