package spoolwork.solver;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.apache.commons.math3.fitting.leastsquares.LeastSquaresBuilder;
import org.apache.commons.math3.fitting.leastsquares.LeastSquaresOptimizer;
import org.apache.commons.math3.fitting.leastsquares.LevenbergMarquardtOptimizer;
import org.apache.commons.math3.fitting.leastsquares.MultivariateJacobianFunction;
import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.ArrayRealVector;
import org.apache.commons.math3.linear.RealVector;
import org.apache.commons.math3.util.Pair;
import org.junit.jupiter.api.Test;

import spoolwork.model.ActuatorState;
import spoolwork.model.ActuatorState.LoadKind;
import spoolwork.model.ActuatorState.Mode;
import spoolwork.model.Circuit;
import spoolwork.model.ComponentType;
import spoolwork.model.OperatingState;
import spoolwork.model.netlist.Netlist;
import spoolwork.solver.elements.Network;

/**
 * Cross-check with a general-purpose reference: Apache Commons Math's Levenberg–Marquardt least squares
 * on the same scaled residuals, started from the same rest point, must land on our Newton's answer.
 */
class CommonsMathCrossCheckTest {
    static final double LPM = 1.0 / 60000;

    static double[] reference(Network net) {
        int n = net.size();
        double[] cs = new double[n];
        double[] rs = new double[n];
        for (int i = 0; i < n; i++) {
            cs[i] = net.unknownScale(i);
            rs[i] = net.rowScale(i);
        }
        MultivariateJacobianFunction model = point -> {
            double[] x = new double[n];
            for (int i = 0; i < n; i++) {
                x[i] = point.getEntry(i) * cs[i];
            }
            double[] f = new double[n];
            double[][] j = new double[n][n];
            net.beginRun();
            net.evaluate(x, f, (r, c, v) -> j[r][c] += v * cs[c] / rs[r]);
            for (int i = 0; i < n; i++) {
                f[i] /= rs[i];
            }
            return new Pair<RealVector, org.apache.commons.math3.linear.RealMatrix>(new ArrayRealVector(f, false),
                    new Array2DRowRealMatrix(j, false));
        };
        double[] start = net.initialGuess();
        for (int i = 0; i < n; i++) {
            start[i] /= cs[i];
        }
        LeastSquaresOptimizer.Optimum opt = new LevenbergMarquardtOptimizer()
                .withCostRelativeTolerance(1e-15).withParameterRelativeTolerance(1e-15).withOrthoTolerance(1e-15)
                .optimize(new LeastSquaresBuilder().model(model).target(new double[n]).start(start)
                        .maxEvaluations(20000).maxIterations(20000).build());
        assertTrue(opt.getRMS() < 1e-9, "reference converged, rms " + opt.getRMS());
        double[] x = opt.getPoint().toArray();
        for (int i = 0; i < n; i++) {
            x[i] *= cs[i];
        }
        return x;
    }

    static void compare(Circuit c) {
        OperatingState st = c.states().get(0);
        CircuitEquations eq = new CircuitEquations(c, st, new Netlist(c, st), SolverOptions.defaults());
        double[] ref = reference(eq.net);
        Solution ours = new SteadyStateSolver().solve(c, st);
        assertTrue(ours.converged());
        for (ComponentResult r : ours.components().values()) {
            for (var port : r.ports().entrySet()) {
                int node = eq.nodeOf.get(new spoolwork.model.netlist.NetNode.Port(r.id(), port.getKey()));
                double p = node < 0 ? 0 : ref[node];
                assertEquals(p, port.getValue().pressure(), 1e-6 * eq.net.pressureRef() + 1e-9 * Math.abs(p),
                        r.tag() + "." + port.getKey());
            }
        }
    }

    @Test
    void laminarLineIntoRelief() {
        compare(new CircuitBuilder()
                .add("T1", ComponentType.RESERVOIR)
                .add("P1", ComponentType.FIXED_PUMP)
                .add("V1", ComponentType.RELIEF_VALVE, "cracking_pressure", 50e5)
                .ideal("T1.S", "P1.S").line("L1", "P1.P", "V1.P", 0.010, 5).line("L2", "V1.T", "T1.T", 0.012, 3)
                .build());
    }

    @Test
    void orificeAndCylinderAgainstSpringLoad() {
        compare(new CircuitBuilder()
                .add("T1", ComponentType.RESERVOIR)
                .add("P1", ComponentType.FIXED_PUMP)
                .add("V1", ComponentType.RELIEF_VALVE, "cracking_pressure", 120e5, "override", 8e5)
                .add("O1", ComponentType.ORIFICE, "diameter", 0.0025)
                .add("C1", ComponentType.SINGLE_ACTING_CYLINDER)
                .ideal("T1.S", "P1.S").ideal("P1.P", "V1.P").ideal("V1.T", "T1.T").ideal("P1.P", "O1.A")
                .line("L1", "O1.B", "C1.A", 0.008, 2)
                .build(OperatingState.named("Push").withActuator("C1",
                        new ActuatorState(Mode.FREE, LoadKind.CONSTANT, 8000))));
    }

    @Test
    void motorThroughDirectionalValveAndTurbulentReturn() {
        compare(new CircuitBuilder()
                .add("T1", ComponentType.RESERVOIR)
                .add("P1", ComponentType.FIXED_PUMP, "displacement", 40e-6)
                .add("V1", ComponentType.RELIEF_VALVE, "cracking_pressure", 180e5, "override", 12e5)
                .add("D1", ComponentType.DIRECTIONAL_4_3)
                .add("H1", ComponentType.HYDRAULIC_MOTOR)
                .ideal("T1.S", "P1.S").ideal("P1.P", "V1.P").ideal("V1.T", "T1.T").ideal("P1.P", "D1.P")
                .line("L1", "D1.T", "T1.T", 0.008, 4).ideal("D1.A", "H1.A").ideal("H1.B", "D1.B")
                .build(OperatingState.named("Run").withPosition("D1", "a").withActuator("H1",
                        new ActuatorState(Mode.FREE, LoadKind.CONSTANT, 30))));
    }

    @Test
    void meterInAtThreeLoadsAgrees() {
        for (double load : List.of(1000.0, 5000.0, 12000.0)) {
            compare(new CircuitBuilder()
                    .add("T1", ComponentType.RESERVOIR)
                    .add("P1", ComponentType.FIXED_PUMP)
                    .add("V1", ComponentType.RELIEF_VALVE, "cracking_pressure", 100e5, "override", 5e5)
                    .add("F1", ComponentType.FLOW_CONTROL, "set_flow", 8 * LPM)
                    .add("C1", ComponentType.DOUBLE_ACTING_CYLINDER)
                    .ideal("T1.S", "P1.S").ideal("P1.P", "V1.P").ideal("V1.T", "T1.T").ideal("P1.P", "F1.A")
                    .line("L1", "F1.B", "C1.A", 0.01, 2).line("L2", "C1.B", "T1.T", 0.01, 2)
                    .build(OperatingState.named("Run").withActuator("C1",
                            new ActuatorState(Mode.FREE, LoadKind.CONSTANT, load))));
        }
    }
}
