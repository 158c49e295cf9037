package spoolwork.model;

import java.util.Objects;

/**
 * A port a component type declares. Hydraulic ports carry ISO 9461 letters where they apply
 * (P supply, T return, A/B work, X/Y pilot and pilot drain, L leakage drain, S suction). A mechanical
 * port ("shaft") couples a prime mover to a pump and carries no fluid.
 */
public record PortSpec(String name, boolean mechanical, String meaning) {
    public PortSpec {
        Objects.requireNonNull(name);
        Objects.requireNonNull(meaning);
    }

    static PortSpec fluid(String name, String meaning) {
        return new PortSpec(name, false, meaning);
    }

    static PortSpec shaft(String meaning) {
        return new PortSpec(SHAFT, true, meaning);
    }

    /** Name of the mechanical drive port of prime movers and pumps. */
    public static final String SHAFT = "shaft";
}
