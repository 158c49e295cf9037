package spoolwork.solver.elements;

import java.util.EnumMap;
import java.util.LinkedHashMap;
import java.util.Map;

/** What one element reports at a solution: flows into its ports, its own values, and its share of power. */
public final class Report {
    /** Flow into the component at each port, m³/s. */
    public final Map<String, Double> portFlows = new LinkedHashMap<>();
    /** Named results in SI, e.g. "velocity_mps". */
    public final Map<String, Double> values = new LinkedHashMap<>();
    /** Absorbed power by kind, W. */
    public final EnumMap<PowerKind, Double> power = new EnumMap<>(PowerKind.class);

    public void flow(String port, double q) {
        Double old = portFlows.get(port);
        portFlows.put(port, old == null ? q : old + q);
    }

    public void value(String key, double v) {
        Double old = values.get(key);
        values.put(key, old == null ? v : old + v);
    }

    public void power(PowerKind kind, double w) {
        Double old = power.get(kind);
        power.put(kind, old == null ? w : old + w);
    }
}
