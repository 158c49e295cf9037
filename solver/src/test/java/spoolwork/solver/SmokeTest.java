package spoolwork.solver;

import static org.junit.jupiter.api.Assertions.*;

import org.junit.jupiter.api.Test;

import spoolwork.model.ActuatorState;
import spoolwork.model.Circuit;
import spoolwork.model.ComponentType;
import spoolwork.model.OperatingState;

class SmokeTest {
    @Test
    void meterIn() {
        Circuit c = new CircuitBuilder()
                .add("T1", ComponentType.RESERVOIR)
                .add("P1", ComponentType.FIXED_PUMP)
                .add("V1", ComponentType.RELIEF_VALVE, "cracking_pressure", 100e5, "override", 0.0)
                .add("F1", ComponentType.FLOW_CONTROL)
                .add("C1", ComponentType.DOUBLE_ACTING_CYLINDER)
                .ideal("T1.S", "P1.S").ideal("P1.P", "V1.P").ideal("V1.T", "T1.T").ideal("P1.P", "F1.A")
                .ideal("F1.B", "C1.A").ideal("C1.B", "T1.T")
                .build(OperatingState.named("Run").withActuator("C1",
                        new ActuatorState(ActuatorState.Mode.FREE, ActuatorState.LoadKind.CONSTANT, 15000)));
        Solution s = new SteadyStateSolver().solve(c, c.states().get(0));
        System.out.println(s.diagnostics());
        System.out.println(s.iterations() + " " + s.components());
        System.out.println(s.lines());
        System.out.println(s.power() + " imb " + (s.power() == null ? 0 : s.power().relativeImbalance()));
        assertTrue(s.converged());
    }
}
