package org.linesweep.app.view;

import java.util.ArrayList;
import java.util.List;
import java.util.function.IntToDoubleFunction;
import javafx.collections.ListChangeListener;
import javafx.geometry.Insets;
import javafx.geometry.Pos;
import javafx.scene.control.ChoiceBox;
import javafx.scene.control.Label;
import javafx.scene.control.Tooltip;
import javafx.scene.layout.GridPane;
import javafx.scene.layout.HBox;
import javafx.scene.layout.Priority;
import javafx.scene.layout.StackPane;
import javafx.scene.layout.VBox;
import javafx.scene.paint.Color;
import org.linesweep.app.model.ExplorerModel;
import org.linesweep.app.model.Pin;
import org.linesweep.app.model.SweepSnapshot;
import org.linesweep.app.model.UnitSystem;
import org.linesweep.physics.FrequencyLimits;
import org.linesweep.physics.LineType;
import org.linesweep.physics.LossRegions;
import org.linesweep.physics.MicrostripLine;
import org.linesweep.physics.PhysicalConstants;
import org.linesweep.sweep.SweepResult;

/**
 * The four plots against frequency: attenuation, velocity, characteristic impedance and one of R', L',
 * G', C'. They share the frequency axis and the crosshair; pinned designs appear on each in their own
 * colour and dash pattern; in marker mode the limits are drawn as labelled markers and regions.
 */
public final class PlotsPane extends GridPane {

    /** What the impedance plot shows. */
    public enum ImpedanceForm { MAGNITUDE_PHASE, REAL_IMAGINARY }

    /** Which per-unit-length parameter the fourth plot shows. */
    public enum PerUnitLength { R, L, G, C }

    private static final double C0 = PhysicalConstants.SPEED_OF_LIGHT_METRES_PER_SECOND;

    private final ExplorerModel model;
    private final FrequencyPlot attenuation = new FrequencyPlot();
    private final FrequencyPlot velocity = new FrequencyPlot();
    private final FrequencyPlot impedance = new FrequencyPlot();
    private final FrequencyPlot perUnit = new FrequencyPlot();
    private final ChoiceBox<Display.AttenuationUnit> attenuationUnit = new ChoiceBox<>();
    private final ChoiceBox<String> velocityUnit = new ChoiceBox<>();
    private final ChoiceBox<ImpedanceForm> impedanceForm = new ChoiceBox<>();
    private final ChoiceBox<PerUnitLength> perUnitChoice = new ChoiceBox<>();
    private Palette palette = Palette.STANDARD;
    /** Tolerance bands: frequencies and [|Z0|, α, v_p][p5, p50, p95][frequency], or null. */
    private double[] bandFrequencies;
    private double[][][] bandValues;
    /** Frequencies of the last sweep drawn, shared by all its series (one array per sweep). */
    private SweepResult framesOf;
    private double[] sharedFrequencies;

    public PlotsPane(ExplorerModel model) {
        this.model = model;
        getStyleClass().add("plots-pane");
        setHgap(6);
        setVgap(6);
        setPadding(new Insets(6));
        attenuation.setId("plot-attenuation");
        velocity.setId("plot-velocity");
        impedance.setId("plot-impedance");
        perUnit.setId("plot-per-unit-length");
        attenuationUnit.setId("attenuation-unit");
        velocityUnit.getItems().addAll("v/c", "m/s");
        velocityUnit.setValue("v/c");
        impedanceForm.getItems().addAll(ImpedanceForm.values());
        impedanceForm.setValue(ImpedanceForm.MAGNITUDE_PHASE);
        impedanceForm.setConverter(new javafx.util.StringConverter<>() {
            @Override
            public String toString(ImpedanceForm f) {
                return f == ImpedanceForm.REAL_IMAGINARY ? "real, imaginary" : "magnitude, phase";
            }

            @Override
            public ImpedanceForm fromString(String s) {
                return null;
            }
        });
        perUnitChoice.setId("per-unit-choice");
        perUnitChoice.getItems().addAll(PerUnitLength.values());
        perUnitChoice.setValue(PerUnitLength.R);
        perUnitChoice.setConverter(new javafx.util.StringConverter<>() {
            @Override
            public String toString(PerUnitLength p) {
                return p.name() + "′";
            }

            @Override
            public PerUnitLength fromString(String s) {
                return null;
            }
        });
        attenuationUnit.setConverter(new javafx.util.StringConverter<>() {
            @Override
            public String toString(Display.AttenuationUnit u) {
                return u == null ? "" : u.label();
            }

            @Override
            public Display.AttenuationUnit fromString(String s) {
                return null;
            }
        });
        fillAttenuationUnits(UnitSystem.METRIC);
        add(framed(attenuation, attenuationUnit), 0, 0);
        add(framed(velocity, velocityUnit), 1, 0);
        add(framed(impedance, impedanceForm), 0, 1);
        add(framed(perUnit, perUnitChoice), 1, 1);
        for (int i = 0; i < 2; i++) {
            javafx.scene.layout.ColumnConstraints column = new javafx.scene.layout.ColumnConstraints();
            column.setPercentWidth(50);
            column.setHgrow(Priority.ALWAYS);
            getColumnConstraints().add(column);
            javafx.scene.layout.RowConstraints row = new javafx.scene.layout.RowConstraints();
            row.setPercentHeight(50);
            row.setVgrow(Priority.ALWAYS);
            getRowConstraints().add(row);
        }
        for (FrequencyPlot plot : plots()) {
            plot.setOnHover(f -> model.crosshairHzProperty().set(f));
        }
        Tooltip.install(attenuation, new Tooltip("Attenuation α from the exact telegrapher solution of the model's R′, L′,"
                + " G′, C′. Conductor and dielectric shares split α in proportion to R′/2|Z0| and G′|Z0|/2."));
        Tooltip.install(impedance, new Tooltip("Z0 = sqrt((R′ + jωL′)/(G′ + jωC′)), principal root. Microstrip: quasi-static"
                + " Hammerstad-Jensen Z0 (no Z0 dispersion model)."));
        Tooltip.install(velocity, new Tooltip("Phase velocity ω/β and group velocity dω/dβ (local derivative of the model)."));
        Tooltip.install(perUnit, new Tooltip("Per-unit-length parameters; L′ includes the conductors' internal inductance."));
        model.snapshotProperty().addListener((o, old, now) -> redraw());
        model.pins().addListener((ListChangeListener<Pin>) c -> redraw());
        model.markerModeProperty().addListener((o, old, now) -> redraw());
        model.unitSystemProperty().addListener((o, old, now) -> {
            fillAttenuationUnits(now);
            redraw();
        });
        model.meetingModeProperty().addListener((o, old, now) -> applyLook(now));
        model.crosshairHzProperty().addListener((o, old, now) -> plots().forEach(p -> p.setCrosshair(now.doubleValue())));
        attenuationUnit.valueProperty().addListener((o, old, now) -> redraw());
        velocityUnit.valueProperty().addListener((o, old, now) -> redraw());
        impedanceForm.valueProperty().addListener((o, old, now) -> redraw());
        perUnitChoice.valueProperty().addListener((o, old, now) -> redraw());
        applyLook(model.meetingModeProperty().get());
        redraw();
    }

    private void fillAttenuationUnits(UnitSystem system) {
        Display.AttenuationUnit wanted = system == UnitSystem.IMPERIAL ? Display.DB_PER_100_FT : Display.DB_PER_METRE;
        boolean whole = attenuationUnit.getValue() != null && attenuationUnit.getValue().wholeLine();
        attenuationUnit.getItems().setAll(system == UnitSystem.IMPERIAL
                ? List.of(Display.DB_PER_100_FT, Display.DB_PER_INCH, Display.DB_WHOLE_LINE)
                : List.of(Display.DB_PER_METRE, Display.DB_WHOLE_LINE));
        attenuationUnit.setValue(whole ? Display.DB_WHOLE_LINE : wanted);
    }

    private static VBox framed(FrequencyPlot plot, javafx.scene.Node choice) {
        HBox bar = new HBox(6, new Label("show:"), choice);
        bar.setAlignment(Pos.CENTER_RIGHT);
        StackPane holder = new StackPane(plot);
        VBox.setVgrow(holder, Priority.ALWAYS);
        VBox box = new VBox(2, bar, holder);
        box.getStyleClass().add("plot-frame");
        return box;
    }

    /** Shows (or, with nulls, clears) the 5-95 % tolerance bands around the live curves. */
    public void setToleranceBands(double[] frequencies, double[][][] bands) {
        if (bands == null && bandValues == null) {
            return; // nothing shown, nothing to clear: no redraw (this runs on every design change)
        }
        bandFrequencies = frequencies;
        bandValues = bands;
        redraw();
    }

    /** Whether tolerance bands are shown (for tests). */
    public boolean hasToleranceBands() {
        return bandValues != null;
    }

    private List<PlotSeries[]> band(int quantity, double scale) {
        if (bandValues == null) {
            return List.of();
        }
        double[] low = bandValues[quantity][0].clone();
        double[] high = bandValues[quantity][2].clone();
        for (int i = 0; i < low.length; i++) {
            low[i] *= scale;
            high[i] *= scale;
        }
        return List.<PlotSeries[]>of(new PlotSeries[] {
            new PlotSeries("", bandFrequencies, low, low.length, palette.live(), 1, new double[0], false),
            new PlotSeries("", bandFrequencies, high, high.length, palette.live(), 1, new double[0], false)});
    }

    public List<FrequencyPlot> plots() {
        return List.of(attenuation, velocity, impedance, perUnit);
    }

    public FrequencyPlot attenuationPlot() {
        return attenuation;
    }

    public FrequencyPlot impedancePlot() {
        return impedance;
    }

    public ChoiceBox<PerUnitLength> perUnitChoice() {
        return perUnitChoice;
    }

    private void applyLook(boolean meeting) {
        palette = Palette.of(meeting);
        for (FrequencyPlot plot : plots()) {
            plot.setMeetingLook(meeting);
        }
        redraw();
    }

    /** Rebuilds every plot's series, markers and regions from the model's current state. */
    public void redraw() {
        SweepSnapshot snapshot = model.snapshotProperty().get();
        if (snapshot == null) {
            return;
        }
        SweepResult live = snapshot.sweep();
        double from = live.frequencyHz(0);
        double to = live.frequencyHz(live.size() - 1);
        for (Pin pin : model.pins()) {
            from = Math.min(from, pin.snapshot().sweep().frequencyHz(0));
            to = Math.max(to, pin.snapshot().sweep().frequencyHz(pin.snapshot().sweep().size() - 1));
        }
        for (FrequencyPlot plot : plots()) {
            plot.setFrequencyRange(from, to);
        }
        drawAttenuation(snapshot);
        drawVelocity(snapshot);
        drawImpedance(snapshot);
        drawPerUnit(snapshot);
        List<PlotMarker> markers = model.markerModeProperty().get() ? markers(snapshot) : List.of();
        List<PlotRegion> regions = model.markerModeProperty().get() ? regions(snapshot, from, to) : List.of();
        for (FrequencyPlot plot : plots()) {
            plot.setMarkers(markers);
            List<PlotRegion> own = new ArrayList<>(regions);
            if (plot == attenuation && model.markerModeProperty().get()) {
                own.addAll(lossRegions(snapshot, from, to));
            }
            plot.setRegions(own);
            plot.setCrosshair(model.crosshairHzProperty().get());
        }
    }

    private static double[] column(SweepResult sweep, IntToDoubleFunction value) {
        double[] out = new double[sweep.size()];
        for (int i = 0; i < out.length; i++) {
            out[i] = value.applyAsDouble(i);
        }
        return out;
    }

    /** The frequency array of a sweep, built once per sweep and shared by its series. */
    private double[] frequencies(SweepResult sweep) {
        if (sweep != framesOf) {
            framesOf = sweep;
            sharedFrequencies = column(sweep, sweep::frequencyHz);
        }
        return sharedFrequencies;
    }

    private PlotSeries live(String name, SweepResult sweep, double[] y, double[] dash, boolean right) {
        return new PlotSeries(name, frequencies(sweep), y, sweep.size(), palette.live(),
                right ? 1.6 : 2.0, dash, right);
    }

    private void addPins(List<PlotSeries> series, java.util.function.Function<SweepResult, double[]> quantity,
            boolean right) {
        for (Pin pin : model.pins()) {
            SweepResult s = pin.snapshot().sweep();
            series.add(new PlotSeries(pin.label(), column(s, s::frequencyHz), quantity.apply(s), s.size(),
                    palette.pin(pin.slot()), 1.8, Palette.PIN_DASHES[pin.slot()], right));
        }
    }

    private void drawAttenuation(SweepSnapshot snapshot) {
        Display.AttenuationUnit unit = attenuationUnit.getValue() == null ? Display.DB_PER_METRE
                : attenuationUnit.getValue();
        SweepResult s = snapshot.sweep();
        java.util.function.Function<SweepResult, double[]> total = r -> column(r, i -> scale(unit, r, r.alphaDbPerMetre(i)));
        List<PlotSeries> series = new ArrayList<>();
        series.add(live("total", s, total.apply(s), new double[0], false));
        series.add(live("conductor", s, column(s, i -> scale(unit, s, s.conductorAlphaDbPerMetre(i))),
                new double[] {8, 4}, false));
        series.add(live("dielectric", s, column(s, i -> scale(unit, s, s.dielectricAlphaDbPerMetre(i))),
                new double[] {2, 3}, false));
        addPins(series, total, false);
        attenuation.setBands(band(1, unit.wholeLine() ? s.lengthMetres() : unit.perDbPerMetre()));
        attenuation.setTitle("Attenuation");
        attenuation.setLeftAxis(unit.label(), FrequencyPlot.Scale.LOG);
        attenuation.setSeries(series);
    }

    private static double scale(Display.AttenuationUnit unit, SweepResult sweep, double dbPerMetre) {
        return unit.wholeLine() ? dbPerMetre * sweep.lengthMetres() : dbPerMetre * unit.perDbPerMetre();
    }

    private void drawVelocity(SweepSnapshot snapshot) {
        boolean fraction = !"m/s".equals(velocityUnit.getValue());
        double divisor = fraction ? C0 : 1;
        SweepResult s = snapshot.sweep();
        List<PlotSeries> series = new ArrayList<>();
        java.util.function.Function<SweepResult, double[]> phase = r -> column(r, i -> r.phaseVelocityMetresPerSecond(i) / divisor);
        series.add(live("phase", s, phase.apply(s), new double[0], false));
        series.add(live("group", s, column(s, i -> s.groupVelocityMetresPerSecond(i) / divisor), new double[] {8, 4},
                false));
        addPins(series, phase, false);
        velocity.setBands(band(2, 1 / divisor));
        velocity.setTitle("Velocity");
        velocity.setLeftAxis(fraction ? "fraction of c" : "m/s", FrequencyPlot.Scale.LINEAR);
        velocity.setSeries(series);
    }

    private void drawImpedance(SweepSnapshot snapshot) {
        SweepResult s = snapshot.sweep();
        List<PlotSeries> series = new ArrayList<>();
        if (impedanceForm.getValue() == ImpedanceForm.REAL_IMAGINARY) {
            java.util.function.Function<SweepResult, double[]> real = r -> column(r, r::z0RealOhm);
            series.add(live("Re Z0", s, real.apply(s), new double[0], false));
            series.add(live("Im Z0", s, column(s, s::z0ImaginaryOhm), new double[] {8, 4}, false));
            addPins(series, real, false);
            impedance.setLeftAxis("Ω", FrequencyPlot.Scale.LINEAR);
            impedance.setBands(List.of());
            impedance.setRightAxis("", FrequencyPlot.Scale.LINEAR);
        } else {
            java.util.function.Function<SweepResult, double[]> magnitude = r -> column(r, r::z0MagnitudeOhm);
            series.add(live("|Z0|", s, magnitude.apply(s), new double[0], false));
            series.add(live("phase", s, column(s, i -> Math.toDegrees(Math.atan2(s.z0ImaginaryOhm(i), s.z0RealOhm(i)))),
                    new double[] {8, 4}, true));
            addPins(series, magnitude, false);
            impedance.setLeftAxis("|Z0| Ω", FrequencyPlot.Scale.LOG);
            impedance.setBands(band(0, 1));
            impedance.setRightAxis("phase °", FrequencyPlot.Scale.LINEAR);
        }
        if (s.isPair()) {
            // the pair's own impedances share the left axis: Zdiff is what a differential target names
            series.add(live("Zdiff", s, column(s, s::differentialImpedanceOhm), new double[] {14, 4, 3, 4}, false));
            series.add(live("Zcommon", s, column(s, s::commonImpedanceOhm), new double[] {3, 3}, false));
            for (Pin pin : model.pins()) {
                SweepResult p = pin.snapshot().sweep();
                if (p.isPair()) {
                    series.add(new PlotSeries(pin.label() + " Zdiff", column(p, p::frequencyHz),
                            column(p, p::differentialImpedanceOhm), p.size(), palette.pin(pin.slot()), 1.8,
                            new double[] {14, 4, 3, 4}, false));
                }
            }
        }
        if (s.isPair() && impedanceForm.getValue() != ImpedanceForm.REAL_IMAGINARY) {
            // Zcommon, Z0 and Zdiff span about a factor of four: a linear axis labels all three
            impedance.setLeftAxis("Ω", FrequencyPlot.Scale.LINEAR);
        }
        impedance.setTitle(s.isPair() ? "Impedance (pair)" : "Impedance Z0");
        impedance.setSeries(series);
    }

    private void drawPerUnit(SweepSnapshot snapshot) {
        PerUnitLength which = perUnitChoice.getValue();
        java.util.function.Function<SweepResult, double[]> quantity = switch (which) {
            case R -> r -> column(r, r::resistanceOhmPerMetre);
            case L -> r -> column(r, r::inductanceHenryPerMetre);
            case G -> r -> column(r, r::conductanceSiemensPerMetre);
            case C -> r -> column(r, r::capacitanceFaradPerMetre);
        };
        String unit = switch (which) {
            case R -> "Ω/m";
            case L -> "H/m";
            case G -> "S/m";
            case C -> "F/m";
        };
        SweepResult s = snapshot.sweep();
        List<PlotSeries> series = new ArrayList<>();
        series.add(live(which.name() + "′", s, quantity.apply(s), new double[0], false));
        addPins(series, quantity, false);
        perUnit.setTitle("Per unit length: " + which.name() + "′");
        perUnit.setLeftAxis(unit, FrequencyPlot.Scale.LOG);
        perUnit.setSeries(series);
    }

    private List<PlotMarker> markers(SweepSnapshot snapshot) {
        FrequencyLimits limits = snapshot.limits();
        List<PlotMarker> markers = new ArrayList<>();
        add(markers, limits.electricalLengthHz(), "L/λ = " + Display.number(snapshot.design().threshold()),
                palette.electricalLength(), new double[0]);
        boolean round = snapshot.design().geometry().type() == LineType.COAX
                || snapshot.design().geometry().type() == LineType.TWO_WIRE
                || snapshot.design().geometry().type() == LineType.WIRE_OVER_GROUND;
        add(markers, limits.skinDepthEqualsRadiusHz(), round ? "δ = radius" : "δ = t/2", palette.skin(),
                new double[] {6, 4});
        add(markers, limits.resistanceDoublesHz(), "R = 2·R_dc", palette.skin(), new double[] {2, 3});
        add(markers, limits.higherModeCutoffHz(), "1st higher mode", palette.higherMode(), new double[0]);
        add(markers, limits.lossBudgetHz(), Display.number(snapshot.design().lossBudgetDb()) + " dB used",
                palette.lossBudget(), new double[0]);
        return markers;
    }

    private static void add(List<PlotMarker> markers, double frequency, String label, Color color, double[] dash) {
        if (!Double.isNaN(frequency)) {
            markers.add(new PlotMarker(frequency, label + " · " + Display.frequency(frequency), color, dash));
        }
    }

    private List<PlotRegion> regions(SweepSnapshot snapshot, double from, double to) {
        FrequencyLimits limits = snapshot.limits();
        List<PlotRegion> regions = new ArrayList<>();
        if (!Double.isNaN(limits.electricalLengthHz())) {
            regions.add(new PlotRegion(from, limits.electricalLengthHz(), palette.lumpedShade(), false,
                    "lumped is fine", -1));
        }
        double invalidFrom = limits.higherModeCutoffHz();
        String invalidLabel = "TEM model not valid";
        if (snapshot.model() instanceof MicrostripLine microstrip) {
            double dispersion = microstrip.dispersionValidityLimitHz();
            if (Double.isNaN(invalidFrom) || dispersion < invalidFrom) {
                invalidFrom = dispersion;
                invalidLabel = "outside the dispersion model's range";
            }
        }
        if (!Double.isNaN(limits.radiationSpacingHz())) {
            invalidFrom = limits.radiationSpacingHz();
            invalidLabel = "open line radiates (not modelled)";
        }
        if (!Double.isNaN(invalidFrom) && invalidFrom < to) {
            regions.add(new PlotRegion(invalidFrom, to, palette.invalidHatch(), true, invalidLabel, -1));
        }
        return regions;
    }

    private List<PlotRegion> lossRegions(SweepSnapshot snapshot, double from, double to) {
        LossRegions regions = snapshot.regions();
        FrequencyLimits limits = snapshot.limits();
        List<PlotRegion> strips = new ArrayList<>();
        if (!Double.isNaN(regions.rcCornerHz())) {
            strips.add(new PlotRegion(from, regions.rcCornerHz(), palette.regionBand(), false, "RC: ωL′ < R′", 0));
        }
        if (!Double.isNaN(limits.resistanceDoublesHz())) {
            strips.add(new PlotRegion(limits.resistanceDoublesHz(), to, palette.regionBand(), false, "skin effect", 1));
        }
        if (!Double.isNaN(regions.lossCrossoverHz())) {
            strips.add(new PlotRegion(regions.lossCrossoverHz(), to, palette.regionBand().darker(), false,
                    "dielectric loss > conductor loss", 0));
        }
        return strips;
    }
}
