package spoolwork.symbols;

import spoolwork.model.LineKind;

/** How a line is drawn: working lines solid, pilot lines long-dashed, drain lines short-dashed. */
public enum Stroke {
    SOLID(new double[0]),
    /** Pilot (control) line: long dashes. */
    PILOT(new double[] {0.8, 0.3}),
    /** Drain or leakage line: short dashes. */
    DRAIN(new double[] {0.3, 0.25}),
    /** Outline of an assembly or of a filter element: dash-dot. */
    ENCLOSURE(new double[] {1.0, 0.25, 0.15, 0.25});

    private final double[] dashes;

    Stroke(double[] dashes) {
        this.dashes = dashes;
    }

    /** Dash and gap lengths in grid units, alternating; empty for a solid line. */
    public double[] dashes() {
        return dashes.clone();
    }

    /** The stroke for a circuit line of the given kind (a shaft is drawn as a double solid line). */
    public static Stroke of(LineKind kind) {
        switch (kind) {
            case PILOT:
                return PILOT;
            case DRAIN:
                return DRAIN;
            default:
                return SOLID;
        }
    }
}
