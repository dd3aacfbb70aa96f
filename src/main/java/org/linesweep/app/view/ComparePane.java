package org.linesweep.app.view;

import java.util.function.ToDoubleFunction;
import javafx.beans.property.ReadOnlyStringWrapper;
import javafx.collections.ListChangeListener;
import javafx.geometry.Insets;
import javafx.scene.control.Button;
import javafx.scene.control.Label;
import javafx.scene.control.TableColumn;
import javafx.scene.control.TableView;
import javafx.scene.layout.HBox;
import javafx.scene.layout.VBox;
import javafx.scene.shape.Line;
import org.linesweep.app.model.ExplorerModel;
import org.linesweep.app.model.Pin;
import org.linesweep.app.model.SweepSnapshot;
import org.linesweep.design.Design;
import org.linesweep.physics.LinePoint;

/**
 * The pinned designs: each with its line style, and its Z0, attenuation and ceiling at the crosshair's
 * frequency beside the difference from the live design.
 */
public final class ComparePane extends VBox {

    private final ExplorerModel model;
    private final TableView<Pin> table = new TableView<>();
    private final Button pin = new Button("Pin");
    private final Button unpin = new Button("Unpin");
    private final Button clear = new Button("Clear pins");
    private Palette palette = Palette.STANDARD;
    private final TableColumn<Pin, String> differential = new TableColumn<>("Zdiff Ω");

    public ComparePane(ExplorerModel model) {
        this.model = model;
        getStyleClass().add("compare-pane");
        setPadding(new Insets(6, 10, 6, 10));
        setSpacing(4);
        pin.setId("pin-button");
        unpin.setId("unpin-button");
        clear.setId("clear-pins-button");
        table.setId("pins-table");
        pin.setOnAction(e -> model.pinCurrent());
        unpin.setOnAction(e -> {
            Pin selected = table.getSelectionModel().getSelectedItem();
            if (selected != null) {
                model.unpin(selected);
            }
        });
        clear.setOnAction(e -> model.unpinAll());
        pin.disableProperty().bind(javafx.beans.binding.Bindings.size(model.pins()).greaterThanOrEqualTo(
                ExplorerModel.MAX_PINS));
        table.setItems(model.pins());
        table.setPlaceholder(new Label("Pin the current design to compare variants (up to "
                + ExplorerModel.MAX_PINS + ")."));
        table.setPrefHeight(150);
        table.setColumnResizePolicy(TableView.CONSTRAINED_RESIZE_POLICY_FLEX_LAST_COLUMN);
        TableColumn<Pin, Pin> style = new TableColumn<>("Line");
        style.setCellValueFactory(c -> new javafx.beans.property.ReadOnlyObjectWrapper<>(c.getValue()));
        style.setCellFactory(c -> new javafx.scene.control.TableCell<>() {
            @Override
            protected void updateItem(Pin item, boolean empty) {
                super.updateItem(item, empty);
                if (empty || item == null) {
                    setGraphic(null);
                    return;
                }
                Line line = new Line(0, 0, 34, 0);
                line.setStroke(palette.pin(item.slot()));
                line.setStrokeWidth(2.5);
                for (double d : Palette.PIN_DASHES[item.slot()]) {
                    line.getStrokeDashArray().add(d);
                }
                setGraphic(line);
            }
        });
        style.setPrefWidth(50);
        TableColumn<Pin, String> name = new TableColumn<>("Design");
        name.setCellValueFactory(c -> new ReadOnlyStringWrapper(c.getValue().label()));
        name.setPrefWidth(220);
        table.getColumns().add(style);
        table.getColumns().add(name);
        table.getColumns().add(column("|Z0| Ω", p -> p.z0MagnitudeOhm(), false));
        table.getColumns().add(column("Δ|Z0|", p -> p.z0MagnitudeOhm(), true));
        table.getColumns().add(column("α dB/m", LinePoint::alphaDbPerMetre, false));
        table.getColumns().add(column("Δα", LinePoint::alphaDbPerMetre, true));
        TableColumn<Pin, String> ceiling = new TableColumn<>("ceiling");
        ceiling.setCellValueFactory(c -> new ReadOnlyStringWrapper(Display.frequency(c.getValue().snapshot().limits()
                .ceilingHz())));
        TableColumn<Pin, String> ceilingChange = new TableColumn<>("Δceiling");
        ceilingChange.setCellValueFactory(c -> {
            SweepSnapshot live = model.snapshotProperty().get();
            double ratio = live == null ? Double.NaN
                    : c.getValue().snapshot().limits().ceilingHz() / live.limits().ceilingHz();
            return new ReadOnlyStringWrapper(Double.isFinite(ratio) ? "×" + Display.number(ratio) : "—");
        });
        table.getColumns().add(ceiling);
        table.getColumns().add(ceilingChange);
        differential.setId("pins-zdiff");
        differential.setCellValueFactory(c -> {
            SweepSnapshot live = model.snapshotProperty().get();
            Design pinned = c.getValue().snapshot().design();
            if (live == null || !pinned.geometry().isPair()) {
                return new ReadOnlyStringWrapper("—");
            }
            return new ReadOnlyStringWrapper(Display.number(pinned.toPair().modes(readoutFrequency(live))
                    .differentialImpedanceOhm()));
        });
        differential.setVisible(false);
        table.getColumns().add(differential);
        pin.setTooltip(new javafx.scene.control.Tooltip("Pin the current design for comparison (Ctrl+P)"));
        table.setTooltip(new javafx.scene.control.Tooltip("Values at the read-out frequency; differences are pin − live"));
        Label note = new Label("Δ = pin − live, at the read-out frequency");
        note.getStyleClass().add("compare-note");
        HBox buttons = new HBox(6, pin, unpin, clear, note);
        getChildren().addAll(buttons, table);
        // refreshing rebuilds the table's cells and lays the window out again: only when there is a row to show
        model.snapshotProperty().addListener((o, old, now) -> refreshRows());
        model.crosshairHzProperty().addListener((o, old, now) -> refreshRows());
        model.pins().addListener((ListChangeListener<Pin>) c -> {
            // a pair's differential impedance is the number its variants are compared by
            differential.setVisible(model.pins().stream().anyMatch(pin -> pin.snapshot().design().geometry().isPair()));
            table.refresh();
        });
        model.meetingModeProperty().addListener((o, old, now) -> {
            palette = Palette.of(now);
            table.refresh();
        });
    }

    private void refreshRows() {
        if (!model.pins().isEmpty()) {
            table.refresh();
        }
    }

    public TableView<Pin> table() {
        return table;
    }

    private double readoutFrequency(SweepSnapshot snapshot) {
        double f = model.crosshairHzProperty().get();
        if (Double.isNaN(f)) {
            f = Math.sqrt(snapshot.sweep().frequencyHz(0) * snapshot.sweep().frequencyHz(snapshot.sweep().size() - 1));
        }
        return f;
    }

    private TableColumn<Pin, String> column(String title, ToDoubleFunction<LinePoint> quantity, boolean difference) {
        TableColumn<Pin, String> column = new TableColumn<>(title);
        column.setCellValueFactory(c -> {
            SweepSnapshot live = model.snapshotProperty().get();
            if (live == null) {
                return new ReadOnlyStringWrapper("");
            }
            double f = readoutFrequency(live);
            double pinned = quantity.applyAsDouble(c.getValue().snapshot().model().at(f));
            if (!difference) {
                return new ReadOnlyStringWrapper(Display.number(pinned));
            }
            double current = quantity.applyAsDouble(live.model().at(f));
            double change = pinned - current;
            return new ReadOnlyStringWrapper((change >= 0 ? "+" : "") + Display.number(change));
        });
        return column;
    }
}
