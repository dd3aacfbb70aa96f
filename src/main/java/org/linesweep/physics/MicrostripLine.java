package org.linesweep.physics;

import java.util.ArrayList;
import java.util.List;
import org.apache.commons.math3.complex.Complex;

/**
 * Microstrip: a strip of width w and thickness t on a substrate of height h over a ground plane.
 *
 * <p>Quasi-TEM mapping to per-unit-length parameters, with Z0 the quasi-static Hammerstad-Jensen value at
 * ε′(f) and ε_eff(f) from Kirschning-Jansen (see {@link MicrostripFormulas}):
 * <pre>L'_ext = Z0·sqrt(ε_eff(f))/c,   C' = sqrt(ε_eff(f))/(Z0·c),   G' = 2α_d/Z0</pre>
 * so β follows the dispersive ε_eff. Dielectric loss uses the filling factor
 * α_d = k0·εr·(ε_eff − 1)·tan δ/(2·sqrt(ε_eff)·(εr − 1)) (Pozar, Microwave Engineering) with the
 * dispersive ε_eff(f) and the loss tangent including bulk conduction.
 *
 * <p>Conductor loss by Wheeler's incremental-inductance rule (Proc. IRE 30, 1942) on the air-filled
 * Hammerstad-Jensen impedance with thickness: every surface recedes by dn, the strip's (w − 2dn, t − 2dn,
 * h + dn) and the ground's (h + dn), and the surface impedance of each conductor replaces Rs:
 * Z_int = K_rough·[Z_s(t)·∂Z0_air/∂n|strip + Z_s(t)·∂Z0_air/∂n|ground]/η0. The ground plane is taken
 * to be the same foil as the strip (thickness t). At DC this gives the surface-impedance limit 1/(σt)
 * spread by the same geometric weights, which overstates the strip's true DC resistance 1/(σwt) a little
 * because the derivative includes the edges.
 */
public final class MicrostripLine extends LineModel {

    /** Derivative step of the incremental-inductance rule, as a fraction of t (1e-4·t is adequate). */
    static final double WHEELER_STEP_FRACTION = 1e-4;

    private final double widthMetres;
    private final double heightMetres;
    private final double thicknessMetres;
    private final double stripDerivativeOhmPerMetre;
    private final double groundDerivativeOhmPerMetre;
    private final double[] constantStatic;
    /**
     * The Hammerstad-Jensen static values (Z0 as the real part, ε_eff(0) as the imaginary part) against ε′,
     * tabulated over a sweep's range of ε′(f) when the dielectric is dispersive; null otherwise.
     */
    private volatile HermiteTable staticTable;

    public MicrostripLine(double widthMetres, double heightMetres, double thicknessMetres, Conductor conductor,
            Dielectric dielectric) {
        super(conductor, dielectric);
        this.widthMetres = widthMetres;
        this.heightMetres = heightMetres;
        this.thicknessMetres = thicknessMetres;
        double dn = WHEELER_STEP_FRACTION * thicknessMetres;
        this.stripDerivativeOhmPerMetre =
                (MicrostripFormulas.airImpedance(widthMetres - 2 * dn, heightMetres + dn, thicknessMetres - 2 * dn)
                - MicrostripFormulas.airImpedance(widthMetres + 2 * dn, heightMetres - dn, thicknessMetres + 2 * dn))
                / (2 * dn);
        this.groundDerivativeOhmPerMetre =
                (MicrostripFormulas.airImpedance(widthMetres, heightMetres + dn, thicknessMetres)
                - MicrostripFormulas.airImpedance(widthMetres, heightMetres - dn, thicknessMetres)) / (2 * dn);
        this.constantStatic = dielectric.model() == DielectricModelKind.CONSTANT
                ? staticAt(dielectric.relativePermittivity()) : null;
    }

    private double[] staticAt(double relativePermittivity) {
        return MicrostripFormulas.staticImpedanceAndPermittivity(widthMetres / heightMetres,
                thicknessMetres / heightMetres, relativePermittivity);
    }

    @Override
    protected String geometryText() {
        return "w=" + widthMetres + " h=" + heightMetres + " t=" + thicknessMetres;
    }

    @Override
    public LineType type() {
        return LineType.MICROSTRIP;
    }

    /** Quasi-static Z0 and ε_eff(0) at the dielectric's ε′(f). */
    public double[] staticImpedanceAndPermittivity(double frequencyHz) {
        if (constantStatic != null) {
            return constantStatic;
        }
        double relativePermittivity = permittivity.real(frequencyHz);
        HermiteTable table = staticTable;
        if (table != null && table.covers(relativePermittivity)) {
            double[] out = new double[4];
            table.evaluate(relativePermittivity, out);
            return new double[] {out[0], out[1]};
        }
        return staticAt(relativePermittivity);
    }

    /** Relative step of the central difference in ε′ at the static table's nodes. */
    static final double STATIC_TABLE_STEP = 1e-5;
    /** Nodes per unit of ln ε′ in the static table (a sweep spans a few hundredths of a unit). */
    static final int STATIC_TABLE_NODES_PER_UNIT_LOG = 512;

    /**
     * With a wideband dielectric the Hammerstad-Jensen static values change with f only through ε′(f), which a
     * sweep moves over a narrow range (a few per cent): tabulate them over that range, padded so the
     * slopes' neighbouring evaluations stay inside, from a handful of exact evaluations (slopes in ε′ by
     * central difference at the nodes). Each point then reads the table instead of three exact evaluations.
     */
    @Override
    public void prepareForSweep(double[] frequenciesHz, int count) {
        if (constantStatic != null || count < 16) {
            return;
        }
        double low = Double.POSITIVE_INFINITY;
        double high = 0.0;
        for (int i = 0; i < count; i++) {
            double value = permittivity.real(frequenciesHz[i]);
            low = Math.min(low, value);
            high = Math.max(high, value);
        }
        low *= 1 - 1e-3;
        high *= 1 + 1e-3;
        HermiteTable existing = staticTable;
        if (!(low > 1.0) || (existing != null && existing.covers(low) && existing.covers(high))) {
            return;
        }
        staticTable = new HermiteTable((relativePermittivity, out) -> {
            double[] here = staticAt(relativePermittivity);
            double[] above = staticAt(relativePermittivity * (1 + STATIC_TABLE_STEP));
            double[] below = staticAt(relativePermittivity * (1 - STATIC_TABLE_STEP));
            double span = 2 * STATIC_TABLE_STEP * relativePermittivity;
            out[0] = here[0];
            out[1] = here[1];
            out[2] = (above[0] - below[0]) / span;
            out[3] = (above[1] - below[1]) / span;
        }, low, high, STATIC_TABLE_NODES_PER_UNIT_LOG);
    }

    /** Kirschning-Jansen ε_eff(f). */
    public double effectivePermittivity(double frequencyHz) {
        double[] statics = staticImpedanceAndPermittivity(frequencyHz);
        return MicrostripFormulas.dispersiveEffectivePermittivity(statics[1], widthMetres / heightMetres,
                permittivity.real(frequencyHz), frequencyHz * heightMetres);
    }

    /** Internal impedance of strip and ground per metre, Ω/m. */
    public Complex conductorImpedance(double frequencyHz) {
        Complex surface = InternalImpedance.flatSurface(conductor, thicknessMetres, frequencyHz);
        return surface.multiply((stripDerivativeOhmPerMetre + groundDerivativeOhmPerMetre)
                / PhysicalConstants.FREE_SPACE_IMPEDANCE_OHM);
    }

    @Override
    public void evaluate(double frequencyHz, LineParameters out) {
        double[] dielectricPart = new double[3];
        double effective = dielectricPart(frequencyHz, dielectricPart);
        Complex internal = conductorImpedance(frequencyHz);
        double omega = 2 * Math.PI * frequencyHz;
        out.set(internal.getReal(), dielectricPart[0] + internal.getImaginary() / omega, dielectricPart[2],
                dielectricPart[1], effective);
    }

    /**
     * The parameters and their ω-derivatives. The conductor part has a closed-form derivative (the surface
     * impedance's, with the roughness factor's); the rest (Hammerstad-Jensen at ε′(f), Kirschning-Jansen
     * dispersion, the filling factor) is a chain of closed forms in f and ε′(f) without one, so it alone is
     * differentiated numerically, by the same central difference the default uses. That part is a few
     * elementary functions, a fraction of the surface impedance's cost.
     */
    @Override
    public void evaluateWithSlopes(double frequencyHz, LineParameters out) {
        double step = GROUP_VELOCITY_STEP * frequencyHz;
        double[] here = new double[3];
        double[] above = new double[3];
        double[] below = new double[3];
        double effective = dielectricPart(frequencyHz, here);
        dielectricPart(frequencyHz + step, above);
        dielectricPart(frequencyHz - step, below);
        double span = 2 * Math.PI * 2 * step;
        double weight = (stripDerivativeOhmPerMetre + groundDerivativeOhmPerMetre)
                / PhysicalConstants.FREE_SPACE_IMPEDANCE_OHM;
        Complex[] surface = InternalImpedance.flatSurfaceWithSlope(conductor, thicknessMetres, frequencyHz);
        double omega = 2 * Math.PI * frequencyHz;
        double internalRe = surface[0].getReal() * weight;
        double internalIm = surface[0].getImaginary() * weight;
        double internalReSlope = surface[1].getReal() * weight;
        double internalImSlope = surface[1].getImaginary() * weight;
        out.set(internalRe, here[0] + internalIm / omega, here[2], here[1], effective);
        // d(X/ω)/dω = (X′·ω − X)/ω²
        out.setSlopes(internalReSlope, (above[0] - below[0]) / span + (internalImSlope * omega - internalIm) / (omega * omega),
                (above[2] - below[2]) / span, (above[1] - below[1]) / span);
    }

    /**
     * Everything but the conductors at f: L'_ext, C' and G' from the quasi-static Z0, the dispersive ε_eff and
     * the filling-factor dielectric loss.
     *
     * @param out receives {L'_ext (H/m), C' (F/m), G' (S/m)}
     * @return ε_eff(f)
     */
    private double dielectricPart(double frequencyHz, double[] out) {
        double omega = 2 * Math.PI * frequencyHz;
        double relativePermittivity = permittivity.real(frequencyHz);
        double[] statics = staticImpedanceAndPermittivity(frequencyHz);
        double z0 = statics[0];
        double effective = MicrostripFormulas.dispersiveEffectivePermittivity(statics[1],
                widthMetres / heightMetres, relativePermittivity, frequencyHz * heightMetres);
        double rootEffective = Math.sqrt(effective);
        double c = PhysicalConstants.SPEED_OF_LIGHT_METRES_PER_SECOND;
        double fillingFactor = relativePermittivity - 1.0 > 1e-12
                ? (effective - 1.0) / (relativePermittivity - 1.0) : 1.0;
        double alphaDielectric = (omega / c) * relativePermittivity * fillingFactor
                * permittivity.effectiveLossTangent(frequencyHz) / (2.0 * rootEffective);
        out[0] = z0 * rootEffective / c;
        out[1] = rootEffective / (z0 * c);
        out[2] = 2.0 * alphaDielectric / z0;
        return effective;
    }

    @Override
    public double characteristicHalfSizeMetres() {
        return thicknessMetres / 2;
    }

    @Override
    public double characteristicResistanceRatio(double frequencyHz) {
        return InternalImpedance.flatResistanceRatio(conductor, thicknessMetres, frequencyHz);
    }

    /**
     * The lower of the TM0 surface-wave coupling frequency f_T = c·atan(εr)/(√2·π·h·sqrt(εr − 1))
     * (Vendelin, 1970, from memory) and the transverse resonance f_CT = c/(sqrt(εr)·(2w + 0.8h))
     * (as collected by Edwards, Foundations for Microstrip Circuit Design, from memory).
     */
    @Override
    public double higherModeCutoffHz() {
        double c = PhysicalConstants.SPEED_OF_LIGHT_METRES_PER_SECOND;
        double estimate = c / (2 * widthMetres + 0.8 * heightMetres);
        double f = estimate;
        for (int i = 0; i < 4; i++) {
            f = Math.min(surfaceWaveHz(permittivity.real(f)), transverseHz(permittivity.real(f)));
        }
        return f;
    }

    private double surfaceWaveHz(double relativePermittivity) {
        if (relativePermittivity <= 1.0) {
            return Double.POSITIVE_INFINITY;
        }
        return PhysicalConstants.SPEED_OF_LIGHT_METRES_PER_SECOND * Math.atan(relativePermittivity)
                / (Math.sqrt(2.0) * Math.PI * heightMetres * Math.sqrt(relativePermittivity - 1.0));
    }

    private double transverseHz(double relativePermittivity) {
        return PhysicalConstants.SPEED_OF_LIGHT_METRES_PER_SECOND
                / (Math.sqrt(relativePermittivity) * (2 * widthMetres + 0.8 * heightMetres));
    }

    @Override
    public List<String> validityWarnings() {
        List<String> warnings = new ArrayList<>();
        double u = widthMetres / heightMetres;
        double er = dielectric.relativePermittivity();
        if (u < 0.01 || u > 100) {
            warnings.add(String.format("microstrip: w/h = %.4g is outside the Hammerstad-Jensen range 0.01..100", u));
        } else if (u < 0.1) {
            warnings.add(String.format("microstrip: w/h = %.4g is below 0.1, the Kirschning-Jansen dispersion range",
                    u));
        }
        if (er > 128) {
            warnings.add(String.format("microstrip: εr = %.4g is above the Hammerstad-Jensen range (≤ 128)", er));
        } else if (er > 20) {
            warnings.add(String.format("microstrip: εr = %.4g is above the Kirschning-Jansen range (≤ 20)", er));
        }
        if (thicknessMetres > heightMetres) {
            warnings.add("microstrip: the strip is thicker than its substrate; the thickness correction is"
                    + " not meant for that");
        }
        if (dielectric.relativePermeability() != 1.0) {
            warnings.add("microstrip: the substrate's permeability is not modelled (taken as 1)");
        }
        return warnings;
    }

    /** Highest frequency of the Kirschning-Jansen validity range, h/λ0 = 0.13, Hz. */
    public double dispersionValidityLimitHz() {
        return 0.13 * PhysicalConstants.SPEED_OF_LIGHT_METRES_PER_SECOND / heightMetres;
    }
}
