package spoolwork.solver.elements;

import java.util.Arrays;
import java.util.List;

/**
 * What the elements of one component report at a solution: flows into its ports, its own values, and its
 * share of power.
 *
 * <p>Flows and values are summed in plain arrays rather than in maps of boxed numbers: a solve makes one
 * report per component. A sum starts from its first term (not from zero), so that a single report of −0.0
 * stays −0.0.
 */
public final class Report {
    /** Names of the ports whose flows are reported, in port order. */
    private final List<String> ports;
    private final double[] flows;
    private final boolean[] flowed;
    private static final int KINDS = PowerKind.values().length;
    /** Named values in the order first reported; the first {@link #valueCount} slots are in use. */
    private String[] keys = {};
    private double[] values = {};
    private int valueCount;
    /** Absorbed power by kind (index: the kind's ordinal), W; 0 for a kind never reported. */
    public final double[] power = new double[KINDS];

    /** A report that takes no port flows: for elements that belong to no component (nodes, lines). */
    public Report() {
        this(List.of());
    }

    /** @param ports names of the component's hydraulic ports, in port order */
    public Report(List<String> ports) {
        this.ports = ports;
        this.flows = new double[ports.size()];
        this.flowed = new boolean[ports.size()];
    }

    /** Adds flow into the component at the named port, m³/s. */
    public void flow(String port, double q) {
        int k = ports.indexOf(port);
        if (k < 0) {
            throw new IllegalArgumentException("flow reported at port " + port + ", not one of " + ports);
        }
        flows[k] = flowed[k] ? flows[k] + q : q;
        flowed[k] = true;
    }

    /** Flow into the component at its k-th port (in port order), m³/s; 0 when none was reported. */
    public double flowAt(int k) {
        return flows[k];
    }

    /** Adds to a named result in SI, e.g. "velocity_mps"; the first report of a key sets its place. */
    public void value(String key, double v) {
        int i = indexOf(key);
        if (i >= 0) {
            values[i] += v;
        } else {
            append(key, v);
        }
    }

    /** Sets a named result, keeping the place of one reported before. */
    public void setValue(String key, double v) {
        int i = indexOf(key);
        if (i >= 0) {
            values[i] = v;
        } else {
            append(key, v);
        }
    }

    /** Sets a named result unless it has been reported. */
    public void setValueIfAbsent(String key, double v) {
        if (indexOf(key) < 0) {
            append(key, v);
        }
    }

    /** True when the named result has been reported. */
    public boolean hasValue(String key) {
        return indexOf(key) >= 0;
    }

    /** A named result that has been reported. */
    public double valueOf(String key) {
        int i = indexOf(key);
        if (i < 0) {
            throw new IllegalArgumentException("no value " + key + " was reported");
        }
        return values[i];
    }

    /** Number of named results. */
    public int valueCount() {
        return valueCount;
    }

    /** The key of the i-th named result, in the order first reported. */
    public String valueKey(int i) {
        return keys[i];
    }

    /** The i-th named result, in the order first reported. */
    public double valueAt(int i) {
        return values[i];
    }

    private int indexOf(String key) {
        for (int i = 0; i < valueCount; i++) {
            if (keys[i].equals(key)) {
                return i;
            }
        }
        return -1;
    }

    private void append(String key, double v) {
        if (valueCount == keys.length) {
            // most components report fewer than eight values, a pump nine
            int grown = Math.max(8, 2 * valueCount);
            keys = Arrays.copyOf(keys, grown);
            values = Arrays.copyOf(values, grown);
        }
        keys[valueCount] = key;
        values[valueCount++] = v;
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
