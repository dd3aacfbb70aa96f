package org.linesweep.cli;

import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.PrintWriter;
import java.nio.charset.StandardCharsets;
import java.util.concurrent.Callable;
import org.linesweep.design.Design;
import org.linesweep.design.InvalidInputException;
import org.linesweep.design.Rule;
import org.linesweep.design.Synthesis;
import org.linesweep.io.DesignFiles;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

/** {@code linesweep solve}: the value of one geometry field that meets a target. */
@Command(name = "solve", mixinStandardHelpOptions = true,
        description = "Find the value of one geometry field (e.g. width, innerDiameter, spacing) that gives a target"
                + " |Z0|, attenuation or delay per metre at a frequency, all else held. Prints JSON; exit 3 when no"
                + " value in the allowed range meets the target.")
final class SolveCommand implements Callable<Integer> {

    @Mixin
    CommonOptions common;

    @Spec
    CommandSpec spec;

    @Option(names = "--for", required = true, paramLabel = "FIELD", description = "The geometry field to solve for.")
    String field;

    @Option(names = "--z0", paramLabel = "OHMS", description = "Target |Z0| in ohms.")
    String z0;

    @Option(names = "--z-diff", paramLabel = "OHMS", description = "Target differential impedance 2·Zodd of a pair"
            + " (a microstrip or stripline with line.gap), e.g. 85, 90 or 100.")
    String zDiff;

    @Option(names = "--attenuation-db-per-m", paramLabel = "DB", description = "Target attenuation, dB/m.")
    String attenuation;

    @Option(names = "--delay-s-per-m", paramLabel = "S", description = "Target phase delay per metre, s/m.")
    String delay;

    @Option(names = "--at", paramLabel = "F", description = "Frequency of the target (default 1 GHz).")
    String at;

    @Option(names = "--out", paramLabel = "FILE", description = "Write to FILE (atomically) instead of standard output.")
    String out;

    @Override
    public Integer call() {
        PrintWriter err = spec.commandLine().getErr();
        int given = (z0 == null ? 0 : 1) + (zDiff == null ? 0 : 1) + (attenuation == null ? 0 : 1)
                + (delay == null ? 0 : 1);
        if (given != 1) {
            throw new InvalidInputException("--z0", z0, "give exactly one target: --z0, --z-diff,"
                    + " --attenuation-db-per-m or --delay-s-per-m");
        }
        Design design = common.loadDesign();
        double frequency = at == null ? Synthesis.DEFAULT_FREQUENCY_HZ : Rule.FREQUENCY.parse("--at", at);
        Synthesis.Target target;
        if (z0 != null) {
            target = new Synthesis.Target(Synthesis.Quantity.Z0_MAGNITUDE, positive("--z0", z0), frequency);
        } else if (zDiff != null) {
            target = new Synthesis.Target(Synthesis.Quantity.DIFFERENTIAL_IMPEDANCE, positive("--z-diff", zDiff),
                    frequency);
        } else if (attenuation != null) {
            target = new Synthesis.Target(Synthesis.Quantity.ATTENUATION, positive("--attenuation-db-per-m",
                    attenuation), frequency);
        } else {
            target = new Synthesis.Target(Synthesis.Quantity.DELAY, positive("--delay-s-per-m", delay), frequency);
        }
        Synthesis.Solution solution;
        try {
            solution = Synthesis.solve(design, field, target);
        } catch (Synthesis.NoSolutionException e) {
            throw new NoSolutionException(e.getMessage());
        }
        CommonOptions.printWarnings(solution.design(), err);
        var point = solution.design().toModel().at(frequency);
        ObjectNode json = DesignFiles.mapper().createObjectNode();
        json.put("field", field);
        json.put("value", solution.valueMetres());
        json.put("z0Ohm", point.z0MagnitudeOhm());
        json.put("attenuationDbPerM", point.alphaDbPerMetre());
        json.put("delaySPerM", point.delaySeconds(1.0));
        if (solution.design().geometry().isPair()) {
            var modes = solution.design().toPair().modes(frequency);
            json.put("zDiffOhm", modes.differentialImpedanceOhm());
            json.put("zCommonOhm", modes.commonImpedanceOhm());
        }
        json.put("frequencyHz", frequency);
        json.set("design", DesignFiles.toTree(solution.design()));
        Output.deliver(CommonOptions.path("--out", out), spec.commandLine().getOut(), stream -> stream.write(
                (DesignFiles.mapper().writeValueAsString(json) + "\n").getBytes(StandardCharsets.UTF_8)));
        return ExitStatus.OK;
    }

    private static double positive(String option, String text) {
        double value;
        try {
            value = Double.parseDouble(text.strip());
        } catch (NumberFormatException e) {
            throw new InvalidInputException(option, text, "expected a positive number");
        }
        if (!(value > 0) || !Double.isFinite(value)) {
            throw new InvalidInputException(option, text, "expected a positive number");
        }
        return value;
    }
}
