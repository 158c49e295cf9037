package spoolwork.solver;

import java.util.ArrayDeque;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;

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

    static Map<String, Double> compute(CircuitEquations eq, double[] x, Map<NetNode, Double> portFlowInto) {
        Map<NetNode, Double> inj = new HashMap<>();
        Map<NetNode, List<Line>> edges = new HashMap<>();
        Set<NetNode> slack = new HashSet<>();
        for (NetNode.Port r : eq.netlist.reservoirPorts()) {
            slack.add(r);
        }
        for (Map.Entry<NetNode, Double> e : portFlowInto.entrySet()) {
            inj.merge(e.getKey(), -e.getValue(), Double::sum);
        }
        List<Line> ideal = new ArrayList<>();
        for (Line l : eq.circuit.lines()) {
            if (l.kind() == LineKind.SHAFT) {
                continue;
            }
            NetNode a = Netlist.node(l.from());
            NetNode b = Netlist.node(l.to());
            if (l.ideal()) {
                ideal.add(l);
                edges.computeIfAbsent(a, k -> new ArrayList<>()).add(l);
                edges.computeIfAbsent(b, k -> new ArrayList<>()).add(l);
            } else {
                double q = eq.lineBranches.get(l.id()).flow(x);
                inj.merge(a, -q, Double::sum);
                inj.merge(b, q, Double::sum);
            }
        }
        Map<String, Double> flows = new LinkedHashMap<>();
        Set<Line> removed = new HashSet<>();
        Map<NetNode, Integer> degree = new HashMap<>();
        ArrayDeque<NetNode> leaves = new ArrayDeque<>();
        for (Map.Entry<NetNode, List<Line>> e : edges.entrySet()) {
            degree.put(e.getKey(), e.getValue().size());
            if (e.getValue().size() == 1 && !slack.contains(e.getKey())) {
                leaves.add(e.getKey());
            }
        }
        while (!leaves.isEmpty()) {
            NetNode v = leaves.poll();
            if (degree.get(v) != 1) {
                continue;
            }
            Line e = null;
            for (Line l : edges.get(v)) {
                if (!removed.contains(l)) {
                    e = l;
                }
            }
            if (e == null) {
                continue;
            }
            NetNode a = Netlist.node(e.from());
            NetNode u = a.equals(v) ? Netlist.node(e.to()) : a;
            double out = inj.getOrDefault(v, 0.0);
            flows.put(e.id(), a.equals(v) ? out : -out);
            inj.merge(u, out, Double::sum);
            inj.put(v, 0.0);
            removed.add(e);
            degree.merge(v, -1, Integer::sum);
            degree.merge(u, -1, Integer::sum);
            if (degree.get(u) == 1 && !slack.contains(u)) {
                leaves.add(u);
            }
        }
        List<Line> rest = new ArrayList<>();
        for (Line l : ideal) {
            if (!removed.contains(l)) {
                rest.add(l);
            }
        }
        if (!rest.isEmpty()) {
            loops(rest, inj, slack, flows);
        }
        return flows;
    }

    private static void loops(List<Line> rest, Map<NetNode, Double> inj, Set<NetNode> slack, Map<String, Double> flows) {
        Map<NetNode, Integer> index = new LinkedHashMap<>();
        for (Line l : rest) {
            index.putIfAbsent(Netlist.node(l.from()), index.size());
            index.putIfAbsent(Netlist.node(l.to()), index.size());
        }
        int n = index.size();
        DMatrixRMaj lap = new DMatrixRMaj(n, n);
        DMatrixRMaj rhs = new DMatrixRMaj(n, 1);
        for (Line l : rest) {
            int a = index.get(Netlist.node(l.from()));
            int b = index.get(Netlist.node(l.to()));
            lap.add(a, a, 1);
            lap.add(b, b, 1);
            lap.add(a, b, -1);
            lap.add(b, a, -1);
        }
        // Ground every reservoir port and one node of each part; a tiny pull to zero keeps the rest regular.
        for (Map.Entry<NetNode, Integer> e : index.entrySet()) {
            int i = e.getValue();
            rhs.set(i, 0, slack.contains(e.getKey()) ? 0 : inj.getOrDefault(e.getKey(), 0.0));
            lap.add(i, i, slack.contains(e.getKey()) ? 1e6 : 1e-9);
        }
        DMatrixRMaj phi = new DMatrixRMaj(n, 1);
        if (!CommonOps_DDRM.solve(lap, rhs, phi)) {
            return;
        }
        for (Line l : rest) {
            int a = index.get(Netlist.node(l.from()));
            int b = index.get(Netlist.node(l.to()));
            flows.put(l.id(), phi.get(a, 0) - phi.get(b, 0));
        }
    }
}
