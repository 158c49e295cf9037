package spoolwork.model.netlist;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.Collections;
import java.util.HashMap;
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
import org.jgrapht.graph.AbstractBaseGraph;
import org.jgrapht.graph.AsUnmodifiableGraph;
import org.jgrapht.graph.DefaultGraphSpecificsStrategy;
import org.jgrapht.graph.DefaultGraphType;

import spoolwork.model.Circuit;
import spoolwork.model.Component;
import spoolwork.model.ComponentType;
import spoolwork.model.Endpoint;
import spoolwork.model.Junction;
import spoolwork.model.Line;
import spoolwork.model.LineKind;
import spoolwork.model.OperatingState;

/**
 * The hydraulic connectivity of a circuit in one operating state, as a JGraphT multigraph.
 *
 * <p>Nodes are every hydraulic port of every component and every junction. Edges are the drawn lines
 * (shaft couplings excluded) and the component-internal paths of the state: the open spool paths of each
 * directional valve and the main path of every other valve, pump and motor (see
 * {@link ComponentType#internalPaths}). A "net" is a set of nodes joined by lines alone, i.e. the points
 * that share one pressure when lines have no loss. The constructor numbers the nodes and edges (the
 * solver works on that numbering); the JGraphT graphs are built from it on first use. All results are
 * unmodifiable.
 */
public final class Netlist {
    private final Circuit circuit;
    /** The whole graph, built on first use from the numbered nodes and edges below. */
    private volatile Graph<NetNode, NetEdge> graph;
    /** The graph of lines alone, built on first use: only {@link #nets} and {@link #netOf} walk it. */
    private volatile Graph<NetNode, NetEdge> lineGraph;
    /** Number of line edges; they come first in the edge numbering, in drawing order. */
    private final int lineEdgeCount;
    private final Map<String, String> driverOf;
    /** Every node, numbered in graph vertex order: component ports in drawing order, then junctions. */
    private final NetNode[] nodes;
    /** The component each node is a port of; null for a junction. */
    private final Component[] ownerOf;
    /** Number of drawn (non-shaft) lines ending at each node. */
    private final int[] lineDegree;
    /** Index of the first port node of each component id, and of each junction id. */
    private final Map<String, Integer> firstNode;
    /** Edge ends by node index, in graph edge order. */
    private final int[] edgeSource;
    private final int[] edgeTarget;
    private final NetEdge[] edges;
    private final int[] reservoirNodes;

    /**
     * @param state the operating state whose spool positions set the valves' internal paths; null for all
     *              valves at rest
     */
    public Netlist(Circuit circuit, OperatingState state) {
        this.circuit = circuit;
        int count = 0;
        int reservoirCount = 0;
        for (Component c : circuit.components()) {
            int ports = c.type().hydraulicPortCount();
            count += ports;
            if (c.type() == ComponentType.RESERVOIR) {
                reservoirCount += ports;
            }
        }
        int portCount = count;
        count += circuit.junctions().size();
        nodes = new NetNode[count];
        ownerOf = new Component[count];
        lineDegree = new int[count];
        firstNode = new HashMap<>(capacity(circuit.components().size() + circuit.junctions().size()));
        reservoirNodes = new int[reservoirCount];
        int k = 0;
        int r = 0;
        List<Component> components = circuit.components();
        for (int ci = 0; ci < components.size(); ci++) {
            Component c = components.get(ci);
            firstNode.put(c.id(), k);
            List<String> ports = c.type().hydraulicPorts();
            for (int pi = 0; pi < ports.size(); pi++) {
                NetNode n = new NetNode.Port(c.id(), ports.get(pi));
                if (c.type() == ComponentType.RESERVOIR) {
                    reservoirNodes[r++] = k;
                }
                ownerOf[k] = c;
                nodes[k++] = n;
            }
        }
        for (Junction j : circuit.junctions()) {
            NetNode n = new NetNode.Junction(j.id());
            firstNode.put(j.id(), k);
            nodes[k++] = n;
        }
        assert k == portCount + circuit.junctions().size();
        Map<String, String> drivers = new LinkedHashMap<>();
        int maxEdges = circuit.lines().size() + 3 * circuit.components().size();
        int[] src = new int[maxEdges];
        int[] dst = new int[maxEdges];
        NetEdge[] es = new NetEdge[maxEdges];
        int m = 0;
        List<Line> lines = circuit.lines();
        for (int li = 0; li < lines.size(); li++) {
            Line l = lines.get(li);
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
            int a = existing(l.from());
            int b = existing(l.to());
            NetEdge e = new NetEdge.LineEdge(l.id());
            lineDegree[a]++;
            lineDegree[b]++;
            if (m == es.length) {
                src = Arrays.copyOf(src, 2 * m);
                dst = Arrays.copyOf(dst, 2 * m);
                es = Arrays.copyOf(es, 2 * m);
            }
            src[m] = a;
            dst[m] = b;
            es[m++] = e;
        }
        this.lineEdgeCount = m;
        // the components' port nodes are numbered in drawing order, so each one's first node is counted here
        int first = 0;
        for (int ci = 0; ci < components.size(); ci++) {
            Component c = components.get(ci);
            int firstOfC = first;
            first += c.type().hydraulicPortCount();
            // only a directional valve's paths depend on the state, so only a valve looks up its position
            String position = state == null || !c.type().isDirectionalValve() ? null : state.positionOf(c.id());
            List<List<String>> paths = c.type().internalPaths(c.options(), position);
            for (int pi = 0; pi < paths.size(); pi++) {
                List<String> path = paths.get(pi);
                int a = existingPort(firstOfC, c, path.get(0));
                int b = existingPort(firstOfC, c, path.get(1));
                NetEdge e = new NetEdge.InternalEdge(c.id(), path.get(0), path.get(1));
                if (m == es.length) {
                    src = Arrays.copyOf(src, 2 * m);
                    dst = Arrays.copyOf(dst, 2 * m);
                    es = Arrays.copyOf(es, 2 * m);
                }
                src[m] = a;
                dst[m] = b;
                es[m++] = e;
            }
        }
        this.edgeSource = Arrays.copyOf(src, m);
        this.edgeTarget = Arrays.copyOf(dst, m);
        this.edges = Arrays.copyOf(es, m);
        this.driverOf = Collections.unmodifiableMap(drivers);
    }

    /**
     * A multigraph with JGraphT's plain specifics: the netlist never asks for the edges between two given
     * nodes, so the lookup table of vertex pairs a {@code Pseudograph} keeps would only cost time.
     */
    private static final class NetGraph extends AbstractBaseGraph<NetNode, NetEdge> {
        private static final long serialVersionUID = 1L;

        NetGraph() {
            super(null, null, DefaultGraphType.pseudograph(), new DefaultGraphSpecificsStrategy<>());
        }
    }

    /** The graph of the first {@code edgeCount} edges over every node, in numbering order. */
    private Graph<NetNode, NetEdge> build(int edgeCount) {
        Graph<NetNode, NetEdge> built = new NetGraph();
        for (NetNode n : nodes) {
            built.addVertex(n);
        }
        for (int k = 0; k < edgeCount; k++) {
            built.addEdge(nodes[edgeSource[k]], nodes[edgeTarget[k]], edges[k]);
        }
        return new AsUnmodifiableGraph<>(built);
    }

    /** The graph of every node and the drawn lines alone, in the same vertex and edge order as {@link #graph}. */
    private Graph<NetNode, NetEdge> lineGraph() {
        Graph<NetNode, NetEdge> lg = lineGraph;
        if (lg == null) {
            synchronized (this) {
                lg = lineGraph;
                if (lg == null) {
                    lg = build(lineEdgeCount);
                    lineGraph = lg;
                }
            }
        }
        return lg;
    }

    private static int capacity(int entries) {
        return (int) (entries / 0.75f) + 1;
    }

    private int existing(Endpoint e) {
        int i = indexOf(e);
        if (i < 0) {
            throw new IllegalArgumentException("no such vertex in graph: " + node(e));
        }
        return i;
    }

    private static int existingPort(int first, Component c, String port) {
        int i = portAt(first, c, port);
        if (i < 0) {
            throw new IllegalArgumentException("no such vertex in graph: " + c.id() + "." + port);
        }
        return i;
    }

    /**
     * The number of a hydraulic port of component c, given the number of its first hydraulic port (ports
     * are numbered consecutively in the type's port order); −1 if c has no such hydraulic port.
     */
    public static int portAt(int first, Component c, String port) {
        int k = c.type().hydraulicPortIndex(port);
        return k < 0 ? -1 : first + k;
    }

    /** Number of nodes; they are numbered from 0 in the order of {@code graph().vertexSet()}. */
    public int nodeCount() {
        return nodes.length;
    }

    /** The node with the given number. */
    public NetNode node(int index) {
        return nodes[index];
    }

    /** The component whose port the numbered node is; null for a junction. */
    public Component componentAt(int index) {
        return ownerOf[index];
    }

    /** Number of drawn lines (shaft couplings excluded) ending at the numbered node. */
    public int lineDegree(int index) {
        return lineDegree[index];
    }

    /** The number of a component's hydraulic port, or −1 when there is no such hydraulic port. */
    public int portIndex(String componentId, String port) {
        Integer first = firstNode.get(componentId);
        if (first == null) {
            return -1;
        }
        int i = first;
        Component c = ownerOf.length > i ? ownerOf[i] : null;
        if (c == null || !c.id().equals(componentId)) {
            return -1;
        }
        return portAt(i, c, port);
    }

    /** The number of the node a line endpoint sits on, or −1 when the netlist has no such node. */
    public int indexOf(Endpoint e) {
        if (e instanceof Endpoint.PortRef p) {
            return portIndex(p.componentId(), p.port());
        }
        return junctionIndex(((Endpoint.JunctionRef) e).junctionId());
    }

    /** The number of a node, or −1 when it is not in the netlist. */
    public int indexOf(NetNode n) {
        if (n instanceof NetNode.Port p) {
            return portIndex(p.componentId(), p.port());
        }
        return junctionIndex(((NetNode.Junction) n).junctionId());
    }

    private int junctionIndex(String id) {
        Integer i = firstNode.get(id);
        return i == null || !(nodes[i] instanceof NetNode.Junction j) || !j.junctionId().equals(id) ? -1 : i;
    }

    /** Number of edges; they are numbered from 0 in the order of {@code graph().edgeSet()}. */
    public int edgeCount() {
        return edges.length;
    }

    /** The numbered edge. */
    public NetEdge edge(int index) {
        return edges[index];
    }

    /** The number of the node the numbered edge starts at. */
    public int edgeSource(int index) {
        return edgeSource[index];
    }

    /** The number of the node the numbered edge ends at. */
    public int edgeTarget(int index) {
        return edgeTarget[index];
    }

    /** The numbers of the reservoir ports, in the order of {@link #reservoirPorts()}. */
    public int[] reservoirNodes() {
        return reservoirNodes.clone();
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

    /** The whole graph: lines and internal paths (unmodifiable view), built on first use. */
    public Graph<NetNode, NetEdge> graph() {
        Graph<NetNode, NetEdge> g = graph;
        if (g == null) {
            synchronized (this) {
                g = graph;
                if (g == null) {
                    g = build(edges.length);
                    graph = g;
                }
            }
        }
        return g;
    }

    /** Hydraulic ports with no line attached, in drawing order. */
    public List<NetNode.Port> unconnectedPorts() {
        List<NetNode.Port> out = new ArrayList<>();
        for (int i = 0; i < nodes.length; i++) {
            if (nodes[i] instanceof NetNode.Port p && lineDegree[i] == 0) {
                out.add(p);
            }
        }
        return out;
    }

    /** Connected sub-networks through lines and internal paths; each set in graph order (copies). */
    public List<Set<NetNode>> subNetworks() {
        return copy(new ConnectivityInspector<>(graph()).connectedSets());
    }

    /** Nets: nodes joined by lines and junctions alone (copies); a lone unconnected port is a net of its own. */
    public List<Set<NetNode>> nets() {
        return copy(new ConnectivityInspector<>(lineGraph()).connectedSets());
    }

    /** The net containing the given node. */
    public Set<NetNode> netOf(NetNode n) {
        return Collections.unmodifiableSet(new LinkedHashSet<>(new ConnectivityInspector<>(lineGraph()).connectedSetOf(n)));
    }

    /** A path with the fewest edges between two nodes through lines and internal paths, if any. */
    public Optional<GraphPath<NetNode, NetEdge>> path(NetNode from, NetNode to) {
        Graph<NetNode, NetEdge> g = graph();
        if (!g.containsVertex(from) || !g.containsVertex(to)) {
            throw new IllegalArgumentException("no such node: " + (g.containsVertex(from) ? to : from));
        }
        return Optional.ofNullable(new BFSShortestPath<>(g).getPath(from, to));
    }

    /** The reservoir ports, which sit at the reference (zero gauge) pressure. */
    public List<NetNode.Port> reservoirPorts() {
        List<NetNode.Port> out = new ArrayList<>(reservoirNodes.length);
        for (int i : reservoirNodes) {
            out.add((NetNode.Port) nodes[i]);
        }
        return out;
    }

    /** Nodes with no path to any reservoir port: their pressure is not fixed by the network. */
    public Set<NetNode> nodesWithoutReservoir() {
        ConnectivityInspector<NetNode, NetEdge> ci = new ConnectivityInspector<>(graph());
        Set<NetNode> reached = new LinkedHashSet<>();
        for (NetNode.Port r : reservoirPorts()) {
            reached.addAll(ci.connectedSetOf(r));
        }
        Set<NetNode> out = new LinkedHashSet<>(graph().vertexSet());
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
