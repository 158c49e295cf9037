package spoolwork.symbols;

import java.util.ArrayList;
import java.util.List;

import spoolwork.model.LineKind;
import spoolwork.model.Point;

/**
 * Circuit lines between symbols: working lines solid, pilot and drain lines dashed, a shaft as a double
 * line; a filled dot where lines are joined. Lines that only cross carry no dot — on an ISO 1219 drawing
 * that is what says "not connected" — and {@link #crossings} finds those places so that nothing is joined
 * there by mistake.
 */
public final class LineArt {
    /** Radius of a junction dot, grid units. */
    public static final double DOT_RADIUS = 0.2;

    private LineArt() {
    }

    /** The shapes of a line of the given kind along a route of at least two points (grid units). */
    public static List<Shape> line(List<Point> route, LineKind kind) {
        if (route.size() < 2) {
            throw new IllegalArgumentException("a line needs at least two points, got " + route.size());
        }
        if (kind == LineKind.SHAFT) {
            return List.of(new Shape.Polyline(offset(route, Draw.SHAFT_HALF), false, Stroke.SOLID),
                    new Shape.Polyline(offset(route, -Draw.SHAFT_HALF), false, Stroke.SOLID));
        }
        return List.of(new Shape.Polyline(route, false, Stroke.of(kind)));
    }

    /** The dash-dot outline drawn round an assembly (a manifold block, a combined unit), grid units. */
    public static Shape enclosure(Box around) {
        return new Shape.Polyline(List.of(new Point(around.minX(), around.minY()), new Point(around.maxX(), around.minY()),
                new Point(around.maxX(), around.maxY()), new Point(around.minX(), around.maxY())), true, Stroke.ENCLOSURE);
    }

    /** The connection dot drawn where three or more lines are joined. */
    public static Shape junctionDot(Point at) {
        return new Shape.Circle(at, DOT_RADIUS, true, Stroke.SOLID);
    }

    /**
     * Points where two routes cross each other in the middle of segments of both: a crossing without a
     * connection. Touching at an end point (a line ending on another) is not a crossing; collinear overlaps
     * are not reported either.
     */
    public static List<Point> crossings(List<Point> a, List<Point> b) {
        List<Point> out = new ArrayList<>();
        for (int i = 0; i + 1 < a.size(); i++) {
            for (int j = 0; j + 1 < b.size(); j++) {
                Point p = properIntersection(a.get(i), a.get(i + 1), b.get(j), b.get(j + 1));
                if (p != null) {
                    out.add(p);
                }
            }
        }
        return out;
    }

    private static Point properIntersection(Point p1, Point p2, Point q1, Point q2) {
        double rx = p2.x() - p1.x();
        double ry = p2.y() - p1.y();
        double sx = q2.x() - q1.x();
        double sy = q2.y() - q1.y();
        double den = rx * sy - ry * sx;
        if (Math.abs(den) < 1e-12) {
            return null;
        }
        double qpx = q1.x() - p1.x();
        double qpy = q1.y() - p1.y();
        double t = (qpx * sy - qpy * sx) / den;
        double u = (qpx * ry - qpy * rx) / den;
        double eps = 1e-9;
        if (t <= eps || t >= 1 - eps || u <= eps || u >= 1 - eps) {
            return null;
        }
        return new Point(p1.x() + t * rx, p1.y() + t * ry);
    }

    /** The route moved sideways by d (left of the direction of travel positive), mitred at the bends. */
    static List<Point> offset(List<Point> route, double d) {
        List<Point> out = new ArrayList<>();
        for (int i = 0; i < route.size(); i++) {
            double[] nPrev = i > 0 ? normal(route.get(i - 1), route.get(i)) : null;
            double[] nNext = i + 1 < route.size() ? normal(route.get(i), route.get(i + 1)) : null;
            double nx;
            double ny;
            if (nPrev == null) {
                nx = nNext[0];
                ny = nNext[1];
            } else if (nNext == null) {
                nx = nPrev[0];
                ny = nPrev[1];
            } else {
                double k = 1 + nPrev[0] * nNext[0] + nPrev[1] * nNext[1];
                if (k < 1e-6) {
                    nx = nNext[0];
                    ny = nNext[1];
                } else {
                    nx = (nPrev[0] + nNext[0]) / k;
                    ny = (nPrev[1] + nNext[1]) / k;
                }
            }
            Point p = route.get(i);
            out.add(new Point(p.x() + nx * d, p.y() + ny * d));
        }
        return out;
    }

    private static double[] normal(Point a, Point b) {
        double dx = b.x() - a.x();
        double dy = b.y() - a.y();
        double n = Math.hypot(dx, dy);
        if (n == 0) {
            return new double[] {0, 0};
        }
        return new double[] {dy / n, -dx / n};
    }
}
