package spoolwork.solver.topology;

import java.util.ArrayDeque;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.HashSet;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;

import org.jgrapht.Graph;
import org.jgrapht.Graphs;

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
        for (Component c : circuit.components()) {
            typeOf.put(c.id(), c.type());
        }
    }

    private final Map<String, ComponentType> typeOf = new HashMap<>();

    public List<Diagnostic> run() {
        List<Diagnostic> out = new ArrayList<>();
        unconnected(out);
        floating(out);
        pumps(out);
        locked(out);
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
        Set<NetNode> without = netlist.nodesWithoutReservoir();
        if (without.isEmpty()) {
            return;
        }
        Set<NetNode> lone = new HashSet<>(netlist.unconnectedPorts());
        for (Set<NetNode> sub : netlist.subNetworks()) {
            if (!without.containsAll(sub) || lone.containsAll(sub)) {
                continue;
            }
            Set<String> tags = new LinkedHashSet<>();
            List<String> nodes = new ArrayList<>();
            for (NetNode n : sub) {
                nodes.add(name(n));
                if (n instanceof NetNode.Port p) {
                    tags.add(tag(p.componentId()));
                }
            }
            boolean onlyPilots = sub.stream().allMatch(n -> n instanceof NetNode.Junction
                    || isPilot((NetNode.Port) n));
            if (onlyPilots && !sub.isEmpty()) {
                continue;
            }
            List<String> involved = new ArrayList<>(tags);
            out.add(new Diagnostic(Severity.WARNING, "no path to the reservoir from " + String.join(", ", nodes)
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
    private Map<NetNode, Integer> parts(boolean cutMotors) {
        Graph<NetNode, NetEdge> g = netlist.graph();
        Map<NetNode, Integer> label = new HashMap<>();
        int next = 0;
        for (NetNode start : g.vertexSet()) {
            if (label.containsKey(start)) {
                continue;
            }
            int id = next++;
            ArrayDeque<NetNode> queue = new ArrayDeque<>();
            label.put(start, id);
            queue.add(start);
            while (!queue.isEmpty()) {
                NetNode n = queue.poll();
                for (NetEdge e : g.edgesOf(n)) {
                    if (e instanceof NetEdge.InternalEdge ie) {
                        ComponentType t = typeOf.get(ie.componentId());
                        if (t.isPump() || (cutMotors && t == ComponentType.HYDRAULIC_MOTOR)) {
                            continue;
                        }
                    }
                    NetNode m = Graphs.getOppositeVertex(g, e, n);
                    if (!label.containsKey(m)) {
                        label.put(m, id);
                        queue.add(m);
                    }
                }
            }
        }
        return label;
    }

    /** Labels of the parts that hold a port of one of the given types (and port name, when not null). */
    private Set<Integer> partsWith(Map<NetNode, Integer> label, Set<ComponentType> types, String port) {
        Set<Integer> out = new HashSet<>();
        for (Map.Entry<NetNode, Integer> e : label.entrySet()) {
            if (e.getKey() instanceof NetNode.Port p && types.contains(typeOf.get(p.componentId()))
                    && (port == null || p.port().equals(port))) {
                out.add(e.getValue());
            }
        }
        return out;
    }

    private void pumps(List<Diagnostic> out) {
        Map<NetNode, Integer> label = parts(false);
        Set<Integer> relieved = partsWith(label, Set.of(ComponentType.RELIEF_VALVE), "P");
        Set<Integer> fed = partsWith(label, Set.of(ComponentType.RESERVOIR), null);
        for (Component c : circuit.components()) {
            if (!c.type().isPump()) {
                continue;
            }
            int outlet = label.get(new NetNode.Port(c.id(), "P"));
            if (c.type() == ComponentType.FIXED_PUMP && !relieved.contains(outlet)) {
                out.add(new Diagnostic(Severity.ERROR, "the outlet of fixed pump " + c.tag()
                        + " reaches no relief valve in state " + state.name()
                        + ": its pressure would rise until something breaks. Add a relief valve at the pump.",
                        List.of(c.tag())));
            }
            if (!fed.contains(label.get(new NetNode.Port(c.id(), "S")))) {
                out.add(new Diagnostic(Severity.ERROR, "the inlet S of pump " + c.tag()
                        + " is not fed from a reservoir: it would run dry", List.of(c.tag())));
            }
        }
    }

    private void locked(List<Diagnostic> out) {
        Map<NetNode, Integer> label = parts(true);
        Set<Integer> escape = partsWith(label, Set.of(ComponentType.RESERVOIR, ComponentType.FIXED_PUMP,
                ComponentType.COMPENSATED_PUMP, ComponentType.ACCUMULATOR), null);
        for (Component c : circuit.components()) {
            if (!c.type().isActuator()) {
                continue;
            }
            ActuatorState a = state.actuatorOf(c.id());
            if (c.type() == ComponentType.HYDRAULIC_MOTOR && a.mode() != ActuatorState.Mode.FREE) {
                continue;
            }
            List<String> trapped = new ArrayList<>();
            for (PortSpec ps : c.type().ports()) {
                if (!ps.mechanical() && !escape.contains(label.get(new NetNode.Port(c.id(), ps.name())))) {
                    trapped.add(ps.name());
                }
            }
            if (!trapped.isEmpty()) {
                out.add(new Diagnostic(Severity.WARNING, "caution: " + c.tag() + " is hydraulically locked in state "
                        + state.name() + " — its load is held by trapped oil at port " + String.join(", ", trapped)
                        + " and it creeps only by leakage", List.of(c.tag())));
            }
        }
    }
}
