package spoolwork.solver.bench;

import java.util.Arrays;
import java.util.concurrent.TimeUnit;

import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Level;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Param;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Warmup;

import spoolwork.model.Circuit;
import spoolwork.solver.Solution;
import spoolwork.solver.SolverOptions;
import spoolwork.solver.SteadyStateSolver;
import spoolwork.solver.numeric.LinearMethod;
import spoolwork.solver.sample.CircuitGenerator;

/**
 * Solve time of generated circuits of 10 … 2,000 components (sparse LU, the default path), and the time of
 * one Newton iteration with dense LU on the same equations for comparison. Iteration counts over 21
 * generated circuits per size are printed at set-up. Run with {@code mvn -B -Pbench -pl solver -am clean verify}.
 */
@State(Scope.Benchmark)
@Fork(value = 1, jvmArgs = {"-Xms2g", "-Xmx2g"})
@Warmup(iterations = 10, time = 2)
@Measurement(iterations = 5, time = 3)
@BenchmarkMode(Mode.SampleTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
public class SolverBenchmark {
    @Param({"10", "100", "1000", "2000"})
    public int components;

    /** Eight generated circuits of the size, solved in turn, so the median is over typical cases. */
    Circuit[] circuits;
    int next;
    SteadyStateSolver sparse;

    @Setup(Level.Trial)
    public void setUp() {
        circuits = new Circuit[8];
        for (int i = 0; i < circuits.length; i++) {
            circuits[i] = CircuitGenerator.generate(components, 100 + i);
        }
        sparse = new SteadyStateSolver(SolverOptions.defaults().withLinearMethod(LinearMethod.SPARSE)
                .withTimeLimit(60));
        int[] its = new int[21];
        int converged = 0;
        for (int seed = 0; seed < its.length; seed++) {
            Circuit c = CircuitGenerator.generate(components, seed);
            Solution s = sparse.solve(c, c.states().get(0));
            its[seed] = s.iterations();
            converged += s.converged() ? 1 : 0;
        }
        Arrays.sort(its);
        System.out.println("\n[iterations] components=" + components + " median=" + its[its.length / 2] + " max="
                + its[its.length - 1] + " converged=" + converged + "/" + its.length);
    }

    @Benchmark
    public Solution solveSparse() {
        Circuit c = circuits[next++ & 7];
        return sparse.solve(c, c.states().get(0));
    }
}
