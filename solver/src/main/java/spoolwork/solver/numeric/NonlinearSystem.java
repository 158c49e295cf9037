package spoolwork.solver.numeric;

/**
 * A square system F(x) = 0 with an analytic Jacobian, in physical units. Scales say what size a unit
 * of each unknown and of each row has, so that Newton can work on numbers near one.
 */
public interface NonlinearSystem {
    int size();

    /** Evaluates F(x) into f (overwritten); adds Jacobian entries into j when j is not null. */
    void evaluate(double[] x, double[] f, Jacobian j);

    /** Typical magnitude of unknown i, in its own unit. */
    double unknownScale(int i);

    /** Tolerance of row i in its own unit: the row is satisfied when |F[i]| is at most this. */
    double rowTolerance(int i);

    /** Typical magnitude of row i, in its own unit, used to weigh rows against each other. */
    double rowScale(int i);

    /** True when unknown i is a pressure, whose Newton steps are limited. */
    boolean isPressure(int i);

    /**
     * True when unknown i may be eliminated before the sparse factorisation: its row holds only itself and
     * unknowns that are never eliminated, its column appears only in such rows, and its own derivative
     * never vanishes (a branch flow with a strictly increasing drop law).
     */
    default boolean eliminable(int i) {
        return false;
    }

    /** True when row i is a complementarity row, whose Jacobian row changes with its side. */
    default boolean switchesSides(int i) {
        return false;
    }

    /** Called at the start of every Newton run: complementarity rows choose their sides afresh. */
    default void beginRun() {
    }

    /**
     * The values the rows take in the Newton step's right-hand side, into out: F itself, except for a
     * complementarity row, where it is the side in force (F there is the min of both sides).
     */
    default void stepResiduals(double[] f, double[] out) {
        System.arraycopy(f, 0, out, 0, f.length);
    }

    /**
     * Given a Newton step dx from the last evaluated point, changes the side of every complementarity row
     * whose other side the step would drive negative (the primal–dual active-set rule), or of only the
     * worst such row, and returns how many rows wanted to change; the Jacobian must then be evaluated again.
     */
    default int switchSides(double[] dx, boolean onlyWorst) {
        return 0;
    }

    /**
     * Rewrites, in j, the Jacobian rows of the complementarity rows for the sides now in force, at the
     * point last evaluated into j; returns false when it cannot (then evaluate again).
     */
    default boolean restampSides(Jacobian.Kept j) {
        return false;
    }

    /** Puts back the sides as they were before the last {@link #switchSides}. */
    default void undoSwitch() {
    }
}
