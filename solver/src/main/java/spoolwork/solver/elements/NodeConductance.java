package spoolwork.solver.elements;

import spoolwork.solver.numeric.Jacobian;

/**
 * A tiny conductance from every node to the reservoir. It keeps a node that is cut off (a blocked port, a
 * closed check) determined at reservoir pressure instead of singular, and it is the gmin of gmin stepping
 * when the network's extra conductance is raised. Its flow counts as leakage.
 */
public final class NodeConductance extends Element {
    /** Permanent conductance, m³/(s·Pa): 3e-10 m³/s at 300 bar, far below any valve's leakage. */
    public static final double FLOOR = 1e-17;

    private final int[] nodes;
    private final String[] names;

    public NodeConductance(int[] nodes, String[] names) {
        super("nodes");
        this.nodes = nodes;
        this.names = names;
    }

    @Override
    public void load(double[] x, double[] f, Jacobian j, Network net) {
        double g = FLOOR + net.extraConductance();
        for (int n : nodes) {
            f[n] -= g * x[n];
            addJ(j, n, n, -g);
        }
    }

    @Override
    public void report(double[] x, Network net, Report r) {
        double w = 0;
        for (int n : nodes) {
            w += FLOOR * x[n] * x[n];
        }
        r.power(PowerKind.LEAKAGE, w);
    }

    public String[] names() {
        return names;
    }
}
