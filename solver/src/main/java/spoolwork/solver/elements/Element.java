package spoolwork.solver.elements;

import spoolwork.solver.numeric.Jacobian;

/**
 * One element's share of the equations ("stamp"): it adds its flows into the node rows, writes its own
 * rows, and adds the analytic derivatives of everything it wrote. Node row residual = Σ flows into the
 * node (m³/s). Index −1 is the reservoir (0 Pa gauge); writes there are dropped.
 */
public abstract class Element {
    /** The component tag or line id this element belongs to. */
    public final String owner;

    protected Element(String owner) {
        this.owner = owner;
    }

    /** Adds residuals into f and Jacobian entries into j (j may be null). */
    public abstract void load(double[] x, double[] f, Jacobian j, Network net);

    /** Writes a starting value for this element's own unknowns into x (default: rest, zero). */
    public void initialGuess(double[] x, Network net) {
    }

    /** Reports flows, values and power at the solution x. */
    public abstract void report(double[] x, Network net, Report r);

    protected static double p(double[] x, int i) {
        return i < 0 ? 0 : x[i];
    }

    protected static void addF(double[] f, int i, double v) {
        if (i >= 0) {
            f[i] += v;
        }
    }

    protected static void addJ(Jacobian j, int r, int c, double v) {
        if (j != null && r >= 0 && c >= 0) {
            j.add(r, c, v);
        }
    }

    /** Stamps a flow q from node a to node b whose derivative by unknown c is dq. */
    protected static void flowJ(Jacobian j, int a, int b, int c, double dq) {
        addJ(j, a, c, -dq);
        addJ(j, b, c, dq);
    }
}
