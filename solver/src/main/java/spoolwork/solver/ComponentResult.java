package spoolwork.solver;

import java.util.Map;
import java.util.Optional;

import spoolwork.model.ComponentType;

/**
 * Results of one component.
 *
 * @param ports  pressure and flow at each hydraulic port, in the type's port order
 * @param values the type's own results in SI, keyed like "velocity_mps", "force_n", "speed_rpm",
 *               "torque_nm", "bypass_flow_m3s", "power_loss_w"
 */
public record ComponentResult(String id, String tag, ComponentType type, Map<String, PortResult> ports,
                              Map<String, Double> values) {
    public ComponentResult {
        ports = Frozen.copyOf(ports);
        values = Frozen.copyOf(values);
    }

    public Optional<Double> value(String key) {
        return Optional.ofNullable(values.get(key));
    }

    public PortResult port(String name) {
        PortResult r = ports.get(name);
        if (r == null) {
            throw new IllegalArgumentException(tag + " has no port " + name);
        }
        return r;
    }
}
