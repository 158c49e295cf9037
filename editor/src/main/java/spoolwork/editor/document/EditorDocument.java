package spoolwork.editor.document;

import java.nio.file.Path;
import java.util.Objects;

import javafx.beans.property.ReadOnlyBooleanProperty;
import javafx.beans.property.ReadOnlyBooleanWrapper;
import javafx.beans.property.ReadOnlyLongProperty;
import javafx.beans.property.ReadOnlyLongWrapper;
import javafx.beans.property.ReadOnlyObjectProperty;
import javafx.beans.property.ReadOnlyObjectWrapper;
import javafx.beans.property.ReadOnlyStringProperty;
import javafx.beans.property.ReadOnlyStringWrapper;

import spoolwork.editor.commands.Command;
import spoolwork.editor.commands.History;
import spoolwork.model.Circuit;
import spoolwork.model.ModelException;

/**
 * The open document: the current circuit, its file, and its undo history. Every change goes through
 * {@link #execute}; views watch {@link #revisionProperty()}, which rises by one on every change, undo,
 * redo or load, so a background calculation can snapshot (revision, circuit) and know whether its
 * answer is still current. Needs no running JavaFX toolkit.
 */
public final class EditorDocument {
    private static final int UNDO_LIMIT = 1000;

    private final ReadOnlyObjectWrapper<Circuit> circuit = new ReadOnlyObjectWrapper<>(this, "circuit", Circuit.empty());
    private final ReadOnlyLongWrapper revision = new ReadOnlyLongWrapper(this, "revision", 0);
    private final ReadOnlyObjectWrapper<Path> file = new ReadOnlyObjectWrapper<>(this, "file");
    private final ReadOnlyBooleanWrapper dirty = new ReadOnlyBooleanWrapper(this, "dirty", false);
    private final ReadOnlyBooleanWrapper canUndo = new ReadOnlyBooleanWrapper(this, "canUndo", false);
    private final ReadOnlyBooleanWrapper canRedo = new ReadOnlyBooleanWrapper(this, "canRedo", false);
    private final ReadOnlyStringWrapper undoText = new ReadOnlyStringWrapper(this, "undoText", "");
    private final ReadOnlyStringWrapper redoText = new ReadOnlyStringWrapper(this, "redoText", "");
    private final History history = new History(UNDO_LIMIT);
    private Circuit saved = Circuit.empty();

    /** A consistent pair a background calculation can take and later compare against {@link #getRevision()}. */
    public record Snapshot(long revision, Circuit circuit) {
    }

    public Circuit getCircuit() {
        return circuit.get();
    }

    public ReadOnlyObjectProperty<Circuit> circuitProperty() {
        return circuit.getReadOnlyProperty();
    }

    public long getRevision() {
        return revision.get();
    }

    public ReadOnlyLongProperty revisionProperty() {
        return revision.getReadOnlyProperty();
    }

    public Snapshot snapshot() {
        return new Snapshot(getRevision(), getCircuit());
    }

    public Path getFile() {
        return file.get();
    }

    public ReadOnlyObjectProperty<Path> fileProperty() {
        return file.getReadOnlyProperty();
    }

    /** True when the circuit differs from the one last saved or opened. */
    public boolean isDirty() {
        return dirty.get();
    }

    public ReadOnlyBooleanProperty dirtyProperty() {
        return dirty.getReadOnlyProperty();
    }

    public ReadOnlyBooleanProperty canUndoProperty() {
        return canUndo.getReadOnlyProperty();
    }

    public ReadOnlyBooleanProperty canRedoProperty() {
        return canRedo.getReadOnlyProperty();
    }

    public ReadOnlyStringProperty undoTextProperty() {
        return undoText.getReadOnlyProperty();
    }

    public ReadOnlyStringProperty redoTextProperty() {
        return redoText.getReadOnlyProperty();
    }

    /**
     * Applies the command as one undo step. A command whose result equals the current circuit changes
     * nothing and leaves no step.
     *
     * @return true when the document changed
     * @throws ModelException when the result would break a rule of the model; the document is unchanged
     */
    public boolean execute(Command command) {
        Circuit before = getCircuit();
        Circuit after = Objects.requireNonNull(command.change().apply(before), "command returned no circuit");
        if (after.equals(before)) {
            return false;
        }
        history.push(new History.Step(command.description(), before, after));
        set(after);
        return true;
    }

    public boolean undo() {
        return history.undo().map(s -> {
            set(s.before());
            return true;
        }).orElse(false);
    }

    public boolean redo() {
        return history.redo().map(s -> {
            set(s.after());
            return true;
        }).orElse(false);
    }

    /** Replaces the whole document (New, Open): the history is cleared and the circuit counts as saved. */
    public void replace(Circuit c, Path path) {
        history.clear();
        saved = c;
        file.set(path);
        set(c);
    }

    /** Records that the current circuit was written to the file. */
    public void markSaved(Path path) {
        saved = getCircuit();
        file.set(path);
        refresh();
    }

    private void set(Circuit c) {
        circuit.set(c);
        revision.set(revision.get() + 1);
        refresh();
    }

    private void refresh() {
        dirty.set(!getCircuit().equals(saved));
        canUndo.set(history.nextUndo().isPresent());
        canRedo.set(history.nextRedo().isPresent());
        undoText.set(history.nextUndo().map(History.Step::description).orElse(""));
        redoText.set(history.nextRedo().map(History.Step::description).orElse(""));
    }
}
