package spoolwork.solver.elements;

import java.util.ArrayList;
import java.util.List;

import spoolwork.solver.fluid.FluidProperties;
import spoolwork.solver.numeric.Jacobian;
import spoolwork.solver.numeric.NonlinearSystem;

/**
 * The circuit as a square system: unknowns (node pressures and the elements' own unknowns) each paired
 * with one row. Continuation parameters (source scale, extra node conductance) are set between Newton runs.
 */
public final class Network implements NonlinearSystem {
    /** Kind of an unknown, which fixes its scale and the tolerance of its row. */
    public enum Kind { PRESSURE, FLOW, VELOCITY, SPEED, COMPLEMENTARITY }

    private final List<Kind> kinds = new ArrayList<>();
    private final List<String> owners = new ArrayList<>();
    private final List<double[]> scales = new ArrayList<>();
    private final List<Element> elements = new ArrayList<>();
    private final FluidProperties fluid;
    private final double pressureRef;
    private final double flowRef;
    private double sourceScale = 1;
    private double extraConductance = 0;
    private double[] us;
    private double[] rs;
    private double[] rt;

    public Network(FluidProperties fluid, double pressureRef, double flowRef) {
        this.fluid = fluid;
        this.pressureRef = pressureRef;
        this.flowRef = flowRef;
    }

    /** Adds a node pressure unknown with its flow-balance row. */
    public int addNode(String name) {
        return add(Kind.PRESSURE, name, pressureRef, flowRef, flowTolerance());
    }

    /**
     * Adds an unknown of an element with its row.
     *
     * @param scale     typical size of the unknown, in its unit
     * @param rowScale  typical size of the row, in its unit
     * @param tolerance row tolerance, in the row's unit
     */
    public int add(Kind kind, String owner, double scale, double rowScale, double tolerance) {
        kinds.add(kind);
        owners.add(owner);
        scales.add(new double[]{scale, rowScale, tolerance});
        us = null;
        return kinds.size() - 1;
    }

    public void addElement(Element e) {
        elements.add(e);
    }

    public List<Element> elements() {
        return elements;
    }

    public FluidProperties fluid() {
        return fluid;
    }

    /** Typical pressure of the circuit, Pa. */
    public double pressureRef() {
        return pressureRef;
    }

    /** Typical flow of the circuit (total pump flow), m³/s. */
    public double flowRef() {
        return flowRef;
    }

    /** Tolerance of a node's flow balance: 1e-9 of the total pump flow, at least 1e-15 m³/s. */
    public double flowTolerance() {
        return Math.max(1e-9 * flowRef, 1e-15);
    }

    /** Tolerance of a pressure-law row, Pa. */
    public double pressureTolerance() {
        return 1e-9 * pressureRef;
    }

    /** Scale of pump flows for source stepping, 0 … 1. */
    public double sourceScale() {
        return sourceScale;
    }

    public void setSourceScale(double s) {
        sourceScale = s;
    }

    /** Extra conductance from every node to the reservoir during gmin stepping, m³/(s·Pa). */
    public double extraConductance() {
        return extraConductance;
    }

    public void setExtraConductance(double g) {
        extraConductance = g;
    }

    public Kind kind(int i) {
        return kinds.get(i);
    }

    /** The component tag, line id or node name that unknown i and its row belong to. */
    public String owner(int i) {
        return owners.get(i);
    }

    private void freeze() {
        if (us == null) {
            int n = kinds.size();
            us = new double[n];
            rs = new double[n];
            rt = new double[n];
            for (int i = 0; i < n; i++) {
                us[i] = scales.get(i)[0];
                rs[i] = scales.get(i)[1];
                rt[i] = scales.get(i)[2];
            }
        }
    }

    /** The starting point of Newton: pressures zero, elements' own unknowns as they choose. */
    public double[] initialGuess() {
        double[] x = new double[size()];
        for (Element e : elements) {
            e.initialGuess(x, this);
        }
        return x;
    }

    @Override
    public int size() {
        return kinds.size();
    }

    @Override
    public void evaluate(double[] x, double[] f, Jacobian j) {
        java.util.Arrays.fill(f, 0);
        for (Element e : elements) {
            e.load(x, f, j, this);
        }
    }

    @Override
    public double unknownScale(int i) {
        freeze();
        return us[i];
    }

    @Override
    public double rowTolerance(int i) {
        freeze();
        return rt[i];
    }

    @Override
    public double rowScale(int i) {
        freeze();
        return rs[i];
    }

    @Override
    public boolean eliminable(int i) {
        return kinds.get(i) == Kind.FLOW;
    }

    @Override
    public boolean isPressure(int i) {
        return kinds.get(i) == Kind.PRESSURE;
    }
}
