package spoolwork.solver.numeric;

/** One linear Newton step of a system at a point, with a chosen linear method, for benchmarks. */
public final class StepAccess {
    private StepAccess() {
    }

    /** Evaluates the system and its Jacobian at x and solves for the scaled Newton step; null if singular. */
    public static double[] step(NonlinearSystem s, double[] x, LinearMethod method) {
        int n = s.size();
        double[] f = new double[n];
        double[] rowScale = Newton.rowScales(s);
        double[] colScale = Newton.unknownScales(s);
        LinearStep lin = new LinearStep(n, method, s);
        s.beginRun();
        s.evaluate(x, f, lin);
        double[] rhs = Newton.negScaled(s, f, rowScale);
        return lin.solve(rhs, rowScale, colScale);
    }
}
