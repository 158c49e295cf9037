package spoolwork.solver.numeric;

/**
 * Damped Newton's method on a scaled system: pressure steps limited to max(20 bar, half the pressure),
 * then Armijo backtracking on ½‖W·F‖² with W the inverse row scales. Converged means every row within its
 * tolerance and a small Newton step, or every row within tolerance and no further descent possible.
 * Never returns a non-finite iterate: a step that gives NaN is backtracked like any other bad step.
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
        double[] rowScale = new double[n];
        double[] colScale = new double[n];
        for (int i = 0; i < n; i++) {
            rowScale[i] = s.rowScale(i);
            colScale[i] = s.unknownScale(i);
        }
        LinearStep lin = new LinearStep(n, method, s);
        s.evaluate(x, f, lin);
        if (!finite(f)) {
            return new Result(x0.clone(), false, 0, "residual not finite at the start", worst(s, f));
        }
        double merit = merit(f, rowScale);
        double[] history = new double[4];
        int watchdog = 8;
        for (int it = 0; it < maxIterations; it++) {
            if (System.nanoTime() > deadlineNanos) {
                return new Result(x, false, it, "time limit reached", worst(s, f));
            }
            double[] rhs = new double[n];
            for (int i = 0; i < n; i++) {
                rhs[i] = -f[i] / rowScale[i];
            }
            double[] y = lin.solve(rhs, rowScale, colScale);
            if (y == null) {
                if (within(s, f)) {
                    return new Result(x, true, it, null, -1);
                }
                return new Result(x, false, it, "singular Jacobian", worst(s, f));
            }
            double stepNorm = 0;
            double[] dir = new double[n];
            for (int i = 0; i < n; i++) {
                stepNorm = Math.max(stepNorm, Math.abs(y[i]));
                double dx = y[i] * colScale[i];
                if (s.isPressure(i)) {
                    // limit each pressure's change on its own, as circuit simulators limit junction voltages
                    double limit = Math.max(Math.max(PRESSURE_STEP_FLOOR, 0.5 * colScale[i]), 0.5 * Math.abs(x[i]));
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
                }
                alpha *= 0.5;
            }
            if (!accepted && small) {
                return new Result(x, true, it, null, -1);
            }
            if (!accepted && watchdog > 0) {
                // A flat merit (a saturated path, a closed valve the pressure must climb to) stalls the line
                // search; take the limited full step a few times, as circuit simulators do without one.
                watchdog--;
                for (int i = 0; i < n; i++) {
                    xt[i] = x[i] + dir[i];
                }
                s.evaluate(xt, ft, lin.spare());
                if (finite(ft)) {
                    accepted = true;
                    alpha = 1;
                    merit = merit(ft, rowScale);
                }
            }
            if (!accepted) {
                return new Result(x, false, it + 1, "no descent along the Newton step", worst(s, f));
            }
            if (TRACE) {
                System.err.printf("it %d alpha %.3g step %.3g merit %.3g%n", it, alpha, stepNorm, merit);
            }
            // the accepted trial already holds F and the Jacobian at the new iterate
            System.arraycopy(xt, 0, x, 0, n);
            double[] swap = f;
            f = ft;
            ft = swap;
            lin.acceptSpare();
            if (within(s, f) && alpha * stepNorm <= STEP_TOLERANCE) {
                double[] last = lin.solve(negScaled(f, rowScale), rowScale, colScale);
                return new Result(last == null ? x : polish(s, x, f, last, colScale, rowScale), true, it + 2, null, -1);
            }
        }
        if (within(s, f)) {
            return new Result(x, true, maxIterations, null, -1);
        }
        return new Result(x, false, maxIterations, "iteration limit reached", worst(s, f));
    }

    private static double[] negScaled(double[] f, double[] rowScale) {
        double[] r = new double[f.length];
        for (int i = 0; i < f.length; i++) {
            r[i] = -f[i] / rowScale[i];
        }
        return r;
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
        for (int i = 0; i < f.length; i++) {
            if (!(Math.abs(f[i]) <= s.rowTolerance(i))) {
                return false;
            }
        }
        return true;
    }

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
