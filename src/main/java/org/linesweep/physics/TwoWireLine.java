package org.linesweep.physics;

import java.util.List;
import org.apache.commons.math3.complex.Complex;

/**
 * Two parallel round wires of radius a at centre spacing D in a homogeneous dielectric.
 *
 * <p>With X = D/(2a): F = π/acosh X (exact for ideal geometry; the thin-wire ln(D/a) is only its
 * X ≫ 1 limit). Each wire has the exact round-wire internal impedance multiplied by the proximity factor
 * X/sqrt(X² − 1) (H. A. Wheeler, "Formulas for the skin effect", Proc. IRE 30, 1942, via the
 * incremental-inductance rule), blended in with the skin effect as {@link InternalImpedance#blendedProximity}
 * describes. Open line: no cutoff, but it radiates as D approaches the wavelength (not modelled).
 */
public final class TwoWireLine extends HomogeneousTemLine {

    private final double wireRadiusMetres;
    private final double spacingMetres;
    private final double proximityFactor;
    private final double capacitanceFactor;

    /**
     * @param wireDiameterMetres diameter 2a of each wire
     * @param spacingMetres centre-to-centre spacing D &gt; 2a
     */
    public TwoWireLine(double wireDiameterMetres, double spacingMetres, Conductor conductor, Dielectric dielectric) {
        super(conductor, dielectric);
        this.wireRadiusMetres = wireDiameterMetres / 2;
        this.spacingMetres = spacingMetres;
        double x = spacingMetres / wireDiameterMetres;
        this.proximityFactor = x / Math.sqrt((x - 1) * (x + 1));
        this.capacitanceFactor = Math.PI / acosh(x);
        setConductorTerms(SkinEffectTerm.roundWire(conductor, wireRadiusMetres, proximityFactor, 2.0));
    }

    @Override
    protected String geometryText() {
        return "a=" + wireRadiusMetres + " D=" + spacingMetres;
    }

    @Override
    public LineType type() {
        return LineType.TWO_WIRE;
    }

    @Override
    public double capacitanceFactor() {
        return capacitanceFactor;
    }

    /** X/sqrt(X² − 1) with X = D/2a. */
    public double proximityFactor() {
        return proximityFactor;
    }

    /** R_ac/R_dc of one wire including the blended proximity factor. */
    static double wireResistanceRatio(Conductor conductor, double radiusMetres, double proximityFactor,
            double frequencyHz) {
        if (conductor.isPerfect()) {
            return Double.NaN;
        }
        Complex ratio = InternalImpedance.roundWireRatio(radiusMetres / conductor.skinDepthMetres(frequencyHz));
        return ratio.getReal() * InternalImpedance.blendedProximity(ratio, proximityFactor)
                * conductor.roughnessFactor(frequencyHz);
    }

    @Override
    public double characteristicHalfSizeMetres() {
        return wireRadiusMetres;
    }

    @Override
    public double characteristicResistanceRatio(double frequencyHz) {
        return wireResistanceRatio(conductor, wireRadiusMetres, proximityFactor, frequencyHz);
    }

    @Override
    public double higherModeCutoffHz() {
        return Double.NaN;
    }

    @Override
    public double radiatingSpacingMetres() {
        return spacingMetres;
    }

    @Override
    public List<String> validityWarnings() {
        return List.of();
    }
}
