package org.linesweep.app.view;

import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.CompletableFuture;
import java.util.concurrent.Executor;
import java.util.concurrent.atomic.AtomicLong;
import java.util.function.Consumer;
import javafx.beans.property.ReadOnlyObjectProperty;
import javafx.beans.property.ReadOnlyObjectWrapper;
import javafx.collections.FXCollections;
import javafx.geometry.Insets;
import javafx.geometry.Pos;
import javafx.scene.control.Button;
import javafx.scene.control.ChoiceBox;
import javafx.scene.control.Label;
import javafx.scene.control.TextField;
import javafx.scene.control.Tooltip;
import javafx.scene.layout.HBox;
import javafx.scene.layout.Priority;
import javafx.scene.layout.VBox;
import javafx.util.StringConverter;
import org.linesweep.app.model.ExplorerModel;
import org.linesweep.design.Design;
import org.linesweep.design.InvalidInputException;
import org.linesweep.design.Rule;
import org.linesweep.signal.WaveShape;
import org.linesweep.signal.Waveform;
import org.linesweep.signal.WaveformSettings;

/**
 * The time-domain view: the live design's line of its length between a source and a load, driven with a
 * step, pulse or square wave; source, near-end and far-end voltages on a time axis, the far end's delay,
 * rise time and overshoot read out, and the model's causality warnings beside them.
 *
 * <p>The response is computed off the FX thread whenever the design or the stimulus changes while the view
 * is showing; only the latest request's result is drawn.
 */
public final class WaveformPane extends HBox {

    private final ExplorerModel model;
    private final Executor worker;
    private final Executor fx;
    private final FrequencyPlot plot = new FrequencyPlot();
    private final ChoiceBox<WaveShape> shape = new ChoiceBox<>(FXCollections.observableArrayList(WaveShape.values()));
    private final TextField rise = field("wave-rise", "100 ps", 6);
    private final TextField width = field("wave-width", "1 ns", 6);
    private final TextField period = field("wave-period", "4 ns", 6);
    private final TextField source = field("wave-source", "50", 5);
    private final TextField load = field("wave-load", "50", 5);
    private final TextField capacitance = field("wave-load-pf", "0", 4);
    private final TextField duration = field("wave-duration", "", 6);
    private final javafx.scene.control.ScrollPane controlsScroll = new javafx.scene.control.ScrollPane();
    private final Label readout = new Label("");
    private final Label warnings = new Label("");
    private final Label message = new Label("");
    private final Button export = new Button("Save CSV…");
    private final AtomicLong requests = new AtomicLong();
    private final ReadOnlyObjectWrapper<Waveform> waveform = new ReadOnlyObjectWrapper<>();
    private WaveformSettings settings = WaveformSettings.DEFAULT;
    private boolean showing;

    public WaveformPane(ExplorerModel model, Executor worker, Executor fx, Consumer<Waveform> exporter) {
        this.model = model;
        this.worker = worker;
        this.fx = fx;
        setPadding(new Insets(6, 10, 6, 10));
        setSpacing(8);
        setId("waveform-pane");
        shape.setId("wave-shape");
        shape.setValue(WaveShape.STEP);
        shape.setConverter(new StringConverter<>() {
            @Override
            public String toString(WaveShape value) {
                return value == null ? "" : value.key();
            }

            @Override
            public WaveShape fromString(String text) {
                return WaveShape.fromKey(text);
            }
        });
        load.setTooltip(new Tooltip("Load resistance in ohms, or \"open\""));
        capacitance.setTooltip(new Tooltip("Capacitance across the load, pF (a receiver's input)"));
        duration.setPromptText("auto");
        duration.setTooltip(new Tooltip("Length of the record; blank chooses one from the delay, edges and echoes"));
        javafx.scene.layout.GridPane inputs = new javafx.scene.layout.GridPane();
        inputs.setHgap(6);
        inputs.setVgap(3);
        inputs.addRow(0, new Label("shape"), shape, new Label("rise 10-90 %"), rise);
        Label widthLabel = new Label("pulse width");
        Label periodLabel = new Label("period");
        inputs.addRow(1, widthLabel, width, periodLabel, period);
        inputs.addRow(2, new Label("source Ω"), source, new Label("load Ω"), load);
        inputs.addRow(3, new Label("load ‖ pF"), capacitance, new Label("duration"), duration);
        for (javafx.scene.Node node : inputs.getChildren()) {
            if (node instanceof Label label) {
                label.setMinWidth(javafx.scene.layout.Region.USE_PREF_SIZE);
            }
        }
        widthLabel.visibleProperty().bind(width.visibleProperty());
        periodLabel.visibleProperty().bind(period.visibleProperty());
        readout.setId("wave-readout");
        readout.getStyleClass().add("wave-readout");
        warnings.setId("wave-warnings");
        warnings.getStyleClass().add("wave-warnings");
        warnings.setWrapText(true);
        message.setId("wave-message");
        message.getStyleClass().add("field-message");
        message.setWrapText(true);
        plot.setId("plot-waveform");
        plot.setHorizontalAxis("s", FrequencyPlot.Scale.LINEAR);
        plot.setLeftAxis("V", FrequencyPlot.Scale.LINEAR);
        plot.setTitle("Time domain");
        plot.setMinHeight(150);
        plot.setOnHover(plot::setCrosshair);
        export.setId("wave-export");
        export.setDisable(true);
        export.setOnAction(e -> {
            if (waveform.get() != null) {
                exporter.accept(waveform.get());
            }
        });
        readout.setWrapText(true);
        readout.setMinHeight(javafx.scene.layout.Region.USE_PREF_SIZE);
        warnings.setMinHeight(javafx.scene.layout.Region.USE_PREF_SIZE);
        message.setMinHeight(javafx.scene.layout.Region.USE_PREF_SIZE);
        VBox controls = new VBox(4, inputs, export, message, readout, warnings);
        controls.setPrefWidth(330);
        controls.setMinWidth(280);
        HBox.setHgrow(plot, Priority.ALWAYS);
        plot.setMinWidth(300);
        controlsScroll.setContent(controls);
        controlsScroll.setFitToWidth(true);
        controlsScroll.setHbarPolicy(javafx.scene.control.ScrollPane.ScrollBarPolicy.NEVER);
        getChildren().addAll(controlsScroll, plot);
        for (TextField field : List.of(rise, width, period, source, load, capacitance, duration)) {
            field.setOnAction(e -> commit());
            field.focusedProperty().addListener((o, was, now) -> {
                if (!now) {
                    commit();
                }
            });
        }
        shape.valueProperty().addListener((o, old, now) -> {
            updateShapeFields();
            commit();
        });
        updateShapeFields();
        model.snapshotProperty().addListener((o, old, now) -> recompute());
        applyLook(model.meetingModeProperty().get());
        model.meetingModeProperty().addListener((o, old, now) -> {
            applyLook(now);
            draw();
        });
    }

    /** Meeting mode's larger type needs a wider column of inputs, as the design panel does. */
    private void applyLook(boolean meeting) {
        plot.setMeetingLook(meeting);
        controlsScroll.setPrefWidth(meeting ? 470 : 345);
        controlsScroll.setMinWidth(meeting ? 400 : 290);
    }

    private static TextField field(String id, String text, int columns) {
        TextField field = new TextField(text);
        field.setId(id);
        field.setPrefColumnCount(columns);
        return field;
    }

    private void updateShapeFields() {
        width.setVisible(shape.getValue() == WaveShape.PULSE);
        period.setVisible(shape.getValue() == WaveShape.SQUARE);
    }

    /** Tells the pane whether it is on screen; it computes only then. */
    public void setShowing(boolean value) {
        showing = value;
        if (value) {
            recompute();
        }
    }

    /** The last computed waveform (null before the first). */
    public ReadOnlyObjectProperty<Waveform> waveformProperty() {
        return waveform.getReadOnlyProperty();
    }

    /** The stimulus and terminations in force. */
    public WaveformSettings settings() {
        return settings;
    }

    public Label readoutLabel() {
        return readout;
    }

    public Label warningsLabel() {
        return warnings;
    }

    public Label messageLabel() {
        return message;
    }

    public FrequencyPlot plot() {
        return plot;
    }

    /**
     * Reads the fields into settings; on bad input names the field, the value and the allowed range and
     * keeps the last valid settings.
     *
     * @return true if the fields were valid
     */
    public boolean commit() {
        try {
            WaveShape chosen = shape.getValue();
            WaveformSettings next = new WaveformSettings(chosen, Rule.RISE_TIME.parse("rise", rise.getText()),
                    chosen == WaveShape.PULSE ? Rule.TIME_SPAN.parse("width", width.getText()) : Double.NaN,
                    chosen == WaveShape.SQUARE ? Rule.TIME_SPAN.parse("period", period.getText()) : Double.NaN,
                    Rule.SOURCE_RESISTANCE.parse("source Ω", source.getText()),
                    WaveformSettings.parseLoad("load Ω", load.getText()),
                    WaveformSettings.parseLoadPicofarads("load pF", capacitance.getText()),
                    duration.getText().isBlank() ? Double.NaN : Rule.TIME_SPAN.parse("duration", duration.getText()));
            message.setText("");
            if (!next.equals(settings)) {
                settings = next;
                recompute();
            }
            return true;
        } catch (InvalidInputException e) {
            message.setText(e.getMessage() + " (the waveform keeps the last valid settings)");
            return false;
        }
    }

    private void recompute() {
        if (!showing || model.getDesign() == null) {
            return;
        }
        Design design = model.getDesign();
        WaveformSettings request = settings;
        long sequence = requests.incrementAndGet();
        CompletableFuture.supplyAsync(() -> request.simulate(design.toModel(), design.lengthMetres()), worker)
                .whenCompleteAsync((result, error) -> {
                    if (sequence != requests.get()) {
                        return; // a newer request is on its way
                    }
                    if (error != null) {
                        Throwable cause = error.getCause() != null ? error.getCause() : error;
                        message.setText("the waveform could not be computed: " + cause.getMessage());
                        return;
                    }
                    waveform.set(result);
                    export.setDisable(false);
                    draw();
                }, fx);
    }

    private void draw() {
        Waveform w = waveform.get();
        if (w == null || w.size() < 2) {
            return;
        }
        Palette palette = Palette.of(model.meetingModeProperty().get());
        double[] time = w.timeSeconds();
        plot.setFrequencyRange(time[0], time[time.length - 1]);
        List<PlotSeries> series = new ArrayList<>();
        series.add(new PlotSeries("source (open circuit)", time, w.sourceVolts(), w.size(), palette.grid().darker(),
                1.2, new double[] {3, 3}, false));
        series.add(new PlotSeries("near end", time, w.inputVolts(), w.size(), palette.pin(1), 1.6, new double[] {8, 4},
                false));
        series.add(new PlotSeries("far end (load)", time, w.outputVolts(), w.size(), palette.live(), 2.2,
                new double[0], false));
        plot.setSeries(series);
        readout.setText("Far end: " + w.summary());
        warnings.setText(String.join("\n", w.warnings()));
    }
}
