package spoolwork.symbols;

import java.util.ArrayList;
import java.util.List;

import spoolwork.model.Point;
import spoolwork.model.PortSpec;

/**
 * Where the letter of each fluid port (P, T, A, B, …) is written beside a symbol, so that the SVG and the
 * editor put them in the same place. A letter sits just inside its anchor, beside the line rather than on
 * it; a shaft has none. Text stays upright whatever the symbol's rotation, because the anchors already
 * carry it.
 */
public final class PortLetters {
    /** Cap height of port letters, grid units. */
    public static final double SIZE = 0.7;

    private PortLetters() {
    }

    /** The letter of one port as text at its place, in the anchor's coordinates (grid units). */
    public static Shape.Text of(Anchor a) {
        Direction o = a.outward();
        double x = a.at().x() - o.dx() * 0.45;
        double y = a.at().y() - o.dy() * 0.45;
        if (o.dx() == 0) {
            x += 0.45;
            return new Shape.Text(new Point(x, y), a.port(), SIZE, Shape.TextAnchor.START);
        }
        y -= 0.55;
        return new Shape.Text(new Point(x, y), a.port(), SIZE, Shape.TextAnchor.MIDDLE);
    }

    /** The letters of every fluid port of the symbol, in anchor order; a new list. */
    public static List<Shape.Text> of(Symbol s) {
        List<Shape.Text> out = new ArrayList<>();
        for (Anchor a : s.anchors()) {
            if (!a.port().equals(PortSpec.SHAFT)) {
                out.add(of(a));
            }
        }
        return out;
    }
}
