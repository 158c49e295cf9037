package spoolwork.symbols;

import java.util.ArrayList;
import java.util.List;

import spoolwork.model.Point;
import spoolwork.symbols.Shape.Arc;
import spoolwork.symbols.Shape.Circle;
import spoolwork.symbols.Shape.Polygon;
import spoolwork.symbols.Shape.Polyline;
import spoolwork.symbols.Shape.Text;
import spoolwork.symbols.Shape.TextAnchor;

/** Collects the shapes and anchors of one symbol; the recurring ISO 1219 elements live here once. */
final class Draw {
    /** Length of an arrow head, grid units. */
    static final double HEAD = 0.6;
    /** Half width of an arrow head, grid units. */
    static final double HEAD_HALF = 0.27;
    /** Half the gap between the two lines of a shaft, grid units. */
    static final double SHAFT_HALF = 0.15;

    private final List<Shape> shapes = new ArrayList<>();
    private final List<Anchor> anchors = new ArrayList<>();

    static Point p(double x, double y) {
        return new Point(x, y);
    }

    private static List<Point> pts(double... xy) {
        if (xy.length % 2 != 0 || xy.length < 4) {
            throw new IllegalArgumentException("need pairs of coordinates");
        }
        List<Point> out = new ArrayList<>();
        for (int i = 0; i < xy.length; i += 2) {
            out.add(p(xy[i], xy[i + 1]));
        }
        return out;
    }

    Draw line(double... xy) {
        return stroke(Stroke.SOLID, xy);
    }

    Draw stroke(Stroke s, double... xy) {
        shapes.add(new Polyline(pts(xy), false, s));
        return this;
    }

    Draw closed(double... xy) {
        shapes.add(new Polyline(pts(xy), true, Stroke.SOLID));
        return this;
    }

    Draw rect(double x0, double y0, double x1, double y1) {
        return closed(x0, y0, x1, y0, x1, y1, x0, y1);
    }

    Draw fill(double... xy) {
        shapes.add(new Polygon(pts(xy), true));
        return this;
    }

    Draw hollow(double... xy) {
        shapes.add(new Polygon(pts(xy), false));
        return this;
    }

    Draw circle(double cx, double cy, double r) {
        shapes.add(new Circle(p(cx, cy), r, false, Stroke.SOLID));
        return this;
    }

    Draw dot(double cx, double cy, double r) {
        shapes.add(new Circle(p(cx, cy), r, true, Stroke.SOLID));
        return this;
    }

    Draw arc(double cx, double cy, double r, double startDeg, double sweepDeg) {
        shapes.add(new Arc(p(cx, cy), r, startDeg, sweepDeg, Stroke.SOLID));
        return this;
    }

    Draw text(double x, double y, String s, double size) {
        shapes.add(new Text(p(x, y), s, size, TextAnchor.MIDDLE));
        return this;
    }

    /** A filled arrow head with its tip at (tx, ty), pointing away from (fx, fy). */
    Draw head(double tx, double ty, double fx, double fy) {
        return head(tx, ty, fx, fy, HEAD, HEAD_HALF);
    }

    Draw head(double tx, double ty, double fx, double fy, double len, double half) {
        double dx = tx - fx;
        double dy = ty - fy;
        double n = Math.hypot(dx, dy);
        dx /= n;
        dy /= n;
        double bx = tx - dx * len;
        double by = ty - dy * len;
        return fill(tx, ty, bx - dy * half, by + dx * half, bx + dy * half, by - dx * half);
    }

    /** A solid line with a filled head at its end: a flow path or a variability arrow. */
    Draw arrow(double x0, double y0, double x1, double y1) {
        double dx = x1 - x0;
        double dy = y1 - y0;
        double n = Math.hypot(dx, dy);
        // Stop the shaft inside the head so the tip stays sharp.
        double sx = x1 - dx / n * HEAD * 0.8;
        double sy = y1 - dy / n * HEAD * 0.8;
        line(x0, y0, sx, sy);
        return head(x1, y1, x0, y0);
    }

    /** The long slanted arrow of variability (adjustable), centred on (cx, cy), lower left to upper right. */
    Draw variable(double cx, double cy, double half) {
        return arrow(cx - half, cy + half, cx + half, cy - half);
    }

    /**
     * A spring from (x0, y0) to (x1, y1): a zigzag of {@code peaks} points with short straight ends, and
     * amplitude {@code amp} either side of the axis.
     */
    Draw spring(double x0, double y0, double x1, double y1, double amp, int peaks) {
        double dx = x1 - x0;
        double dy = y1 - y0;
        double n = Math.hypot(dx, dy);
        double ux = dx / n;
        double uy = dy / n;
        double end = Math.min(0.2, n * 0.1);
        double step = (n - 2 * end) / peaks;
        List<Point> pts = new ArrayList<>();
        pts.add(p(x0, y0));
        pts.add(p(x0 + ux * end, y0 + uy * end));
        for (int i = 0; i < peaks; i++) {
            double t = end + step * (i + 0.5);
            double s = (i % 2 == 0) ? amp : -amp;
            pts.add(p(x0 + ux * t - uy * s, y0 + uy * t + ux * s));
        }
        pts.add(p(x1 - ux * end, y1 - uy * end));
        pts.add(p(x1, y1));
        shapes.add(new Polyline(pts, false, Stroke.SOLID));
        return this;
    }

    /** A blocked port inside an envelope: a short line in from the edge ending in a cross-bar (a "T"). */
    Draw tee(double x, double edgeY, double inward) {
        double endY = edgeY + inward;
        line(x, edgeY, x, endY);
        return line(x - 0.4, endY, x + 0.4, endY);
    }

    /** A port: a working line from the body at (bx, by) to the anchor at (ax, ay). */
    Draw port(String name, double bx, double by, double ax, double ay, Direction out) {
        return port(name, bx, by, ax, ay, out, Stroke.SOLID);
    }

    Draw port(String name, double bx, double by, double ax, double ay, Direction out, Stroke s) {
        if (bx != ax || by != ay) {
            stroke(s, bx, by, ax, ay);
        }
        return anchor(name, ax, ay, out);
    }

    /** A shaft: two parallel lines from the body edge to the anchor, along x or y. */
    Draw shaft(double bx, double by, double ax, double ay, Direction out) {
        double ox = out.dy() * SHAFT_HALF;
        double oy = out.dx() * SHAFT_HALF;
        line(bx + ox, by + oy, ax + ox, ay + oy);
        line(bx - ox, by - oy, ax - ox, ay - oy);
        return anchor(spoolwork.model.PortSpec.SHAFT, ax, ay, out);
    }

    Draw anchor(String name, double x, double y, Direction out) {
        if (x != Math.rint(x) || y != Math.rint(y)) {
            throw new IllegalStateException("anchor " + name + " off the grid: " + x + ", " + y);
        }
        anchors.add(new Anchor(name, p(x, y), out));
        return this;
    }

    Symbol build(String key) {
        Box b = null;
        for (Shape s : shapes) {
            b = b == null ? s.bounds() : b.union(s.bounds());
        }
        if (b == null) {
            throw new IllegalStateException(key + " draws nothing");
        }
        // The whole drawing picks the symbol: its parts are close together and stubs are short.
        return new Symbol(key, shapes, anchors, b, List.of(b));
    }
}
