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
 * The sparse path numbers the unknowns once by reverse Cuthill–McKee and then always factors with
 * {@link FillReducing#NONE}: EJML's own orderings are not safe to use with its LU.
 */
final class LinearStep implements Jacobian {
    private final int n;
    private final boolean dense;
    private int[] rows = new int[256];
    private int[] cols = new int[256];
    private double[] vals = new double[256];
    private int count;

    private final boolean[] eliminable;

    LinearStep(int n, LinearMethod method) {
        this(n, method, null);
    }

    LinearStep(int n, LinearMethod method, NonlinearSystem s) {
        this.n = n;
        this.dense = method == LinearMethod.DENSE || (method == LinearMethod.AUTO && n <= LinearMethod.DENSE_LIMIT);
        this.eliminable = new boolean[n];
        if (s != null && !dense) {
            for (int i = 0; i < n; i++) {
                eliminable[i] = s.eliminable(i);
            }
        }
    }



    void clear() {
        count = 0;
    }

    private int[] spareRows = new int[256];
    private int[] spareCols = new int[256];
    private double[] spareVals = new double[256];
    private int spareCount;

    /**
     * A second, empty set of entries for a trial point of the line search, so that the accepted trial's
     * Jacobian is kept (by {@link #acceptSpare()}) instead of evaluating the system again there.
     */
    Jacobian spare() {
        spareCount = 0;
        return spareSink;
    }

    private final Jacobian spareSink = (row, col, value) -> {
            if (row < 0 || col < 0) {
                return;
            }
            if (spareCount == spareRows.length) {
                spareRows = Arrays.copyOf(spareRows, spareCount * 2);
                spareCols = Arrays.copyOf(spareCols, spareCount * 2);
                spareVals = Arrays.copyOf(spareVals, spareCount * 2);
            }
            spareRows[spareCount] = row;
            spareCols[spareCount] = col;
            spareVals[spareCount] = value;
            spareCount++;
    };

    /** Makes the entries last written through {@link #spare()} the current ones. */
    void acceptSpare() {
        int[] r = rows;
        int[] c = cols;
        double[] v = vals;
        rows = spareRows;
        cols = spareCols;
        vals = spareVals;
        count = spareCount;
        spareRows = r;
        spareCols = c;
        spareVals = v;
        spareCount = 0;
    }

    @Override
    public void add(int row, int col, double value) {
        if (row < 0 || col < 0) {
            return;
        }
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

    /**
     * Solves (R⁻¹·J·C)·y = rhs for y, R = diag(rowScale), C = diag(colScale); returns null when the matrix
     * is singular or the answer is not finite.
     */
    double[] solve(double[] rhs, double[] rowScale, double[] colScale) {
        return dense ? solveDense(rhs, rowScale, colScale) : solveSparse(rhs, rowScale, colScale);
    }

    private double[] solveDense(double[] rhs, double[] rowScale, double[] colScale) {
        DMatrixRMaj a = new DMatrixRMaj(n, n);
        double[] d = a.data;
        for (int k = 0; k < count; k++) {
            d[rows[k] * n + cols[k]] += vals[k] * colScale[cols[k]] / rowScale[rows[k]];
        }
        LinearSolver<DMatrixRMaj, DMatrixRMaj> lu = LinearSolverFactory_DDRM.lu(n);
        if (!lu.setA(a)) {
            return null;
        }
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
        if (plan == null || !plan.fits(rows, cols, count)) {
            plan = Plan.make(n, eliminable, rows, cols, count);
            work = null;
            if (plan == null) {
                return solveSparseFull(rhs, rowScale, colScale);
            }
        }
        Plan pl = plan;
        double[] pivot = new double[n];
        double[] rowVal = new double[pl.rowSlots];
        double[] colVal = new double[pl.colSlots];
        if (work == null) {
            work = pl.matrix.copy();
        }
        DMatrixSparseCSC a = work;
        double[] nz = a.nz_values;
        java.util.Arrays.fill(nz, 0, a.nz_length, 0);
        for (int k = 0; k < count; k++) {
            double v = vals[k] * colScale[cols[k]] / rowScale[rows[k]];
            int d = pl.dest[k];
            switch (pl.role[k]) {
                case Plan.PIVOT -> pivot[rows[k]] += v;
                case Plan.ROW -> rowVal[d] = v;
                case Plan.COL -> colVal[d] = v;
                default -> nz[d] += v;
            }
        }
        double[] b = rhs.clone();
        int f = 0;
        for (int e = 0; e < pl.elim.length; e++) {
            int k = pl.elim[e];
            double d = pivot[k];
            if (!(Math.abs(d) > 1e-300)) {
                return solveSparseFull(rhs, rowScale, colScale);
            }
            for (int c = pl.colStart[e]; c < pl.colStart[e + 1]; c++) {
                double factor = colVal[c] / d;
                b[pl.colRow[c]] -= factor * rhs[k];
                for (int r = pl.rowStart[e]; r < pl.rowStart[e + 1]; r++) {
                    nz[pl.fill[f++]] -= factor * rowVal[r];
                }
            }
        }
        if (condensedLu == null) {
            condensedLu = LinearSolverFactory_DSCC.lu(FillReducing.NONE);
        }
        LinearSolverSparse<DMatrixSparseCSC, DMatrixRMaj> lu = condensedLu;
        if (!lu.setA(a)) {
            return null;
        }
        int m = pl.m;
        DMatrixRMaj bb = new DMatrixRMaj(m, 1);
        for (int i = 0; i < n; i++) {
            if (pl.place[i] >= 0) {
                bb.data[pl.place[i]] = b[i];
            }
        }
        DMatrixRMaj y = new DMatrixRMaj(m, 1);
        lu.solve(bb, y);
        double[] out = new double[n];
        for (int i = 0; i < n; i++) {
            if (pl.place[i] >= 0) {
                out[i] = y.data[pl.place[i]];
            }
        }
        for (int e = 0; e < pl.elim.length; e++) {
            int k = pl.elim[e];
            double sum = rhs[k];
            for (int r = pl.rowStart[e]; r < pl.rowStart[e + 1]; r++) {
                sum -= rowVal[r] * out[pl.rowCol[r]];
            }
            out[k] = sum / pivot[k];
        }
        return finite(out) ? out : null;
    }

    private Plan plan;
    /** The condensed matrix of the current plan, refilled every iteration; its LU keeps its workspaces. */
    private DMatrixSparseCSC work;
    private LinearSolverSparse<DMatrixSparseCSC, DMatrixRMaj> condensedLu;

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
        byte[] role;
        int[] dest;
        int[] elim;
        int[] rowStart;
        int[] rowCol;
        int[] colStart;
        int[] colRow;
        int[] fill;
        int rowSlots;
        int colSlots;
        DMatrixSparseCSC matrix;

        boolean fits(int[] rows, int[] cols, int count) {
            if (count != rowsSeen.length) {
                return false;
            }
            for (int k = 0; k < count; k++) {
                if (rows[k] != rowsSeen[k] || cols[k] != colsSeen[k]) {
                    return false;
                }
            }
            return true;
        }

        static Plan make(int n, boolean[] eliminable, int[] rows, int[] cols, int count) {
            Plan p = new Plan();
            p.rowsSeen = Arrays.copyOf(rows, count);
            p.colsSeen = Arrays.copyOf(cols, count);
            int[] kept = new int[n];
            int m = 0;
            int[] elimPos = new int[n];
            int ne = 0;
            for (int i = 0; i < n; i++) {
                kept[i] = eliminable[i] ? -1 : m++;
                elimPos[i] = eliminable[i] ? ne++ : -1;
            }
            p.m = m;
            p.elim = new int[ne];
            for (int i = 0; i < n; i++) {
                if (eliminable[i]) {
                    p.elim[elimPos[i]] = i;
                }
            }
            int[] rc = new int[ne + 1];
            int[] cc = new int[ne + 1];
            p.role = new byte[count];
            for (int k = 0; k < count; k++) {
                int r = rows[k];
                int c = cols[k];
                if (eliminable[r] && eliminable[c] && r != c) {
                    return null;
                }
                if (r == c && eliminable[r]) {
                    p.role[k] = PIVOT;
                } else if (eliminable[r]) {
                    p.role[k] = ROW;
                    rc[elimPos[r] + 1]++;
                } else if (eliminable[c]) {
                    p.role[k] = COL;
                    cc[elimPos[c] + 1]++;
                }
            }
            for (int e = 0; e < ne; e++) {
                rc[e + 1] += rc[e];
                cc[e + 1] += cc[e];
            }
            p.rowStart = rc;
            p.colStart = cc;
            p.rowSlots = rc[ne];
            p.colSlots = cc[ne];
            p.rowCol = new int[p.rowSlots];
            p.colRow = new int[p.colSlots];
            p.dest = new int[count];
            int[] rf = Arrays.copyOf(rc, ne);
            int[] cf = Arrays.copyOf(cc, ne);
            for (int k = 0; k < count; k++) {
                if (p.role[k] == ROW) {
                    int e = elimPos[rows[k]];
                    p.dest[k] = rf[e];
                    p.rowCol[rf[e]++] = cols[k];
                } else if (p.role[k] == COL) {
                    int e = elimPos[cols[k]];
                    p.dest[k] = cf[e];
                    p.colRow[cf[e]++] = rows[k];
                }
            }
            // pattern of the condensed matrix: kept entries and fill-ins, in kept numbering
            int fills = 0;
            for (int e = 0; e < ne; e++) {
                fills += (cc[e + 1] - cc[e]) * (rc[e + 1] - rc[e]);
            }
            int total = 0;
            int[] pr = new int[count + fills];
            int[] pc = new int[count + fills];
            for (int k = 0; k < count; k++) {
                if (p.role[k] == KEPT) {
                    pr[total] = kept[rows[k]];
                    pc[total++] = kept[cols[k]];
                }
            }
            int keptEntries = total;
            for (int e = 0; e < ne; e++) {
                for (int c = cc[e]; c < cc[e + 1]; c++) {
                    for (int r = rc[e]; r < rc[e + 1]; r++) {
                        pr[total] = kept[p.colRow[c]];
                        pc[total++] = kept[p.rowCol[r]];
                    }
                }
            }
            int[] perm = Ordering.reverseCuthillMcKee(m, pr, pc, total);
            int[] inverse = new int[m];
            for (int i = 0; i < m; i++) {
                inverse[perm[i]] = i;
            }
            p.place = new int[n];
            for (int i = 0; i < n; i++) {
                p.place[i] = kept[i] < 0 ? -1 : inverse[kept[i]];
            }
            // unique (column, row) pairs in the new numbering, as CSC
            long[] keys = new long[total];
            for (int t = 0; t < total; t++) {
                keys[t] = (long) inverse[pc[t]] * m + inverse[pr[t]];
            }
            long[] sorted = keys.clone();
            Arrays.sort(sorted);
            int unique = 0;
            for (int t = 0; t < total; t++) {
                if (t == 0 || sorted[t] != sorted[t - 1]) {
                    sorted[unique++] = sorted[t];
                }
            }
            DMatrixSparseCSC a = new DMatrixSparseCSC(m, m, unique);
            a.nz_length = unique;
            for (int t = 0; t < unique; t++) {
                int col = (int) (sorted[t] / m);
                a.nz_rows[t] = (int) (sorted[t] % m);
                a.col_idx[col + 1]++;
            }
            for (int c = 0; c < m; c++) {
                a.col_idx[c + 1] += a.col_idx[c];
            }
            a.indicesSorted = true;
            p.matrix = a;
            long[] uniq = Arrays.copyOf(sorted, unique);
            int t = 0;
            for (int k = 0; k < count; k++) {
                if (p.role[k] == KEPT) {
                    p.dest[k] = Arrays.binarySearch(uniq, keys[t++]);
                }
            }
            p.fill = new int[fills];
            for (int q = 0; q < fills; q++) {
                p.fill[q] = Arrays.binarySearch(uniq, keys[keptEntries + q]);
            }
            return p;
        }
    }

    private int[] fullPerm;
    private int[] fullInverse;

    private double[] solveSparseFull(double[] rhs, double[] rowScale, double[] colScale) {
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
