package spoolwork.symbols;

import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import java.util.Optional;

import spoolwork.model.Component;
import spoolwork.model.Point;

/**
 * One drawn symbol: its shapes, one anchor per model port, its bounding box and the boxes a pointer must
 * fall in to pick it. Immutable; all coordinates in grid units, either about the symbol's own origin (as
 * {@link SymbolLibrary} returns it) or on the sheet (after {@link #placed(Component)}).
 *
 * @param key      identifies the drawing: type key, chosen options and shown spool position
 * @param shapes   drawing primitives in painting order
 * @param anchors  one per port of the component type, in the type's port order
 * @param bounds   smallest box holding every shape; every anchor lies on its outline
 * @param hitAreas boxes that pick the symbol
 */
public record Symbol(String key, List<Shape> shapes, List<Anchor> anchors, Box bounds, List<Box> hitAreas) {
    public Symbol {
        Objects.requireNonNull(key);
        shapes = List.copyOf(shapes);
        anchors = List.copyOf(anchors);
        Objects.requireNonNull(bounds);
        hitAreas = List.copyOf(hitAreas);
    }

    public Optional<Anchor> anchor(String port) {
        return anchors.stream().filter(a -> a.port().equals(port)).findFirst();
    }

    /** The anchor nearest to {@code p} within {@code tolerance} grid units, for snapping a line end to a port. */
    public Optional<Anchor> anchorNear(Point p, double tolerance) {
        Anchor best = null;
        double bestD = tolerance;
        for (Anchor a : anchors) {
            double d = Math.hypot(a.at().x() - p.x(), a.at().y() - p.y());
            if (d <= bestD) {
                best = a;
                bestD = d;
            }
        }
        return Optional.ofNullable(best);
    }

    /** The symbol moved by a transform: shapes, anchors, bounds and hit areas alike. */
    public Symbol transformed(Transform t) {
        List<Shape> s = new ArrayList<>(shapes.size());
        for (Shape sh : shapes) {
            s.add(sh.transformed(t));
        }
        List<Anchor> a = new ArrayList<>(anchors.size());
        for (Anchor an : anchors) {
            a.add(an.transformed(t));
        }
        List<Box> h = new ArrayList<>(hitAreas.size());
        for (Box b : hitAreas) {
            h.add(b.transformed(t));
        }
        return new Symbol(key, s, a, bounds.transformed(t), h);
    }

    /** This symbol as drawn for a component: mirrored, rotated and moved to its position on the sheet. */
    public Symbol placed(Component c) {
        return transformed(Transform.of(c));
    }

    /** True when the point (same coordinates as the symbol) picks the symbol. */
    public boolean hits(Point p) {
        for (Box b : hitAreas) {
            if (b.contains(p)) {
                return true;
            }
        }
        return false;
    }
}
