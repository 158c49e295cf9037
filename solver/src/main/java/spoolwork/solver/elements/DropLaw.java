package spoolwork.solver.elements;

/** A pressure drop as a strictly increasing, odd function of flow: Δp = r(q). */
public interface DropLaw {
    /** Δp in Pa at flow q in m³/s; d[0] = dΔp/dq. */
    double drop(double q, double[] d);

    /**
     * A flow of the size this path typically carries, m³/s, or 0 when none is known. Newton starts the
     * branch there rather than at rest: at rest a turbulent law's slope is nearly zero, so the first step
     * would predict a flow orders of magnitude too large and then need many halvings to come back.
     */
    default double typicalFlow() {
        return 0;
    }

    /** Quadratic (turbulent) law from a rated flow at a rated drop, with a laminar core below 0.1 % of rated. */
    static DropLaw rated(double ratedFlow, double ratedDrop) {
        double k = ratedDrop / (ratedFlow * ratedFlow);
        return quadratic(k, 1e-3 * ratedFlow, ratedFlow);
    }

    /**
     * Sharp-edged orifice: Δp = ρ/(2·Cd²·A²)·q·|q| with a laminar core below flow qt. Its typical flow is
     * the one at a 10 bar drop, a usual throttling drop (common practice).
     */
    static DropLaw orifice(double cd, double diameter, double density, double qt) {
        double area = Math.PI * diameter * diameter / 4;
        double k = density / (2 * cd * cd * area * area);
        return quadratic(k, qt, Math.sqrt(10e5 / k));
    }

    /** Δp = k·q·√(q² + qt²) (see {@link Laws#quadraticDrop}) with the given typical flow. */
    private static DropLaw quadratic(double k, double qt, double typical) {
        return new DropLaw() {
            @Override
            public double drop(double q, double[] d) {
                return Laws.quadraticDrop(k, q, qt, d);
            }

            @Override
            public double typicalFlow() {
                return typical;
            }
        };
    }

    /** Linear law Δp = R·q. */
    static DropLaw linear(double r) {
        return (q, d) -> {
            d[0] = r;
            return r * q;
        };
    }
}
