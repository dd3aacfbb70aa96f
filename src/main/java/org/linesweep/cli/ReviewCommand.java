package org.linesweep.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.Callable;
import org.linesweep.design.Design;
import org.linesweep.design.Rule;
import org.linesweep.io.DesignFiles;
import org.linesweep.io.ReviewPack;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

/** {@code linesweep review}: the design-review pack without the window (everything but the plot images). */
@Command(name = "review", mixinStandardHelpOptions = true,
        description = "Write a design-review pack: a one-page HTML summary (limits and ceiling, parameters, key"
                + " values, validity, models, cautions) with the limits and parameter tables, each design's sweep"
                + " (CSV), Touchstone two-ports and the design file beside it. Plot images come from the explorer's"
                + " File > Export review pack.")
final class ReviewCommand implements Callable<Integer> {

    @Mixin
    CommonOptions common;

    @Spec
    CommandSpec spec;

    @Option(names = "--pin", paramLabel = "OTHER.json", description = "A design to compare beside it (repeat, up to 4).")
    List<String> pins = new ArrayList<>();

    @Option(names = "--reference-ohm", paramLabel = "R", defaultValue = "50",
            description = "Touchstone reference impedance, ohms (default 50).")
    String referenceOhm;

    @Option(names = "--out", required = true, paramLabel = "REVIEW.html", description = "The summary's file; the"
            + " other files are written beside it with its base name.")
    String out;

    @Override
    public Integer call() {
        PrintWriter err = spec.commandLine().getErr();
        double reference = Rule.REFERENCE_IMPEDANCE.parse("--reference-ohm", referenceOhm);
        if (pins.size() > 4) {
            throw new org.linesweep.design.InvalidInputException("--pin", String.valueOf(pins.size()),
                    "at most 4 designs beside the live one");
        }
        Design live = common.loadDesign();
        CommonOptions.printWarnings(live, err);
        List<ReviewPack.Entry> pinned = new ArrayList<>();
        for (int i = 0; i < pins.size(); i++) {
            Design pin = DesignFiles.read(CommonOptions.path("--pin", pins.get(i)));
            pinned.add(ReviewPack.Entry.compute("pin " + (i + 1) + ": " + label(pin), pin));
        }
        Path html = CommonOptions.path("--out", out);
        try {
            List<Path> files = ReviewPack.write(html, ReviewPack.Entry.compute(label(live), live), pinned, null, null, reference);
            for (Path file : files) {
                spec.commandLine().getOut().println(file);
            }
            spec.commandLine().getOut().flush();
        } catch (IOException | RuntimeException e) {
            if (e instanceof org.linesweep.design.InvalidInputException invalid) {
                throw invalid;
            }
            String reason = e instanceof java.nio.file.NoSuchFileException ? "the folder does not exist"
                    : e.getMessage();
            throw new OutputFailedException("cannot write the review pack " + html + ": " + reason, e);
        }
        return ExitStatus.OK;
    }

    private static String label(Design design) {
        return design.name().isEmpty() ? "design" : design.name();
    }
}
