package org.linesweep.app;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.TimeoutException;
import javafx.application.Platform;
import javafx.scene.control.CheckBox;
import javafx.scene.control.TextField;
import javafx.stage.Stage;
import javax.imageio.ImageIO;
import org.junit.jupiter.api.Test;
import org.linesweep.app.view.PlotSeries;
import org.linesweep.design.Design;
import org.linesweep.design.Synthesis;
import org.linesweep.io.Presets;
import org.linesweep.io.Touchstone;
import org.linesweep.physics.PhysicalConstants;
import org.linesweep.signal.Waveform;
import org.testfx.api.FxRobot;
import org.testfx.framework.junit5.Start;
import org.testfx.util.WaitForAsyncUtils;

/**
 * The signal and hand-off tools in the real window, headless: the waveform tab, a differential pair with
 * its read-out and curves, solving a pair's gap for a differential target, the Touchstone export and the
 * review pack.
 */
class SignalToolsWindowTest extends WindowTestBase {

    @Start
    void start(Stage stage) {
        open(stage);
    }

    private Waveform awaitWaveformOtherThan(Waveform previous) throws TimeoutException {
        WaitForAsyncUtils.waitFor(20, TimeUnit.SECONDS, () -> {
            Waveform now = window.waveformPane().waveformProperty().get();
            return now != null && now != previous;
        });
        WaitForAsyncUtils.waitForFxEvents();
        return window.waveformPane().waveformProperty().get();
    }

    private static void type(FxRobot robot, TextField field, String text) {
        robot.interact(() -> {
            field.setText(text);
            field.getOnAction().handle(null);
        });
    }

    /**
     * The preset's 1.5 m of PTFE coax (εr 2.06) matched at both ends delays the edge by about
     * L·sqrt(εr)/c = 7.17 ns (textbook); bad input names the field and keeps the last waveform; an open load
     * doubles the far end to the source's full volt.
     */
    @Test
    void waveformTabShowsTheEdgeAtTheFarEnd(FxRobot robot) throws TimeoutException {
        settle();
        robot.clickOn("Waveform");
        Waveform first = awaitWaveformOtherThan(null);
        double expected = 1.5 * Math.sqrt(2.06) / PhysicalConstants.SPEED_OF_LIGHT_METRES_PER_SECOND;
        assertEquals(expected, first.delaySeconds(), 0.02 * expected);
        assertTrue(window.waveformPane().readoutLabel().getText().contains("delay 7."),
                window.waveformPane().readoutLabel().getText());
        List<String> names = window.waveformPane().plot().getSeries().stream().map(PlotSeries::name).toList();
        assertEquals(List.of("source (open circuit)", "near end", "far end (load)"), names);
        // the preset's constant loss tangent is not causal: the view says so
        assertTrue(window.waveformPane().warningsLabel().getText().contains("not causal"),
                window.waveformPane().warningsLabel().getText());

        TextField rise = robot.lookup("#wave-rise").queryAs(TextField.class);
        type(robot, rise, "-5 ps");
        assertTrue(window.waveformPane().messageLabel().getText().startsWith("rise: '-5 ps'"),
                window.waveformPane().messageLabel().getText());
        assertTrue(window.waveformPane().messageLabel().getText().contains("1 fs to 1 s"));
        assertSame(first, window.waveformPane().waveformProperty().get(), "the last valid waveform stays");

        type(robot, rise, "200 ps");
        TextField load = robot.lookup("#wave-load").queryAs(TextField.class);
        type(robot, load, "open");
        Waveform open = awaitWaveformOtherThan(first);
        assertEquals("", window.waveformPane().messageLabel().getText());
        assertEquals(1.0, open.settledVolts(), 1e-3);
    }

    /** A stripline made a pair: read-out rows, Zdiff and Zcommon curves, solving the gap for 90 Ω, undo. */
    @Test
    void pairReadoutCurvesAndDifferentialSolve(FxRobot robot) throws TimeoutException {
        robot.interact(() -> model.open(Presets.load("buried-clock-stripline")));
        settle();
        CheckBox toggle = robot.lookup("#pair-toggle").queryAs(CheckBox.class);
        assertFalse(toggle.isSelected());
        robot.interact(toggle::fire);
        settle();
        assertTrue(model.getDesign().geometry().isPair());
        String zdiff = window.readout().value("pair Zdiff / Zcommon");
        assertTrue(zdiff.matches("[0-9.]+ Ω  /  [0-9.]+ Ω"), zdiff);
        List<String> impedanceSeries = window.plots().impedancePlot().getSeries().stream().map(PlotSeries::name)
                .toList();
        assertTrue(impedanceSeries.containsAll(List.of("Zdiff", "Zcommon")), impedanceSeries.toString());

        robot.interact(() -> window.designPanel().solveFor("gap", Synthesis.Quantity.DIFFERENTIAL_IMPEDANCE, 90, 1e9));
        settle();
        Design solved = model.getDesign();
        assertEquals(90, solved.toPair().modes(1e9).differentialImpedanceOhm(), 1e-6);
        // a pinned pair shows its Zdiff in the comparison table
        robot.interact(() -> {
            model.pinCurrent();
        });
        javafx.scene.control.TableColumn<?, ?> zdiffColumn = window.compare().table().getColumns().stream()
                .filter(c -> "pins-zdiff".equals(c.getId())).findFirst().orElseThrow();
        assertTrue(zdiffColumn.isVisible());
        String cell = String.valueOf(zdiffColumn.getCellData(0));
        double frequency = Math.sqrt(solved.sweep().fromHz() * solved.sweep().toHz());
        assertEquals(solved.toPair().modes(frequency).differentialImpedanceOhm(), Double.parseDouble(cell), 0.01);
        robot.interact(() -> {
            model.unpinAll();
        });
        robot.interact(model::undo);
        robot.interact(model::undo);
        settle();
        assertFalse(model.getDesign().geometry().isPair());
        assertFalse(toggle.isSelected());
    }

    /** The Touchstone file parses back on the design's grid; the review pack holds every part. */
    @Test
    void touchstoneAndReviewPack(FxRobot robot) throws TimeoutException, IOException {
        settle();
        Path s2p = folder.resolve("lead.s2p");
        dialogs.next = s2p;
        // the menu action asks for the reference impedance first: answer 75 Ω in its dialog
        Platform.runLater(window::exportTouchstone);
        WaitForAsyncUtils.waitForFxEvents();
        javafx.scene.control.DialogPane pane = robot.lookup(".dialog-pane").queryAs(javafx.scene.control.DialogPane.class);
        javafx.scene.control.TextField reference = robot.from(pane).lookup(".text-field").queryAs(TextField.class);
        robot.interact(() -> reference.setText("75"));
        robot.interact(() -> ((javafx.scene.control.Button) pane.lookupButton(javafx.scene.control.ButtonType.OK)).fire());
        WaitForAsyncUtils.waitForFxEvents();
        Touchstone.TwoPortData data = Touchstone.read(s2p);
        assertEquals(model.getDesign().sweep().points(), data.size());
        assertEquals(75.0, data.referenceOhm());

        robot.interact(() -> { model.pinCurrent(); });
        robot.interact(() -> model.apply(d -> d.withLength(3.0)));
        settle();
        Path html = folder.resolve("lead-review.html");
        dialogs.next = html;
        robot.interact(() -> { window.exportReviewPack(); });
        for (String name : List.of("lead-review.html", "lead-review-plots.png", "lead-review-limits.csv",
                "lead-review-parameters.csv", "lead-review-sweep.csv", "lead-review.s2p", "lead-review-pin1-sweep.csv",
                "lead-review-pin1.s2p", "lead-review-design.json", "lead-review-waveform.csv")) {
            assertTrue(Files.exists(folder.resolve(name)), name);
        }
        assertNotNull(ImageIO.read(folder.resolve("lead-review-plots.png").toFile()));
        String page = Files.readString(html);
        for (String part : List.of("Frequency ceiling", "Limits", "Parameters", "Key values", "Time domain",
                "Models used", "Cautions", "licensed", "lead-review-plots.png")) {
            assertTrue(page.contains(part), part);
        }
        List<String> limits = Files.readAllLines(folder.resolve("lead-review-limits.csv"));
        assertEquals(3, limits.size(), "header, live, one pin");
        assertEquals("time_s,input_v,output_v", Files.readAllLines(folder.resolve("lead-review-waveform.csv")).get(0));
        // the pack's two-ports use the reference chosen for the last export
        assertEquals(75.0, Touchstone.read(folder.resolve("lead-review.s2p")).referenceOhm());
    }
}
