package org.linesweep.app;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.TimeoutException;
import javafx.scene.control.Slider;
import javafx.scene.input.KeyCode;
import javafx.stage.Stage;
import javax.imageio.ImageIO;
import org.junit.jupiter.api.Test;
import org.linesweep.app.view.FrequencyPlot;
import org.linesweep.app.view.PlotMarker;
import org.linesweep.design.Design;
import org.linesweep.io.SweepTable;
import org.linesweep.physics.FrequencyLimits;
import org.linesweep.physics.LimitFinder;
import org.testfx.api.FxRobot;
import org.testfx.framework.junit5.Start;
import org.testfx.util.WaitForAsyncUtils;

/**
 * One walk through the real window, headless: open a preset, drag a geometry slider, toggle marker mode,
 * pin and compare, type an invalid value, export CSV and PNG and read them back.
 */
class ExplorerWindowTest extends WindowTestBase {

    @Start
    void start(Stage stage) {
        open(stage);
    }

    private double readoutZ0() {
        String text = window.readout().value("|Z0|");
        return Double.parseDouble(text.substring(0, text.indexOf(' ')));
    }

    @Test
    void draggingTheOuterDiameterUpRaisesZ0(FxRobot robot) throws TimeoutException {
        settle();
        double before = readoutZ0();
        int drawsBefore = window.plots().impedancePlot().drawCount();
        Slider slider = window.designPanel().geometryControl("outerDiameter").slider();
        robot.drag(slider.lookup(".thumb")).moveBy(40, 0).release(javafx.scene.input.MouseButton.PRIMARY);
        settle();
        assertTrue(model.getDesign().geometry().value("outerDiameter") > 2.95e-3, "the slider moved the design");
        assertTrue(readoutZ0() > before, "wider gap, higher Z0: " + before + " -> " + readoutZ0());
        assertTrue(window.plots().impedancePlot().drawCount() > drawsBefore, "the curve was redrawn");
        assertTrue(model.canUndoProperty().get());
        robot.interact(() -> { model.undo(); });
        settle();
        assertEquals(2.95e-3, model.getDesign().geometry().value("outerDiameter"), 1e-15, "the drag is one undo step");
    }

    /**
     * A drag that takes the line past its TEM limit and back: the warning shows while it applies, and its strip
     * keeps its place until the drag ends, so the plots below do not jump as the warning comes and goes.
     */
    @Test
    void theWarningStripHoldsItsPlaceDuringADrag(FxRobot robot) throws TimeoutException {
        settle();
        javafx.scene.control.Label strip = window.warningStrip();
        assertFalse(strip.isManaged(), "no warning on the preset: TE11 above its 20 GHz sweep");
        robot.interact(model::beginDrag);
        // outer diameter 8 mm: TE11 near 12 GHz, inside the sweep
        robot.interact(() -> model.drag(d -> d.withGeometryValue("outerDiameter", 8e-3)));
        settle();
        assertTrue(strip.isVisible() && strip.isManaged());
        assertTrue(strip.getText().contains("higher-order mode"), strip.getText());
        double plotsTop = window.plots().impedancePlot().localToScene(0, 0).getY();
        robot.interact(() -> model.drag(d -> d.withGeometryValue("outerDiameter", 2.95e-3)));
        settle();
        assertFalse(strip.isVisible(), "the warning no longer applies");
        assertTrue(strip.isManaged(), "its place is kept while the drag goes on");
        assertEquals(plotsTop, window.plots().impedancePlot().localToScene(0, 0).getY(), 1e-9, "the plots stayed");
        robot.interact(model::endDrag);
        WaitForAsyncUtils.waitForFxEvents();
        assertFalse(strip.isManaged(), "the strip goes when the drag ends");
    }

    /** The read-out refreshes at most ten times a second during a drag, and always ends on the final design. */
    @Test
    void aFastDragEndsWithTheFinalDesignInTheReadout(FxRobot robot) throws TimeoutException, InterruptedException {
        settle();
        double before = readoutZ0();
        robot.interact(model::beginDrag);
        for (int step = 1; step <= 20; step++) {
            double outer = 2.95e-3 + step * 0.05e-3;
            robot.interact(() -> model.drag(d -> d.withGeometryValue("outerDiameter", outer)));
            Thread.sleep(10); // steps 10-20 ms apart, faster than the read-out refreshes
        }
        robot.interact(model::endDrag);
        settle();
        assertTrue(window.readout().isCurrent());
        var snapshot = model.snapshotProperty().get();
        assertEquals(3.95e-3, snapshot.design().geometry().value("outerDiameter"), 1e-15);
        double midHz = Math.sqrt(snapshot.sweep().frequencyHz(0)
                * snapshot.sweep().frequencyHz(snapshot.sweep().size() - 1));
        double expected = snapshot.model().at(midHz).z0MagnitudeOhm();
        assertEquals(org.linesweep.app.view.Display.number(expected) + " Ω",
                window.readout().value("|Z0|").substring(0, window.readout().value("|Z0|").indexOf(" ∠")));
        assertTrue(readoutZ0() > before, "a wider outer conductor, a higher Z0");
    }

    @Test
    void markersAgreeWithTheCoreLimits(FxRobot robot) throws TimeoutException {
        settle();
        robot.interact(() -> model.markerModeProperty().set(false));
        assertTrue(window.plots().attenuationPlot().getMarkers().isEmpty());
        robot.interact(() -> model.markerModeProperty().set(true));
        Design d = model.getDesign();
        FrequencyLimits limits = LimitFinder.find(d.toModel(), d.lengthMetres(), d.threshold(), d.lossBudgetDb());
        List<Double> shown = window.plots().attenuationPlot().getMarkers().stream().map(PlotMarker::frequencyHz).toList();
        assertTrue(shown.contains(limits.electricalLengthHz()));
        assertTrue(shown.contains(limits.skinDepthEqualsRadiusHz()));
        assertTrue(shown.contains(limits.resistanceDoublesHz()));
        assertTrue(shown.contains(limits.higherModeCutoffHz()));
        assertTrue(window.readout().ceilingLabel().getText().contains("electrical length"));
        var tenthButton = robot.lookup("#threshold-0_1").queryAs(javafx.scene.control.ToggleButton.class);
        robot.interact(tenthButton::fire);
        settle();
        FrequencyLimits tenth = LimitFinder.find(model.getDesign().toModel(), d.lengthMetres(), 0.1, Double.NaN);
        assertTrue(window.plots().attenuationPlot().getMarkers().stream()
                .anyMatch(m -> m.frequencyHz() == tenth.electricalLengthHz()));
    }

    @Test
    void pinAndCompare(FxRobot robot) throws TimeoutException {
        settle();
        robot.clickOn("#pin-button");
        assertEquals(1, model.pins().size());
        robot.interact(() -> model.apply(d -> d.withGeometryValue("outerDiameter", 3.6e-3)));
        settle();
        FrequencyPlot plot = window.plots().impedancePlot();
        assertTrue(plot.getSeries().stream().anyMatch(s -> s.name().startsWith("Pin 1")), "pinned curve on the plot");
        assertEquals(1, window.compare().table().getItems().size());
        String difference = window.compare().table().getColumns().get(3).getCellData(0).toString();
        assertTrue(difference.startsWith("-"), "the pin has the narrower gap, so lower Z0: " + difference);
    }

    @Test
    void invalidInputShowsAMessageAndKeepsTheDesign(FxRobot robot) throws TimeoutException {
        settle();
        Design before = model.getDesign();
        robot.doubleClickOn("#line-innerDiameter").eraseText(12).write("3.5 mm").type(KeyCode.ENTER);
        WaitForAsyncUtils.waitForFxEvents();
        assertEquals(before, model.getDesign());
        var message = window.designPanel().geometryControl("innerDiameter").messageLabel();
        assertTrue(message.isVisible());
        assertTrue(message.getText().contains("line.innerDiameter"), message.getText());
        robot.doubleClickOn("#line-innerDiameter").eraseText(12).write("10 mmm").type(KeyCode.ENTER);
        WaitForAsyncUtils.waitForFxEvents();
        assertEquals(before, model.getDesign());
        assertTrue(message.getText().contains("unknown unit"), message.getText());
        robot.doubleClickOn("#line-innerDiameter").eraseText(12).write("35 mil").type(KeyCode.ENTER);
        settle();
        assertEquals(889e-6, model.getDesign().geometry().value("innerDiameter"), 1e-12);
        assertFalse(message.isVisible());
    }

    @Test
    void exportsCsvAndPngThatReadBack(FxRobot robot) throws TimeoutException, IOException {
        settle();
        Path csv = folder.resolve("sweep.csv");
        dialogs.next = csv;
        robot.interact(() -> window.exportCsv());
        List<String> lines = Files.readAllLines(csv);
        assertEquals(SweepTable.csvHeader(), lines.get(0));
        assertEquals(model.getDesign().sweep().points() + 1, lines.size());
        Path png = folder.resolve("plots.png");
        dialogs.next = png;
        robot.interact(() -> window.exportPng());
        var image = ImageIO.read(png.toFile());
        assertNotNull(image);
        assertEquals(2 * window.plots().getWidth(), image.getWidth(), 2, "exported at twice the scale");
    }

    @Test
    void openingABadFileKeepsTheDesign(FxRobot robot) throws IOException, TimeoutException {
        settle();
        Design before = model.getDesign();
        Path bad = folder.resolve("bad.json");
        Files.writeString(bad, "{ not json");
        dialogs.next = bad;
        robot.interact(() -> window.openFile());
        assertEquals(before, model.getDesign());
        assertTrue(model.messageProperty().get().contains("Could not open"), model.messageProperty().get());
        assertEquals("{ not json", Files.readString(bad), "the bad file is left untouched");
    }

    @Test
    void sensitivityRanksTheInputs(FxRobot robot) throws TimeoutException {
        settle();
        robot.clickOn("Sensitivity");
        robot.clickOn("#sensitivity-analyse");
        WaitForAsyncUtils.waitFor(20, TimeUnit.SECONDS, () -> !window.sensitivity().rows().isEmpty());
        WaitForAsyncUtils.waitForFxEvents();
        var rows = window.sensitivity().rows();
        assertTrue(rows.get(0).input().name().startsWith("line."), "a dimension matters most for |Z0| of a coax");
        assertEquals(rows.size(), window.sensitivity().table().getItems().size());
    }

    @Test
    void toleranceBandsAndYield(FxRobot robot) throws TimeoutException {
        settle();
        robot.clickOn("Tolerances");
        var spec = robot.lookup("#tolerance-spec").queryAs(javafx.scene.control.TextField.class);
        robot.interact(() -> spec.setText("50±10"));
        var runButton = robot.lookup("#tolerance-run").queryAs(javafx.scene.control.Button.class);
        robot.interact(runButton::fire);
        WaitForAsyncUtils.waitFor(60, TimeUnit.SECONDS, () -> {
            String shown = window.tolerance().resultLabel().getText();
            return !shown.isEmpty() && !shown.startsWith("running");
        });
        WaitForAsyncUtils.waitForFxEvents();
        assertTrue(window.plots().hasToleranceBands(), window.tolerance().resultLabel().getText());
        assertFalse(window.plots().impedancePlot().getBands().isEmpty(), "a band around |Z0|");
        assertFalse(window.plots().attenuationPlot().getBands().isEmpty(), "a band around the attenuation");
        String text = window.tolerance().resultLabel().getText();
        assertTrue(text.contains("yield") && text.contains("root-sum-square"), text);
        robot.interact(() -> model.apply(d -> d.withLength(2.0)));
        assertFalse(window.plots().hasToleranceBands(), "a changed design clears the stale band");
    }

    @Test
    void meetingModeAndUnits(FxRobot robot) throws TimeoutException {
        settle();
        robot.interact(() -> model.meetingModeProperty().set(true));
        assertTrue(window.root().getStyleClass().contains("meeting"));
        assertFalse(window.designPanel().secondaryControls().isVisible());
        robot.interact(() -> model.unitSystemProperty().set(org.linesweep.app.model.UnitSystem.IMPERIAL));
        String text = window.designPanel().geometryControl("innerDiameter").textField().getText();
        assertTrue(text.endsWith("mil"), text);
        robot.interact(() -> model.meetingModeProperty().set(false));
        assertTrue(window.designPanel().secondaryControls().isVisible());
    }
}
