package spoolwork.symbols.routing;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;

import spoolwork.model.Circuit;
import spoolwork.model.Component;
import spoolwork.model.Endpoint;
import spoolwork.model.Junction;
import spoolwork.model.Line;
import spoolwork.model.Point;
import spoolwork.symbols.Anchor;
import spoolwork.symbols.Box;
import spoolwork.symbols.Symbol;
import spoolwork.symbols.SymbolLibrary;

/**
 * Orthogonal routes for the lines of a circuit that have no bends, so that a circuit written by code or
 * read from a file without bends draws with square corners instead of diagonals. A port's line leaves in
 * its anchor's outward direction; a junction's line leaves in any direction. Every symbol outline is an
 * obstacle, and each line keeps off the runs of the lines already routed, bent ones first. Lines are
 * routed in the circuit's line order, so the result does not depend on anything but the circuit.
 * All coordinates are sheet grid units.
 */
public final class AutoRoute {
    private AutoRoute() {
    }

    /**
     * The circuit with every line that has no bends given the bends of an orthogonal route; lines that have
     * bends are left exactly as they are, and nothing else changes. A line whose two ends already lie on one
     * straight run in the exit direction keeps no bends.
     *
     * @throws IllegalArgumentException when a line ends on a missing component, port or junction
     */
    public static Circuit routeUnbent(Circuit circuit) {
        Map<String, List<Point>> routes = unbentRoutes(circuit, placed(circuit));
        Circuit out = circuit;
        for (Line l : circuit.lines()) {
            List<Point> r = routes.get(l.id());
            if (r != null && r.size() > 2) {
                out = out.withLine(l.withBends(r.subList(1, r.size() - 1)));
            }
        }
        return out;
    }

    /**
     * The drawn routes of the lines that have no bends, keyed by line id in line order: each route runs from
     * the start anchor through its new bends to the end anchor (at least two points). The document is not
     * changed.
     *
     * @param placed the circuit's symbols as placed on the sheet, keyed by component id
     * @throws IllegalArgumentException when a line ends on a missing component, port or junction
     */
    public static Map<String, List<Point>> unbentRoutes(Circuit circuit, Map<String, Symbol> placed) {
        Objects.requireNonNull(circuit);
        List<Box> obstacles = new ArrayList<>();
        for (Symbol s : placed.values()) {
            obstacles.add(s.bounds());
        }
        List<List<Point>> drawn = new ArrayList<>();
        for (Line l : circuit.lines()) {
            if (!l.bends().isEmpty()) {
                drawn.add(Router.polyline(end(circuit, placed, l.from(), l).at(), l.bends(), end(circuit, placed, l.to(), l).at()));
            }
        }
        Map<String, List<Point>> out = new LinkedHashMap<>();
        for (Line l : circuit.lines()) {
            if (!l.bends().isEmpty()) {
                continue;
            }
            Router.End a = end(circuit, placed, l.from(), l);
            Router.End b = end(circuit, placed, l.to(), l);
            List<Point> route = Router.polyline(a.at(), Router.route(a, b, obstacles, drawn), b.at());
            out.put(l.id(), List.copyOf(route));
            drawn.add(route);
        }
        return out;
    }

    /**
     * The drawn route of every line, keyed by line id in line order, from start anchor to end anchor: a line
     * without bends along the route of {@link #unbentRoutes}; a line with bends through its bends, with any
     * slanting run between two of them replaced by an orthogonal route between the same two points; other
     * lines exactly as stored. The document is not changed.
     *
     * @param placed the circuit's symbols as placed on the sheet, keyed by component id
     * @throws IllegalArgumentException when a line ends on a missing component, port or junction
     */
    public static Map<String, List<Point>> drawnRoutes(Circuit circuit, Map<String, Symbol> placed) {
        Map<String, List<Point>> unbent = unbentRoutes(circuit, placed);
        List<Box> obstacles = new ArrayList<>();
        for (Symbol s : placed.values()) {
            obstacles.add(s.bounds());
        }
        List<List<Point>> drawn = new ArrayList<>(unbent.values());
        Map<String, List<Point>> out = new LinkedHashMap<>();
        for (Line l : circuit.lines()) {
            List<Point> r = unbent.get(l.id());
            if (r == null) {
                Router.End a = end(circuit, placed, l.from(), l);
                Router.End b = end(circuit, placed, l.to(), l);
                List<Point> stored = Router.polyline(a.at(), l.bends(), b.at());
                r = new ArrayList<>();
                r.add(stored.get(0));
                boolean squared = false;
                for (int i = 0; i + 1 < stored.size(); i++) {
                    Point p = stored.get(i);
                    Point q = stored.get(i + 1);
                    if (Math.abs(p.x() - q.x()) > 1e-9 && Math.abs(p.y() - q.y()) > 1e-9) {
                        Router.End from = i == 0 ? a : new Router.End(p, null);
                        Router.End to = i + 2 == stored.size() ? b : new Router.End(q, null);
                        r.addAll(Router.route(from, to, obstacles, drawn));
                        squared = true;
                    }
                    r.add(q);
                }
                r = List.copyOf(squared ? Router.simplify(r) : r);
                drawn.add(r);
            }
            out.put(l.id(), r);
        }
        return out;
    }

    /** The circuit's symbols at rest, placed on the sheet, keyed by component id. */
    private static Map<String, Symbol> placed(Circuit circuit) {
        Map<String, Symbol> m = new HashMap<>();
        for (Component c : circuit.components()) {
            m.put(c.id(), SymbolLibrary.placed(c, null));
        }
        return m;
    }

    private static Router.End end(Circuit circuit, Map<String, Symbol> placed, Endpoint e, Line l) {
        if (e instanceof Endpoint.PortRef p) {
            Symbol s = placed.get(p.componentId());
            if (s == null) {
                throw new IllegalArgumentException("line " + l.id() + " ends on missing component " + p.componentId());
            }
            Anchor a = s.anchor(p.port()).orElseThrow(() -> new IllegalArgumentException(
                    "line " + l.id() + " ends on " + p + ", a port the symbol does not have"));
            return new Router.End(a.at(), new Point(a.outward().dx(), a.outward().dy()));
        }
        Junction j = circuit.junction(e.ownerId()).orElseThrow(() -> new IllegalArgumentException(
                "line " + l.id() + " ends on missing junction " + e.ownerId()));
        return new Router.End(new Point(j.x(), j.y()), null);
    }
}
