package spoolwork.symbols;

/** Cylinders, the reservoir, accumulator, filter, cooler, gauge, flow meter and plug. */
final class ConditioningSymbols {
    private ConditioningSymbols() {
    }

    /** Bore from x = −5 to 5, y = −1.5 to 1.5; ports A (cap end) and B (rod end) leave downwards. */
    static Draw doubleActing() {
        Draw d = new Draw();
        d.rect(-5, -1.5, 5, 1.5);
        piston(d, -2);
        rod(d, -2, 8);
        d.port("A", -4, 1.5, -4, 3, Direction.DOWN);
        d.port("B", 4, 1.5, 4, 3, Direction.DOWN);
        return d;
    }

    static Draw doubleRod() {
        Draw d = new Draw();
        d.rect(-5, -1.5, 5, 1.5);
        piston(d, 0);
        rod(d, -8, 8);
        d.port("A", -4, 1.5, -4, 3, Direction.DOWN);
        d.port("B", 4, 1.5, 4, 3, Direction.DOWN);
        return d;
    }

    /** Single-acting: one port at the cap end; the rod end breathes, with the return spring inside when spring-returned. */
    static Draw singleActing(java.util.Map<String, String> options) {
        Draw d = new Draw();
        d.rect(-5, -1.5, 5, 1.5);
        piston(d, -2);
        rod(d, -2, 8);
        if (!"load".equals(options.get("return"))) {
            d.spring(-1.75, -0.95, 5, -0.95, 0.4, 8);
        }
        d.port("A", -4, 1.5, -4, 3, Direction.DOWN);
        return d;
    }

    private static void piston(Draw d, double x) {
        d.rect(x - 0.25, -1.5, x + 0.25, 1.5);
    }

    /** A rod as a double line from x0 to x1 (through the piston), ending in a cross line outside the bore. */
    private static void rod(Draw d, double x0, double x1) {
        double h = 0.4;
        double a = x0 < -5 ? x0 : x0 + 0.25;
        double b = x1 > 5 ? x1 : x1 - 0.25;
        d.line(a, -h, b, -h);
        d.line(a, h, b, h);
        if (x1 > 5) {
            d.line(x1, -h, x1, h);
        }
        if (x0 < -5) {
            d.line(x0, -h, x0, h);
        }
    }

    /** Open-top tank: both lines enter from above and end below the fluid surface. */
    static Draw reservoir() {
        Draw d = new Draw();
        d.line(-2.5, -1, -2.5, 1, 2.5, 1, 2.5, -1);
        d.port("S", -1, 0.4, -1, -2, Direction.UP);
        d.port("T", 1, 0.4, 1, -2, Direction.UP);
        return d;
    }

    /** Upright capsule with the separator across, gas above (hollow triangle of gas energy). */
    static Draw accumulator() {
        Draw d = new Draw();
        d.arc(0, -1, 1.5, 180, 180);
        d.arc(0, 0.5, 1.5, 0, 180);
        d.line(-1.5, -1, -1.5, 0.5);
        d.line(1.5, -1, 1.5, 0.5);
        d.line(-1.5, -0.25, 1.5, -0.25);
        d.hollow(0, -0.6, -0.45, -1.35, 0.45, -1.35);
        d.port("P", 0, 2, 0, 3, Direction.DOWN);
        return d;
    }

    private static void diamond(Draw d) {
        d.closed(-2, 0, 0, -2, 2, 0, 0, 2);
    }

    /** Diamond with the element as a dashed line across the flow; the bypass check above it, A to B. */
    static Draw filter() {
        Draw d = new Draw();
        diamond(d);
        d.stroke(Stroke.PILOT, 0, -2, 0, 2);
        d.port("A", -2, 0, -4, 0, Direction.LEFT);
        d.port("B", 2, 0, 4, 0, Direction.RIGHT);
        d.line(-3, 0, -3, -3, -1, -3);
        d.line(1.6, -3, 3, -3, 3, 0);
        CheckSymbols.ballAndSeat(d, 0, -3, Direction.RIGHT);
        d.spring(0.33, -3, 1.6, -3, 0.3, 4);
        d.dot(-3, 0, 0.15);
        d.dot(3, 0, 0.15);
        return d;
    }

    /** Diamond with the coolant line across the flow and arrows out of it: heat leaving. */
    static Draw cooler() {
        Draw d = new Draw();
        diamond(d);
        d.line(0, -2, 0, 2);
        d.arrow(0, -2, 0, -3);
        d.arrow(0, 2, 0, 3);
        d.port("A", -2, 0, -3, 0, Direction.LEFT);
        d.port("B", 2, 0, 3, 0, Direction.RIGHT);
        return d;
    }

    static Draw gauge() {
        Draw d = new Draw();
        d.circle(0, -1, 1.5);
        d.arrow(-1.06, 0.06, 1.06, -2.06);
        d.port("P", 0, 0.5, 0, 2, Direction.DOWN);
        return d;
    }

    static Draw flowMeter() {
        Draw d = new Draw();
        d.circle(0, 0, 1.5);
        d.arrow(-1.1, 0, 1.1, 0);
        d.port("A", -1.5, 0, -3, 0, Direction.LEFT);
        d.port("B", 1.5, 0, 3, 0, Direction.RIGHT);
        return d;
    }

    static Draw plug() {
        Draw d = new Draw();
        d.port("A", 0, 0, 0, 1, Direction.DOWN);
        d.line(-0.7, 0, 0.7, 0);
        return d;
    }
}
