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

        private Evaluator(Dielectric d) {
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
