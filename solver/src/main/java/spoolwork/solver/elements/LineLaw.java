package spoolwork.solver.elements;

/**
 * Darcy–Weisbach loss in a round line: Δp = f·(L/D)·ρ·v·|v|/2 with f = 64/Re laminar and the Haaland
 * (1983) explicit form of Colebrook turbulent, blended by a smoothstep in Re across 2,000 … 4,000 (the
 * critical zone, common practice). Laminar flow is exactly Hagen–Poiseuille, so the law is linear and
 * well conditioned near zero flow.
 */
public final class LineLaw implements DropLaw {
    /** Reynolds number where the laminar law starts to give way (common practice). */
    public static final double RE_LAMINAR = 2000;
    /** Reynolds number above which the turbulent law holds alone (common practice). */
    public static final double RE_TURBULENT = 4000;

    private final double d;
    private final double length;
    private final double rho;
    private final double nu;
    private final double relRoughness;
    private final double area;
    /** Parts of {@link #drop} that depend on the line alone, each written as the law writes it. */
    private final double lamPerVelocity;
    private final double dSquared;
    private final double dlam;
    private final double nuArea;
    private final double dyn;
    /** The roughness term of the Haaland form, (ε/D / 3.7)^1.11. */
    private final double roughTerm;

    private static final double LN10 = Math.log(10);

    /**
     * @param diameter  inner diameter, m
     * @param length    length, m
     * @param density   kg/m³
     * @param viscosity kinematic viscosity, m²/s
     * @param roughness absolute wall roughness, m
     */
    public LineLaw(double diameter, double length, double density, double viscosity, double roughness) {
        this.d = diameter;
        this.length = length;
        this.rho = density;
        this.nu = viscosity;
        this.relRoughness = roughness / diameter;
        this.area = Math.PI * diameter * diameter / 4;
        this.lamPerVelocity = 32 * rho * nu * length;
        this.dSquared = d * d;
        this.dlam = 32 * rho * nu * length / (d * d * area);
        this.nuArea = nu * area;
        this.dyn = length / d * rho / 2;
        this.roughTerm = Math.pow(relRoughness / 3.7, 1.11);
    }

    /** Mean velocity at flow q, m/s. */
    public double velocity(double q) {
        return q / area;
    }

    /** Reynolds number at flow q. */
    public double reynolds(double q) {
        return Math.abs(q) / area * d / nu;
    }

    /** Haaland friction factor at Reynolds number re; df[0] = df/dRe. */
    public static double haaland(double re, double relRoughness, double[] df) {
        double xx = Math.pow(relRoughness / 3.7, 1.11) + 6.9 / re;
        double lg = Math.log10(xx);
        double f = 1 / (3.24 * lg * lg);
        double dxdre = -6.9 / (re * re);
        df[0] = -2 / (3.24 * lg * lg * lg) / (xx * LN10) * dxdre;
        return f;
    }

    /** Darcy friction factor at Reynolds number re, blended between laminar and turbulent. */
    public double frictionFactor(double re) {
        if (re <= 0) {
            return Double.POSITIVE_INFINITY;
        }
        double s = Math.min(1, Math.max(0, (re - RE_LAMINAR) / (RE_TURBULENT - RE_LAMINAR)));
        double w = s * s * (3 - 2 * s);
        double ft = w > 0 ? haaland(re, relRoughness, new double[1]) : 0;
        return (1 - w) * 64 / re + w * ft;
    }

    @Override
    public double drop(double q, double[] dd) {
        double v = q / area;
        double lam = lamPerVelocity * v / dSquared;
        double re = Math.abs(v) * d / nu;
        if (re <= RE_LAMINAR) {
            dd[0] = dlam;
            return lam;
        }
        double dre = Math.signum(q) * d / nuArea;
        double s = Math.min(1, (re - RE_LAMINAR) / (RE_TURBULENT - RE_LAMINAR));
        double w = s * s * (3 - 2 * s);
        double dw = re < RE_TURBULENT ? 6 * s * (1 - s) / (RE_TURBULENT - RE_LAMINAR) * dre : 0;
        // the Haaland form as in haaland(), with its roughness term worked out once per line
        double xx = roughTerm + 6.9 / re;
        double lg = Math.log10(xx);
        double f = 1 / (3.24 * lg * lg);
        double dxdre = -6.9 / (re * re);
        double df = -2 / (3.24 * lg * lg * lg) / (xx * LN10) * dxdre;
        double turb = f * dyn * v * Math.abs(v);
        double dturb = dyn * (df * dre * v * Math.abs(v) + f * 2 * Math.abs(v) / area);
        dd[0] = (1 - w) * dlam + w * dturb + dw * (turb - lam);
        return (1 - w) * lam + w * turb;
    }
}
