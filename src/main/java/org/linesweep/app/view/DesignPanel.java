package org.linesweep.app.view;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.function.DoubleFunction;
import javafx.collections.FXCollections;
import javafx.geometry.Insets;
import javafx.scene.control.ComboBox;
import javafx.scene.control.Label;
import javafx.scene.control.ListCell;
import javafx.scene.control.Separator;
import javafx.scene.control.ToggleButton;
import javafx.scene.control.ToggleGroup;
import javafx.scene.control.Tooltip;
import javafx.scene.layout.HBox;
import javafx.scene.layout.VBox;
import org.linesweep.app.model.ExplorerModel;
import org.linesweep.design.ConductorSpec;
import org.linesweep.design.Design;
import org.linesweep.design.DielectricSpec;
import org.linesweep.design.Geometry;
import org.linesweep.design.GeometryField;
import org.linesweep.design.Rule;
import org.linesweep.design.SweepSettings;
import org.linesweep.physics.ConductorMaterial;
import org.linesweep.physics.DielectricMaterial;
import org.linesweep.physics.DielectricModelKind;
import org.linesweep.physics.LineType;

/**
 * The design editor: line type, one control per geometry field, conductor, dielectric, length, temperature,
 * sweep and the marker threshold. It shows the model's design and turns every edit into a model change;
 * a refused edit shows the model's message under the field and the design stays as it was.
 */
public final class DesignPanel extends VBox {

    private static final String CUSTOM = "custom";

    private final ExplorerModel model;
    private final ComboBox<LineType> type = new ComboBox<>(FXCollections.observableArrayList(LineType.values()));
    private final VBox geometryBox = new VBox(2);
    private final Map<String, QuantityControl> geometryControls = new LinkedHashMap<>();
    /** Makes a microstrip or stripline a pair; null for the other types. */
    private javafx.scene.control.CheckBox pairToggle;
    private final ComboBox<String> conductor = new ComboBox<>();
    private final ComboBox<String> dielectric = new ComboBox<>();
    private final ComboBox<DielectricModelKind> dielectricModel =
            new ComboBox<>(FXCollections.observableArrayList(DielectricModelKind.values()));
    private final QuantityControl conductivity;
    private final QuantityControl conductorPermeability;
    private final QuantityControl roughness;
    private final QuantityControl temperature;
    private final QuantityControl permittivity;
    private final QuantityControl lossTangent;
    private final QuantityControl lineLength;
    private final QuantityControl sweepFrom;
    private final QuantityControl sweepTo;
    private final QuantityControl sweepPoints;
    private final QuantityControl threshold;
    private final QuantityControl lossBudget;
    private final ToggleGroup thresholdChoices = new ToggleGroup();
    private final VBox secondary = new VBox(2);
    private LineType shownType;
    private boolean updating;

    public DesignPanel(ExplorerModel model) {
        this.model = model;
        getStyleClass().add("design-panel");
        setSpacing(4);
        setPadding(new Insets(10));
        setPrefWidth(300);
        type.setId("line-type");
        type.setMaxWidth(Double.MAX_VALUE);
        type.setCellFactory(v -> typeCell());
        type.setButtonCell(typeCell());
        type.valueProperty().addListener((o, old, now) -> {
            if (!updating && now != null && now != model.getDesign().geometry().type()) {
                model.apply(d -> d.withGeometry(Geometry.starter(now)));
            }
        });
        conductor.getItems().addAll(keys(ConductorMaterial.values()));
        conductor.getItems().add(CUSTOM);
        conductor.setId("conductor-material");
        conductor.setMaxWidth(Double.MAX_VALUE);
        conductor.valueProperty().addListener((o, old, now) -> {
            if (!updating && now != null && !now.equals(CUSTOM)) {
                ConductorMaterial m = ConductorMaterial.byKey(now).orElseThrow();
                model.apply(d -> d.withConductor(ConductorSpec.of(m).withRoughness(d.conductor().roughnessRmsMetres())));
            }
        });
        dielectric.getItems().addAll(keys(DielectricMaterial.values()));
        dielectric.getItems().add(CUSTOM);
        dielectric.setId("dielectric-material");
        dielectric.setMaxWidth(Double.MAX_VALUE);
        dielectric.valueProperty().addListener((o, old, now) -> {
            if (!updating && now != null && !now.equals(CUSTOM)) {
                model.apply(d -> d.withDielectric(DielectricSpec.of(DielectricMaterial.byKey(now).orElseThrow())));
            }
        });
        dielectricModel.setId("dielectric-model");
        dielectricModel.setConverter(new javafx.util.StringConverter<>() {
            @Override
            public String toString(DielectricModelKind kind) {
                return kind == null ? "" : kind == DielectricModelKind.CONSTANT ? "constant loss tangent (not causal)"
                        : "wideband Debye (causal)";
            }

            @Override
            public DielectricModelKind fromString(String text) {
                return null;
            }
        });
        dielectricModel.setMaxWidth(Double.MAX_VALUE);
        dielectricModel.setTooltip(new Tooltip("constant: ε′ and tan δ fixed (not causal). wideband-debye: the causal"
                + " Djordjevic-Sarkar model fitted at the reference frequency, band 1 kHz to 1 THz."));
        dielectricModel.valueProperty().addListener((o, old, now) -> {
            if (!updating && now != null) {
                model.apply(d -> d.withDielectric(d.dielectric().withValues(d.dielectric().relativePermittivity(),
                        d.dielectric().lossTangent(), now)));
            }
        });
        conductivity = plain("Conductivity (S/m)", "conductor.conductivity", Rule.CONDUCTIVITY, Display::number,
                v -> model.apply(d -> d.withConductor(d.conductor().withValues(v, d.conductor().relativePermeability()))));
        conductorPermeability = plain("Conductor μr", "conductor.permeability", Rule.PERMEABILITY, Display::number,
                v -> model.apply(d -> d.withConductor(d.conductor().withValues(d.conductor().conductivitySiemensPerMetre(),
                        v))));
        roughness = plain("Roughness (RMS)", "conductor.roughnessRms", Rule.ROUGHNESS, v -> Display.length(v,
                model.unitSystemProperty().get()), v -> model.apply(d -> d.withConductor(d.conductor().withRoughness(v))));
        temperature = plain("Temperature", "temperature", Rule.TEMPERATURE, Display::celsius,
                v -> model.apply(d -> d.withTemperature(v)));
        permittivity = plain("Permittivity εr", "dielectric.permittivity", Rule.PERMITTIVITY, Display::number,
                v -> model.apply(d -> d.withDielectric(d.dielectric().withValues(v, d.dielectric().lossTangent(),
                        d.dielectric().model()))));
        lossTangent = plain("Loss tangent", "dielectric.lossTangent", Rule.LOSS_TANGENT, Display::number,
                v -> model.apply(d -> d.withDielectric(d.dielectric().withValues(d.dielectric().relativePermittivity(), v,
                        d.dielectric().model()))));
        lineLength = slider("Line length", "length", Rule.LINE_LENGTH,
                v -> Display.lineLength(v, model.unitSystemProperty().get()), Design::withLength);
        sweepFrom = plain("Sweep from", "sweep.from", Rule.FREQUENCY, Display::frequency,
                v -> model.apply(d -> d.withSweep(new SweepSettings(v, d.sweep().toHz(), d.sweep().points(),
                        d.sweep().scale()))));
        sweepTo = plain("Sweep to", "sweep.to", Rule.FREQUENCY, Display::frequency,
                v -> model.apply(d -> d.withSweep(new SweepSettings(d.sweep().fromHz(), v, d.sweep().points(),
                        d.sweep().scale()))));
        sweepPoints = plain("Points", "sweep.points", Rule.POINTS, v -> String.valueOf((long) v),
                v -> model.apply(d -> d.withSweep(new SweepSettings(d.sweep().fromHz(), d.sweep().toHz(), (int) v,
                        d.sweep().scale()))));
        threshold = plain("L/λ threshold", "threshold", Rule.THRESHOLD, Display::number,
                v -> model.apply(d -> d.withThreshold(v)));
        lossBudget = plain("Loss budget (dB)", "lossBudget", Rule.LOSS_BUDGET, Display::number,
                v -> model.apply(d -> d.withLossBudget(v)));
        HBox quick = new HBox(4);
        for (double choice : new double[] {0.01, 0.05, 0.1}) {
            ToggleButton button = new ToggleButton(Display.number(choice));
            button.setId("threshold-" + Display.number(choice).replace('.', '_'));
            button.setToggleGroup(thresholdChoices);
            button.setUserData(choice);
            button.setOnAction(e -> model.apply(d -> d.withThreshold(choice)));
            quick.getChildren().add(button);
        }
        Label quickLabel = new Label("Quick thresholds:");
        HBox quickRow = new HBox(6, quickLabel, quick);
        secondary.getChildren().addAll(heading("Sweep"), sweepFrom, sweepTo, sweepPoints);
        getChildren().addAll(heading("Line"), type, geometryBox, lineLength, new Separator(),
                heading("Conductor"), conductor, conductivity, conductorPermeability, roughness, temperature,
                new Separator(), heading("Dielectric"), dielectric, permittivity, lossTangent, dielectricModel,
                new Separator(), heading("Limits"), threshold, quickRow, lossBudget, new Separator(), secondary);
        model.designProperty().addListener((o, old, now) -> show(now));
        model.unitSystemProperty().addListener((o, old, now) -> refreshFormats());
        model.messageProperty().addListener((o, old, now) -> {
            if (now == null || now.isEmpty()) {
                allControls().forEach(c -> c.setMessage(""));
            }
        });
        show(model.getDesign());
    }

    /** Controls shown only outside meeting mode. */
    public VBox secondaryControls() {
        return secondary;
    }

    /**
     * Meeting mode: keep what a meeting decides on (geometry, length, materials, threshold) and hide the
     * material details and the sweep.
     */
    public void setCompact(boolean compact) {
        for (javafx.scene.Node node : List.of(secondary, conductivity, conductorPermeability, roughness, temperature,
                permittivity, lossTangent, dielectricModel, lossBudget)) {
            node.setVisible(!compact);
            node.setManaged(!compact);
        }
    }

    /** The control of a geometry field, by its design-file name (for tests). */
    public QuantityControl geometryControl(String field) {
        return geometryControls.get(field);
    }

    public QuantityControl lineLengthControl() {
        return lineLength;
    }

    /** Any control by its field path (e.g. {@code dielectric.permittivity}), for tests; null if none. */
    public QuantityControl control(String fieldPath) {
        for (QuantityControl c : allControls()) {
            if (c.textField().getId().equals(fieldPath.replace('.', '-'))) {
                return c;
            }
        }
        return null;
    }

    private List<QuantityControl> allControls() {
        List<QuantityControl> all = new ArrayList<>(geometryControls.values());
        all.addAll(List.of(conductivity, conductorPermeability, roughness, temperature, permittivity, lossTangent,
                lineLength, sweepFrom, sweepTo, sweepPoints, threshold, lossBudget));
        return all;
    }

    private static Label heading(String text) {
        Label label = new Label(text);
        label.getStyleClass().add("panel-heading");
        return label;
    }

    private static ListCell<LineType> typeCell() {
        return new ListCell<>() {
            @Override
            protected void updateItem(LineType item, boolean empty) {
                super.updateItem(item, empty);
                setText(empty || item == null ? "" : item.displayName());
            }
        };
    }

    private static List<String> keys(ConductorMaterial[] values) {
        List<String> keys = new ArrayList<>();
        for (ConductorMaterial m : values) {
            keys.add(m.key());
        }
        return keys;
    }

    private static List<String> keys(DielectricMaterial[] values) {
        List<String> keys = new ArrayList<>();
        for (DielectricMaterial m : values) {
            keys.add(m.key());
        }
        return keys;
    }

    /** A field without a slider; the message comes from the model when the design refuses the value. */
    private QuantityControl plain(String label, String field, Rule rule, DoubleFunction<String> format,
            java.util.function.DoublePredicate commit) {
        QuantityControl[] holder = new QuantityControl[1];
        holder[0] = new QuantityControl(label, field, rule, false, format, new QuantityControl.Listener() {
            @Override
            public void dragStarted() {
            }

            @Override
            public boolean dragged(double value) {
                return committed(value);
            }

            @Override
            public void dragEnded() {
            }

            @Override
            public boolean committed(double value) {
                boolean ok = commit.test(value);
                if (!ok) {
                    holder[0].setMessage(model.messageProperty().get());
                }
                return ok;
            }
        });
        return holder[0];
    }

    /** A field with a log slider; dragging is one undo step. */
    private QuantityControl slider(String label, String field, Rule rule, DoubleFunction<String> format,
            java.util.function.BiFunction<Design, Double, Design> change) {
        QuantityControl[] holder = new QuantityControl[1];
        holder[0] = new QuantityControl(label, field, rule, true, format, new QuantityControl.Listener() {
            @Override
            public void dragStarted() {
                model.beginDrag();
            }

            @Override
            public boolean dragged(double value) {
                boolean ok = model.drag(d -> change.apply(d, value));
                holder[0].setMessage(ok ? "" : model.messageProperty().get());
                return ok;
            }

            @Override
            public void dragEnded() {
                model.endDrag();
            }

            @Override
            public boolean committed(double value) {
                boolean ok = model.apply(d -> change.apply(d, value));
                holder[0].setMessage(ok ? "" : model.messageProperty().get());
                return ok;
            }
        });
        return holder[0];
    }

    private void rebuildGeometry(LineType lineType) {
        geometryControls.clear();
        geometryBox.getChildren().clear();
        for (GeometryField field : GeometryField.of(lineType)) {
            if (field.optional()) {
                pairToggle = new javafx.scene.control.CheckBox("Edge-coupled pair (differential)");
                pairToggle.setId("pair-toggle");
                pairToggle.setTooltip(new Tooltip("Add an identical twin strip beside this one, a gap apart:"
                        + " odd/even, differential and common-mode impedances appear in the plots and read-out"));
                pairToggle.selectedProperty().addListener((o, was, now) -> {
                    if (updating) {
                        return;
                    }
                    if (now) {
                        // start from a gap equal to the strip width: a loosely coupled, common layout
                        model.apply(d -> d.withGeometryValue(GeometryField.GAP,
                                d.geometry().value(GeometryField.of(d.geometry().type()).get(0).name())));
                    } else {
                        model.apply(d -> d.withGeometry(d.geometry().without(GeometryField.GAP)));
                    }
                });
                geometryBox.getChildren().add(pairToggle);
            }
            QuantityControl control = slider(field.label(), "line." + field.name(), field.rule(),
                    v -> Display.length(v, model.unitSystemProperty().get()),
                    (d, v) -> d.withGeometryValue(field.name(), v));
            javafx.scene.control.Button solve = new javafx.scene.control.Button("solve…");
            solve.setId("solve-" + field.name());
            solve.getStyleClass().add("solve-button");
            solve.setMinWidth(javafx.scene.layout.Region.USE_PREF_SIZE);
            solve.setTooltip(new Tooltip("Find the " + field.label().toLowerCase()
                    + " that gives a target |Z0|, all else held (Brent's method over its allowed range)"));
            solve.setOnAction(e -> askAndSolve(field));
            control.addAction(solve);
            geometryControls.put(field.name(), control);
            geometryBox.getChildren().add(control);
            if (field.optional()) {
                control.managedProperty().bind(control.visibleProperty());
            }
        }
        if (!GeometryField.pairable(lineType)) {
            pairToggle = null;
        }
        shownType = lineType;
    }

    /**
     * Solves the field for a target |Z0| at a frequency and applies the result as one undoable change.
     *
     * @return true if a solution was found and applied; otherwise the model's message says why
     */
    public boolean solveFor(String field, double targetOhm, double frequencyHz) {
        return solveFor(field, org.linesweep.design.Synthesis.Quantity.Z0_MAGNITUDE, targetOhm, frequencyHz);
    }

    /** Solves the field for a target |Z0| (Ω), attenuation (dB/m) or delay (s/m) at a frequency. */
    public boolean solveFor(String field, org.linesweep.design.Synthesis.Quantity quantity, double targetValue,
            double frequencyHz) {
        org.linesweep.design.Synthesis.Target target = new org.linesweep.design.Synthesis.Target(quantity, targetValue,
                frequencyHz);
        try {
            org.linesweep.design.Synthesis.Solution solution =
                    org.linesweep.design.Synthesis.solve(model.getDesign(), field, target);
            return model.apply(d -> solution.design());
        } catch (org.linesweep.design.Synthesis.NoSolutionException e) {
            model.report("No solution: " + e.getMessage() + ".");
            return false;
        }
    }

    private void askAndSolve(GeometryField field) {
        javafx.scene.control.Dialog<javafx.scene.control.ButtonType> dialog = new javafx.scene.control.Dialog<>();
        dialog.setTitle("Solve for " + field.label().toLowerCase());
        dialog.setHeaderText("Which " + field.label().toLowerCase() + " gives this target, all else held?");
        javafx.collections.ObservableList<org.linesweep.design.Synthesis.Quantity> quantities =
                FXCollections.observableArrayList(org.linesweep.design.Synthesis.Quantity.values());
        boolean pair = model.getDesign().geometry().isPair();
        if (!pair) {
            quantities.remove(org.linesweep.design.Synthesis.Quantity.DIFFERENTIAL_IMPEDANCE);
        }
        javafx.scene.control.ChoiceBox<org.linesweep.design.Synthesis.Quantity> quantity =
                new javafx.scene.control.ChoiceBox<>(quantities);
        // a pair's designers set differential targets (85, 90, 100 Ω are the usual ones)
        quantity.setValue(pair ? org.linesweep.design.Synthesis.Quantity.DIFFERENTIAL_IMPEDANCE
                : org.linesweep.design.Synthesis.Quantity.Z0_MAGNITUDE);
        quantity.setId("solve-quantity");
        quantity.setConverter(new javafx.util.StringConverter<>() {
            @Override
            public String toString(org.linesweep.design.Synthesis.Quantity q) {
                return q == null ? "" : switch (q) {
                    case Z0_MAGNITUDE -> "|Z0| (Ω)";
                    case ATTENUATION -> "attenuation (dB/m)";
                    case DELAY -> "delay (ns/m)";
                    case DIFFERENTIAL_IMPEDANCE -> "Zdiff of the pair (Ω)";
                };
            }

            @Override
            public org.linesweep.design.Synthesis.Quantity fromString(String text) {
                return null;
            }
        });
        javafx.scene.control.TextField ohms = new javafx.scene.control.TextField(pair ? "100" : "50");
        ohms.setId("solve-target-ohm");
        javafx.scene.control.TextField at = new javafx.scene.control.TextField(
                Display.frequency(org.linesweep.design.Synthesis.DEFAULT_FREQUENCY_HZ));
        at.setId("solve-frequency");
        javafx.scene.layout.GridPane grid = new javafx.scene.layout.GridPane();
        grid.setHgap(8);
        grid.setVgap(6);
        grid.addRow(0, new Label("Target"), quantity, ohms);
        grid.addRow(1, new Label("at frequency"), at);
        dialog.getDialogPane().setContent(grid);
        dialog.getDialogPane().getButtonTypes().addAll(javafx.scene.control.ButtonType.OK,
                javafx.scene.control.ButtonType.CANCEL);
        dialog.showAndWait().filter(b -> b == javafx.scene.control.ButtonType.OK).ifPresent(b -> {
            try {
                double target = Double.parseDouble(ohms.getText().strip());
                double frequency = Rule.FREQUENCY.parse("solve frequency", at.getText());
                if (!(target > 0) || !Double.isFinite(target)) {
                    throw new NumberFormatException();
                }
                // delay is entered in ns/m for people, solved in s/m
                double value = quantity.getValue() == org.linesweep.design.Synthesis.Quantity.DELAY ? target * 1e-9 : target;
                solveFor(field.name(), quantity.getValue(), value, frequency);
            } catch (NumberFormatException e) {
                model.report("Target: '" + ohms.getText() + "' is not a positive number.");
            } catch (org.linesweep.design.InvalidInputException e) {
                model.report(e.getMessage());
            }
        });
    }

    private void refreshFormats() {
        for (QuantityControl c : geometryControls.values()) {
            c.setFormatter(v -> Display.length(v, model.unitSystemProperty().get()));
        }
        roughness.setFormatter(v -> Display.length(v, model.unitSystemProperty().get()));
        lineLength.setFormatter(v -> Display.lineLength(v, model.unitSystemProperty().get()));
    }

    private void show(Design design) {
        updating = true;
        try {
            LineType lineType = design.geometry().type();
            if (lineType != shownType) {
                rebuildGeometry(lineType);
            }
            type.setValue(lineType);
            design.geometry().valuesMetres().forEach((name, value) -> geometryControls.get(name).show(value));
            QuantityControl gap = geometryControls.get(GeometryField.GAP);
            if (gap != null) {
                boolean pair = design.geometry().isPair();
                gap.setVisible(pair);
                pairToggle.setSelected(pair);
            }
            lineLength.show(design.lengthMetres());
            ConductorSpec c = design.conductor();
            conductor.setValue(c.materialKey() == null ? CUSTOM : c.materialKey());
            boolean perfect = c.isPerfect();
            conductivity.setDisable(perfect);
            conductorPermeability.setDisable(perfect);
            if (!perfect) {
                conductivity.show(c.conductivitySiemensPerMetre());
            }
            conductorPermeability.show(c.relativePermeability());
            roughness.show(c.roughnessRmsMetres());
            temperature.show(design.temperatureKelvin());
            DielectricSpec d = design.dielectric();
            dielectric.setValue(d.materialKey() == null ? CUSTOM : d.materialKey());
            permittivity.show(d.relativePermittivity());
            lossTangent.show(d.lossTangent());
            dielectricModel.setValue(d.model());
            sweepFrom.show(design.sweep().fromHz());
            sweepTo.show(design.sweep().toHz());
            sweepPoints.show(design.sweep().points());
            threshold.show(design.threshold());
            thresholdChoices.getToggles().forEach(t -> t.setSelected(((Double) t.getUserData()) == design.threshold()));
            if (Double.isNaN(design.lossBudgetDb())) {
                lossBudget.textField().setText("");
                lossBudget.textField().setPromptText("none");
            } else {
                lossBudget.show(design.lossBudgetDb());
            }
        } finally {
            updating = false;
        }
    }
}
