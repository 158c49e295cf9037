package spoolwork.solver.numeric;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;

import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;

import org.ejml.data.DMatrixRMaj;
import org.ejml.dense.row.CommonOps_DDRM;
import org.junit.jupiter.api.Test;

/**
 * The sparse step (condensation, numbering, sparse LU) against a dense solve of the same entries, and the
 * entry-by-entry update of the condensed matrix after rows are rewritten in place (as when complementarity
 * rows change side) against a fresh condensation.
 */
class LinearStepTest {
    /**
     * A network-like system: {@code nodes} kept unknowns with a small diagonal each, and one eliminable
     * branch unknown between random pairs of nodes (its row: d·q + p_i − p_j; the nodes' rows: ±q). A few
     * kept rows also depend on a branch unknown, as a valve's margin row may.
     */
    private static final class Network implements NonlinearSystem {
        final int nodes;
        final int size;
        final List<int[]> at = new ArrayList<>();
        final List<Double> values = new ArrayList<>();

        Network(int nodes, int branches, long seed) {
            this.nodes = nodes;
            this.size = nodes + branches;
            SplittableRandom rnd = new SplittableRandom(seed);
            for (int i = 0; i < nodes; i++) {
                entry(i, i, rnd.nextDouble(1e-3, 1));
            }
            for (int b = 0; b < branches; b++) {
                int q = nodes + b;
                int i = rnd.nextInt(nodes);
                int j = (i + 1 + rnd.nextInt(nodes - 1)) % nodes;
                entry(q, q, rnd.nextDouble(0.5, 5));
                entry(q, i, 1);
                entry(q, j, -1);
                entry(i, q, -1);
                entry(j, q, 1);
                if (b % 7 == 0) {
                    entry(rnd.nextInt(nodes), q, rnd.nextDouble(-1, 1));
                }
            }
        }

        private void entry(int row, int col, double v) {
            at.add(new int[] {row, col});
            values.add(v);
        }

        void stamp(Jacobian j) {
            for (int k = 0; k < at.size(); k++) {
                j.add(at.get(k)[0], at.get(k)[1], values.get(k));
            }
        }

        double[] dense(double[] rhs) {
            DMatrixRMaj a = new DMatrixRMaj(size, size);
            for (int k = 0; k < at.size(); k++) {
                a.add(at.get(k)[0], at.get(k)[1], values.get(k));
            }
            DMatrixRMaj x = new DMatrixRMaj(size, 1);
            CommonOps_DDRM.solve(a, DMatrixRMaj.wrap(size, 1, rhs.clone()), x);
            return x.data;
        }

        @Override
        public int size() {
            return size;
        }

        @Override
        public void evaluate(double[] x, double[] f, Jacobian j) {
            throw new UnsupportedOperationException();
        }

        @Override
        public double unknownScale(int i) {
            return 1;
        }

        @Override
        public double rowTolerance(int i) {
            return 1e-12;
        }

        @Override
        public double rowScale(int i) {
            return 1;
        }

        @Override
        public boolean isPressure(int i) {
            return i < nodes;
        }

        @Override
        public boolean eliminable(int i) {
            return i >= nodes;
        }
    }

    private static double[] ones(int n) {
        double[] v = new double[n];
        java.util.Arrays.fill(v, 1);
        return v;
    }

    private static void assertClose(double[] expected, double[] actual, String where) {
        double scale = 0;
        for (double e : expected) {
            scale = Math.max(scale, Math.abs(e));
        }
        for (int i = 0; i < expected.length; i++) {
            assertEquals(expected[i], actual[i], 1e-9 * scale, where + " unknown " + i);
        }
    }

    @Test
    void rewrittenRowsGiveTheStepOfAFreshCondensation() {
        for (long seed = 1; seed <= 5; seed++) {
            Network net = new Network(60, 90, seed);
            int n = net.size;
            double[] scale = ones(n);
            SplittableRandom rnd = new SplittableRandom(100 + seed);
            double[] rhs = new double[n];
            for (int i = 0; i < n; i++) {
                rhs[i] = rnd.nextDouble(-1, 1);
            }
            LinearStep lin = new LinearStep(n, LinearMethod.SPARSE, net);
            net.stamp(lin);
            double[] first = lin.solve(rhs, scale, scale);
            assertNotNull(first);
            assertClose(net.dense(rhs), first, "seed " + seed + " first solve");
            for (int round = 0; round < 4; round++) {
                // rewrite a few entries of kept rows in place: node diagonals, node–branch entries, and the
                // kept rows' entries in branch columns; every other round one entry of a branch row too
                for (int r = 0; r < 5; r++) {
                    int k;
                    do {
                        k = rnd.nextInt(net.at.size());
                    } while (net.at.get(k)[0] >= net.nodes && (round % 2 == 0 || r > 0));
                    double v = net.values.get(k) * rnd.nextDouble(0.2, 3);
                    net.values.set(k, v);
                    lin.set(k, v);
                }
                double[] updated = lin.solve(rhs, scale, scale);
                LinearStep fresh = new LinearStep(n, LinearMethod.SPARSE, net);
                net.stamp(fresh);
                double[] reference = fresh.solve(rhs, scale, scale);
                String where = "seed " + seed + " round " + round;
                assertNotNull(updated, where);
                assertClose(reference, updated, where + " against a fresh condensation");
                assertClose(net.dense(rhs), updated, where + " against dense LU");
            }
        }
    }
}
