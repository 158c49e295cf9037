package spoolwork.symbols;

import java.util.Map;

/**
 * Pumps, motors and prime movers: a circle of radius 2 about the origin. Energy triangles sit at the
 * circle on the hydraulic ports (pointing out on a pump's outlet, in on a motor's ports); the shaft leaves
 * as a double line with the curved arrow of rotation across it.
 */
final class RotatingSymbols {
    private static final double R = 2;
    /** Size of an energy triangle: length along its axis and half its base, grid units. */
    private static final double TRI = 0.9;
    private static final double TRI_HALF = 0.5;

    private RotatingSymbols() {
    }

    static Draw fixedPump() {
        Draw d = body();
        outTriangle(d);
        d.port("P", 0, -R, 0, -3, Direction.UP);
        d.port("S", 0, R, 0, 3, Direction.DOWN);
        shaftLeft(d, false);
        return d;
    }

    static Draw compensatedPump() {
        Draw d = body();
        outTriangle(d);
        d.variable(0, 0, 1.9);
        // The outlet is one unit longer than on the fixed pump to leave room for the pilot branch and the letter.
        d.port("P", 0, -R, 0, -4, Direction.UP);
        d.port("S", 0, R, 0, 3, Direction.DOWN);
        // Compensator on the right: outlet pressure through a pilot line against an adjustable spring.
        d.stroke(Stroke.PILOT, 0, -3, 3.4, -3, 3.4, -0.8, 2.75, -0.8);
        d.head(1.85, -0.8, 3.4, -0.8, 0.9, 0.3);
        d.spring(1.85, 0.8, 3.9, 0.8, 0.35, 5);
        d.line(3.9, 0.3, 3.9, 1.3);
        d.variable(2.9, 0.8, 0.75);
        d.dot(0, -3, 0.15);
        // Case drain, short dashes, down to L.
        d.stroke(Stroke.DRAIN, -Math.sqrt(3), 1, -2, 1, -2, 3);
        d.anchor("L", -2, 3, Direction.DOWN);
        shaftLeft(d, false);
        return d;
    }

    static Draw motor(Map<String, String> options) {
        boolean two = !"one".equals(options.get("directions"));
        Draw d = body();
        inTriangle(d, -1);
        if (two) {
            inTriangle(d, 1);
        }
        d.port("A", 0, -R, 0, -3, Direction.UP);
        d.port("B", 0, R, 0, 3, Direction.DOWN);
        shaftRight(d, two);
        return d;
    }

    static Draw primeMover(Map<String, String> options) {
        Draw d = new Draw();
        if ("engine".equals(options.get("kind"))) {
            // A combustion engine: a box carrying the M, to tell it apart from the electric motor's circle.
            d.rect(-2, -2, 2, 2);
            d.text(0, 0, "M", 1.6);
        } else {
            d.circle(0, 0, R);
            d.text(0, 0, "M", 1.6);
        }
        // No rotation arrow here: the pump it drives carries the one arrow of the coupled shaft.
        d.shaft(R, 0, 4, 0, Direction.RIGHT);
        return d;
    }

    private static Draw body() {
        return new Draw().circle(0, 0, R);
    }

    /** Outlet triangle of a pump: apex on the circle at the top, pointing out. */
    private static void outTriangle(Draw d) {
        d.fill(0, -R, -TRI_HALF, -R + TRI, TRI_HALF, -R + TRI);
    }

    /** Inlet triangle of a motor at the top (side −1) or bottom (+1): base on the circle, pointing in. */
    private static void inTriangle(Draw d, int side) {
        double base = side * Math.sqrt(R * R - TRI_HALF * TRI_HALF);
        d.fill(-TRI_HALF, base, TRI_HALF, base, 0, base - side * TRI);
    }

    private static void shaftLeft(Draw d, boolean both) {
        d.shaft(-R, 0, -4, 0, Direction.LEFT);
        rotationArrow(d, 180, both);
    }

    private static void shaftRight(Draw d, boolean both) {
        d.shaft(R, 0, 4, 0, Direction.RIGHT);
        rotationArrow(d, 0, both);
    }

    /** The curved arrow round the shaft, centred on the shaft's angle; heads at both ends for two directions. */
    private static void rotationArrow(Draw d, double atDeg, boolean both) {
        double r = 2.9;
        double half = 32;
        d.arc(0, 0, r, atDeg - half, 2 * half);
        headOnArc(d, r, atDeg + half, +1);
        if (both) {
            headOnArc(d, r, atDeg - half, -1);
        }
    }

    private static void headOnArc(Draw d, double r, double deg, int sense) {
        double a = Math.toRadians(deg);
        double tx = r * Math.cos(a);
        double ty = r * Math.sin(a);
        // Tangent in the sense of travel along the arc.
        double ux = -Math.sin(a) * sense;
        double uy = Math.cos(a) * sense;
        d.head(tx + ux * 0.25, ty + uy * 0.25, tx - ux, ty - uy, 0.55, 0.25);
    }
}
