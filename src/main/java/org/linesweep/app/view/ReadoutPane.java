package org.linesweep.app.view;

import java.util.Locale;
import javafx.animation.PauseTransition;
import javafx.geometry.Insets;
import javafx.scene.control.Label;
import javafx.scene.layout.GridPane;
import javafx.scene.layout.VBox;
import javafx.util.Duration;
import org.linesweep.app.model.ExplorerModel;
import org.linesweep.app.model.SweepSnapshot;
import org.linesweep.physics.FrequencyLimits;
import org.linesweep.physics.LinePoint;
import org.linesweep.physics.PairModes;
import org.linesweep.physics.PhysicalConstants;

/**
 * The frequency ceiling with what sets it, and every quantity at the crosshair's frequency, evaluated
 * exactly by the model (not read off the plotted grid).
 *
 * <p>While the values keep changing (a drag, a moving crosshair) the read-out is refreshed at most ten times
 * a second, and always once more at the end: numbers changing faster cannot be read, and each refresh costs
 * a re-layout of the pane and a repaint of all its text, which in the software pipeline took about a fifth of
 * the time to paint a frame of a drag.
 */
public final class ReadoutPane extends VBox {

    private final ExplorerModel model;
    private final Label ceiling = new Label();
    private final Label limitsLine = new Label();
    private final Label where = new Label();
    private final GridPane values = new GridPane();
    private static final String[] NAMES = {"|Z0|", "Z0", "α", "loss over length", "conductor / dielectric",
        "phase velocity", "group velocity", "wavelength", "L/λ", "ε_eff", "skin depth", "R′ / L′", "G′ / C′",
        "delay", "pair Zdiff / Zcommon", "pair Zodd / Zeven", "pair ε_eff odd / even"};
    /** Index of the first row that only a pair shows. */
    private static final int FIRST_PAIR_ROW = 14;
    /** Shortest time between two refreshes while values keep changing. */
    private static final long REFRESH_INTERVAL_NANOS = 100_000_000L;
    private final Label[] cells = new Label[NAMES.length];
    private final Label[] names = new Label[NAMES.length];
    private final PauseTransition trailingRefresh = new PauseTransition();
    private long lastRefreshNanos = Long.MIN_VALUE / 2;
    /** A refresh is waiting for its time (volatile: tests ask from their own thread). */
    private volatile boolean refreshWaiting;

    public ReadoutPane(ExplorerModel model) {
        this.model = model;
        getStyleClass().add("readout-pane");
        setPadding(new Insets(8, 10, 8, 10));
        setSpacing(4);
        ceiling.setId("ceiling-readout");
        ceiling.getStyleClass().add("ceiling");
        ceiling.setWrapText(true);
        limitsLine.setWrapText(true);
        limitsLine.getStyleClass().add("limits-line");
        where.getStyleClass().add("readout-where");
        values.setHgap(10);
        values.setVgap(1);
        for (int i = 0; i < NAMES.length; i++) {
            Label name = new Label(NAMES[i]);
            name.getStyleClass().add("readout-name");
            names[i] = name;
            cells[i] = new Label();
            cells[i].setId("readout-" + i);
            values.add(name, 0, i);
            values.add(cells[i], 1, i);
        }
        getChildren().addAll(ceiling, limitsLine, where, values);
        trailingRefresh.setOnFinished(e -> refresh());
        model.snapshotProperty().addListener((o, old, now) -> requestRefresh());
        model.crosshairHzProperty().addListener((o, old, now) -> requestRefresh());
        model.unitSystemProperty().addListener((o, old, now) -> requestRefresh());
        refresh();
    }

    /** True when the read-out shows the latest values (no refresh is waiting). */
    public boolean isCurrent() {
        return !refreshWaiting;
    }

    private void requestRefresh() {
        if (!isCurrent()) {
            return; // the waiting refresh will show the newest values
        }
        long since = System.nanoTime() - lastRefreshNanos;
        if (since >= REFRESH_INTERVAL_NANOS) {
            refresh();
        } else {
            refreshWaiting = true;
            trailingRefresh.setDuration(Duration.millis((REFRESH_INTERVAL_NANOS - since) / 1e6));
            trailingRefresh.playFromStart();
        }
    }

    public Label ceilingLabel() {
        return ceiling;
    }

    /** The read-out value of a row by its name, for tests. */
    public String value(String name) {
        for (int i = 0; i < NAMES.length; i++) {
            if (NAMES[i].equals(name)) {
                return cells[i].getText();
            }
        }
        throw new IllegalArgumentException(name);
    }

    private void refresh() {
        lastRefreshNanos = System.nanoTime();
        refreshWaiting = false;
        trailingRefresh.stop();
        SweepSnapshot snapshot = model.snapshotProperty().get();
        if (snapshot == null) {
            ceiling.setText("computing…");
            return;
        }
        FrequencyLimits limits = snapshot.limits();
        if (Double.isNaN(limits.ceilingHz())) {
            ceiling.setText("No frequency ceiling between 1 Hz and 10 THz");
        } else {
            String reason = switch (limits.limitedBy()) {
                case ELECTRICAL_LENGTH -> "electrical length (L/λ = " + Display.number(snapshot.design().threshold()) + ")";
                case HIGHER_ORDER_MODE -> "the first higher-order mode";
                case LOSS_BUDGET -> "the " + Display.number(snapshot.design().lossBudgetDb()) + " dB loss budget";
            };
            ceiling.setText("Frequency ceiling " + Display.frequency(limits.ceilingHz()) + ", set by " + reason);
        }
        limitsLine.setText(String.join("   ",
                part("lumped up to", limits.electricalLengthHz()),
                part("δ = r at", limits.skinDepthEqualsRadiusHz()),
                part("R = 2R_dc at", limits.resistanceDoublesHz()),
                part("1st higher mode", limits.higherModeCutoffHz()),
                part("loss budget at", limits.lossBudgetHz())).trim());
        double f = model.crosshairHzProperty().get();
        boolean hovering = !Double.isNaN(f);
        if (!hovering) {
            f = Math.sqrt(snapshot.sweep().frequencyHz(0) * snapshot.sweep().frequencyHz(snapshot.sweep().size() - 1));
        }
        where.setText((hovering ? "At the crosshair, " : "Mid-sweep (hover a plot to move), ") + Display.frequency(f));
        LinePoint p = snapshot.model().at(f);
        double length = snapshot.design().lengthMetres();
        double alpha = p.alphaDbPerMetre();
        double r = p.resistanceOhmPerMetre();
        double z2 = p.z0MagnitudeOhm() * p.z0MagnitudeOhm();
        double conductorShare = r + p.conductanceSiemensPerMetre() * z2 > 0
                ? r / (r + p.conductanceSiemensPerMetre() * z2) : 0;
        String[] text = {
            Display.number(p.z0MagnitudeOhm()) + " Ω ∠ "
                    + String.format(Locale.ROOT, "%.2f°", Math.toDegrees(Math.atan2(p.z0ImaginaryOhm(), p.z0RealOhm()))),
            Display.number(p.z0RealOhm()) + (p.z0ImaginaryOhm() < 0 ? " − j" : " + j")
                    + Display.number(Math.abs(p.z0ImaginaryOhm())) + " Ω",
            Display.number(alpha) + " dB/m  (" + Display.number(alpha * 30.48) + " dB/100 ft)",
            Display.number(alpha * length) + " dB",
            String.format(Locale.ROOT, "%.0f %% / %.0f %%", 100 * conductorShare, 100 * (1 - conductorShare)),
            Display.number(p.phaseVelocityMetresPerSecond()) + " m/s  ("
                    + Display.number(p.phaseVelocityMetresPerSecond() / PhysicalConstants.SPEED_OF_LIGHT_METRES_PER_SECOND)
                    + " c)",
            Display.number(p.groupVelocityMetresPerSecond()) + " m/s",
            Display.lineLength(p.wavelengthMetres(), model.unitSystemProperty().get()),
            Display.number(p.electricalLengthWavelengths(length)) + " λ  ("
                    + Display.number(360 * p.electricalLengthWavelengths(length)) + "°)",
            Display.number(p.effectivePermittivity()),
            Double.isNaN(p.skinDepthMetres()) ? "— (perfect conductor)"
                    : Display.length(p.skinDepthMetres(), model.unitSystemProperty().get()),
            Display.number(p.resistanceOhmPerMetre()) + " Ω/m  /  " + Display.number(p.inductanceHenryPerMetre()) + " H/m",
            Display.number(p.conductanceSiemensPerMetre()) + " S/m  /  " + Display.number(p.capacitanceFaradPerMetre())
                    + " F/m",
            Display.number(p.delaySeconds(length)) + " s"
        };
        for (int i = 0; i < text.length; i++) {
            cells[i].setText(text[i]);
        }
        boolean pair = snapshot.design().geometry().isPair();
        for (int i = FIRST_PAIR_ROW; i < NAMES.length; i++) {
            names[i].setVisible(pair);
            names[i].setManaged(pair);
            cells[i].setVisible(pair);
            cells[i].setManaged(pair);
        }
        if (pair) {
            PairModes modes = snapshot.design().toPair().modes(f);
            cells[FIRST_PAIR_ROW].setText(Display.number(modes.differentialImpedanceOhm()) + " Ω  /  "
                    + Display.number(modes.commonImpedanceOhm()) + " Ω");
            cells[FIRST_PAIR_ROW + 1].setText(Display.number(modes.oddImpedanceOhm()) + " Ω  /  "
                    + Display.number(modes.evenImpedanceOhm()) + " Ω");
            cells[FIRST_PAIR_ROW + 2].setText(Display.number(modes.oddEffectivePermittivity()) + "  /  "
                    + Display.number(modes.evenEffectivePermittivity()));
        }
    }

    private static String part(String label, double frequency) {
        return Double.isNaN(frequency) ? "" : label + " " + Display.frequency(frequency) + ";";
    }
}
