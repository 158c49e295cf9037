package spoolwork.solver.elements;

import spoolwork.solver.numeric.Jacobian;

/**
 * A cylinder or motor: its rate u (piston velocity m/s, or shaft speed rev/s, positive extending or
 * forward A → B) takes flow cA·u into port A and gives cB·u out of port B. Its hydraulic force (or
 * torque) is kA·p_A − kB·p_B; with F the constant load it balances kA·p_A − kB·p_B − F = R·sign(u), where
 * R is the resistive load plus seal friction.
 *
 * <p>With R = 0 and free to move this is a plain force balance. Otherwise u = u⁺ − u⁻ and each part is a
 * complementarity condition, u⁺ ≥ 0 ⊥ R − (net) ≥ 0 and u⁻ ≥ 0 ⊥ R + (net) ≥ 0: the actuator stays still
 * while |net| ≤ R and moves when the pressure overcomes it. Held at an end stop, the part moving into
 * the stop is absent, so it can only move away from the stop.
 */
public final class Actuator extends Element {
    /** How the rate is represented. */
    public enum Mode { PLAIN, SPLIT, BRAKED }

    private final int a;
    private final int b;
    private final double cA;
    private final double cB;
    private final double kA;
    private final double kB;
    private final double constant;
    private final double resistive;
    private final double friction;
    private final double leak;
    private final double forceScale;
    private final boolean motor;
    private final int plus;
    private final int minus;

    /**
     * @param constantLoad load force or torque that acts whatever the motion (N or N·m)
     * @param resistiveLoad magnitude of a load that only opposes motion (N or N·m)
     * @param friction     magnitude of seal friction, a loss (N or N·m)
     * @param leak         laminar leakage conductance A → B, m³/(s·Pa)
     * @param allowPlus    false when held at the end the positive direction runs into
     * @param allowMinus   false when held at the other end
     */
    public Actuator(String owner, boolean motor, int a, int b, double cA, double cB, double kA, double kB,
                    double constantLoad, double resistiveLoad, double friction, double leak, boolean allowPlus,
                    boolean allowMinus, Network net) {
        super(owner);
        this.motor = motor;
        this.a = a;
        this.b = b;
        this.cA = cA;
        this.cB = cB;
        this.kA = kA;
        this.kB = kB;
        this.constant = constantLoad;
        this.resistive = Math.abs(resistiveLoad);
        this.friction = Math.abs(friction);
        this.leak = leak;
        double c = Math.max(cA, cB);
        double k = Math.max(kA, kB);
        this.forceScale = net.pressureRef() * k;
        double rateScale = net.flowRef() / c;
        Network.Kind kind = motor ? Network.Kind.SPEED : Network.Kind.VELOCITY;
        double r = this.resistive + this.friction;
        if (allowPlus && allowMinus && r == 0) {
            plus = net.add(kind, owner, rateScale, forceScale, 1e-9 * forceScale);
            minus = -1;
            mode = Mode.PLAIN;
        } else if (!allowPlus && !allowMinus) {
            plus = -1;
            minus = -1;
            mode = Mode.BRAKED;
        } else {
            plus = allowPlus ? net.add(Network.Kind.COMPLEMENTARITY, owner, rateScale, 1, 1e-9) : -1;
            minus = allowMinus ? net.add(Network.Kind.COMPLEMENTARITY, owner, rateScale, 1, 1e-9) : -1;
            mode = Mode.SPLIT;
        }
        this.rateScale = rateScale;
        this.plusCols = new int[]{plus, a, b};
        this.minusCols = new int[]{minus, a, b};
    }

    private final int[] plusCols;
    private final int[] minusCols;

    private final Mode mode;
    private final double rateScale;

    public Mode mode() {
        return mode;
    }

    /** Rate at the solution: m/s for a cylinder, rev/s for a motor. */
    public double rate(double[] x) {
        double u = 0;
        if (plus >= 0) {
            u += x[plus];
        }
        if (minus >= 0 && mode == Mode.SPLIT) {
            u -= x[minus];
        }
        return u;
    }

    @Override
    public void load(double[] x, double[] f, Jacobian j, Network net) {
        double u = rate(x);
        double pa = p(x, a);
        double pb = p(x, b);
        // flows: cA·u into A, cB·u out of B
        addF(f, a, -cA * u);
        addF(f, b, cB * u);
        if (plus >= 0) {
            addJ(j, a, plus, -cA);
            addJ(j, b, plus, cB);
        }
        if (minus >= 0) {
            addJ(j, a, minus, cA);
            addJ(j, b, minus, -cB);
        }
        if (leak > 0) {
            double q = leak * (pa - pb);
            addF(f, a, -q);
            addF(f, b, q);
            flowJ(j, a, b, a, leak);
            flowJ(j, a, b, b, -leak);
        }
        double net0 = kA * pa - kB * pb - constant;
        double r = resistive + friction;
        if (mode == Mode.PLAIN) {
            f[plus] = net0;
            addJ(j, plus, a, kA);
            addJ(j, plus, b, -kB);
            return;
        }
        // a side: the rate part (still when zero); b side: the force margin (moving when zero)
        if (plus >= 0) {
            da[0] = 1 / rateScale;
            db[1] = -kA / forceScale;
            db[2] = kB / forceScale;
            net.complementarity(plus, x[plus] / rateScale, (r - net0) / forceScale, plusCols, da, db, f, j);
        }
        if (minus >= 0) {
            da[0] = 1 / rateScale;
            db[1] = kA / forceScale;
            db[2] = -kB / forceScale;
            net.complementarity(minus, x[minus] / rateScale, (r + net0) / forceScale, minusCols, da, db, f, j);
        }
    }

    private final double[] da = new double[3];
    private final double[] db = new double[3];

    @Override
    public void report(double[] x, Network net, Report rep) {
        double u = rate(x);
        double pa = p(x, a);
        double pb = p(x, b);
        double q = leak * (pa - pb);
        rep.flow("A", cA * u + q);
        if (cB > 0) {
            rep.flow("B", -cB * u - q);
        }
        double hydraulic = kA * pa - kB * pb;
        double omega = motor ? 2 * Math.PI * u : u;
        if (motor) {
            rep.value("speed_rpm", u * 60);
            rep.value("torque_nm", hydraulic);
            // mechanical loss: ideal torque D·Δp/2π less shaft torque
            double ideal = cA * (pa - pb) * u;
            rep.power(PowerKind.ACTUATOR, ideal - hydraulic * omega);
            rep.power(PowerKind.LEAKAGE, q * (pa - pb));
        } else {
            rep.value("velocity_mps", u);
            rep.value("force_n", hydraulic);
        }
        rep.value(motor ? "load_nm" : "load_n", constant + resistive * Math.signum(u));
        rep.power(PowerKind.USEFUL, constant * omega + resistive * Math.abs(omega));
        rep.power(PowerKind.ACTUATOR, friction * Math.abs(omega));
    }
}
