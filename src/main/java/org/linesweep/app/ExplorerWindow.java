package org.linesweep.app;

import java.io.IOException;
import java.nio.file.Path;
import java.util.List;
import javafx.embed.swing.SwingFXUtils;
import javafx.geometry.Insets;
import javafx.scene.Node;
import javafx.scene.Parent;
import javafx.scene.control.Alert;
import javafx.scene.control.ButtonType;
import javafx.scene.control.CheckMenuItem;
import javafx.scene.control.Label;
import javafx.scene.control.Menu;
import javafx.scene.control.MenuBar;
import javafx.scene.control.MenuItem;
import javafx.scene.control.RadioMenuItem;
import javafx.scene.control.ScrollPane;
import javafx.scene.control.SeparatorMenuItem;
import javafx.scene.control.SplitPane;
import javafx.scene.control.ToggleGroup;
import javafx.scene.image.WritableImage;
import javafx.scene.input.KeyCode;
import javafx.scene.input.KeyCodeCombination;
import javafx.scene.input.KeyCombination;
import javafx.scene.layout.BorderPane;
import javafx.scene.layout.HBox;
import javafx.scene.layout.Priority;
import javafx.scene.layout.VBox;
import javafx.stage.Stage;
import javax.imageio.ImageIO;
import org.linesweep.app.model.ExplorerModel;
import org.linesweep.app.model.SweepSnapshot;
import org.linesweep.app.model.UnitSystem;
import org.linesweep.app.view.ComparePane;
import org.linesweep.app.view.CrossSectionView;
import org.linesweep.app.view.DesignPanel;
import org.linesweep.app.view.PlotsPane;
import org.linesweep.app.view.ReadoutPane;
import org.linesweep.design.Design;
import org.linesweep.design.InvalidInputException;
import org.linesweep.io.AtomicFiles;
import org.linesweep.io.DesignFiles;
import org.linesweep.io.Presets;
import org.linesweep.io.SweepTable;

/**
 * The explorer window's content: menus, design panel with the cross-section, the four plots, the read-out
 * and the comparison table. It composes the views around one {@link ExplorerModel} and carries out the
 * file actions; everything it shows comes from the model.
 */
public final class ExplorerWindow {

    /** The cautions shown under Help, as in the README. */
    public static final String CAUTIONS = String.join("\n\n", org.linesweep.design.ModelNotes.CAUTIONS);

    private final ExplorerModel model;
    private final FileDialogs dialogs;
    private final RecentFiles recent;
    private final BorderPane root = new BorderPane();
    private final DesignPanel designPanel;
    private final PlotsPane plots;
    private final ReadoutPane readout;
    private final ComparePane compare;
    private final org.linesweep.app.view.SensitivityPane sensitivity;
    private final org.linesweep.app.view.TolerancePane tolerance;
    private final org.linesweep.app.view.WaveformPane waveform;
    private final CrossSectionView crossSection = new CrossSectionView();
    private final Label warnings = new Label();
    private final Label status = new Label();
    private final Menu recentMenu = new Menu("Recent files");
    private final ScrollPane designScroll;
    private Path currentFile;
    private Stage stage;

    public ExplorerWindow(ExplorerModel model, FileDialogs dialogs, java.util.prefs.Preferences preferences) {
        this.model = model;
        this.dialogs = dialogs;
        this.recent = new RecentFiles(preferences);
        designPanel = new DesignPanel(model);
        plots = new PlotsPane(model);
        readout = new ReadoutPane(model);
        compare = new ComparePane(model);
        sensitivity = new org.linesweep.app.view.SensitivityPane(model,
                java.util.concurrent.ForkJoinPool.commonPool(), javafx.application.Platform::runLater);
        tolerance = new org.linesweep.app.view.TolerancePane(model, plots,
                java.util.concurrent.ForkJoinPool.commonPool(), javafx.application.Platform::runLater);
        waveform = new org.linesweep.app.view.WaveformPane(model, java.util.concurrent.ForkJoinPool.commonPool(),
                javafx.application.Platform::runLater, this::exportWaveform);
        VBox left = new VBox(crossSection, designPanel);
        left.setAlignment(javafx.geometry.Pos.TOP_CENTER);
        designScroll = new ScrollPane(left);
        designScroll.setFitToWidth(true);
        designScroll.setPrefWidth(370);
        designScroll.setMinWidth(280);
        paintViewportDirectly(designScroll);
        warnings.setId("warning-strip");
        warnings.getStyleClass().add("warning-strip");
        warnings.setWrapText(true);
        warnings.setMaxWidth(Double.MAX_VALUE);
        status.setId("status-message");
        status.getStyleClass().add("status-message");
        status.setWrapText(true);
        status.textProperty().bind(model.messageProperty());
        VBox top = new VBox(menuBar(), warnings);
        ScrollPane readoutScroll = new ScrollPane(readout);
        readoutScroll.setFitToWidth(true);
        readoutScroll.setPrefWidth(330);
        paintViewportDirectly(readoutScroll);
        javafx.scene.control.TabPane tools = new javafx.scene.control.TabPane(
                new javafx.scene.control.Tab("Compare", compare),
                new javafx.scene.control.Tab("Sensitivity", new ScrollPane(sensitivity)),
                new javafx.scene.control.Tab("Tolerances", tolerance),
                new javafx.scene.control.Tab("Waveform", waveform));
        tools.getSelectionModel().selectedItemProperty().addListener((o, old, now) ->
                waveform.setShowing(now != null && now.getContent() == waveform));
        tools.setTabClosingPolicy(javafx.scene.control.TabPane.TabClosingPolicy.UNAVAILABLE);
        tools.setId("tools-tabs");
        SplitPane bottom = new SplitPane(tools, readoutScroll);
        bottom.setDividerPositions(0.62);
        bottom.setPrefHeight(230);
        SplitPane center = new SplitPane(plots, bottom);
        center.setOrientation(javafx.geometry.Orientation.VERTICAL);
        center.setDividerPositions(0.7);
        // the time-domain view needs height: give it some when it opens, if the user has not already
        tools.getSelectionModel().selectedItemProperty().addListener((o, old, now) -> {
            if (now != null && now.getContent() == waveform && center.getDividerPositions()[0] > 0.6) {
                center.setDividerPositions(0.56);
                bottom.setDividerPositions(Math.max(bottom.getDividerPositions()[0], 0.7));
            }
        });
        root.setTop(top);
        root.setLeft(designScroll);
        root.setCenter(center);
        HBox statusBar = new HBox(status);
        statusBar.setPadding(new Insets(3, 8, 3, 8));
        HBox.setHgrow(status, Priority.ALWAYS);
        root.setBottom(statusBar);
        root.getStyleClass().add("explorer");
        root.getStylesheets().add(ExplorerWindow.class.getResource("explorer.css").toExternalForm());
        model.designProperty().addListener((o, old, now) -> crossSection.show(now.geometry()));
        crossSection.show(model.getDesign().geometry());
        model.snapshotProperty().addListener((o, old, now) -> showWarnings(now));
        model.draggingProperty().addListener((o, was, now) -> showWarnings(model.snapshotProperty().get()));
        model.meetingModeProperty().addListener((o, old, now) -> applyMeetingMode(now));
        refreshRecent();
    }

    public Parent root() {
        return root;
    }

    /** Gives the window its stage: title, full screen and shortcuts that need it. */
    public void attach(Stage newStage) {
        this.stage = newStage;
        updateTitle();
        model.designProperty().addListener((o, old, now) -> updateTitle());
    }

    public PlotsPane plots() {
        return plots;
    }

    public DesignPanel designPanel() {
        return designPanel;
    }

    public ReadoutPane readout() {
        return readout;
    }

    public ComparePane compare() {
        return compare;
    }

    public org.linesweep.app.view.TolerancePane tolerance() {
        return tolerance;
    }

    public org.linesweep.app.view.SensitivityPane sensitivity() {
        return sensitivity;
    }

    public Label warningStrip() {
        return warnings;
    }

    private void updateTitle() {
        if (stage != null) {
            Design d = model.getDesign();
            stage.setTitle("LineSweep — " + (d.name().isBlank() ? "untitled" : d.name())
                    + (currentFile == null ? "" : " (" + currentFile.getFileName() + ")"));
        }
    }

    private void showWarnings(SweepSnapshot snapshot) {
        List<String> list = snapshot == null ? List.of() : snapshot.warnings();
        warnings.setText(list.isEmpty() ? "" : "Outside a model's stated range: " + String.join(" · ", list));
        warnings.setVisible(!list.isEmpty());
        // during a drag the strip keeps its place once shown, so the plots below it do not jump up and down
        // (and the whole window is not repainted) each time the design crosses a model's limit; it goes when
        // the drag ends
        warnings.setManaged(!list.isEmpty() || (model.draggingProperty().get() && warnings.isManaged()));
    }

    private void applyMeetingMode(boolean meeting) {
        if (meeting) {
            root.getStyleClass().add("meeting");
        } else {
            root.getStyleClass().remove("meeting");
        }
        designPanel.setCompact(meeting);
        designScroll.setPrefWidth(meeting ? 470 : 370);
        if (stage != null) {
            stage.setFullScreenExitHint("F5 leaves meeting mode");
            stage.setFullScreen(meeting);
        }
    }

    private MenuBar menuBar() {
        Menu file = new Menu("File");
        MenuItem open = item("Open design…", new KeyCodeCombination(KeyCode.O, KeyCombination.SHORTCUT_DOWN),
                this::openFile);
        MenuItem save = item("Save design", new KeyCodeCombination(KeyCode.S, KeyCombination.SHORTCUT_DOWN),
                () -> save(false));
        MenuItem saveAs = item("Save design as…", new KeyCodeCombination(KeyCode.S, KeyCombination.SHORTCUT_DOWN,
                KeyCombination.SHIFT_DOWN), () -> save(true));
        Menu presets = new Menu("Presets");
        for (String name : Presets.NAMES) {
            Design preset = Presets.load(name);
            MenuItem item = new MenuItem(preset.name());
            item.setOnAction(e -> {
                currentFile = null;
                model.open(preset);
            });
            presets.getItems().add(item);
        }
        MenuItem exportPng = item("Export plots as PNG (2×)…", new KeyCodeCombination(KeyCode.E,
                KeyCombination.SHORTCUT_DOWN), this::exportPng);
        MenuItem exportCsv = item("Export sweep as CSV…", new KeyCodeCombination(KeyCode.E,
                KeyCombination.SHORTCUT_DOWN, KeyCombination.SHIFT_DOWN), this::exportCsv);
        MenuItem exportTouchstone = item("Export line as Touchstone (.s2p)…", null, this::exportTouchstone);
        MenuItem exportReview = item("Export review pack (HTML, plots, tables, .s2p)…", new KeyCodeCombination(
                KeyCode.R, KeyCombination.SHORTCUT_DOWN, KeyCombination.SHIFT_DOWN), this::exportReviewPack);
        file.getItems().addAll(open, recentMenu, presets, new SeparatorMenuItem(), save, saveAs,
                new SeparatorMenuItem(), exportPng, exportCsv, exportTouchstone, exportReview);
        Menu edit = new Menu("Edit");
        MenuItem undo = item("Undo", new KeyCodeCombination(KeyCode.Z, KeyCombination.SHORTCUT_DOWN), model::undo);
        MenuItem redo = item("Redo", new KeyCodeCombination(KeyCode.Y, KeyCombination.SHORTCUT_DOWN), model::redo);
        undo.disableProperty().bind(model.canUndoProperty().not());
        redo.disableProperty().bind(model.canRedoProperty().not());
        MenuItem pin = item("Pin current design", new KeyCodeCombination(KeyCode.P, KeyCombination.SHORTCUT_DOWN),
                model::pinCurrent);
        MenuItem clearPins = item("Clear pins", null, model::unpinAll);
        edit.getItems().addAll(undo, redo, new SeparatorMenuItem(), pin, clearPins);
        Menu view = new Menu("View");
        CheckMenuItem markers = new CheckMenuItem("Marker mode");
        markers.setAccelerator(new KeyCodeCombination(KeyCode.M, KeyCombination.SHORTCUT_DOWN));
        markers.selectedProperty().bindBidirectional(model.markerModeProperty());
        CheckMenuItem meeting = new CheckMenuItem("Meeting mode (large, high contrast, full screen)");
        meeting.setAccelerator(new KeyCodeCombination(KeyCode.F5));
        meeting.selectedProperty().bindBidirectional(model.meetingModeProperty());
        ToggleGroup units = new ToggleGroup();
        RadioMenuItem metric = new RadioMenuItem("Metric units (mm, dB/m)");
        RadioMenuItem imperial = new RadioMenuItem("Imperial units (mil, dB/100 ft)");
        metric.setToggleGroup(units);
        imperial.setToggleGroup(units);
        metric.setSelected(model.unitSystemProperty().get() == UnitSystem.METRIC);
        imperial.setSelected(model.unitSystemProperty().get() == UnitSystem.IMPERIAL);
        metric.setOnAction(e -> model.unitSystemProperty().set(UnitSystem.METRIC));
        imperial.setOnAction(e -> model.unitSystemProperty().set(UnitSystem.IMPERIAL));
        imperial.setAccelerator(new KeyCodeCombination(KeyCode.U, KeyCombination.SHORTCUT_DOWN));
        model.unitSystemProperty().addListener((o, old, now) -> (now == UnitSystem.METRIC ? metric : imperial)
                .setSelected(true));
        view.getItems().addAll(markers, meeting, new SeparatorMenuItem(), metric, imperial);
        Menu help = new Menu("Help");
        MenuItem cautions = item("Cautions", null, () -> info("Cautions", CAUTIONS));
        MenuItem models = item("Models and validity", null, () -> info("Models and validity", MODELS));
        help.getItems().addAll(cautions, models);
        MenuBar bar = new MenuBar(file, edit, view, help);
        bar.setId("menu-bar");
        return bar;
    }

    private static final String MODELS = String.join("\n", org.linesweep.design.ModelNotes.all())
            + "\nSee docs/physics.md for sources and ranges.";

    private static MenuItem item(String text, KeyCombination accelerator, Runnable action) {
        MenuItem item = new MenuItem(text);
        if (accelerator != null) {
            item.setAccelerator(accelerator);
        }
        item.setOnAction(e -> action.run());
        return item;
    }

    private void info(String title, String text) {
        Alert alert = new Alert(Alert.AlertType.INFORMATION, text, ButtonType.OK);
        alert.setTitle(title);
        alert.setHeaderText(title);
        alert.getDialogPane().setPrefWidth(560);
        alert.show();
    }

    /** Opens a design file; a bad file is reported and the current design kept. */
    public void openFile() {
        dialogs.open("Open design", "json").ifPresent(this::open);
    }

    /** Opens a design file by path. */
    public void open(Path path) {
        try {
            Design design = DesignFiles.read(path);
            currentFile = path;
            model.open(design);
            recent.add(path);
            refreshRecent();
        } catch (InvalidInputException e) {
            model.report("Could not open " + path.getFileName() + ": " + e.getMessage()
                    + ". The current design is unchanged.");
        }
    }

    private void refreshRecent() {
        recentMenu.getItems().clear();
        for (Path path : recent.list()) {
            MenuItem item = new MenuItem(path.toString());
            item.setOnAction(e -> open(path));
            recentMenu.getItems().add(item);
        }
        recentMenu.setDisable(recentMenu.getItems().isEmpty());
    }

    /** Saves the design, atomically; a failed save leaves the old file as it was and says why. */
    public void save(boolean askForName) {
        Path target = currentFile;
        if (askForName || target == null) {
            String suggested = model.getDesign().name().isBlank() ? "design.json"
                    : model.getDesign().name().replaceAll("[^A-Za-z0-9]+", "-").toLowerCase() + ".json";
            target = dialogs.save("Save design", "json", suggested).orElse(null);
        }
        if (target == null) {
            return;
        }
        try {
            DesignFiles.write(model.getDesign(), target);
            currentFile = target;
            recent.add(target);
            refreshRecent();
            updateTitle();
            model.report("Saved " + target.getFileName());
        } catch (IOException | RuntimeException e) {
            model.report("Could not save " + target.getFileName() + ": " + e.getMessage()
                    + ". Any earlier file there is unchanged.");
        }
    }

    /** Exports the four plots as one PNG at twice the screen scale. */
    public void exportPng() {
        dialogs.save("Export plots", "png", "linesweep-plots.png").ifPresent(this::exportPng);
    }

    public void exportPng(Path target) {
        WritableImage image = snapshotPlots(2.0);
        try {
            AtomicFiles.write(target, out -> ImageIO.write(SwingFXUtils.fromFXImage(image, null), "png", out));
            model.report("Exported " + target.getFileName());
        } catch (IOException | RuntimeException e) {
            model.report("Could not export " + target.getFileName() + ": " + e.getMessage());
        }
    }

    /** The plots as an image at a scale. */
    public WritableImage snapshotPlots(double scale) {
        javafx.scene.SnapshotParameters parameters = new javafx.scene.SnapshotParameters();
        parameters.setTransform(javafx.scene.transform.Transform.scale(scale, scale));
        Node node = plots;
        return node.snapshot(parameters, null);
    }

    /** Exports the live sweep as CSV with the command line's columns. */
    public void exportCsv() {
        dialogs.save("Export sweep", "csv", "linesweep-sweep.csv").ifPresent(this::exportCsv);
    }

    public void exportCsv(Path target) {
        SweepSnapshot snapshot = model.snapshotProperty().get();
        if (snapshot == null) {
            model.report("Nothing computed yet to export.");
            return;
        }
        try {
            AtomicFiles.write(target, out -> SweepTable.writeCsv(snapshot.sweep(), out));
            model.report("Exported " + target.getFileName());
        } catch (IOException | RuntimeException e) {
            model.report("Could not export " + target.getFileName() + ": " + e.getMessage());
        }
    }

    /** The time-domain view. */
    public org.linesweep.app.view.WaveformPane waveformPane() {
        return waveform;
    }

    /** Reference impedance of exported two-ports: 50 Ω until the user chooses another. */
    private double touchstoneReferenceOhm = 50.0;

    /** Asks for the reference impedance (50 Ω offered), then where to write the two-port. */
    public void exportTouchstone() {
        javafx.scene.control.TextInputDialog ask = new javafx.scene.control.TextInputDialog(
                org.linesweep.app.view.Display.number(touchstoneReferenceOhm));
        ask.setTitle("Export Touchstone two-port");
        ask.setHeaderText("Port reference impedance for the S-parameters");
        ask.setContentText("Reference (Ω):");
        ask.showAndWait().ifPresent(text -> {
            double reference;
            try {
                reference = org.linesweep.design.Rule.REFERENCE_IMPEDANCE.parse("reference impedance", text);
            } catch (InvalidInputException e) {
                model.report(e.getMessage());
                return;
            }
            dialogs.save("Export Touchstone two-port", "s2p", "linesweep-line.s2p")
                    .ifPresent(target -> exportTouchstone(target, reference));
        });
    }

    /** Writes the live line as a Touchstone two-port on its sweep grid, against the given reference. */
    public void exportTouchstone(Path target, double referenceOhm) {
        Design design = model.getDesign();
        try {
            org.linesweep.signal.ScatteringSweep sweep = org.linesweep.signal.ScatteringSweep.of(design.toModel(),
                    design.lengthMetres(), design.sweep().grid().frequencies(), referenceOhm);
            AtomicFiles.write(target, out -> org.linesweep.io.Touchstone.write(sweep,
                    org.linesweep.io.Touchstone.header(design, referenceOhm), out));
            touchstoneReferenceOhm = referenceOhm;
            model.report("Exported " + target.getFileName() + " (reference " + org.linesweep.app.view.Display.number(referenceOhm) + " Ω, "
                    + design.sweep().points() + " frequencies)");
        } catch (IOException | RuntimeException e) {
            model.report("Could not export " + target.getFileName() + ": " + e.getMessage());
        }
    }

    private void exportWaveform(org.linesweep.signal.Waveform result) {
        dialogs.save("Export waveform", "csv", "linesweep-waveform.csv").ifPresent(target -> {
            try {
                AtomicFiles.write(target, out -> org.linesweep.io.WaveformTable.writeCsv(result, out));
                model.report("Exported " + target.getFileName());
            } catch (IOException | RuntimeException e) {
                model.report("Could not export " + target.getFileName() + ": " + e.getMessage());
            }
        });
    }

    /** Exports the review pack for the live design and its pins. */
    public void exportReviewPack() {
        String name = model.getDesign().name().isEmpty() ? "linesweep" : model.getDesign().name()
                .toLowerCase(java.util.Locale.ROOT).replaceAll("[^a-z0-9]+", "-").replaceAll("(^-|-$)", "");
        dialogs.save("Export review pack", "html", name + "-review.html").ifPresent(this::exportReviewPack);
    }

    public void exportReviewPack(Path target) {
        SweepSnapshot snapshot = model.snapshotProperty().get();
        if (snapshot == null) {
            model.report("Nothing computed yet to export.");
            return;
        }
        try {
            java.io.ByteArrayOutputStream png = new java.io.ByteArrayOutputStream();
            ImageIO.write(SwingFXUtils.fromFXImage(snapshotPlots(2.0), null), "png", png);
            java.util.List<org.linesweep.io.ReviewPack.Entry> pins = new java.util.ArrayList<>();
            for (org.linesweep.app.model.Pin pin : model.pins()) {
                pins.add(new org.linesweep.io.ReviewPack.Entry(pin.label(), pin.snapshot().design(),
                        pin.snapshot().sweep(), pin.snapshot().limits()));
            }
            Design design = snapshot.design();
            org.linesweep.signal.WaveformSettings settings = waveform.settings();
            org.linesweep.io.ReviewPack.TimeDomainPart timeDomain = new org.linesweep.io.ReviewPack.TimeDomainPart(
                    settings, settings.simulate(snapshot.model(), design.lengthMetres()));
            java.util.List<Path> files = org.linesweep.io.ReviewPack.write(target,
                    new org.linesweep.io.ReviewPack.Entry(design.name().isEmpty() ? "live design" : design.name(),
                            design, snapshot.sweep(), snapshot.limits()),
                    pins, png.toByteArray(), timeDomain, touchstoneReferenceOhm);
            model.report("Exported the review pack: " + files.size() + " files beside " + target.getFileName());
        } catch (IOException | RuntimeException e) {
            model.report("Could not export the review pack " + target.getFileName() + ": " + e.getMessage());
        }
    }

    /**
     * A scroll pane caches its viewport as one image, so a change anywhere inside repaints all of it. The
     * design panel (the dragged slider and its field) and the read-out change on every step of a drag, so
     * their viewports are painted directly: only the changed areas are repainted.
     */
    private static void paintViewportDirectly(ScrollPane pane) {
        pane.skinProperty().addListener((o, old, skin) -> {
            javafx.scene.Node viewport = pane.lookup(".viewport");
            if (viewport != null) {
                viewport.setCache(false);
            }
        });
    }
}
