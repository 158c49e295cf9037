package spoolwork.symbols;

import java.util.ArrayList;
import java.util.List;
import java.util.Objects;

import spoolwork.model.Point;

/** A drawing primitive of a symbol, in grid units. Strokes are all one weight; fills are solid black. */
public sealed interface Shape {

    /** The shape after a placement transform; text keeps upright. */
    Shape transformed(Transform t);

    /** Smallest box holding the shape, grid units (text approximated by its advance and height). */
    Box bounds();

    /** Straight segments through the points; closed joins the last point back to the first. */
    record Polyline(List<Point> points, boolean closed, Stroke stroke) implements Shape {
        public Polyline {
            points = List.copyOf(points);
            if (points.size() < 2) {
                throw new IllegalArgumentException("a polyline needs two points");
            }
            Objects.requireNonNull(stroke);
        }

        @Override
        public Polyline transformed(Transform t) {
            return new Polyline(map(points, t), closed, stroke);
        }

        @Override
        public Box bounds() {
            return boundsOf(points);
        }
    }

    /** A closed area, filled black (energy triangles, arrow heads) or outlined only (hollow triangle). */
    record Polygon(List<Point> points, boolean filled) implements Shape {
        public Polygon {
            points = List.copyOf(points);
            if (points.size() < 3) {
                throw new IllegalArgumentException("a polygon needs three points");
            }
        }

        @Override
        public Polygon transformed(Transform t) {
            return new Polygon(map(points, t), filled);
        }

        @Override
        public Box bounds() {
            return boundsOf(points);
        }
    }

    /** A circle; filled for a junction dot. */
    record Circle(Point centre, double radius, boolean filled, Stroke stroke) implements Shape {
        public Circle {
            Objects.requireNonNull(centre);
            Objects.requireNonNull(stroke);
            if (!(radius > 0)) {
                throw new IllegalArgumentException("radius must be positive");
            }
        }

        @Override
        public Circle transformed(Transform t) {
            return new Circle(t.apply(centre), radius, filled, stroke);
        }

        @Override
        public Box bounds() {
            return new Box(centre.x() - radius, centre.y() - radius, centre.x() + radius, centre.y() + radius);
        }
    }

    /**
     * A circular arc from angle {@code startDeg} sweeping {@code sweepDeg} (positive = clockwise on the
     * sheet), degrees. Toolkits that count angles counter-clockwise on a y-down screen (JavaFX {@code Arc})
     * take start −startDeg and length −sweepDeg.
     */
    record Arc(Point centre, double radius, double startDeg, double sweepDeg, Stroke stroke) implements Shape {
        public Arc {
            Objects.requireNonNull(centre);
            Objects.requireNonNull(stroke);
            if (!(radius > 0) || sweepDeg == 0 || Math.abs(sweepDeg) >= 360) {
                throw new IllegalArgumentException("bad arc radius " + radius + " sweep " + sweepDeg);
            }
        }

        public Point start() {
            return pointAt(startDeg);
        }

        public Point end() {
            return pointAt(startDeg + sweepDeg);
        }

        Point pointAt(double deg) {
            double a = Math.toRadians(deg);
            return new Point(centre.x() + radius * Math.cos(a), centre.y() + radius * Math.sin(a));
        }

        @Override
        public Arc transformed(Transform t) {
            return new Arc(t.apply(centre), radius, t.applyAngle(startDeg), t.sweepSign() * sweepDeg, stroke);
        }

        @Override
        public Box bounds() {
            List<Point> pts = new ArrayList<>();
            int steps = 24;
            for (int i = 0; i <= steps; i++) {
                pts.add(pointAt(startDeg + sweepDeg * i / steps));
            }
            return boundsOf(pts);
        }
    }

    /** Horizontal alignment of text about its reference point. */
    enum TextAnchor { START, MIDDLE, END }

    /**
     * Upright text. The reference point is on the text's vertical middle; {@code anchor} says whether it is
     * the start, middle or end of the line.
     *
     * @param size cap height of the letters, grid units
     */
    record Text(Point at, String text, double size, TextAnchor anchor) implements Shape {
        public Text {
            Objects.requireNonNull(at);
            Objects.requireNonNull(text);
            Objects.requireNonNull(anchor);
        }

        @Override
        public Text transformed(Transform t) {
            return new Text(t.apply(at), text, size, anchor);
        }

        @Override
        public Box bounds() {
            double w = 0.75 * size * text.length();
            double x0 = anchor == TextAnchor.START ? at.x() : anchor == TextAnchor.MIDDLE ? at.x() - w / 2 : at.x() - w;
            return new Box(x0, at.y() - size / 2, x0 + w, at.y() + size / 2);
        }
    }

    private static List<Point> map(List<Point> pts, Transform t) {
        List<Point> out = new ArrayList<>(pts.size());
        for (Point p : pts) {
            out.add(t.apply(p));
        }
        return out;
    }

    private static Box boundsOf(List<Point> pts) {
        double x0 = Double.POSITIVE_INFINITY;
        double y0 = Double.POSITIVE_INFINITY;
        double x1 = Double.NEGATIVE_INFINITY;
        double y1 = Double.NEGATIVE_INFINITY;
        for (Point p : pts) {
            x0 = Math.min(x0, p.x());
            y0 = Math.min(y0, p.y());
            x1 = Math.max(x1, p.x());
            y1 = Math.max(y1, p.y());
        }
        return new Box(x0, y0, x1, y1);
    }
}
