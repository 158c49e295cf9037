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
import spoolwork.solver.EquationsAccess;
import spoolwork.solver.elements.Network;
import spoolwork.solver.numeric.LinearMethod;
import spoolwork.solver.numeric.StepAccess;
import spoolwork.solver.sample.CircuitGenerator;

/**
 * One Newton step — Jacobian, linear set-up and solve — of the same 1,000-component circuit from its starting
 * point, with the sparse step and with dense LU on the same equations, so the ratio is the linear algebra's.
 * (A whole Newton step may also hold side rounds; both methods would do the same rounds, each a solve like
 * this one.) One dense step at this size takes minutes, which is the point of the sparse path.
 */
@State(Scope.Benchmark)
@Fork(value = 1, jvmArgs = {"-Xmx3g"})
@org.openjdk.jmh.annotations.Timeout(time = 30, timeUnit = TimeUnit.MINUTES)
@BenchmarkMode(Mode.SingleShotTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
public class DenseComparisonBenchmark {
    @Param({"1000"})
    public int components;

    Network net;
    double[] start;

    @Setup(Level.Trial)
    public void setUp() {
        Circuit circuit = CircuitGenerator.generate(components, 7);
        net = EquationsAccess.network(circuit, circuit.states().get(0));
        start = net.initialGuess();
        System.out.println("\n[unknowns] components=" + components + " unknowns=" + net.size());
    }

    @Benchmark
    @Warmup(iterations = 20)
    @Measurement(iterations = 20)
    public double[] oneStepSparse() {
        return StepAccess.step(net, start, LinearMethod.SPARSE);
    }

    @Benchmark
    @Warmup(iterations = 0)
    @Measurement(iterations = 1)
    public double[] oneStepDense() {
        return StepAccess.step(net, start, LinearMethod.DENSE);
    }
}
