package org.linesweep.physics;

import java.util.ArrayList;
import java.util.List;

/**
 * Coaxial line: solid round inner conductor of radius a, tubular outer conductor of inner radius b and
 * wall thickness t, filled with one dielectric.
 *
 * <p>F = 2π/ln(b/a) (any transmission-line text, e.g. Pozar, Microwave Engineering, table of common
 * lines). The inner conductor's internal impedance is the exact round-wire result and the outer
 * conductor's the exact tube result, both from Schelkunoff (1934): see {@link InternalImpedance}.
 * The first higher-order mode is TE11, found exactly by {@link CoaxModes}.
 */
public final class CoaxLine extends HomogeneousTemLine {

    private final double innerRadiusMetres;
    private final double outerRadiusMetres;
    private final double outerWallMetres;
    private final double capacitanceFactor;
    private volatile double cachedTe11Hz = Double.NaN;

    /**
     * @param innerDiameterMetres diameter 2a of the inner conductor
     * @param outerDiameterMetres inside diameter 2b of the outer conductor, &gt; 2a
     * @param outerThicknessMetres wall thickness t of the outer conductor, &gt; 0
     */
    public CoaxLine(double innerDiameterMetres, double outerDiameterMetres, double outerThicknessMetres,
            Conductor conductor, Dielectric dielectric) {
        super(conductor, dielectric);
        this.innerRadiusMetres = innerDiameterMetres / 2;
        this.outerRadiusMetres = outerDiameterMetres / 2;
        this.outerWallMetres = outerThicknessMetres;
        this.capacitanceFactor = 2 * Math.PI / Math.log1p((outerRadiusMetres - innerRadiusMetres) / innerRadiusMetres);
        // the outer tube tabulates its thin-wall range per sweep (see SkinEffectTerm#prepareForSweep)
        setConductorTerms(SkinEffectTerm.roundWire(conductor, innerRadiusMetres, 1.0, 1.0),
                SkinEffectTerm.tube(conductor, outerRadiusMetres, outerRadiusMetres + outerWallMetres));
    }

    @Override
    protected String geometryText() {
        return "a=" + innerRadiusMetres + " b=" + outerRadiusMetres + " wall=" + outerWallMetres;
    }

    @Override
    public LineType type() {
        return LineType.COAX;
    }

    @Override
    public double capacitanceFactor() {
        return capacitanceFactor;
    }

    @Override
    public double characteristicHalfSizeMetres() {
        return innerRadiusMetres;
    }

    @Override
    public double characteristicResistanceRatio(double frequencyHz) {
        if (conductor.isPerfect()) {
            return Double.NaN;
        }
        return InternalImpedance.roundWireRatio(innerRadiusMetres / conductor.skinDepthMetres(frequencyHz))
                .getReal() * conductor.roughnessFactor(frequencyHz);
    }

    /** TE11 cutoff from the exact root of the Bessel cross-product equation, in the line's dielectric. */
    @Override
    public double higherModeCutoffHz() {
        double cached = cachedTe11Hz;
        if (Double.isNaN(cached)) {
            double x = CoaxModes.te11CutoffTimesInnerRadius(outerRadiusMetres / innerRadiusMetres);
            double freeSpace = x * PhysicalConstants.SPEED_OF_LIGHT_METRES_PER_SECOND / (2 * Math.PI * innerRadiusMetres);
            cached = cutoffInDielectric(freeSpace);
            cachedTe11Hz = cached;
        }
        return cached;
    }

    @Override
    public List<String> validityWarnings() {
        List<String> warnings = new ArrayList<>();
        if (outerWallMetres > outerRadiusMetres) {
            warnings.add("coax: the outer wall is thicker than the outer radius; the tube model still applies,"
                    + " but check the dimensions");
        }
        return warnings;
    }

    public double innerRadiusMetres() {
        return innerRadiusMetres;
    }

    public double outerRadiusMetres() {
        return outerRadiusMetres;
    }
}
