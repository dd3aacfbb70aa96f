package org.linesweep.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.linesweep.io.DesignFiles;
import org.linesweep.io.Presets;
import org.linesweep.physics.FrequencyLimits;
import org.linesweep.physics.LimitFinder;

class CommandLineTest {

    private static final String HEADER = "frequency_hz,r_ohm_per_m,l_h_per_m,g_s_per_m,c_f_per_m,z0_re_ohm,z0_im_ohm,"
            + "alpha_db_per_m,beta_rad_per_m,phase_velocity_m_per_s,group_velocity_m_per_s,wavelength_m,"
            + "electrical_length,eps_eff,skin_depth_m";

    private record Run(int status, String out, String err) {
    }

    private static Run run(String... args) {
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        ByteArrayOutputStream err = new ByteArrayOutputStream();
        int status = LineSweepCommand.execute(args, new PrintStream(out, true, StandardCharsets.UTF_8),
                new PrintStream(err, true, StandardCharsets.UTF_8));
        return new Run(status, out.toString(StandardCharsets.UTF_8), err.toString(StandardCharsets.UTF_8));
    }

    private static String preset(String name) {
        return "presets/" + name + ".json";
    }

    @Test
    void sweepWritesTheExactHeaderAndOneRowPerPoint() {
        Run r = run("sweep", preset("bench-patch-lead"), "--from", "1MHz", "--to", "1GHz", "--points", "7");
        assertEquals(0, r.status(), r.err());
        String[] lines = r.out().split("\n");
        assertEquals(HEADER, lines[0]);
        assertEquals(8, lines.length);
        assertTrue(lines[1].startsWith("1000000.0,"));
        assertTrue(lines[7].startsWith("1.0E9,"));
        assertFalse(r.out().contains(" "), "no padding or thousands separators");
    }

    @Test
    void singleAtPointHasAGroupVelocityAndPerfectConductorHasNoSkinDepth() {
        Run r = run("sweep", preset("air-line-reference"), "--at", "2.4GHz");
        assertEquals(0, r.status(), r.err());
        String[] cells = r.out().split("\n")[1].split(",", -1);
        assertEquals(15, cells.length);
        assertEquals(2.998e8, Double.parseDouble(cells[10]), 1e5);
        assertEquals("", cells[14], "skin depth of a perfect conductor is an empty cell");
    }

    @Test
    void jsonFormatHasColumnsRowsAndNulls() throws IOException {
        Run r = run("sweep", preset("air-line-reference"), "--at", "1e9,2e9", "--format", "json");
        assertEquals(0, r.status(), r.err());
        JsonNode json = new ObjectMapper().readTree(r.out());
        assertEquals(HEADER, String.join(",", new ObjectMapper().convertValue(json.get("columns"), String[].class)));
        assertEquals(2, json.get("rows").size());
        assertTrue(json.get("rows").get(0).get(14).isNull());
    }

    @Test
    void limitsMatchTheCore() throws IOException {
        Run r = run("limits", preset("rooftop-antenna-feeder"), "--threshold", "0.1");
        assertEquals(0, r.status(), r.err());
        JsonNode json = new ObjectMapper().readTree(r.out());
        var design = Presets.load("rooftop-antenna-feeder");
        FrequencyLimits expected = LimitFinder.find(design.toModel(), design.lengthMetres(), 0.1, 3.0);
        assertEquals(expected.electricalLengthHz(), json.get("electricalLengthHz").asDouble());
        assertEquals(expected.lossBudgetHz(), json.get("lossBudgetHz").asDouble());
        assertEquals(expected.ceilingHz(), json.get("ceilingHz").asDouble());
        assertEquals(expected.limitedBy().key(), json.get("limitedBy").asText());
        for (String key : new String[] {"electricalLengthHz", "skinDepthEqualsRadiusHz", "resistanceDoublesHz",
            "higherModeCutoffHz", "lossBudgetHz", "ceilingHz", "limitedBy"}) {
            assertTrue(json.has(key), key);
        }
        Run open = run("limits", preset("ladder-line-feeder"));
        assertTrue(open.out().contains("\"higherModeCutoffHz\" : null"), open.out());
    }

    @ParameterizedTest
    @ValueSource(strings = {"--from=5mhz", "--points=1", "--to=20THz", "--scale=cubic", "--format=xml", "--at=0Hz",
        "--bogus", "--points=abc"})
    void badOptionsExitTwoWithOneClearLine(String option) {
        Run r = run("sweep", preset("bench-patch-lead"), option);
        assertEquals(ExitStatus.INVALID_INPUT, r.status(), r.err());
        assertTrue(r.err().startsWith("error: "), r.err());
        assertFalse(r.err().contains("\tat "), "no stack trace");
    }

    @Test
    void badDesignFilesExitTwo(@TempDir Path dir) throws IOException {
        Path bad = dir.resolve("bad.json");
        var tree = DesignFiles.toTree(Presets.load("bench-patch-lead"));
        ((com.fasterxml.jackson.databind.node.ObjectNode) tree.get("line")).put("innerDiameter", 0.1);
        Files.writeString(bad, tree.toString());
        Run r = run("limits", bad.toString());
        assertEquals(ExitStatus.INVALID_INPUT, r.status(), r.err());
        assertTrue(r.err().contains("line.innerDiameter"), r.err());
        assertEquals(ExitStatus.INVALID_INPUT, run("sweep", dir.resolve("none.json").toString()).status());
    }

    @Test
    void unwritableOutputExitsFour(@TempDir Path dir) {
        Run r = run("sweep", preset("bench-patch-lead"), "--out", dir.resolve("no/such/folder/x.csv").toString());
        assertEquals(ExitStatus.OUTPUT_FAILED, r.status(), r.err());
        assertTrue(r.err().contains("folder does not exist"), r.err());
    }

    @Test
    void outWritesTheFile(@TempDir Path dir) throws IOException {
        Path csv = dir.resolve("s.csv");
        Run r = run("sweep", preset("board-trace-50-ohm"), "--points", "3", "--out", csv.toString());
        assertEquals(0, r.status(), r.err());
        assertEquals("", r.out());
        assertTrue(Files.readString(csv).startsWith(HEADER + "\n"));
    }

    @Test
    void warningsGoToStandardError() {
        Run r = run("sweep", preset("air-line-reference"), "--points", "3");
        assertEquals(0, r.status());
        assertTrue(r.err().contains("warning: the sweep goes above the first higher-order mode"), r.err());
    }

    @Test
    void solvePrintsTheDimensionAndTheDesign() throws IOException {
        Run r = run("solve", preset("board-trace-50-ohm"), "--for", "width", "--z0", "50", "--at", "1GHz");
        assertEquals(0, r.status(), r.err());
        JsonNode json = new ObjectMapper().readTree(r.out());
        assertEquals("width", json.get("field").asText());
        assertEquals(50.0, json.get("z0Ohm").asDouble(), 1e-8);
        assertEquals(json.get("value").asDouble(), json.get("design").get("line").get("width").asDouble());
        Run none = run("solve", preset("board-trace-50-ohm"), "--for", "width", "--z0", "1000");
        assertEquals(ExitStatus.NO_SOLUTION, none.status(), none.err());
        assertTrue(none.err().startsWith("no solution: "), none.err());
        assertEquals(ExitStatus.INVALID_INPUT, run("solve", preset("board-trace-50-ohm"), "--for", "spacing", "--z0",
                "50").status());
        assertEquals(ExitStatus.INVALID_INPUT, run("solve", preset("board-trace-50-ohm"), "--for", "width").status());
    }

    @Test
    void toleranceIsReproducibleAndReportsTheYield() throws IOException {
        String[] args = {"tolerance", preset("board-trace-50-ohm"), "--vary", "width=±0.5mil", "--vary", "height=±10%",
            "--vary", "permittivity=±0.1", "--samples", "500", "--seed", "3", "--spec-z0", "50±10"};
        Run first = run(args);
        assertEquals(0, first.status(), first.err());
        assertEquals(first.out(), run(args).out(), "same seed, same answer");
        JsonNode json = new ObjectMapper().readTree(first.out());
        assertTrue(json.get("z0Ohm").get("p5").asDouble() < json.get("z0Ohm").get("p95").asDouble());
        assertTrue(json.get("yield").asDouble() > 0.9);
        assertEquals(ExitStatus.INVALID_INPUT, run("tolerance", preset("board-trace-50-ohm"), "--vary", "spacing=±1%")
                .status());
        assertEquals(ExitStatus.INVALID_INPUT, run("tolerance", preset("board-trace-50-ohm"), "--vary", "width=±x%")
                .status());
    }

    @Test
    void materialsListsTheCatalogue() {
        Run r = run("materials");
        assertEquals(0, r.status());
        for (String key : new String[] {"copper", "aluminium", "silver", "gold", "brass", "tin", "nickel",
            "stainless-steel", "perfect", "air", "ptfe", "polyethylene", "foam-polyethylene", "polypropylene",
            "epoxy-glass", "polyimide", "alumina", "fused-silica", "ptfe-ceramic"}) {
            assertTrue(r.out().contains(key), key);
        }
    }

    @Test
    void waveformWritesTheExactHeaderAndReadsOutDelay(@TempDir Path folder) throws IOException {
        Path file = folder.resolve("edge.csv");
        Run r = run("waveform", preset("bench-patch-lead"), "--shape", "step", "--rise", "500ps", "--source-ohm", "50",
                "--load-ohm", "50", "--out", file.toString());
        assertEquals(0, r.status(), r.err());
        java.util.List<String> lines = Files.readAllLines(file);
        assertEquals("time_s,input_v,output_v", lines.get(0));
        assertTrue(lines.size() > 100);
        // the preset's 1.5 m of PTFE coax (εr 2.06) delays the edge by L·sqrt(εr)/c = 7.17 ns, plus the
        // conductors' internal inductance
        assertTrue(r.err().matches("(?s).*delay 7\\.[12]\\d* ns.*"), r.err());
        String[] last = lines.get(lines.size() - 1).split(",");
        assertEquals(0.5, Double.parseDouble(last[2]), 0.01, "a matched line delivers half the source");
    }

    @Test
    void waveformShapesAndInputErrors() {
        Run pulse = run("waveform", preset("board-trace-50-ohm"), "--shape", "pulse", "--rise", "50ps", "--width", "1ns",
                "--source-ohm", "25", "--load-ohm", "open", "--load-pf", "2");
        assertEquals(0, pulse.status(), pulse.err());
        Run square = run("waveform", preset("board-trace-50-ohm"), "--shape", "square", "--rise", "50ps", "--period",
                "2ns", "--source-ohm", "25", "--load-ohm", "1k");
        assertEquals(0, square.status(), square.err());
        Run noWidth = run("waveform", preset("board-trace-50-ohm"), "--shape", "pulse", "--rise", "50ps",
                "--source-ohm", "25", "--load-ohm", "50");
        assertEquals(2, noWidth.status());
        assertTrue(noWidth.err().contains("--width"), noWidth.err());
        Run badRise = run("waveform", preset("board-trace-50-ohm"), "--shape", "step", "--rise", "-1ns",
                "--source-ohm", "25", "--load-ohm", "50");
        assertEquals(2, badRise.status());
        assertTrue(badRise.err().contains("--rise") && badRise.err().contains("1 fs to 1 s"), badRise.err());
        Run badShape = run("waveform", preset("board-trace-50-ohm"), "--shape", "ramp", "--rise", "1ns",
                "--source-ohm", "25", "--load-ohm", "50");
        assertEquals(2, badShape.status());
        assertTrue(badShape.err().contains("step, pulse or square"), badShape.err());
    }

    @Test
    void touchstoneFileParsesBackOnTheDesignGrid(@TempDir Path folder) throws IOException {
        Path file = folder.resolve("lead.s2p");
        Run r = run("touchstone", preset("bench-patch-lead"), "--reference-ohm", "75", "--out", file.toString());
        assertEquals(0, r.status(), r.err());
        org.linesweep.io.Touchstone.TwoPortData data = org.linesweep.io.Touchstone.read(file);
        assertEquals(75.0, data.referenceOhm());
        assertEquals(Presets.load("bench-patch-lead").sweep().points(), data.size());
        Run bad = run("touchstone", preset("bench-patch-lead"), "--reference-ohm", "0", "--out", file.toString());
        assertEquals(2, bad.status());
        assertTrue(bad.err().contains("--reference-ohm"), bad.err());
    }

    @Test
    void pairSweepAddsTheModeColumns(@TempDir Path folder) throws IOException {
        Path pair = folder.resolve("pair.json");
        DesignFiles.write(Presets.load("board-trace-50-ohm").withGeometryValue("gap", 0.2e-3), pair);
        Run r = run("sweep", pair.toString(), "--at", "1GHz");
        assertEquals(0, r.status(), r.err());
        String[] lines = r.out().split("\n");
        assertEquals(HEADER + ",z_odd_ohm,z_even_ohm,z_diff_ohm,z_common_ohm,eps_eff_odd,eps_eff_even", lines[0]);
        String[] cells = lines[1].split(",");
        double odd = Double.parseDouble(cells[15]);
        double even = Double.parseDouble(cells[16]);
        assertEquals(2 * odd, Double.parseDouble(cells[17]), 1e-9 * odd);
        assertEquals(even / 2, Double.parseDouble(cells[18]), 1e-9 * even);
        assertTrue(odd < even);
        Run solved = run("solve", pair.toString(), "--for", "gap", "--z-diff", "90");
        assertEquals(0, solved.status(), solved.err());
        assertTrue(solved.out().contains("\"zDiffOhm\" : 90.0"), solved.out());
        Run single = run("solve", preset("board-trace-50-ohm"), "--for", "width", "--z-diff", "90");
        assertEquals(2, single.status());
        assertTrue(single.err().contains("line.gap"), single.err());
    }

    @Test
    void reviewPackWithoutTheWindow(@TempDir Path folder) throws IOException {
        Path html = folder.resolve("trace-review.html");
        Run r = run("review", preset("board-trace-50-ohm"), "--pin", preset("bench-patch-lead"), "--out", html.toString());
        assertEquals(0, r.status(), r.err());
        assertTrue(r.out().startsWith(html.toString()), r.out());
        assertTrue(Files.readString(html).contains("Plots: not included"));
        assertTrue(Files.exists(folder.resolve("trace-review-pin1.s2p")));
        Run missing = run("review", preset("board-trace-50-ohm"), "--out", folder.resolve("no/such/folder/x.html").toString());
        assertEquals(4, missing.status(), missing.err());
        assertTrue(missing.err().contains("the folder does not exist"), missing.err());
    }
}
