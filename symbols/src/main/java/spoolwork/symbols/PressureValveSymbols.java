package spoolwork.symbols;

/**
 * Pressure valves: one 4 × 4 envelope about the origin, inlet at the bottom (0, 3) and outlet at the top
 * (0, −3). The spring (adjustable, with the slanted arrow) pushes from the right; the sensing pilot line
 * pushes from the left. A normally closed valve (relief, sequence) has its arrow offset one unit towards
 * the pilot, so the pilot has to push it across to the ports; a normally open reducing valve has it in
 * line with them.
 */
final class PressureValveSymbols {
    private PressureValveSymbols() {
    }

    static Draw relief() {
        Draw d = frame();
        d.arrow(-1, 1.6, -1, -1.6);
        d.port("P", 0, 2, 0, 3, Direction.DOWN);
        d.port("T", 0, -2, 0, -3, Direction.UP);
        pilotFrom(d, 2.5);
        return d;
    }

    static Draw reducing() {
        Draw d = frame();
        d.arrow(0, 2, 0, -2);
        d.port("P", 0, 2, 0, 3, Direction.DOWN);
        d.port("A", 0, -2, 0, -3, Direction.UP);
        pilotFrom(d, -2.5);
        springDrain(d);
        return d;
    }

    static Draw sequence() {
        Draw d = frame();
        d.arrow(-1, 1.6, -1, -1.6);
        d.port("P", 0, 2, 0, 3, Direction.DOWN);
        d.port("A", 0, -2, 0, -3, Direction.UP);
        pilotFrom(d, 2.5);
        springDrain(d);
        return d;
    }

    /**
     * Counterbalance valve: load side A at the top, valve side B at the bottom. The main element opens A to B
     * on load pressure (internal pilot from A) helped by the external pilot X; the check beside it gives
     * free flow B to A.
     */
    static Draw counterbalance() {
        Draw d = frame();
        d.arrow(-1, -1.6, -1, 1.6);
        d.port("A", 0, -2, 0, -4, Direction.UP);
        d.port("B", 0, 2, 0, 4, Direction.DOWN);
        d.stroke(Stroke.PILOT, 0, -3, -3, -3, -3, -0.8, -2.6, -0.8);
        d.fill(-2, -0.8, -2.6, -1.1, -2.6, -0.5);
        d.stroke(Stroke.PILOT, -4, 1, -2.6, 1);
        d.fill(-2, 1, -2.6, 0.7, -2.6, 1.3);
        d.anchor("X", -4, 1, Direction.LEFT);
        // Free-flow check B to A, beside the spring.
        d.line(0, -3, 6, -3, 6, -1);
        d.line(0, 3, 6, 3, 6, 1);
        CheckSymbols.ballAndSeat(d, 6, 0, Direction.UP);
        d.dot(0, -3, 0.15);
        d.dot(0, 3, 0.15);
        return d;
    }

    private static Draw frame() {
        Draw d = new Draw();
        d.rect(-2, -2, 2, 2);
        d.spring(2, 0, 4, 0, 0.45, 5);
        d.variable(3, 0, 0.9);
        return d;
    }

    /** The sensing pilot: from the port line at height y round the left side into the envelope. */
    private static void pilotFrom(Draw d, double y) {
        d.stroke(Stroke.PILOT, 0, y, -3, y, -3, 0, -2.6, 0);
        d.fill(-2, 0, -2.6, -0.3, -2.6, 0.3);
        d.dot(0, y, 0.15);
    }

    /** External drain of the spring chamber, short dashes down to Y. */
    private static void springDrain(Draw d) {
        d.stroke(Stroke.DRAIN, 3, 0.45, 3, 3);
        d.anchor("Y", 3, 3, Direction.DOWN);
    }
}
