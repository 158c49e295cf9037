package spoolwork.model.netlist;

import java.util.ArrayList;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;

import org.jgrapht.Graph;
import org.jgrapht.GraphPath;
import org.jgrapht.alg.connectivity.ConnectivityInspector;
import org.jgrapht.alg.shortestpath.BFSShortestPath;
import org.jgrapht.graph.AsUnmodifiableGraph;
import org.jgrapht.graph.Pseudograph;

import spoolwork.model.Circuit;
import spoolwork.model.Component;
import spoolwork.model.ComponentType;
import spoolwork.model.Endpoint;
import spoolwork.model.Line;
import spoolwork.model.LineKind;
import spoolwork.model.OperatingState;
import spoolwork.model.PortSpec;

/**
 * The hydraulic connectivity of a circuit in one operating state, as a JGraphT multigraph.
 *
 * <p>Nodes are every hydraulic port of every component and every junction. Edges are the drawn lines
 * (shaft couplings excluded) and the component-internal paths of the state: the open spool paths of each
 * directional valve and the main path of every other valve, pump and motor (see
 * {@link ComponentType#internalPaths}). A "net" is a set of nodes joined by lines alone, i.e. the points
 * that share one pressure when lines have no loss. Built once in the constructor; all results are
 * unmodifiable.
 */
public final class Netlist {
    private final Circuit circuit;
    private final Graph<NetNode, NetEdge> graph;
    private final Graph<NetNode, NetEdge> lineGraph;
    private final Map<String, String> driverOf;

    /**
     * @param state the operating state whose spool positions set the valves' internal paths; null for all
     *              valves at rest
     */
    public Netlist(Circuit circuit, OperatingState state) {
        this.circuit = circuit;
        Graph<NetNode, NetEdge> g = new Pseudograph<>(null, null, false);
        Graph<NetNode, NetEdge> lg = new Pseudograph<>(null, null, false);
        for (Component c : circuit.components()) {
            for (PortSpec p : c.type().ports()) {
                if (!p.mechanical()) {
                    NetNode n = new NetNode.Port(c.id(), p.name());
                    g.addVertex(n);
                    lg.addVertex(n);
                }
            }
        }
        circuit.junctions().forEach(j -> {
            g.addVertex(new NetNode.Junction(j.id()));
            lg.addVertex(new NetNode.Junction(j.id()));
        });
        Map<String, String> drivers = new LinkedHashMap<>();
        for (Line l : circuit.lines()) {
            if (l.kind() == LineKind.SHAFT) {
                Component a = circuit.component(l.from().ownerId()).orElseThrow();
                Component b = circuit.component(l.to().ownerId()).orElseThrow();
                if (a.type() == ComponentType.PRIME_MOVER) {
                    drivers.put(b.id(), a.id());
                } else if (b.type() == ComponentType.PRIME_MOVER) {
                    drivers.put(a.id(), b.id());
                }
                continue;
            }
            NetEdge e = new NetEdge.LineEdge(l.id());
            g.addEdge(node(l.from()), node(l.to()), e);
            lg.addEdge(node(l.from()), node(l.to()), e);
        }
        for (Component c : circuit.components()) {
            String position = state == null ? null : state.positionOf(c.id());
            for (List<String> path : c.type().internalPaths(c.options(), position)) {
                g.addEdge(new NetNode.Port(c.id(), path.get(0)), new NetNode.Port(c.id(), path.get(1)),
                        new NetEdge.InternalEdge(c.id(), path.get(0), path.get(1)));
            }
        }
        this.graph = new AsUnmodifiableGraph<>(g);
        this.lineGraph = new AsUnmodifiableGraph<>(lg);
        this.driverOf = Collections.unmodifiableMap(drivers);
    }

    /** The node a line endpoint sits on. */
    public static NetNode node(Endpoint e) {
        if (e instanceof Endpoint.PortRef p) {
            return new NetNode.Port(p.componentId(), p.port());
        }
        return new NetNode.Junction(((Endpoint.JunctionRef) e).junctionId());
    }

    public Circuit circuit() {
        return circuit;
    }

    /** The whole graph: lines and internal paths (unmodifiable view). */
    public Graph<NetNode, NetEdge> graph() {
        return graph;
    }

    /** Hydraulic ports with no line attached, in drawing order. */
    public List<NetNode.Port> unconnectedPorts() {
        List<NetNode.Port> out = new ArrayList<>();
        for (NetNode n : lineGraph.vertexSet()) {
            if (n instanceof NetNode.Port p && lineGraph.degreeOf(n) == 0) {
                out.add(p);
            }
        }
        return out;
    }

    /** Connected sub-networks through lines and internal paths; each set in graph order (copies). */
    public List<Set<NetNode>> subNetworks() {
        return copy(new ConnectivityInspector<>(graph).connectedSets());
    }

    /** Nets: nodes joined by lines and junctions alone (copies); a lone unconnected port is a net of its own. */
    public List<Set<NetNode>> nets() {
        return copy(new ConnectivityInspector<>(lineGraph).connectedSets());
    }

    /** The net containing the given node. */
    public Set<NetNode> netOf(NetNode n) {
        return Collections.unmodifiableSet(new LinkedHashSet<>(new ConnectivityInspector<>(lineGraph).connectedSetOf(n)));
    }

    /** A path with the fewest edges between two nodes through lines and internal paths, if any. */
    public Optional<GraphPath<NetNode, NetEdge>> path(NetNode from, NetNode to) {
        if (!graph.containsVertex(from) || !graph.containsVertex(to)) {
            throw new IllegalArgumentException("no such node: " + (graph.containsVertex(from) ? to : from));
        }
        return Optional.ofNullable(new BFSShortestPath<>(graph).getPath(from, to));
    }

    /** The reservoir ports, which sit at the reference (zero gauge) pressure. */
    public List<NetNode.Port> reservoirPorts() {
        List<NetNode.Port> out = new ArrayList<>();
        for (Component c : circuit.components()) {
            if (c.type() == ComponentType.RESERVOIR) {
                for (PortSpec p : c.type().ports()) {
                    out.add(new NetNode.Port(c.id(), p.name()));
                }
            }
        }
        return out;
    }

    /** Nodes with no path to any reservoir port: their pressure is not fixed by the network. */
    public Set<NetNode> nodesWithoutReservoir() {
        ConnectivityInspector<NetNode, NetEdge> ci = new ConnectivityInspector<>(graph);
        Set<NetNode> reached = new LinkedHashSet<>();
        for (NetNode.Port r : reservoirPorts()) {
            reached.addAll(ci.connectedSetOf(r));
        }
        Set<NetNode> out = new LinkedHashSet<>(graph.vertexSet());
        out.removeAll(reached);
        return Collections.unmodifiableSet(out);
    }

    /** For each pump or motor id coupled by a shaft line to a prime mover, that prime mover's id. */
    public Map<String, String> drivers() {
        return driverOf;
    }

    private static List<Set<NetNode>> copy(List<Set<NetNode>> sets) {
        List<Set<NetNode>> out = new ArrayList<>();
        for (Set<NetNode> s : sets) {
            out.add(Collections.unmodifiableSet(new LinkedHashSet<>(s)));
        }
        return Collections.unmodifiableList(out);
    }
}
