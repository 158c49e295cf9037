package spoolwork.solver.bench;

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
import spoolwork.model.OperatingState;
import spoolwork.solver.Solution;
import spoolwork.solver.SolverOptions;
import spoolwork.solver.SteadyStateSolver;
import spoolwork.solver.numeric.LinearMethod;
import spoolwork.solver.sample.CircuitGenerator;

/**
 * The same 1,000-component circuit as {@link SolverBenchmark}, solved with sparse LU and with dense LU,
 * both limited to the same number of Newton iterations (2), so the ratio is the linear algebra's alone.
 * A full dense solve at this size takes minutes, which is the point of the sparse path.
 */
@State(Scope.Benchmark)
@Fork(value = 1, jvmArgs = {"-Xmx3g"})
@org.openjdk.jmh.annotations.Timeout(time = 30, timeUnit = TimeUnit.MINUTES)
@Warmup(iterations = 0)
@Measurement(iterations = 1)
@BenchmarkMode(Mode.SingleShotTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
public class DenseComparisonBenchmark {
    @Param({"1000"})
    public int components;

    Circuit circuit;
    OperatingState state;
    SteadyStateSolver sparse;
    SteadyStateSolver dense;

    @Setup(Level.Trial)
    public void setUp() {
        circuit = CircuitGenerator.generate(components, 7);
        state = circuit.states().get(0);
        SolverOptions capped = new SolverOptions(LinearMethod.SPARSE, 3600, 2, 1.5e-6, false);
        sparse = new SteadyStateSolver(capped);
        dense = new SteadyStateSolver(capped.withLinearMethod(LinearMethod.DENSE));
    }

    @Benchmark
    public Solution twoIterationsSparse() {
        return sparse.solve(circuit, state);
    }

    @Benchmark
    public Solution twoIterationsDense() {
        return dense.solve(circuit, state);
    }
}
