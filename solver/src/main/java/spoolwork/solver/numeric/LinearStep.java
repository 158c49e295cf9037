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

    LinearStep(int n, LinearMethod method) {
        this.n = n;
        this.dense = method == LinearMethod.DENSE || (method == LinearMethod.AUTO && n <= LinearMethod.DENSE_LIMIT);
    }

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

    private double[] solveSparse(double[] rhs, double[] rowScale, double[] colScale) {
        if (perm == null) {
            perm = Ordering.reverseCuthillMcKee(n, rows, cols, count);
            inverse = new int[n];
            for (int i = 0; i < n; i++) {
                inverse[perm[i]] = i;
            }
        }
        DMatrixSparseTriplet t = new DMatrixSparseTriplet(n, n, count);
        for (int k = 0; k < count; k++) {
            t.addItem(inverse[rows[k]], inverse[cols[k]], vals[k] * colScale[cols[k]] / rowScale[rows[k]]);
        }
        DMatrixSparseCSC a = DConvertMatrixStruct.convert(t, (DMatrixSparseCSC) null);
        CommonOps_DSCC.duplicatesAdd(a, null);
        LinearSolverSparse<DMatrixSparseCSC, DMatrixRMaj> lu = LinearSolverFactory_DSCC.lu(FillReducing.NONE);
        if (!lu.setA(a)) {
            return null;
        }
        DMatrixRMaj b = new DMatrixRMaj(n, 1);
        for (int i = 0; i < n; i++) {
            b.data[i] = rhs[perm[i]];
        }
        DMatrixRMaj y = new DMatrixRMaj(n, 1);
        lu.solve(b, y);
        double[] out = new double[n];
        for (int i = 0; i < n; i++) {
            out[perm[i]] = y.data[i];
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
