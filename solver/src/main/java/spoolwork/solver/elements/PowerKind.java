package spoolwork.solver.elements;

/**
 * Where hydraulic power goes. Every element's absorbed power Σ p·q (flows into it) is split into these,
 * and by flow balance at every node their sum equals the pumps' hydraulic power.
 */
public enum PowerKind {
    /** Work done on actuator loads (negative when an overrunning load drives the actuator). */
    USEFUL("useful"),
    /** Heat in relief valves. */
    RELIEF("relief_loss"),
    /** Heat in orifices, throttles and flow controls. */
    THROTTLE("throttle_loss"),
    /** Friction in lines. */
    LINE("line_loss"),
    /** Internal leakage of valves, motors and the nodes' regularising conductance. */
    LEAKAGE("leakage_loss"),
    /** Drops in directional, check and pressure-control valves, filters, coolers and meters. */
    VALVE("valve_loss"),
    /** Seal friction of cylinders and mechanical losses of motors. */
    ACTUATOR("actuator_loss");

    private final String key;

    PowerKind(String key) {
        this.key = key;
    }

    public String key() {
        return key;
    }
}
