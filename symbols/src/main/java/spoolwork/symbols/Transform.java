package spoolwork.symbols;

import spoolwork.model.Component;
import spoolwork.model.Point;

/**
 * Places a symbol on the sheet: first mirrored about its vertical axis (x → −x) when asked, then rotated
 * clockwise (as seen on the sheet, y down) by a multiple of 90° about its origin, then moved by (dx, dy)
 * grid units. This is the order in which {@link Component} states its rotation and mirroring.
 */
public record Transform(int rotation, boolean mirrored, double dx, double dy) {
    public static final Transform IDENTITY = new Transform(0, false, 0, 0);

    public Transform {
        if (rotation % 90 != 0) {
            throw new IllegalArgumentException("rotation must be a multiple of 90°: " + rotation);
        }
        rotation = ((rotation % 360) + 360) % 360;
    }

    /** The transform that puts a component's symbol where the component is drawn. */
    public static Transform of(Component c) {
        return new Transform(c.rotation(), c.mirrored(), c.x(), c.y());
    }

    public static Transform translation(double dx, double dy) {
        return new Transform(0, false, dx, dy);
    }

    public Point apply(Point p) {
        double x = mirrored ? -p.x() : p.x();
        double y = p.y();
        double rx;
        double ry;
        switch (rotation) {
            case 90:
                rx = -y;
                ry = x;
                break;
            case 180:
                rx = -x;
                ry = -y;
                break;
            case 270:
                rx = y;
                ry = -x;
                break;
            default:
                rx = x;
                ry = y;
        }
        return new Point(rx + dx + 0.0, ry + dy + 0.0);
    }

    /** Maps a direction (rotation and mirror only; translation does not move directions). */
    public Direction apply(Direction d) {
        Point o = new Transform(rotation, mirrored, 0, 0).apply(new Point(d.dx(), d.dy()));
        return Direction.of(o.x(), o.y());
    }

    /** Maps an angle in degrees (clockwise on the sheet from +x) to the placed angle, 0 ≤ result &lt; 360. */
    public double applyAngle(double degrees) {
        double a = mirrored ? 180 - degrees : degrees;
        a += rotation;
        return ((a % 360) + 360) % 360;
    }

    /** Sign by which a sweep angle changes: mirroring reverses the sense of arcs. */
    public double sweepSign() {
        return mirrored ? -1 : 1;
    }

    /** The sheet point back in symbol coordinates, for hit testing. */
    public Point inverse(Point sheet) {
        double x = sheet.x() - dx;
        double y = sheet.y() - dy;
        double rx;
        double ry;
        switch (rotation) {
            case 90:
                rx = y;
                ry = -x;
                break;
            case 180:
                rx = -x;
                ry = -y;
                break;
            case 270:
                rx = -y;
                ry = x;
                break;
            default:
                rx = x;
                ry = y;
        }
        return new Point(mirrored ? -rx : rx, ry);
    }

    /** This transform followed by {@code next}. */
    public Transform then(Transform next) {
        // Mirror-then-rotate composed with mirror-then-rotate: a mirror after a rotation R equals a rotation −R after a mirror.
        int rot = next.mirrored ? (next.rotation - rotation) : (next.rotation + rotation);
        boolean mir = mirrored ^ next.mirrored;
        Point o = next.apply(new Point(dx, dy));
        return new Transform(rot, mir, o.x(), o.y());
    }
}
