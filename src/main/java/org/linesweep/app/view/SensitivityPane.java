package org.linesweep.app.view;

import java.util.List;
import java.util.Locale;
import java.util.concurrent.CompletableFuture;
import java.util.concurrent.Executor;
import javafx.beans.property.ReadOnlyStringWrapper;
import javafx.collections.FXCollections;
import javafx.geometry.Insets;
import javafx.geometry.VPos;
import javafx.scene.canvas.Canvas;
import javafx.scene.canvas.GraphicsContext;
import javafx.scene.control.Button;
import javafx.scene.control.ChoiceBox;
import javafx.scene.control.Label;
import javafx.scene.control.TableColumn;
import javafx.scene.control.TableView;
import javafx.scene.control.TextField;
import javafx.scene.layout.HBox;
import javafx.scene.layout.Priority;
import javafx.scene.layout.VBox;
import javafx.scene.paint.Color;
import javafx.scene.text.TextAlignment;
import org.linesweep.app.model.ExplorerModel;
import org.linesweep.design.Design;
import org.linesweep.design.Sensitivity;

/**
 * Which input matters most, at the read-out frequency: a ranked bar chart of the change in the chosen
 * quantity for −x % and +x % of each input (temperature ∓/± K), and a table with every number.
 */
public final class SensitivityPane extends VBox {

    private static final Color DECREASED = Color.web("#c2410c");
    private static final Color INCREASED = Color.web("#17408b");

    private final ExplorerModel model;
    private final Executor worker;
    private final Executor fx;
    private final TextField percent = new TextField("5");
    private final TextField kelvin = new TextField("10");
    /** Shown only when the analysed design is a pair. */
    private TableColumn<Sensitivity.Row, String> differentialColumn;
    private final ChoiceBox<Sensitivity.Quantity> rankBy =
            new ChoiceBox<>(FXCollections.observableArrayList(Sensitivity.Quantity.values()));
    private final Button analyse = new Button("Analyse at read-out frequency");
    private final Label status = new Label("");
    private final Canvas bars = new Canvas(520, 200);
    private final TableView<Sensitivity.Row> table = new TableView<>();
    private List<Sensitivity.Row> rows = List.of();

    public SensitivityPane(ExplorerModel model, Executor worker, Executor fx) {
        this.model = model;
        this.worker = worker;
        this.fx = fx;
        setPadding(new Insets(6, 10, 6, 10));
        setSpacing(4);
        percent.setPrefColumnCount(4);
        percent.setId("sensitivity-percent");
        kelvin.setPrefColumnCount(4);
        rankBy.setValue(Sensitivity.Quantity.Z0);
        rankBy.setConverter(new javafx.util.StringConverter<>() {
            @Override
            public String toString(Sensitivity.Quantity q) {
                return q == null ? "" : q.label();
            }

            @Override
            public Sensitivity.Quantity fromString(String s) {
                return null;
            }
        });
        rankBy.valueProperty().addListener((o, old, now) -> {
            rows = rows.stream().sorted(java.util.Comparator.comparingDouble(
                    (Sensitivity.Row r) -> r.magnitude(now)).reversed()).toList();
            show();
        });
        analyse.setId("sensitivity-analyse");
        analyse.setOnAction(e -> run());
        table.setId("sensitivity-table");
        table.setPrefHeight(140);
        table.setColumnResizePolicy(TableView.CONSTRAINED_RESIZE_POLICY_FLEX_LAST_COLUMN);
        TableColumn<Sensitivity.Row, String> input = new TableColumn<>("Input");
        input.setCellValueFactory(c -> new ReadOnlyStringWrapper(c.getValue().input().label()));
        table.getColumns().add(input);
        for (Sensitivity.Quantity q : Sensitivity.Quantity.values()) {
            TableColumn<Sensitivity.Row, String> column = new TableColumn<>(q.label() + " −/+");
            column.setCellValueFactory(c -> new ReadOnlyStringWrapper(String.format(Locale.ROOT, "%s / %s",
                    percentText(c.getValue().minus()[q.ordinal()]), percentText(c.getValue().plus()[q.ordinal()]))));
            table.getColumns().add(column);
            if (q == Sensitivity.Quantity.DIFFERENTIAL_IMPEDANCE) {
                differentialColumn = column;
                column.setVisible(false);
            }
        }
        TableColumn<Sensitivity.Row, String> elasticity = new TableColumn<>("d ln Q/d ln X");
        elasticity.setCellValueFactory(c -> new ReadOnlyStringWrapper(String.format(Locale.ROOT, "%.3g",
                c.getValue().elasticity()[rankBy.getValue().ordinal()])));
        table.getColumns().add(elasticity);
        HBox controls = new HBox(6, new Label("±"), percent, new Label("%   temperature ±"), kelvin, new Label("K   rank by"),
                rankBy, analyse, status);
        controls.setAlignment(javafx.geometry.Pos.CENTER_LEFT);
        HBox.setHgrow(status, Priority.ALWAYS);
        getChildren().addAll(controls, bars, table);
    }

    public TableView<Sensitivity.Row> table() {
        return table;
    }

    public List<Sensitivity.Row> rows() {
        return rows;
    }

    private static String percentText(double change) {
        return Double.isNaN(change) ? "—" : String.format(Locale.ROOT, "%+.2f %%", 100 * change);
    }

    /** Runs the analysis off the FX thread and shows it when done. */
    public void run() {
        double step;
        double kelvinStep;
        try {
            step = Double.parseDouble(percent.getText().strip());
            kelvinStep = Double.parseDouble(kelvin.getText().strip());
            if (!(step > 0 && step < 50) || !(kelvinStep > 0 && kelvinStep <= 100)) {
                throw new NumberFormatException();
            }
        } catch (NumberFormatException e) {
            status.setText("the step must be a number of per cent between 0 and 50, the temperature step 0 to 100 K");
            return;
        }
        Design design = model.getDesign();
        differentialColumn.setVisible(design.geometry().isPair());
        double f = model.crosshairHzProperty().get();
        double frequency = Double.isNaN(f)
                ? Math.sqrt(design.sweep().fromHz() * design.sweep().toHz()) : f;
        Sensitivity.Quantity rank = rankBy.getValue();
        status.setText("analysing at " + Display.frequency(frequency) + "…");
        analyse.setDisable(true);
        CompletableFuture.supplyAsync(() -> Sensitivity.analyse(design, frequency, step, kelvinStep, rank), worker)
                .whenCompleteAsync((result, error) -> {
                    analyse.setDisable(false);
                    if (error != null) {
                        status.setText("analysis failed: " + error.getMessage());
                        return;
                    }
                    rows = result;
                    status.setText("at " + Display.frequency(frequency) + ", ±" + Display.number(step) + " % (±"
                            + Display.number(kelvinStep) + " K)");
                    show();
                }, fx);
    }

    private void show() {
        table.getItems().setAll(rows);
        Sensitivity.Quantity q = rankBy.getValue();
        GraphicsContext g = bars.getGraphicsContext2D();
        double rowHeight = 20;
        bars.setHeight(Math.max(40, rows.size() * rowHeight + 24));
        double w = bars.getWidth();
        g.setFill(Color.WHITE);
        g.fillRect(0, 0, w, bars.getHeight());
        double max = rows.stream().mapToDouble(r -> r.magnitude(q)).max().orElse(0);
        double centre = 170 + (w - 170) / 2;
        double half = (w - 170) / 2 - 50;
        g.setStroke(Color.web("#888888"));
        g.strokeLine(centre, 4, centre, bars.getHeight() - 18);
        g.setTextBaseline(VPos.CENTER);
        for (int i = 0; i < rows.size(); i++) {
            Sensitivity.Row row = rows.get(i);
            double y = 6 + i * rowHeight;
            g.setFill(Color.web("#1f2328"));
            g.setTextAlign(TextAlignment.RIGHT);
            g.fillText(row.input().label(), 162, y + rowHeight / 2 - 1);
            drawBar(g, row.minus()[q.ordinal()], max, centre, half, y + 2, DECREASED);
            drawBar(g, row.plus()[q.ordinal()], max, centre, half, y + 10, INCREASED);
        }
        g.setTextAlign(TextAlignment.LEFT);
        g.setFill(DECREASED);
        g.fillText("input decreased", 8, bars.getHeight() - 9);
        g.setFill(INCREASED);
        g.fillText("input increased", 140, bars.getHeight() - 9);
        g.setFill(Color.web("#1f2328"));
        g.fillText("change in " + q.label(), centre + 10, bars.getHeight() - 9);
    }

    private static void drawBar(GraphicsContext g, double change, double max, double centre, double half, double y,
            Color color) {
        if (Double.isNaN(change) || max <= 0) {
            return;
        }
        double length = half * Math.abs(change) / max;
        g.setFill(color);
        if (change >= 0) {
            g.fillRect(centre, y, length, 7);
        } else {
            g.fillRect(centre - length, y, length, 7);
        }
        g.setTextAlign(change >= 0 ? TextAlignment.LEFT : TextAlignment.RIGHT);
        g.fillText(String.format(Locale.ROOT, "%+.2f %%", 100 * change), change >= 0 ? centre + length + 4
                : centre - length - 4, y + 4);
    }
}
