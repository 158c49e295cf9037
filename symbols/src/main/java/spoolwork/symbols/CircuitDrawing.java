package spoolwork.symbols;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Objects;

import spoolwork.model.Circuit;
import spoolwork.model.Component;
import spoolwork.model.Endpoint;
import spoolwork.model.Junction;
import spoolwork.model.Line;
import spoolwork.model.Note;
import spoolwork.model.OperatingState;
import spoolwork.model.Point;
import spoolwork.symbols.Shape.TextAnchor;

/**
 * A circuit drawn in sheet coordinates (grid units): each component's symbol placed, with valves shown in
 * the spool positions of an operating state; the lines routed from anchor through their bends to anchor;
 * a dot on each junction where three or more lines meet; tags and notes as upright text.
 *
 * @param symbols symbols placed on the sheet, in the circuit's component order
 * @param tags    the component tags, one per symbol, just above its top left corner
 * @param lines   the line shapes (solid, dashed or double by line kind)
 * @param dots    junction dots
 * @param notes   free text notes
 */
public record CircuitDrawing(List<Symbol> symbols, List<Shape.Text> tags, List<Shape> lines, List<Shape> dots,
                             List<Shape.Text> notes) {
    /** Cap height of component tags, grid units. */
    public static final double TAG_SIZE = 0.8;

    public CircuitDrawing {
        symbols = List.copyOf(symbols);
        tags = List.copyOf(tags);
        lines = List.copyOf(lines);
        dots = List.copyOf(dots);
        notes = List.copyOf(notes);
    }

    /** Draws the circuit with every valve in the position the state gives it (null: every valve at rest). */
    public static CircuitDrawing of(Circuit circuit, OperatingState state) {
        Objects.requireNonNull(circuit);
        List<Symbol> symbols = new ArrayList<>();
        List<Shape.Text> tags = new ArrayList<>();
        Map<String, Symbol> byId = new java.util.HashMap<>();
        for (Component c : circuit.components()) {
            String shown = state == null ? null : state.positionOf(c.id());
            Symbol s = SymbolLibrary.placed(c, shown);
            symbols.add(s);
            byId.put(c.id(), s);
            tags.add(new Shape.Text(new Point(s.bounds().minX(), s.bounds().minY() - 0.8), c.tag(), TAG_SIZE, TextAnchor.START));
        }
        List<Shape> lines = new ArrayList<>();
        for (Line l : circuit.lines()) {
            lines.addAll(LineArt.line(route(circuit, byId, l), l.kind()));
        }
        List<Shape> dots = new ArrayList<>();
        for (Junction j : circuit.junctions()) {
            if (circuit.linesAt(j.id()).size() >= 3) {
                dots.add(LineArt.junctionDot(new Point(j.x(), j.y())));
            }
        }
        List<Shape.Text> notes = new ArrayList<>();
        for (Note n : circuit.notes()) {
            notes.add(new Shape.Text(new Point(n.x(), n.y()), n.text(), TAG_SIZE, TextAnchor.START));
        }
        return new CircuitDrawing(symbols, tags, lines, dots, notes);
    }

    /** The points a line runs through on the sheet: its start anchor, its bends, its end anchor. */
    public static List<Point> route(Circuit circuit, Map<String, Symbol> placed, Line l) {
        List<Point> pts = new ArrayList<>();
        pts.add(endpoint(circuit, placed, l.from(), l.id()));
        pts.addAll(l.bends());
        pts.add(endpoint(circuit, placed, l.to(), l.id()));
        return pts;
    }

    private static Point endpoint(Circuit circuit, Map<String, Symbol> placed, Endpoint e, String lineId) {
        if (e instanceof Endpoint.PortRef p) {
            Symbol s = placed.get(p.componentId());
            if (s == null) {
                throw new IllegalArgumentException("line " + lineId + " ends on missing component " + p.componentId());
            }
            return s.anchor(p.port()).orElseThrow(() -> new IllegalArgumentException(
                    "line " + lineId + " ends on " + p + ", a port the symbol does not have")).at();
        }
        Junction j = circuit.junction(e.ownerId()).orElseThrow(() -> new IllegalArgumentException(
                "line " + lineId + " ends on missing junction " + e.ownerId()));
        return new Point(j.x(), j.y());
    }

    /** Box holding everything drawn, grid units. */
    public Box bounds() {
        Box b = null;
        for (Symbol s : symbols) {
            b = b == null ? s.bounds() : b.union(s.bounds());
        }
        for (List<? extends Shape> list : List.of(tags, lines, dots, notes)) {
            for (Shape s : list) {
                b = b == null ? s.bounds() : b.union(s.bounds());
            }
        }
        return b == null ? new Box(0, 0, 10, 10) : b;
    }
}
