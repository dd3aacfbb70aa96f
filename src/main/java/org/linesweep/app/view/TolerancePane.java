package org.linesweep.app.view;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.CompletableFuture;
import java.util.concurrent.Executor;
import java.util.concurrent.atomic.AtomicBoolean;
import javafx.collections.FXCollections;
import javafx.geometry.Insets;
import javafx.geometry.Pos;
import javafx.scene.control.Button;
import javafx.scene.control.ChoiceBox;
import javafx.scene.control.Label;
import javafx.scene.control.ProgressBar;
import javafx.scene.control.TextField;
import javafx.scene.layout.HBox;
import javafx.scene.layout.Priority;
import javafx.scene.layout.VBox;
import org.linesweep.app.model.ExplorerModel;
import org.linesweep.design.Design;
import org.linesweep.design.InvalidInputException;
import org.linesweep.design.Tolerance;
import org.linesweep.sweep.FrequencyGrid;
import org.linesweep.sweep.GridScale;

/**
 * Manufacturing tolerances: the inputs' tolerances in the command line's FIELD=±X[%] form, a Monte Carlo run
 * over both cores with progress and cancel, 5-95 % bands drawn around the live |Z0|, attenuation and velocity
 * curves, and at the read-out frequency the yield and the Monte Carlo band beside the root-sum-square one.
 */
public final class TolerancePane extends VBox {

    /** Frequencies of the band (log-spaced over the sweep): enough for a smooth band, cheap to sample. */
    static final int BAND_POINTS = 60;

    private final ExplorerModel model;
    private final Executor worker;
    private final Executor fx;
    private final PlotsPane plots;
    private final TextField variations = new TextField();
    private final TextField samples = new TextField("2000");
    private final TextField seed = new TextField("1");
    private final TextField spec = new TextField("");
    private final ChoiceBox<Tolerance.Distribution> distribution =
            new ChoiceBox<>(FXCollections.observableArrayList(Tolerance.Distribution.values()));
    private final Button run = new Button("Run");
    private final Button cancel = new Button("Cancel");
    private final ProgressBar progress = new ProgressBar(0);
    private final Label result = new Label("");
    private final AtomicBoolean cancelled = new AtomicBoolean();

    public TolerancePane(ExplorerModel model, PlotsPane plots, Executor worker, Executor fx) {
        this.model = model;
        this.plots = plots;
        this.worker = worker;
        this.fx = fx;
        setPadding(new Insets(6, 10, 6, 10));
        setSpacing(5);
        variations.setId("tolerance-variations");
        variations.setPromptText("e.g. width=±0.5mil, height=±10%, permittivity=±0.1");
        HBox.setHgrow(variations, Priority.ALWAYS);
        samples.setPrefColumnCount(5);
        seed.setPrefColumnCount(5);
        spec.setPrefColumnCount(6);
        spec.setPromptText("50±10");
        spec.setId("tolerance-spec");
        distribution.setValue(Tolerance.Distribution.UNIFORM);
        run.setId("tolerance-run");
        cancel.setId("tolerance-cancel");
        cancel.setDisable(true);
        run.setOnAction(e -> start());
        cancel.setOnAction(e -> cancelled.set(true));
        result.setId("tolerance-result");
        result.setWrapText(true);
        progress.setPrefWidth(160);
        HBox first = new HBox(6, new Label("Tolerances"), variations);
        first.setAlignment(Pos.CENTER_LEFT);
        HBox second = new HBox(6, new Label("samples"), samples, new Label("seed"), seed, distribution,
                new Label("|Z0| spec Ω±%"), spec);
        second.setAlignment(Pos.CENTER_LEFT);
        HBox third = new HBox(6, run, cancel, progress);
        third.setAlignment(Pos.CENTER_LEFT);
        getChildren().addAll(first, second, third, result);
        model.designProperty().addListener((o, old, now) -> {
            plots.setToleranceBands(null, null);
            if (old == null || old.geometry().type() != now.geometry().type()) {
                variations.setText(defaultVariations(now));
            }
        });
        variations.setText(defaultVariations(model.getDesign()));
    }

    private static String defaultVariations(Design design) {
        String first = design.geometry().valuesMetres().keySet().iterator().next();
        return first + "=±5%, permittivity=±0.1";
    }

    public Label resultLabel() {
        return result;
    }

    /** Starts a run, or says which input is wrong. */
    public void start() {
        Design design = model.getDesign();
        List<Tolerance.Variation> list = new ArrayList<>();
        int count;
        long seedValue;
        double target = Double.NaN;
        double fraction = 0;
        try {
            for (String item : variations.getText().split(",")) {
                if (!item.isBlank()) {
                    list.add(Tolerance.parseVariation(design, item.strip()));
                }
            }
            count = Integer.parseInt(samples.getText().strip());
            seedValue = Long.parseLong(seed.getText().strip());
            if (count < 10 || count > 100_000) {
                throw new NumberFormatException();
            }
            if (!spec.getText().isBlank()) {
                String[] parts = spec.getText().replace("+-", "±").split("±");
                target = Double.parseDouble(parts[0].strip());
                fraction = Double.parseDouble(parts[1].replace("%", "").strip()) / 100;
            }
        } catch (InvalidInputException e) {
            result.setText(e.getMessage());
            return;
        } catch (NumberFormatException | ArrayIndexOutOfBoundsException e) {
            result.setText("samples: a whole number from 10 to 100000; seed: a whole number; spec: OHMS±PERCENT");
            return;
        }
        if (list.isEmpty()) {
            result.setText("give at least one tolerance, e.g. width=±5%");
            return;
        }
        double f = model.crosshairHzProperty().get();
        double readout = Double.isNaN(f) ? Math.sqrt(design.sweep().fromHz() * design.sweep().toHz()) : f;
        double[] frequencies = new FrequencyGrid(design.sweep().fromHz(), design.sweep().toHz(), BAND_POINTS,
                GridScale.LOG).frequencies();
        Tolerance.Distribution shape = distribution.getValue();
        double specTarget = target;
        double specFraction = fraction;
        int threads = Math.max(1, Runtime.getRuntime().availableProcessors());
        cancelled.set(false);
        run.setDisable(true);
        cancel.setDisable(false);
        progress.setProgress(0);
        result.setText("running " + count + " samples…");
        CompletableFuture.supplyAsync(() -> {
            double[][][] bands = Tolerance.bands(design, list, shape, count, seedValue, frequencies, threads,
                    n -> fx.execute(() -> progress.setProgress((double) n / count)), cancelled::get);
            Tolerance.Result point = Tolerance.run(design, list, shape, count, seedValue, readout, specTarget,
                    specFraction, threads, n -> { }, cancelled::get);
            return new Object[] {bands, point};
        }, worker).whenCompleteAsync((outcome, error) -> {
            run.setDisable(false);
            cancel.setDisable(true);
            if (error != null) {
                Throwable cause = error.getCause() != null ? error.getCause() : error;
                result.setText(cause instanceof java.util.concurrent.CancellationException ? "cancelled"
                        : "the run failed: " + cause.getMessage());
                return;
            }
            if (!design.equals(model.getDesign())) {
                result.setText("the design changed during the run; run again");
                return;
            }
            double[][][] bands = (double[][][]) outcome[0];
            Tolerance.Result point = (Tolerance.Result) outcome[1];
            plots.setToleranceBands(frequencies, bands);
            result.setText(summary(point, readout));
        }, fx);
    }

    private static String summary(Tolerance.Result r, double frequency) {
        Tolerance.Band z = r.z0Ohm();
        String yield = Double.isNaN(r.yield()) ? "" : String.format(Locale.ROOT, "   yield %.1f %%", 100 * r.yield());
        return String.format(Locale.ROOT, "At %s: |Z0| 5-95 %% %.2f to %.2f Ω (Monte Carlo), %.2f to %.2f Ω"
                        + " (root-sum-square); attenuation %.4g to %.4g dB/m; %d of %d samples buildable%s",
                Display.frequency(frequency), z.p5(), z.p95(), z.rssP5(), z.rssP95(), r.attenuationDbPerMetre().p5(),
                r.attenuationDbPerMetre().p95(), r.valid(), r.samples(), yield);
    }
}
