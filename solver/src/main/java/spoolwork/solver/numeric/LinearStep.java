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
    private int[] perm;
    private int[] inverse;

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

    // reduced numbering: kept unknowns 0 … m−1
    private int[] keptIndex;
    private int m = -1;

    void clear() {
        count = 0;
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
     * drop laws' slopes, which never vanish, and what is left is a nodal system about half the size.
     */
    private double[] solveSparse(double[] rhs, double[] rowScale, double[] colScale) {
        if (m < 0) {
            keptIndex = new int[n];
            m = 0;
            for (int i = 0; i < n; i++) {
                keptIndex[i] = eliminable[i] ? -1 : m++;
            }
        }
        double[] pivot = new double[n];
        int[] rowCount = new int[n];
        int[] colCount = new int[n];
        for (int k = 0; k < count; k++) {
            int r = rows[k];
            int c = cols[k];
            if (eliminable[r] && eliminable[c] && r != c) {
                return solveSparseFull(rhs, rowScale, colScale);
            }
            if (eliminable[r] && r != c) {
                rowCount[r]++;
            } else if (eliminable[c] && r != c) {
                colCount[c]++;
            }
        }
        int[][] rowIdx = new int[n][];
        double[][] rowVal = new double[n][];
        int[][] colIdx = new int[n][];
        double[][] colVal = new double[n][];
        for (int i = 0; i < n; i++) {
            if (eliminable[i]) {
                rowIdx[i] = new int[rowCount[i]];
                rowVal[i] = new double[rowCount[i]];
                colIdx[i] = new int[colCount[i]];
                colVal[i] = new double[colCount[i]];
                rowCount[i] = 0;
                colCount[i] = 0;
            }
        }
        DMatrixSparseTriplet t = new DMatrixSparseTriplet(m, m, count);
        double[] b = rhs.clone();
        int[] tr = new int[count * 2];
        int[] tc = new int[count * 2];
        double[] tv = new double[count * 2];
        int tn = 0;
        for (int k = 0; k < count; k++) {
            int r = rows[k];
            int c = cols[k];
            double v = vals[k] * colScale[c] / rowScale[r];
            if (r == c && eliminable[r]) {
                pivot[r] += v;
            } else if (eliminable[r]) {
                rowIdx[r][rowCount[r]] = c;
                rowVal[r][rowCount[r]++] = v;
            } else if (eliminable[c]) {
                colIdx[c][colCount[c]] = r;
                colVal[c][colCount[c]++] = v;
            } else {
                if (tn == tr.length) {
                    tr = Arrays.copyOf(tr, tn * 2);
                    tc = Arrays.copyOf(tc, tn * 2);
                    tv = Arrays.copyOf(tv, tn * 2);
                }
                tr[tn] = keptIndex[r];
                tc[tn] = keptIndex[c];
                tv[tn++] = v;
            }
        }
        for (int k = 0; k < n; k++) {
            if (!eliminable[k]) {
                continue;
            }
            double d = pivot[k];
            if (!(Math.abs(d) > 1e-300)) {
                return solveSparseFull(rhs, rowScale, colScale);
            }
            for (int a = 0; a < colIdx[k].length; a++) {
                int i = colIdx[k][a];
                double f = colVal[k][a] / d;
                b[i] -= f * rhs[k];
                for (int e = 0; e < rowIdx[k].length; e++) {
                    if (tn == tr.length) {
                        tr = Arrays.copyOf(tr, tn * 2);
                        tc = Arrays.copyOf(tc, tn * 2);
                        tv = Arrays.copyOf(tv, tn * 2);
                    }
                    tr[tn] = keptIndex[i];
                    tc[tn] = keptIndex[rowIdx[k][e]];
                    tv[tn++] = -f * rowVal[k][e];
                }
            }
        }
        if (perm == null) {
            perm = Ordering.reverseCuthillMcKee(m, tr, tc, tn);
            inverse = new int[m];
            for (int i = 0; i < m; i++) {
                inverse[perm[i]] = i;
            }
        }
        for (int k = 0; k < tn; k++) {
            t.addItem(inverse[tr[k]], inverse[tc[k]], tv[k]);
        }
        DMatrixSparseCSC a = DConvertMatrixStruct.convert(t, (DMatrixSparseCSC) null);
        CommonOps_DSCC.duplicatesAdd(a, null);
        LinearSolverSparse<DMatrixSparseCSC, DMatrixRMaj> lu = LinearSolverFactory_DSCC.lu(FillReducing.NONE);
        if (!lu.setA(a)) {
            return null;
        }
        DMatrixRMaj bb = new DMatrixRMaj(m, 1);
        for (int i = 0; i < n; i++) {
            if (!eliminable[i]) {
                bb.data[inverse[keptIndex[i]]] = b[i];
            }
        }
        DMatrixRMaj y = new DMatrixRMaj(m, 1);
        lu.solve(bb, y);
        double[] out = new double[n];
        for (int i = 0; i < n; i++) {
            if (!eliminable[i]) {
                out[i] = y.data[inverse[keptIndex[i]]];
            }
        }
        for (int k = 0; k < n; k++) {
            if (eliminable[k]) {
                double sum = rhs[k];
                for (int e = 0; e < rowIdx[k].length; e++) {
                    sum -= rowVal[k][e] * out[rowIdx[k][e]];
                }
                out[k] = sum / pivot[k];
            }
        }
        return finite(out) ? out : null;
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
