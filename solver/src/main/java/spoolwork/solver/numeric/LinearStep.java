package spoolwork.solver.numeric;

import java.util.Arrays;

import org.ejml.data.DMatrixRMaj;
import org.ejml.data.DMatrixSparseCSC;
import org.ejml.data.DMatrixSparseTriplet;
import org.ejml.interfaces.linsol.LinearSolver;
import org.ejml.interfaces.linsol.LinearSolverSparse;
import org.ejml.ops.DConvertMatrixStruct;
import org.ejml.sparse.FillReducing;
import org.ejml.sparse.csc.CommonOps_DSCC;
import org.ejml.sparse.csc.factory.LinearSolverFactory_DSCC;
import org.ejml.dense.row.factory.LinearSolverFactory_DDRM;

/**
 * Collects Jacobian entries of one Newton iteration and solves J·dx = b for the step, in scaled units.
 * The sparse path condenses the system, numbers the kept unknowns once per sparsity pattern (minimum degree
 * by default, whose elimination also gives the patterns of L and U for the first factorisation) and factors
 * with {@link SparseLu}, which reuses its pivot order and patterns from one iteration to the next. The
 * fallback for systems that cannot be condensed uses EJML's sparse LU with {@link FillReducing#NONE} after
 * reverse Cuthill–McKee: EJML's own orderings are not safe with its LU.
 */
final class LinearStep implements Jacobian.Kept {
    private final int n;
    private final boolean dense;
    private Triplets current;
    private Triplets trial;
    private boolean bandOrdering;

    private final boolean[] eliminable;
    /** Unknowns of complementarity rows, numbered after a neighbour (see Ordering#minimumDegree). */
    private final boolean[] delayed;

    LinearStep(int n, LinearMethod method, NonlinearSystem s) {
        this.n = n;
        // generated circuits have 3.6 entries per unknown; the buffers grow if need be
        this.current = new Triplets(Math.max(256, 4 * n));
        this.trial = new Triplets(Math.max(256, 4 * n));
        this.dense = method == LinearMethod.DENSE || (method == LinearMethod.AUTO && n <= LinearMethod.DENSE_LIMIT);
        this.eliminable = new boolean[n];
        this.outputs = dense ? null : new double[2][n];
        this.delayed = new boolean[n];
        if (s != null && !dense) {
            for (int i = 0; i < n; i++) {
                eliminable[i] = s.eliminable(i);
                delayed[i] = s.switchesSides(i);
            }
        }
    }



    void clear() {
        current.reset();
    }

    /** Jacobian entries in the order they arrived; entries for the same place are summed later. */
    private static final class Triplets implements Jacobian.Kept {
        int[] rows;
        int[] cols;
        double[] vals;
        int count;
        /** True while no entry has been added since the pattern was last found to fit the plan. */
        boolean fitted;
        /** Changes whenever entries are added or dropped; rewriting values through set() keeps it. */
        int generation;
        /** Indices rewritten through set() with a new value since the last condensation, in order. */
        int[] rewritten = new int[16];
        int rewrites;

        Triplets(int capacity) {
            rows = new int[capacity];
            cols = new int[capacity];
            vals = new double[capacity];
        }

        @Override
        public void add(int row, int col, double value) {
            if (row < 0 || col < 0) {
                return;
            }
            fitted = false;
            generation++;
            if (count == rows.length) {
                rows = Arrays.copyOf(rows, count * 2);
                cols = Arrays.copyOf(cols, count * 2);
                vals = Arrays.copyOf(vals, count * 2);
            }
            rows[count] = row;
            cols[count] = col;
            vals[count] = value;
            count++;
        }

        @Override
        public int size() {
            return count;
        }

        @Override
        public void set(int index, double value) {
            if (vals[index] == value) {
                return;
            }
            vals[index] = value;
            if (rewrites == rewritten.length && rewrites < count / 4) {
                rewritten = Arrays.copyOf(rewritten, 2 * rewrites);
            }
            if (rewrites < rewritten.length) {
                rewritten[rewrites] = index;
            }
            // past a quarter of the entries only the count goes on: too many to apply one by one
            rewrites++;
        }

        void reset() {
            count = 0;
            fitted = false;
            generation++;
            rewrites = 0;
        }
    }

    /**
     * A second, empty set of entries for a trial point of the line search, so that the accepted trial's
     * Jacobian is kept (by {@link #acceptSpare()}) instead of evaluating the system again there.
     */
    Jacobian spare() {
        trial.reset();
        return trial;
    }

    /** Makes the entries last written through {@link #spare()} the current ones. */
    void acceptSpare() {
        Triplets t = current;
        current = trial;
        trial = t;
        trial.reset();
    }

    @Override
    public void add(int row, int col, double value) {
        current.add(row, col, value);
    }

    @Override
    public int size() {
        return current.count;
    }

    @Override
    public void set(int index, double value) {
        current.set(index, value);
    }

    /**
     * Numbers the condensed matrix by reverse Cuthill–McKee instead of minimum degree from the next new
     * sparsity pattern on (for comparing the fill of the two).
     */
    void useBandOrdering(boolean band) {
        if (band != bandOrdering) {
            bandOrdering = band;
            plan = null;
        }
    }

    /** Entries of L and U of the last condensed factorisation; 0 when there is none. */
    int condensedFactorEntries() {
        return plan == null || plan.lu == null ? 0 : plan.lu.factorEntries();
    }

    /**
     * Solves (R⁻¹·J·C)·y = rhs for y, R = diag(rowScale), C = diag(colScale); returns null when the matrix
     * is singular or the answer is not finite. On the sparse path the returned array is one of two that
     * this object takes in turn: it stays valid until the second solve after this one.
     */
    double[] solve(double[] rhs, double[] rowScale, double[] colScale) {
        reusable = false;
        double[] y = dense ? solveDense(rhs, rowScale, colScale) : solveSparse(rhs, rowScale, colScale);
        reusable = y != null && (dense ? denseLu != null : reusable);
        return y;
    }

    /** True while the matrix of the last successful {@link #solve} is kept factorised for {@link #solveAgain}. */
    private boolean reusable;
    /** The dense factorisation of the last dense solve. */
    private LinearSolver<DMatrixRMaj, DMatrixRMaj> denseLu;

    /** True when {@link #solveAgain} can answer. */
    boolean canSolveAgain() {
        return reusable;
    }

    /**
     * Solves with the matrix of the last successful {@link #solve} (same scales), whatever entries arrived
     * since: a chord step. Returns null when there is no such matrix or the answer is not finite.
     */
    double[] solveAgain(double[] rhs) {
        if (!reusable) {
            return null;
        }
        return dense ? denseSubstitute(denseLu, rhs) : substitute(plan, rhs, false);
    }

    private double[] solveDense(double[] rhs, double[] rowScale, double[] colScale) {
        int[] rows = current.rows;
        int[] cols = current.cols;
        double[] vals = current.vals;
        int count = current.count;
        DMatrixRMaj a = new DMatrixRMaj(n, n);
        double[] d = a.data;
        for (int k = 0; k < count; k++) {
            d[rows[k] * n + cols[k]] += vals[k] * colScale[cols[k]] / rowScale[rows[k]];
        }
        LinearSolver<DMatrixRMaj, DMatrixRMaj> lu = LinearSolverFactory_DDRM.lu(n);
        denseLu = null;
        if (!lu.setA(a)) {
            return null;
        }
        denseLu = lu;
        return denseSubstitute(lu, rhs);
    }

    /** The answer for rhs from a dense factorisation; null when it is not finite. */
    private double[] denseSubstitute(LinearSolver<DMatrixRMaj, DMatrixRMaj> lu, double[] rhs) {
        DMatrixRMaj b = new DMatrixRMaj(n, 1);
        System.arraycopy(rhs, 0, b.data, 0, n);
        DMatrixRMaj x = new DMatrixRMaj(n, 1);
        lu.solve(b, x);
        return finite(x.data) ? x.data : null;
    }

    /**
     * Sparse path. Branch flows are eliminated first (static condensation, exact): their 1×1 pivots are the
     * drop laws' slopes, which never vanish, and what is left is a nodal system about half the size. The
     * entries arrive in the same order every iteration, so where each one lands in the reduced matrix is
     * worked out once and later iterations only fill in numbers.
     */
    private double[] solveSparse(double[] rhs, double[] rowScale, double[] colScale) {
        int[] rows = current.rows;
        int[] cols = current.cols;
        double[] vals = current.vals;
        int count = current.count;
        // entries only rewritten through set() since the last check keep their places
        if (plan == null || !(current.fitted && plan.checked == current) && !plan.fits(rows, cols, count)) {
            plan = Plan.make(n, eliminable, delayed, rows, cols, count, bandOrdering);
            if (plan == null) {
                current.fitted = false;
                return solveSparseFull(rhs, rowScale, colScale);
            }
        }
        current.fitted = true;
        Plan pl = plan;
        pl.checked = current;
        double[] sc = pl.scales(rows, cols, rowScale, colScale);
        if (pl.condensed == current && pl.condensedGeneration == current.generation && pl.scalesKept
                && pl.update(current)) {
            current.rewrites = 0;
            return factorAndSubstitute(pl, rhs, true);
        }
        pl.condensed = null;
        double[] pivot = pl.pivot;
        double[] rowVal = pl.rowVal;
        double[] colVal = pl.colVal;
        double[] nz = pl.values;
        Arrays.fill(pivot, 0);
        Arrays.fill(nz, 0);
        // the entries split by role once in the plan, so that each loop does one thing; the factor
        // colScale/rowScale of each entry is kept while the scales stay the same
        int[] idx = pl.byRole;
        int[] dst = pl.byRoleDest;
        for (int t = 0, end = pl.roleEnd[Plan.KEPT]; t < end; t++) {
            nz[dst[t]] += vals[idx[t]] * sc[t];
        }
        for (int t = pl.roleEnd[Plan.KEPT], end = pl.roleEnd[Plan.PIVOT]; t < end; t++) {
            int k = idx[t];
            pivot[rows[k]] += vals[k] * sc[t];
        }
        for (int t = pl.roleEnd[Plan.PIVOT], end = pl.roleEnd[Plan.ROW]; t < end; t++) {
            rowVal[dst[t]] = vals[idx[t]] * sc[t];
        }
        for (int t = pl.roleEnd[Plan.ROW], end = pl.roleEnd[Plan.COL]; t < end; t++) {
            colVal[dst[t]] = vals[idx[t]] * sc[t];
        }
        int f = 0;
        for (int e = 0; e < pl.elim.length; e++) {
            int k = pl.elim[e];
            double d = pivot[k];
            if (!(Math.abs(d) > 1e-300)) {
                return solveSparseFull(rhs, rowScale, colScale);
            }
            for (int c = pl.colStart[e]; c < pl.colStart[e + 1]; c++) {
                double factor = colVal[c] / d;
                for (int r = pl.rowStart[e]; r < pl.rowStart[e + 1]; r++) {
                    nz[pl.fill[f++]] -= factor * rowVal[r];
                }
            }
        }
        pl.condensed = current;
        pl.condensedGeneration = current.generation;
        current.rewrites = 0;
        System.arraycopy(vals, 0, pl.condensedValues, 0, count);
        return factorAndSubstitute(pl, rhs, false);
    }

    /**
     * Factors the plan's condensed matrix and solves for rhs. {@code updated}: the matrix was brought up to
     * date by {@link Plan#update}, which lists the entries it touched, so the factorisation starts from those.
     */
    private double[] factorAndSubstitute(Plan pl, double[] rhs, boolean updated) {
        if (pl.lu == null) {
            pl.lu = pl.lStart == null ? new SparseLu(pl.m, pl.colPtr, pl.rowIdx, null)
                    : new SparseLu(pl.m, pl.colPtr, pl.rowIdx, pl.lStart, pl.lRows);
        }
        if (!(updated ? pl.lu.factorChanged(pl.values, pl.touched, pl.touchedCount) : pl.lu.factor(pl.values))) {
            return null;
        }
        double[] out = substitute(pl, rhs, updated);
        reusable = out != null;
        return out;
    }

    /**
     * The step for the right-hand side rhs with the plan's condensed matrix as last factorised: condense rhs,
     * solve for the kept unknowns, then back-substitute the eliminated ones. {@code updated}: the factorisation
     * is that of {@link Plan#update} after the last solve, whose answer then starts this one.
     */
    private double[] substitute(Plan pl, double[] rhs, boolean updated) {
        double[] pivot = pl.pivot;
        double[] rowVal = pl.rowVal;
        double[] colVal = pl.colVal;
        int[] keptIndex = pl.keptIndex;
        int m = pl.m;
        double[] y = pl.y;
        for (int j = 0; j < m; j++) {
            y[j] = rhs[keptIndex[j]];
        }
        int[] colRowPlace = pl.colRowPlace;
        for (int e = 0; e < pl.elim.length; e++) {
            int k = pl.elim[e];
            double rk = rhs[k] / pivot[k];
            if (rk != 0) {
                for (int c = pl.colStart[e]; c < pl.colStart[e + 1]; c++) {
                    y[colRowPlace[c]] -= colVal[c] * rk;
                }
            }
        }
        if (updated) {
            pl.lu.solveChanged(y, y);
        } else {
            pl.lu.solve(y, y);
        }
        // two output arrays in turn, so that the step of the round before stays valid (Newton keeps it)
        double[] out = outputs[nextOutput];
        nextOutput = 1 - nextOutput;
        boolean finite = true;
        for (int j = 0; j < m; j++) {
            double v = y[j];
            finite &= Double.isFinite(v);
            out[keptIndex[j]] = v;
        }
        for (int e = 0; e < pl.elim.length; e++) {
            int k = pl.elim[e];
            double sum = rhs[k];
            for (int r = pl.rowStart[e]; r < pl.rowStart[e + 1]; r++) {
                sum -= rowVal[r] * out[pl.rowCol[r]];
            }
            double v = sum / pivot[k];
            finite &= Double.isFinite(v);
            out[k] = v;
        }
        return finite ? out : null;
    }

    private final double[][] outputs;
    private int nextOutput;

    /** The current sparsity pattern's condensation, numbering, work arrays and factorisation. */
    private Plan plan;

    /** Where each Jacobian entry goes in the condensed, renumbered sparse matrix. */
    private static final class Plan {
        static final byte KEPT = 0;
        static final byte PIVOT = 1;
        static final byte ROW = 2;
        static final byte COL = 3;

        int[] rowsSeen;
        int[] colsSeen;
        int m;
        /** Position of each kept unknown in the factorised matrix (after renumbering); −1 if eliminated. */
        int[] place;
        /** The unknown at each position of the factorised matrix (place inverted). */
        int[] keptIndex;
        /** Position of the kept row of each column slot of an eliminated unknown. */
        int[] colRowPlace;
        /** Entry indices grouped by role (kept, pivot, row, column), the group ends and each entry's dest. */
        int[] byRole;
        int[] byRoleDest;
        int[] roleEnd;
        /** The entries last found to fit this plan (valid while they report no additions). */
        Triplets checked;
        /**
         * The entries whose values the condensed matrix holds, at which generation, and those values: when
         * only entries of kept rows were rewritten since (a complementarity row changing side), the condensed
         * matrix is brought up to date entry by entry instead of condensed again.
         */
        Triplets condensed;
        int condensedGeneration;
        double[] condensedValues;
        /** Slot of each entry in byRole order. */
        int[] slotOf;
        /** True when the last call of scales() found the scales the same as before. */
        boolean scalesKept;

        /**
         * Applies the entries rewritten since the condensation to the condensed matrix; false (and nothing
         * changed) when one of them is in the row of an eliminated unknown, or there are too many to track.
         */
        boolean update(Triplets t) {
            if (t.rewrites > t.rewritten.length) {
                return false;
            }
            int keptEnd = roleEnd[KEPT];
            int rowEnd = roleEnd[ROW];
            for (int r = 0; r < t.rewrites; r++) {
                int slot = slotOf[t.rewritten[r]];
                if (slot >= keptEnd && slot < rowEnd) {
                    return false;
                }
            }
            double[] sc = byRoleScale;
            touchedCount = 0;
            for (int r = 0; r < t.rewrites; r++) {
                int k = t.rewritten[r];
                int slot = slotOf[k];
                double v = t.vals[k] * sc[slot];
                double old = condensedValues[k] * sc[slot];
                condensedValues[k] = t.vals[k];
                if (slot < keptEnd) {
                    touch(byRoleDest[slot]);
                    values[byRoleDest[slot]] += v - old;
                    continue;
                }
                // a kept row's entry in an eliminated column: its share of the fill changes with it
                int c = byRoleDest[slot];
                int e = colOwner[c];
                double change = (v - colVal[c]) / pivot[elim[e]];
                colVal[c] = v;
                int f = fillAt[c];
                for (int q = rowStart[e]; q < rowStart[e + 1]; q++) {
                    touch(fill[f]);
                    values[fill[f++]] -= change * rowVal[q];
                }
            }
            return true;
        }

        /** Entries of the condensed matrix the last {@link #update} wrote to, in touchedCount. */
        int[] touched = new int[16];
        int touchedCount;

        private void touch(int entry) {
            if (touchedCount == touched.length) {
                touched = Arrays.copyOf(touched, 2 * touchedCount);
            }
            touched[touchedCount++] = entry;
        }

        /** For each column slot: the eliminated unknown it belongs to, and where its fill entries start. */
        int[] colOwner;
        int[] fillAt;
        /** colScale[col] / rowScale[row] of each entry in byRole order, for the scales last seen. */
        private double[] byRoleScale;
        private double[] rowScaleSeen;
        private double[] colScaleSeen;

        double[] scales(int[] rows, int[] cols, double[] rowScale, double[] colScale) {
            scalesKept = byRoleScale != null && Arrays.equals(rowScale, rowScaleSeen)
                    && Arrays.equals(colScale, colScaleSeen);
            if (!scalesKept) {
                rowScaleSeen = rowScale.clone();
                colScaleSeen = colScale.clone();
                byRoleScale = new double[byRole.length];
                for (int t = 0; t < byRole.length; t++) {
                    int k = byRole[t];
                    byRoleScale[t] = colScale[cols[k]] / rowScale[rows[k]];
                }
            }
            return byRoleScale;
        }
        int[] elim;
        int[] rowStart;
        int[] rowCol;
        int[] colStart;
        int[] colRow;
        int[] fill;
        int rowSlots;
        int colSlots;
        /** Pattern of the condensed matrix (compressed columns, rows sorted) in the new numbering. */
        int[] colPtr;
        int[] rowIdx;
        // work arrays of solveSparse, refilled every iteration
        double[] values;
        double[] pivot;
        double[] rowVal;
        double[] colVal;
        double[] y;
        SparseLu lu;
        /** Pattern of L found by the minimum degree elimination (see Ordering.Elimination); null for RCM. */
        int[] lStart;
        int[] lRows;

        boolean fits(int[] rows, int[] cols, int count) {
            return count == rowsSeen.length && Arrays.equals(rows, 0, count, rowsSeen, 0, count)
                    && Arrays.equals(cols, 0, count, colsSeen, 0, count);
        }

        static Plan make(int n, boolean[] eliminable, boolean[] delayed, int[] rows, int[] cols, int count,
                         boolean band) {
            Plan p = new Plan();
            p.rowsSeen = Arrays.copyOf(rows, count);
            p.colsSeen = Arrays.copyOf(cols, count);
            // kept[i]: number of kept unknown i, or −1 − (its place among the eliminated ones)
            int[] kept = new int[n];
            int m = 0;
            int ne = 0;
            for (int i = 0; i < n; i++) {
                kept[i] = eliminable[i] ? -1 - ne++ : m++;
            }
            p.m = m;
            p.elim = new int[ne];
            for (int i = 0; i < n; i++) {
                if (kept[i] < 0) {
                    p.elim[-1 - kept[i]] = i;
                }
            }
            // one pass sorts the entries by role and counts each eliminated unknown's row and column entries
            int[] rc = new int[ne + 1];
            int[] cc = new int[ne + 1];
            byte[] role = new byte[count];
            int[] roleEnd = new int[4];
            for (int k = 0; k < count; k++) {
                int kr = kept[rows[k]];
                int kc = kept[cols[k]];
                byte r;
                if (kr >= 0) {
                    if (kc >= 0) {
                        r = KEPT;
                    } else {
                        r = COL;
                        cc[-kc]++;
                    }
                } else if (kc >= 0) {
                    r = ROW;
                    rc[-kr]++;
                } else if (kr == kc) {
                    r = PIVOT;
                } else {
                    return null;
                }
                role[k] = r;
                roleEnd[r]++;
            }
            for (int e = 0; e < ne; e++) {
                rc[e + 1] += rc[e];
                cc[e + 1] += cc[e];
            }
            for (int r = 1; r < 4; r++) {
                roleEnd[r] += roleEnd[r - 1];
            }
            int keptEntries = roleEnd[KEPT];
            p.roleEnd = roleEnd;
            p.rowStart = rc;
            p.colStart = cc;
            p.rowSlots = rc[ne];
            p.colSlots = cc[ne];
            p.rowCol = new int[p.rowSlots];
            p.colRow = new int[p.colSlots];
            p.byRole = new int[count];
            p.byRoleDest = new int[count];
            int fills = 0;
            for (int e = 0; e < ne; e++) {
                fills += (cc[e + 1] - cc[e]) * (rc[e + 1] - rc[e]);
            }
            // entries of the condensed matrix in kept numbering, kept ones first (in arrival order) and then
            // the fill-ins; each column's entries form a linked list
            int total = keptEntries + fills;
            int[] entRow = new int[total];
            int[] entNext = new int[total];
            int[] colHead = new int[m];
            Arrays.fill(colHead, -1);
            int[] at = {0, roleEnd[KEPT], roleEnd[PIVOT], roleEnd[ROW]};
            int[] rf = Arrays.copyOf(rc, ne);
            int[] cf = Arrays.copyOf(cc, ne);
            for (int k = 0; k < count; k++) {
                byte r = role[k];
                int slot = at[r]++;
                p.byRole[slot] = k;
                if (r == KEPT) {
                    int c = kept[cols[k]];
                    entRow[slot] = kept[rows[k]];
                    entNext[slot] = colHead[c];
                    colHead[c] = slot;
                } else if (r == ROW) {
                    int e = -1 - kept[rows[k]];
                    p.byRoleDest[slot] = rf[e];
                    p.rowCol[rf[e]++] = cols[k];
                } else if (r == COL) {
                    int e = -1 - kept[cols[k]];
                    p.byRoleDest[slot] = cf[e];
                    p.colRow[cf[e]++] = rows[k];
                }
            }
            int t = keptEntries;
            for (int e = 0; e < ne; e++) {
                for (int c = cc[e]; c < cc[e + 1]; c++) {
                    int row = kept[p.colRow[c]];
                    for (int r = rc[e]; r < rc[e + 1]; r++) {
                        int col = kept[p.rowCol[r]];
                        entRow[t] = row;
                        entNext[t] = colHead[col];
                        colHead[col] = t++;
                    }
                }
            }
            // unique entries, column by column (kept numbering, rows unsorted); uniqueOf[t] for each entry
            int[] uStart = new int[m + 1];
            int[] uRow = new int[total];
            int[] uCol = new int[total];
            int[] uniqueOf = new int[total];
            int[] seenIn = new int[m];
            int[] seenAt = new int[m];
            Arrays.fill(seenIn, -1);
            int unique = 0;
            for (int c = 0; c < m; c++) {
                uStart[c] = unique;
                for (int s = colHead[c]; s >= 0; s = entNext[s]) {
                    int row = entRow[s];
                    if (seenIn[row] != c) {
                        seenIn[row] = c;
                        seenAt[row] = unique;
                        uRow[unique] = row;
                        uCol[unique++] = c;
                    }
                    uniqueOf[s] = seenAt[row];
                }
            }
            uStart[m] = unique;
            // unknowns numbered after a neighbour: complementarity ones, and those whose own row does not hold
            // them (an actuator's velocity appears only in its nodes' flow balances), so that eliminating the
            // neighbour first fills in their diagonal and the first factorisation can pivot on it
            boolean[] hasDiagonal = new boolean[m];
            for (int u = 0; u < unique; u++) {
                if (uRow[u] == uCol[u]) {
                    hasDiagonal[uRow[u]] = true;
                }
            }
            boolean[] keptDelayed = new boolean[m];
            for (int i = 0; i < n; i++) {
                if (kept[i] >= 0) {
                    keptDelayed[kept[i]] = delayed[i] || !hasDiagonal[kept[i]];
                }
            }
            Ordering.Elimination elimination = band ? null : new Ordering.Elimination();
            int[] perm = band ? Ordering.reverseCuthillMcKee(m, uRow, uCol, unique)
                    : Ordering.minimumDegree(m, uRow, uCol, unique, keptDelayed, elimination);
            int[] inverse = new int[m];
            for (int i = 0; i < m; i++) {
                inverse[perm[i]] = i;
            }
            if (elimination != null) {
                // the elimination's pattern of L, in the new numbering, for the first factorisation
                p.lStart = elimination.start;
                p.lRows = elimination.rows;
                for (int q = 0; q < p.lStart[m]; q++) {
                    p.lRows[q] = inverse[p.lRows[q]];
                }
            }
            p.place = new int[n];
            p.keptIndex = new int[m];
            for (int i = 0; i < n; i++) {
                p.place[i] = kept[i] < 0 ? -1 : inverse[kept[i]];
                if (p.place[i] >= 0) {
                    p.keptIndex[p.place[i]] = i;
                }
            }
            p.colRowPlace = new int[p.colSlots];
            for (int c = 0; c < p.colSlots; c++) {
                p.colRowPlace[c] = p.place[p.colRow[c]];
            }
            // the renumbered pattern as compressed columns with rows sorted: column c is kept column
            // perm[c], its short list sorted by insertion; finalOf[u] is where unique entry u ends up
            p.colPtr = new int[m + 1];
            int[] rowIdx = new int[unique];
            int[] src = new int[unique];
            int[] finalOf = uCol;
            int pos = 0;
            for (int c = 0; c < m; c++) {
                p.colPtr[c] = pos;
                int lo = pos;
                int old = perm[c];
                for (int u = uStart[old]; u < uStart[old + 1]; u++) {
                    int v = inverse[uRow[u]];
                    int j = pos - 1;
                    while (j >= lo && rowIdx[j] > v) {
                        rowIdx[j + 1] = rowIdx[j];
                        src[j + 1] = src[j];
                        j--;
                    }
                    rowIdx[j + 1] = v;
                    src[j + 1] = u;
                    pos++;
                }
            }
            p.colPtr[m] = unique;
            for (int q = 0; q < unique; q++) {
                finalOf[src[q]] = q;
            }
            p.rowIdx = rowIdx;
            for (int s = 0; s < keptEntries; s++) {
                p.byRoleDest[s] = finalOf[uniqueOf[s]];
            }
            p.colOwner = new int[p.colSlots];
            p.fillAt = new int[p.colSlots];
            for (int e = 0, f = 0; e < ne; e++) {
                for (int c = cc[e]; c < cc[e + 1]; c++) {
                    p.colOwner[c] = e;
                    p.fillAt[c] = f;
                    f += rc[e + 1] - rc[e];
                }
            }
            p.fill = new int[fills];
            for (int f = 0; f < fills; f++) {
                p.fill[f] = finalOf[uniqueOf[keptEntries + f]];
            }
            p.values = new double[unique];
            p.condensedValues = new double[count];
            p.slotOf = new int[count];
            for (int slot = 0; slot < count; slot++) {
                p.slotOf[p.byRole[slot]] = slot;
            }
            p.pivot = new double[n];
            p.rowVal = new double[p.rowSlots];
            p.colVal = new double[p.colSlots];
            p.y = new double[m];
            return p;
        }
    }

    private int[] fullPerm;
    private int[] fullInverse;

    private double[] solveSparseFull(double[] rhs, double[] rowScale, double[] colScale) {
        int[] rows = current.rows;
        int[] cols = current.cols;
        double[] vals = current.vals;
        int count = current.count;
        if (fullPerm == null) {
            fullPerm = Ordering.reverseCuthillMcKee(n, rows, cols, count);
            fullInverse = new int[n];
            for (int i = 0; i < n; i++) {
                fullInverse[fullPerm[i]] = i;
            }
        }
        DMatrixSparseTriplet t = new DMatrixSparseTriplet(n, n, count);
        for (int k = 0; k < count; k++) {
            t.addItem(fullInverse[rows[k]], fullInverse[cols[k]], vals[k] * colScale[cols[k]] / rowScale[rows[k]]);
        }
        DMatrixSparseCSC a = DConvertMatrixStruct.convert(t, (DMatrixSparseCSC) null);
        CommonOps_DSCC.duplicatesAdd(a, null);
        LinearSolverSparse<DMatrixSparseCSC, DMatrixRMaj> lu = LinearSolverFactory_DSCC.lu(FillReducing.NONE);
        if (!lu.setA(a)) {
            return null;
        }
        DMatrixRMaj b = new DMatrixRMaj(n, 1);
        for (int i = 0; i < n; i++) {
            b.data[i] = rhs[fullPerm[i]];
        }
        DMatrixRMaj y = new DMatrixRMaj(n, 1);
        lu.solve(b, y);
        double[] out = new double[n];
        for (int i = 0; i < n; i++) {
            out[fullPerm[i]] = y.data[i];
        }
        return finite(out) ? out : null;
    }

    private static boolean finite(double[] v) {
        for (double d : v) {
            if (!Double.isFinite(d)) {
                return false;
            }
        }
        return true;
    }
}
