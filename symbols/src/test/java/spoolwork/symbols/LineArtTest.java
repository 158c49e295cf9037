package spoolwork.symbols;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.api.Test;

import spoolwork.model.LineKind;
import spoolwork.model.Point;

class LineArtTest {
    private static Point p(double x, double y) {
        return new Point(x, y);
    }

    @Test
    void crossingInTheMiddleOfBothLinesIsFound() {
        List<Point> h = List.of(p(0, 5), p(10, 5));
        List<Point> v = List.of(p(4, 0), p(4, 3), p(4, 9));
        assertEquals(List.of(p(4, 5)), LineArt.crossings(h, v));
    }

    @Test
    void aLineEndingOnAnotherIsNotACrossing() {
        List<Point> h = List.of(p(0, 5), p(10, 5));
        assertEquals(List.of(), LineArt.crossings(h, List.of(p(4, 0), p(4, 5))));
        assertEquals(List.of(), LineArt.crossings(h, List.of(p(2, 5), p(8, 5))), "collinear overlap is not a crossing");
    }

    @Test
    void strokesFollowTheLineKind() {
        List<Point> r = List.of(p(0, 0), p(5, 0), p(5, 5));
        assertEquals(Stroke.PILOT, ((Shape.Polyline) LineArt.line(r, LineKind.PILOT).get(0)).stroke());
        assertEquals(Stroke.DRAIN, ((Shape.Polyline) LineArt.line(r, LineKind.DRAIN).get(0)).stroke());
        assertEquals(Stroke.SOLID, ((Shape.Polyline) LineArt.line(r, LineKind.RETURN).get(0)).stroke());
        assertTrue(Stroke.PILOT.dashes()[0] > Stroke.DRAIN.dashes()[0], "pilot dashes are the long ones");
        assertThrows(IllegalArgumentException.class, () -> LineArt.line(List.of(p(0, 0)), LineKind.PRESSURE));
    }

    @Test
    void shaftIsTwoParallelLinesMitredAtTheBend() {
        List<Shape> s = LineArt.line(List.of(p(0, 0), p(5, 0), p(5, 5)), LineKind.SHAFT);
        assertEquals(2, s.size());
        List<Point> a = ((Shape.Polyline) s.get(0)).points();
        List<Point> b = ((Shape.Polyline) s.get(1)).points();
        assertEquals(2 * Draw.SHAFT_HALF, Math.abs(a.get(0).y() - b.get(0).y()), 1e-9);
        assertEquals(2 * Draw.SHAFT_HALF, Math.abs(a.get(1).x() - b.get(1).x()), 1e-9, "square corner keeps the gap");
        assertEquals(2 * Draw.SHAFT_HALF, Math.abs(a.get(1).y() - b.get(1).y()), 1e-9);
        assertEquals(2 * Draw.SHAFT_HALF, Math.abs(a.get(2).x() - b.get(2).x()), 1e-9);
    }

    @Test
    void enclosureIsAClosedDashDotOutline() {
        Shape.Polyline e = (Shape.Polyline) LineArt.enclosure(new Box(1, 2, 7, 5));
        assertTrue(e.closed());
        assertEquals(Stroke.ENCLOSURE, e.stroke());
        assertEquals(new Box(1, 2, 7, 5), e.bounds());
    }

    @Test
    void junctionDotIsFilled() {
        Shape.Circle c = (Shape.Circle) LineArt.junctionDot(p(3, 4));
        assertTrue(c.filled());
        assertEquals(p(3, 4), c.centre());
    }
}
