package org.linesweep.physics;

import java.util.List;

/**
 * A round wire of radius a with its centre at height h over an infinite ground plane, in a homogeneous
 * dielectric. By image theory it is half of a two-wire line with D = 2h: F = 2π/acosh(h/a).
 *
 * <p>Losses: the wire's exact internal impedance times the proximity factor (h/a)/sqrt((h/a)² − 1), blended
 * in with the skin effect, plus the ground plane's Z_s/(2π·sqrt(h² − a²)), where sqrt(h² − a²) is the
 * height of the equivalent line source of the image problem (integrating Z_s·K² over the plane for the
 * image current density). The plane is taken as thick (semi-infinite), so its share vanishes at DC as
 * it does for a plane of unbounded width.
 */
public final class WireOverGroundLine extends HomogeneousTemLine {

    private final double wireRadiusMetres;
    private final double heightMetres;
    private final double proximityFactor;
    private final double capacitanceFactor;
    private final double sourceHeightMetres;

    /**
     * @param wireDiameterMetres diameter 2a of the wire
     * @param heightMetres height h of the wire's centre above the plane, &gt; a
     */
    public WireOverGroundLine(double wireDiameterMetres, double heightMetres, Conductor conductor,
            Dielectric dielectric) {
        super(conductor, dielectric);
        this.wireRadiusMetres = wireDiameterMetres / 2;
        this.heightMetres = heightMetres;
        double x = heightMetres / wireRadiusMetres;
        this.proximityFactor = x / Math.sqrt((x - 1) * (x + 1));
        this.capacitanceFactor = 2 * Math.PI / acosh(x);
        this.sourceHeightMetres = Math.sqrt((heightMetres - wireRadiusMetres) * (heightMetres + wireRadiusMetres));
        setConductorTerms(SkinEffectTerm.roundWire(conductor, wireRadiusMetres, proximityFactor, 1.0),
                SkinEffectTerm.flat(conductor, Double.POSITIVE_INFINITY, 1.0 / (2 * Math.PI * sourceHeightMetres)));
    }

    @Override
    protected String geometryText() {
        return "a=" + wireRadiusMetres + " h=" + heightMetres;
    }

    @Override
    public LineType type() {
        return LineType.WIRE_OVER_GROUND;
    }

    @Override
    public double capacitanceFactor() {
        return capacitanceFactor;
    }

    @Override
    public double characteristicHalfSizeMetres() {
        return wireRadiusMetres;
    }

    @Override
    public double characteristicResistanceRatio(double frequencyHz) {
        return TwoWireLine.wireResistanceRatio(conductor, wireRadiusMetres, proximityFactor, frequencyHz);
    }

    @Override
    public double higherModeCutoffHz() {
        return Double.NaN;
    }

    @Override
    public double radiatingSpacingMetres() {
        return 2 * heightMetres;
    }

    @Override
    public List<String> validityWarnings() {
        return List.of();
    }
}
