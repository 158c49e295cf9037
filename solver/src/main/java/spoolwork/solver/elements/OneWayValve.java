package spoolwork.solver.elements;

import spoolwork.solver.numeric.Jacobian;

/**
 * A valve path that passes flow q ≥ 0 from node a to node b only, written as a complementarity condition
 * q ≥ 0 ⊥ m(p, q) ≥ 0, where the margin m (Pa) is what the inlet pressure lacks for the valve to open
 * further (see {@link Network#complementarity}). Exact at the closed/open switch, no smoothing.
 */
public abstract class OneWayValve extends Element {
    /**
     * Scale of the margin in the complementarity row, Pa: the circuit's typical pressure, so that the row's
     * pressure derivatives are of the same size as the node rows' and one pivot order suits both sides.
     */
    private final double marginScale;
    /** Corner width of smooth max/min inside margins, Pa. */
    static final double CORNER = 100;

    protected final int a;
    protected final int b;
    protected final int x;
    protected final String portA;
    protected final String portB;
    protected final double qs;
    protected final int q;

    protected OneWayValve(String owner, int a, String portA, int b, String portB, int pilot, double flowScale,
                          Network net) {
        super(owner);
        this.a = a;
        this.b = b;
        this.x = pilot;
        this.portA = portA;
        this.portB = portB;
        this.qs = flowScale;
        this.q = net.add(Network.Kind.COMPLEMENTARITY, owner, net.flowRef(), 1, 1e-9);
        this.marginScale = net.pressureRef();
        this.cols = new int[]{q, a, b, pilot};
    }

    /** Margin in Pa; d gets ∂m/∂p_a, ∂m/∂p_b, ∂m/∂p_x, ∂m/∂q. */
    protected abstract double margin(double pa, double pb, double px, double flow, double[] d);

    /** Where the power this path absorbs goes. */
    protected abstract PowerKind kind();

    @Override
    public void load(double[] xs, double[] f, Jacobian j, Network net) {
        double flow = xs[q];
        addF(f, a, -flow);
        addF(f, b, flow);
        flowJ(j, a, b, q, 1);
        double m = margin(p(xs, a), p(xs, b), p(xs, x), flow, dm);
        // a side: the flow (shut when zero); b side: the margin (open when zero); columns q, a, b, x
        da[0] = 1 / qs;
        db[0] = dm[3] / marginScale;
        db[1] = dm[0] / marginScale;
        db[2] = dm[1] / marginScale;
        db[3] = dm[2] / marginScale;
        net.complementarity(q, flow / qs, m / marginScale, cols, da, db, f, j);
    }

    private final int[] cols;
    /** Scratch for the margins' inner derivatives. */
    protected final double[] t1 = new double[1];
    protected final double[] s2 = new double[2];
    private final double[] dm = new double[4];
    private final double[] da = new double[4];
    private final double[] db = new double[4];

    @Override
    public void report(double[] xs, Network net, Report r) {
        double flow = xs[q];
        r.flow(portA, flow);
        r.flow(portB, -flow);
        r.power(kind(), flow * (p(xs, a) - p(xs, b)));
    }

    public double flow(double[] xs) {
        return xs[q];
    }

    /** Relief valve P → T: opens at cracking, then Δp = p_crack + (override/rated)·q. */
    public static final class Relief extends OneWayValve {
        private final double crack;
        private final double slope;

        public Relief(String owner, int p, int t, double crack, double override, double rated, Network net) {
            super(owner, p, "P", t, "T", -1, rated, net);
            this.crack = crack;
            this.slope = override / rated;
        }

        @Override
        protected double margin(double pa, double pb, double px, double flow, double[] d) {
            d[0] = -1;
            d[1] = 1;
            d[2] = 0;
            d[3] = slope;
            return crack + slope * flow - (pa - pb);
        }

        @Override
        protected PowerKind kind() {
            return PowerKind.RELIEF;
        }

        /** Starting half open lets Newton find the relieving pressure at once instead of creeping up to it. */
        @Override
        public void initialGuess(double[] xs, Network net) {
            xs[q] = 0.5 * net.flowRef();
        }

        @Override
        public void report(double[] xs, Network net, Report r) {
            super.report(xs, net, r);
            double flow = xs[q];
            r.value("bypass_flow_m3s", flow);
            r.value("power_loss_w", flow * (p(xs, a) - p(xs, b)));
        }
    }

    /** Check valve A → B: opens at its cracking difference, then a turbulent drop sized at rated flow. */
    public static final class Check extends OneWayValve {
        private final double crack;
        private final DropLaw law;
        private final PowerKind kind;

        public Check(String owner, int a, String portA, int b, String portB, double crack, DropLaw law,
                     double rated, PowerKind kind, Network net) {
            super(owner, a, portA, b, portB, -1, rated, net);
            this.crack = crack;
            this.law = law;
            this.kind = kind;
        }

        @Override
        protected double margin(double pa, double pb, double px, double flow, double[] d) {
            double[] t = t1;
            double r = law.drop(flow, t);
            d[0] = -1;
            d[1] = 1;
            d[2] = 0;
            d[3] = t[0];
            return crack + r - (pa - pb);
        }

        @Override
        protected PowerKind kind() {
            return kind;
        }
    }

    /**
     * Sequence valve P → A: holds its inlet at the cracking pressure plus override while the outlet is
     * lower; once the outlet needs more, it is wide open with a turbulent drop. A counterbalance valve is
     * the same law with pilot assistance.
     */
    public static class Sequence extends OneWayValve {
        private final double crack;
        private final double ratio;
        private final double slope;
        private final DropLaw open;

        public Sequence(String owner, int p, int a, double crack, double override, double rated, Network net) {
            this(owner, p, "P", a, "A", -1, crack, 0, override, rated, net);
        }

        /** With a pilot port x whose pressure, times the ratio, helps to open the valve. */
        protected Sequence(String owner, int in, String portIn, int out, String portOut, int x, double crack,
                           double ratio, double override, double rated, Network net) {
            super(owner, in, portIn, out, portOut, x, rated, net);
            this.crack = crack;
            this.ratio = ratio;
            this.slope = override / rated;
            this.open = DropLaw.rated(rated, Math.max(override, 1e5));
        }

        @Override
        protected double margin(double pa, double pb, double px, double flow, double[] d) {
            double[] t = t1;
            double r = open.drop(flow, t);
            double[] s = s2;
            double need = Laws.smoothMax(crack - ratio * px + slope * flow, pb + r, CORNER, s);
            d[0] = -1;
            d[1] = s[1];
            d[2] = -ratio * s[0];
            d[3] = s[0] * slope + s[1] * t[0];
            return need - pa;
        }

        @Override
        protected PowerKind kind() {
            return PowerKind.VALVE;
        }
    }

    /**
     * Pressure-reducing valve P → A: holds its outlet at the setting less the override share of the flow;
     * with the inlet below that, it is wide open with a turbulent drop.
     */
    public static final class Reducing extends OneWayValve {
        private final double setting;
        private final double slope;
        private final DropLaw open;

        public Reducing(String owner, int p, int a, double setting, double override, double rated, Network net) {
            super(owner, p, "P", a, "A", -1, rated, net);
            this.setting = setting;
            this.slope = override / rated;
            this.open = DropLaw.rated(rated, Math.max(override, 1e5));
        }

        @Override
        protected double margin(double pa, double pb, double px, double flow, double[] d) {
            double[] t = t1;
            double r = open.drop(flow, t);
            double[] s = s2;
            double held = Laws.smoothMin(setting - slope * flow, pa - r, CORNER, s);
            d[0] = -s[1];
            d[1] = 1;
            d[2] = 0;
            d[3] = s[0] * slope + s[1] * t[0];
            return pb - held;
        }

        @Override
        protected PowerKind kind() {
            return PowerKind.VALVE;
        }
    }

    /**
     * Counterbalance valve, controlled path A → B: opens when p_A + pilot ratio·p_X reaches the setting,
     * then rises with its override; wide open it has a turbulent drop.
     */
    public static final class Counterbalance extends Sequence {
        public Counterbalance(String owner, int a, int b, int x, double setting, double ratio, double override,
                              double rated, Network net) {
            super(owner, a, "A", b, "B", x, setting, ratio, override, rated, net);
        }
    }
}
