package org.linesweep.physics;

import java.util.ArrayList;
import java.util.List;

/**
 * An edge-coupled pair: the design's microstrip or stripline and an identical twin strip beside it, edge to
 * edge {@code gapMetres} apart. Quasi-static (quasi-TEM) mode impedances and effective permittivities; the
 * dielectric's ε′(f) enters at each frequency, the modes' own geometric dispersion does not (we do not
 * implement the frequency-dependent part of the coupled-microstrip model).
 *
 * <p><b>Stripline</b>: S. B. Cohn, "Shielded coupled-strip transmission line", IRE Trans. MTT-3(5), 1955,
 * pp. 29-38: exact for zero thickness, Z_e,o = (η/4)·K(k′_e,o)/K(k_e,o) with
 * k_e = tanh(πw/2b)·tanh(π(w + s)/2b) and k_o = tanh(πw/2b)·coth(π(w + s)/2b). Thickness enters as the
 * single line's ratio Z0(w, b, t)/Z0(w, b, 0) (Cohn and Wheeler, {@link StriplineFormulas}).
 *
 * <p><b>Microstrip</b>: M. Kirschning and R. H. Jansen, "Accurate wide-range design equations for the
 * frequency-dependent characteristic of parallel coupled microstrip lines", IEEE Trans. MTT-32(1), 1984,
 * pp. 83-90, static part (their eqs. for ε_eff,e(0), ε_eff,o(0), Z_e(0), Z_o(0)); stated range
 * 0.1 ≤ w/h ≤ 10, 0.1 ≤ s/h ≤ 10, 1 ≤ εr ≤ 18, stated accuracy about 1 %. The coefficients are written
 * here from memory of the paper and checked against Garg and Bahl's independent model in the tests.
 * The paper is for zero thickness; thickness enters as the single line's ratio of Hammerstad-Jensen's
 * thick-strip to thin-strip values, so that both modes tend to our single-line values as the gap grows.
 */
public final class CoupledPair {

    private static final double ETA0 = PhysicalConstants.FREE_SPACE_IMPEDANCE_OHM;

    private final LineType type;
    private final double widthMetres;
    private final double heightMetres;
    private final double thicknessMetres;
    private final double gapMetres;
    private final Dielectric.Evaluator permittivity;

    /**
     * @param type {@link LineType#MICROSTRIP} or {@link LineType#STRIPLINE}
     * @param widthMetres each strip's width w
     * @param heightMetres substrate height h (microstrip) or ground-plane spacing b (stripline)
     * @param thicknessMetres strip thickness t
     * @param gapMetres edge-to-edge gap s
     */
    public CoupledPair(LineType type, double widthMetres, double heightMetres, double thicknessMetres,
            double gapMetres, Dielectric dielectric) {
        if (type != LineType.MICROSTRIP && type != LineType.STRIPLINE) {
            throw new IllegalArgumentException("only microstrip and stripline pairs are modelled, not " + type);
        }
        this.type = type;
        this.widthMetres = widthMetres;
        this.heightMetres = heightMetres;
        this.thicknessMetres = thicknessMetres;
        this.gapMetres = gapMetres;
        this.permittivity = dielectric.evaluator();
    }

    /** The modes at frequency f (through the dielectric's ε′(f)). */
    public PairModes modes(double frequencyHz) {
        double relativePermittivity = permittivity.real(frequencyHz);
        return type == LineType.STRIPLINE ? striplineModes(relativePermittivity) : microstripModes(relativePermittivity);
    }

    private PairModes striplineModes(double relativePermittivity) {
        double[] air = cohnAirImpedances(widthMetres, heightMetres, gapMetres);
        double thicknessRatio = StriplineFormulas.airImpedance(widthMetres, heightMetres, thicknessMetres)
                / StriplineFormulas.cohnAirImpedance(widthMetres, heightMetres);
        double root = Math.sqrt(relativePermittivity);
        return new PairModes(air[1] * thicknessRatio / root, air[0] * thicknessRatio / root, relativePermittivity,
                relativePermittivity);
    }

    /**
     * Cohn's exact zero-thickness even and odd impedances in air, Ω.
     *
     * @return {Z_even, Z_odd}
     */
    public static double[] cohnAirImpedances(double widthMetres, double spacingMetres, double gapMetres) {
        double inner = Math.tanh(Math.PI * widthMetres / (2 * spacingMetres));
        double outerArgument = Math.PI * (widthMetres + gapMetres) / (2 * spacingMetres);
        double outer = Math.tanh(outerArgument);
        double even = inner * outer;
        double odd = inner / outer;
        return new double[] {ETA0 / 4 * ratioComplementOverModulus(even), ETA0 / 4 * ratioComplementOverModulus(odd)};
    }

    /** K(k′)/K(k) for a modulus k in (0, 1), with k′ formed without cancellation. */
    private static double ratioComplementOverModulus(double modulus) {
        double complementary = Math.sqrt((1 - modulus) * (1 + modulus));
        return SpecialFunctions.ellipticKFromComplementaryModulus(modulus)
                / SpecialFunctions.ellipticKFromComplementaryModulus(complementary);
    }

    private PairModes microstripModes(double relativePermittivity) {
        double u = widthMetres / heightMetres;
        double g = gapMetres / heightMetres;
        double[] thin = kirschningJansenStatic(u, g, relativePermittivity);
        // the single line's thickness correction, applied to both modes as a ratio
        double singleThinEffective = MicrostripFormulas.effectivePermittivityZeroThickness(u, relativePermittivity);
        double singleThinImpedance = MicrostripFormulas.airImpedanceZeroThickness(u) / Math.sqrt(singleThinEffective);
        double[] singleThick = MicrostripFormulas.staticImpedanceAndPermittivity(u, thicknessMetres / heightMetres,
                relativePermittivity);
        double impedanceRatio = singleThick[0] / singleThinImpedance;
        double permittivityRatio = singleThick[1] / singleThinEffective;
        return new PairModes(thin[1] * impedanceRatio, thin[0] * impedanceRatio, thin[3] * permittivityRatio,
                thin[2] * permittivityRatio);
    }

    /**
     * Kirschning-Jansen (1984) static even- and odd-mode values of zero-thickness coupled microstrip, built
     * on the Hammerstad-Jensen single line of the same u.
     *
     * @param u w/h
     * @param g s/h
     * @return {Z_even, Z_odd, ε_eff,even, ε_eff,odd}
     */
    public static double[] kirschningJansenStatic(double u, double g, double relativePermittivity) {
        double er = relativePermittivity;
        double singleEffective = MicrostripFormulas.effectivePermittivityZeroThickness(u, er);
        double singleImpedance = MicrostripFormulas.airImpedanceZeroThickness(u) / Math.sqrt(singleEffective);
        // even mode: the single-line form evaluated at an equivalent width v
        double v = u * (20 + g * g) / (10 + g * g) + g * Math.exp(-g);
        double v4 = v * v * v * v;
        double ae = 1 + Math.log((v4 + Math.pow(v / 52, 2)) / (v4 + 0.432)) / 49 + Math.log(1 + Math.pow(v / 18.1, 3)) / 18.7;
        double be = 0.564 * Math.pow((er - 0.9) / (er + 3), 0.053);
        double evenEffective = (er + 1) / 2 + (er - 1) / 2 * Math.pow(1 + 10 / v, -ae * be);
        // odd mode
        double ao = 0.7287 * (singleEffective - (er + 1) / 2) * (1 - Math.exp(-0.179 * u));
        double bo = 0.747 * er / (0.15 + er);
        double co = bo - (bo - 0.207) * Math.exp(-0.414 * u);
        double d0 = 0.593 + 0.694 * Math.exp(-0.562 * u);
        double oddEffective = ((er + 1) / 2 + ao - singleEffective) * Math.exp(-co * Math.pow(g, d0)) + singleEffective;
        // impedances
        double q1 = 0.8695 * Math.pow(u, 0.194);
        double q2 = 1 + 0.7519 * g + 0.189 * Math.pow(g, 2.31);
        double q3 = 0.1975 + Math.pow(16.6 + Math.pow(8.4 / g, 6), -0.387)
                + Math.log(Math.pow(g, 10) / (1 + Math.pow(g / 3.4, 10))) / 241;
        double q4 = 2 * q1 / q2 / (Math.exp(-g) * Math.pow(u, q3) + (2 - Math.exp(-g)) * Math.pow(u, -q3));
        double q5 = 1.794 + 1.14 * Math.log(1 + 0.638 / (g + 0.517 * Math.pow(g, 2.43)));
        double q6 = 0.2305 + Math.log(Math.pow(g, 10) / (1 + Math.pow(g / 5.8, 10))) / 281.3
                + Math.log(1 + 0.598 * Math.pow(g, 1.154)) / 5.1;
        double q7 = (10 + 190 * g * g) / (1 + 82.3 * g * g * g);
        double q8 = Math.exp(-6.5 - 0.95 * Math.log(g) - Math.pow(g / 0.15, 5));
        double q9 = Math.log(q7) * (q8 + 1 / 16.5);
        double q10 = q4 - q5 / q2 * Math.exp(q6 * Math.log(u) / Math.pow(u, q9));
        double scale = singleImpedance / ETA0 * Math.sqrt(singleEffective);
        double evenImpedance = singleImpedance * Math.sqrt(singleEffective / evenEffective) / (1 - scale * q4);
        double oddImpedance = singleImpedance * Math.sqrt(singleEffective / oddEffective) / (1 - scale * q10);
        return new double[] {evenImpedance, oddImpedance, evenEffective, oddEffective};
    }

    /** Where the pair lies outside its model's stated range, in words. */
    public List<String> validityWarnings() {
        List<String> warnings = new ArrayList<>();
        if (type == LineType.MICROSTRIP) {
            double u = widthMetres / heightMetres;
            double g = gapMetres / heightMetres;
            if (u < 0.1 || u > 10 || g < 0.1 || g > 10) {
                warnings.add(String.format(java.util.Locale.ROOT, "pair: w/h = %.3g and s/h = %.3g; the"
                        + " Kirschning-Jansen coupled-microstrip range is 0.1..10 for both", u, g));
            }
            if (permittivity.real(1e9) > 18) {
                warnings.add("pair: εr above 18 is outside the Kirschning-Jansen coupled-microstrip range");
            }
        }
        return warnings;
    }
}
