package org.linesweep.cli;

import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTimeoutPreemptively;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.PrintStream;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.atomic.AtomicInteger;
import net.jqwik.api.Arbitraries;
import net.jqwik.api.Arbitrary;
import net.jqwik.api.Combinators;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.Provide;
import net.jqwik.api.lifecycle.AfterContainer;
import org.linesweep.design.InvalidInputException;
import org.linesweep.io.DesignFiles;
import org.linesweep.io.Presets;

/**
 * Feeds mutated design files and mutated command lines to the reader and the command line. The only
 * outcomes allowed are a valid result (exit 0) or a clear one-line error with exit 2; never an internal
 * error, an uncaught exception, a stack trace or an input that takes longer than its time bound. The
 * number of tries is jqwik's default (1000 each) in CI; the long run sets -Djqwik.tries.default (see
 * docs/robustness.md).
 */
class FuzzTest {

    /** Time bound per input: far above a normal run (a few ms), far below a hang. */
    private static final Duration PER_INPUT = Duration.ofSeconds(20);
    private static final AtomicInteger FILES_TRIED = new AtomicInteger();
    private static final AtomicInteger COMMANDS_TRIED = new AtomicInteger();

    private static final List<String> NASTY = List.of("\"NaN\"", "\"-0\"", "\"1e999\"", "1e999", "-1", "0", "\"\"",
            "null", "true", "[]", "{}", "\"10 mmm\"", "\"5 GHz GHz\"", "\"5 mhz\"", "\"0.82 mm\"", "\"35 mil\"",
            "\"2 oz\"", "\"1e-30 m\"", "\"1e30 m\"", "1e-300", "\"perfect\"", "\"wideband-debye\"", "\"coax\"",
            "\"stripline\"", "99999999999", "\"-40 degC\"", "\"1000 K\"", "\"μm\"", "\"\\u0000\"", "0.5", "3");

    private static final String[] PRESETS = Presets.NAMES.toArray(String[]::new);

    @Provide
    Arbitrary<String> mutatedDesigns() {
        Arbitrary<String> base = Arbitraries.of(PRESETS).map(name -> {
            try {
                return Files.readString(Path.of("presets", name + ".json"));
            } catch (IOException e) {
                throw new UncheckedIOException(e);
            }
        });
        return Combinators.combine(base, Arbitraries.integers().between(0, 5), Arbitraries.integers().between(0, 100_000),
                Arbitraries.of(NASTY), Arbitraries.strings().ofMaxLength(4))
                .as(FuzzTest::mutate);
    }

    /** One of: replace a value with a nasty one, cut the text, insert junk, drop a line, duplicate a line. */
    private static String mutate(String text, int kind, int position, String nasty, String junk) {
        int at = Math.floorMod(position, Math.max(1, text.length()));
        return switch (kind) {
            case 0 -> text.replaceFirst(":\\s*(\"[^\"]*\"|[-0-9.eE]+)", ": " + nasty);
            case 1 -> text.substring(0, at);
            case 2 -> text.substring(0, at) + junk + text.substring(at);
            case 3 -> {
                String[] lines = text.split("\n");
                List<String> kept = new ArrayList<>(List.of(lines));
                kept.remove(Math.floorMod(position, lines.length));
                yield String.join("\n", kept);
            }
            case 4 -> {
                String replaced = text.replaceAll("(\"[a-zA-Z]+\")\\s*:\\s*(\"[^\"]*\"|[-0-9.eE]+)", "$1: " + nasty);
                yield replaced.substring(0, Math.min(replaced.length(), at + 200));
            }
            default -> {
                String[] lines = text.split("\n");
                String line = lines[Math.floorMod(position, lines.length)];
                yield text.replace(line, line + "\n" + line.replace("\"", "\"x"));
            }
        };
    }

    @Property(seed = "20261206")
    void mutatedDesignFilesGiveAResultOrAClearError(@ForAll("mutatedDesigns") String json) throws IOException {
        FILES_TRIED.incrementAndGet();
        assertTimeoutPreemptively(PER_INPUT, () -> {
            try {
                DesignFiles.parse(json).toModel();
            } catch (InvalidInputException e) {
                assertFalse(e.getMessage().isBlank());
                assertFalse(e.getMessage().contains("\n"), "one line: " + e.getMessage());
            }
        });
        Path file = Files.createTempFile("fuzz", ".json");
        try {
            Files.writeString(file, json);
            for (String command : new String[] {"limits", "sweep"}) {
                String[] args = command.equals("sweep")
                        ? new String[] {command, file.toString(), "--points", "7"} : new String[] {command, file.toString()};
                assertCleanOutcome(args);
            }
        } finally {
            Files.deleteIfExists(file);
        }
    }

    @Provide
    Arbitrary<List<String>> mutatedCommandLines() {
        Arbitrary<String> word = Arbitraries.oneOf(
                Arbitraries.of("sweep", "limits", "materials", "solve", "tolerance", "--for", "width", "--z0", "--vary",
                        "width=±1%", "height=±0.01mm", "--samples", "20", "--seed", "--spec-z0", "50±10", "--from", "--to", "--points", "--scale", "--at",
                        "--format", "--out", "--threshold", "--loss-budget-db", "--debug", "--help", "-h", "log", "lin",
                        "csv", "json", "presets/bench-patch-lead.json", "presets/board-trace-50-ohm.json",
                        "presets/none.json", "1GHz", "2.4ghz", "5mhz", "0", "-1", "1e999", "NaN", "100000", "100001",
                        "0.01", "2", "1,2,3", ",,", "10THz", "20THz", "", " ", "=", "--from=1kHz", "--at=1GHz,2GHz",
                        "waveform", "touchstone", "review", "--shape", "step", "pulse", "square", "--rise", "100ps",
                        "--width", "1ns", "--period", "--source-ohm", "--load-ohm", "open", "--load-pf", "3",
                        "--duration", "--reference-ohm", "--pin", "--z-diff", "gap", "presets/camera-link-pair.json"),
                Arbitraries.strings().ofMaxLength(6));
        return word.list().ofMinSize(0).ofMaxSize(7);
    }

    @Property(seed = "20261207")
    void mutatedCommandLinesGiveAResultOrAClearError(@ForAll("mutatedCommandLines") List<String> words) {
        COMMANDS_TRIED.incrementAndGet();
        // never let a fuzzed --out write outside a scratch name
        List<String> args = new ArrayList<>(words);
        for (int i = 0; i < args.size(); i++) {
            if (args.get(i).startsWith("--out")) {
                args.set(i, "--format");
            }
        }
        assertCleanOutcome(args.toArray(String[]::new));
    }

    private static void assertCleanOutcome(String[] args) {
        assertTimeoutPreemptively(PER_INPUT, () -> {
            ByteArrayOutputStream out = new ByteArrayOutputStream();
            ByteArrayOutputStream err = new ByteArrayOutputStream();
            int status = LineSweepCommand.execute(args, new PrintStream(out, true, StandardCharsets.UTF_8),
                    new PrintStream(err, true, StandardCharsets.UTF_8));
            String errors = err.toString(StandardCharsets.UTF_8);
            // a target no dimension reaches is a clean, documented outcome too
            assertTrue(status == ExitStatus.OK || status == ExitStatus.INVALID_INPUT || status == ExitStatus.NO_SOLUTION,
                    "exit " + status + " for " + String.join(" ", args) + ": " + errors);
            assertFalse(errors.contains("\tat ") || errors.contains("Exception"), "stack trace for "
                    + String.join(" ", args) + ": " + errors);
        });
    }

    @AfterContainer
    static void report() {
        System.out.println("FUZZ design files tried=" + FILES_TRIED.get() + " (each also through limits and sweep);"
                + " command lines tried=" + COMMANDS_TRIED.get());
    }
}
