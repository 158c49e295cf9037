package spoolwork.symbols;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeSet;
import java.util.stream.Stream;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

import spoolwork.model.Component;
import spoolwork.model.ComponentType;
import spoolwork.model.Point;
import spoolwork.model.PortSpec;
import spoolwork.model.SpoolPosition;

class SymbolLibraryTest {

    /** Every type, every combination of its options, and for directional valves every shown position. */
    static Stream<Arguments> everySymbol() {
        List<Arguments> out = new ArrayList<>();
        for (ComponentType t : ComponentType.values()) {
            for (Map<String, String> v : SymbolLibrary.variants(t)) {
                if (t.isDirectionalValve()) {
                    for (SpoolPosition p : t.spoolPositions(v)) {
                        out.add(Arguments.of(t, v, p.name()));
                    }
                } else {
                    out.add(Arguments.of(t, v, null));
                }
            }
        }
        return out.stream();
    }

    @Test
    void variantsCoverEveryOptionChoice() {
        assertEquals(24, SymbolLibrary.variants(ComponentType.DIRECTIONAL_4_3).size(), "4 centres × 3 actuations × 2 returns");
        assertEquals(2, SymbolLibrary.variants(ComponentType.HYDRAULIC_MOTOR).size());
        assertEquals(1, SymbolLibrary.variants(ComponentType.RELIEF_VALVE).size());
        for (ComponentType t : ComponentType.values()) {
            for (var o : t.options().values()) {
                Set<String> seen = new HashSet<>();
                SymbolLibrary.variants(t).forEach(v -> seen.add(v.get(o.key())));
                assertEquals(new HashSet<>(o.choices()), seen, t.key() + " " + o.key());
            }
        }
    }

    @ParameterizedTest(name = "{0} {1} @{2}")
    @MethodSource("everySymbol")
    void everyPortHasExactlyOneAnchorOnTheOutlineOnAGridPoint(ComponentType t, Map<String, String> v, String shown) {
        Symbol s = SymbolLibrary.symbolFor(t, v, shown);
        assertFalse(s.shapes().isEmpty());
        List<String> ports = t.ports().stream().map(PortSpec::name).toList();
        assertEquals(ports, s.anchors().stream().map(Anchor::port).toList(), "one anchor per port, in port order");
        Box b = s.bounds();
        for (Anchor a : s.anchors()) {
            Point p = a.at();
            String where = s.key() + " port " + a.port() + " at " + p;
            assertEquals(Math.rint(p.x()), p.x(), 0, where + " x off the grid");
            assertEquals(Math.rint(p.y()), p.y(), 0, where + " y off the grid");
            double edge;
            double coord;
            switch (a.outward()) {
                case LEFT: edge = b.minX(); coord = p.x(); break;
                case RIGHT: edge = b.maxX(); coord = p.x(); break;
                case UP: edge = b.minY(); coord = p.y(); break;
                default: edge = b.maxY(); coord = p.y();
            }
            assertEquals(edge, coord, 1e-9, where + " not on the " + a.outward() + " edge of " + b);
            assertTrue(lineEndsAt(s, p, a.outward()), where + ": no line of the symbol reaches the anchor from inside");
        }
        assertTrue(s.hitAreas().stream().anyMatch(h -> h.contains(b.centre())), s.key() + " hit area misses its middle");
    }

    /** Some stroked segment ends at the anchor and runs back into the symbol against the outward direction. */
    static boolean lineEndsAt(Symbol s, Point p, Direction out) {
        for (Shape sh : s.shapes()) {
            if (sh instanceof Shape.Polyline pl) {
                List<Point> pts = pl.points();
                for (int i = 0; i < pts.size(); i++) {
                    Point q = pts.get(i);
                    boolean shaftSide = Math.abs(q.x() - p.x()) <= Draw.SHAFT_HALF + 1e-9 && Math.abs(q.y() - p.y()) <= Draw.SHAFT_HALF + 1e-9;
                    if (!shaftSide) {
                        continue;
                    }
                    for (int j : new int[] {i - 1, i + 1}) {
                        if (j >= 0 && j < pts.size()) {
                            Point r = pts.get(j);
                            double dot = (r.x() - q.x()) * out.dx() + (r.y() - q.y()) * out.dy();
                            if (dot < 0) {
                                return true;
                            }
                        }
                    }
                }
            }
        }
        return false;
    }

    @ParameterizedTest(name = "{0} {1}")
    @MethodSource("everySymbol")
    void shiftingTheSpoolKeepsThePortsWhereTheyAre(ComponentType t, Map<String, String> v, String shown) {
        Symbol rest = SymbolLibrary.symbolFor(t, v, SpoolPosition.REST);
        Symbol s = SymbolLibrary.symbolFor(t, v, shown);
        assertEquals(rest.anchors(), s.anchors());
    }

    @Test
    void theShownEnvelopeIsTheOneAtThePorts() {
        ComponentType t = ComponentType.DIRECTIONAL_4_3;
        Map<String, String> v = Map.of("centre", "tandem");
        // Arrow tips inside the envelope that meets the ports (x from −2 to 2) name where flow arrives.
        assertEquals(Set.of("A", "T"), arrowTipsAtPorts(SymbolLibrary.symbolFor(t, v, "a")), "a: P→A, B→T");
        assertEquals(Set.of("T"), arrowTipsAtPorts(SymbolLibrary.symbolFor(t, v, "0")), "tandem: P→T");
        assertEquals(Set.of("B", "T"), arrowTipsAtPorts(SymbolLibrary.symbolFor(t, v, "b")), "b: P→B, A→T");
        Symbol a = SymbolLibrary.symbolFor(t, v, "a");
        Symbol b = SymbolLibrary.symbolFor(t, v, "b");
        assertEquals(8, a.bounds().minX() - b.bounds().minX(), 1e-9, "the row slides two envelopes between a and b");
        assertEquals(Set.of(), arrowTipsAtPorts(SymbolLibrary.symbolFor(t, Map.of("centre", "closed"), "0")));
    }

    private static Set<String> arrowTipsAtPorts(Symbol s) {
        Map<String, Point> ports = DirectionalValveSymbols.portPositions(ComponentType.DIRECTIONAL_4_3);
        Set<String> out = new TreeSet<>();
        for (Shape sh : s.shapes()) {
            if (sh instanceof Shape.Polygon pg && pg.filled()) {
                Point tip = pg.points().get(0);
                ports.forEach((name, p) -> {
                    if (Math.hypot(tip.x() - p.x(), tip.y() - p.y()) < 1e-9) {
                        out.add(name);
                    }
                });
            }
        }
        return out;
    }

    @Test
    void variantsLookDifferent() {
        Symbol spring = SymbolLibrary.symbolFor(ComponentType.SINGLE_ACTING_CYLINDER, Map.of("return", "spring"), null);
        Symbol load = SymbolLibrary.symbolFor(ComponentType.SINGLE_ACTING_CYLINDER, Map.of("return", "load"), null);
        assertNotEquals(spring.shapes(), load.shapes());
        Set<List<Shape>> drawings = new HashSet<>();
        for (Map<String, String> v : SymbolLibrary.variants(ComponentType.DIRECTIONAL_4_3)) {
            drawings.add(SymbolLibrary.symbolFor(ComponentType.DIRECTIONAL_4_3, v, null).shapes());
        }
        assertEquals(24, drawings.size(), "every 4/3 variant has its own drawing");
    }

    @Test
    void pumpTriangleSitsOnTheOutletPointingOutMotorTrianglesPointIn() {
        Symbol pump = SymbolLibrary.symbolFor(ComponentType.FIXED_PUMP, Map.of(), null);
        List<Shape.Polygon> tris = pump.shapes().stream().filter(s -> s instanceof Shape.Polygon p && p.filled()
                && p.bounds().maxY() < 0 && Math.hypot(p.bounds().centre().x(), p.bounds().centre().y()) < 2)
                .map(s -> (Shape.Polygon) s).toList();
        assertEquals(1, tris.size(), "one energy triangle at the outlet P (top)");
        assertEquals(-2, tris.get(0).points().get(0).y(), 1e-9, "apex on the circle, pointing up and out");
        Symbol motor2 = SymbolLibrary.symbolFor(ComponentType.HYDRAULIC_MOTOR, Map.of("directions", "two"), null);
        Symbol motor1 = SymbolLibrary.symbolFor(ComponentType.HYDRAULIC_MOTOR, Map.of("directions", "one"), null);
        assertEquals(2, countEnergyTriangles(motor2));
        assertEquals(1, countEnergyTriangles(motor1));
    }

    private static long countEnergyTriangles(Symbol s) {
        return s.shapes().stream().filter(x -> x instanceof Shape.Polygon p && p.filled()
                && Math.hypot(p.bounds().centre().x(), p.bounds().centre().y()) < 2).count();
    }

    @Test
    void componentOverloadsAgreeWithTheTypeOverload() {
        Component c = Component.of("c1", "V1", ComponentType.DIRECTIONAL_4_3, 10, 20).withOption("centre", "float");
        assertEquals(SymbolLibrary.symbolFor(ComponentType.DIRECTIONAL_4_3, Map.of("centre", "float"), "0"), SymbolLibrary.symbolFor(c));
        Symbol placed = SymbolLibrary.placed(c, "b");
        assertEquals(new Point(9, 23), placed.anchor("P").orElseThrow().at());
    }

    @Test
    void anchorNearSnapsToTheClosestPortWithinTolerance() {
        Symbol s = SymbolLibrary.symbolFor(ComponentType.DIRECTIONAL_4_3, Map.of(), null);
        assertEquals("T", s.anchorNear(new Point(1.3, 2.8), 0.5).orElseThrow().port());
        assertEquals("P", s.anchorNear(new Point(-0.8, 3.1), 0.5).orElseThrow().port());
        assertTrue(s.anchorNear(new Point(0, 3), 0.5).isEmpty(), "half way between P and T is one unit from each");
    }

    @Test
    void badOptionsAndPositionsAreRefusedByName() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> SymbolLibrary.symbolFor(ComponentType.DIRECTIONAL_4_3, Map.of("centre", "semi"), null));
        assertTrue(e.getMessage().contains("centre") && e.getMessage().contains("semi"), e.getMessage());
        e = assertThrows(IllegalArgumentException.class,
                () -> SymbolLibrary.symbolFor(ComponentType.RELIEF_VALVE, Map.of("colour", "red"), null));
        assertTrue(e.getMessage().contains("relief_valve") && e.getMessage().contains("colour"), e.getMessage());
        e = assertThrows(IllegalArgumentException.class,
                () -> SymbolLibrary.symbolFor(ComponentType.DIRECTIONAL_4_2, Map.of(), "b"));
        assertTrue(e.getMessage().contains("'b'"), e.getMessage());
    }
}
