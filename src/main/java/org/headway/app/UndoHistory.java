package org.headway.app;

import java.util.ArrayDeque;
import java.util.Deque;
import javafx.beans.property.BooleanProperty;
import javafx.beans.property.ObjectProperty;
import javafx.beans.property.ReadOnlyBooleanProperty;
import javafx.beans.property.SimpleBooleanProperty;

/**
 * Undo and redo over an editor's one immutable piece of state (the run editor's project, the
 * network workspace's line list): every accepted edit replaces the state, the one before is kept
 * (at most {@code limit}), and {@link #canUndoProperty()} / {@link #canRedoProperty()} follow.
 */
final class UndoHistory<T> {

    private final ObjectProperty<T> state;
    private final int limit;
    private final Deque<T> undo = new ArrayDeque<>();
    private final Deque<T> redo = new ArrayDeque<>();
    private final BooleanProperty canUndo = new SimpleBooleanProperty(false);
    private final BooleanProperty canRedo = new SimpleBooleanProperty(false);

    UndoHistory(ObjectProperty<T> state, int limit) {
        this.state = state;
        this.limit = limit;
    }

    ReadOnlyBooleanProperty canUndoProperty() {
        return canUndo;
    }

    ReadOnlyBooleanProperty canRedoProperty() {
        return canRedo;
    }

    /** Replaces the state, the present one becoming undoable; false (nothing done) if they are equal. */
    boolean replace(T next) {
        T current = state.get();
        if (current.equals(next)) {
            return false;
        }
        undo.push(current);
        if (undo.size() > limit) {
            undo.removeLast();
        }
        redo.clear();
        state.set(next);
        update();
        return true;
    }

    /** Goes back one edit; false if there is none. */
    boolean undo() {
        if (undo.isEmpty()) {
            return false;
        }
        redo.push(state.get());
        state.set(undo.pop());
        update();
        return true;
    }

    /** Goes forward one undone edit; false if there is none. */
    boolean redo() {
        if (redo.isEmpty()) {
            return false;
        }
        undo.push(state.get());
        state.set(redo.pop());
        update();
        return true;
    }

    /** Puts {@code value} in place with no history (a file opened, a new document). */
    void reset(T value) {
        undo.clear();
        redo.clear();
        state.set(value);
        update();
    }

    private void update() {
        canUndo.set(!undo.isEmpty());
        canRedo.set(!redo.isEmpty());
    }
}
