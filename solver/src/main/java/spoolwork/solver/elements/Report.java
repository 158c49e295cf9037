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
        portFlows.merge(port, q, Double::sum);
    }

    public void value(String key, double v) {
        values.merge(key, v, Double::sum);
    }

    public void power(PowerKind kind, double w) {
        power.merge(kind, w, Double::sum);
    }
}
