package org.linesweep.signal;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.apache.commons.math3.complex.Complex;
import org.apache.commons.math3.special.Erf;
import org.apache.commons.math3.transform.DftNormalization;
import org.apache.commons.math3.transform.FastFourierTransformer;
import org.apache.commons.math3.transform.TransformType;
import org.linesweep.design.Units;
import org.linesweep.physics.DielectricModelKind;
import org.linesweep.physics.LineModel;
import org.linesweep.physics.LineParameters;
import org.linesweep.physics.LinePoint;
import org.linesweep.physics.LineTwoPort;
import org.linesweep.physics.Telegrapher;

/**
 * Time-domain response of a terminated line, computed through the frequency-domain line model.
 *
 * <p>Method. The line with both terminations is a linear system whose transfer functions from the source's
 * open-circuit voltage to the near-end and far-end voltages are exact in the frequency domain
 * ({@link LineTwoPort#terminatedVoltages}, every round trip included). We drive it with one Gaussian-profile
 * edge: the spectrum of the edge's derivative is exp(−(2πfσ)²/2)·exp(−j2πf·t0), so the product with the
 * transfer function is negligible above a few times 1/rise and the inverse FFT (Commons Math) of that
 * product, sampled finely, gives the response to the edge's derivative; its running integral is the
 * response to the edge itself. The record is made long enough for the reflections to die down before they
 * could wrap round. Pulses and square waves are sums of shifted, signed edges, so by linearity their
 * responses are the same sums of the one edge response (exact, and free of any periodic wrap-round).
 *
 * <p>Causality: the response is causal exactly when the model is. The wideband Debye dielectric and the
 * Bessel internal impedances are; a constant loss tangent and the Hammerstad roughness factor are not,
 * and we say so among the warnings.
 */
public final class TimeDomain {

    /** Time samples per rise time: 10 resolves the 10 % and 90 % crossings to well under 1 %. */
    static final double SAMPLES_PER_RISE = 10.0;
    /** Most samples returned over the shown duration. */
    public static final int MAX_SAMPLES = 100_000;
    /** Largest FFT record, 2^19 points: 8 MB of doubles for both transfer functions. */
    static final int MAX_RECORD = 1 << 19;
    /** Smallest FFT record. */
    static final int MIN_RECORD = 1 << 10;
    /** The edge spectrum is treated as zero below exp(−36), about 2e-16 of its DC value. */
    static final double SPECTRUM_EXPONENT_LIMIT = 36.0;
    /** Reflections are followed until the round-trip product falls below this. */
    static final double RINGDOWN_LEVEL = 1e-5;
    /**
     * The record is at least this many times the shown duration: lossy lines settle slowly (the skin
     * effect's erfc tail, the wideband dielectric's logarithmic creep), and whatever of the step has not
     * arrived by the end of the record wraps round to the start as a small precursor; four durations keep
     * it near 1e-5 of the step on the test lines.
     */
    static final double RECORD_PER_DURATION = 4.0;
    /** The first edge is centred this many rise times after t = 0, leaving a quiet lead-in before it. */
    public static final double EDGE_CENTRE_PER_RISE = 4.0;
    /** The edge is treated as not yet begun more than this many standard deviations before its centre. */
    static final double QUIET_SIGMAS = 6.0;
    /** Knee frequency of an edge: 0.35/rise (common practice). */
    public static final double KNEE_TIMES_RISE = 0.35;

    private TimeDomain() {
    }

    /**
     * A duration that shows what matters: the delay, several round trips or twenty rise times after it,
     * the pulse or two periods of the square wave, and the load capacitor's charging.
     */
    public static double defaultDurationSeconds(LineModel model, double lengthMetres, Stimulus stimulus,
            Terminations terminations) {
        double rise = stimulus.riseSeconds();
        LinePoint knee = model.at(KNEE_TIMES_RISE / rise);
        double delay = knee.delaySeconds(lengthMetres);
        double z0 = knee.z0MagnitudeOhm();
        double duration = EDGE_CENTRE_PER_RISE * rise + delay + Math.max(4 * delay, 20 * rise)
                + 5 * (terminations.sourceOhm() + z0) * terminations.loadFarad();
        if (stimulus.shape() == WaveShape.PULSE) {
            duration += stimulus.widthSeconds();
        } else if (stimulus.shape() == WaveShape.SQUARE) {
            duration = Math.max(duration, EDGE_CENTRE_PER_RISE * rise + delay + 2 * stimulus.periodSeconds());
        }
        return duration;
    }

    /**
     * Computes the waveforms.
     *
     * @param model the line
     * @param lengthMetres its length
     * @param stimulus the source waveform
     * @param terminations source and load
     * @param durationSeconds how long a record to return, s
     */
    public static Waveform simulate(LineModel model, double lengthMetres, Stimulus stimulus,
            Terminations terminations, double durationSeconds) {
        List<String> warnings = new ArrayList<>(causalityWarnings(model));
        double rise = stimulus.riseSeconds();
        double sigma = stimulus.edgeSigmaSeconds();
        double edgeCentre = EDGE_CENTRE_PER_RISE * rise;
        double step = Math.max(rise / SAMPLES_PER_RISE, durationSeconds / MAX_SAMPLES);
        if (step > rise / 4) {
            warnings.add(String.format(Locale.ROOT, "the duration is long for this rise time: samples are %s apart,"
                    + " so the edges are resolved coarsely (at most %d samples are returned)",
                    seconds(step), MAX_SAMPLES));
        }
        double kneeHz = KNEE_TIMES_RISE / rise;
        double modeHz = model.higherModeCutoffHz();
        if (!Double.isNaN(modeHz) && kneeHz > modeHz) {
            warnings.add(String.format(Locale.ROOT, "the edge's knee frequency 0.35/rise = %s is above the first"
                    + " higher-order mode (%s): the TEM model does not hold for this edge", hertz(kneeHz),
                    hertz(modeHz)));
        }
        double record = recordSeconds(model, lengthMetres, terminations, kneeHz, durationSeconds, edgeCentre);
        int size = MIN_RECORD;
        while (size < record / step && size < MAX_RECORD) {
            size <<= 1;
        }
        if (size * step < record) {
            warnings.add("the reflections last longer than the longest record computed ("
                    + seconds(size * step) + "): late echoes may wrap round to the start; lengthen the rise"
                    + " time or add loss or matching");
        }
        int shown = (int) Math.min(Math.floor(durationSeconds / step) + 1, size);
        double[][] near = {new double[size], new double[size]};
        double[][] far = {new double[size], new double[size]};
        double settled = fillSpectra(model, lengthMetres, terminations, sigma, edgeCentre, step, near, far);
        FastFourierTransformer.transformInPlace(near, DftNormalization.STANDARD, TransformType.INVERSE);
        FastFourierTransformer.transformInPlace(far, DftNormalization.STANDARD, TransformType.INVERSE);
        int quiet = (int) Math.floor((edgeCentre - QUIET_SIGMAS * sigma) / step);
        double[] nearEdge = runningIntegral(near[0], quiet);
        double[] farEdge = runningIntegral(far[0], quiet);

        double[] edgeTimes = edgeTimes(stimulus, edgeCentre, shown * step);
        double[] time = new double[shown];
        double[] source = new double[shown];
        double[] input = new double[shown];
        double[] output = new double[shown];
        for (int i = 0; i < shown; i++) {
            double t = i * step;
            time[i] = t;
            double sign = 1.0;
            for (double edge : edgeTimes) {
                source[i] += sign * gaussianEdge(t - edge, sigma);
                double shift = (t - (edge - edgeCentre)) / step;
                input[i] += sign * interpolate(nearEdge, shift);
                output[i] += sign * interpolate(farEdge, shift);
                sign = -sign;
            }
        }
        int searchEnd = size - size / 4;
        double half = crossing(farEdge, 0.5 * settled, searchEnd) * step;
        double delay = half - edgeCentre;
        double rise10 = crossing(farEdge, 0.1 * settled, searchEnd);
        double rise90 = crossing(farEdge, 0.9 * settled, searchEnd);
        double outputRise = (rise90 - rise10) * step;
        double peak = Double.NEGATIVE_INFINITY;
        for (int i = 0; i < Math.min(searchEnd, Math.max(shown, 1)); i++) {
            peak = Math.max(peak, farEdge[i]);
        }
        double overshoot = settled > 0 ? Math.max(0.0, (peak - settled) / settled * 100.0) : Double.NaN;
        return new Waveform(time, source, input, output, delay, outputRise, overshoot, settled,
                List.copyOf(warnings));
    }

    /** Warnings for the parts of the model that are not causal. */
    public static List<String> causalityWarnings(LineModel model) {
        List<String> warnings = new ArrayList<>();
        if (model.dielectric().model() == DielectricModelKind.CONSTANT && model.dielectric().lossTangent() > 0) {
            warnings.add("not causal: a constant loss tangent has no matching change of permittivity with"
                    + " frequency, so the response can start before the line's delay; choose the wideband"
                    + " Debye dielectric model for a causal waveform");
        }
        if (!model.conductor().isPerfect() && model.conductor().roughnessRmsMetres() > 0) {
            warnings.add("not causal: the Hammerstad roughness factor scales the loss without the matching"
                    + " inductance; the edge's shape near its start is approximate");
        }
        return warnings;
    }

    /** Long enough for the echoes to fall below {@link #RINGDOWN_LEVEL} and the load capacitor to charge. */
    private static double recordSeconds(LineModel model, double lengthMetres, Terminations terminations,
            double kneeHz, double durationSeconds, double edgeCentre) {
        LinePoint knee = model.at(kneeHz);
        Complex z0 = new Complex(knee.z0RealOhm(), knee.z0ImaginaryOhm());
        double delay = knee.delaySeconds(lengthMetres);
        double sourceReflection = LineTwoPort.reflection(terminations.sourceImpedance(), z0).abs();
        double loadReflection = Math.max(LineTwoPort.reflection(terminations.loadImpedance(0.0), z0).abs(),
                LineTwoPort.reflection(terminations.loadImpedance(kneeHz), z0).abs());
        double roundTrip = sourceReflection * loadReflection
                * Math.exp(-2 * knee.alphaNepersPerMetre() * lengthMetres);
        double trips = roundTrip < RINGDOWN_LEVEL ? 1 : Math.min(1e4, Math.log(RINGDOWN_LEVEL) / Math.log(roundTrip));
        double charging = 10 * (terminations.sourceOhm() + z0.abs()) * terminations.loadFarad();
        double tail = Math.max(2 * trips * delay, charging);
        return Math.max(RECORD_PER_DURATION * durationSeconds, durationSeconds + edgeCentre + delay + tail);
    }

    /**
     * Writes the spectra of the near- and far-end responses to one edge into the FFT arrays (Hermitian, so the
     * inverse is real).
     *
     * @return the far-end DC value: what the output settles to after one edge, V
     */
    private static double fillSpectra(LineModel model, double lengthMetres, Terminations terminations,
            double sigma, double edgeCentre, double step, double[][] near, double[][] far) {
        int size = near[0].length;
        double frequencyStep = 1.0 / (size * step);
        LineParameters parameters = new LineParameters();
        double[] solution = new double[Telegrapher.SIZE];
        Complex source = terminations.sourceImpedance();
        double settled = Double.NaN;
        for (int k = 0; k <= size / 2; k++) {
            // The DC bin is taken a millionth of a bin above zero, where every model is defined.
            double frequency = k == 0 ? frequencyStep * 1e-6 : k * frequencyStep;
            double angular = 2 * Math.PI * frequency;
            double exponent = 0.5 * (angular * sigma) * (angular * sigma);
            if (exponent > SPECTRUM_EXPONENT_LIMIT) {
                break;
            }
            model.evaluate(frequency, parameters);
            Telegrapher.solve(parameters.resistanceOhmPerMetre(), parameters.inductanceHenryPerMetre(),
                    parameters.conductanceSiemensPerMetre(), parameters.capacitanceFaradPerMetre(), angular,
                    solution);
            Complex z0 = new Complex(solution[Telegrapher.Z0_RE], solution[Telegrapher.Z0_IM]);
            Complex gammaLength = new Complex(solution[Telegrapher.ALPHA] * lengthMetres,
                    solution[Telegrapher.BETA] * lengthMetres);
            Complex[] voltages = LineTwoPort.terminatedVoltages(z0, gammaLength, source,
                    terminations.loadImpedance(frequency));
            if (k == 0) {
                // magnitudes with the real part's sign: the residual phase there is of order 1e-6 rad
                settled = Math.copySign(voltages[1].abs(), voltages[1].getReal());
                near[0][0] = Math.copySign(voltages[0].abs(), voltages[0].getReal());
                far[0][0] = settled;
                continue;
            }
            double edgePhase = -2 * Math.PI * k * frequencyStep * edgeCentre;
            Complex edge = new Complex(Math.cos(edgePhase), Math.sin(edgePhase)).multiply(Math.exp(-exponent));
            place(near, k, voltages[0].multiply(edge));
            place(far, k, voltages[1].multiply(edge));
        }
        return settled;
    }

    private static void place(double[][] spectrum, int k, Complex value) {
        int size = spectrum[0].length;
        if (k == size / 2) {
            spectrum[0][k] = value.getReal();
            return;
        }
        spectrum[0][k] = value.getReal();
        spectrum[1][k] = value.getImaginary();
        spectrum[0][size - k] = value.getReal();
        spectrum[1][size - k] = -value.getImaginary();
    }

    /**
     * Trapezoidal running sum, the integral from the start of the record to each sample, after removing the
     * constant the record's finite length adds.
     *
     * <p>Why: a lossy line approaches its DC value more slowly than any affordable record lasts (the
     * conductor's transition to its DC resistance, the dielectric's logarithmic creep). The DFT folds the
     * part of the response that falls after the record's end back over the record, and being slow, it
     * folds back as a near-constant offset of the derivative response: a ramp from t = 0 in the step
     * response, i.e. an artificial precursor. Before the source's edge begins (more than
     * {@link #QUIET_SIGMAS} σ ahead of its centre) nothing can have happened at either end of the line under
     * any model, so the mean there is that offset, and we subtract it.
     */
    private static double[] runningIntegral(double[] samples, int quietSamples) {
        double offset = 0.0;
        if (quietSamples > 0) {
            for (int i = 0; i < quietSamples; i++) {
                offset += samples[i];
            }
            offset /= quietSamples;
        }
        // trapezoid with the Euler-Maclaurin end correction −h²/12·(y′(t) − y′(0)), y′ by central differences:
        // fourth order, where the plain trapezoid would move each 10 %/90 % crossing by h²/12·s″/s′
        int last = samples.length - 1;
        double[] integral = new double[samples.length];
        double sum = 0.0;
        for (int i = 0; i <= last; i++) {
            double sample = samples[i] - offset;
            double slope = (samples[Math.min(i + 1, last)] - samples[Math.max(i - 1, 0)]) / 2;
            integral[i] = sum + 0.5 * sample - slope / 12;
            sum += sample;
        }
        return integral;
    }

    /** The times of the stimulus's edges, alternately rising and falling, within the record. */
    static double[] edgeTimes(Stimulus stimulus, double firstEdge, double endSeconds) {
        return switch (stimulus.shape()) {
            case STEP -> new double[] {firstEdge};
            case PULSE -> new double[] {firstEdge, firstEdge + stimulus.widthSeconds()};
            case SQUARE -> {
                double half = stimulus.periodSeconds() / 2;
                int count = (int) Math.max(1, Math.min(100_000, Math.ceil((endSeconds - firstEdge) / half) + 1));
                double[] times = new double[count];
                for (int i = 0; i < count; i++) {
                    times[i] = firstEdge + i * half;
                }
                yield times;
            }
        };
    }

    /** The 0-to-1 Gaussian edge centred on 0. */
    private static double gaussianEdge(double t, double sigma) {
        return 0.5 * Erf.erfc(-t / (sigma * Math.sqrt(2.0)));
    }

    /**
     * Four-point (cubic Lagrange) interpolation at a fractional index; zero before the start, where nothing
     * has happened yet. Cubic rather than linear: at ten samples per rise time a straight chord misplaces
     * the 10 % and 90 % crossings of a Gaussian edge by about 0.4 % of the rise each.
     */
    static double interpolate(double[] samples, double index) {
        if (index < 0) {
            return index < -1e-9 ? 0.0 : samples[0];
        }
        int last = samples.length - 1;
        if (index >= last) {
            return samples[last];
        }
        int base = Math.max(1, Math.min(last - 2, (int) Math.floor(index)));
        double x = index - base;
        double p0 = samples[base - 1];
        double p1 = samples[base];
        double p2 = samples[base + 1];
        double p3 = samples[base + 2];
        return -x * (x - 1) * (x - 2) / 6 * p0 + (x + 1) * (x - 1) * (x - 2) / 2 * p1
                - (x + 1) * x * (x - 2) / 2 * p2 + (x + 1) * x * (x - 1) / 6 * p3;
    }

    /**
     * First fractional index at which the samples reach the level from below, refined on the cubic
     * interpolant by bisection; NaN if never.
     */
    static double crossing(double[] samples, double level, int end) {
        for (int i = 1; i < end; i++) {
            if (samples[i - 1] < level && samples[i] >= level) {
                double low = i - 1;
                double high = i;
                for (int iteration = 0; iteration < 50; iteration++) {
                    double middle = 0.5 * (low + high);
                    if (interpolate(samples, middle) < level) {
                        low = middle;
                    } else {
                        high = middle;
                    }
                }
                return 0.5 * (low + high);
            }
        }
        return Double.NaN;
    }

    private static String seconds(double value) {
        return Units.engineering(value, "s", 4);
    }

    private static String hertz(double value) {
        return Units.engineering(value, "Hz", 4);
    }
}
