package spoolwork.solver.elements;

import java.util.LinkedHashMap;
import java.util.Map;

/** What one element reports at a solution: flows into its ports, its own values, and its share of power. */
public final class Report {
    /** Flow into the component at each port, m³/s. */
    public final Map<String, Double> portFlows = new LinkedHashMap<>();
    /** Named results in SI, e.g. "velocity_mps". */
    public final Map<String, Double> values = new LinkedHashMap<>();
    /** Absorbed power by kind (index: the kind's ordinal), W; 0 for a kind never reported. */
    public final double[] power = new double[PowerKind.values().length];

    public void flow(String port, double q) {
        Double old = portFlows.get(port);
        portFlows.put(port, old == null ? q : old + q);
    }

    public void value(String key, double v) {
        Double old = values.get(key);
        values.put(key, old == null ? v : old + v);
    }

    public void power(PowerKind kind, double w) {
        power[kind.ordinal()] += w;
    }

    /** Power absorbed of every kind together, W (summed in the kinds' order). */
    public double totalPower() {
        double w = 0;
        for (double v : power) {
            w += v;
        }
        return w;
    }
}
