package org.linesweep.app;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.concurrent.TimeoutException;
import javafx.scene.control.Slider;
import javafx.stage.Stage;
import org.junit.jupiter.api.Test;
import org.linesweep.app.model.ExplorerModel;
import org.linesweep.app.model.SweepSnapshot;
import org.linesweep.app.view.FrequencyPlot;
import org.linesweep.app.view.QuantityControl;
import org.linesweep.design.Design;
import org.linesweep.design.SweepSettings;
import org.linesweep.io.DesignFiles;
import org.linesweep.io.Presets;
import org.linesweep.physics.LineType;
import org.linesweep.sweep.GridScale;
import org.testfx.api.FxRobot;
import org.testfx.framework.junit5.Start;

/**
 * The explorer under abuse: sliders dragged end to end, the line type switched mid-drag, pins toggled
 * rapidly, a file opened while a sweep is running. Nothing may throw on any thread, and once things settle
 * the curves on screen must belong to the newest design (no stale result drawn over a newer one).
 */
class ExplorerStressTest extends WindowTestBase {

    @Start
    void start(Stage stage) {
        open(stage);
    }

    /** The bench patch lead at 20,000 points: the heaviest sweep the explorer is asked for here. */
    @Override
    Design initialDesign() {
        Design heavy = Presets.load("bench-patch-lead");
        return heavy.withSweep(new SweepSettings(heavy.sweep().fromHz(), heavy.sweep().toHz(), 20_000, GridScale.LOG));
    }

    /** The impedance plot shows the newest snapshot's |Z0|, point for point. */
    private void assertCurvesAreCurrent() {
        SweepSnapshot shown = model.snapshotProperty().get();
        assertEquals(model.getDesign(), shown.design());
        FrequencyPlot impedance = window.plots().impedancePlot();
        var live = impedance.getSeries().get(0);
        assertEquals(shown.sweep().size(), live.count());
        for (int i = 0; i < live.count(); i += Math.max(1, live.count() / 50)) {
            assertEquals(shown.sweep().z0MagnitudeOhm(i), live.y()[i], 0.0, "point " + i);
        }
    }

    private void dragEndToEnd(FxRobot robot, QuantityControl control) {
        Slider slider = control.slider();
        robot.interact(() -> slider.setValueChanging(true));
        for (int step = 0; step <= 40; step++) {
            double position = step <= 20 ? slider.getMax() * step / 20.0 : slider.getMax() * (40 - step) / 20.0;
            robot.interact(() -> slider.setValue(position));
        }
        robot.interact(() -> slider.setValue(slider.getMin()));
        robot.interact(() -> slider.setValue(slider.getMax()));
        robot.interact(() -> slider.setValueChanging(false));
    }

    @Test
    void everySliderEndToEndOnEveryLineType(FxRobot robot) throws TimeoutException {
        for (LineType type : LineType.values()) {
            robot.interact(() -> model.apply(d -> d.withGeometry(org.linesweep.design.Geometry.starter(type))));
            for (var field : org.linesweep.design.GeometryField.of(type)) {
                dragEndToEnd(robot, window.designPanel().geometryControl(field.name()));
            }
            dragEndToEnd(robot, window.designPanel().lineLengthControl());
            settle();
            assertCurvesAreCurrent();
        }
    }

    @Test
    void switchingTypeMidDrag(FxRobot robot) throws TimeoutException {
        Slider slider = window.designPanel().geometryControl("outerDiameter").slider();
        robot.interact(() -> slider.setValueChanging(true));
        robot.interact(() -> slider.setValue(700));
        robot.interact(() -> model.apply(d -> d.withGeometry(org.linesweep.design.Geometry.starter(LineType.MICROSTRIP))));
        robot.interact(() -> slider.setValue(300));
        robot.interact(() -> slider.setValueChanging(false));
        settle();
        assertEquals(LineType.MICROSTRIP, model.getDesign().geometry().type());
        assertCurvesAreCurrent();
    }

    @Test
    void pinningAndUnpinningRapidly(FxRobot robot) throws TimeoutException {
        settle();
        for (int i = 0; i < 60; i++) {
            int round = i;
            robot.interact(() -> {
                model.apply(d -> d.withLength(1 + round * 0.01));
                model.pinCurrent();
                if (round % 3 == 0 && !model.pins().isEmpty()) {
                    model.unpin(model.pins().get(0));
                }
            });
        }
        settle();
        assertTrue(model.pins().size() <= ExplorerModel.MAX_PINS);
        robot.interact(() -> { model.pinCurrent(); });
        assertCurvesAreCurrent();
    }

    @Test
    void openingAFileWhileASweepRuns(FxRobot robot) throws IOException, TimeoutException {
        Path file = folder.resolve("trace.json");
        Files.writeString(file, DesignFiles.toJson(Presets.load("board-trace-50-ohm")));
        dialogs.next = file;
        Slider slider = window.designPanel().geometryControl("outerDiameter").slider();
        robot.interact(() -> slider.setValueChanging(true));
        robot.interact(() -> slider.setValue(900));
        robot.interact(() -> window.openFile());
        robot.interact(() -> slider.setValueChanging(false));
        settle();
        assertEquals(LineType.MICROSTRIP, model.getDesign().geometry().type());
        assertCurvesAreCurrent();
    }
}
