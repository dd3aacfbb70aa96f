package org.linesweep.app;

import java.util.Locale;
import javafx.application.Application;
import javafx.geometry.Insets;
import javafx.scene.Scene;
import javafx.scene.control.Label;
import javafx.scene.layout.VBox;
import javafx.stage.Stage;
import org.linesweep.design.Design;
import org.linesweep.design.Units;
import org.linesweep.io.Presets;
import org.linesweep.physics.FrequencyLimits;
import org.linesweep.physics.LimitFinder;
import org.linesweep.physics.LineModel;
import org.linesweep.physics.LinePoint;

/**
 * The explorer window. For now a summary of the default design (its characteristic impedance, loss and
 * frequency limits); the live plots come with the explorer proper.
 */
public final class ExplorerApplication extends Application {

    @Override
    public void start(Stage stage) {
        Design design = Presets.load(Presets.DEFAULT);
        LineModel model = design.toModel();
        FrequencyLimits limits = LimitFinder.find(model, design.lengthMetres(), design.threshold(),
                design.lossBudgetDb());
        double probeHz = Math.sqrt(design.sweep().fromHz() * design.sweep().toHz());
        LinePoint point = model.at(probeHz);
        VBox root = new VBox(8,
                heading(design.name()),
                new Label(design.description()),
                new Label(design.geometry().type().displayName() + ", " + Units.engineering(design.lengthMetres(), "m", 3)
                        + " long"),
                new Label(String.format(Locale.ROOT, "At %s: |Z0| = %.2f Ω, attenuation %.4g dB/m",
                        Units.engineering(probeHz, "Hz", 3), point.z0MagnitudeOhm(), point.alphaDbPerMetre())),
                new Label("Lumped up to (L/λ = " + design.threshold() + "): "
                        + Units.engineering(limits.electricalLengthHz(), "Hz", 4)),
                new Label("First higher-order mode: " + Units.engineering(limits.higherModeCutoffHz(), "Hz", 4)),
                new Label("Frequency ceiling: " + Units.engineering(limits.ceilingHz(), "Hz", 4)
                        + (limits.limitedBy() == null ? "" : ", set by " + limits.limitedBy().key())));
        root.setPadding(new Insets(16));
        stage.setTitle("LineSweep — " + design.name());
        stage.setScene(new Scene(root, 640, 300));
        stage.show();
    }

    private static Label heading(String text) {
        Label label = new Label(text);
        label.setStyle("-fx-font-size: 18px; -fx-font-weight: bold;");
        return label;
    }
}
