package spoolwork.editor.document;

import java.util.Collection;
import java.util.LinkedHashSet;
import java.util.Set;

import javafx.beans.property.ReadOnlyLongProperty;
import javafx.beans.property.ReadOnlyLongWrapper;

import spoolwork.model.Circuit;

/**
 * The ids of the selected elements (components, lines, junctions, notes). Views watch the revision,
 * which rises on every change of the set.
 */
public final class Selection {
    private final Set<String> ids = new LinkedHashSet<>();
    private final ReadOnlyLongWrapper revision = new ReadOnlyLongWrapper(this, "revision", 0);

    /** The selected ids, a copy in selection order. */
    public Set<String> ids() {
        return Set.copyOf(ids);
    }

    /** The selected ids in the order they were selected (a copy). */
    public java.util.List<String> ordered() {
        return java.util.List.copyOf(ids);
    }

    public boolean contains(String id) {
        return ids.contains(id);
    }

    public boolean isEmpty() {
        return ids.isEmpty();
    }

    public int size() {
        return ids.size();
    }

    public ReadOnlyLongProperty revisionProperty() {
        return revision.getReadOnlyProperty();
    }

    public void set(Collection<String> newIds) {
        if (ids.size() == newIds.size() && ids.containsAll(newIds)) {
            return;
        }
        ids.clear();
        ids.addAll(newIds);
        bump();
    }

    public void toggle(String id) {
        if (!ids.remove(id)) {
            ids.add(id);
        }
        bump();
    }

    public void add(Collection<String> more) {
        if (ids.addAll(more)) {
            bump();
        }
    }

    public void clear() {
        if (!ids.isEmpty()) {
            ids.clear();
            bump();
        }
    }

    /** Drops ids the circuit no longer has (after undo, delete or load). */
    public void retainIn(Circuit c) {
        if (ids.removeIf(id -> !c.hasId(id))) {
            bump();
        }
    }

    private void bump() {
        revision.set(revision.get() + 1);
    }
}
