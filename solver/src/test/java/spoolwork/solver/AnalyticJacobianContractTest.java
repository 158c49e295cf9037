package spoolwork.solver;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.Random;

import org.junit.jupiter.api.Test;

import spoolwork.model.ActuatorState;
import spoolwork.model.ActuatorState.LoadKind;
import spoolwork.model.ActuatorState.Mode;
import spoolwork.model.Circuit;
import spoolwork.model.ComponentType;
import spoolwork.model.OperatingState;
import spoolwork.model.netlist.Netlist;
import spoolwork.solver.elements.Network;
import spoolwork.solver.sample.CircuitGenerator;

/**
 * Every element's analytic derivatives match central finite differences of its residuals, at points
 * scattered around the solution (away from the measure-zero kinks of the complementarity functions).
 */
class AnalyticJacobianContractTest {

    /** A circuit holding every kind of element the solver stamps. */
    static Circuit everyElement() {
        return new CircuitBuilder()
                .add("T1", ComponentType.RESERVOIR)
                .add("M1", ComponentType.PRIME_MOVER)
                .add("P1", ComponentType.FIXED_PUMP)
                .add("P2", ComponentType.COMPENSATED_PUMP, "compensator_setting", 120e5)
                .add("V1", ComponentType.RELIEF_VALVE, "cracking_pressure", 140e5)
                .add("R1", ComponentType.REDUCING_VALVE)
                .add("S1", ComponentType.SEQUENCE_VALVE)
                .add("B1", ComponentType.COUNTERBALANCE_VALVE)
                .add("K1", ComponentType.CHECK_VALVE)
                .add("K2", ComponentType.PILOT_CHECK_VALVE)
                .add("O1", ComponentType.ORIFICE)
                .add("O2", ComponentType.THROTTLE)
                .add("F1", ComponentType.FLOW_CONTROL)
                .add("D1", ComponentType.DIRECTIONAL_4_3, "centre", "tandem")
                .add("D2", ComponentType.DIRECTIONAL_3_2)
                .add("D3", ComponentType.DIRECTIONAL_2_2)
                .add("D4", ComponentType.DIRECTIONAL_4_2)
                .add("C1", ComponentType.DOUBLE_ACTING_CYLINDER, "friction", 300.0)
                .add("C2", ComponentType.SINGLE_ACTING_CYLINDER)
                .add("C3", ComponentType.DOUBLE_ROD_CYLINDER)
                .add("H1", ComponentType.HYDRAULIC_MOTOR)
                .add("A1", ComponentType.ACCUMULATOR)
                .add("X1", ComponentType.FILTER)
                .add("X2", ComponentType.COOLER)
                .add("G1", ComponentType.PRESSURE_GAUGE)
                .add("Q1", ComponentType.FLOW_METER)
                .junction("J1").junction("J2")
                .shaft("M1.shaft", "P1.shaft")
                .ideal("T1.S", "P1.S").ideal("T1.S", "P2.S").ideal("P2.L", "T1.T")
                .line("l1", "P1.P", "J1", 0.012, 2).ideal("P2.P", "J1")
                .ideal("J1", "V1.P").ideal("V1.T", "J2").line("l2", "J2", "X2.A", 0.02, 1).ideal("X2.B", "X1.A")
                .ideal("X1.B", "T1.T")
                .ideal("J1", "D1.P").ideal("D1.T", "J2").line("l3", "D1.A", "B1.B", 0.01, 3)
                .ideal("B1.A", "C1.B").ideal("D1.B", "K2.A").ideal("K2.B", "C1.A").ideal("B1.X", "D1.B")
                .ideal("K2.X", "D1.A")
                .ideal("J1", "R1.P").ideal("R1.A", "D2.P").ideal("D2.T", "J2").ideal("D2.A", "C2.A")
                .ideal("R1.Y", "T1.T")
                .ideal("J1", "S1.P").ideal("S1.A", "O1.A").ideal("O1.B", "J2").ideal("S1.Y", "T1.T")
                .ideal("J1", "D3.P").ideal("D3.A", "F1.A").ideal("F1.B", "Q1.A").ideal("Q1.B", "H1.A")
                .ideal("H1.B", "O2.A").ideal("O2.B", "J2")
                .ideal("J1", "D4.P").ideal("D4.T", "J2").ideal("D4.A", "K1.A").ideal("K1.B", "C3.A")
                .ideal("D4.B", "C3.B")
                .ideal("J1", "A1.P").ideal("J1", "G1.P")
                .build(OperatingState.named("Mixed").withPosition("D1", "a").withPosition("D2", "a")
                        .withPosition("D3", "a")
                        .withActuator("C1", new ActuatorState(Mode.FREE, LoadKind.CONSTANT, -3000))
                        .withActuator("C2", new ActuatorState(Mode.FREE, LoadKind.RESISTIVE, 2000))
                        .withActuator("C3", new ActuatorState(Mode.HELD_RETRACTED, LoadKind.CONSTANT, 1000))
                        .withActuator("H1", new ActuatorState(Mode.FREE, LoadKind.RESISTIVE, 20)));
    }

    static double[][] jacobian(Network net, double[] x) {
        int n = net.size();
        double[][] j = new double[n][n];
        // each complementarity row takes the side that is the smaller at x, so its row is the derivative of
        // min(a, b) there (away from ties)
        net.beginRun();
        net.evaluate(x, new double[n], (r, c, v) -> j[r][c] += v);
        return j;
    }

    static void check(Circuit c, long seed) {
        OperatingState st = c.states().get(0);
        Netlist nl = new Netlist(c, st);
        CircuitEquations eq = new CircuitEquations(c, st, nl, SolverOptions.defaults());
        Network net = eq.net;
        int n = net.size();
        Solution sol = new SteadyStateSolver().solve(c, st);
        assertTrue(sol.converged(), "the check circuit solves: " + sol.diagnostics());
        double[] base = spoolwork.solver.numeric.NewtonAccess.solve(net);
        Random rnd = new Random(seed);
        List<String> bad = new ArrayList<>();
        for (int trial = 0; trial < 6; trial++) {
            double[] x = base.clone();
            for (int i = 0; i < n; i++) {
                x[i] += net.unknownScale(i) * 0.05 * rnd.nextGaussian() + Math.abs(x[i]) * 0.05 * rnd.nextGaussian();
            }
            double[][] ja = jacobian(net, x);
            double[] fp = new double[n];
            double[] fm = new double[n];
            for (int col = 0; col < n; col++) {
                double h = 1e-6 * net.unknownScale(col);
                double keep = x[col];
                x[col] = keep + h;
                net.evaluate(x, fp, null);
                x[col] = keep - h;
                net.evaluate(x, fm, null);
                x[col] = keep;
                for (int row = 0; row < n; row++) {
                    double fd = (fp[row] - fm[row]) / (2 * h);
                    double scale = net.unknownScale(col) / net.rowScale(row);
                    double a = ja[row][col] * scale;
                    double d = fd * scale;
                    if (Math.abs(a - d) > 1e-5 + 1e-4 * Math.max(Math.abs(a), Math.abs(d))) {
                        bad.add(net.owner(row) + " row " + row + " / " + net.owner(col) + " col " + col + ": analytic "
                                + a + " vs difference " + d);
                    }
                }
            }
        }
        assertTrue(bad.isEmpty(), () -> bad.size() + " mismatches, first: " + bad.subList(0, Math.min(8, bad.size())));
    }

    @Test
    void everyElementTypeMatchesFiniteDifferences() {
        check(everyElement(), 1);
    }

    @Test
    void generatedCircuitsMatchFiniteDifferences() {
        for (int seed = 0; seed < 20; seed++) {
            check(CircuitGenerator.generate(20, seed), seed);
        }
    }
}
