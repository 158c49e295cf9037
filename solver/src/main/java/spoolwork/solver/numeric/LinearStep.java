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
 * by default) and factors with {@link SparseLu}, which reuses its pivot order and patterns from one
 * iteration to the next. The fallback for systems that cannot be condensed uses EJML's sparse LU with
 * {@link FillReducing#NONE} after reverse Cuthill–McKee: EJML's own orderings are not safe with its LU.
 */
final class LinearStep implements Jacobian {
    private final int n;
    private final boolean dense;
    private Triplets current = new Triplets();
    private Triplets trial = new Triplets();
    private boolean bandOrdering;

    private final boolean[] eliminable;
    /** Unknowns of complementarity rows, numbered after a neighbour (see Ordering#minimumDegree). */
    private final boolean[] delayed;

    LinearStep(int n, LinearMethod method) {
        this(n, method, null);
    }

    LinearStep(int n, LinearMethod method, NonlinearSystem s) {
        this.n = n;
        this.dense = method == LinearMethod.DENSE || (method == LinearMethod.AUTO && n <= LinearMethod.DENSE_LIMIT);
        this.eliminable = new boolean[n];
        this.delayed = new boolean[n];
        if (s != null && !dense) {
            for (int i = 0; i < n; i++) {
                eliminable[i] = s.eliminable(i);
                delayed[i] = s.switchesSides(i);
            }
        }
    }



    void clear() {
        current.count = 0;
    }

    /** Jacobian entries in the order they arrived; entries for the same place are summed later. */
    private static final class Triplets implements Jacobian {
        int[] rows = new int[256];
        int[] cols = new int[256];
        double[] vals = new double[256];
        int count;

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

        @Override
        public int size() {
            return count;
        }

        @Override
        public void set(int index, double value) {
            vals[index] = value;
        }
    }

    /**
     * A second, empty set of entries for a trial point of the line search, so that the accepted trial's
     * Jacobian is kept (by {@link #acceptSpare()}) instead of evaluating the system again there.
     */
    Jacobian spare() {
        trial.count = 0;
        return trial;
    }

    /** Makes the entries last written through {@link #spare()} the current ones. */
    void acceptSpare() {
        Triplets t = current;
        current = trial;
        trial = t;
        trial.count = 0;
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
        current.vals[index] = value;
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
     * is singular or the answer is not finite.
     */
    double[] solve(double[] rhs, double[] rowScale, double[] colScale) {
        return dense ? solveDense(rhs, rowScale, colScale) : solveSparse(rhs, rowScale, colScale);
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
        int[] rows = current.rows;
        int[] cols = current.cols;
        double[] vals = current.vals;
        int count = current.count;
        if (plan == null || !plan.fits(rows, cols, count)) {
            plan = Plan.make(n, eliminable, delayed, rows, cols, count, bandOrdering);
            if (plan == null) {
                return solveSparseFull(rhs, rowScale, colScale);
            }
        }
        Plan pl = plan;
        double[] pivot = pl.pivot;
        double[] rowVal = pl.rowVal;
        double[] colVal = pl.colVal;
        double[] nz = pl.values;
        Arrays.fill(pivot, 0);
        Arrays.fill(nz, 0);
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
        double[] b = pl.b;
        System.arraycopy(rhs, 0, b, 0, n);
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
        if (pl.lu == null) {
            pl.lu = new SparseLu(pl.m, pl.colPtr, pl.rowIdx, null);
        }
        double[] y = pl.y;
        for (int i = 0; i < n; i++) {
            if (pl.place[i] >= 0) {
                y[pl.place[i]] = b[i];
            }
        }
        if (!pl.update.solve(nz, y)) {
            if (!pl.lu.factor(nz)) {
                pl.update.forget();
                return null;
            }
            pl.update.factored(nz);
            pl.lu.solve(y, y);
        }
        double[] out = new double[n];
        for (int i = 0; i < n; i++) {
            if (pl.place[i] >= 0) {
                out[i] = y[pl.place[i]];
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
        /** Pattern of the condensed matrix (compressed columns, rows sorted) in the new numbering. */
        int[] colPtr;
        int[] rowIdx;
        // work arrays of solveSparse, refilled every iteration
        double[] values;
        double[] pivot;
        double[] rowVal;
        double[] colVal;
        double[] b;
        double[] y;
        SparseLu lu;
        RowUpdate update;

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

        static Plan make(int n, boolean[] eliminable, boolean[] delayed, int[] rows, int[] cols, int count,
                         boolean band) {
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
            boolean[] keptDelayed = new boolean[m];
            for (int i = 0; i < n; i++) {
                if (kept[i] >= 0) {
                    keptDelayed[kept[i]] = delayed[i];
                }
            }
            int[] perm = band ? Ordering.reverseCuthillMcKee(m, pr, pc, total)
                    : Ordering.minimumDegree(m, pr, pc, total, keptDelayed);
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
            p.colPtr = new int[m + 1];
            p.rowIdx = new int[unique];
            for (int t = 0; t < unique; t++) {
                int col = (int) (sorted[t] / m);
                p.rowIdx[t] = (int) (sorted[t] % m);
                p.colPtr[col + 1]++;
            }
            for (int c = 0; c < m; c++) {
                p.colPtr[c + 1] += p.colPtr[c];
            }
            p.values = new double[unique];
            p.pivot = new double[n];
            p.rowVal = new double[p.rowSlots];
            p.colVal = new double[p.colSlots];
            p.b = new double[n];
            p.y = new double[m];
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
            p.update = new RowUpdate(p);
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

    /**
     * Solves with a matrix that differs from the factorised one in a few rows only, as after complementarity
     * rows change sides within one Newton step, without factorising again: with F the factorised matrix and
     * A = F + U·Dᵀ (U the unit columns of the changed rows, Dᵀ their differences), the Sherman–Morrison–
     * Woodbury identity gives A⁻¹y = z − Z·(I + Dᵀ·Z)⁻¹·Dᵀ·z with z = F⁻¹y and Z = F⁻¹U (Golub & Van Loan,
     * Matrix Computations, §2.1.4). The columns of Z are kept while F stays the same. The answer is checked
     * by its residual; when it is not good, or too many rows changed, the caller factorises instead.
     */
    static final class RowUpdate {
        /** Most changed rows taken this way; beyond it a refactorisation is cheaper. */
        static final int MAX_ROWS = 24;

        private final Plan plan;
        private final int m;
        private final int[] colOf;
        private double[] factored;
        private final int[] slotOf;
        private final double[][] columns = new double[MAX_ROWS][];
        private final int[] rowOfSlot = new int[MAX_ROWS];
        private int slots;
        private final boolean[] changed;
        private final int[] changedRows = new int[MAX_ROWS];
        private final double[] work;

        RowUpdate(Plan plan) {
            this.plan = plan;
            this.m = plan.m;
            int nnz = plan.colPtr[m];
            this.colOf = new int[nnz];
            for (int c = 0; c < m; c++) {
                for (int p = plan.colPtr[c]; p < plan.colPtr[c + 1]; p++) {
                    colOf[p] = c;
                }
            }
            this.slotOf = new int[m];
            Arrays.fill(slotOf, -1);
            this.changed = new boolean[m];
            this.work = new double[m];
        }

        /** Records the values just factorised. */
        void factored(double[] values) {
            if (factored == null) {
                factored = new double[values.length];
            }
            System.arraycopy(values, 0, factored, 0, values.length);
            forgetColumns();
        }

        /** No factorisation to build on. */
        void forget() {
            factored = null;
            forgetColumns();
        }

        private void forgetColumns() {
            for (int k = 0; k < slots; k++) {
                slotOf[rowOfSlot[k]] = -1;
            }
            slots = 0;
        }

        /** Solves A·y = y in place when A differs from the factorised matrix in a few rows; false otherwise. */
        boolean solve(double[] values, double[] y) {
            if (factored == null) {
                return false;
            }
            int[] rowIdx = plan.rowIdx;
            int k = 0;
            boolean same = true;
            for (int p = 0; p < values.length; p++) {
                if (values[p] != factored[p]) {
                    same = false;
                    int r = rowIdx[p];
                    if (!changed[r]) {
                        if (k == MAX_ROWS) {
                            clearChanged(k);
                            return false;
                        }
                        changed[r] = true;
                        changedRows[k++] = r;
                    }
                }
            }
            if (same) {
                plan.lu.solve(y, y);
                return true;
            }
            double[] rhs = work;
            System.arraycopy(y, 0, rhs, 0, m);
            // Z = F⁻¹·U for the changed rows, kept while F stays
            double[][] z = new double[k][];
            for (int i = 0; i < k; i++) {
                int r = changedRows[i];
                int slot = slotOf[r];
                if (slot < 0) {
                    if (slots == MAX_ROWS) {
                        forgetColumns();
                        clearChanged(k);
                        return false;
                    }
                    double[] col = new double[m];
                    col[r] = 1;
                    plan.lu.solve(col, col);
                    slot = slots++;
                    columns[slot] = col;
                    rowOfSlot[slot] = r;
                    slotOf[r] = slot;
                }
                z[i] = columns[slot];
            }
            plan.lu.solve(y, y);
            // S = I + Dᵀ·Z and Dᵀ·z, from the differences of the changed rows
            double[][] sm = new double[k][k + 1];
            for (int i = 0; i < k; i++) {
                sm[i][i] = 1;
            }
            int[] index = new int[m];
            for (int i = 0; i < k; i++) {
                index[changedRows[i]] = i;
            }
            for (int p = 0; p < values.length; p++) {
                double d = values[p] - factored[p];
                if (d != 0) {
                    int i = index[rowIdx[p]];
                    int c = colOf[p];
                    for (int j = 0; j < k; j++) {
                        sm[i][j] += d * z[j][c];
                    }
                    sm[i][k] += d * y[c];
                }
            }
            clearChanged(k);
            double[] w = Dense.solveInPlace(sm, k);
            if (w == null) {
                System.arraycopy(rhs, 0, y, 0, m);
                return false;
            }
            for (int j = 0; j < k; j++) {
                double wj = w[j];
                double[] zj = z[j];
                for (int c = 0; c < m; c++) {
                    y[c] -= zj[c] * wj;
                }
            }
            // residual of A·y = rhs; a poor answer is left to a fresh factorisation
            double[] res = new double[m];
            double norm = 0;
            for (int c = 0; c < m; c++) {
                for (int p = plan.colPtr[c]; p < plan.colPtr[c + 1]; p++) {
                    res[rowIdx[p]] += values[p] * y[c];
                    norm = Math.max(norm, Math.abs(values[p] * y[c]));
                }
            }
            double worst = 0;
            for (int r = 0; r < m; r++) {
                worst = Math.max(worst, Math.abs(res[r] - rhs[r]));
                norm = Math.max(norm, Math.abs(rhs[r]));
            }
            if (!(worst <= 1e-10 * norm)) {
                System.arraycopy(rhs, 0, y, 0, m);
                return false;
            }
            return true;
        }

        private void clearChanged(int k) {
            for (int i = 0; i < k; i++) {
                changed[changedRows[i]] = false;
            }
        }
    }

    /** Gaussian elimination with partial pivoting on a small dense augmented matrix. */
    static final class Dense {
        private Dense() {
        }

        /** Solves a[0..k)[0..k)·w = a[·][k]; null when a pivot is not clearly non-zero. */
        static double[] solveInPlace(double[][] a, int k) {
            double scale = 0;
            for (int i = 0; i < k; i++) {
                for (int j = 0; j < k; j++) {
                    scale = Math.max(scale, Math.abs(a[i][j]));
                }
            }
            for (int c = 0; c < k; c++) {
                int best = c;
                for (int r = c + 1; r < k; r++) {
                    if (Math.abs(a[r][c]) > Math.abs(a[best][c])) {
                        best = r;
                    }
                }
                if (!(Math.abs(a[best][c]) > 1e-12 * scale)) {
                    return null;
                }
                double[] t = a[c];
                a[c] = a[best];
                a[best] = t;
                for (int r = c + 1; r < k; r++) {
                    double f = a[r][c] / a[c][c];
                    if (f != 0) {
                        for (int j = c; j <= k; j++) {
                            a[r][j] -= f * a[c][j];
                        }
                    }
                }
            }
            double[] w = new double[k];
            for (int r = k - 1; r >= 0; r--) {
                double sum = a[r][k];
                for (int j = r + 1; j < k; j++) {
                    sum -= a[r][j] * w[j];
                }
                w[r] = sum / a[r][r];
            }
            return w;
        }
    }
}
