package spoolwork.solver.elements;

/** A pressure drop as a strictly increasing, odd function of flow: Δp = r(q). */
public interface DropLaw {
    /** Δp in Pa at flow q in m³/s; d[0] = dΔp/dq. */
    double drop(double q, double[] d);

    /** Quadratic (turbulent) law from a rated flow at a rated drop, with a laminar core below 0.1 % of rated. */
    static DropLaw rated(double ratedFlow, double ratedDrop) {
        double k = ratedDrop / (ratedFlow * ratedFlow);
        double qt = 1e-3 * ratedFlow;
        return (q, d) -> Laws.quadraticDrop(k, q, qt, d);
    }

    /** Sharp-edged orifice: Δp = ρ/(2·Cd²·A²)·q·|q| with a laminar core below flow qt. */
    static DropLaw orifice(double cd, double diameter, double density, double qt) {
        double area = Math.PI * diameter * diameter / 4;
        double k = density / (2 * cd * cd * area * area);
        return (q, d) -> Laws.quadraticDrop(k, q, qt, d);
    }

    /** Linear law Δp = R·q. */
    static DropLaw linear(double r) {
        return (q, d) -> {
            d[0] = r;
            return r * q;
        };
    }
}
