package spoolwork.symbols;

/**
 * Check valves (ball and V seat) and flow valves (orifice, throttle, compensated flow control), drawn with
 * the flow left to right: A at (−3, 0), B at (3, 0).
 */
final class CheckSymbols {
    private static final double BALL = 0.55;

    private CheckSymbols() {
    }

    /**
     * A ball in its seat at (x, y), free flow in direction {@code free}: the seat's point faces upstream, so
     * flow that way lifts the ball off and flow the other way presses it in. Lines end at the seat apex
     * and at the far side of the ball, 1.0 either side of (x, y).
     */
    static void ballAndSeat(Draw d, double x, double y, Direction free) {
        double ux = free.dx();
        double uy = free.dy();
        double ax = x - ux * 1.0;
        double ay = y - uy * 1.0;
        double bx = x - ux * 0.22;
        double by = y - uy * 0.22;
        // Seat arms from the apex, each at 45° to the flow.
        double w = 0.95;
        d.line(ax - uy * w + ux * w, ay + ux * w + uy * w, ax, ay, ax + uy * w + ux * w, ay - ux * w + uy * w);
        d.circle(bx, by, BALL);
        d.line(bx + ux * BALL, by + uy * BALL, x + ux * 1.0, y + uy * 1.0);
    }

    static Draw check() {
        Draw d = new Draw();
        d.port("A", -1, 0, -3, 0, Direction.LEFT);
        ballAndSeat(d, 0, 0, Direction.RIGHT);
        d.port("B", 1, 0, 3, 0, Direction.RIGHT);
        return d;
    }

    /** Pilot-operated check: ball and seat in an envelope, the pilot X entering from below to lift the ball. */
    static Draw pilotCheck() {
        Draw d = new Draw();
        d.rect(-2, -2, 2, 2);
        d.port("A", -1, 0, -3, 0, Direction.LEFT);
        d.line(-2, 0, -1, 0);
        ballAndSeat(d, 0, 0, Direction.RIGHT);
        d.line(1, 0, 2, 0);
        d.port("B", 2, 0, 3, 0, Direction.RIGHT);
        d.stroke(Stroke.PILOT, 1, 3, 1, 2, 1, 1.2);
        d.fill(0.6, 0.6, 0.7, 1.2, 1.3, 1.2);
        d.anchor("X", 1, 3, Direction.DOWN);
        return d;
    }

    /** A restriction: two arcs pinching the line at (x, y), horizontal flow. */
    static void waist(Draw d, double x, double y) {
        d.arc(x, y - 1.3, 1.1, 35, 110);
        d.arc(x, y + 1.3, 1.1, 215, 110);
    }

    static Draw orifice() {
        Draw d = new Draw();
        d.port("A", 0, 0, -3, 0, Direction.LEFT);
        d.port("B", 0, 0, 3, 0, Direction.RIGHT);
        waist(d, 0, 0);
        return d;
    }

    static Draw throttle() {
        Draw d = orifice();
        d.variable(0, 0, 1.3);
        return d;
    }

    /**
     * Two-way flow control held constant by a compensator: the adjustable restriction in an envelope with the
     * compensator's small arrow across the flow upstream of it.
     */
    static Draw flowControl() {
        Draw d = new Draw();
        d.rect(-2, -2, 2, 2);
        d.port("A", -2, 0, -3, 0, Direction.LEFT);
        d.port("B", 2, 0, 3, 0, Direction.RIGHT);
        d.line(-2, 0, 2, 0);
        waist(d, 0.5, 0);
        d.variable(0.5, 0, 1.15);
        d.arrow(-1.2, -1.4, -1.2, -0.25);
        d.line(-1.55, -1.4, -0.85, -1.4);
        return d;
    }
}
