package spoolwork.solver.elements;

/**
 * Smooth scalar laws with their derivatives. Each method returns the value and writes derivatives into
 * {@code d} (d[0] by the first argument, d[1] by the second).
 */
public final class Laws {
    private Laws() {
    }

    /** Smooth maximum (a + b + √((a−b)² + ε²))/2; within ε/2 of max(a,b). */
    public static double smoothMax(double a, double b, double eps, double[] d) {
        double s = Math.sqrt((a - b) * (a - b) + eps * eps);
        d[0] = 0.5 * (1 + (a - b) / s);
        d[1] = 0.5 * (1 - (a - b) / s);
        return 0.5 * (a + b + s);
    }

    /** Smooth minimum (a + b − √((a−b)² + ε²))/2; within ε/2 of min(a,b). */
    public static double smoothMin(double a, double b, double eps, double[] d) {
        double s = Math.sqrt((a - b) * (a - b) + eps * eps);
        d[0] = 0.5 * (1 - (a - b) / s);
        d[1] = 0.5 * (1 + (a - b) / s);
        return 0.5 * (a + b - s);
    }

    /** Smooth clamp of u to [0, 1] with corner width ε; d[0] = derivative by u. */
    public static double smoothUnit(double u, double eps, double[] d) {
        double[] t = new double[2];
        double lo = smoothMax(u, 0, eps, t);
        double dlo = t[0];
        double v = smoothMin(lo, 1, eps, t);
        d[0] = t[0] * dlo;
        return v;
    }

    /**
     * Turbulent drop with a laminar core: Δp = k·q·√(q² + qt²). It tends to k·q·|q| above qt and to the
     * linear k·qt·q below it, so the law is smooth and strictly increasing; d[0] = dΔp/dq.
     */
    public static double quadraticDrop(double k, double q, double qt, double[] d) {
        double s = Math.sqrt(q * q + qt * qt);
        d[0] = k * (2 * q * q + qt * qt) / s;
        return k * q * s;
    }

    /**
     * Flow through an orifice-type path written in pressure: q = K·Δp/(Δp² + Δpt²)^¼, the C∞ blend of
     * the laminar and square-root laws (K·√|Δp| above Δpt); d[0] = dq/dΔp.
     */
    public static double orificeFlow(double kq, double dp, double dpt, double[] d) {
        double s = dp * dp + dpt * dpt;
        double r = Math.pow(s, 0.25);
        d[0] = kq * (0.5 * dp * dp + dpt * dpt) / (r * s);
        return kq * dp / r;
    }
}
