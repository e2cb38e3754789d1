package org.arcwright.app.model;

import java.util.ArrayDeque;
import java.util.Deque;
import java.util.Objects;
import java.util.Optional;

/**
 * Undo and redo over immutable snapshots. Because worksheets are immutable, an edit is simply the
 * state before it, with a label saying what the edit was.
 *
 * @param <T> the immutable state
 */
public final class UndoHistory<T> {
    /** One remembered state and the edit that left it. */
    public record Step<T>(String label, T state) {}

    private final Deque<Step<T>> undo = new ArrayDeque<>();
    private final Deque<Step<T>> redo = new ArrayDeque<>();
    private final int limit;

    public UndoHistory(int limit) {
        if (limit < 1) throw new IllegalArgumentException("limit must be at least 1, got " + limit);
        this.limit = limit;
    }

    /** Remembers {@code before} as the state an edit called {@code label} replaced; clears redo. */
    public void record(String label, T before) {
        undo.push(new Step<>(Objects.requireNonNull(label, "label"), Objects.requireNonNull(before, "before")));
        while (undo.size() > limit) undo.removeLast();
        redo.clear();
    }

    public boolean canUndo() { return !undo.isEmpty(); }

    public boolean canRedo() { return !redo.isEmpty(); }

    /** The label of the edit undo would revert. */
    public Optional<String> undoLabel() { return canUndo() ? Optional.of(undo.peek().label()) : Optional.empty(); }

    /** The label of the edit redo would repeat. */
    public Optional<String> redoLabel() { return canRedo() ? Optional.of(redo.peek().label()) : Optional.empty(); }

    /** The state before the last edit; {@code current} becomes redoable. */
    public T undo(T current) {
        Step<T> s = undo.pop();
        redo.push(new Step<>(s.label(), current));
        return s.state();
    }

    /** The state after the last undone edit; {@code current} becomes undoable again. */
    public T redo(T current) {
        Step<T> s = redo.pop();
        undo.push(new Step<>(s.label(), current));
        return s.state();
    }

    public void clear() {
        undo.clear();
        redo.clear();
    }
}
