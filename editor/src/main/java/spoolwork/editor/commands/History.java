package spoolwork.editor.commands;

import java.util.ArrayDeque;
import java.util.Deque;
import java.util.Optional;

import spoolwork.model.Circuit;

/**
 * The undo and redo stacks: each entry holds the circuit before and after one command. Bounded, so a long
 * session does not keep every version; pushing a new step clears what could be redone.
 */
public final class History {
    /** One undoable step. */
    public record Step(String description, Circuit before, Circuit after) {
    }

    private final int limit;
    private final Deque<Step> undo = new ArrayDeque<>();
    private final Deque<Step> redo = new ArrayDeque<>();

    public History(int limit) {
        if (limit < 1) {
            throw new IllegalArgumentException("limit must be at least 1");
        }
        this.limit = limit;
    }

    public void push(Step s) {
        undo.push(s);
        while (undo.size() > limit) {
            undo.removeLast();
        }
        redo.clear();
    }

    /** Takes the latest step off the undo stack and keeps it for redo. */
    public Optional<Step> undo() {
        if (undo.isEmpty()) {
            return Optional.empty();
        }
        Step s = undo.pop();
        redo.push(s);
        return Optional.of(s);
    }

    public Optional<Step> redo() {
        if (redo.isEmpty()) {
            return Optional.empty();
        }
        Step s = redo.pop();
        undo.push(s);
        return Optional.of(s);
    }

    public Optional<Step> nextUndo() {
        return Optional.ofNullable(undo.peek());
    }

    public Optional<Step> nextRedo() {
        return Optional.ofNullable(redo.peek());
    }

    public int undoDepth() {
        return undo.size();
    }

    public void clear() {
        undo.clear();
        redo.clear();
    }
}
