package spoolwork.solver.elements;

import spoolwork.solver.numeric.Jacobian;

/**
 * Positive-displacement pump S → P. Geometric flow D·n less a laminar internal leakage G·(p_P − p_S),
 * with G set so that the volumetric efficiency holds at the reference pressure. A pressure-compensated
 * pump keeps full displacement below its setting and destrokes linearly to zero over its band: its stroke
 * is k = u − λ₁ + λ₀ with u = (setting + band − p)/band and two complementarity pairs, λ₁ ≥ 0 ⊥ 1 − k ≥ 0
 * (on its stop at full stroke) and λ₀ ≥ 0 ⊥ k ≥ 0 (fully destroked), exact at both corners. Its leakage
 * goes to the case drain L when that is connected.
 * Input power is the hydraulic power over the overall efficiency.
 */
public final class Pump extends Element {
    private final int s;
    private final int pp;
    private final int l;
    private final double geometric;
    private final double g;
    private final boolean compensated;
    private final double setting;
    private final double band;
    private final double overall;
    private final double speed;
    /** Multipliers of the full-stroke and zero-stroke stops of a compensated pump; −1 for a fixed pump. */
    private final int full;
    private final int empty;
    private final int[] fullCols;
    private final int[] emptyCols;
    private final double[] da = new double[3];
    private final double[] db = new double[3];

    /**
     * @param speed      shaft speed, rev/s
     * @param drain      case drain node, or Integer.MIN_VALUE when leakage stays inside the pump
     */
    public Pump(String owner, int s, int p, int drain, double displacement, double speed, double volumetric,
                double overall, double referencePressure, boolean compensated, double setting, double band,
                Network net) {
        super(owner);
        this.s = s;
        this.pp = p;
        this.l = drain;
        this.speed = speed;
        this.geometric = displacement * speed;
        this.g = (1 - volumetric) * geometric / referencePressure;
        this.compensated = compensated;
        this.setting = setting;
        this.band = band;
        this.overall = overall;
        this.full = compensated ? net.add(Network.Kind.COMPLEMENTARITY, owner, 1, 1, 1e-9) : -1;
        this.empty = compensated ? net.add(Network.Kind.COMPLEMENTARITY, owner, 1, 1, 1e-9) : -1;
        this.fullCols = new int[]{full, p, empty};
        this.emptyCols = new int[]{empty, p, full};
    }

    private boolean drained() {
        return l != Integer.MIN_VALUE;
    }

    /** Stroke fraction 0 … 1 at outlet pressure p and the stops' multipliers in x; d[0] = derivative by p. */
    private double stroke(double[] x, double p, double[] d) {
        if (!compensated) {
            d[0] = 0;
            return 1;
        }
        d[0] = -1 / band;
        return (setting + band - p) / band - x[full] + x[empty];
    }

    @Override
    public void load(double[] x, double[] f, Jacobian j, Network net) {
        double ps = p(x, s);
        double pOut = p(x, pp);
        double[] d = db;
        double k = stroke(x, pOut, d);
        double dk = d[0];
        double qg = net.sourceScale() * geometric * k;
        double dqg = net.sourceScale() * geometric * dk;
        if (compensated) {
            double gs = net.sourceScale() * geometric;
            addJ(j, s, full, gs);
            addJ(j, pp, full, -gs);
            addJ(j, s, empty, -gs);
            addJ(j, pp, empty, gs);
            // full-stroke stop: λ₁ ⊥ 1 − k; columns λ₁, p, λ₀
            da[0] = 1;
            db[0] = 1;
            db[1] = 1 / band;
            db[2] = -1;
            net.complementarity(full, x[full], 1 - k, fullCols, da, db, f, j);
            // zero-stroke stop: λ₀ ⊥ k; columns λ₀, p, λ₁
            db[0] = 1;
            db[1] = -1 / band;
            db[2] = -1;
            net.complementarity(empty, x[empty], k, emptyCols, da, db, f, j);
        }
        int leakTo = drained() ? l : s;
        double pl = p(x, leakTo);
        double leak = g * (pOut - pl);
        // geometric flow S → P
        addF(f, s, -qg);
        addF(f, pp, qg);
        flowJ(j, s, pp, pp, dqg);
        // leakage P → S or L
        addF(f, pp, -leak);
        addF(f, leakTo, leak);
        flowJ(j, pp, leakTo, pp, g);
        flowJ(j, pp, leakTo, leakTo, -g);
    }

    @Override
    public void report(double[] x, Network net, Report r) {
        double ps = p(x, s);
        double pOut = p(x, pp);
        double k = stroke(x, pOut, new double[1]);
        double qg = net.sourceScale() * geometric * k;
        double pl = drained() ? p(x, l) : ps;
        double leak = g * (pOut - pl);
        double qp = qg - leak;
        double qs = drained() ? qg : qg - leak;
        r.flow("S", qs);
        r.flow("P", -qp);
        if (drained()) {
            r.flow("L", -leak);
        }
        double hyd = pOut * qp + (drained() ? pl * leak : 0) - ps * qs;
        double input = hyd >= 0 ? hyd / overall : hyd * overall;
        r.value("flow_m3s", qp);
        r.value("geometric_flow_m3s", geometric * net.sourceScale());
        r.value("stroke", k);
        r.value("speed_rpm", speed * 60);
        r.value("hydraulic_power_w", hyd);
        r.value("input_power_w", input);
        r.value("power_loss_w", input - hyd);
        r.value("inlet_pressure_abs_pa", ps + 101_325);
        r.value("leakage_flow_m3s", leak);
    }
}
