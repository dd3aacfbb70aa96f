package org.linesweep.cli;

import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.PrintWriter;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.Callable;
import org.linesweep.design.Design;
import org.linesweep.design.InvalidInputException;
import org.linesweep.design.Rule;
import org.linesweep.design.Synthesis;
import org.linesweep.design.Tolerance;
import org.linesweep.io.DesignFiles;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

/** {@code linesweep tolerance}: Monte Carlo of manufacturing tolerances. */
@Command(name = "tolerance", mixinStandardHelpOptions = true,
        description = "Vary inputs within their tolerances (Monte Carlo, reproducible with --seed) and print the 5, 50"
                + " and 95 %% points of |Z0|, attenuation and delay per metre at one frequency, the root-sum-square"
                + " estimate beside them, and the yield against a |Z0| spec.")
final class ToleranceCommand implements Callable<Integer> {

    @Mixin
    CommonOptions common;

    @Spec
    CommandSpec spec;

    @Option(names = "--vary", required = true, paramLabel = "FIELD=±X[%]",
            description = "An input and its tolerance, e.g. width=±0.5mil, height=±10%%, permittivity=±0.1,"
                    + " temperature=±10 (kelvin). Repeat for each input.")
    List<String> vary;

    @Option(names = "--samples", defaultValue = "2000", paramLabel = "N", description = "Samples (default 2000).")
    String samples;

    @Option(names = "--seed", defaultValue = "1", paramLabel = "S", description = "Random seed (default 1).")
    String seed;

    @Option(names = "--distribution", defaultValue = "uniform", paramLabel = "uniform|normal",
            description = "Uniform over ±X, or normal with ±X as three standard deviations.")
    String distribution;

    @Option(names = "--at", paramLabel = "F", description = "Frequency (default 1 GHz).")
    String at;

    @Option(names = "--spec-z0", paramLabel = "OHMS±PCT", description = "Yield spec, e.g. 50±10 (|Z0| within ±10 %%).")
    String specZ0;

    @Option(names = "--out", paramLabel = "FILE", description = "Write to FILE (atomically) instead of standard output.")
    String out;

    @Override
    public Integer call() {
        PrintWriter err = spec.commandLine().getErr();
        Design design = common.loadDesign();
        int count = (int) parseRange("--samples", samples, 10, 1_000_000);
        long seedValue = (long) parseRange("--seed", seed, Long.MIN_VALUE, Long.MAX_VALUE);
        Tolerance.Distribution shape = switch (distribution) {
            case "uniform" -> Tolerance.Distribution.UNIFORM;
            case "normal" -> Tolerance.Distribution.NORMAL;
            default -> throw new InvalidInputException("--distribution", distribution, "expected uniform or normal");
        };
        double frequency = at == null ? Synthesis.DEFAULT_FREQUENCY_HZ : Rule.FREQUENCY.parse("--at", at);
        List<Tolerance.Variation> variations = new ArrayList<>();
        for (String item : vary) {
            variations.add(Tolerance.parseVariation(design, item));
        }
        double target = Double.NaN;
        double fraction = Double.NaN;
        if (specZ0 != null) {
            String[] parts = specZ0.replace("+-", "±").split("±");
            if (parts.length != 2) {
                throw new InvalidInputException("--spec-z0", specZ0, "expected OHMS±PERCENT, e.g. 50±10");
            }
            target = parseRange("--spec-z0", parts[0], 1e-6, 1e9);
            fraction = parseRange("--spec-z0", parts[1].replace("%", ""), 1e-9, 100) / 100;
        }
        CommonOptions.printWarnings(design, err);
        Tolerance.Result result = Tolerance.run(design, variations, shape, count, seedValue, frequency, target, fraction,
                Runtime.getRuntime().availableProcessors(), n -> { }, () -> false);
        ObjectNode json = DesignFiles.mapper().createObjectNode();
        json.put("samples", result.samples());
        json.put("validSamples", result.valid());
        json.put("seed", seedValue);
        json.put("distribution", distribution);
        json.put("frequencyHz", frequency);
        band(json.putObject("z0Ohm"), result.z0Ohm());
        band(json.putObject("attenuationDbPerM"), result.attenuationDbPerMetre());
        band(json.putObject("delaySPerM"), result.delaySecondsPerMetre());
        if (Double.isNaN(result.yield())) {
            json.putNull("yield");
        } else {
            json.put("yield", result.yield());
        }
        Output.deliver(CommonOptions.path("--out", out), spec.commandLine().getOut(), stream -> stream.write(
                (DesignFiles.mapper().writeValueAsString(json) + "\n").getBytes(StandardCharsets.UTF_8)));
        return ExitStatus.OK;
    }

    private static void band(ObjectNode node, Tolerance.Band band) {
        node.put("nominal", band.nominal());
        node.put("p5", band.p5());
        node.put("p50", band.p50());
        node.put("p95", band.p95());
        node.put("rssP5", band.rssP5());
        node.put("rssP95", band.rssP95());
    }

    private static double parseRange(String option, String text, double low, double high) {
        double value;
        try {
            value = Double.parseDouble(text.strip());
        } catch (NumberFormatException e) {
            throw new InvalidInputException(option, text, "expected a number");
        }
        if (!(value >= low && value <= high)) {
            throw new InvalidInputException(option, text, "expected a number from " + low + " to " + high);
        }
        return value;
    }
}
