package spoolwork.model;

/**
 * The hydraulic fluid.
 *
 * @param isoVg          ISO 3448 viscosity grade (kinematic viscosity in mm²/s at 40 °C), e.g. 46
 * @param viscosityIndex ASTM D2270 viscosity index
 * @param temperature    working temperature, °C
 * @param density        density at 15 °C, kg/m³
 */
public record Fluid(double isoVg, double viscosityIndex, double temperature, double density) {
    public static final double MIN_VG = 2, MAX_VG = 1500;
    public static final double MIN_VI = 0, MAX_VI = 400;
    public static final double MIN_T = -40, MAX_T = 150;
    public static final double MIN_RHO = 600, MAX_RHO = 1400;

    /** Mineral oil ISO VG 46, VI 100, at 50 °C, 870 kg/m³ (common-practice values). */
    public static Fluid standard() {
        return new Fluid(46, 100, 50, 870);
    }
}
