package org.linesweep.app.model;

import java.util.ArrayDeque;
import java.util.Deque;
import javafx.beans.property.ReadOnlyBooleanProperty;
import javafx.beans.property.ReadOnlyBooleanWrapper;

/** Undo and redo stacks of immutable states, bounded in depth. */
public final class UndoHistory<T> {

    private final int depth;
    private final Deque<T> undo = new ArrayDeque<>();
    private final Deque<T> redo = new ArrayDeque<>();
    private final ReadOnlyBooleanWrapper canUndo = new ReadOnlyBooleanWrapper();
    private final ReadOnlyBooleanWrapper canRedo = new ReadOnlyBooleanWrapper();

    public UndoHistory(int depth) {
        this.depth = depth;
    }

    /** Records the state being left, before a change. Clears the redo stack. */
    public void record(T previous) {
        undo.push(previous);
        while (undo.size() > depth) {
            undo.removeLast();
        }
        redo.clear();
        refresh();
    }

    /** Steps back: returns the state to restore, given the current one; null if there is none. */
    public T undo(T current) {
        if (undo.isEmpty()) {
            return null;
        }
        redo.push(current);
        T previous = undo.pop();
        refresh();
        return previous;
    }

    /** Steps forward again; null if there is nothing to redo. */
    public T redo(T current) {
        if (redo.isEmpty()) {
            return null;
        }
        undo.push(current);
        T next = redo.pop();
        refresh();
        return next;
    }

    public ReadOnlyBooleanProperty canUndoProperty() {
        return canUndo.getReadOnlyProperty();
    }

    public ReadOnlyBooleanProperty canRedoProperty() {
        return canRedo.getReadOnlyProperty();
    }

    private void refresh() {
        canUndo.set(!undo.isEmpty());
        canRedo.set(!redo.isEmpty());
    }
}
