package spoolwork.solver.elements;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Objects;

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

    /** Per unknown, in growing arrays of which the first {@link #count} entries are in use. */
    private Kind[] kinds = new Kind[16];
    private String[] owners = new String[16];
    private double[] unknownScales = new double[16];
    private double[] rowScales = new double[16];
    private double[] rowTolerances = new double[16];
    private int count;
    private final List<Element> elements = new ArrayList<>();
    /** The elements as an array for {@link #evaluate}, rebuilt when one is added. */
    private Element[] elementArray;
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

    /**
     * A network with room for about the given numbers of unknowns and elements, so that building it does
     * not grow its arrays step by step; it may still grow past them.
     */
    public Network(FluidProperties fluid, double pressureRef, double flowRef, int unknowns, int elementCount) {
        this(fluid, pressureRef, flowRef);
        if (unknowns > kinds.length) {
            kinds = new Kind[unknowns];
            owners = new String[unknowns];
            unknownScales = new double[unknowns];
            rowScales = new double[unknowns];
            rowTolerances = new double[unknowns];
        }
        ((ArrayList<Element>) elements).ensureCapacity(elementCount);
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
        if (count == kinds.length) {
            int grown = 2 * count;
            kinds = Arrays.copyOf(kinds, grown);
            owners = Arrays.copyOf(owners, grown);
            unknownScales = Arrays.copyOf(unknownScales, grown);
            rowScales = Arrays.copyOf(rowScales, grown);
            rowTolerances = Arrays.copyOf(rowTolerances, grown);
        }
        kinds[count] = kind;
        owners[count] = owner;
        unknownScales[count] = scale;
        rowScales[count] = rowScale;
        rowTolerances[count] = tolerance;
        us = null;
        return count++;
    }

    public void addElement(Element e) {
        elements.add(e);
        elementArray = null;
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
        return kinds[Objects.checkIndex(i, count)];
    }

    /** The component tag, line id or node name that unknown i and its row belong to. */
    public String owner(int i) {
        return owners[Objects.checkIndex(i, count)];
    }

    private void freeze() {
        if (us == null) {
            us = Arrays.copyOf(unknownScales, count);
            rs = Arrays.copyOf(rowScales, count);
            rt = Arrays.copyOf(rowTolerances, count);
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
        return count;
    }

    @Override
    public void evaluate(double[] x, double[] f, Jacobian j) {
        Arrays.fill(f, 0);
        Element[] es = elementArray;
        if (es == null || es.length != elements.size()) {
            es = elements.toArray(new Element[0]);
            elementArray = es;
        }
        for (Element e : es) {
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

    // ---- complementarity pairs -------------------------------------------------------------------------

    /** Side of each complementarity row in force for the Newton step: −1 unset, 0 the a side, 1 the b side. */
    private byte[] side;
    private double[] pairA;
    private double[] pairB;
    /** Columns and derivatives of both sides of each complementarity row, at the last evaluation. */
    private int[][] pairCols;
    private double[][] gradA;
    private double[][] gradB;

    /** The complementarity rows, in order; the loops over sides visit only these. */
    private int[] pairRows;

    private void pairs() {
        if (side == null) {
            int n = size();
            pairRows = java.util.stream.IntStream.range(0, n).filter(i -> kinds[i] == Kind.COMPLEMENTARITY).toArray();
            side = new byte[n];
            java.util.Arrays.fill(side, (byte) -1);
            pairA = new double[n];
            pairB = new double[n];
            pairCols = new int[n][];
            gradA = new double[n][];
            gradB = new double[n][];
            stampedAt = new int[n];
        }
    }

    /**
     * Writes complementarity row {@code row}: a ≥ 0, b ≥ 0, a·b = 0 (both dimensionless). The residual is
     * min(a, b), which is zero exactly at a solution. The Jacobian row is that of the side in force — a
     * (shut: the element's own unknown is zero) or b (open: its margin is zero) — so that each Newton step
     * solves the linearised complementarity problem once the sides are settled ({@link #switchSides}). Both
     * sides are stamped, the unused one with zeros, so the sparsity pattern never changes.
     *
     * @param cols columns the two sides depend on (−1 entries are skipped); the same array on every call
     *             for a row, never changed
     * @param da   ∂a/∂x[cols[k]]
     * @param db   ∂b/∂x[cols[k]]
     */
    public void complementarity(int row, double a, double b, int[] cols, double[] da, double[] db, double[] f,
                                Jacobian j) {
        pairs();
        if (side[row] < 0) {
            side[row] = (byte) (a <= b ? 0 : 1);
        }
        f[row] = Math.min(a, b);
        pairA[row] = a;
        pairB[row] = b;
        if (j == null) {
            return;
        }
        // an element's column list is fixed for the solve, so it is kept, not copied; the derivatives are copied
        // because elements pass them in scratch arrays
        pairCols[row] = cols;
        if (gradA[row] == null || gradA[row].length != cols.length) {
            gradA[row] = new double[cols.length];
            gradB[row] = new double[cols.length];
        }
        boolean useA = side[row] == 0;
        stampedAt[row] = j instanceof Jacobian.Kept kept ? kept.size() : -1;
        for (int k = 0; k < cols.length; k++) {
            gradA[row][k] = da[k];
            gradB[row][k] = db[k];
            if (cols[k] >= 0) {
                j.add(row, cols[k], useA ? da[k] : db[k]);
            }
        }
    }

    /** Where each complementarity row's entries start in the Jacobian it was last stamped into; −1 unknown. */
    private int[] stampedAt;

    @Override
    public boolean restampSides(Jacobian.Kept j) {
        if (side == null) {
            return true;
        }
        for (int row : pairRows) {
            if (side[row] < 0 || pairCols[row] == null) {
                continue;
            }
            int at = stampedAt[row];
            if (at < 0) {
                return false;
            }
            boolean useA = side[row] == 0;
            int[] cols = pairCols[row];
            for (int k = 0; k < cols.length; k++) {
                if (cols[k] >= 0) {
                    j.set(at++, useA ? gradA[row][k] : gradB[row][k]);
                }
            }
        }
        return true;
    }

    @Override
    public void beginRun() {
        if (side != null) {
            for (int row : pairRows) {
                side[row] = -1;
            }
        }
    }

    @Override
    public void stepResiduals(double[] f, double[] out) {
        System.arraycopy(f, 0, out, 0, f.length);
        if (side == null) {
            return;
        }
        for (int i : pairRows) {
            if (side[i] >= 0) {
                out[i] = side[i] == 0 ? pairA[i] : pairB[i];
            }
        }
    }

    @Override
    public int switchSides(double[] dx, boolean onlyWorst) {
        if (side == null) {
            return 0;
        }
        if (previousSide == null) {
            previousSide = new byte[side.length];
        }
        for (int i : pairRows) {
            previousSide[i] = side[i];
        }
        int switched = 0;
        int worst = -1;
        double worstValue = 0;
        for (int i : pairRows) {
            if (side[i] < 0 || pairCols[i] == null) {
                continue;
            }
            double a = pairA[i];
            double b = pairB[i];
            int[] cols = pairCols[i];
            for (int k = 0; k < cols.length; k++) {
                if (cols[k] >= 0) {
                    a += gradA[i][k] * dx[cols[k]];
                    b += gradB[i][k] * dx[cols[k]];
                }
            }
            // the side in force is zero after the step; the other must not go negative
            double free = side[i] == 0 ? b : a;
            if (free < -SIDE_SLACK) {
                if (onlyWorst) {
                    if (free < worstValue) {
                        worstValue = free;
                        worst = i;
                    }
                } else {
                    side[i] = (byte) (1 - side[i]);
                }
                switched++;
            }
        }
        if (onlyWorst && worst >= 0) {
            side[worst] = (byte) (1 - side[worst]);
            return 1;
        }
        return switched;
    }

    @Override
    public void undoSwitch() {
        if (previousSide != null) {
            for (int i : pairRows) {
                side[i] = previousSide[i];
            }
        }
    }

    private byte[] previousSide;

    /** How far below zero the predicted free side may go before the row changes side (dimensionless). */
    private static final double SIDE_SLACK = 1e-12;

    @Override
    public boolean eliminable(int i) {
        return kind(i) == Kind.FLOW;
    }

    @Override
    public boolean switchesSides(int i) {
        return kind(i) == Kind.COMPLEMENTARITY;
    }

    @Override
    public boolean isPressure(int i) {
        return kind(i) == Kind.PRESSURE;
    }
}
