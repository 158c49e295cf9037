package spoolwork.model;

import java.util.List;
import java.util.Objects;

/**
 * A hydraulic line (pipe or hose) between two endpoints, routed through bends on the sheet.
 *
 * @param diameter inner diameter, m
 * @param length   length for the pressure-loss calculation, m
 * @param ideal    true for a line with no pressure loss (diameter and length are then only informative)
 */
public record Line(String id, Endpoint from, Endpoint to, List<Point> bends, double diameter, double length,
                   LineKind kind, boolean ideal) {
    public static final double MIN_DIAMETER = 1e-4;
    public static final double MAX_DIAMETER = 1.0;
    public static final double MAX_LENGTH = 10_000;

    public Line {
        Objects.requireNonNull(id);
        Objects.requireNonNull(from);
        Objects.requireNonNull(to);
        bends = List.copyOf(bends);
        Objects.requireNonNull(kind);
    }

    public Line withBends(List<Point> newBends) {
        return new Line(id, from, to, newBends, diameter, length, kind, ideal);
    }

    public Line withEnds(Endpoint newFrom, Endpoint newTo) {
        return new Line(id, newFrom, newTo, bends, diameter, length, kind, ideal);
    }

    public Line withSize(double newDiameter, double newLength) {
        return new Line(id, from, to, bends, newDiameter, newLength, kind, ideal);
    }

    public Line withKind(LineKind newKind) {
        return new Line(id, from, to, bends, diameter, length, newKind, ideal);
    }

    public Line withIdeal(boolean newIdeal) {
        return new Line(id, from, to, bends, diameter, length, kind, newIdeal);
    }
}
