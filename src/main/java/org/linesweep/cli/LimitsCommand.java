package org.linesweep.cli;

import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.PrintWriter;
import java.nio.charset.StandardCharsets;
import java.util.concurrent.Callable;
import org.linesweep.design.Design;
import org.linesweep.design.Rule;
import org.linesweep.io.DesignFiles;
import org.linesweep.physics.FrequencyLimits;
import org.linesweep.physics.LimitFinder;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

/** {@code linesweep limits}: where the frequency ceiling lies, as JSON. */
@Command(name = "limits", mixinStandardHelpOptions = true,
        description = "Print as JSON where L/λ reaches the threshold, where skin effect takes over, the first"
                + " higher-order mode, where a loss budget is used up, and the resulting frequency ceiling.")
final class LimitsCommand implements Callable<Integer> {

    @Mixin
    CommonOptions common;

    @Spec
    CommandSpec spec;

    @Option(names = "--threshold", paramLabel = "T",
            description = "Electrical-length threshold L/λ (default: the design's, usually 0.01).")
    String threshold;

    @Option(names = "--loss-budget-db", paramLabel = "B", description = "Total-loss budget in dB.")
    String lossBudget;

    @Option(names = "--out", paramLabel = "FILE", description = "Write to FILE (atomically) instead of standard output.")
    String out;

    @Override
    public Integer call() {
        PrintWriter err = spec.commandLine().getErr();
        Design design = common.loadDesign();
        if (threshold != null) {
            design = design.withThreshold(Rule.THRESHOLD.parse("--threshold", threshold));
        }
        if (lossBudget != null) {
            design = design.withLossBudget(Rule.LOSS_BUDGET.parse("--loss-budget-db", lossBudget));
        }
        CommonOptions.printWarnings(design, err);
        FrequencyLimits limits = LimitFinder.find(design.toModel(), design.lengthMetres(), design.threshold(),
                design.lossBudgetDb());
        ObjectNode json = toJson(limits);
        Output.deliver(CommonOptions.path("--out", out), spec.commandLine().getOut(), stream -> stream.write(
                (DesignFiles.mapper().writeValueAsString(json) + "\n").getBytes(StandardCharsets.UTF_8)));
        return ExitStatus.OK;
    }

    /** The limits as the JSON object the command prints; null where a limit does not apply. */
    static ObjectNode toJson(FrequencyLimits limits) {
        ObjectNode json = DesignFiles.mapper().createObjectNode();
        putFrequency(json, "electricalLengthHz", limits.electricalLengthHz());
        putFrequency(json, "skinDepthEqualsRadiusHz", limits.skinDepthEqualsRadiusHz());
        putFrequency(json, "resistanceDoublesHz", limits.resistanceDoublesHz());
        putFrequency(json, "higherModeCutoffHz", limits.higherModeCutoffHz());
        putFrequency(json, "lossBudgetHz", limits.lossBudgetHz());
        putFrequency(json, "ceilingHz", limits.ceilingHz());
        if (limits.limitedBy() == null) {
            json.putNull("limitedBy");
        } else {
            json.put("limitedBy", limits.limitedBy().key());
        }
        putFrequency(json, "openLineRadiationHz", limits.radiationSpacingHz());
        return json;
    }

    private static void putFrequency(ObjectNode json, String name, double value) {
        if (Double.isNaN(value)) {
            json.putNull(name);
        } else {
            json.put(name, value);
        }
    }
}
