package spoolwork.solver.elements;

import spoolwork.solver.numeric.Jacobian;

/** Laminar leakage q = G·(p_a − p_b) between two ports of a component, e.g. across a spool land. */
public final class Conductance extends Element {
    private final int a;
    private final int b;
    private final String portA;
    private final String portB;
    private final double g;

    /** @param g conductance, m³/(s·Pa) */
    public Conductance(String owner, int a, String portA, int b, String portB, double g) {
        super(owner);
        this.a = a;
        this.b = b;
        this.portA = portA;
        this.portB = portB;
        this.g = g;
    }

    @Override
    public void load(double[] x, double[] f, Jacobian j, Network net) {
        double q = g * (p(x, a) - p(x, b));
        addF(f, a, -q);
        addF(f, b, q);
        flowJ(j, a, b, a, g);
        flowJ(j, a, b, b, -g);
    }

    @Override
    public void report(double[] x, Network net, Report r) {
        double dp = p(x, a) - p(x, b);
        double q = g * dp;
        r.flow(portA, q);
        r.flow(portB, -q);
        r.value("leakage_flow_m3s", Math.abs(q));
        r.power(PowerKind.LEAKAGE, q * dp);
    }
}
