package spoolwork.editor.commands;

import java.util.LinkedHashMap;
import java.util.Map;

import spoolwork.model.Circuit;
import spoolwork.model.Component;
import spoolwork.model.Junction;
import spoolwork.model.Line;
import spoolwork.model.Note;

/**
 * A circuit being changed in many places at once. Each {@code with…} of a circuit copies and checks the
 * whole document; an edit touching hundreds of elements collects them here and builds (and checks) once.
 */
final class Draft {
    private final Circuit base;
    final Map<String, Component> components = new LinkedHashMap<>();
    final Map<String, Junction> junctions = new LinkedHashMap<>();
    final Map<String, Line> lines = new LinkedHashMap<>();
    final Map<String, Note> notes = new LinkedHashMap<>();
    java.util.List<spoolwork.model.OperatingState> states;

    Draft(Circuit c) {
        base = c;
        states = c.states();
        c.components().forEach(k -> components.put(k.id(), k));
        c.junctions().forEach(j -> junctions.put(j.id(), j));
        c.lines().forEach(l -> lines.put(l.id(), l));
        c.notes().forEach(n -> notes.put(n.id(), n));
    }

    boolean hasId(String id) {
        return components.containsKey(id) || junctions.containsKey(id) || lines.containsKey(id) || notes.containsKey(id);
    }

    /** A fresh id with the prefix, unused in the draft so far. */
    String freshId(String prefix) {
        for (int i = 1; ; i++) {
            if (!hasId(prefix + i)) {
                return prefix + i;
            }
        }
    }

    /** The checked circuit; throws the model's exception when a rule is broken. */
    Circuit build() {
        return new Circuit(base.title(), base.fluid(), components.values(), junctions.values(), lines.values(),
                notes.values(), states);
    }
}
