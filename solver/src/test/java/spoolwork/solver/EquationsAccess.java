package spoolwork.solver;

import spoolwork.model.Circuit;
import spoolwork.model.OperatingState;
import spoolwork.model.netlist.Netlist;
import spoolwork.solver.elements.Network;

/** The equations the solver builds for a circuit in one state, for benchmarks outside this package. */
public final class EquationsAccess {
    private EquationsAccess() {
    }

    public static Network network(Circuit circuit, OperatingState state) {
        return new CircuitEquations(circuit, state, new Netlist(circuit, state), SolverOptions.defaults()).net;
    }
}
