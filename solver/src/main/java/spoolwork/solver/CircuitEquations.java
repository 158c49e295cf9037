package spoolwork.solver;

import java.util.AbstractMap;
import java.util.ArrayList;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;

import spoolwork.model.ActuatorState;
import spoolwork.model.Circuit;
import spoolwork.model.Component;
import spoolwork.model.ComponentType;
import spoolwork.model.Endpoint;
import spoolwork.model.Line;
import spoolwork.model.LineKind;
import spoolwork.model.OperatingState;
import spoolwork.model.PortSpec;
import spoolwork.model.SpoolPosition;
import spoolwork.model.netlist.NetEdge;
import spoolwork.model.netlist.NetNode;
import spoolwork.model.netlist.Netlist;
import spoolwork.solver.elements.Actuator;
import spoolwork.solver.elements.Branch;
import spoolwork.solver.elements.Conductance;
import spoolwork.solver.elements.DropLaw;
import spoolwork.solver.elements.Element;
import spoolwork.solver.elements.FlowControl;
import spoolwork.solver.elements.LineLaw;
import spoolwork.solver.elements.Network;
import spoolwork.solver.elements.NodeConductance;
import spoolwork.solver.elements.OneWayValve;
import spoolwork.solver.elements.PilotPath;
import spoolwork.solver.elements.PowerKind;
import spoolwork.solver.elements.Pump;
import spoolwork.solver.fluid.FluidProperties;

/**
 * Turns a circuit in one operating state into equations. Points joined by ideal lines share one node;
 * every reservoir port is the reference node. Each component becomes one or more elements.
 */
final class CircuitEquations {
    /** Nominal speed for a motor's leakage conductance: the catalogue's 4-pole 50 Hz speed (common practice). */
    static final double MOTOR_NOMINAL_SPEED = 1450.0 / 60;

    final Circuit circuit;
    final OperatingState state;
    final Netlist netlist;
    final FluidProperties fluid;
    final Network net;
    /** Node index of every netlist node, by the netlist's node number; −1 for the reservoir. */
    final int[] nodeAt;
    /** Node index of every netlist node; −1 for the reservoir (a view of {@link #nodeAt}). */
    final Map<NetNode, Integer> nodeOf;
    /** Per line in drawing order: the netlist node numbers of its ends (−1 for a shaft coupling). */
    final int[] lineStart;
    final int[] lineEnd;
    /** Per line in drawing order: its loss-bearing element, null for an ideal line or a shaft. */
    final Branch[] lineBranch;
    /** Elements of each component, in drawing order. */
    final List<List<Element>> componentElements;
    /** Representative names of node indices. */
    final List<String> nodeNames = new ArrayList<>();
    final NodeConductance nodes;

    CircuitEquations(Circuit circuit, OperatingState state, Netlist netlist, SolverOptions options) {
        this.circuit = circuit;
        this.state = state;
        this.netlist = netlist;
        this.fluid = new FluidProperties(circuit.fluid());
        this.nodeAt = new int[netlist.nodeCount()];
        this.nodeOf = new NodeView();
        int lineCount = circuit.lines().size();
        this.lineStart = new int[lineCount];
        this.lineEnd = new int[lineCount];
        this.lineBranch = new Branch[lineCount];
        int componentCount = circuit.components().size();
        this.componentElements = new ArrayList<>(componentCount);
        double pRef = 1e6;
        double qRef = 0;
        List<Component> components = circuit.components();
        for (int ci = 0; ci < componentCount; ci++) {
            Component c = components.get(ci);
            for (String k : SETTINGS_OF[c.type().ordinal()]) {
                pRef = Math.max(pRef, c.param(k));
            }
            if (c.type().isPump()) {
                qRef += c.param("displacement") * speedOf(c);
            }
        }
        // about one unknown per node, per line and per element, and a few per component
        this.net = new Network(fluid, pRef, Math.max(qRef, 1e-5), netlist.nodeCount() + lineCount + 2 * componentCount,
                1 + lineCount + 2 * componentCount);
        lineEnds();
        numberNodes();
        int[] all = new int[nodeNames.size()];
        for (int i = 0; i < all.length; i++) {
            all[i] = i;
        }
        nodes = new NodeConductance(all, nodeNames.toArray(new String[0]));
        net.addElement(nodes);
        List<Line> lines = circuit.lines();
        for (int li = 0; li < lineCount; li++) {
            Line l = lines.get(li);
            if (l.kind() == LineKind.SHAFT || l.ideal()) {
                continue;
            }
            LineLaw law = new LineLaw(l.diameter(), l.length(), fluid.density(), fluid.kinematicViscosity(),
                    options.roughness());
            Branch b = new Branch(l.id(), nodeAt[lineStart[li]], null, nodeAt[lineEnd[li]], null, law, PowerKind.LINE,
                    net);
            net.addElement(b);
            lineBranch[li] = b;
        }
        int base = 0;
        for (int ci = 0; ci < componentCount; ci++) {
            Component c = components.get(ci);
            // most components are one element, a few two, a directional valve up to six
            List<Element> es = new ArrayList<>(2);
            building = c;
            buildingBase = base;
            build(c, es);
            base += c.type().hydraulicPortCount();
            for (int k = 0; k < es.size(); k++) {
                net.addElement(es.get(k));
            }
            componentElements.add(es);
        }
        building = null;
    }

    /** The component being built and the netlist number of its first hydraulic port. */
    private Component building;
    private int buildingBase;

    /**
     * The netlist node numbers of every line's ends. The netlist numbers the drawn lines first, in drawing
     * order, so their ends are read from its edges; a line found otherwise is looked up by its endpoints.
     */
    private void lineEnds() {
        int li = -1;
        int k = 0;
        int edgeCount = netlist.edgeCount();
        for (Line l : circuit.lines()) {
            li++;
            if (l.kind() == LineKind.SHAFT) {
                lineStart[li] = -1;
                lineEnd[li] = -1;
                continue;
            }
            if (k < edgeCount && netlist.edge(k) instanceof NetEdge.LineEdge e && e.lineId().equals(l.id())) {
                lineStart[li] = netlist.edgeSource(k);
                lineEnd[li] = netlist.edgeTarget(k);
                k++;
            } else {
                lineStart[li] = netlist.indexOf(l.from());
                lineEnd[li] = netlist.indexOf(l.to());
            }
        }
    }

    private double speedOf(Component pump) {
        String driver = netlist.drivers().get(pump.id());
        if (driver != null) {
            Component pm = circuit.component(driver).orElseThrow();
            return state.speeds().getOrDefault(driver, pm.param("speed"));
        }
        return pump.param("speed");
    }

    private static final List<String> SETTINGS = List.of("cracking_pressure", "setting", "compensator_setting");

    /**
     * By component type: the settings that set the circuit's typical pressure, in the order of
     * {@link #SETTINGS}. A check valve's cracking pressure is no setting of the circuit.
     */
    private static final String[][] SETTINGS_OF = new String[ComponentType.values().length][];

    static {
        for (ComponentType t : ComponentType.values()) {
            List<String> keys = new ArrayList<>();
            for (String k : SETTINGS) {
                if (t.params().containsKey(k) && t != ComponentType.CHECK_VALVE
                        && t != ComponentType.PILOT_CHECK_VALVE) {
                    keys.add(k);
                }
            }
            SETTINGS_OF[t.ordinal()] = keys.toArray(new String[0]);
        }
    }

    private void numberNodes() {
        int count = netlist.nodeCount();
        int[] parent = new int[count];
        for (int i = 0; i < count; i++) {
            parent[i] = i;
        }
        int ground = -1;
        for (int r : netlist.reservoirNodes()) {
            if (ground < 0) {
                ground = r;
            } else {
                union(parent, ground, r);
            }
        }
        int li = -1;
        for (Line l : circuit.lines()) {
            li++;
            if (l.kind() != LineKind.SHAFT && l.ideal()) {
                union(parent, lineStart[li], lineEnd[li]);
            }
        }
        int groundRoot = ground < 0 ? -1 : find(parent, ground);
        int[] index = new int[count];
        java.util.Arrays.fill(index, -1);
        // number along the drawing (the netlist's node order): component ports in order, then junctions
        for (int n = 0; n < count; n++) {
            int root = find(parent, n);
            if (root == groundRoot) {
                nodeAt[n] = -1;
                continue;
            }
            int i = index[root];
            if (i < 0) {
                String name = describe(n);
                i = net.addNode(name);
                index[root] = i;
                nodeNames.add(name);
            }
            nodeAt[n] = i;
        }
    }

    private String describe(int n) {
        Component owner = netlist.componentAt(n);
        if (owner == null) {
            return ((NetNode.Junction) netlist.node(n)).junctionId();
        }
        return owner.tag() + "." + ((NetNode.Port) netlist.node(n)).port();
    }

    private static int find(int[] parent, int n) {
        int r = n;
        while (parent[r] != r) {
            r = parent[r];
        }
        int c = n;
        while (parent[c] != r) {
            int next = parent[c];
            parent[c] = r;
            c = next;
        }
        return r;
    }

    private static void union(int[] parent, int a, int b) {
        int ra = find(parent, a);
        int rb = find(parent, b);
        if (ra != rb) {
            parent[rb] = ra;
        }
    }

    /** Read-only map view of the node numbering, keyed by netlist node. */
    private final class NodeView extends AbstractMap<NetNode, Integer> {
        @Override
        public Integer get(Object key) {
            int i = key instanceof NetNode n ? netlist.indexOf(n) : -1;
            return i < 0 ? null : nodeAt[i];
        }

        @Override
        public boolean containsKey(Object key) {
            return key instanceof NetNode n && netlist.indexOf(n) >= 0;
        }

        @Override
        public int size() {
            return nodeAt.length;
        }

        @Override
        public Set<Map.Entry<NetNode, Integer>> entrySet() {
            Map<NetNode, Integer> m = new LinkedHashMap<>();
            for (int i = 0; i < nodeAt.length; i++) {
                m.put(netlist.node(i), nodeAt[i]);
            }
            return Collections.unmodifiableMap(m).entrySet();
        }
    }

    int node(Endpoint e) {
        return nodeAt[netlist.indexOf(e)];
    }

    /** The netlist number of a component's hydraulic port, or −1 when there is no such hydraulic port. */
    private int portIndex(Component c, String port) {
        if (c != building) {
            return netlist.portIndex(c.id(), port);
        }
        return Netlist.portAt(buildingBase, c, port);
    }

    int node(Component c, String port) {
        int i = portIndex(c, port);
        if (i < 0) {
            throw new NullPointerException(c.tag() + " has no hydraulic port " + port);
        }
        return nodeAt[i];
    }

    private boolean connected(Component c, String port) {
        int i = portIndex(c, port);
        return i >= 0 && netlist.lineDegree(i) > 0;
    }

    private void build(Component c, List<Element> es) {
        String t = c.tag();
        switch (c.type()) {
            case FIXED_PUMP, COMPENSATED_PUMP -> {
                boolean comp = c.type() == ComponentType.COMPENSATED_PUMP;
                int drain = comp && connected(c, "L") ? node(c, "L") : Integer.MIN_VALUE;
                Pump p = new Pump(t, node(c, "S"), node(c, "P"), drain, c.param("displacement"),
                        speedOf(c), c.param("volumetric_efficiency"), c.param("overall_efficiency"),
                        c.param("reference_pressure"), comp, comp ? c.param("compensator_setting") : 0,
                        comp ? c.param("compensator_band") : 1, net);
                es.add(p);
            }
            case HYDRAULIC_MOTOR -> {
                double d = c.param("displacement");
                double k = c.param("mechanical_efficiency") * d / (2 * Math.PI);
                double leak = (1 - c.param("volumetric_efficiency")) * d * MOTOR_NOMINAL_SPEED
                        / c.param("reference_pressure");
                ActuatorState a = state.actuatorOf(c.id());
                boolean free = a.mode() == ActuatorState.Mode.FREE;
                boolean constant = a.loadKind() == ActuatorState.LoadKind.CONSTANT;
                es.add(new Actuator(t, true, node(c, "A"), node(c, "B"), d, d, k, k,
                        constant ? a.load() : 0, constant ? 0 : a.load(), 0, leak, free, free, net));
            }
            case DOUBLE_ACTING_CYLINDER, SINGLE_ACTING_CYLINDER, DOUBLE_ROD_CYLINDER -> {
                double bore = c.param("bore");
                double rod = c.param("rod");
                double full = Math.PI * bore * bore / 4;
                double annulus = full - Math.PI * rod * rod / 4;
                double cap = c.type() == ComponentType.DOUBLE_ROD_CYLINDER ? annulus : full;
                double rodSide = c.type() == ComponentType.SINGLE_ACTING_CYLINDER ? 0 : annulus;
                int b = c.type() == ComponentType.SINGLE_ACTING_CYLINDER ? -1 : node(c, "B");
                ActuatorState a = state.actuatorOf(c.id());
                boolean constant = a.loadKind() == ActuatorState.LoadKind.CONSTANT;
                double fixed = constant ? a.load() : 0;
                if (c.type() == ComponentType.SINGLE_ACTING_CYLINDER && c.option("return").equals("spring")) {
                    // the spring's force at mid-stroke stands for its force over the stroke
                    fixed += c.param("spring_preload") + c.param("spring_rate") * c.param("stroke") / 2;
                }
                boolean plus = a.mode() != ActuatorState.Mode.HELD_EXTENDED;
                boolean minus = a.mode() != ActuatorState.Mode.HELD_RETRACTED;
                es.add(new Actuator(t, false, node(c, "A"), b, cap, rodSide, cap, rodSide, fixed,
                        constant ? 0 : a.load(), c.param("friction"), 0, plus, minus, net));
            }
            case RELIEF_VALVE -> es.add(new OneWayValve.Relief(t, node(c, "P"), node(c, "T"),
                    c.param("cracking_pressure"), c.param("override"), c.param("rated_flow"), net));
            case REDUCING_VALVE -> es.add(new OneWayValve.Reducing(t, node(c, "P"), node(c, "A"), c.param("setting"),
                    c.param("override"), c.param("rated_flow"), net));
            case SEQUENCE_VALVE -> es.add(new OneWayValve.Sequence(t, node(c, "P"), node(c, "A"),
                    c.param("cracking_pressure"), c.param("override"), c.param("rated_flow"), net));
            case COUNTERBALANCE_VALVE -> {
                double rated = c.param("rated_flow");
                es.add(new OneWayValve.Counterbalance(t, node(c, "A"), node(c, "B"), node(c, "X"), c.param("setting"),
                        c.param("pilot_ratio"), c.param("override"), rated, net));
                es.add(new OneWayValve.Check(t, node(c, "B"), "B", node(c, "A"), "A", c.param("check_cracking"),
                        DropLaw.rated(rated, Math.max(c.param("override"), 1e5)), rated, PowerKind.VALVE, net));
            }
            case CHECK_VALVE -> es.add(new OneWayValve.Check(t, node(c, "A"), "A", node(c, "B"), "B",
                    c.param("cracking_pressure"), DropLaw.rated(c.param("rated_flow"), c.param("rated_drop")),
                    c.param("rated_flow"), PowerKind.VALVE, net));
            case PILOT_CHECK_VALVE -> {
                es.add(new OneWayValve.Check(t, node(c, "A"), "A", node(c, "B"), "B", c.param("cracking_pressure"),
                        DropLaw.rated(c.param("rated_flow"), c.param("rated_drop")), c.param("rated_flow"),
                        PowerKind.VALVE, net));
                es.add(new PilotPath(t, node(c, "A"), node(c, "B"), node(c, "X"), c.param("pilot_ratio"),
                        c.param("cracking_pressure"), c.param("rated_flow"), c.param("rated_drop")));
            }
            case ORIFICE, THROTTLE -> {
                double d = c.param("diameter");
                // laminar below an orifice Reynolds number of about 10 (from memory)
                double qt = Math.PI * d * fluid.kinematicViscosity() * 10 / 4;
                es.add(new Branch(t, node(c, "A"), "A", node(c, "B"), "B",
                        DropLaw.orifice(c.param("discharge_coefficient"), d, fluid.density(), qt), PowerKind.THROTTLE,
                        net));
            }
            case FLOW_CONTROL -> es.add(new FlowControl(t, node(c, "A"), node(c, "B"), c.param("set_flow"),
                    c.param("minimum_drop"), net));
            case DIRECTIONAL_2_2, DIRECTIONAL_3_2, DIRECTIONAL_4_2, DIRECTIONAL_4_3 -> directional(c, es);
            case FILTER -> {
                double r = c.param("clean_drop") / c.param("rated_flow");
                es.add(new Branch(t, node(c, "A"), "A", node(c, "B"), "B", DropLaw.linear(r), PowerKind.VALVE, net));
                es.add(new OneWayValve.Check(t, node(c, "A"), "A", node(c, "B"), "B", c.param("bypass_cracking"),
                        DropLaw.linear(r), c.param("rated_flow"), PowerKind.VALVE, net));
            }
            case COOLER -> es.add(new Branch(t, node(c, "A"), "A", node(c, "B"), "B",
                    DropLaw.rated(c.param("rated_flow"), c.param("rated_drop")), PowerKind.VALVE, net));
            case FLOW_METER -> es.add(new Branch(t, node(c, "A"), "A", node(c, "B"), "B",
                    DropLaw.linear(1.0 / c.param("full_scale")), PowerKind.VALVE, net));
            default -> {
                // reservoir, prime mover, accumulator, gauge, plug: no flow at steady state
            }
        }
    }

    /** Port pairs of a directional valve that leak across the spool when no open path joins them. */
    private static final String[] LEAK_FROM = {"P", "P", "A", "B"};
    private static final String[] LEAK_TO = {"A", "B", "T", "T"};

    /**
     * By component type: the indices into {@link #LEAK_FROM} of the pairs whose two ports the type has, so
     * that building a valve does not scan its ports for every pair.
     */
    private static final int[][] LEAKS_OF = new int[ComponentType.values().length][];

    static {
        for (ComponentType t : ComponentType.values()) {
            int[] ks = new int[LEAK_FROM.length];
            int n = 0;
            for (int k = 0; k < LEAK_FROM.length; k++) {
                if (hasPort(t, LEAK_FROM[k]) && hasPort(t, LEAK_TO[k])) {
                    ks[n++] = k;
                }
            }
            LEAKS_OF[t.ordinal()] = java.util.Arrays.copyOf(ks, n);
        }
    }

    private static boolean hasPort(ComponentType t, String name) {
        for (PortSpec p : t.ports()) {
            if (p.name().equals(name)) {
                return true;
            }
        }
        return false;
    }

    /** True when an open path of the position joins the two ports, in either direction. */
    private static boolean joins(SpoolPosition pos, String x, String y) {
        for (SpoolPosition.FlowPath fp : pos.paths()) {
            if (fp.from().equals(x) && fp.to().equals(y) || fp.from().equals(y) && fp.to().equals(x)) {
                return true;
            }
        }
        return false;
    }

    private void directional(Component c, List<Element> es) {
        String want = state.positionOf(c.id());
        // the catalogue keeps each type's positions per option choice, so this walks two or three of them
        SpoolPosition pos = null;
        for (SpoolPosition sp : c.type().spoolPositions(c.options())) {
            if (sp.name().equals(want)) {
                pos = sp;
            }
        }
        if (pos == null) {
            throw new IllegalStateException(c.tag() + " has no spool position " + want);
        }
        // every open path of the valve has the same law, and a law holds no state, so they share one
        DropLaw law = DropLaw.rated(c.param("rated_flow"), c.param("rated_drop"));
        for (SpoolPosition.FlowPath fp : pos.paths()) {
            es.add(new Branch(c.tag(), node(c, fp.from()), fp.from(), node(c, fp.to()), fp.to(), law,
                    PowerKind.VALVE, net));
        }
        double leak = c.param("leakage");
        if (leak <= 0) {
            return;
        }
        for (int k : LEAKS_OF[c.type().ordinal()]) {
            String x = LEAK_FROM[k];
            String y = LEAK_TO[k];
            if (joins(pos, x, y)) {
                continue;
            }
            es.add(new Conductance(c.tag(), node(c, x), x, node(c, y), y, leak));
        }
    }
}
