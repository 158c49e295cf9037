package spoolwork.solver.elements;

import spoolwork.solver.numeric.Jacobian;

/**
 * A path carrying flow q from node a to node b against a drop law: row p_a − p_b − r(q) = 0, with q as its
 * own unknown. Keeping the flow as the unknown linearises the convex drop law, which converges far better
 * than writing q as a square root of Δp.
 */
public class Branch extends Element {
    protected final int a;
    protected final int b;
    protected final String portA;
    protected final String portB;
    protected final DropLaw law;
    protected final PowerKind kind;
    protected int q;
    private final double[] slope = new double[1];

    public Branch(String owner, int a, String portA, int b, String portB, DropLaw law, PowerKind kind, Network net) {
        super(owner);
        this.a = a;
        this.b = b;
        this.portA = portA;
        this.portB = portB;
        this.law = law;
        this.kind = kind;
        this.q = net.add(Network.Kind.FLOW, owner, net.flowRef(), net.pressureRef(), net.pressureTolerance());
    }

    public int flowIndex() {
        return q;
    }

    @Override
    public void load(double[] x, double[] f, Jacobian j, Network net) {
        double[] d = slope;
        double flow = x[q];
        double r = law.drop(flow, d);
        addF(f, a, -flow);
        addF(f, b, flow);
        flowJ(j, a, b, q, 1);
        f[q] = p(x, a) - p(x, b) - r;
        addJ(j, q, a, 1);
        addJ(j, q, b, -1);
        addJ(j, q, q, -d[0]);
    }

    @Override
    public void initialGuess(double[] x, Network net) {
        x[q] = law.typicalFlow();
    }

    @Override
    public void report(double[] x, Network net, Report r) {
        double flow = x[q];
        if (portA != null) {
            r.flow(portA, flow);
        }
        if (portB != null) {
            r.flow(portB, -flow);
        }
        r.power(kind, flow * (p(x, a) - p(x, b)));
    }

    /** Flow a → b at the solution, m³/s. */
    public double flow(double[] x) {
        return x[q];
    }
}
