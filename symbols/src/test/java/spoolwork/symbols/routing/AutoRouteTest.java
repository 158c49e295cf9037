package spoolwork.symbols.routing;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;

import org.junit.jupiter.api.Test;

import spoolwork.model.Circuit;
import spoolwork.model.Component;
import spoolwork.model.ComponentType;
import spoolwork.model.Endpoint;
import spoolwork.model.Fluid;
import spoolwork.model.Junction;
import spoolwork.model.Line;
import spoolwork.model.LineKind;
import spoolwork.model.Point;
import spoolwork.model.TitleBlock;
import spoolwork.symbols.Anchor;
import spoolwork.symbols.CircuitDrawing;
import spoolwork.symbols.Shape;
import spoolwork.symbols.Symbol;
import spoolwork.symbols.SymbolLibrary;

class AutoRouteTest {

    private static Line line(String id, Endpoint a, Endpoint b, LineKind k, Point... bends) {
        return new Line(id, a, b, List.of(bends), 0.012, 1.0, k, false);
    }

    private static Anchor anchor(Component c, String port) {
        return SymbolLibrary.placed(c, null).anchor(port).orElseThrow();
    }

    /** Component of the type placed so that the named port's anchor lands on (x, y). */
    private static Component withPortAt(String id, String tag, ComponentType type, String port, double x, double y) {
        Anchor a = anchor(Component.of(id, tag, type, 0, 0), port);
        return Component.of(id, tag, type, x - a.at().x(), y - a.at().y());
    }

    /**
     * Pump outlet straight below the relief valve inlet, a filter standing on the straight run between them,
     * a reservoir off to the side and one line that already has bends.
     */
    static Circuit blocked() {
        Component p = Component.of("p", "P1", ComponentType.FIXED_PUMP, 10, 40);
        Point out = anchor(p, "P").at();
        Component v = withPortAt("v", "V1", ComponentType.RELIEF_VALVE, "P", out.x(), out.y() - 20);
        Component f = Component.of("f", "F1", ComponentType.FILTER, 0, 0);
        Point fc = SymbolLibrary.placed(f, null).bounds().centre();
        f = f.at(Math.round(out.x() - fc.x()), Math.round(out.y() - 10 - fc.y()));
        Component t = Component.of("t", "T1", ComponentType.RESERVOIR, 30, 46);
        Component t2 = Component.of("t2", "T2", ComponentType.RESERVOIR, 10, 50);
        Junction j = new Junction("j", 24, 30);
        return new Circuit(TitleBlock.empty(), Fluid.standard(), List.of(p, v, f, t, t2), List.of(j),
                List.of(line("l1", Endpoint.port("p", "P"), Endpoint.port("v", "P"), LineKind.PRESSURE),
                        line("l2", Endpoint.port("v", "T"), Endpoint.junction("j"), LineKind.RETURN),
                        line("l3", Endpoint.junction("j"), Endpoint.port("t", "T"), LineKind.RETURN),
                        line("l4", Endpoint.port("t2", "S"), Endpoint.port("p", "S"), LineKind.SUCTION,
                                new Point(anchor(t2, "S").at().x(), anchor(p, "S").at().y() + 3),
                                new Point(anchor(p, "S").at().x(), anchor(p, "S").at().y() + 3))),
                List.of(), List.of());
    }

    private static Map<String, Symbol> placed(Circuit c) {
        Map<String, Symbol> m = new java.util.HashMap<>();
        for (Component k : c.components()) {
            m.put(k.id(), SymbolLibrary.placed(k, null));
        }
        return m;
    }

    private static Point at(Circuit c, Endpoint e) {
        if (e instanceof Endpoint.PortRef p) {
            return anchor(c.component(p.componentId()).orElseThrow(), p.port()).at();
        }
        Junction j = c.junction(e.ownerId()).orElseThrow();
        return new Point(j.x(), j.y());
    }

    @Test
    void theStraightRunWouldPassThroughTheFilter() {
        Circuit c = blocked();
        Symbol filter = placed(c).get("f");
        Line l1 = c.line("l1").orElseThrow();
        assertTrue(Router.crosses(at(c, l1.from()), at(c, l1.to()), filter.bounds()),
                "the circuit must make a straight line wrong, or the next test shows nothing");
    }

    @Test
    void unbentLinesGetOrthogonalRoutesFromAnchorToAnchorClearOfEverySymbol() {
        Circuit c = blocked();
        Circuit routed = AutoRoute.routeUnbent(c);
        Map<String, Symbol> symbols = placed(c);
        for (Line l : routed.lines()) {
            List<Point> pts = Router.polyline(at(c, l.from()), l.bends(), at(c, l.to()));
            for (int i = 0; i + 1 < pts.size(); i++) {
                Point a = pts.get(i);
                Point b = pts.get(i + 1);
                assertTrue(Math.abs(a.x() - b.x()) < 1e-9 || Math.abs(a.y() - b.y()) < 1e-9,
                        l.id() + " segment " + a + " → " + b + " is not orthogonal");
                for (Map.Entry<String, Symbol> s : symbols.entrySet()) {
                    assertFalse(Router.crosses(a, b, s.getValue().bounds()),
                            l.id() + " segment " + a + " → " + b + " runs through " + s.getKey());
                }
            }
            for (boolean start : new boolean[] {true, false}) {
                Endpoint e = start ? l.from() : l.to();
                if (e instanceof Endpoint.PortRef p) {
                    Anchor an = anchor(c.component(p.componentId()).orElseThrow(), p.port());
                    Point next = start ? pts.get(1) : pts.get(pts.size() - 2);
                    double ahead = (next.x() - an.at().x()) * an.outward().dx() + (next.y() - an.at().y()) * an.outward().dy();
                    assertTrue(ahead > 0, l.id() + " leaves " + p + " backwards or sideways, towards " + next);
                }
            }
        }
        assertFalse(routed.line("l1").orElseThrow().bends().isEmpty(), "l1 bends round the filter");
    }

    @Test
    void linesWithBendsAndEverythingElseStayAsTheyWere() {
        Circuit c = blocked();
        Circuit routed = AutoRoute.routeUnbent(c);
        assertEquals(c.line("l4").orElseThrow(), routed.line("l4").orElseThrow());
        assertEquals(new ArrayList<>(c.components()), new ArrayList<>(routed.components()));
        assertEquals(new ArrayList<>(c.junctions()), new ArrayList<>(routed.junctions()));
        for (Line l : c.lines()) {
            Line r = routed.line(l.id()).orElseThrow();
            assertEquals(l.withBends(r.bends()), r, "only the bends of " + l.id() + " change");
        }
        assertEquals(routed, AutoRoute.routeUnbent(routed), "routing a routed circuit changes nothing");
    }

    @Test
    void theDrawingShowsTheSameRouteWithoutChangingTheDocument() {
        Circuit c = blocked();
        Circuit routed = AutoRoute.routeUnbent(c);
        CircuitDrawing drawn = CircuitDrawing.of(c, null);
        CircuitDrawing ofRouted = CircuitDrawing.of(routed, null);
        assertEquals(ofRouted.lines(), drawn.lines());
        Shape.Polyline l1 = (Shape.Polyline) drawn.lines().get(0);
        Line r1 = routed.line("l1").orElseThrow();
        assertEquals(Router.polyline(at(c, r1.from()), r1.bends(), at(c, r1.to())), l1.points());
        assertTrue(c.line("l1").orElseThrow().bends().isEmpty(), "drawing leaves the document alone");
    }

    @Test
    void aLineOnASymbolNotPlacedIsReportedByName() {
        Circuit c = blocked();
        Map<String, Symbol> some = placed(c);
        some.remove("v");
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> AutoRoute.unbentRoutes(c, some));
        assertTrue(e.getMessage().contains("l1") && e.getMessage().contains("missing component v"), e.getMessage());
    }

    @Test
    void aSlantingRunBetweenBendsIsDrawnSquareThroughTheSameBend() {
        Circuit c = blocked();
        Line l2 = c.line("l2").orElseThrow();
        Point bend = new Point(28, 12);
        Circuit slanting = c.withLine(l2.withBends(List.of(bend)));
        List<Point> r = AutoRoute.drawnRoutes(slanting, placed(slanting)).get("l2");
        assertEquals(at(c, l2.from()), r.get(0));
        assertEquals(at(c, l2.to()), r.get(r.size() - 1));
        assertTrue(r.contains(bend), "the user's bend stays on the route: " + r);
        for (int i = 0; i + 1 < r.size(); i++) {
            Point a = r.get(i);
            Point b = r.get(i + 1);
            assertTrue(Math.abs(a.x() - b.x()) < 1e-9 || Math.abs(a.y() - b.y()) < 1e-9, a + " → " + b + " slants");
        }
        assertEquals(List.of(bend), slanting.line("l2").orElseThrow().bends(), "the document keeps its bends");
    }
}
