package spoolwork.solver.topology;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.EnumSet;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeMap;

import spoolwork.model.ActuatorState;
import spoolwork.model.Circuit;
import spoolwork.model.Component;
import spoolwork.model.ComponentType;
import spoolwork.model.OperatingState;
import spoolwork.model.PortSpec;
import spoolwork.model.netlist.NetEdge;
import spoolwork.model.netlist.NetNode;
import spoolwork.model.netlist.Netlist;
import spoolwork.solver.Diagnostic;
import spoolwork.solver.Severity;

/**
 * Checks the circuit's connectivity in one operating state before any number is computed: unconnected
 * ports, parts with no path to the reservoir, a pump outlet that reaches no relief valve (an error: the
 * pressure would rise until something breaks), a pump inlet not fed from a reservoir, and actuators held
 * by trapped oil.
 */
public final class TopologyCheck {
    private final Circuit circuit;
    private final OperatingState state;
    private final Netlist netlist;

    public TopologyCheck(Circuit circuit, OperatingState state, Netlist netlist) {
        this.circuit = circuit;
        this.state = state;
        this.netlist = netlist;
        // a compact copy of the graph, numbered like the netlist's nodes, so that each traversal below is a
        // plain walk over int arrays
        int n = netlist.nodeCount();
        nodes = new NetNode[n];
        nodeType = new ComponentType[n];
        for (int i = 0; i < n; i++) {
            nodes[i] = netlist.node(i);
            Component owner = netlist.componentAt(i);
            nodeType[i] = owner == null ? null : owner.type();
        }
        int m = netlist.edgeCount();
        int[] from = new int[m];
        int[] to = new int[m];
        byte[] kind = new byte[m];
        int[] degree = new int[n + 1];
        for (int k = 0; k < m; k++) {
            from[k] = netlist.edgeSource(k);
            to[k] = netlist.edgeTarget(k);
            if (netlist.edge(k) instanceof NetEdge.InternalEdge) {
                ComponentType t = nodeType[from[k]];
                kind[k] = t.isPump() ? PUMP_PATH : t == ComponentType.HYDRAULIC_MOTOR ? MOTOR_PATH : OTHER;
            }
            degree[from[k] + 1]++;
            degree[to[k] + 1]++;
        }
        for (int i = 0; i < n; i++) {
            degree[i + 1] += degree[i];
        }
        adjStart = degree;
        adjNode = new int[2 * m];
        adjKind = new byte[2 * m];
        int[] fill = Arrays.copyOf(degree, n);
        for (int e = 0; e < m; e++) {
            adjNode[fill[from[e]]] = to[e];
            adjKind[fill[from[e]]++] = kind[e];
            adjNode[fill[to[e]]] = from[e];
            adjKind[fill[to[e]]++] = kind[e];
        }
    }

    private static final byte OTHER = 0;
    private static final byte PUMP_PATH = 1;
    private static final byte MOTOR_PATH = 2;

    private final NetNode[] nodes;
    /** Type of the component each node is a port of; null for a junction. */
    private final ComponentType[] nodeType;
    private final int[] adjStart;
    private final int[] adjNode;
    private final byte[] adjKind;

    public List<Diagnostic> run() {
        List<Diagnostic> out = new ArrayList<>();
        List<Diagnostic> lockedOut = new ArrayList<>();
        locked(lockedOut);
        unconnected(out);
        floating(out);
        pumps(out);
        out.addAll(lockedOut);
        return out;
    }

    private String tag(String componentId) {
        return circuit.component(componentId).map(Component::tag).orElse(componentId);
    }

    private String name(NetNode n) {
        if (n instanceof NetNode.Port p) {
            return tag(p.componentId()) + "." + p.port();
        }
        return ((NetNode.Junction) n).junctionId();
    }

    private void unconnected(List<Diagnostic> out) {
        for (NetNode.Port p : netlist.unconnectedPorts()) {
            Component c = circuit.component(p.componentId()).orElseThrow();
            if (c.type() == ComponentType.RESERVOIR) {
                continue;
            }
            String why;
            if (c.type() == ComponentType.COMPENSATED_PUMP && p.port().equals("L")) {
                why = "case drain of " + c.tag() + " is not connected; its leakage is taken back inside the pump";
            } else if (p.port().equals("X")) {
                why = "pilot port X of " + c.tag() + " is not connected; it sees reservoir pressure";
            } else if (p.port().equals("Y")) {
                why = "drain port Y of " + c.tag() + " is not connected";
            } else {
                why = "port " + p.port() + " of " + c.tag() + " is not connected";
            }
            out.add(new Diagnostic(Severity.WARNING, why, List.of(c.tag())));
        }
    }

    private void floating(List<Diagnostic> out) {
        int[] label = labels(false, false);
        boolean[] reached = new boolean[nodes.length];
        for (int r : netlist.reservoirNodes()) {
            reached[label[r]] = true;
        }
        Map<Integer, List<Integer>> subs = new TreeMap<>();
        for (int i = 0; i < nodes.length; i++) {
            if (!reached[label[i]]) {
                subs.computeIfAbsent(label[i], x -> new ArrayList<>()).add(i);
            }
        }
        for (List<Integer> members : subs.values()) {
            // a part made of unconnected ports alone has had its warning already, and so has a part that
            // traps the oil of a locked actuator (its caution says more)
            boolean lone = true;
            boolean holdsLocked = false;
            for (int i : members) {
                lone &= nodes[i] instanceof NetNode.Port && netlist.lineDegree(i) == 0;
                holdsLocked |= trappedNode[i];
            }
            if (lone || holdsLocked) {
                continue;
            }
            List<NetNode> sub = new ArrayList<>(members.size());
            for (int i : members) {
                sub.add(nodes[i]);
            }
            Set<String> tags = new LinkedHashSet<>();
            List<String> names = new ArrayList<>();
            for (NetNode n : sub) {
                names.add(name(n));
                if (n instanceof NetNode.Port p) {
                    tags.add(tag(p.componentId()));
                }
            }
            boolean onlyPilots = sub.stream().allMatch(n -> n instanceof NetNode.Junction
                    || isPilot((NetNode.Port) n));
            if (onlyPilots) {
                continue;
            }
            List<String> involved = new ArrayList<>(tags);
            out.add(new Diagnostic(Severity.WARNING, "no path to the reservoir from " + String.join(", ", names)
                    + " in state " + state.name() + ": the pressure there is set by leakage and trapped oil only",
                    involved));
        }
    }

    private boolean isPilot(NetNode.Port p) {
        Component c = circuit.component(p.componentId()).orElseThrow();
        return p.port().equals("X") || p.port().equals("Y") || c.type() == ComponentType.PRESSURE_GAUGE
                || c.type() == ComponentType.PLUG;
    }

    /**
     * Labels the nodes by connected part of the graph, leaving out the internal paths of pumps (a pump does
     * not pass its outlet pressure back to its inlet) and, when asked, of motors.
     */
    private int[] parts(boolean cutMotors) {
        return labels(true, cutMotors);
    }

    /** Connected-part label of every node, optionally not walking through pumps and motors. */
    private int[] labels(boolean cutPumps, boolean cutMotors) {
        int n = nodes.length;
        int[] label = new int[n];
        Arrays.fill(label, -1);
        int[] queue = new int[n];
        int next = 0;
        for (int start = 0; start < n; start++) {
            if (label[start] >= 0) {
                continue;
            }
            int id = next++;
            int head = 0;
            int tail = 0;
            label[start] = id;
            queue[tail++] = start;
            while (head < tail) {
                int v = queue[head++];
                for (int k = adjStart[v]; k < adjStart[v + 1]; k++) {
                    if ((cutPumps && adjKind[k] == PUMP_PATH) || (cutMotors && adjKind[k] == MOTOR_PATH)) {
                        continue;
                    }
                    int w = adjNode[k];
                    if (label[w] < 0) {
                        label[w] = id;
                        queue[tail++] = w;
                    }
                }
            }
        }
        return label;
    }

    /** Labels of the parts that hold a port of one of the given types (and port name, when not null). */
    private boolean[] partsWith(int[] label, Set<ComponentType> types, String port) {
        boolean[] out = new boolean[nodes.length];
        for (int i = 0; i < nodes.length; i++) {
            if (nodeType[i] != null && types.contains(nodeType[i])
                    && (port == null || ((NetNode.Port) nodes[i]).port().equals(port))) {
                out[label[i]] = true;
            }
        }
        return out;
    }

    private void pumps(List<Diagnostic> out) {
        int[] label = parts(false);
        boolean[] relieved = partsWith(label, EnumSet.of(ComponentType.RELIEF_VALVE), "P");
        boolean[] fed = partsWith(label, EnumSet.of(ComponentType.RESERVOIR), null);
        // the netlist numbers the components' hydraulic ports consecutively in drawing order, so the walk
        // counts its way to each one's ports instead of looking every component up by id
        int first = 0;
        for (Component c : circuit.components()) {
            int firstOfC = first;
            first += c.type().hydraulicPortCount();
            if (!c.type().isPump()) {
                continue;
            }
            int outlet = label[Netlist.portAt(firstOfC, c, "P")];
            if (c.type() == ComponentType.FIXED_PUMP && !relieved[outlet]) {
                out.add(new Diagnostic(Severity.ERROR, "the outlet of fixed pump " + c.tag()
                        + " reaches no relief valve in state " + state.name()
                        + ": its pressure would rise until something breaks. Add a relief valve at the pump.",
                        List.of(c.tag())));
            }
            if (!fed[label[Netlist.portAt(firstOfC, c, "S")]]) {
                out.add(new Diagnostic(Severity.ERROR, "the inlet S of pump " + c.tag()
                        + " is not fed from a reservoir: it would run dry", List.of(c.tag())));
            }
        }
    }

    /** Ports of actuators that {@link #locked} found holding their load by trapped oil. */
    private boolean[] trappedNode;

    private void locked(List<Diagnostic> out) {
        trappedNode = new boolean[nodes.length];
        int[] label = parts(true);
        boolean[] escape = partsWith(label, EnumSet.of(ComponentType.RESERVOIR, ComponentType.FIXED_PUMP,
                ComponentType.COMPENSATED_PUMP, ComponentType.ACCUMULATOR), null);
        int first = 0;
        for (Component c : circuit.components()) {
            int firstOfC = first;
            first += c.type().hydraulicPortCount();
            if (!c.type().isActuator()) {
                continue;
            }
            ActuatorState a = state.actuatorOf(c.id());
            if (c.type() == ComponentType.HYDRAULIC_MOTOR && a.mode() != ActuatorState.Mode.FREE) {
                continue;
            }
            List<String> trapped = new ArrayList<>();
            int node = firstOfC;
            for (PortSpec ps : c.type().ports()) {
                if (ps.mechanical()) {
                    continue;
                }
                if (!escape[label[node]]) {
                    trapped.add(ps.name());
                    trappedNode[node] = true;
                }
                node++;
            }
            if (!trapped.isEmpty()) {
                out.add(new Diagnostic(Severity.WARNING, "caution: " + c.tag() + " is hydraulically locked in state "
                        + state.name() + " — its load is held by trapped oil at port " + String.join(", ", trapped)
                        + " and it creeps only by leakage", List.of(c.tag())));
            }
        }
    }
}
