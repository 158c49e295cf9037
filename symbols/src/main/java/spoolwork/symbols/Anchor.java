package spoolwork.symbols;

import java.util.Objects;

import spoolwork.model.Point;

/**
 * Where a line joins a port of a symbol.
 *
 * @param port    the model's port name ("P", "A", …, or "shaft")
 * @param at      the connection point, grid units; always a grid point
 * @param outward the direction a line leaves the symbol in
 */
public record Anchor(String port, Point at, Direction outward) {
    public Anchor {
        Objects.requireNonNull(port);
        Objects.requireNonNull(at);
        Objects.requireNonNull(outward);
    }

    public Anchor transformed(Transform t) {
        return new Anchor(port, t.apply(at), t.apply(outward));
    }
}
