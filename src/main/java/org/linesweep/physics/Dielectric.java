package org.linesweep.physics;

/**
 * A dielectric: complex relative permittivity ε(ω) = ε′ − jε″ (time dependence e^(+jωt)), an optional
 * bulk conductivity and a relative permeability.
 *
 * <p>With {@link DielectricModelKind#WIDEBAND_DEBYE} the permittivity follows the wideband Debye model
 * of A. R. Djordjevic, R. M. Biljić, V. D. Likar-Smiljanić and T. K. Sarkar, "Wideband frequency-domain
 * characterization of FR-4 and time-domain causality", IEEE Trans. EMC 43(4), 2001, pp. 662-667:
 * <pre>ε(ω) = ε∞ + K·log10[(ω2 + jω)/(ω1 + jω)]</pre>
 * fitted so that ε′ and tan δ equal the given values at the reference frequency. The band edges are
 * given here in hertz (ω = 2πf); the paper states them in rad/s. The model is analytic in the lower
 * half ω-plane, so it satisfies the Kramers-Kronig relations.
 *
 * @param relativePermittivity ε′ at the reference frequency, ≥ 1
 * @param lossTangent ε″/ε′ at the reference frequency, ≥ 0
 * @param referenceFrequencyHz where ε′ and tan δ are stated, Hz (used by the wideband model only)
 * @param conductivitySiemensPerMetre bulk conductivity σ_d, ≥ 0
 * @param relativePermeability μr of the dielectric, ≥ 1
 * @param model how ε varies with frequency
 * @param bandLowHz lower band edge f1 of the wideband model, Hz
 * @param bandHighHz upper band edge f2 of the wideband model, Hz
 */
public record Dielectric(double relativePermittivity, double lossTangent, double referenceFrequencyHz,
        double conductivitySiemensPerMetre, double relativePermeability, DielectricModelKind model,
        double bandLowHz, double bandHighHz) {

    /** Default lower band edge of the wideband Debye model: 1 kHz. */
    public static final double DEFAULT_BAND_LOW_HZ = 1e3;
    /** Default upper band edge of the wideband Debye model: 1 THz. */
    public static final double DEFAULT_BAND_HIGH_HZ = 1e12;

    private static final double LN10 = Math.log(10.0);

    /** Fitted slope K = Δε/(m2 − m1) of the wideband model; 0 for the constant model. */
    private double slope() {
        double omegaRef = 2 * Math.PI * referenceFrequencyHz;
        double omega1 = 2 * Math.PI * bandLowHz;
        double omega2 = 2 * Math.PI * bandHighHz;
        double imagLog = (Math.atan(omegaRef / omega2) - Math.atan(omegaRef / omega1)) / LN10;
        return -relativePermittivity * lossTangent / imagLog;
    }

    /** A dielectric from the catalogue, with its default model and band edges. */
    public static Dielectric of(DielectricMaterial material) {
        return new Dielectric(material.relativePermittivity(), material.lossTangent(),
                material.referenceFrequencyHz(), 0.0, 1.0, material.defaultModel(),
                DEFAULT_BAND_LOW_HZ, DEFAULT_BAND_HIGH_HZ);
    }

    /** A lossless dielectric of constant permittivity. */
    public static Dielectric lossless(double relativePermittivity) {
        return new Dielectric(relativePermittivity, 0.0, 1e9, 0.0, 1.0, DielectricModelKind.CONSTANT,
                DEFAULT_BAND_LOW_HZ, DEFAULT_BAND_HIGH_HZ);
    }

    /**
     * Returns a frequency-evaluating form of this dielectric with the wideband fit done once.
     */
    public Evaluator evaluator() {
        return new Evaluator(this);
    }

    /** Recently built permittivity tables by dielectric: a drag of the geometry keeps the dielectric. */
    private static final RecentTables<Dielectric> RECENT_TABLES = new RecentTables<>(8);

    /** A table of ε(f) covering [lowHz, highHz]: a recent one of this dielectric if it covers the range, else new. */
    private static HermiteTable sharedTable(Dielectric dielectric, Evaluator evaluator, double lowHz, double highHz) {
        return RECENT_TABLES.covering(dielectric, lowHz, highHz, () -> new HermiteTable((frequencyHz, out) -> {
            double dOmegaDf = 2 * Math.PI;
            out[0] = evaluator.real(frequencyHz);
            out[1] = evaluator.imaginary(frequencyHz);
            out[2] = evaluator.realSlope(frequencyHz) * dOmegaDf;
            out[3] = evaluator.imaginarySlope(frequencyHz) * dOmegaDf;
        }, lowHz, highHz, Evaluator.TABLE_NODES_PER_UNIT_LOG));
    }

    /** Evaluates ε′(f) and ε″(f) cheaply: the wideband fit is computed once. */
    public static final class Evaluator {
        private final boolean wideband;
        private final double constantReal;
        private final double constantImag;
        private final double slope;
        private final double epsilonInfinity;
        private final double omega1;
        private final double omega2;
        private final double conductivity;
        private final Dielectric dielectric;
        /** ε(f) of the wideband model tabulated over a sweep's range, or null. */
        private volatile HermiteTable table;

        private Evaluator(Dielectric d) {
            this.dielectric = d;
            this.wideband = d.model == DielectricModelKind.WIDEBAND_DEBYE && d.lossTangent > 0;
            this.constantReal = d.relativePermittivity;
            this.constantImag = d.relativePermittivity * d.lossTangent;
            this.omega1 = 2 * Math.PI * d.bandLowHz;
            this.omega2 = 2 * Math.PI * d.bandHighHz;
            this.conductivity = d.conductivitySiemensPerMetre;
            if (wideband) {
                this.slope = d.slope();
                double omegaRef = 2 * Math.PI * d.referenceFrequencyHz;
                this.epsilonInfinity = d.relativePermittivity - slope * realLog(omegaRef);
            } else {
                this.slope = 0.0;
                this.epsilonInfinity = d.relativePermittivity;
            }
        }

        private double realLog(double omega) {
            return 0.5 * Math.log((omega2 * omega2 + omega * omega) / (omega1 * omega1 + omega * omega)) / LN10;
        }

        /** Real relative permittivity ε′ at the frequency. */
        public double real(double frequencyHz) {
            if (!wideband) {
                return constantReal;
            }
            return epsilonInfinity + slope * realLog(2 * Math.PI * frequencyHz);
        }

        /** Imaginary relative permittivity ε″ (≥ 0) at the frequency, excluding bulk conduction. */
        public double imaginary(double frequencyHz) {
            if (!wideband) {
                return constantImag;
            }
            double omega = 2 * Math.PI * frequencyHz;
            return slope * (Math.atan(omega / omega1) - Math.atan(omega / omega2)) / LN10;
        }

        /** dε′/dω at the frequency, per rad/s: (K/ln 10)·[ω/(ω2² + ω²) − ω/(ω1² + ω²)]; 0 for the constant model. */
        public double realSlope(double frequencyHz) {
            if (!wideband) {
                return 0.0;
            }
            double omega = 2 * Math.PI * frequencyHz;
            return slope / LN10 * (omega / (omega2 * omega2 + omega * omega) - omega / (omega1 * omega1 + omega * omega));
        }

        /** dε″/dω at the frequency, per rad/s: (K/ln 10)·[ω1/(ω1² + ω²) − ω2/(ω2² + ω²)]; 0 for the constant model. */
        public double imaginarySlope(double frequencyHz) {
            if (!wideband) {
                return 0.0;
            }
            double omega = 2 * Math.PI * frequencyHz;
            return slope / LN10 * (omega1 / (omega1 * omega1 + omega * omega) - omega2 / (omega2 * omega2 + omega * omega));
        }

        /**
         * Writes ε′, ε″ and their ω-derivatives at the point {@code p} describes (its f, ln f and ω) into p:
         * from the sweep's table where one covers ln f, else from the closed forms.
         */
        void evaluate(LineParameters p) {
            if (!wideband) {
                p.permittivityRe = constantReal;
                p.permittivityIm = constantImag;
                p.permittivityReSlope = 0.0;
                p.permittivityImSlope = 0.0;
                return;
            }
            HermiteTable sweepTable = table;
            if (sweepTable != null && sweepTable.coversLog(p.logFrequency)) {
                double[] f = p.lookup;
                sweepTable.evaluateLog(p.logFrequency, f);
                // the table's variable is ln f = ln ω − ln 2π, so d/dω = (d/d ln f)/ω
                p.permittivityRe = f[0];
                p.permittivityIm = f[1];
                p.permittivityReSlope = f[2] * p.inverseOmega;
                p.permittivityImSlope = f[3] * p.inverseOmega;
                return;
            }
            double frequencyHz = p.frequencyHz;
            p.permittivityRe = real(frequencyHz);
            p.permittivityIm = imaginary(frequencyHz);
            p.permittivityReSlope = realSlope(frequencyHz);
            p.permittivityImSlope = imaginarySlope(frequencyHz);
        }

        /** Nodes per unit of ln f in a sweep's permittivity table. */
        static final int TABLE_NODES_PER_UNIT_LOG = 64;
        /**
         * Tabulates the wideband model's ε(f) over [lowHz, highHz] when a sweep of {@code count} points there
         * has at least {@link HermiteTable#POINTS_PER_NODE} points per node (a node costs one closed-form evaluation, a
         * logarithm and two arc tangents; a lookup a fraction of that), reusing a recent table of the same
         * dielectric when it covers the range. The model is smooth on the scale of one unit of ln f, so 64
         * nodes per unit hold the value within about 2.5e-10 and the slope within about 5e-10 of the closed form
         * (tested; the worst is ε″ far outside the model's band, where it is small).
         */
        void prepareForSweep(double lowHz, double highHz, int count) {
            if (!wideband || !(highHz > lowHz) || !(lowHz > 0)) {
                return;
            }
            HermiteTable existing = table;
            if (existing != null && existing.covers(lowHz) && existing.covers(highHz)) {
                return;
            }
            if (HermiteTable.pays(lowHz, highHz, TABLE_NODES_PER_UNIT_LOG, count)) {
                table = sharedTable(dielectric, this, lowHz, highHz);
            }
        }

        /** True when ε′ and ε″ do not change with frequency. */
        public boolean isConstant() {
            return !wideband;
        }

        /** The table this evaluator reads, or null (for tests). */
        HermiteTable table() {
            return table;
        }

        /** ε∞ of the wideband fit (the constant ε′ for the constant model). */
        public double epsilonInfinity() {
            return epsilonInfinity;
        }

        /**
         * Effective loss tangent including conduction, (ωε0ε″ + σ_d)/(ωε0ε′).
         */
        public double effectiveLossTangent(double frequencyHz) {
            double omega = 2 * Math.PI * frequencyHz;
            return (imaginary(frequencyHz)
                    + conductivity / (omega * PhysicalConstants.VACUUM_PERMITTIVITY_FARAD_PER_METRE))
                    / real(frequencyHz);
        }

        /** Bulk conductivity σ_d, S/m. */
        public double conductivity() {
            return conductivity;
        }
    }
}
