package spoolwork.solver.elements;

import spoolwork.solver.numeric.Jacobian;

/**
 * Pressure-compensated flow control A → B. Its throttle, fully open, passes the set flow at the minimum drop
 * (a turbulent law Δp = r(q)); the compensator adds whatever further drop λ holds the flow at the set value.
 * Written in flow, like a {@link Branch}: p_A − p_B − r(q) − λ⁺ + λ⁻ = 0, with two complementarity pairs
 * λ⁺ ≥ 0 ⊥ set − q ≥ 0 and λ⁻ ≥ 0 ⊥ set + q ≥ 0, so reverse flow is limited alike. With less than the
 * minimum drop available the compensator is idle (λ = 0) and the valve is an open throttle.
 */
public final class FlowControl extends Element {
    /** Scale of the compensator drop in its complementarity row: the circuit's typical pressure, Pa. */
    private final double dropScale;

    private final int a;
    private final int b;
    private final double set;
    private final DropLaw open;
    private final int q;
    private final int up;
    private final int down;
    private final int[] upCols;
    private final int[] downCols;
    private final double[] dr = new double[1];
    private final double[] da = new double[2];
    private final double[] db = new double[2];

    public FlowControl(String owner, int a, int b, double setFlow, double minimumDrop, Network net) {
        super(owner);
        this.a = a;
        this.b = b;
        this.set = setFlow;
        this.open = DropLaw.rated(setFlow, minimumDrop);
        this.q = net.add(Network.Kind.FLOW, owner, net.flowRef(), net.pressureRef(), net.pressureTolerance());
        this.dropScale = net.pressureRef();
        this.up = net.add(Network.Kind.COMPLEMENTARITY, owner, net.pressureRef(), 1, 1e-9);
        this.down = net.add(Network.Kind.COMPLEMENTARITY, owner, net.pressureRef(), 1, 1e-9);
        this.upCols = new int[]{up, q};
        this.downCols = new int[]{down, q};
    }

    @Override
    public void initialGuess(double[] x, Network net) {
        x[q] = 0.5 * set;
    }

    @Override
    public void load(double[] x, double[] f, Jacobian j, Network net) {
        double flow = x[q];
        addF(f, a, -flow);
        addF(f, b, flow);
        flowJ(j, a, b, q, 1);
        double r = open.drop(flow, dr);
        f[q] = p(x, a) - p(x, b) - r - x[up] + x[down];
        addJ(j, q, a, 1);
        addJ(j, q, b, -1);
        addJ(j, q, q, -dr[0]);
        addJ(j, q, up, -1);
        addJ(j, q, down, 1);
        da[0] = 1 / dropScale;
        db[1] = -1 / set;
        net.complementarity(up, x[up] / dropScale, (set - flow) / set, upCols, da, db, f, j);
        db[1] = 1 / set;
        net.complementarity(down, x[down] / dropScale, (set + flow) / set, downCols, da, db, f, j);
    }

    @Override
    public void report(double[] x, Network net, Report r) {
        double flow = x[q];
        double dp = p(x, a) - p(x, b);
        r.flow("A", flow);
        r.flow("B", -flow);
        r.value("flow_m3s", flow);
        r.value("pressure_drop_pa", dp);
        r.value("compensator_drop_pa", x[up] - x[down]);
        r.value("regulating", Math.max(x[up], x[down]) > 1e-6 * net.pressureRef() ? 1 : 0);
        r.value("power_loss_w", flow * dp);
        r.power(PowerKind.THROTTLE, flow * dp);
    }
}
