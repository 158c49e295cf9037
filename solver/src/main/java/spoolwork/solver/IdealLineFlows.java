package spoolwork.solver;

import java.util.Arrays;
import java.util.HashMap;
import java.util.Map;

import org.ejml.data.DMatrixRMaj;
import org.ejml.dense.row.CommonOps_DDRM;

import spoolwork.model.Line;
import spoolwork.model.LineKind;
import spoolwork.model.netlist.NetNode;
import spoolwork.model.netlist.Netlist;

/**
 * Flows in ideal lines, which share one pressure node and so are not unknowns of the solve. They follow
 * from flow balance at every port and junction: a tree of ideal lines is peeled from its leaves, which
 * gives the unique flows; a loop of ideal lines left over shares its flow as equal resistances would
 * (its split is not fixed by physics when the lines have no loss).
 */
final class IdealLineFlows {
    private IdealLineFlows() {
    }

    /**
     * @param portFlowInto flow into its component at every port, by netlist node number (junctions unused)
     * @return the flow of every line by its place in the drawing order; 0 for lines that are not ideal
     */
    static double[] compute(CircuitEquations eq, double[] x, double[] portFlowInto) {
        Netlist netlist = eq.netlist;
        int n = netlist.nodeCount();
        // injection at each node; "has" tells a node whose sum has begun from one that has none yet, so
        // that a sum keeps the sign of a first zero term
        double[] inj = new double[n];
        boolean[] has = new boolean[n];
        boolean[] slack = new boolean[n];
        for (int r : netlist.reservoirNodes()) {
            slack[r] = true;
        }
        for (int v = 0; v < n; v++) {
            if (netlist.componentAt(v) != null) {
                inj[v] = -portFlowInto[v];
                has[v] = true;
            }
        }
        int lineCount = eq.lineStart.length;
        int[] ideal = new int[lineCount];
        int idealCount = 0;
        int[] degree = new int[n];
        // leaves are peeled in the order of this hash map's keys, as they always have been
        Map<NetNode, Integer> seen = new HashMap<>();
        int li = 0;
        for (Line l : eq.circuit.lines()) {
            int a = eq.lineStart[li];
            int b = eq.lineEnd[li];
            if (l.kind() == LineKind.SHAFT) {
                li++;
                continue;
            }
            if (l.ideal()) {
                ideal[idealCount++] = li;
                seen.computeIfAbsent(netlist.node(a), k -> a);
                seen.computeIfAbsent(netlist.node(b), k -> b);
                degree[a]++;
                degree[b]++;
            } else {
                double q = eq.lineBranch[li].flow(x);
                add(inj, has, a, -q);
                add(inj, has, b, q);
            }
            li++;
        }
        // ideal lines at each node, in drawing order
        int[] adjStart = new int[n + 1];
        for (int v = 0; v < n; v++) {
            adjStart[v + 1] = adjStart[v] + degree[v];
        }
        int[] adj = new int[adjStart[n]];
        int[] fill = Arrays.copyOf(adjStart, n);
        for (int k = 0; k < idealCount; k++) {
            int l = ideal[k];
            adj[fill[eq.lineStart[l]]++] = l;
            adj[fill[eq.lineEnd[l]]++] = l;
        }
        double[] flows = new double[lineCount];
        boolean[] removed = new boolean[lineCount];
        int[] leaves = new int[n];
        int head = 0;
        int tail = 0;
        for (int v : seen.values()) {
            if (degree[v] == 1 && !slack[v]) {
                leaves[tail++] = v;
            }
        }
        while (head < tail) {
            int v = leaves[head++];
            if (degree[v] != 1) {
                continue;
            }
            int e = -1;
            for (int k = adjStart[v]; k < adjStart[v + 1]; k++) {
                if (!removed[adj[k]]) {
                    e = adj[k];
                }
            }
            if (e < 0) {
                continue;
            }
            int a = eq.lineStart[e];
            int u = a == v ? eq.lineEnd[e] : a;
            double out = has[v] ? inj[v] : 0.0;
            flows[e] = a == v ? out : -out;
            add(inj, has, u, out);
            inj[v] = 0.0;
            has[v] = true;
            removed[e] = true;
            degree[v]--;
            degree[u]--;
            if (degree[u] == 1 && !slack[u]) {
                leaves[tail++] = u;
            }
        }
        int[] rest = new int[idealCount];
        int restCount = 0;
        for (int k = 0; k < idealCount; k++) {
            if (!removed[ideal[k]]) {
                rest[restCount++] = ideal[k];
            }
        }
        if (restCount > 0) {
            loops(eq, Arrays.copyOf(rest, restCount), inj, has, slack, flows);
        }
        return flows;
    }

    private static void add(double[] inj, boolean[] has, int v, double q) {
        inj[v] = has[v] ? inj[v] + q : q;
        has[v] = true;
    }

    private static void loops(CircuitEquations eq, int[] rest, double[] inj, boolean[] has, boolean[] slack,
                              double[] flows) {
        int[] index = new int[inj.length];
        Arrays.fill(index, -1);
        int[] nodeOfIndex = new int[2 * rest.length];
        int n = 0;
        for (int l : rest) {
            for (int v : new int[] {eq.lineStart[l], eq.lineEnd[l]}) {
                if (index[v] < 0) {
                    index[v] = n;
                    nodeOfIndex[n++] = v;
                }
            }
        }
        DMatrixRMaj lap = new DMatrixRMaj(n, n);
        DMatrixRMaj rhs = new DMatrixRMaj(n, 1);
        for (int l : rest) {
            int a = index[eq.lineStart[l]];
            int b = index[eq.lineEnd[l]];
            lap.add(a, a, 1);
            lap.add(b, b, 1);
            lap.add(a, b, -1);
            lap.add(b, a, -1);
        }
        // Ground every reservoir port and one node of each part; a tiny pull to zero keeps the rest regular.
        for (int i = 0; i < n; i++) {
            int v = nodeOfIndex[i];
            rhs.set(i, 0, slack[v] ? 0 : has[v] ? inj[v] : 0.0);
            lap.add(i, i, slack[v] ? 1e6 : 1e-9);
        }
        DMatrixRMaj phi = new DMatrixRMaj(n, 1);
        if (!CommonOps_DDRM.solve(lap, rhs, phi)) {
            return;
        }
        for (int l : rest) {
            int a = index[eq.lineStart[l]];
            int b = index[eq.lineEnd[l]];
            flows[l] = phi.get(a, 0) - phi.get(b, 0);
        }
    }
}
