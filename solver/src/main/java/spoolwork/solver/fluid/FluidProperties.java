package spoolwork.solver.fluid;

import spoolwork.model.Fluid;

/**
 * Kinematic viscosity and density of the working fluid at its working temperature.
 *
 * <p>Viscosity follows the ASTM D341 (Walther) form log10(log10(ν + 0.7)) = A − B·log10(T), ν in mm²/s,
 * T in kelvin, through two points: ν at 40 °C equal to the ISO 3448 grade, and ν at 100 °C found from the
 * viscosity index with the ASTM D2270 relations (L and H from the quadratic fits of its Appendix X2).
 * Density falls with temperature by a volumetric expansion coefficient of 6.5e-4 per kelvin, a typical
 * value for mineral oil (from memory).
 */
public final class FluidProperties {
    /** Volumetric thermal expansion of mineral oil, 1/K (from memory). */
    public static final double EXPANSION = 6.5e-4;

    private final double nu40;
    private final double nu100;
    private final double a;
    private final double b;
    private final double temperature;
    private final double density;
    private final double kinematicViscosity;

    public FluidProperties(Fluid fluid) {
        this.nu40 = fluid.isoVg();
        this.nu100 = viscosityAt100(fluid.isoVg(), fluid.viscosityIndex());
        double x1 = Math.log10(313.15);
        double x2 = Math.log10(373.15);
        double y1 = Math.log10(Math.log10(nu40 + 0.7));
        double y2 = Math.log10(Math.log10(nu100 + 0.7));
        this.b = (y1 - y2) / (x2 - x1);
        this.a = y1 + b * x1;
        this.temperature = fluid.temperature();
        this.density = fluid.density() / (1 + EXPANSION * (fluid.temperature() - 15));
        this.kinematicViscosity = viscosityMm2s(fluid.temperature()) * 1e-6;
    }

    /** Walther constant A of the ASTM D341 line. */
    public double walterA() {
        return a;
    }

    /** Walther constant B of the ASTM D341 line. */
    public double walterB() {
        return b;
    }

    /** Kinematic viscosity at 100 °C, mm²/s. */
    public double viscosityAt100() {
        return nu100;
    }

    /** Kinematic viscosity at the given temperature, mm²/s. */
    public double viscosityMm2s(double celsius) {
        double z = Math.pow(10, Math.pow(10, a - b * Math.log10(celsius + 273.15)));
        return z - 0.7;
    }

    /** Kinematic viscosity at the working temperature, m²/s. */
    public double kinematicViscosity() {
        return kinematicViscosity;
    }

    /** Dynamic viscosity at the working temperature, Pa·s. */
    public double dynamicViscosity() {
        return kinematicViscosity * density;
    }

    /** Density at the working temperature, kg/m³. */
    public double density() {
        return density;
    }

    /** Working temperature, °C. */
    public double temperature() {
        return temperature;
    }

    // ASTM D2270 Table X2.1: L = a·Y² + b·Y + c and H = d·Y² + e·Y + f over ranges of Y = ν100 in mm²/s.
    private static final double[][] X21 = {
            {2.0, 3.8, 1.14673, 1.7576, -0.109, 0.84155, 1.5521, -0.077},
            {3.8, 4.4, 3.38095, -15.4952, 33.196, 0.78571, 1.7929, -0.183},
            {4.4, 5.0, 2.5000, -7.2143, 13.812, 0.82143, 1.5679, 0.119},
            {5.0, 6.4, 0.10100, 16.6350, -45.469, 0.04985, 9.1613, -18.557},
            {6.4, 7.0, 3.35714, -23.5643, 78.466, 0.22619, 7.7369, -16.656},
            {7.0, 7.7, 0.01191, 21.4750, -72.870, 0.79762, -0.7321, 14.610},
            {7.7, 9.0, 0.41858, 16.1558, -56.040, 0.05794, 10.5156, -28.240},
            {9.0, 12.0, 0.88779, 7.5527, -16.600, 0.26665, 6.7015, -10.810},
            {12.0, 15.0, 0.76720, 10.7972, -38.180, 0.20073, 8.4658, -22.490},
            {15.0, 18.0, 0.97305, 5.3135, -2.200, 0.28889, 5.9741, -4.930},
            {18.0, 22.0, 0.97256, 5.2500, -0.980, 0.24504, 7.4160, -16.730},
            {22.0, 28.0, 0.91413, 7.4759, -21.820, 0.20323, 9.1267, -34.230},
            {28.0, 40.0, 0.87031, 9.7157, -50.770, 0.18411, 10.1015, -46.750},
            {40.0, 55.0, 0.84703, 12.6752, -133.310, 0.17029, 11.4866, -80.620},
            {55.0, 70.0, 0.85921, 11.1009, -83.190, 0.17130, 11.3680, -76.940},
            {70.0, Double.POSITIVE_INFINITY, 0.83531, 14.6731, -216.246, 0.16841, 11.8493, -96.947},
    };

    /** ASTM D2270 L and H for a viscosity at 100 °C (mm²/s, at least 2). */
    static double[] lh(double y) {
        double[] row = X21[0];
        for (double[] r : X21) {
            if (y >= r[0] && y <= r[1]) {
                row = r;
                break;
            }
        }
        if (y > 70) {
            row = X21[X21.length - 1];
        }
        return new double[]{row[2] * y * y + row[3] * y + row[4], row[5] * y * y + row[6] * y + row[7]};
    }

    /** Viscosity at 40 °C (mm²/s) that an oil with the given ν100 and viscosity index has, by ASTM D2270. */
    static double u40(double y, double vi) {
        double[] lh = lh(y);
        if (vi <= 100) {
            return lh[0] - vi / 100 * (lh[0] - lh[1]);
        }
        double n = Math.log10((vi - 100) * 0.00715 + 1);
        return lh[1] / Math.pow(y, n);
    }

    /**
     * The viscosity at 100 °C of an oil with viscosity u (mm²/s) at 40 °C and the given viscosity index,
     * by bisection on the ASTM D2270 relation (U rises with Y at a fixed index).
     */
    public static double viscosityAt100(double u, double vi) {
        double lo = 2.0;
        double hi = Math.max(2.0, u);
        if (u40(lo, vi) >= u) {
            // Thinner than the table covers: keep the Walther slope of a VI 100 oil at ν100 = 2 mm²/s.
            return lo * u / u40(lo, vi);
        }
        while (u40(hi, vi) < u) {
            hi *= 2;
            if (hi > 1e6) {
                return hi;
            }
        }
        for (int i = 0; i < 200 && hi - lo > 1e-12 * hi; i++) {
            double mid = 0.5 * (lo + hi);
            if (u40(mid, vi) < u) {
                lo = mid;
            } else {
                hi = mid;
            }
        }
        return 0.5 * (lo + hi);
    }
}
