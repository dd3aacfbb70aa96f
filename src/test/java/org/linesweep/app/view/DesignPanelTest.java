package org.linesweep.app.view;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.concurrent.Executor;
import javafx.scene.Scene;
import javafx.scene.control.ComboBox;
import javafx.scene.control.ScrollPane;
import javafx.scene.input.KeyCode;
import javafx.stage.Stage;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.linesweep.app.model.ExplorerModel;
import org.linesweep.app.model.UnitSystem;
import org.linesweep.io.Presets;
import org.linesweep.physics.DielectricModelKind;
import org.linesweep.physics.LineType;
import org.testfx.api.FxRobot;
import org.testfx.framework.junit5.ApplicationExtension;
import org.testfx.framework.junit5.Start;
import org.testfx.util.WaitForAsyncUtils;

/** The design panel mounted alone on a model that computes synchronously. */
@ExtendWith(ApplicationExtension.class)
class DesignPanelTest {

    private static final Executor NOW = Runnable::run;
    private ExplorerModel model;
    private DesignPanel panel;

    @Start
    void start(Stage stage) {
        model = new ExplorerModel(Presets.load("board-trace-50-ohm"), NOW, NOW);
        panel = new DesignPanel(model);
        stage.setScene(new Scene(new ScrollPane(panel), 360, 1100));
        stage.show();
    }

    @Test
    void showsTheGeometryOfTheLineType(FxRobot robot) {
        assertNotNull(panel.geometryControl("width"));
        assertNotNull(panel.geometryControl("height"));
        assertNotNull(panel.geometryControl("thickness"));
        assertEquals("0.38 mm", panel.geometryControl("width").textField().getText());
        @SuppressWarnings("unchecked")
        ComboBox<LineType> type = robot.lookup("#line-type").queryAs(ComboBox.class);
        robot.interact(() -> type.setValue(LineType.TWO_WIRE));
        assertEquals(LineType.TWO_WIRE, model.getDesign().geometry().type());
        assertNull(panel.geometryControl("width"));
        assertNotNull(panel.geometryControl("spacing"));
        robot.interact(() -> { model.undo(); });
        assertEquals(LineType.MICROSTRIP, model.getDesign().geometry().type());
        assertNotNull(panel.geometryControl("width"), "the panel follows the model on undo");
    }

    @Test
    void acceptsImperialInputAndShowsImperialUnits(FxRobot robot) {
        robot.doubleClickOn("#line-width").eraseText(12).write("20 mil").type(KeyCode.ENTER);
        WaitForAsyncUtils.waitForFxEvents();
        assertEquals(508e-6, model.getDesign().geometry().value("width"), 1e-12);
        robot.interact(() -> model.unitSystemProperty().set(UnitSystem.IMPERIAL));
        assertEquals("20 mil", panel.geometryControl("width").textField().getText());
        robot.doubleClickOn("#line-width").eraseText(12).write("0.4 mm").type(KeyCode.ENTER);
        WaitForAsyncUtils.waitForFxEvents();
        assertEquals(0.4e-3, model.getDesign().geometry().value("width"), 1e-12, "either system is accepted");
    }

    @Test
    void refusesOutOfRangeInputWithTheRange(FxRobot robot) {
        var before = model.getDesign();
        robot.doubleClickOn("#dielectric-permittivity").eraseText(12).write("0.5").type(KeyCode.ENTER);
        WaitForAsyncUtils.waitForFxEvents();
        assertEquals(before, model.getDesign());
        var message = panel.control("dielectric.permittivity").messageLabel();
        assertTrue(message.isVisible());
        assertTrue(message.getText().startsWith("dielectric.permittivity: '0.5': a relative permittivity from 1 to 10000"),
                message.getText());
        assertEquals("4.2", panel.control("dielectric.permittivity").textField().getText(), "the field shows the kept value");
    }

    @Test
    void solveBesideTheFieldHitsTheTarget(FxRobot robot) {
        robot.clickOn("#solve-width");
        robot.doubleClickOn("#solve-target-ohm").eraseText(6).write("60");
        robot.clickOn("OK");
        WaitForAsyncUtils.waitForFxEvents();
        double z0 = model.getDesign().toModel().at(1e9).z0MagnitudeOhm();
        assertEquals(60.0, z0, 1e-7);
        robot.interact(() -> { model.undo(); });
        assertEquals(0.38e-3, model.getDesign().geometry().value("width"), 1e-15, "solving is one undo step");
        assertTrue(panel.solveFor("height", org.linesweep.design.Synthesis.Quantity.ATTENUATION, 4.0, 1e9));
        assertEquals(4.0, model.getDesign().toModel().at(1e9).alphaDbPerMetre(), 1e-8, "attenuation target");
        assertFalse(panel.solveFor("width", 5000, 1e9), "impossible target");
        assertTrue(model.messageProperty().get().startsWith("No solution"), model.messageProperty().get());
    }

    @Test
    void dielectricModelSwitches(FxRobot robot) {
        @SuppressWarnings("unchecked")
        ComboBox<DielectricModelKind> kind = robot.lookup("#dielectric-model").queryAs(ComboBox.class);
        robot.interact(() -> kind.setValue(DielectricModelKind.CONSTANT));
        assertEquals(DielectricModelKind.CONSTANT, model.getDesign().dielectric().model());
        assertEquals(null, model.getDesign().dielectric().materialKey(), "edited values make a custom material");
        assertFalse(model.messageProperty().get().length() > 0);
    }
}
