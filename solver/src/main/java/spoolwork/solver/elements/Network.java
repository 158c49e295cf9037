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

    // Complementarity rows are kept by slot (their place among those rows), each with its two sides' values
    // and, in three flat arrays, the columns and derivatives of both sides: the loops over sides after every
    // linear solve read them in order instead of through an array per row.
    /** The row of each slot, in row order. */
    private int[] pairRows;
    /** The slot of each row; −1 for the other rows. */
    private int[] slotOf;
    /** Side of each slot in force for the Newton step: −1 unset, 0 the a side, 1 the b side. */
    private byte[] side;
    /** The side each slot's Jacobian entries were last written for. */
    private byte[] stampedSide;
    private double[] pairA;
    private double[] pairB;
    /** Where each slot's columns start in the flat arrays; −1 before its first Jacobian. */
    private int[] segStart;
    private int[] segLength;
    /** The column list each slot's segment was copied from (elements pass the same array every time). */
    private int[][] segSource;
    private int[] flatCols;
    private double[] flatA;
    private double[] flatB;
    private int flatUsed;
    /** Where each slot's entries start in the Jacobian it was last stamped into; −1 unknown. */
    private int[] stampedAt;
    private byte[] previousSide;

    private void pairs() {
        if (side == null) {
            int n = size();
            pairRows = java.util.stream.IntStream.range(0, n).filter(i -> kinds[i] == Kind.COMPLEMENTARITY).toArray();
            int slots = pairRows.length;
            slotOf = new int[n];
            Arrays.fill(slotOf, -1);
            for (int s = 0; s < slots; s++) {
                slotOf[pairRows[s]] = s;
            }
            side = new byte[slots];
            Arrays.fill(side, (byte) -1);
            stampedSide = new byte[slots];
            previousSide = new byte[slots];
            pairA = new double[slots];
            pairB = new double[slots];
            segStart = new int[slots];
            Arrays.fill(segStart, -1);
            segLength = new int[slots];
            segSource = new int[slots][];
            stampedAt = new int[slots];
            int room = Math.max(16, 4 * slots);
            flatCols = new int[room];
            flatA = new double[room];
            flatB = new double[room];
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
        int s = slotOf[row];
        if (side[s] < 0) {
            side[s] = (byte) (a <= b ? 0 : 1);
        }
        f[row] = Math.min(a, b);
        pairA[s] = a;
        pairB[s] = b;
        if (j == null) {
            return;
        }
        // an element's column list is fixed for the solve, so it is copied once; the derivatives every time,
        // because elements pass them in scratch arrays
        int at = segStart[s];
        if (segSource[s] != cols) {
            if (at < 0 || segLength[s] != cols.length) {
                at = flatUsed;
                flatUsed += cols.length;
                if (flatUsed > flatCols.length) {
                    int room = Math.max(2 * flatCols.length, flatUsed);
                    flatCols = Arrays.copyOf(flatCols, room);
                    flatA = Arrays.copyOf(flatA, room);
                    flatB = Arrays.copyOf(flatB, room);
                }
                segStart[s] = at;
                segLength[s] = cols.length;
            }
            System.arraycopy(cols, 0, flatCols, at, cols.length);
            segSource[s] = cols;
        }
        boolean useA = side[s] == 0;
        stampedAt[s] = j instanceof Jacobian.Kept kept ? kept.size() : -1;
        stampedSide[s] = side[s];
        for (int k = 0; k < cols.length; k++) {
            flatA[at + k] = da[k];
            flatB[at + k] = db[k];
            if (cols[k] >= 0) {
                j.add(row, cols[k], useA ? da[k] : db[k]);
            }
        }
    }

    /** Rewrites the entries of the rows whose side changed since they were stamped; the others hold already. */
    @Override
    public boolean restampSides(Jacobian.Kept j) {
        if (side == null) {
            return true;
        }
        for (int s = 0; s < side.length; s++) {
            if (side[s] < 0 || segStart[s] < 0 || side[s] == stampedSide[s]) {
                continue;
            }
            int at = stampedAt[s];
            if (at < 0) {
                return false;
            }
            double[] grad = side[s] == 0 ? flatA : flatB;
            for (int t = segStart[s], end = t + segLength[s]; t < end; t++) {
                if (flatCols[t] >= 0) {
                    j.set(at++, grad[t]);
                }
            }
            stampedSide[s] = side[s];
        }
        return true;
    }

    @Override
    public void beginRun() {
        if (side != null) {
            Arrays.fill(side, (byte) -1);
        }
    }

    @Override
    public void stepResiduals(double[] f, double[] out) {
        System.arraycopy(f, 0, out, 0, f.length);
        if (side == null) {
            return;
        }
        for (int s = 0; s < side.length; s++) {
            if (side[s] >= 0) {
                out[pairRows[s]] = side[s] == 0 ? pairA[s] : pairB[s];
            }
        }
    }

    @Override
    public int switchSides(double[] dx, boolean onlyWorst) {
        if (side == null) {
            return 0;
        }
        System.arraycopy(side, 0, previousSide, 0, side.length);
        int switched = 0;
        int worst = -1;
        double worstValue = 0;
        for (int s = 0; s < side.length; s++) {
            if (side[s] < 0 || segStart[s] < 0) {
                continue;
            }
            double a = pairA[s];
            double b = pairB[s];
            for (int t = segStart[s], end = t + segLength[s]; t < end; t++) {
                int c = flatCols[t];
                if (c >= 0) {
                    a += flatA[t] * dx[c];
                    b += flatB[t] * dx[c];
                }
            }
            // the side in force is zero after the step; the other must not go negative
            double free = side[s] == 0 ? b : a;
            if (free < -SIDE_SLACK) {
                if (onlyWorst) {
                    if (free < worstValue) {
                        worstValue = free;
                        worst = s;
                    }
                } else {
                    side[s] = (byte) (1 - side[s]);
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
        if (side != null) {
            System.arraycopy(previousSide, 0, side, 0, side.length);
        }
    }

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
