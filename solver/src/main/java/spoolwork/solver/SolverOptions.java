package spoolwork.solver;

import spoolwork.solver.numeric.LinearMethod;

/**
 * Settings of the solver.
 *
 * @param linearMethod  how Newton steps are solved
 * @param timeLimit     wall-clock limit of one solve, s
 * @param maxIterations Newton iterations allowed per continuation stage
 * @param roughness     absolute wall roughness of lines, m (1.5 µm: drawn steel tube, from memory)
 * @param continuation  false to stop after plain Newton (for measuring it alone)
 */
public record SolverOptions(LinearMethod linearMethod, double timeLimit, int maxIterations, double roughness,
                            boolean continuation) {
    public static SolverOptions defaults() {
        return new SolverOptions(LinearMethod.AUTO, 0.8, 60, 1.5e-6, true);
    }

    public SolverOptions withLinearMethod(LinearMethod m) {
        return new SolverOptions(m, timeLimit, maxIterations, roughness, continuation);
    }

    public SolverOptions withTimeLimit(double seconds) {
        return new SolverOptions(linearMethod, seconds, maxIterations, roughness, continuation);
    }

    public SolverOptions withContinuation(boolean on) {
        return new SolverOptions(linearMethod, timeLimit, maxIterations, roughness, on);
    }
}
