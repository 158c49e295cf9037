package spoolwork.solver;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

import spoolwork.model.ActuatorState;
import spoolwork.model.ActuatorState.LoadKind;
import spoolwork.model.ActuatorState.Mode;
import spoolwork.model.Circuit;
import spoolwork.model.ComponentType;
import spoolwork.model.OperatingState;

/**
 * The Newton step solves the linearised complementarity problem: in a circuit whose every law is linear or
 * piecewise linear (ideal lines, an ideal relief, laminar pump leakage, a load that either holds or moves),
 * that problem is the circuit itself, so the first step lands on the answer whichever valves start on the
 * wrong side, and Newton only has to confirm it. The counts below are that promise; the physics is checked
 * by the hand-worked circuits.
 */
class ActiveSetStepTest {
    static final double N = 1450.0 / 60; // rev/s

    static Solution solve(Circuit c) {
        Solution s = new SteadyStateSolver().solve(c, c.states().get(0));
        assertTrue(s.converged(), () -> "not converged: " + s.diagnostics());
        return s;
    }

    @Test
    void pumpIntoAShutLoadOpensTheReliefInTheFirstStep() {
        // The cylinder's 60 kN resistive load needs 60000/(π/4·0.05²) = 305.6 bar, more than the 150 bar relief:
        // the cylinder holds, and all pump flow (F = p·A; relief flow = pump flow) crosses the relief.
        Circuit c = new CircuitBuilder()
                .add("T1", ComponentType.RESERVOIR)
                .add("P1", ComponentType.FIXED_PUMP, "volumetric_efficiency", 1.0)
                .add("V1", ComponentType.RELIEF_VALVE, "cracking_pressure", 150e5, "override", 0.0)
                .add("C1", ComponentType.DOUBLE_ACTING_CYLINDER, "bore", 0.05, "friction", 0.0)
                .ideal("T1.S", "P1.S").ideal("P1.P", "V1.P").ideal("V1.T", "T1.T").ideal("P1.P", "C1.A")
                .ideal("C1.B", "T1.T")
                .build(OperatingState.named("Hold").withActuator("C1",
                        new ActuatorState(Mode.FREE, LoadKind.RESISTIVE, 60000)));
        Solution s = solve(c);
        assertEquals(150e5, s.pressure("P1", "P"), 1);
        assertEquals(0, s.value("C1", "velocity_mps"), 1e-12);
        // less only the solver's floor conductance from the node, 1e-17 m³/(s·Pa) · 150e5 Pa = 1.5e-10 m³/s
        assertEquals(s.value("P1", "flow_m3s"), s.value("V1", "bypass_flow_m3s"), 1e-9);
        assertTrue(s.iterations() <= 3, "piecewise-linear circuit took " + s.iterations() + " iterations");
    }

    @Test
    void aLoadThatBreaksAwayLeavesTheReliefShutInTheFirstStep() {
        // 20 kN on the 50 mm bore needs 20000/(π/4·0.05²) = 101.9 bar, below the 150 bar relief: the cylinder
        // moves at v = Q/A with the pump's whole flow 16e-6·N (continuity), and the relief stays shut.
        Circuit c = new CircuitBuilder()
                .add("T1", ComponentType.RESERVOIR)
                .add("P1", ComponentType.FIXED_PUMP, "volumetric_efficiency", 1.0, "displacement", 16e-6)
                .add("V1", ComponentType.RELIEF_VALVE, "cracking_pressure", 150e5, "override", 0.0)
                .add("C1", ComponentType.DOUBLE_ACTING_CYLINDER, "bore", 0.05, "friction", 0.0)
                .ideal("T1.S", "P1.S").ideal("P1.P", "V1.P").ideal("V1.T", "T1.T").ideal("P1.P", "C1.A")
                .ideal("C1.B", "T1.T")
                .build(OperatingState.named("Lift").withActuator("C1",
                        new ActuatorState(Mode.FREE, LoadKind.RESISTIVE, 20000)));
        Solution s = solve(c);
        double area = Math.PI / 4 * 0.05 * 0.05;
        assertEquals(20000 / area, s.pressure("C1", "A"), 1);
        // less the floor conductance's 1e-17 · 102e5 = 1e-10 m³/s, i.e. 5e-8 m/s
        assertEquals(16e-6 * N / area, s.value("C1", "velocity_mps"), 1e-7);
        assertEquals(0, s.value("V1", "bypass_flow_m3s"), 1e-12);
        assertTrue(s.iterations() <= 3, "piecewise-linear circuit took " + s.iterations() + " iterations");
    }
}
