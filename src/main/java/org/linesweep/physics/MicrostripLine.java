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
    private final double[] constantStatic;
    /**
     * The Hammerstad-Jensen static values (Z0 as the real part, ε_eff(0) as the imaginary part) against ε′,
     * tabulated over a sweep's range of ε′(f) when the dielectric is dispersive; null otherwise.
     */
    private volatile HermiteTable staticTable;
    /** {L'_ext + jC', G' + jε_e} against f over a sweep's range (see {@link #prepareForSweep}); null until then. */
    private volatile HermiteTable[] substrateTables;
    private final MicrostripFormulas.Dispersion dispersion;
    private static final double INVERSE_SPEED_OF_LIGHT = 1.0 / PhysicalConstants.SPEED_OF_LIGHT_METRES_PER_SECOND;
    /** σ_d/ε0 of the substrate, 1/s. */
    private final double conductivityOverVacuumPermittivity;
    /** h in units of 1e6 m, so that f·h is Kirschning-Jansen's fn in GHz·mm; and its logarithm. */
    private final double heightMegametres;
    private final double logHeightMegametres;
    /** Strip and ground's internal impedance; null for a perfect conductor. */
    private final SkinEffectTerm conductorTerm;

    public MicrostripLine(double widthMetres, double heightMetres, double thicknessMetres, Conductor conductor,
            Dielectric dielectric) {
        super(conductor, dielectric);
        this.widthMetres = widthMetres;
        this.heightMetres = heightMetres;
        this.thicknessMetres = thicknessMetres;
        double dn = WHEELER_STEP_FRACTION * thicknessMetres;
        double stripDerivativeOhmPerMetre =
                (MicrostripFormulas.airImpedance(widthMetres - 2 * dn, heightMetres + dn, thicknessMetres - 2 * dn)
                - MicrostripFormulas.airImpedance(widthMetres + 2 * dn, heightMetres - dn, thicknessMetres + 2 * dn))
                / (2 * dn);
        double groundDerivativeOhmPerMetre =
                (MicrostripFormulas.airImpedance(widthMetres, heightMetres + dn, thicknessMetres)
                - MicrostripFormulas.airImpedance(widthMetres, heightMetres - dn, thicknessMetres)) / (2 * dn);
        this.constantStatic = permittivity.isConstant() ? staticAt(dielectric.relativePermittivity()) : null;
        this.dispersion = new MicrostripFormulas.Dispersion(widthMetres / heightMetres);
        this.conductivityOverVacuumPermittivity = permittivity.conductivity()
                / PhysicalConstants.VACUUM_PERMITTIVITY_FARAD_PER_METRE;
        this.heightMegametres = heightMetres * 1e-6;
        this.logHeightMegametres = Math.log(heightMegametres);
        // strip and ground, each the same foil, weighted by Wheeler's rule
        this.conductorTerm = conductor.isPerfect() ? null : SkinEffectTerm.flat(conductor, thicknessMetres,
                (stripDerivativeOhmPerMetre + groundDerivativeOhmPerMetre) / PhysicalConstants.FREE_SPACE_IMPEDANCE_OHM);
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

    /** Nodes per unit of ln ε′ in the static table (a sweep spans a few hundredths of a unit). */
    static final int STATIC_TABLE_NODES_PER_UNIT_LOG = 512;

    /** Nodes per unit of ln f in the substrate tables. */
    static final int SUBSTRATE_TABLE_NODES_PER_UNIT_LOG = 64;

    /**
     * Two tables over the sweep, when it is dense enough that they cost less than evaluating each point:
     * <ul>
     * <li>With a wideband dielectric the Hammerstad-Jensen static values change with f only through ε′(f), which
     * a sweep moves over a narrow range (a few per cent, ε′ falling with f): they are tabulated over that range,
     * padded, from a few dozen exact evaluations (slopes in ε′ by central difference at the nodes).</li>
     * <li>Everything but the conductors (L'_ext, C', G', ε_e with their slopes: Hammerstad-Jensen at ε′(f),
     * Kirschning-Jansen's dispersion, the filling factor) is a smooth function of ln f, so it is tabulated
     * against ln f at {@link #SUBSTRATE_TABLE_NODES_PER_UNIT_LOG} nodes per unit (two lookups a point instead of
     * five exponentials, a logarithm and a dozen multiplications), when the sweep has at least
     * {@link HermiteTable#POINTS_PER_NODE} points per node. Held within 3e-10 of point-by-point evaluation
     * (tested).</li>
     * </ul>
     */
    @Override
    protected void prepareForRange(double[] frequenciesHz, int count, double lowHz, double highHz) {
        super.prepareForRange(frequenciesHz, count, lowHz, highHz);
        if (count < 16) {
            return;
        }
        if (!(highHz > lowHz) || !(lowHz > 0)) {
            return;
        }
        if (constantStatic == null) {
            // the wideband model's ε′ falls monotonically with f: its range is set by the ends
            double low = permittivity.real(highHz) * (1 - 1e-3);
            double high = permittivity.real(lowHz) * (1 + 1e-3);
            HermiteTable existing = staticTable;
            if (low > 1.0 && !(existing != null && existing.covers(low) && existing.covers(high))) {
                staticTable = new HermiteTable(this::staticWithSlopes, low, high, STATIC_TABLE_NODES_PER_UNIT_LOG);
            }
        }
        HermiteTable[] existing = substrateTables;
        if (existing != null && existing[0].covers(lowHz) && existing[0].covers(highHz)) {
            return;
        }
        if (HermiteTable.pays(lowHz, highHz, SUBSTRATE_TABLE_NODES_PER_UNIT_LOG, count)) {
            LineParameters node = new LineParameters();
            double[] values = new double[8];
            double dOmegaDf = 2 * Math.PI;
            substrateTables = HermiteTable.several(2, (frequencyHz, out) -> {
                node.setFrequency(frequencyHz);
                substrate(node, values);
                out[0] = values[0];
                out[1] = values[1];
                out[2] = values[4] * dOmegaDf;
                out[3] = values[5] * dOmegaDf;
                out[4] = values[2];
                out[5] = values[3];
                out[6] = values[6] * dOmegaDf;
                out[7] = values[7] * dOmegaDf;
            }, lowHz, highHz, SUBSTRATE_TABLE_NODES_PER_UNIT_LOG);
        }
    }

    /** Kirschning-Jansen ε_eff(f). */
    public double effectivePermittivity(double frequencyHz) {
        LineParameters p = new LineParameters();
        evaluateWithSlopes(frequencyHz, p);
        return p.effectivePermittivity;
    }

    /** Internal impedance of strip and ground per metre, Ω/m. */
    public Complex conductorImpedance(double frequencyHz) {
        LineParameters p = new LineParameters();
        p.setFrequency(frequencyHz);
        beginPoint(p);
        if (conductorTerm != null) {
            conductorTerm.addTo(p);
        }
        return new Complex(p.impedanceRe, p.impedanceIm);
    }

    @Override
    public void evaluate(double frequencyHz, LineParameters out) {
        // every part has a closed-form derivative, so one code path serves both
        evaluateWithSlopes(frequencyHz, out);
    }

    /**
     * The parameters and their ω-derivatives, all in closed form. Conductors: the strip's and ground's surface
     * impedance with the roughness factor ({@link SkinEffectTerm}). The rest is a chain of closed forms in f and
     * ε′(f), differentiated by the chain rule: with Z_s the Hammerstad-Jensen static impedance at ε′, ε_e the
     * Kirschning-Jansen ε_eff(f), ff = (ε_e − 1)/(ε′ − 1) the filling factor and A = ωε″ + σ_d/ε0,
     * <pre>L'_ext = Z_s·sqrt(ε_e)/c,  C' = sqrt(ε_e)/(Z_s·c),  G' = A·ff/(c·sqrt(ε_e)·Z_s)</pre>
     * (G' = 2α_d/Z_s with the filling-factor α_d of the class comment, ε′·tan δ_eff = ε″ + σ_d/(ωε0)), so
     * L'_ω = L'·(Z_s,ω/Z_s + ε_e,ω/(2ε_e)), C'_ω = C'·(ε_e,ω/(2ε_e) − Z_s,ω/Z_s) and
     * G'_ω = (A_ω·ff + A·ff_ω)/(c·sqrt(ε_e)·Z_s) − G'·(ε_e,ω/(2ε_e) + Z_s,ω/Z_s).
     */
    @Override
    public void evaluatePoint(LineParameters out) {
        beginPoint(out);
        if (conductorTerm != null) {
            conductorTerm.addTo(out);
        }
        double[] k = out.substrate;
        HermiteTable[] tables = substrateTables;
        if (tables != null && tables[0].coversLog(out.logFrequency)) {
            // {L'_ext + jC'} and {G' + jε_e} against ln f: d/dω = (d/d ln f)/ω
            double[] f = out.lookup;
            double inverseOmega = out.inverseOmega;
            tables[0].evaluateLog(out.logFrequency, f);
            k[0] = f[0];
            k[1] = f[1];
            k[4] = f[2] * inverseOmega;
            k[5] = f[3] * inverseOmega;
            tables[1].evaluateLog(out.logFrequency, f);
            k[2] = f[0];
            k[3] = f[1];
            k[6] = f[2] * inverseOmega;
            k[7] = f[3] * inverseOmega;
        } else {
            substrate(out, k);
        }
        double internalIm = out.impedanceIm;
        double inverseOmega = out.inverseOmega;
        out.set(out.impedanceRe, k[0] + internalIm * inverseOmega, k[2], k[1], k[3]);
        out.setSlopes(out.impedanceReSlope, k[4] + (out.impedanceImSlope - internalIm * inverseOmega) * inverseOmega,
                k[6], k[5]);
    }

    /**
     * Everything but the conductors at the point {@code p} describes, with ω-derivatives (see
     * {@link #evaluatePoint} for the forms).
     *
     * @param into receives {L'_ext, C', G', ε_e, dL'_ext/dω, dC'/dω, dG'/dω, dε_e/dω}
     */
    private void substrate(LineParameters p, double[] into) {
        permittivity.evaluate(p);
        double omega = p.omega;
        double er = p.permittivityRe;
        double erSlope = p.permittivityReSlope;
        // Hammerstad-Jensen statics at ε′ and their derivatives in ε′
        double staticImpedance;
        double staticEffective;
        double staticImpedanceEr;
        double staticEffectiveEr;
        if (constantStatic != null) {
            staticImpedance = constantStatic[0];
            staticEffective = constantStatic[1];
            staticImpedanceEr = 0.0;
            staticEffectiveEr = 0.0;
        } else {
            double[] f = p.lookup;
            HermiteTable table = staticTable;
            if (table != null && table.covers(er)) {
                table.evaluate(er, f);
            } else {
                staticWithSlopes(er, f);
            }
            staticImpedance = f[0];
            staticEffective = f[1];
            staticImpedanceEr = f[2];
            staticEffectiveEr = f[3];
        }
        double[] k = p.dispersion;
        dispersion.evaluate(staticEffective, er, p.frequencyHz * heightMegametres, p.logFrequency + logHeightMegametres,
                k);
        double effective = k[0];
        double effectiveSlope = k[1] * heightMegametres / (2 * Math.PI)
                + (k[2] + k[3] * staticEffectiveEr) * erSlope;
        // three divisions: 1/Z_s, 1/sqrt(ε_e) and 1/(ε′ − 1); the rest multiplies
        double inverseImpedance = 1.0 / staticImpedance;
        double rootEffective = Math.sqrt(effective);
        double inverseRoot = 1.0 / rootEffective;
        double impedanceSlopeRatio = staticImpedanceEr * erSlope * inverseImpedance;
        double halfEffectiveSlopeRatio = 0.5 * effectiveSlope * inverseRoot * inverseRoot;
        double inductance = staticImpedance * rootEffective * INVERSE_SPEED_OF_LIGHT;
        double capacitance = rootEffective * inverseImpedance * INVERSE_SPEED_OF_LIGHT;
        double filling;
        double fillingSlope;
        if (er - 1.0 > 1e-12) {
            double inverseExcess = 1.0 / (er - 1.0);
            filling = (effective - 1.0) * inverseExcess;
            fillingSlope = (effectiveSlope - filling * erSlope) * inverseExcess;
        } else {
            filling = 1.0;
            fillingSlope = 0.0;
        }
        double loss = omega * p.permittivityIm + conductivityOverVacuumPermittivity;
        double lossSlope = p.permittivityIm + omega * p.permittivityImSlope;
        double lossScale = INVERSE_SPEED_OF_LIGHT * inverseRoot * inverseImpedance;
        double conductance = loss * filling * lossScale;
        into[0] = inductance;
        into[1] = capacitance;
        into[2] = conductance;
        into[3] = effective;
        into[4] = inductance * (impedanceSlopeRatio + halfEffectiveSlopeRatio);
        into[5] = capacitance * (halfEffectiveSlopeRatio - impedanceSlopeRatio);
        into[6] = (lossSlope * filling + loss * fillingSlope) * lossScale
                - conductance * (halfEffectiveSlopeRatio + impedanceSlopeRatio);
        into[7] = effectiveSlope;
    }

    /** Relative step of the central difference in ε′ for the static values' slopes. */
    static final double STATIC_SLOPE_STEP = 1e-5;

    /**
     * The Hammerstad-Jensen static values at ε′ and their slopes in ε′ (central difference: the closed forms'
     * own derivative in εr would be long and they vary slowly, so a relative step of 1e-5 gives about 1e-10).
     *
     * @param out receives {Z0, ε_eff(0), dZ0/dε′, dε_eff(0)/dε′}
     */
    private void staticWithSlopes(double relativePermittivity, double[] out) {
        double[] here = staticAt(relativePermittivity);
        double upper = relativePermittivity * (1 + STATIC_SLOPE_STEP);
        // one-sided at ε′ = 1: the formulas are not defined below it
        double lower = Math.max(1.0, relativePermittivity * (1 - STATIC_SLOPE_STEP));
        double[] above = staticAt(upper);
        double[] below = staticAt(lower);
        double span = upper - lower;
        out[0] = here[0];
        out[1] = here[1];
        out[2] = (above[0] - below[0]) / span;
        out[3] = (above[1] - below[1]) / span;
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
