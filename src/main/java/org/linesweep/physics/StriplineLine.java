package org.linesweep.physics;

import java.util.ArrayList;
import java.util.List;

/**
 * Stripline: a strip of width w and thickness t centred between ground planes spaced b, in a homogeneous
 * dielectric, so a true TEM line with F = η0/Z0_air (see {@link StriplineFormulas}).
 *
 * <p>Conductor loss by Wheeler's incremental-inductance rule on the air impedance, every wall receding
 * by dn: the strip's (w − 2dn, t − 2dn) and the planes' (b + 2dn). The strip carries current on both
 * faces, so each face sees half the thickness: Z_s(t/2) replaces Rs for the strip. The planes are taken as
 * the same foil as the strip, with Z_s(t).
 * First higher-order mode: TE1 across the width, c/(2·sqrt(εr μr)·(w + πb/4)) (Howe, Stripline Circuit
 * Design, 1974, from memory).
 */
public final class StriplineLine extends HomogeneousTemLine {

    static final double WHEELER_STEP_FRACTION = 1e-4;
    /** Upper end of the stated validity of Wheeler's 1978 formula. */
    static final double WHEELER_WIDTH_LIMIT = 10.0;

    private final double widthMetres;
    private final double spacingMetres;
    private final double thicknessMetres;
    private final double capacitanceFactor;

    public StriplineLine(double widthMetres, double spacingMetres, double thicknessMetres, Conductor conductor,
            Dielectric dielectric) {
        super(conductor, dielectric);
        this.widthMetres = widthMetres;
        this.spacingMetres = spacingMetres;
        this.thicknessMetres = thicknessMetres;
        this.capacitanceFactor = PhysicalConstants.FREE_SPACE_IMPEDANCE_OHM
                / StriplineFormulas.airImpedance(widthMetres, spacingMetres, thicknessMetres);
        double dn = WHEELER_STEP_FRACTION * thicknessMetres;
        double stripDerivativeOhmPerMetre =
                (StriplineFormulas.airImpedance(widthMetres - 2 * dn, spacingMetres, thicknessMetres - 2 * dn)
                - StriplineFormulas.airImpedance(widthMetres + 2 * dn, spacingMetres, thicknessMetres + 2 * dn))
                / (2 * dn);
        double groundDerivativeOhmPerMetre =
                (StriplineFormulas.airImpedance(widthMetres, spacingMetres + 2 * dn, thicknessMetres)
                - StriplineFormulas.airImpedance(widthMetres, spacingMetres - 2 * dn, thicknessMetres)) / (2 * dn);
        double eta0 = PhysicalConstants.FREE_SPACE_IMPEDANCE_OHM;
        setConductorTerms(SkinEffectTerm.flat(conductor, thicknessMetres / 2, stripDerivativeOhmPerMetre / eta0),
                SkinEffectTerm.flat(conductor, thicknessMetres, groundDerivativeOhmPerMetre / eta0));
    }

    @Override
    protected String geometryText() {
        return "w=" + widthMetres + " b=" + spacingMetres + " t=" + thicknessMetres;
    }

    @Override
    public LineType type() {
        return LineType.STRIPLINE;
    }

    @Override
    public double capacitanceFactor() {
        return capacitanceFactor;
    }

    @Override
    public double characteristicHalfSizeMetres() {
        return thicknessMetres / 2;
    }

    @Override
    public double characteristicResistanceRatio(double frequencyHz) {
        // each face of the strip sees half its thickness
        return InternalImpedance.flatResistanceRatio(conductor, thicknessMetres / 2, frequencyHz);
    }

    @Override
    public double higherModeCutoffHz() {
        return cutoffInDielectric(PhysicalConstants.SPEED_OF_LIGHT_METRES_PER_SECOND
                / (2 * (widthMetres + Math.PI * spacingMetres / 4)));
    }

    @Override
    public List<String> validityWarnings() {
        List<String> warnings = new ArrayList<>();
        double ratio = StriplineFormulas.wheelerEffectiveWidthRatio(widthMetres, spacingMetres, thicknessMetres);
        if (ratio >= WHEELER_WIDTH_LIMIT) {
            warnings.add(String.format("stripline: W'/(b - t) = %.3g is at or above %.0f, where Wheeler's"
                    + " thickness correction loses its stated 0.5 %% accuracy", ratio, WHEELER_WIDTH_LIMIT));
        }
        return warnings;
    }
}
