package spoolwork.model.netlist;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Set;

import org.junit.jupiter.api.Test;

import spoolwork.model.Circuit;
import spoolwork.model.Component;
import spoolwork.model.ComponentType;
import spoolwork.model.Endpoint;
import spoolwork.model.Junction;
import spoolwork.model.Line;
import spoolwork.model.LineKind;
import spoolwork.model.OperatingState;

class NetlistTest {

    private static Line line(String id, Endpoint a, Endpoint b) {
        return new Line(id, a, b, List.of(), 0.012, 1, LineKind.PRESSURE, false);
    }

    /** Reservoir → pump → junction → relief back to tank, and on to a 4/3 tandem valve feeding a cylinder. */
    private static Circuit press() {
        Circuit c = Circuit.empty()
                .withComponent(Component.of("t", "T1", ComponentType.RESERVOIR, 0, 40))
                .withComponent(Component.of("m", "M1", ComponentType.PRIME_MOVER, -10, 30))
                .withComponent(Component.of("p", "P1", ComponentType.FIXED_PUMP, 0, 30))
                .withComponent(Component.of("rv", "V1", ComponentType.RELIEF_VALVE, 10, 20))
                .withComponent(Component.of("dv", "V2", ComponentType.DIRECTIONAL_4_3, 0, 10).withOption("centre", "tandem"))
                .withComponent(Component.of("cy", "C1", ComponentType.DOUBLE_ACTING_CYLINDER, 0, 0))
                .withJunction(new Junction("j", 0, 20));
        c = c.withLine(line("l1", Endpoint.port("t", "S"), Endpoint.port("p", "S")))
                .withLine(line("l2", Endpoint.port("p", "P"), Endpoint.junction("j")))
                .withLine(line("l3", Endpoint.junction("j"), Endpoint.port("rv", "P")))
                .withLine(line("l4", Endpoint.port("rv", "T"), Endpoint.port("t", "T")))
                .withLine(line("l5", Endpoint.junction("j"), Endpoint.port("dv", "P")))
                .withLine(line("l6", Endpoint.port("dv", "T"), Endpoint.port("t", "T")))
                .withLine(line("l7", Endpoint.port("dv", "A"), Endpoint.port("cy", "A")))
                .withLine(line("l8", Endpoint.port("dv", "B"), Endpoint.port("cy", "B")))
                .withLine(new Line("s1", Endpoint.port("m", "shaft"), Endpoint.port("p", "shaft"), List.of(), 0, 0,
                        LineKind.SHAFT, true));
        return c.withState(OperatingState.named("Extend").withPosition("dv", "a"));
    }

    @Test
    void nodesAndEdges() {
        Netlist n = new Netlist(press(), null);
        // ports: T1 S,T; P1 S,P; V1 P,T; V2 P,T,A,B; C1 A,B (shafts excluded) + 1 junction = 13
        assertEquals(13, n.graph().vertexSet().size());
        // 8 fluid lines + internal: reservoir S–T, pump S–P, relief P–T, tandem centre P–T = 12
        assertEquals(12, n.graph().edgeSet().size());
        assertEquals("m", n.drivers().get("p"));
    }

    @Test
    void unconnectedPorts() {
        Circuit c = press().withoutLine("l8");
        List<NetNode.Port> open = new Netlist(c, null).unconnectedPorts();
        assertEquals(List.of(new NetNode.Port("dv", "B"), new NetNode.Port("cy", "B")), open);
    }

    @Test
    void netsJoinPortsThroughLinesAndJunctions() {
        Netlist n = new Netlist(press(), null);
        Set<NetNode> supply = n.netOf(new NetNode.Port("p", "P"));
        assertEquals(Set.of(new NetNode.Port("p", "P"), new NetNode.Junction("j"), new NetNode.Port("rv", "P"),
                new NetNode.Port("dv", "P")), supply);
        // return net: relief T, valve T and both reservoir T … the reservoir S is its own net with pump S
        assertEquals(Set.of(new NetNode.Port("rv", "T"), new NetNode.Port("dv", "T"), new NetNode.Port("t", "T")),
                n.netOf(new NetNode.Port("t", "T")));
    }

    @Test
    void spoolPositionDecidesThePathToTheCylinder() {
        Circuit c = press();
        NetNode pump = new NetNode.Port("p", "P");
        NetNode cap = new NetNode.Port("cy", "A");
        Netlist rest = new Netlist(c, c.state("Rest").orElseThrow());
        assertTrue(rest.path(pump, cap).isEmpty(), "tandem centre blocks A and B");
        assertFalse(rest.nodesWithoutReservoir().isEmpty());
        assertTrue(rest.nodesWithoutReservoir().contains(cap));

        Netlist extend = new Netlist(c, c.state("Extend").orElseThrow());
        var path = extend.path(pump, cap).orElseThrow();
        // pump P → l2 → j → l5 → V2 P → (P–A) → V2 A → l7 → C1 A
        assertEquals(4, path.getLength());
        assertTrue(extend.nodesWithoutReservoir().isEmpty());
    }

    @Test
    void subNetworks() {
        Circuit c = press().withComponent(Component.of("g", "G1", ComponentType.PRESSURE_GAUGE, 50, 50));
        List<Set<NetNode>> subs = new Netlist(c, c.state("Rest").orElseThrow()).subNetworks();
        // the main circuit at rest, the cylinder chamber A with valve port A, chamber B with port B, the gauge
        assertEquals(4, subs.size());
        assertTrue(subs.contains(Set.of(new NetNode.Port("g", "P"))));
    }
}
