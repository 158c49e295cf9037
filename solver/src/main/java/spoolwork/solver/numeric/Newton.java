package spoolwork.solver.numeric;

/**
 * Semismooth Newton's method on a scaled system. Each step solves the linearised complementarity problem
 * (the sides of the complementarity rows are settled by an active-set loop inside the step); absurd
 * pressure changes are capped; then a non-monotone Armijo test on ½‖W·F‖² (W the inverse row scales) with a
 * watchdog: a full step that raises the merit is taken up to {@link #MAX_RELAXED} times in a row, and if no
 * better point comes of it Newton goes back to the best point and backtracks from there. Converged means
 * every row within its tolerance and a small Newton step, or every row within tolerance and no further
 * descent possible. Never returns a non-finite iterate: a step that gives NaN is backtracked like any other.
 */
public final class Newton {
    /** Outcome of one Newton run. */
    public record Result(double[] x, boolean converged, int iterations, String failure, int worstRow) {
    }

    private static final double PRESSURE_STEP_FLOOR = 20e5;
    private static final double STEP_TOLERANCE = 1e-6;
    private static final boolean TRACE = Boolean.getBoolean("spoolwork.solver.trace");

    private final LinearMethod method;
    private final int maxIterations;

    public Newton(LinearMethod method, int maxIterations) {
        this.method = method;
        this.maxIterations = maxIterations;
    }

    /** Runs from x0 (not modified) until converged, out of iterations or past deadlineNanos (System.nanoTime). */
    public Result solve(NonlinearSystem s, double[] x0, long deadlineNanos) {
        int n = s.size();
        double[] x = x0.clone();
        double[] f = new double[n];
        double[] xt = new double[n];
        double[] ft = new double[n];
        // work arrays of the steps: the step in unknowns' units, and the right-hand side
        double[] dir = new double[n];
        double[] rhs = new double[n];
        double[] rowScale = rowScales(s);
        double[] colScale = unknownScales(s);
        LinearStep lin = new LinearStep(n, method, s);
        s.beginRun();
        s.evaluate(x, f, lin);
        if (!finite(f)) {
            return new Result(x0.clone(), false, 0, "residual not finite at the start", worst(s, f));
        }
        double merit = merit(f, rowScale);
        double[] history = new double[4];
        // watchdog: a full step may raise the merit for a few iterations (a valve opening, a load breaking
        // away moves every pressure at once); if no new best comes of it, go back to the best point and search
        double[] best = x.clone();
        double bestMerit = merit;
        int relaxed = 0;
        boolean searchOnly = false;
        for (int it = 0; it < maxIterations; it++) {
            if (System.nanoTime() > deadlineNanos) {
                return new Result(x, false, it, "time limit reached", worst(s, f));
            }
            double[] y = activeSetStep(s, x, f, lin, rowScale, colScale, dir, rhs);
            if (y == null) {
                if (within(s, f)) {
                    return new Result(x, true, it, null, -1);
                }
                return new Result(x, false, it, "singular Jacobian", worst(s, f));
            }
            double stepNorm = 0;
            for (int i = 0; i < n; i++) {
                stepNorm = Math.max(stepNorm, Math.abs(y[i]));
                double dx = y[i] * colScale[i];
                if (s.isPressure(i)) {
                    // cap absurd pressure changes on their own (a node that only a leak holds); ordinary steps
                    // are left whole, so that they still solve the linearised complementarity problem
                    double limit = Math.max(Math.max(PRESSURE_STEP_FLOOR, 10 * colScale[i]), 0.5 * Math.abs(x[i]));
                    dx = Math.max(-limit, Math.min(limit, dx));
                }
                dir[i] = dx;
            }
            boolean small = within(s, f);
            if (small && stepNorm <= STEP_TOLERANCE) {
                return new Result(polish(s, x, f, y, colScale, rowScale), true, it + 1, null, -1);
            }
            history[it % history.length] = merit;
            double reference = 0;
            for (double h : history) {
                reference = Math.max(reference, h);
            }
            boolean accepted = false;
            double alpha = 1;
            for (int ls = 0; ls < 40; ls++) {
                for (int i = 0; i < n; i++) {
                    xt[i] = x[i] + alpha * dir[i];
                }
                s.evaluate(xt, ft, lin.spare());
                if (finite(ft)) {
                    double mt = merit(ft, rowScale);
                    // non-monotone Armijo test against the worst of the last few merits (Grippo et al. 1986)
                    if (mt <= reference - 1e-4 * alpha * 2 * merit || (mt == 0 && merit == 0)) {
                        accepted = true;
                        merit = mt;
                        break;
                    }
                    if (ls == 0 && !searchOnly && relaxed < MAX_RELAXED) {
                        relaxed++;
                        accepted = true;
                        merit = mt;
                        break;
                    }
                }
                if (ls == 0 && relaxed > 0 && !searchOnly) {
                    // the relaxed steps led nowhere: back to the best point, and search from there
                    break;
                }
                alpha *= 0.5;
            }
            if (!accepted && relaxed > 0 && !searchOnly) {
                System.arraycopy(best, 0, x, 0, n);
                lin.clear();
                s.evaluate(x, f, lin);
                merit = bestMerit;
                java.util.Arrays.fill(history, 0);
                relaxed = 0;
                searchOnly = true;
                continue;
            }
            if (!accepted && small) {
                return new Result(x, true, it, null, -1);
            }
            if (!accepted) {
                return new Result(x, false, it + 1, "no descent along the Newton step", worst(s, f));
            }
            if (TRACE) {
                System.err.printf("it %d alpha %.3g step %.3g merit %.3g relaxed %d%n", it, alpha, stepNorm, merit,
                        relaxed);
            }
            // the accepted trial already holds F and the Jacobian at the new iterate
            System.arraycopy(xt, 0, x, 0, n);
            double[] swap = f;
            f = ft;
            ft = swap;
            lin.acceptSpare();
            if (merit < (1 - 1e-4) * bestMerit) {
                System.arraycopy(x, 0, best, 0, n);
                bestMerit = merit;
                relaxed = 0;
                searchOnly = false;
            }
            if (within(s, f) && alpha * stepNorm <= CLOSE_STEP) {
                if (within(s, f, POLISHED) && alpha * stepNorm <= STEP_TOLERANCE) {
                    // already far inside the tolerance: one more step would change only round-off
                    return new Result(x, true, it + 1, null, -1);
                }
                // the next step by the last factorisation: from this close it is as good as a new one; when it
                // is small too, it is the polishing step and Newton is done without factorising again
                double[] last = lin.canSolveAgain() ? lin.solveAgain(negScaled(s, f, rowScale, rhs)) : null;
                if (last != null && maxAbs(last) <= STEP_TOLERANCE) {
                    return new Result(polish(s, x, f, last, colScale, rowScale), true, it + 2, null, -1);
                }
                if (alpha * stepNorm <= STEP_TOLERANCE) {
                    last = lin.solve(negScaled(s, f, rowScale, rhs), rowScale, colScale);
                    return new Result(last == null ? x : polish(s, x, f, last, colScale, rowScale), true, it + 2,
                            null, -1);
                }
            }
        }
        if (within(s, f)) {
            return new Result(x, true, maxIterations, null, -1);
        }
        return new Result(x, false, maxIterations, "iteration limit reached", worst(s, f));
    }

    /** Typical size of every row of s. */
    static double[] rowScales(NonlinearSystem s) {
        double[] r = new double[s.size()];
        for (int i = 0; i < r.length; i++) {
            r[i] = s.rowScale(i);
        }
        return r;
    }

    /** Typical size of every unknown of s. */
    static double[] unknownScales(NonlinearSystem s) {
        double[] c = new double[s.size()];
        for (int i = 0; i < c.length; i++) {
            c[i] = s.unknownScale(i);
        }
        return c;
    }

    /** Right-hand side of the scaled Newton step: −F/rowScale, complementarity rows on their side in force. */
    static double[] negScaled(NonlinearSystem s, double[] f, double[] rowScale) {
        return negScaled(s, f, rowScale, new double[f.length]);
    }

    /** The same, written into r (returned). */
    static double[] negScaled(NonlinearSystem s, double[] f, double[] rowScale, double[] r) {
        s.stepResiduals(f, r);
        for (int i = 0; i < f.length; i++) {
            r[i] = -r[i] / rowScale[i];
        }
        return r;
    }

    /** Most rounds of side changes within one Newton step. */
    static final int MAX_SIDE_ROUNDS = 8;
    /** Rounds in which every wrong side changes at once; later rounds change only the worst one. */
    static final int BULK_ROUNDS = 3;
    /** Most full steps in a row that may raise the merit before going back to the best point. */
    static final int MAX_RELAXED = 6;
    /**
     * Largest scaled step after which, with every row within its tolerance, the next step is tried with the
     * last factorisation to see whether Newton is done.
     */
    static final double CLOSE_STEP = 1e-3;

    /**
     * The Newton step of the linearised complementarity problem at x: solve with the sides in force, let the
     * system move every row whose other side the step would make negative, evaluate the Jacobian again and
     * repeat until no side changes (or {@link #MAX_SIDE_ROUNDS}). A closed valve thus opens within the step
     * that raises its inlet past the setting, instead of the step overshooting and being cut back.
     * Returns the scaled step, or null when the matrix is singular; dx and rhs are work arrays of length n.
     */
    private static double[] activeSetStep(NonlinearSystem s, double[] x, double[] f, LinearStep lin,
                                          double[] rowScale, double[] colScale, double[] dx, double[] rhs) {
        int n = x.length;
        double[] last = null;
        boolean onlyWorst = false;
        for (int round = 0; ; round++) {
            double[] y = lin.solve(negScaled(s, f, rowScale, rhs), rowScale, colScale);
            if (y == null) {
                if (last == null) {
                    return null;
                }
                // the sides just chosen make the matrix singular (say a relief opening while a load breaks
                // away on the same node): go back, and change only the worst row from there
                s.undoSwitch();
                restamp(s, x, f, lin);
                if (onlyWorst) {
                    return last;
                }
                onlyWorst = true;
                y = last;
            } else {
                last = y;
            }
            if (round == MAX_SIDE_ROUNDS) {
                return y;
            }
            for (int i = 0; i < n; i++) {
                dx[i] = y[i] * colScale[i];
            }
            // after a few rounds of changing every wrong side at once, change one at a time: rows that
            // depend on each other (a flow control feeding a stuck cylinder) can otherwise swap for ever
            if (round >= BULK_ROUNDS) {
                onlyWorst = true;
            }
            if (s.switchSides(dx, onlyWorst) == 0) {
                return y;
            }
            restamp(s, x, f, lin);
        }
    }

    /** Puts the Jacobian rows of the sides now in force into lin: in place when the system can, else anew. */
    private static void restamp(NonlinearSystem s, double[] x, double[] f, LinearStep lin) {
        if (!s.restampSides(lin)) {
            lin.clear();
            s.evaluate(x, f, lin);
        }
    }

    /**
     * One last full Newton step from a converged point: it costs one evaluation and takes the residuals from
     * the tolerance to round-off, so that balances computed from the result (power) hold far tighter than
     * the tolerance. Kept only if it does not make any row worse than its tolerance.
     */
    private static double[] polish(NonlinearSystem s, double[] x, double[] f, double[] y, double[] colScale,
                                   double[] rowScale) {
        int n = x.length;
        double[] xt = new double[n];
        for (int i = 0; i < n; i++) {
            xt[i] = x[i] + y[i] * colScale[i];
        }
        double[] ft = new double[n];
        s.evaluate(xt, ft, null);
        if (finite(ft) && within(s, ft) && merit(ft, rowScale) <= merit(f, rowScale)) {
            return xt;
        }
        return x;
    }

    private static double maxAbs(double[] v) {
        double m = 0;
        for (double d : v) {
            m = Math.max(m, Math.abs(d));
        }
        return m;
    }

    private static double merit(double[] f, double[] scale) {
        double m = 0;
        for (int i = 0; i < f.length; i++) {
            double r = f[i] / scale[i];
            m += r * r;
        }
        return 0.5 * m;
    }

    /** True when every row is within its tolerance. */
    public static boolean within(NonlinearSystem s, double[] f) {
        return within(s, f, 1);
    }

    /** True when every row is within the given fraction of its tolerance. */
    static boolean within(NonlinearSystem s, double[] f, double fraction) {
        for (int i = 0; i < f.length; i++) {
            if (!(Math.abs(f[i]) <= fraction * s.rowTolerance(i))) {
                return false;
            }
        }
        return true;
    }

    /**
     * Fraction of the tolerance below which a converged point is not polished: its rows are then at
     * 1e-12 of the circuit's flow and pressure, so balances computed from it hold to about that already.
     */
    static final double POLISHED = 1e-3;

    private static int worst(NonlinearSystem s, double[] f) {
        int w = -1;
        double worst = 0;
        for (int i = 0; i < f.length; i++) {
            double r = Math.abs(f[i]) / s.rowTolerance(i);
            if (!(r <= worst)) {
                worst = Double.isNaN(r) ? Double.POSITIVE_INFINITY : r;
                w = i;
            }
        }
        return w;
    }

    private static boolean finite(double[] v) {
        for (double d : v) {
            if (!Double.isFinite(d)) {
                return false;
            }
        }
        return true;
    }
}
