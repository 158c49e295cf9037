package spoolwork.solver.elements;

import spoolwork.solver.numeric.Jacobian;

/**
 * The reverse path B → A of a pilot-operated check: the poppet lifts as the pilot force ratio·p_X exceeds
 * the load-side difference p_B − p_A plus cracking, fully over a 1 bar band; open, it is a turbulent path
 * sized at the valve's rated flow and drop.
 */
public final class PilotPath extends Element {
    private static final double BAND = 1e5;

    private final int a;
    private final int b;
    private final int x;
    private final double ratio;
    private final double crack;
    private final double kq;
    private final double dpt;
    private final double[] t1 = new double[1];
    private final double[] d3 = new double[3];

    public PilotPath(String owner, int a, int b, int x, double ratio, double crack, double rated, double ratedDrop) {
        super(owner);
        this.a = a;
        this.b = b;
        this.x = x;
        this.ratio = ratio;
        this.crack = crack;
        this.kq = rated / Math.sqrt(ratedDrop);
        this.dpt = 1e-3 * ratedDrop;
    }

    /** Flow B → A, m³/s; d = ∂/∂p_a, ∂/∂p_b, ∂/∂p_x. */
    double flow(double pa, double pb, double px, double[] d) {
        double[] t = t1;
        double u = (ratio * px - (pb - pa) - crack) / BAND;
        double s = Laws.smoothUnit(u, 1e-3, t);
        double ds = t[0] / BAND;
        double o = Laws.orificeFlow(kq, pb - pa, dpt, t);
        double dodp = t[0];
        d[0] = s * (-dodp) + o * ds;
        d[1] = s * dodp - o * ds;
        d[2] = o * ds * ratio;
        return s * o;
    }

    @Override
    public void load(double[] xs, double[] f, Jacobian j, Network net) {
        double[] d = d3;
        double qr = flow(p(xs, a), p(xs, b), p(xs, x), d);
        addF(f, b, -qr);
        addF(f, a, qr);
        flowJ(j, b, a, a, d[0]);
        flowJ(j, b, a, b, d[1]);
        flowJ(j, b, a, x, d[2]);
    }

    @Override
    public void report(double[] xs, Network net, Report r) {
        double qr = flow(p(xs, a), p(xs, b), p(xs, x), new double[3]);
        r.flow("B", qr);
        r.flow("A", -qr);
        r.value("reverse_flow_m3s", qr);
        r.power(PowerKind.VALVE, qr * (p(xs, b) - p(xs, a)));
    }
}
