package spoolwork.solver.elements;

import spoolwork.solver.numeric.Jacobian;

/**
 * Pressure-compensated flow control A → B: with at least its minimum drop it holds its set flow; below that
 * it is the fully open throttle, sized to pass the set flow at the minimum drop. Written as
 * q − F(Δp) = 0 with F the smooth minimum of the set flow and the open throttle's flow, made odd so that
 * reverse flow is limited alike.
 */
public final class FlowControl extends Element {
    private final int a;
    private final int b;
    private final double set;
    private final double kq;
    private final double dpt;
    private final double eps;
    private final double offset;
    private final int q;

    public FlowControl(String owner, int a, int b, double setFlow, double minimumDrop, Network net) {
        super(owner);
        this.a = a;
        this.b = b;
        this.set = setFlow;
        this.kq = setFlow / Math.sqrt(minimumDrop);
        this.dpt = 1e-3 * minimumDrop;
        this.eps = 1e-3 * setFlow;
        this.offset = half(0, new double[2]);
        this.q = net.add(Network.Kind.FLOW, owner, net.flowRef(), net.flowRef(), net.flowTolerance());
    }

    private double half(double o, double[] d) {
        return Laws.smoothMin(o, set, eps, d);
    }

    /** Regulated flow at drop Δp (Pa), m³/s; d[0] = dF/dΔp. */
    double law(double dp, double[] d) {
        double[] t = new double[2];
        double o = Laws.orificeFlow(kq, Math.abs(dp), dpt, t);
        double dodp = t[0];
        double v = half(o, t) - offset;
        d[0] = t[0] * dodp;
        return dp >= 0 ? v : -v;
    }

    @Override
    public void load(double[] x, double[] f, Jacobian j, Network net) {
        double flow = x[q];
        addF(f, a, -flow);
        addF(f, b, flow);
        flowJ(j, a, b, q, 1);
        double[] d = new double[1];
        double target = law(p(x, a) - p(x, b), d);
        f[q] = flow - target;
        addJ(j, q, q, 1);
        addJ(j, q, a, -d[0]);
        addJ(j, q, b, d[0]);
    }

    @Override
    public void report(double[] x, Network net, Report r) {
        double flow = x[q];
        double dp = p(x, a) - p(x, b);
        r.flow("A", flow);
        r.flow("B", -flow);
        r.value("flow_m3s", flow);
        r.value("pressure_drop_pa", dp);
        r.value("regulating", dp >= 0.999 * (set / kq) * (set / kq) && Math.abs(flow) > 0.99 * set ? 1 : 0);
        r.value("power_loss_w", flow * dp);
        r.power(PowerKind.THROTTLE, flow * dp);
    }
}
