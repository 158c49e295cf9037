package spoolwork.model;

import java.util.List;
import java.util.Objects;
import java.util.Set;

/**
 * One position (one envelope) of a directional valve: the flow paths open in it and the ports it blocks.
 * Positions are named as on the drawing: "a" for the left envelope, "0" for the rest (centre or spring)
 * envelope, "b" for the right envelope of a three-position valve.
 */
public record SpoolPosition(String name, List<FlowPath> paths, Set<String> blocked) {
    public SpoolPosition {
        Objects.requireNonNull(name);
        paths = List.copyOf(paths);
        blocked = Set.copyOf(blocked);
    }

    /** An open path through the spool, drawn as an arrow from {@code from} to {@code to}; it conducts both ways. */
    public record FlowPath(String from, String to) {
        public FlowPath {
            Objects.requireNonNull(from);
            Objects.requireNonNull(to);
        }
    }

    /** Name of the rest position every directional valve has. */
    public static final String REST = "0";
}
