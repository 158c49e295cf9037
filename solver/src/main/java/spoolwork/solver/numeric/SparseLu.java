package spoolwork.solver.numeric;

import java.util.Arrays;

/**
 * Sparse LU factorisation P·A·Q = L·U of a square matrix whose sparsity pattern is fixed, for solving
 * many systems that share that pattern.
 *
 * <p>The pattern (compressed sparse columns) and a column order Q are given once. The first
 * {@link #factor(double[])} is a left-looking factorisation with threshold partial pivoting
 * (Gilbert–Peierls): column k of L and U comes from one sparse triangular solve whose nonzero pattern is
 * found by a depth-first search, and the pivot is the diagonal entry (row Q[k]) when it is at least
 * {@link #PIVOT_TOLERANCE} times the largest candidate, else the largest candidate. Later calls with new
 * values keep the row order and the patterns of L and U and only redo the arithmetic, without searching
 * and without allocating. A refactorisation keeps a pivot while it is at least
 * {@link #REFACTOR_PIVOT_TOLERANCE} of the largest candidate of its column and falls back to pivoting from
 * the first column where it is not; the columns before the failed one are kept, the search starts again at
 * the failed column. Both the refactorisation and that search leave alone the columns whose inputs did not
 * change since the last factorisation (see {@link #refactor} and {@link #pivotingFactor}). When the caller
 * knows which entries it rewrote, {@link #factorChanged} finds those columns from the list instead of
 * comparing every entry.
 *
 * <p>The looser test for kept pivots is what lets one pivot order serve both sides of a complementarity
 * row: a node held only by leakage has a diagonal some 1e-8 of the margin row that pivots its column on
 * the other side, and with the search's own threshold every change of side would search again. Such a
 * pivot puts large entries in L, and the solve loses accuracy in the unknowns it is weakly tied to (the
 * leak-held pressure). Measured over the solves of 84 generated circuits of 10 to 2,000 components, the
 * residual ‖b − A·x‖∞ stayed below 1e-7 ‖b‖∞, mostly between 1e-11 and 1e-14 of it: enough for a Newton
 * step, and Newton checks convergence on the true residual. One step of iterative refinement was tried;
 * it changed those figures little and cost a tenth of the solve time. The search's own threshold,
 * {@link #PIVOT_TOLERANCE}, is loose for the same reason: with 1e-3 instead, the search took the margin row
 * as pivot of a leak-held node's column more often, and a refactorisation had to search again whenever
 * that row changed side (1.6 searches per solve of 2,000 components against 0.4; the residuals of the
 * two were alike).
 *
 * <p>A matrix is reported singular ({@code false}) when a column has no usable pivot: every candidate is
 * zero, or the largest is below {@link #SINGULAR_TOLERANCE} times the largest magnitude met in that
 * column (of A or of its partly reduced form), or a value is not finite.
 */
final class SparseLu {
    /** A diagonal pivot is kept while it is at least this fraction of the largest candidate. */
    static final double PIVOT_TOLERANCE = 1e-6;
    /** A refactorisation keeps a pivot while it is at least this fraction of the largest candidate. */
    static final double REFACTOR_PIVOT_TOLERANCE = 1e-9;
    /** Relative size below which the best pivot of a column counts as zero. */
    static final double SINGULAR_TOLERANCE = 1e-14;

    private final int n;
    private final int[] ap;
    private final int[] ai;
    private final int[] q;

    // factors, in pivot numbering: column k of L starts with its unit diagonal, column k of U ends with
    // its pivot; the off-diagonal entries of U are in an order valid for the forward elimination
    private int[] lp;
    private int[] li;
    private double[] lx;
    private int[] up;
    private int[] ui;
    private double[] ux;
    /** pinv[row of A] = pivot position; row[pivot position] = row of A. */
    private final int[] pinv;
    private final int[] prow;
    private boolean factored;
    /** True when the last call of a factor method succeeded, so that its values are those in {@link #last}. */
    private boolean lastSucceeded;
    /**
     * True while U's pattern is the transpose of L's below the diagonal and the pivots are on the diagonal, as
     * the pattern constructor sets them up and until a search changes them: then the columns whose factors
     * depend on column k are exactly the rows of L(:, k), and {@link #factorChanged} can find them forward.
     */
    private boolean transposedPattern;
    /** Column of each stored entry of A (for {@link #factorChanged}); made on first use. */
    private int[] colOf;
    private int fresh;
    /** Values of the last successful factorisation, to find the columns whose factors can change. */
    private final double[] last;
    /** changed[k]: column k of L and U was recomputed by the running refactorisation. */
    private final boolean[] changed;
    /** same[k]: column k of L and U (and its pivot row) is the one of the factorisation before. */
    private final boolean[] same;
    // the columns from the failed one on of the factorisation before, kept while the search runs
    private int[] oldLp;
    private int[] oldUp;
    private int[] oldProw;
    private int[] oldLi;
    private double[] oldLx;
    private int[] oldUi;
    private double[] oldUx;

    private final double[] x;
    private final int[] xi;
    private final int[] stack;
    private final int[] next;
    private final int[] mark;
    private int stamp;

    /**
     * @param colPtr column starts of the pattern of A, length n + 1
     * @param rowIdx row of each stored entry; no row twice in a column
     * @param order  column order Q (order[k] = column of A taken k-th), or null for the natural order
     */
    SparseLu(int n, int[] colPtr, int[] rowIdx, int[] order) {
        // L and U of these matrices hold about as many entries as A each; the arrays grow when need be
        this(n, colPtr, rowIdx, order, colPtr.length == n + 1 ? Math.max(0, colPtr[n]) + 2 * n : 0);
    }

    /** As above, with room for the given number of entries in each of L and U. */
    private SparseLu(int n, int[] colPtr, int[] rowIdx, int[] order, int factorCapacity) {
        if (colPtr.length != n + 1 || colPtr[0] != 0 || colPtr[n] > rowIdx.length) {
            throw new IllegalArgumentException("sparse LU: column starts do not describe " + n + " columns");
        }
        this.n = n;
        this.ap = colPtr.clone();
        this.ai = Arrays.copyOf(rowIdx, colPtr[n]);
        for (int j = 0; j < n; j++) {
            for (int p = ap[j]; p < ap[j + 1]; p++) {
                if (ai[p] < 0 || ai[p] >= n) {
                    throw new IllegalArgumentException(
                            "sparse LU: row " + ai[p] + " in column " + j + " outside 0.." + (n - 1));
                }
            }
        }
        if (order == null) {
            q = new int[n];
            for (int k = 0; k < n; k++) {
                q[k] = k;
            }
        } else {
            if (order.length != n) {
                throw new IllegalArgumentException(
                        "sparse LU: column order has " + order.length + " entries, not " + n);
            }
            q = order.clone();
            boolean[] seen = new boolean[n];
            for (int c : q) {
                if (c < 0 || c >= n || seen[c]) {
                    throw new IllegalArgumentException("sparse LU: column order is not a permutation (at " + c + ")");
                }
                seen[c] = true;
            }
        }
        pinv = new int[n];
        prow = new int[n];
        x = new double[n];
        xi = new int[n];
        stack = new int[n];
        next = new int[n];
        mark = new int[n];
        last = new double[ap[n]];
        changed = new boolean[n];
        same = new boolean[n];
        lp = new int[n + 1];
        up = new int[n + 1];
        li = new int[factorCapacity];
        lx = new double[factorCapacity];
        ui = new int[factorCapacity];
        ux = new double[factorCapacity];
    }

    /**
     * A factorisation that starts from a known pattern: {@code lRows[lStart[k] .. lStart[k + 1])} are the rows
     * below the diagonal of column k of L for diagonal pivots in the natural column order (all greater than
     * k), a superset of what the elimination fills in, such as a minimum degree elimination of A + Aᵀ
     * records. U's pattern is its transpose. The first {@link #factor} then does only the arithmetic of a
     * refactorisation, without the search for reach and pivots, and searches only from a column whose
     * diagonal pivot fails the refactorisation's threshold.
     */
    SparseLu(int n, int[] colPtr, int[] rowIdx, int[] lStart, int[] lRows) {
        this(n, colPtr, rowIdx, null, 0);
        if (lStart.length != n + 1 || lStart[0] != 0) {
            throw new IllegalArgumentException("sparse LU: pattern of L does not describe " + n + " columns");
        }
        int below = lStart[n];
        int[] uCount = new int[n];
        for (int k = 0; k < n; k++) {
            for (int t = lStart[k]; t < lStart[k + 1]; t++) {
                int r = lRows[t];
                if (r <= k || r >= n) {
                    throw new IllegalArgumentException(
                            "sparse LU: row " + r + " of column " + k + " of L is not below the diagonal");
                }
                uCount[r]++;
            }
        }
        li = new int[below + n];
        lx = new double[below + n];
        ui = new int[below + n];
        ux = new double[below + n];
        int pos = 0;
        for (int k = 0; k < n; k++) {
            lp[k] = pos;
            li[pos++] = k;
            for (int t = lStart[k]; t < lStart[k + 1]; t++) {
                li[pos++] = lRows[t];
            }
        }
        lp[n] = pos;
        // U(:, r) holds the columns k < r whose L has row r, in increasing order (an order valid for the
        // forward elimination), then its diagonal
        int[] next = new int[n];
        pos = 0;
        for (int r = 0; r < n; r++) {
            up[r] = pos;
            next[r] = pos;
            pos += uCount[r] + 1;
            ui[pos - 1] = r;
        }
        up[n] = pos;
        for (int k = 0; k < n; k++) {
            for (int t = lStart[k]; t < lStart[k + 1]; t++) {
                ui[next[lRows[t]]++] = k;
            }
        }
        // the pattern must hold every entry of A, else the arithmetic would leave values behind in x
        int[] seen = new int[n];
        Arrays.fill(seen, -1);
        for (int k = 0; k < n; k++) {
            for (int p = lp[k]; p < lp[k + 1]; p++) {
                seen[li[p]] = k;
            }
            for (int p = up[k]; p < up[k + 1]; p++) {
                seen[ui[p]] = k;
            }
            for (int p = ap[k]; p < ap[k + 1]; p++) {
                if (seen[ai[p]] != k) {
                    throw new IllegalArgumentException("sparse LU: entry (" + ai[p] + ", " + k
                            + ") of A lies outside the given pattern of L and U");
                }
            }
        }
        for (int k = 0; k < n; k++) {
            pinv[k] = k;
            prow[k] = k;
        }
        // every column counts as changed, so the first factorisation computes them all
        Arrays.fill(last, Double.NaN);
        factored = true;
        transposedPattern = true;
    }

    int size() {
        return n;
    }

    /** Entries of L and U together, the unit diagonal of L included; 0 before the first factorisation. */
    int factorEntries() {
        return factored ? lp[n] + up[n] : 0;
    }

    /**
     * How many factorisations searched for pivots, from the first column or from the column where a
     * refactorisation failed; the others reused the stored order throughout.
     */
    int pivotingFactorisations() {
        return fresh;
    }

    /**
     * Factors the matrix with the given values (values[p] belongs to the p-th stored entry of the pattern).
     * Reuses the previous pivot order and patterns when it is still acceptable.
     *
     * @return false when the matrix is singular or holds a value that is not finite
     */
    boolean factor(double[] values) {
        lastSucceeded = false;
        solutionKept = false;
        changeCount = -1;
        for (int p = 0; p < ap[n]; p++) {
            if (!Double.isFinite(values[p])) {
                factored = false;
                return false;
            }
        }
        int from = 0;
        if (factored) {
            from = refactor(values);
            if (from < 0) {
                System.arraycopy(values, 0, last, 0, ap[n]);
                lastSucceeded = true;
                return true;
            }
        }
        return search(values, from);
    }

    /** Pivoting factorisation from column {@code from} on, after which the values are the last ones. */
    private boolean search(double[] values, int from) {
        transposedPattern = false;
        factored = pivotingFactor(values, from);
        if (factored) {
            System.arraycopy(values, 0, last, 0, ap[n]);
            lastSucceeded = true;
        }
        return factored;
    }

    /**
     * As {@link #factor}, for values that differ from those of the last call only in the stored entries
     * {@code entries[0 .. count)} (others may be listed too), as when a few rows of the matrix were rewritten.
     * Instead of comparing every entry with the last values it starts from the columns of those entries and
     * recomputes them and the columns that depend on them, found forward through the pattern of L. Falls
     * back to {@link #factor} when the last call failed or a search has changed the pattern since the first
     * factorisation.
     */
    boolean factorChanged(double[] values, int[] entries, int count) {
        if (!factored || !lastSucceeded || !transposedPattern) {
            return factor(values);
        }
        lastSucceeded = false;
        // the answer of the last solve can start the next one only if no other refactorisation came between
        boolean keep = solutionKept && changeCount < 0;
        solutionKept = false;
        changeCount = -1;
        if (colOf == null) {
            colOf = new int[ap[n]];
            for (int j = 0; j < n; j++) {
                Arrays.fill(colOf, ap[j], ap[j + 1], j);
            }
        }
        Arrays.fill(changed, false);
        int first = n;
        for (int e = 0; e < count; e++) {
            int p = entries[e];
            if (!Double.isFinite(values[p])) {
                factored = false;
                return false;
            }
            if (values[p] != last[p]) {
                // in this pattern the pivot order is the natural one: column j of A is column j of L and U
                int k = colOf[p];
                changed[k] = true;
                first = Math.min(first, k);
            }
        }
        int[] place = rowPlace();
        for (int k = first; k < n; k++) {
            if (!changed[k]) {
                continue;
            }
            if (!column(k, values, place)) {
                // columns after k are not yet known to be recomputed; the search decides them itself
                Arrays.fill(changed, k + 1, n, false);
                return search(values, k);
            }
            for (int t = lp[k] + 1; t < lp[k + 1]; t++) {
                changed[li[t]] = true;
            }
        }
        // the changes of the listed entries, each once (a repeated entry finds its change made), for solveChanged
        if (deltaEntry.length < count) {
            deltaEntry = new int[Math.max(count, 2 * deltaEntry.length)];
            deltaValue = new double[deltaEntry.length];
        }
        int changes = 0;
        for (int e = 0; e < count; e++) {
            int p = entries[e];
            double d = values[p] - last[p];
            if (d != 0) {
                deltaEntry[changes] = p;
                deltaValue[changes++] = d;
            }
            last[p] = values[p];
        }
        solutionKept = keep;
        changeCount = changes;
        lastSucceeded = true;
        return true;
    }

    /**
     * The last solve's right-hand side and answer, while they belong to the matrix last factorised, or to the
     * one before a {@link #factorChanged} whose changes are in deltaEntry and deltaValue.
     */
    private double[] keptB;
    private double[] keptX;
    private boolean solutionKept;
    /** Changes of A made by the last {@link #factorChanged} since the kept solution; −1 when there are none. */
    private int changeCount = -1;
    private int[] deltaEntry = new int[16];
    private double[] deltaValue = new double[16];

    /**
     * Solves A·out = b, like {@link #solve}, right after a {@link #factorChanged}: from the answer x₀ of the
     * solve before, whose matrix differed from A by ΔA in a few entries, out = x₀ + A⁻¹·(b − b₀ − ΔA·x₀). The
     * correction's right-hand side is zero outside the rows that changed (and those whose b changed), so the
     * forward substitution only touches the columns of L they reach. The residual of out is that of x₀ plus
     * the rounding of the correction. Falls back to a plain solve when there is no such answer to start from.
     */
    void solveChanged(double[] b, double[] out) {
        if (!solutionKept || changeCount < 0) {
            solve(b, out);
            return;
        }
        if (correction == null) {
            correction = new double[n];
        }
        double[] r = correction;
        for (int i = 0; i < n; i++) {
            r[i] = b[i] - keptB[i];
        }
        for (int e = 0; e < changeCount; e++) {
            int p = deltaEntry[e];
            r[ai[p]] -= deltaValue[e] * keptX[colOf[p]];
        }
        // b is kept before out, which may be the same array, is written
        System.arraycopy(b, 0, keptB, 0, n);
        substitute(r, r);
        for (int i = 0; i < n; i++) {
            out[i] = keptX[i] + r[i];
        }
        System.arraycopy(out, 0, keptX, 0, n);
        changeCount = -1;
    }

    private double[] correction;

    /**
     * Left-looking LU with threshold partial pivoting from column {@code from} on; finds the patterns of L
     * and U. Columns before {@code from} must hold a valid factorisation of the same values.
     *
     * <p>After a failed refactorisation a later column is taken over from the factorisation before when the
     * search would only find it again: its column of A is unchanged, every column of L it is updated by (the
     * pattern of U) was taken over or kept unchanged too, and the rows of its column of L are still without
     * a pivot. Then the reach, the numbers and so the pivot choice are those of before.
     */
    private boolean pivotingFactor(double[] values, int from) {
        fresh++;
        rowPlaceValid = false;
        boolean reuse = factored;
        if (reuse) {
            saveOld(from);
        }
        Arrays.fill(x, 0);
        if (from == 0) {
            Arrays.fill(pinv, -1);
        } else {
            // keep columns 0..from−1 and their pivot rows; L goes back to rows of A while the search runs
            for (int p = 0; p < lp[from]; p++) {
                li[p] = prow[li[p]];
            }
            for (int k = from; k < n; k++) {
                pinv[prow[k]] = -1;
            }
        }
        int lnz = lp[from];
        int unz = up[from];
        for (int k = from; k < n; k++) {
            lp[k] = lnz;
            up[k] = unz;
            if (lnz + n > li.length) {
                int size = Math.max(2 * li.length, lnz + n);
                li = Arrays.copyOf(li, size);
                lx = Arrays.copyOf(lx, size);
            }
            if (unz + n > ui.length) {
                int size = Math.max(2 * ui.length, unz + n);
                ui = Arrays.copyOf(ui, size);
                ux = Arrays.copyOf(ux, size);
            }
            int col = q[k];
            if (reuse && unchangedSince(values, k)) {
                int base = oldLp[from];
                for (int p = oldLp[k]; p < oldLp[k + 1]; p++) {
                    li[lnz] = oldProw[oldLi[p - base]];
                    lx[lnz++] = oldLx[p - base];
                }
                int ubase = oldUp[from];
                for (int p = oldUp[k]; p < oldUp[k + 1]; p++) {
                    ui[unz] = oldUi[p - ubase];
                    ux[unz++] = oldUx[p - ubase];
                }
                pinv[oldProw[k]] = k;
                prow[k] = oldProw[k];
                same[k] = true;
                continue;
            }
            same[k] = false;
            int top = reach(col);
            double big = 0;
            for (int p = ap[col]; p < ap[col + 1]; p++) {
                x[ai[p]] = values[p];
                big = Math.max(big, Math.abs(values[p]));
            }
            // x = L \ A(:,col), in the topological order left by the search; L's rows are still rows of A
            for (int t = top; t < n; t++) {
                int j = xi[t];
                int jj = pinv[j];
                if (jj < 0) {
                    continue;
                }
                double xj = x[j];
                for (int p = lp[jj] + 1; p < lp[jj + 1]; p++) {
                    x[li[p]] -= lx[p] * xj;
                }
            }
            int ipiv = -1;
            double best = -1;
            for (int t = top; t < n; t++) {
                int i = xi[t];
                double v = Math.abs(x[i]);
                big = Math.max(big, v);
                if (pinv[i] < 0) {
                    if (v > best) {
                        best = v;
                        ipiv = i;
                    }
                } else {
                    ui[unz] = pinv[i];
                    ux[unz++] = x[i];
                }
            }
            if (ipiv < 0 || !(best > SINGULAR_TOLERANCE * big) || !Double.isFinite(big)) {
                Arrays.fill(x, 0);
                return false;
            }
            if (pinv[col] < 0 && Math.abs(x[col]) >= PIVOT_TOLERANCE * best) {
                ipiv = col;
            }
            double pivot = x[ipiv];
            ui[unz] = k;
            ux[unz++] = pivot;
            pinv[ipiv] = k;
            prow[k] = ipiv;
            li[lnz] = ipiv;
            lx[lnz++] = 1;
            for (int t = top; t < n; t++) {
                int i = xi[t];
                if (pinv[i] < 0) {
                    li[lnz] = i;
                    lx[lnz++] = x[i] / pivot;
                }
                x[i] = 0;
            }
        }
        lp[n] = lnz;
        up[n] = unz;
        for (int p = 0; p < lnz; p++) {
            li[p] = pinv[li[p]];
        }
        return true;
    }

    /** Keeps columns from..n−1 of the current factors, and marks the columns before that refactor left alone. */
    private void saveOld(int from) {
        if (oldLp == null) {
            oldLp = new int[n + 1];
            oldUp = new int[n + 1];
            oldProw = new int[n];
        }
        System.arraycopy(lp, 0, oldLp, 0, n + 1);
        System.arraycopy(up, 0, oldUp, 0, n + 1);
        System.arraycopy(prow, 0, oldProw, 0, n);
        saveFrom = from;
        int ln = lp[n] - lp[from];
        int un = up[n] - up[from];
        if (oldLi == null || oldLi.length < ln) {
            oldLi = new int[Math.max(ln, li.length)];
            oldLx = new double[oldLi.length];
        }
        if (oldUi == null || oldUi.length < un) {
            oldUi = new int[Math.max(un, ui.length)];
            oldUx = new double[oldUi.length];
        }
        System.arraycopy(li, lp[from], oldLi, 0, ln);
        System.arraycopy(lx, lp[from], oldLx, 0, ln);
        System.arraycopy(ui, up[from], oldUi, 0, un);
        System.arraycopy(ux, up[from], oldUx, 0, un);
        for (int k = 0; k < from; k++) {
            same[k] = !changed[k];
        }
    }

    /**
     * True when column k of the factorisation before would be found again at this point of the search: see
     * {@link #pivotingFactor}. pinv holds the pivots chosen so far.
     */
    private boolean unchangedSince(double[] values, int k) {
        int col = q[k];
        for (int p = ap[col]; p < ap[col + 1]; p++) {
            if (values[p] != last[p]) {
                return false;
            }
        }
        int ubase = oldUp[saveFrom];
        int diag = oldUp[k + 1] - 1;
        for (int p = oldUp[k]; p < diag; p++) {
            if (!same[oldUi[p - ubase]]) {
                return false;
            }
        }
        int base = oldLp[saveFrom];
        for (int p = oldLp[k]; p < oldLp[k + 1]; p++) {
            if (pinv[oldProw[oldLi[p - base]]] >= 0) {
                return false;
            }
        }
        return true;
    }

    /** The column from which the factorisation before is kept in the old arrays. */
    private int saveFrom;

    /**
     * Rows reachable from the pattern of A(:,col) through the columns of L found so far, in topological
     * order in xi[top..n−1] (non-recursive depth-first search).
     */
    private int reach(int col) {
        stamp++;
        if (stamp == Integer.MAX_VALUE) {
            Arrays.fill(mark, 0);
            stamp = 1;
        }
        int top = n;
        for (int p = ap[col]; p < ap[col + 1]; p++) {
            int start = ai[p];
            if (mark[start] == stamp) {
                continue;
            }
            int head = 0;
            stack[0] = start;
            mark[start] = stamp;
            next[0] = pinv[start] < 0 ? -1 : lp[pinv[start]] + 1;
            while (head >= 0) {
                int j = stack[head];
                int jj = pinv[j];
                boolean descended = false;
                if (jj >= 0) {
                    int end = lp[jj + 1];
                    for (int t = next[head]; t < end; t++) {
                        int i = li[t];
                        if (mark[i] != stamp) {
                            next[head] = t + 1;
                            mark[i] = stamp;
                            head++;
                            stack[head] = i;
                            next[head] = pinv[i] < 0 ? -1 : lp[pinv[i]] + 1;
                            descended = true;
                            break;
                        }
                    }
                }
                if (!descended) {
                    head--;
                    xi[--top] = j;
                }
            }
        }
        return top;
    }

    /**
     * Numeric factorisation along the stored pivot order and patterns. Column k of L and U is a function of
     * column Q[k] of A and of the columns of L named in the pattern of U(:,k); when none of these changed
     * since the last factorisation, the column is left as it is (it passed the pivot test with the same
     * numbers then).
     *
     * @return −1 when done, else the first column whose pivot failed the test
     */
    private int refactor(double[] values) {
        int[] place = rowPlace();
        // x is all zero between columns: each column clears what it wrote as it reads it back
        for (int k = 0; k < n; k++) {
            int col = q[k];
            int diag = up[k + 1] - 1;
            boolean ch = false;
            for (int p = ap[col]; p < ap[col + 1]; p++) {
                if (values[p] != last[p]) {
                    ch = true;
                    break;
                }
            }
            if (!ch) {
                for (int p = up[k]; p < diag; p++) {
                    if (changed[ui[p]]) {
                        ch = true;
                        break;
                    }
                }
            }
            changed[k] = ch;
            if (ch && !column(k, values, place)) {
                return k;
            }
        }
        return -1;
    }

    /** {@link #rowPlace} for the current pivot order. */
    private int[] rowPlace() {
        if (rowPlace == null) {
            rowPlace = new int[ap[n]];
        }
        if (!rowPlaceValid) {
            for (int p = 0; p < ap[n]; p++) {
                rowPlace[p] = pinv[ai[p]];
            }
            rowPlaceValid = true;
        }
        return rowPlace;
    }

    /**
     * Recomputes column k of L and U along the stored pattern and pivot order. False when its pivot fails the
     * refactorisation's test; the work vector x is all zero again either way.
     */
    private boolean column(int k, double[] values, int[] place) {
        int col = q[k];
        int diag = up[k + 1] - 1;
        double big = 0;
        for (int p = ap[col]; p < ap[col + 1]; p++) {
            double v = values[p];
            x[place[p]] = v;
            big = Math.max(big, Math.abs(v));
        }
        for (int p = up[k]; p < diag; p++) {
            int j = ui[p];
            double xj = x[j];
            x[j] = 0;
            ux[p] = xj;
            big = Math.max(big, Math.abs(xj));
            if (xj != 0) {
                for (int t = lp[j] + 1; t < lp[j + 1]; t++) {
                    x[li[t]] -= lx[t] * xj;
                }
            }
        }
        double pivot = x[k];
        x[k] = 0;
        double best = Math.abs(pivot);
        for (int t = lp[k] + 1; t < lp[k + 1]; t++) {
            best = Math.max(best, Math.abs(x[li[t]]));
        }
        big = Math.max(big, best);
        if (!(Math.abs(pivot) >= REFACTOR_PIVOT_TOLERANCE * best) || !(best > SINGULAR_TOLERANCE * big)
                || !Double.isFinite(big)) {
            for (int t = lp[k] + 1; t < lp[k + 1]; t++) {
                x[li[t]] = 0;
            }
            return false;
        }
        ux[diag] = pivot;
        double inverse = 1 / pivot;
        for (int t = lp[k] + 1; t < lp[k + 1]; t++) {
            int i = li[t];
            lx[t] = x[i] * inverse;
            x[i] = 0;
        }
        return true;
    }

    /** Pivot position of the row of each stored entry of A, for the current pivot order. */
    private int[] rowPlace;
    private boolean rowPlaceValid;

    /**
     * Solves A·out = b with the last successful factorisation; b and out may be the same array. Keeps b and
     * the answer for a {@link #solveChanged} after the next {@link #factorChanged}.
     */
    void solve(double[] b, double[] out) {
        if (!factored) {
            throw new IllegalStateException("sparse LU: solve before a successful factorisation");
        }
        if (keptB == null) {
            keptB = new double[n];
            keptX = new double[n];
        }
        System.arraycopy(b, 0, keptB, 0, n);
        substitute(b, out);
        System.arraycopy(out, 0, keptX, 0, n);
        solutionKept = true;
        changeCount = -1;
    }

    /** The forward and back substitutions; zeros in b and in the partial answers are skipped. */
    private void substitute(double[] b, double[] out) {
        double[] y = x;
        for (int k = 0; k < n; k++) {
            y[k] = b[prow[k]];
        }
        for (int k = 0; k < n; k++) {
            double yk = y[k];
            if (yk != 0) {
                for (int p = lp[k] + 1; p < lp[k + 1]; p++) {
                    y[li[p]] -= lx[p] * yk;
                }
            }
        }
        for (int k = n - 1; k >= 0; k--) {
            int diag = up[k + 1] - 1;
            double yk = y[k] / ux[diag];
            y[k] = yk;
            if (yk != 0) {
                for (int p = up[k]; p < diag; p++) {
                    y[ui[p]] -= ux[p] * yk;
                }
            }
        }
        for (int k = 0; k < n; k++) {
            out[q[k]] = y[k];
        }
        Arrays.fill(y, 0);
    }
}
