package org.linesweep.bench;

import java.util.Collection;
import java.util.HashMap;
import java.util.Locale;
import java.util.Map;
import org.openjdk.jmh.results.RunResult;
import org.openjdk.jmh.runner.Runner;
import org.openjdk.jmh.runner.RunnerException;
import org.openjdk.jmh.runner.options.Options;
import org.openjdk.jmh.runner.options.OptionsBuilder;

/**
 * Runs the JMH benchmarks and prints one summary line per line type:
 * {@code RESULT sweep type=coax points=2000 ns_per_point=… floor_ns_per_point=… ratio=…}, then the limits
 * design-change and drag-step figures. Arguments are passed to JMH's options as a regex filter when given.
 */
public final class BenchReport {

    private BenchReport() {
    }

    public static void main(String[] args) throws RunnerException {
        String include = args.length > 0 ? args[0]
                : SweepBenchmark.class.getSimpleName() + "|" + SignalBenchmark.class.getSimpleName();
        Options options = new OptionsBuilder().include(include).build();
        Collection<RunResult> results = new Runner(options).run();
        Map<String, Double> sweep = new HashMap<>();
        Map<String, Double> floor = new HashMap<>();
        Map<String, Double> limits = new HashMap<>();
        Map<String, Double> change = new HashMap<>();
        Map<String, Double> drag = new HashMap<>();
        Map<String, Double> tolerance = new HashMap<>();
        Map<String, Double> waveform = new HashMap<>();
        for (RunResult result : results) {
            String type = result.getParams().getParam("type");
            String method = result.getParams().getBenchmark();
            double score = result.getPrimaryResult().getScore(); // in the benchmark's own time unit
            String name = method.substring(method.lastIndexOf('.') + 1);
            switch (name) {
                case "sweep" -> sweep.put(type, score);
                case "floor" -> floor.put(type, score);
                case "limits" -> limits.put(type, score);
                case "designChange" -> change.put(type, score);
                case "dragStep" -> drag.put(type, score);
                case "tolerance" -> tolerance.put(type, score); // milliseconds
                case "waveform" -> waveform.put(type, score);
                default -> { }
            }
        }
        System.out.println();
        for (String type : new String[] {"COAX", "TWO_WIRE", "WIRE_OVER_GROUND", "PARALLEL_PLATE", "MICROSTRIP",
            "STRIPLINE"}) {
            if (sweep.containsKey(type) && floor.containsKey(type)) {
                double ns = 1000 * sweep.get(type) / SweepBenchmark.POINTS;
                double floorNs = 1000 * floor.get(type) / SweepBenchmark.POINTS;
                System.out.printf(Locale.ROOT,
                        "RESULT sweep type=%s points=%d ns_per_point=%.1f floor_ns_per_point=%.2f ratio=%.1f"
                                + " points_per_second=%.3g sweep_ms=%.3f%n",
                        type.toLowerCase(Locale.ROOT).replace('_', '-'), SweepBenchmark.POINTS, ns, floorNs,
                        ns / floorNs, 1e9 / ns, sweep.get(type) / 1000);
            }
        }
        for (String type : limits.keySet()) {
            System.out.printf(Locale.ROOT, "RESULT limits type=%s us=%.1f%n",
                    type.toLowerCase(Locale.ROOT).replace('_', '-'), limits.get(type));
        }
        for (String type : change.keySet()) {
            System.out.printf(Locale.ROOT, "RESULT design-change type=%s points=%d ms=%.3f%n",
                    type.toLowerCase(Locale.ROOT).replace('_', '-'), SweepBenchmark.POINTS, change.get(type) / 1000);
        }
        for (String type : drag.keySet()) {
            System.out.printf(Locale.ROOT, "RESULT drag-step type=%s points=%d ms=%.3f%n",
                    type.toLowerCase(Locale.ROOT).replace('_', '-'), SweepBenchmark.POINTS, drag.get(type) / 1000);
        }
        for (String type : tolerance.keySet()) {
            System.out.printf(Locale.ROOT, "RESULT tolerance type=%s samples=%d ms=%.1f%n",
                    type.toLowerCase(Locale.ROOT).replace('_', '-'), SignalBenchmark.SAMPLES, tolerance.get(type));
        }
        for (String type : waveform.keySet()) {
            System.out.printf(Locale.ROOT, "RESULT waveform type=%s ms=%.2f%n",
                    type.toLowerCase(Locale.ROOT).replace('_', '-'), waveform.get(type));
        }
    }
}
