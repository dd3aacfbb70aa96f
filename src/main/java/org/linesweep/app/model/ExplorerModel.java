package org.linesweep.app.model;

import java.util.concurrent.Executor;
import java.util.function.BooleanSupplier;
import javafx.beans.property.BooleanProperty;
import javafx.beans.property.DoubleProperty;
import javafx.beans.property.ObjectProperty;
import javafx.beans.property.ReadOnlyBooleanProperty;
import javafx.beans.property.ReadOnlyBooleanWrapper;
import javafx.beans.property.ReadOnlyObjectProperty;
import javafx.beans.property.ReadOnlyObjectWrapper;
import javafx.beans.property.ReadOnlyStringProperty;
import javafx.beans.property.ReadOnlyStringWrapper;
import javafx.beans.property.SimpleBooleanProperty;
import javafx.beans.property.SimpleDoubleProperty;
import javafx.beans.property.SimpleObjectProperty;
import javafx.collections.FXCollections;
import javafx.collections.ObservableList;
import org.linesweep.design.Design;
import org.linesweep.design.InvalidInputException;

/**
 * The explorer's state: the live design with its undo history, the latest computed snapshot, the pins,
 * the crosshair and the display choices. Changes go through methods that validate, so the model never
 * holds an invalid design; a rejected change leaves the last valid design and sets {@link #messageProperty()}.
 */
public final class ExplorerModel {

    /** At most this many designs can be pinned for comparison. */
    public static final int MAX_PINS = 4;
    private static final int UNDO_DEPTH = 200;

    private final ReadOnlyObjectWrapper<Design> design = new ReadOnlyObjectWrapper<>(this, "design");
    private final ReadOnlyObjectWrapper<SweepSnapshot> snapshot = new ReadOnlyObjectWrapper<>(this, "snapshot");
    private final ReadOnlyStringWrapper message = new ReadOnlyStringWrapper(this, "message", "");
    private final UndoHistory<Design> history = new UndoHistory<>(UNDO_DEPTH);
    private final ObservableList<Pin> pins = FXCollections.observableArrayList();
    private final ObservableList<Pin> pinsView = FXCollections.unmodifiableObservableList(pins);
    private final BooleanProperty markerMode = new SimpleBooleanProperty(this, "markerMode", true);
    private final BooleanProperty meetingMode = new SimpleBooleanProperty(this, "meetingMode", false);
    private final ObjectProperty<UnitSystem> unitSystem = new SimpleObjectProperty<>(this, "unitSystem",
            UnitSystem.METRIC);
    private final DoubleProperty crosshairHz = new SimpleDoubleProperty(this, "crosshairHz", Double.NaN);
    private final SweepService service;
    private Design dragStart;
    private final ReadOnlyBooleanWrapper dragging = new ReadOnlyBooleanWrapper(this, "dragging", false);
    private int pinCounter;

    /**
     * A change whose kind of design last computed within this much CPU time is computed on the FX thread itself,
     * so its curves are drawn in the same frame (see {@link SweepService}). 2 ms is an eighth of a 60 Hz frame:
     * a 2,000-point drag step takes 0.1-0.4 ms here (docs/performance.md), and a heavier one goes to the worker.
     */
    public static final long INLINE_BUDGET_NANOS = 2_000_000;

    /**
     * A model that computes every change on the worker.
     *
     * @param initial the design to open on
     * @param worker where sweeps are computed (a background thread in the app)
     * @param resultExecutor where results are delivered (the FX thread in the app)
     */
    public ExplorerModel(Design initial, Executor worker, Executor resultExecutor) {
        this(initial, worker, resultExecutor, () -> false, SweepService.NEVER_INLINE);
    }

    /**
     * @param initial the design to open on
     * @param worker where sweeps are computed (a background thread in the app)
     * @param resultExecutor where results are delivered (the FX thread in the app)
     * @param onResultThread whether the caller is on the result executor's thread
     * @param inlineBudgetNanos see {@link SweepService}
     */
    public ExplorerModel(Design initial, Executor worker, Executor resultExecutor, BooleanSupplier onResultThread,
            long inlineBudgetNanos) {
        this.service = new SweepService(worker, resultExecutor, snapshot::set,
                error -> message.set("computation failed: " + error.getMessage()), onResultThread,
                inlineBudgetNanos);
        design.set(initial);
        service.request(initial);
    }

    public ReadOnlyObjectProperty<Design> designProperty() {
        return design.getReadOnlyProperty();
    }

    public Design getDesign() {
        return design.get();
    }

    /** The latest computed snapshot: always for the newest design once the computation catches up. */
    public ReadOnlyObjectProperty<SweepSnapshot> snapshotProperty() {
        return snapshot.getReadOnlyProperty();
    }

    /** The last rejection or failure, in words; empty when all is well. */
    public ReadOnlyStringProperty messageProperty() {
        return message.getReadOnlyProperty();
    }

    public ReadOnlyBooleanProperty canUndoProperty() {
        return history.canUndoProperty();
    }

    public ReadOnlyBooleanProperty canRedoProperty() {
        return history.canRedoProperty();
    }

    public ObservableList<Pin> pins() {
        return pinsView;
    }

    public BooleanProperty markerModeProperty() {
        return markerMode;
    }

    public BooleanProperty meetingModeProperty() {
        return meetingMode;
    }

    public ObjectProperty<UnitSystem> unitSystemProperty() {
        return unitSystem;
    }

    /** Frequency under the crosshair, Hz; NaN when the pointer is off the plots. */
    public DoubleProperty crosshairHzProperty() {
        return crosshairHz;
    }

    /**
     * Applies a change as one undoable step.
     *
     * @param change builds the new design from the current one; may throw {@link InvalidInputException}
     * @return true if applied, false if rejected (the message says why)
     */
    public boolean apply(DesignChange change) {
        return change(change, true);
    }

    /** Marks the start of a continuous edit (a slider drag): the whole drag becomes one undo step. */
    public void beginDrag() {
        dragStart = design.get();
        dragging.set(true);
    }

    /** True from {@link #beginDrag} to {@link #endDrag}: views may hold their layout still meanwhile. */
    public ReadOnlyBooleanProperty draggingProperty() {
        return dragging.getReadOnlyProperty();
    }

    /** Applies one step of a continuous edit, without an undo entry of its own. */
    public boolean drag(DesignChange change) {
        return change(change, dragStart == null);
    }

    /** Ends a continuous edit, recording it as one undo step. */
    public void endDrag() {
        if (dragStart != null && !dragStart.equals(design.get())) {
            history.record(dragStart);
        }
        dragStart = null;
        dragging.set(false);
    }

    private boolean change(DesignChange change, boolean record) {
        Design current = design.get();
        Design next;
        try {
            next = change.apply(current);
        } catch (InvalidInputException e) {
            message.set(e.getMessage());
            return false;
        }
        message.set("");
        if (next.equals(current)) {
            return true;
        }
        if (record) {
            history.record(current);
        }
        design.set(next);
        service.request(next);
        return true;
    }

    /** Replaces the whole design (opening a file or a preset) as one undoable step. */
    public void open(Design opened) {
        apply(current -> opened);
    }

    /** Reports a problem that did not come from a design change (e.g. a file that cannot be read). */
    public void report(String problem) {
        message.set(problem);
    }

    public boolean undo() {
        Design previous = history.undo(design.get());
        if (previous == null) {
            return false;
        }
        design.set(previous);
        service.request(previous);
        message.set("");
        return true;
    }

    public boolean redo() {
        Design next = history.redo(design.get());
        if (next == null) {
            return false;
        }
        design.set(next);
        service.request(next);
        message.set("");
        return true;
    }

    /**
     * Pins the current design with its computed results. Does nothing (and says so) when four are pinned
     * or the computation has not caught up with the design yet.
     */
    public boolean pinCurrent() {
        SweepSnapshot current = snapshot.get();
        if (pins.size() >= MAX_PINS) {
            message.set("at most " + MAX_PINS + " designs can be pinned; unpin one first");
            return false;
        }
        if (current == null || !current.design().equals(design.get())) {
            message.set("the curves are still being computed; pin again in a moment");
            return false;
        }
        int slot = 0;
        while (slotTaken(slot)) {
            slot++;
        }
        pinCounter++;
        String name = current.design().name().isBlank() ? "design" : current.design().name();
        pins.add(new Pin(slot, "Pin " + pinCounter + ": " + name, current));
        return true;
    }

    /**
     * Pins a design directly (restoring an autosave): its results are computed here, on the calling thread.
     *
     * @return false when four are pinned already
     */
    public boolean pinDesign(Design pinned) {
        if (pins.size() >= MAX_PINS) {
            return false;
        }
        int slot = 0;
        while (slotTaken(slot)) {
            slot++;
        }
        pinCounter++;
        String name = pinned.name().isBlank() ? "design" : pinned.name();
        pins.add(new Pin(slot, "Pin " + pinCounter + ": " + name, SweepSnapshot.compute(-1, pinned)));
        return true;
    }

    private boolean slotTaken(int slot) {
        return pins.stream().anyMatch(p -> p.slot() == slot);
    }

    public void unpin(Pin pin) {
        pins.remove(pin);
    }

    public void unpinAll() {
        pins.clear();
    }

    /** A change to a design. */
    @FunctionalInterface
    public interface DesignChange {
        Design apply(Design current);
    }
}
