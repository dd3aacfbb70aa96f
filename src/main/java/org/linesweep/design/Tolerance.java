package org.linesweep.design;

import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;
import java.util.concurrent.ForkJoinPool;
import java.util.concurrent.atomic.AtomicInteger;
import java.util.function.BooleanSupplier;
import java.util.function.IntConsumer;
import java.util.stream.IntStream;
import org.apache.commons.math3.stat.descriptive.rank.Percentile;
import org.linesweep.physics.LinePoint;

/**
 * Manufacturing tolerances by Monte Carlo: each sample draws every varied input independently (uniform over
 * ±a, or normal with ±a taken as three standard deviations, common practice), and |Z0|, attenuation and delay
 * per metre are evaluated at one frequency. Sample i draws from a random stream derived from the seed and i
 * alone, so the result is the same whatever the number of threads. Beside the Monte Carlo percentiles comes
 * the naive root-sum-square estimate: each input's half-range effect (Q(x + a) − Q(x − a))/2 scaled to one
 * standard deviation of its distribution, combined in quadrature, ±1.645 σ for the 5-95 % band.
 */
public final class Tolerance {

    /** How a varied input is distributed. */
    public enum Distribution { UNIFORM, NORMAL }

    /**
     * One varied input.
     *
     * @param input the input (from {@link Sensitivity#inputs})
     * @param amount the ± amount: a fraction when {@code relative}, else in the input's SI unit (K for temperature)
     * @param relative true for a percentage tolerance
     */
    public record Variation(Sensitivity.Input input, double amount, boolean relative) {
        double halfRange(double nominal) {
            return relative ? Math.abs(nominal) * amount : amount;
        }
    }

    /** 5th, 50th and 95th percentiles of a quantity and the root-sum-square 5-95 % band around the nominal. */
    public record Band(double nominal, double p5, double p50, double p95, double rssP5, double rssP95) {
    }

    /** The outcome. */
    public record Result(int samples, int valid, double frequencyHz, Band z0Ohm, Band attenuationDbPerMetre,
            Band delaySecondsPerMetre, double yield) {
    }

    private static final double Z_95 = 1.6448536269514722;

    private Tolerance() {
    }

    /** FIELD=±X[%]: X in the input's own unit (a length, K, or a plain number) or in per cent. */
    public static Variation parseVariation(Design design, String item) {
        int equals = item.indexOf('=');
        if (equals < 1) {
            throw new InvalidInputException("--vary", item, "expected FIELD=±X or FIELD=±X%, e.g. width=±0.5mil");
        }
        Sensitivity.Input input = input(design, item.substring(0, equals).strip());
        String amount = item.substring(equals + 1).strip().replace("+-", "±");
        if (amount.startsWith("±")) {
            amount = amount.substring(1).strip();
        }
        if (amount.endsWith("%")) {
            double percent = percentOf(item, amount.substring(0, amount.length() - 1));
            return new Variation(input, percent / 100, true);
        }
        UnitKind kind = input.name().startsWith("line.") || input.name().equals("length")
                || input.name().endsWith("roughnessRms") ? UnitKind.LENGTH
                : UnitKind.NUMBER;
        double value = input.name().endsWith("conductivity") ? Units.parse("--vary", amount, UnitKind.CONDUCTIVITY)
                : Units.parse("--vary", amount, kind);
        if (!(value >= 0)) {
            throw new InvalidInputException("--vary", item, "the tolerance must not be negative");
        }
        return new Variation(input, value, false);
    }

    private static double percentOf(String item, String text) {
        try {
            double value = Double.parseDouble(text.strip());
            if (value >= 0 && value <= 100) {
                return value;
            }
        } catch (NumberFormatException e) {
            // refused below
        }
        throw new InvalidInputException("--vary", item, "expected a percentage from 0 to 100, e.g. height=±10%");
    }

    /** Finds an input by its design-file path or its last part (e.g. {@code width}, {@code permittivity}). */
    public static Sensitivity.Input input(Design design, String name) {
        for (Sensitivity.Input input : Sensitivity.inputs(design)) {
            if (input.name().equals(name) || input.name().endsWith("." + name)) {
                return input;
            }
        }
        List<String> names = Sensitivity.inputs(design).stream().map(Sensitivity.Input::name).toList();
        throw new InvalidInputException("--vary", name, "this design can vary " + names);
    }

    /**
     * Runs the Monte Carlo.
     *
     * @param specTargetOhm target |Z0| for the yield, or NaN for none
     * @param specFraction allowed relative deviation from the target (0.1 for ±10 %)
     * @param threads worker threads (1 for sequential); the result does not depend on it
     * @param progress told the number of samples done, now and then
     * @param cancelled polled; a cancelled run throws {@link java.util.concurrent.CancellationException}
     */
    public static Result run(Design design, List<Variation> variations, Distribution distribution, int samples,
            long seed, double frequencyHz, double specTargetOhm, double specFraction, int threads,
            IntConsumer progress, BooleanSupplier cancelled) {
        double[] z0 = new double[samples];
        double[] alpha = new double[samples];
        double[] delay = new double[samples];
        double[] nominals = nominals(design, variations);
        boolean[] ok = forEachSample(samples, threads, progress, cancelled, i -> {
            LinePoint p = sample(design, variations, nominals, distribution, seed, i).toModel().at(frequencyHz);
            z0[i] = p.z0MagnitudeOhm();
            alpha[i] = p.alphaDbPerMetre();
            delay[i] = p.delaySeconds(1.0);
        });
        int valid = 0;
        int inSpec = 0;
        List<double[]> kept = List.of(new double[samples], new double[samples], new double[samples]);
        for (int i = 0; i < samples; i++) {
            if (ok[i]) {
                kept.get(0)[valid] = z0[i];
                kept.get(1)[valid] = alpha[i];
                kept.get(2)[valid] = delay[i];
                valid++;
                if (Math.abs(z0[i] / specTargetOhm - 1) <= specFraction) {
                    inSpec++;
                }
            }
        }
        LinePoint nominal = design.toModel().at(frequencyHz);
        double[][] rss = rss(design, variations, nominals, distribution, frequencyHz);
        double[] nominalValues = {nominal.z0MagnitudeOhm(), nominal.alphaDbPerMetre(), nominal.delaySeconds(1.0)};
        List<Band> bands = new ArrayList<>();
        for (int q = 0; q < 3; q++) {
            double[] values = java.util.Arrays.copyOf(kept.get(q), valid);
            Percentile percentile = new Percentile().withEstimationType(Percentile.EstimationType.R_7);
            percentile.setData(values);
            double sigma = Math.sqrt(rss[q][0]);
            bands.add(new Band(nominalValues[q], percentile.evaluate(5), percentile.evaluate(50),
                    percentile.evaluate(95), nominalValues[q] - Z_95 * sigma, nominalValues[q] + Z_95 * sigma));
        }
        double yield = Double.isNaN(specTargetOhm) || valid == 0 ? Double.NaN : (double) inSpec / samples;
        return new Result(samples, valid, frequencyHz, bands.get(0), bands.get(1), bands.get(2), yield);
    }

    /**
     * 5-95 % bands across frequency: for each sample (drawn exactly as {@link #run} draws it), |Z0|,
     * attenuation and phase velocity at every given frequency; then the 5th, 50th and 95th percentiles per
     * frequency.
     *
     * @return [quantity: |Z0|, α dB/m, v_p][percentile: 5, 50, 95][frequency]
     */
    public static double[][][] bands(Design design, List<Variation> variations, Distribution distribution, int samples,
            long seed, double[] frequenciesHz, int threads, IntConsumer progress, BooleanSupplier cancelled) {
        int n = frequenciesHz.length;
        double[][][] values = new double[3][n][samples];
        double[] nominals = nominals(design, variations);
        boolean[] ok = forEachSample(samples, threads, progress, cancelled, i -> {
            var model = sample(design, variations, nominals, distribution, seed, i).toModel();
            for (int k = 0; k < n; k++) {
                LinePoint p = model.at(frequenciesHz[k]);
                values[0][k][i] = p.z0MagnitudeOhm();
                values[1][k][i] = p.alphaDbPerMetre();
                values[2][k][i] = p.phaseVelocityMetresPerSecond();
            }
        });
        double[][][] bands = new double[3][3][n];
        for (int q = 0; q < 3; q++) {
            for (int k = 0; k < n; k++) {
                double[] kept = new double[samples];
                int valid = 0;
                for (int i = 0; i < samples; i++) {
                    if (ok[i]) {
                        kept[valid++] = values[q][k][i];
                    }
                }
                Percentile percentile = new Percentile().withEstimationType(Percentile.EstimationType.R_7);
                percentile.setData(java.util.Arrays.copyOf(kept, valid));
                bands[q][0][k] = valid == 0 ? Double.NaN : percentile.evaluate(5);
                bands[q][1][k] = valid == 0 ? Double.NaN : percentile.evaluate(50);
                bands[q][2][k] = valid == 0 ? Double.NaN : percentile.evaluate(95);
            }
        }
        return bands;
    }

    /** Σ (half-range effect × σ/a)² per quantity: the root-sum-square variance estimate. */
    private static double[][] rss(Design design, List<Variation> variations, double[] nominals,
            Distribution distribution, double frequencyHz) {
        double[][] variance = new double[3][1];
        // one standard deviation of the input, as a fraction of its half-range a
        double sigmaOverHalfRange = distribution == Distribution.UNIFORM ? 1 / Math.sqrt(3) : 1.0 / 3.0;
        for (int v = 0; v < variations.size(); v++) {
            Variation variation = variations.get(v);
            double half = variation.halfRange(nominals[v]);
            double[] up = quantitiesOrNaN(variation.input().set(), design, nominals[v] + half, frequencyHz);
            double[] down = quantitiesOrNaN(variation.input().set(), design, nominals[v] - half, frequencyHz);
            for (int q = 0; q < 3; q++) {
                double effect = (up[q] - down[q]) / 2 * sigmaOverHalfRange;
                if (Double.isFinite(effect)) {
                    variance[q][0] += effect * effect;
                }
            }
        }
        return variance;
    }

    private static double[] quantitiesOrNaN(java.util.function.BiFunction<Design, Double, Design> set, Design design,
            double value, double frequencyHz) {
        try {
            LinePoint p = set.apply(design, value).toModel().at(frequencyHz);
            return new double[] {p.z0MagnitudeOhm(), p.alphaDbPerMetre(), p.delaySeconds(1.0)};
        } catch (InvalidInputException e) {
            return new double[] {Double.NaN, Double.NaN, Double.NaN};
        }
    }

    /** One sample's work; it throws {@link InvalidInputException} for a draw the geometry does not allow. */
    @FunctionalInterface
    private interface SampleWork {
        void run(int index);
    }

    /**
     * Runs the work for every sample index on a pool of the given size, reporting progress and honouring
     * cancellation.
     *
     * @return which samples could be built (a draw outside what the geometry allows, e.g. an inner diameter
     *         above the outer one, is not)
     */
    private static boolean[] forEachSample(int samples, int threads, IntConsumer progress, BooleanSupplier cancelled,
            SampleWork work) {
        boolean[] ok = new boolean[samples];
        AtomicInteger done = new AtomicInteger();
        ForkJoinPool pool = new ForkJoinPool(Math.max(1, threads));
        try {
            pool.submit(() -> IntStream.range(0, samples).parallel().forEach(i -> {
                if (cancelled.getAsBoolean()) {
                    return;
                }
                try {
                    work.run(i);
                    ok[i] = true;
                } catch (InvalidInputException e) {
                    ok[i] = false;
                }
                int count = done.incrementAndGet();
                if (count % 50 == 0) {
                    progress.accept(count);
                }
            })).join();
        } finally {
            pool.shutdown();
        }
        if (cancelled.getAsBoolean()) {
            throw new java.util.concurrent.CancellationException("tolerance run cancelled");
        }
        progress.accept(samples);
        return ok;
    }

    private static double[] nominals(Design design, List<Variation> variations) {
        double[] nominals = new double[variations.size()];
        for (int v = 0; v < nominals.length; v++) {
            nominals[v] = variations.get(v).input().get().applyAsDouble(design);
        }
        return nominals;
    }

    /**
     * Sample i: every varied input drawn from sample i's own random stream (derived from the seed and i alone,
     * so the draw does not depend on which thread makes it).
     *
     * @throws InvalidInputException when the draw gives a design the geometry does not allow
     */
    private static Design sample(Design design, List<Variation> variations, double[] nominals,
            Distribution distribution, long seed, int i) {
        SplittableRandom random = new SplittableRandom(mix(seed, i));
        Design sample = design;
        for (int v = 0; v < nominals.length; v++) {
            Variation variation = variations.get(v);
            double half = variation.halfRange(nominals[v]);
            double draw = distribution == Distribution.UNIFORM ? random.nextDouble(-1.0, 1.0) * half
                    : gaussian(random) * half / 3.0;
            sample = variation.input().set().apply(sample, nominals[v] + draw);
        }
        return sample;
    }

    /** A standard normal draw (Box-Muller), from the sample's own stream. */
    private static double gaussian(SplittableRandom random) {
        double u = random.nextDouble();
        double v = random.nextDouble();
        return Math.sqrt(-2 * Math.log1p(-u)) * Math.cos(2 * Math.PI * v);
    }

    /** The seed of sample i's stream: the seed and the index mixed (SplitMix64's finaliser). */
    static long mix(long seed, long index) {
        long z = seed + 0x9E3779B97F4A7C15L * (index + 1);
        z = (z ^ (z >>> 30)) * 0xBF58476D1CE4E5B9L;
        z = (z ^ (z >>> 27)) * 0x94D049BB133111EBL;
        return z ^ (z >>> 31);
    }
}
