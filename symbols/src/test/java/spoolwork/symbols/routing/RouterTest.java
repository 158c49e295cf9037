package spoolwork.symbols.routing;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.api.Test;

import spoolwork.model.Point;
import spoolwork.symbols.Box;

class RouterTest {
    private static final Point DOWN = new Point(0, 1);
    private static final Point UP = new Point(0, -1);

    private static void assertOrthogonalAndClear(List<Point> pts, List<Box> boxes) {
        for (int i = 0; i + 1 < pts.size(); i++) {
            Point a = pts.get(i);
            Point b = pts.get(i + 1);
            assertTrue(Math.abs(a.x() - b.x()) < 1e-9 || Math.abs(a.y() - b.y()) < 1e-9, a + " → " + b + " slants");
            for (Box box : boxes) {
                assertFalse(Router.crosses(a, b, box), a + " → " + b + " runs through " + box);
            }
        }
    }

    @Test
    void facingPortsInLineNeedNoBends() {
        assertEquals(List.of(), Router.route(new Router.End(new Point(0, 0), DOWN), new Router.End(new Point(0, 10), UP), List.of()));
    }

    @Test
    void aBoxOnTheStraightRunIsGoneRound() {
        Box block = new Box(-2, 4, 2, 6);
        Router.End from = new Router.End(new Point(0, 0), DOWN);
        Router.End to = new Router.End(new Point(0, 10), UP);
        List<Point> pts = Router.polyline(from.at(), Router.route(from, to, List.of(block)), to.at());
        assertOrthogonalAndClear(pts, List.of(block));
        assertTrue(pts.get(1).x() == 0 && pts.get(1).y() > 0, "leaves its port straight down first: " + pts);
        assertTrue(pts.get(pts.size() - 2).x() == 0 && pts.get(pts.size() - 2).y() < 10, "arrives from above: " + pts);
    }

    @Test
    void aLineKeepsOffTheRunOfAnotherWhenItCan() {
        Router.End from = new Router.End(new Point(0, 0), DOWN);
        Router.End to = new Router.End(new Point(0, 10), UP);
        List<Point> other = List.of(new Point(0, -2), new Point(0, 12));
        List<Point> pts = Router.polyline(from.at(), Router.route(from, to, List.of(), List.of(other)), to.at());
        assertOrthogonalAndClear(pts, List.of());
        assertTrue(pts.stream().anyMatch(p -> p.x() != 0), "the route steps aside: " + pts);
    }

    @Test
    void simplifyDropsRepeatsAndMidpointsButKeepsReversals() {
        List<Point> in = List.of(new Point(0, 0), new Point(0, 0), new Point(0, 2), new Point(0, 4), new Point(3, 4),
                new Point(1, 4));
        assertEquals(List.of(new Point(0, 0), new Point(0, 4), new Point(3, 4), new Point(1, 4)), Router.simplify(in));
    }
}
