package spoolwork.model;

import java.util.Objects;

/** A connection point where three or more lines meet, drawn as a dot. */
public record Junction(String id, double x, double y) {
    public Junction {
        Objects.requireNonNull(id);
    }

    public Junction at(double nx, double ny) {
        return new Junction(id, nx, ny);
    }
}
