package spoolwork.solver.numeric;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Arrays;
import java.util.Map;
import java.util.SplittableRandom;
import java.util.TreeMap;

import org.ejml.data.DMatrixRMaj;
import org.ejml.dense.row.factory.LinearSolverFactory_DDRM;
import org.ejml.interfaces.linsol.LinearSolver;
import org.junit.jupiter.api.Test;

/**
 * Checks {@link SparseLu}, a left-looking LU with threshold partial pivoting after Gilbert & Peierls,
 * "Sparse partial pivoting in time proportional to arithmetic operations" (SIAM J. Sci. Stat. Comput. 9,
 * 1988), in the form given by Davis, "Direct Methods for Sparse Linear Systems" (SIAM, 2006), chapter 6
 * (cs_lu), with a refactorisation that keeps the pivot order and patterns.
 *
 * <p>Accuracy is judged by the normwise backward error ‖Ax − b‖ / (‖A‖‖x‖ + ‖b‖) (infinity norms),
 * which a backward stable solver keeps near the unit round-off (Higham, "Accuracy and Stability of Numerical
 * Algorithms", 2nd ed., 2002, ch. 7, Rigal–Gaches theorem); the bound 1e-12 leaves room for the growth that
 * threshold pivoting allows.
 */
class SparseLuTest {
    private static final double BACKWARD_ERROR = 1e-12;

    /** A square sparse matrix kept as a map from (column, row) to value, with helpers for CSC and dense. */
    private static final class Sparse {
        final int n;
        final TreeMap<Long, Double> entries = new TreeMap<>();

        Sparse(int n) {
            this.n = n;
        }

        void add(int row, int col, double v) {
            entries.merge((long) col * n + row, v, Double::sum);
        }

        void set(int row, int col, double v) {
            entries.put((long) col * n + row, v);
        }

        int[] colPtr() {
            int[] p = new int[n + 1];
            for (long key : entries.keySet()) {
                p[(int) (key / n) + 1]++;
            }
            for (int j = 0; j < n; j++) {
                p[j + 1] += p[j];
            }
            return p;
        }

        int[] rowIdx() {
            return entries.keySet().stream().mapToInt(k -> (int) (k % n)).toArray();
        }

        double[] values() {
            return entries.values().stream().mapToDouble(Double::doubleValue).toArray();
        }

        /** The same pattern with new values from the given source. */
        Sparse withValues(java.util.function.DoubleSupplier next) {
            Sparse s = new Sparse(n);
            for (long key : entries.keySet()) {
                s.entries.put(key, next.getAsDouble());
            }
            return s;
        }

        double[] times(double[] x) {
            double[] y = new double[n];
            for (Map.Entry<Long, Double> e : entries.entrySet()) {
                int col = (int) (e.getKey() / n);
                int row = (int) (e.getKey() % n);
                y[row] += e.getValue() * x[col];
            }
            return y;
        }

        double normInf() {
            double[] rowSum = new double[n];
            for (Map.Entry<Long, Double> e : entries.entrySet()) {
                rowSum[(int) (e.getKey() % n)] += Math.abs(e.getValue());
            }
            return Arrays.stream(rowSum).max().orElse(0);
        }

        DMatrixRMaj dense() {
            DMatrixRMaj a = new DMatrixRMaj(n, n);
            for (Map.Entry<Long, Double> e : entries.entrySet()) {
                a.set((int) (e.getKey() % n), (int) (e.getKey() / n), e.getValue());
            }
            return a;
        }
    }

    /**
     * A circuit-like matrix: nodes joined by a random tree plus a few extra branches, each branch adding
     * the usual nodal stamp with a slightly unsymmetric coupling, some nodes tied to ground, and
     * {@code constraints} extra unknowns whose rows and columns couple to one node each with a zero diagonal
     * (as a fixed pressure or a complementarity condition does), so that pivoting is needed.
     */
    private static Sparse circuitLike(int nodes, int constraints, boolean badlyScaled, long seed) {
        SplittableRandom rnd = new SplittableRandom(seed);
        int n = nodes + constraints;
        Sparse a = new Sparse(n);
        for (int i = 0; i < nodes; i++) {
            a.add(i, i, rnd.nextDouble(1e-3, 1e-2));
        }
        int branches = nodes - 1 + nodes / 3;
        for (int b = 0; b < branches; b++) {
            int i = b + 1 < nodes ? b + 1 : rnd.nextInt(nodes);
            int j = b + 1 < nodes ? rnd.nextInt(b + 1) : rnd.nextInt(nodes);
            if (i == j) {
                continue;
            }
            double g = Math.exp(rnd.nextDouble(-3, 3));
            double skew = 1 + rnd.nextDouble(-0.3, 0.3);
            a.add(i, i, g);
            a.add(j, j, g * skew);
            a.add(i, j, -g * skew);
            a.add(j, i, -g);
        }
        int[] tied = new int[nodes];
        for (int i = 0; i < nodes; i++) {
            tied[i] = i;
        }
        for (int c = 0; c < constraints; c++) {
            // distinct nodes: two constraints on one node would make the matrix singular
            int pick = c + rnd.nextInt(nodes - c);
            int node = tied[pick];
            tied[pick] = tied[c];
            tied[c] = node;
            int k = nodes + c;
            a.add(k, node, 1 + rnd.nextDouble());
            a.add(node, k, 1);
            if (rnd.nextBoolean() && nodes > 1) {
                int other = (node + 1 + rnd.nextInt(nodes - 1)) % nodes;
                a.add(k, other, -rnd.nextDouble());
            }
            a.set(k, k, 0);
        }
        if (badlyScaled) {
            double[] r = new double[n];
            double[] s = new double[n];
            for (int i = 0; i < n; i++) {
                r[i] = Math.pow(10, rnd.nextDouble(-5, 5));
                s[i] = Math.pow(10, rnd.nextDouble(-5, 5));
            }
            Sparse scaled = new Sparse(n);
            for (Map.Entry<Long, Double> e : a.entries.entrySet()) {
                int col = (int) (e.getKey() / n);
                int row = (int) (e.getKey() % n);
                scaled.entries.put(e.getKey(), e.getValue() * r[row] * s[col]);
            }
            return scaled;
        }
        return a;
    }

    private static double backwardError(Sparse a, double[] x, double[] b) {
        double[] ax = a.times(x);
        double res = 0;
        for (int i = 0; i < a.n; i++) {
            res = Math.max(res, Math.abs(ax[i] - b[i]));
        }
        double xn = Arrays.stream(x).map(Math::abs).max().orElse(0);
        double bn = Arrays.stream(b).map(Math::abs).max().orElse(0);
        return res / (a.normInf() * xn + bn);
    }

    private static double[] randomVector(int n, long seed) {
        SplittableRandom rnd = new SplittableRandom(seed);
        double[] b = new double[n];
        for (int i = 0; i < n; i++) {
            b[i] = rnd.nextDouble(-1, 1);
        }
        return b;
    }

    private static int[] order(Sparse a, int kind) {
        if (kind == 0) {
            return null;
        }
        int[] rows = a.rowIdx();
        int[] cols = new int[rows.length];
        int[] p = a.colPtr();
        for (int j = 0; j < a.n; j++) {
            Arrays.fill(cols, p[j], p[j + 1], j);
        }
        return kind == 1 ? Ordering.minimumDegree(a.n, rows, cols, rows.length)
                : Ordering.reverseCuthillMcKee(a.n, rows, cols, rows.length);
    }

    private static double[] denseSolve(Sparse a, double[] b) {
        LinearSolver<DMatrixRMaj, DMatrixRMaj> lu = LinearSolverFactory_DDRM.lu(a.n);
        assertTrue(lu.setA(a.dense()), "dense reference accepts the matrix");
        DMatrixRMaj x = new DMatrixRMaj(a.n, 1);
        lu.solve(new DMatrixRMaj(a.n, 1, true, b), x);
        return x.data;
    }

    @Test
    void randomCircuitLikeMatricesMatchDenseLu() {
        int[] sizes = {1, 2, 3, 5, 8, 13, 30, 64, 100, 250, 500, 1000, 2000};
        int cases = 0;
        for (int size : sizes) {
            int seeds = size <= 100 ? 12 : size <= 500 ? 4 : 1;
            for (int seed = 0; seed < seeds; seed++) {
                int variant = (seed + size) % 3;
                int constraints = variant == 1 ? Math.max(1, size / 8) : variant == 2 ? size / 20 : 0;
                int nodes = Math.max(1, size - constraints);
                Sparse a = circuitLike(nodes, constraints, variant == 2, 1000L * size + seed);
                double[] b = randomVector(a.n, seed);
                double[] reference = denseSolve(a, b);
                assertTrue(backwardError(a, reference, b) <= BACKWARD_ERROR, "dense reference is accurate");
                for (int kind = 0; kind < 3; kind++) {
                    SparseLu lu = new SparseLu(a.n, a.colPtr(), a.rowIdx(), order(a, kind));
                    assertTrue(lu.factor(a.values()), "size " + size + " seed " + seed + " ordering " + kind);
                    double[] x = new double[a.n];
                    lu.solve(b, x);
                    String where = "size " + size + " seed " + seed + " variant " + variant + " ordering " + kind;
                    assertTrue(backwardError(a, x, b) <= BACKWARD_ERROR, where + ": " + backwardError(a, x, b));
                    if (variant != 2) {
                        // well scaled: the two solutions agree to far better than the conditioning spoils
                        double scale = Arrays.stream(reference).map(Math::abs).max().orElse(1);
                        for (int i = 0; i < a.n; i++) {
                            assertEquals(reference[i], x[i], 1e-7 * scale, where + " unknown " + i);
                        }
                    }
                    cases++;
                }
            }
        }
        assertTrue(cases > 300);
    }

    @Test
    void zeroDiagonalsAreHandledByRowPivoting() {
        Sparse a = circuitLike(40, 15, false, 7);
        SparseLu lu = new SparseLu(a.n, a.colPtr(), a.rowIdx(), null);
        assertTrue(lu.factor(a.values()));
        double[] b = randomVector(a.n, 3);
        double[] x = b.clone();
        lu.solve(x, x); // the right side may be overwritten by the answer
        assertTrue(backwardError(a, x, b) <= BACKWARD_ERROR);
    }

    @Test
    void refactorWithNewValuesOnSamePatternAgrees() {
        for (int seed = 0; seed < 20; seed++) {
            Sparse a = circuitLike(300, seed % 2 == 0 ? 0 : 30, false, 50 + seed);
            int[] q = order(a, 1);
            SparseLu lu = new SparseLu(a.n, a.colPtr(), a.rowIdx(), q);
            assertTrue(lu.factor(a.values()));
            int fill = lu.factorEntries();
            SplittableRandom rnd = new SplittableRandom(seed);
            for (int round = 0; round < 5; round++) {
                // the same matrix with every value moved by up to ±20 %, as between Newton iterations
                Sparse changed = new Sparse(a.n);
                for (Map.Entry<Long, Double> e : a.entries.entrySet()) {
                    changed.entries.put(e.getKey(), e.getValue() * (1 + rnd.nextDouble(-0.2, 0.2)));
                }
                assertTrue(lu.factor(changed.values()));
                double[] b = randomVector(a.n, round);
                double[] x = new double[a.n];
                lu.solve(b, x);
                assertTrue(backwardError(changed, x, b) <= BACKWARD_ERROR, "seed " + seed + " round " + round);
                double[] reference = denseSolve(changed, b);
                double scale = Arrays.stream(reference).map(Math::abs).max().orElse(1);
                for (int i = 0; i < a.n; i++) {
                    assertEquals(reference[i], x[i], 1e-7 * scale);
                }
                assertEquals(fill, lu.factorEntries(), "the refactorisation keeps the patterns");
            }
            assertEquals(1, lu.pivotingFactorisations(), "nudged values keep the first pivot order");
        }
    }

    @Test
    void refactorAfterChangingOneRowAgreesWithDenseLu() {
        // a few rows rewritten at a time, as when complementarity rows change sides: the refactorisation
        // redoes only the columns that depend on them and must still solve the whole changed matrix; when a
        // kept pivot fails, the search takes over the later columns it would find again
        int searches = 0;
        for (int seed = 0; seed < 10; seed++) {
            Sparse a = circuitLike(300, 30, false, 90 + seed);
            SparseLu lu = new SparseLu(a.n, a.colPtr(), a.rowIdx(), order(a, 1));
            assertTrue(lu.factor(a.values()));
            SplittableRandom rnd = new SplittableRandom(seed);
            for (int round = 0; round < 16; round++) {
                // the matrix with one row changed (so two rows differ from the round before): odd rounds new
                // values, even rounds a diagonal entry that all but vanishes, below the refactorisation's
                // threshold, as at a node held only by a leak
                int row = rnd.nextInt(a.n);
                Sparse changed = new Sparse(a.n);
                for (Map.Entry<Long, Double> e : a.entries.entrySet()) {
                    long key = e.getKey();
                    boolean inRow = key % a.n == row;
                    double v = e.getValue();
                    if (inRow && round % 2 == 1) {
                        v = rnd.nextDouble(-1, 1);
                    } else if (inRow && key / a.n == row) {
                        v *= 1e-10;
                    }
                    changed.entries.put(key, v);
                }
                assertTrue(lu.factor(changed.values()), "seed " + seed + " round " + round);
                double[] b = randomVector(a.n, round);
                double[] x = new double[a.n];
                lu.solve(b, x);
                String where = "seed " + seed + " round " + round + " row " + row;
                assertTrue(backwardError(changed, x, b) <= BACKWARD_ERROR, where);
                double[] reference = denseSolve(changed, b);
                double scale = Arrays.stream(reference).map(Math::abs).max().orElse(1);
                // the forward error of any backward-stable solve grows with the condition number, which
                // ‖x‖/‖b‖ bounds from below: a diagonal that all but vanishes makes some of these matrices
                // nearly singular
                double bScale = Arrays.stream(b).map(Math::abs).max().orElse(1);
                double relative = Math.max(1e-6, 1e-15 * scale / bScale);
                for (int i = 0; i < a.n; i++) {
                    assertEquals(reference[i], x[i], relative * scale, where + " unknown " + i);
                }
            }
            searches += lu.pivotingFactorisations() - 1;
        }
        assertTrue(searches >= 5, "rewritten rows make kept pivots fail now and then: " + searches);
    }

    @Test
    void refactorFallsBackWhenAKeptPivotVanishes() {
        // [[d, 1], [1, 1]]: with d = 1 the diagonal is taken as pivot; with d = 0 it is useless
        int[] colPtr = {0, 2, 4};
        int[] rowIdx = {0, 1, 0, 1};
        SparseLu lu = new SparseLu(2, colPtr, rowIdx, null);
        assertTrue(lu.factor(new double[] {1, 1, 1, 1 + 1e-9}));
        assertEquals(1, lu.pivotingFactorisations());
        assertTrue(lu.factor(new double[] {0, 1, 1, 1}));
        assertEquals(2, lu.pivotingFactorisations(), "a zero pivot forces a fresh search");
        double[] x = new double[2];
        lu.solve(new double[] {3, 5}, x);
        // 0·x0 + x1 = 3, x0 + x1 = 5
        assertArrayEquals(new double[] {2, 3}, x, 1e-15);

        // the same in a larger matrix: node 0 is taken first, its diagonal (the sum of its conductances) is
        // far above the threshold and becomes the pivot; then that diagonal falls to zero
        Sparse a = circuitLike(200, 20, false, 11);
        int[] md = order(a, 1);
        int[] q = new int[a.n];
        int at = 1;
        for (int c : md) {
            if (c != 0) {
                q[at++] = c;
            }
        }
        SparseLu big = new SparseLu(a.n, a.colPtr(), a.rowIdx(), q);
        assertTrue(big.factor(a.values()));
        Sparse changed = new Sparse(a.n);
        changed.entries.putAll(a.entries);
        changed.set(0, 0, 0);
        assertTrue(big.factor(changed.values()));
        assertEquals(2, big.pivotingFactorisations());
        double[] b = randomVector(a.n, 1);
        double[] y = new double[a.n];
        big.solve(b, y);
        assertTrue(backwardError(changed, y, b) <= BACKWARD_ERROR);
    }

    @Test
    void fallbackInALaterColumnKeepsTheColumnsBefore() {
        // a circuit-like block, then a 2×2 block [[d, 1], [1, 1]] whose columns also have entries in rows of
        // the first block; the first block is numbered by minimum degree, the 2×2 block last, so that its
        // pivot is d itself
        Sparse first = circuitLike(60, 6, false, 21);
        int m = first.n;
        Sparse a = new Sparse(m + 2);
        for (Map.Entry<Long, Double> e : first.entries.entrySet()) {
            a.add((int) (e.getKey() % m), (int) (e.getKey() / m), e.getValue());
        }
        a.add(m, m, 1);
        a.add(m + 1, m, 1);
        a.add(m, m + 1, 1);
        a.add(m + 1, m + 1, 1.5);
        for (int j = 3; j < m; j += 7) {
            a.add(j, m, 0.25 * j);
            a.add(j + 1, m + 1, -0.5);
        }
        int[] q = Arrays.copyOf(order(first, 1), a.n);
        q[m] = m;
        q[m + 1] = m + 1;
        SparseLu lu = new SparseLu(a.n, a.colPtr(), a.rowIdx(), q);
        assertTrue(lu.factor(a.values()));
        SplittableRandom rnd = new SplittableRandom(4);
        for (int round = 0; round < 3; round++) {
            Sparse changed = a.withValues(() -> 0);
            for (Map.Entry<Long, Double> e : a.entries.entrySet()) {
                changed.entries.put(e.getKey(), e.getValue() * (1 + rnd.nextDouble(-0.1, 0.1)));
            }
            if (round == 1) {
                changed.set(m, m, 0);
            }
            assertTrue(lu.factor(changed.values()));
            assertEquals(round == 0 ? 1 : 2, lu.pivotingFactorisations(), "round " + round);
            double[] b = randomVector(a.n, round);
            double[] x = new double[a.n];
            lu.solve(b, x);
            assertTrue(backwardError(changed, x, b) <= BACKWARD_ERROR, "round " + round);
            double[] reference = denseSolve(changed, b);
            double scale = Arrays.stream(reference).map(Math::abs).max().orElse(1);
            for (int i = 0; i < a.n; i++) {
                assertEquals(reference[i], x[i], 1e-9 * scale, "round " + round + " unknown " + i);
            }
        }
    }

    @Test
    void refactorFallsBackWhenAKeptPivotBecomesTiny() {
        // pivot 1e-11 against a candidate 1 in its column fails the refactorisation's 1e-9 threshold; a
        // fresh search swaps rows
        int[] colPtr = {0, 2, 4};
        int[] rowIdx = {0, 1, 0, 1};
        SparseLu lu = new SparseLu(2, colPtr, rowIdx, null);
        assertTrue(lu.factor(new double[] {2, 1, 1, 3}));
        assertTrue(lu.factor(new double[] {1e-11, 1, 1, 3}));
        assertEquals(2, lu.pivotingFactorisations());
        double[] x = new double[2];
        lu.solve(new double[] {1, 2}, x);
        double det = 1e-11 * 3 - 1;
        assertEquals((3 - 2) / det, x[0], 1e-14);
        assertEquals((1e-11 * 2 - 1) / det, x[1], 1e-14);
    }

    @Test
    void aWeakKeptPivotKeepsTheOrderAndASmallResidual() {
        // [[d, 1], [1, 0]] after [[2, 1], [1, 0]]: with d = 1e-7 the kept diagonal pivot is below the search's
        // 1e-6 but above the refactorisation's 1e-9, so the order stays; L then holds 1/d = 1e7, and x0 comes
        // out of a cancellation 1 − x1 that costs it about seven digits, yet the residual stays small
        int[] colPtr = {0, 2, 4};
        int[] rowIdx = {0, 1, 0, 1};
        SparseLu lu = new SparseLu(2, colPtr, rowIdx, null);
        assertTrue(lu.factor(new double[] {2, 1, 1, 0}));
        double d = 1e-7;
        assertTrue(lu.factor(new double[] {d, 1, 1, 0}));
        assertEquals(1, lu.pivotingFactorisations(), "no new search");
        // d·x0 + x1 = 1, x0 = 0.5: x1 = 1 − 0.5·d
        double[] x = new double[2];
        lu.solve(new double[] {1, 0.5}, x);
        assertEquals(1 - 0.5 * d, x[1], 1e-15);
        assertEquals(1, d * x[0] + x[1], 1e-14, "first row");
        assertEquals(0.5, x[0], 1e-8, "second row");
        // below the refactorisation's threshold the search runs again and takes the other row
        assertTrue(lu.factor(new double[] {1e-12, 1, 1, 0}));
        assertEquals(2, lu.pivotingFactorisations());
        lu.solve(new double[] {1, 0.5}, x);
        assertEquals(0.5, x[0], 1e-15);
        assertEquals(1 - 0.5e-12, x[1], 1e-15);
    }

    /**
     * A circuit-like block of 200 nodes and 20 constraint rows on distinct nodes, each tied both ways to its
     * node with a zero diagonal (as a valve's margin row on its open side), numbered by minimum degree with
     * the constraint unknowns after a neighbour as the solver does; with the elimination's pattern of L.
     */
    private record Numbered(Sparse b, int n, int nodes, int[] lStart, int[] lRows, int[] inverse) {
        SparseLu lu() {
            return new SparseLu(n, b.colPtr(), b.rowIdx(), lStart, lRows);
        }
    }

    private static Numbered numberedWithConstraints(long seed) {
        int nodes = 200;
        Sparse block = circuitLike(nodes, 0, false, 300 + seed);
        int n = nodes + 20;
        Sparse a = new Sparse(n);
        a.entries.putAll(block.entries.entrySet().stream().collect(java.util.stream.Collectors.toMap(
                e -> e.getKey() / nodes * n + e.getKey() % nodes, Map.Entry::getValue)));
        for (int c = 0; c < 20; c++) {
            int node = 7 * c + 3;
            a.add(nodes + c, node, 1.5);
            a.add(node, nodes + c, 1);
            a.set(nodes + c, nodes + c, 0);
        }
        int[] rows = a.rowIdx();
        int[] cols = new int[rows.length];
        int[] p = a.colPtr();
        for (int j = 0; j < n; j++) {
            Arrays.fill(cols, p[j], p[j + 1], j);
        }
        boolean[] delayed = new boolean[n];
        Arrays.fill(delayed, nodes, n, true);
        Ordering.Elimination elimination = new Ordering.Elimination();
        int[] perm = Ordering.minimumDegree(n, rows, cols, rows.length, delayed, elimination);
        int[] inverse = new int[n];
        for (int i = 0; i < n; i++) {
            inverse[perm[i]] = i;
        }
        Sparse b = new Sparse(n);
        for (Map.Entry<Long, Double> e : a.entries.entrySet()) {
            b.add(inverse[(int) (e.getKey() % n)], inverse[(int) (e.getKey() / n)], e.getValue());
        }
        int[] lRows = Arrays.copyOf(elimination.rows, elimination.start[n]);
        for (int t = 0; t < lRows.length; t++) {
            lRows[t] = inverse[lRows[t]];
        }
        return new Numbered(b, n, nodes, elimination.start, lRows, inverse);
    }

    @Test
    void aPatternFromTheEliminationFactorsWithoutSearching() {
        for (long seed = 0; seed < 5; seed++) {
            Numbered nb = numberedWithConstraints(seed);
            Sparse b = nb.b();
            int n = nb.n();
            SparseLu lu = nb.lu();
            assertTrue(lu.factor(b.values()), "seed " + seed);
            assertEquals(0, lu.pivotingFactorisations(), "seed " + seed + ": every diagonal pivot passes");
            double[] rhs = randomVector(n, seed);
            double[] x = new double[n];
            lu.solve(rhs, x);
            assertTrue(backwardError(b, x, rhs) <= BACKWARD_ERROR, "seed " + seed);
            double[] reference = denseSolve(b, rhs);
            double scale = Arrays.stream(reference).map(Math::abs).max().orElse(1);
            for (int i = 0; i < n; i++) {
                assertEquals(reference[i], x[i], 1e-9 * scale, "seed " + seed + " unknown " + i);
            }
            // the first column's other entries grown a million million times dwarf its diagonal pivot (an
            // entry of A itself) past the threshold: the search takes over
            Sparse changed = new Sparse(n);
            for (Map.Entry<Long, Double> e : b.entries.entrySet()) {
                boolean below = e.getKey() / n == 0 && e.getKey() % n != 0;
                changed.entries.put(e.getKey(), below ? 1e12 * e.getValue() : e.getValue());
            }
            assertTrue(lu.factor(changed.values()), "seed " + seed);
            assertEquals(1, lu.pivotingFactorisations(), "seed " + seed);
            lu.solve(rhs, x);
            assertTrue(backwardError(changed, x, rhs) <= BACKWARD_ERROR, "seed " + seed);
        }
    }

    /** Entries listed as rewritten: the new matrix and the indices of the stored entries that were written. */
    private record Rewritten(Sparse matrix, int[] entries, int[] rows) {
    }

    /**
     * {@code count} random constraint rows of nb change side: each row holds its own unknown instead of its
     * node's pressure. Lists the stored entries written, in storage order, and the rows.
     */
    private static Rewritten switchSides(Numbered nb, int count, SplittableRandom rnd) {
        int n = nb.n();
        Sparse changed = new Sparse(n);
        changed.entries.putAll(nb.b().entries);
        java.util.List<Long> keys = new java.util.ArrayList<>(nb.b().entries.keySet());
        java.util.List<Integer> entries = new java.util.ArrayList<>();
        int[] rows = new int[count];
        for (int c = 0; c < count; c++) {
            int row = nb.inverse()[nb.nodes() + rnd.nextInt(20)];
            rows[c] = row;
            for (int t = 0; t < keys.size(); t++) {
                long key = keys.get(t);
                if (key % n == row) {
                    changed.entries.put(key, key / n == row ? 1.0 : 0.0);
                    entries.add(t);
                }
            }
        }
        return new Rewritten(changed, entries.stream().mapToInt(Integer::intValue).toArray(), rows);
    }

    @Test
    void aRefactorFromTheListedEntriesMatchesOneThatComparesThemAll() {
        for (long seed = 0; seed < 5; seed++) {
            Numbered nb = numberedWithConstraints(seed);
            Sparse b = nb.b();
            int n = nb.n();
            SparseLu listed = nb.lu();
            SparseLu compared = nb.lu();
            assertTrue(listed.factor(b.values()));
            assertTrue(compared.factor(b.values()));
            // three constraint rows change side
            Rewritten rewritten = switchSides(nb, 3, new SplittableRandom(seed));
            Sparse changed = rewritten.matrix();
            int[] list = rewritten.entries();
            java.util.List<Long> keys = new java.util.ArrayList<>(b.entries.keySet());
            assertTrue(listed.factorChanged(changed.values(), list, list.length), "seed " + seed);
            assertTrue(compared.factor(changed.values()), "seed " + seed);
            double[] rhs = randomVector(n, seed);
            double[] x = new double[n];
            double[] y = new double[n];
            listed.solve(rhs, x);
            compared.solve(rhs, y);
            // the same columns recomputed with the same arithmetic: the same numbers to the last bit
            assertArrayEquals(y, x, 0, "seed " + seed);
            assertTrue(backwardError(changed, x, rhs) <= BACKWARD_ERROR, "seed " + seed);
            assertEquals(0, listed.pivotingFactorisations(), "seed " + seed);
            // an entry listed again after the first column grew a million million times: its diagonal pivot
            // fails, the search takes over from there and the answer is still right
            Sparse grown = new Sparse(n);
            grown.entries.putAll(changed.entries);
            java.util.List<Integer> below = new java.util.ArrayList<>();
            for (int t = 0; t < keys.size(); t++) {
                long key = keys.get(t);
                if (key / n == 0 && key % n != 0) {
                    grown.entries.put(key, 1e12 * changed.entries.get(key));
                    below.add(t);
                }
            }
            int[] grownList = below.stream().mapToInt(Integer::intValue).toArray();
            assertTrue(listed.factorChanged(grown.values(), grownList, grownList.length), "seed " + seed);
            assertEquals(1, listed.pivotingFactorisations(), "seed " + seed);
            listed.solve(rhs, x);
            assertTrue(backwardError(grown, x, rhs) <= BACKWARD_ERROR, "seed " + seed);
        }
    }

    @Test
    void aSolveRightAfterAListedRefactorStartsFromTheAnswerBefore() {
        for (long seed = 0; seed < 5; seed++) {
            Numbered nb = numberedWithConstraints(seed);
            Sparse b = nb.b();
            int n = nb.n();
            SparseLu lu = nb.lu();
            assertTrue(lu.factor(b.values()));
            double[] rhs = randomVector(n, seed);
            double[] x = new double[n];
            lu.solve(rhs, x);
            // two constraint rows change side, and their right-hand sides with them
            SplittableRandom rnd = new SplittableRandom(100 + seed);
            Rewritten rewritten = switchSides(nb, 2, rnd);
            Sparse changed = rewritten.matrix();
            int[] list = rewritten.entries();
            double[] rhs2 = rhs.clone();
            for (int row : rewritten.rows()) {
                rhs2[row] = rnd.nextDouble(-1, 1);
            }
            assertTrue(lu.factorChanged(changed.values(), list, list.length));
            double[] fromBefore = rhs2.clone();
            lu.solveChanged(fromBefore, fromBefore);
            double[] fresh = new double[n];
            lu.solve(rhs2, fresh);
            assertTrue(backwardError(changed, fromBefore, rhs2) <= BACKWARD_ERROR, "seed " + seed);
            double scale = Arrays.stream(fresh).map(Math::abs).max().orElse(1);
            for (int i = 0; i < n; i++) {
                assertEquals(fresh[i], fromBefore[i], 1e-10 * scale, "seed " + seed + " unknown " + i);
            }
            // with no listed refactorisation since the last solve it is a plain solve
            double[] again = rhs2.clone();
            lu.solveChanged(again, again);
            assertArrayEquals(fresh, again, 0, "seed " + seed);
        }
    }

    @Test
    void aPatternThatMissesAnEntryOfTheMatrixIsRejected() {
        // [[1, 1], [1, 1]] with nothing below the diagonal of L: entry (1, 0) has no place
        int[] colPtr = {0, 2, 4};
        int[] rowIdx = {0, 1, 0, 1};
        assertThrows(IllegalArgumentException.class,
                () -> new SparseLu(2, colPtr, rowIdx, new int[] {0, 0, 0}, new int[0]));
        assertThrows(IllegalArgumentException.class,
                () -> new SparseLu(2, colPtr, rowIdx, new int[] {0, 1, 1}, new int[] {0}), "row not below");
        new SparseLu(2, colPtr, rowIdx, new int[] {0, 1, 1}, new int[] {1});
    }

    @Test
    void singularMatricesAreReported() {
        // an empty column
        assertFalse(new SparseLu(2, new int[] {0, 2, 2}, new int[] {0, 1}, null).factor(new double[] {1, 2}));
        // two columns with entries in one row only: structurally singular
        SparseLu structural = new SparseLu(3, new int[] {0, 1, 2, 4}, new int[] {0, 0, 1, 2}, null);
        assertFalse(structural.factor(new double[] {1, 2, 3, 4}));
        // numerically singular: row 2 = row 0 + row 1
        SparseLu dependent = new SparseLu(3, new int[] {0, 3, 6, 9}, new int[] {0, 1, 2, 0, 1, 2, 0, 1, 2}, null);
        assertFalse(dependent.factor(new double[] {0.1, 0.7, 0.8, 0.3, 0.9, 1.2, 1.7, 0.2, 1.9}));
        // a value that is not finite
        SparseLu two = new SparseLu(2, new int[] {0, 1, 2}, new int[] {0, 1}, null);
        assertFalse(two.factor(new double[] {1, Double.NaN}));
        assertThrows(IllegalStateException.class, () -> two.solve(new double[2], new double[2]));
        // refactorising into a singular matrix is reported too, and a later good matrix factors again
        assertTrue(two.factor(new double[] {1, 2}));
        assertFalse(two.factor(new double[] {1, 0}));
        assertTrue(two.factor(new double[] {4, 2}));
        double[] x = new double[2];
        two.solve(new double[] {2, 1}, x);
        assertArrayEquals(new double[] {0.5, 0.5}, x, 0);
    }

    @Test
    void largeSingularCircuitLikeMatrixIsReported() {
        // one more constraint row tied to the same node as another constraint duplicates that row
        Sparse a = circuitLike(500, 10, false, 5);
        Sparse s = new Sparse(a.n + 1);
        for (Map.Entry<Long, Double> e : a.entries.entrySet()) {
            s.add((int) (e.getKey() % a.n), (int) (e.getKey() / a.n), e.getValue());
        }
        int last = a.n;
        int copied = a.n - 1;
        for (Map.Entry<Long, Double> e : a.entries.entrySet()) {
            if (e.getKey() % a.n == copied) {
                s.add(last, (int) (e.getKey() / a.n), 2 * e.getValue());
            }
        }
        s.add(0, last, 1);
        s.set(last, last, 0);
        SparseLu lu = new SparseLu(s.n, s.colPtr(), s.rowIdx(), order(s, 1));
        assertFalse(lu.factor(s.values()));
    }

    @Test
    void badPatternsAreRejectedWithTheirPlace() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> new SparseLu(2, new int[] {0, 1, 2}, new int[] {0, 5}, null));
        assertTrue(e.getMessage().contains("row 5 in column 1"), e.getMessage());
        assertThrows(IllegalArgumentException.class, () -> new SparseLu(2, new int[] {0, 1}, new int[] {0}, null));
        assertThrows(IllegalArgumentException.class,
                () -> new SparseLu(2, new int[] {0, 1, 2}, new int[] {0, 1}, new int[] {1, 1}));
    }

    @Test
    void minimumDegreeOrdersAnArrowMatrixWithoutFill() {
        // An arrow matrix with the dense row and column first fills completely in the natural order and not at
        // all when the dense unknown comes last; minimum degree finds that order (George & Liu, "Computer
        // Solution of Large Sparse Positive Definite Systems", 1981).
        int n = 60;
        Sparse a = new Sparse(n);
        for (int i = 0; i < n; i++) {
            a.add(i, i, 4);
            if (i > 0) {
                a.add(0, i, 1);
                a.add(i, 0, 1);
            }
        }
        int[] q = order(a, 1);
        assertTrue(q[n - 1] == 0 || q[n - 2] == 0, "the dense unknown is numbered among the last two");
        SparseLu md = new SparseLu(n, a.colPtr(), a.rowIdx(), q);
        assertTrue(md.factor(a.values()));
        assertEquals(a.entries.size() + n, md.factorEntries(),
                "no fill: L and U hold A's entries plus L's unit diagonal");
        SparseLu natural = new SparseLu(n, a.colPtr(), a.rowIdx(), null);
        assertTrue(natural.factor(a.values()));
        assertEquals(n * n + n, natural.factorEntries(), "natural order fills L and U completely");
        int[] sorted = q.clone();
        Arrays.sort(sorted);
        for (int i = 0; i < n; i++) {
            assertEquals(i, sorted[i], "a permutation");
        }
    }
}
