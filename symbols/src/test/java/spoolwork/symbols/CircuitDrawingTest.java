package spoolwork.symbols;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.api.Test;
import org.w3c.dom.Document;
import org.w3c.dom.Element;
import org.w3c.dom.NodeList;

import spoolwork.model.Circuit;
import spoolwork.model.Component;
import spoolwork.model.ComponentType;
import spoolwork.model.Endpoint;
import spoolwork.model.Fluid;
import spoolwork.model.Junction;
import spoolwork.model.Line;
import spoolwork.model.LineKind;
import spoolwork.model.Note;
import spoolwork.model.OperatingState;
import spoolwork.model.Point;
import spoolwork.model.TitleBlock;

class CircuitDrawingTest {

    private static Line line(String id, Endpoint a, Endpoint b, LineKind k, Point... bends) {
        return new Line(id, a, b, List.of(bends), 0.012, 1.0, k, false);
    }

    static Circuit sample() {
        Component m = Component.of("m", "M1", ComponentType.PRIME_MOVER, 2, 20);
        Component p = Component.of("p", "P1", ComponentType.FIXED_PUMP, 10, 20);
        Component v = Component.of("v", "V1", ComponentType.RELIEF_VALVE, 20, 10);
        Component d = Component.of("d", "D1", ComponentType.DIRECTIONAL_4_3, 10, 5);
        Component t = Component.of("t", "T1", ComponentType.RESERVOIR, 20, 26);
        Component t2 = Component.of("t2", "T2", ComponentType.RESERVOIR, 10, 30);
        Junction j = new Junction("j", 10, 14);
        return new Circuit(TitleBlock.empty(), Fluid.standard(), List.of(m, p, v, d, t, t2), List.of(j),
                List.of(line("l1", Endpoint.port("m", "shaft"), Endpoint.port("p", "shaft"), LineKind.SHAFT),
                        line("l2", Endpoint.port("p", "P"), Endpoint.junction("j"), LineKind.PRESSURE),
                        line("l3", Endpoint.junction("j"), Endpoint.port("v", "P"), LineKind.PRESSURE, new Point(20, 14)),
                        line("l4", Endpoint.junction("j"), Endpoint.port("d", "P"), LineKind.PRESSURE, new Point(9, 14)),
                        line("l5", Endpoint.port("v", "T"), Endpoint.port("t", "T"), LineKind.RETURN,
                                new Point(20, 2), new Point(24, 2), new Point(24, 22), new Point(21, 22)),
                        line("l6", Endpoint.port("t2", "S"), Endpoint.port("p", "S"), LineKind.SUCTION)),
                List.of(new Note("n", 2, 32, "Pump & relief <demo>")),
                List.of(OperatingState.named("Rest"), OperatingState.named("Lift").withPosition("d", "a")));
    }

    @Test
    void linesRunFromAnchorToAnchorThroughTheirBends() throws Exception {
        Circuit c = sample();
        CircuitDrawing d = CircuitDrawing.of(c, c.states().get(0));
        assertEquals(6, d.symbols().size());
        assertEquals(7, d.lines().size(), "five single lines and a shaft drawn as two");
        Shape.Polyline relief = (Shape.Polyline) d.lines().get(3);
        Symbol v = d.symbols().get(2);
        assertEquals(v.anchor("P").orElseThrow().at(), relief.points().get(relief.points().size() - 1));
        assertEquals(new Point(20, 13), v.anchor("P").orElseThrow().at(), "relief inlet at its origin + (0, 3)");
        assertEquals(1, d.dots().size(), "a dot where three lines meet");
        assertEquals(new Point(10, 14), ((Shape.Circle) d.dots().get(0)).centre());
        assertTrue(LineArt.crossings(((Shape.Polyline) d.lines().get(5)).points(), ((Shape.Polyline) d.lines().get(3)).points()).isEmpty());
    }

    @Test
    void valvesAreShownInTheStatePositionWithThePortsStill() {
        Circuit c = sample();
        CircuitDrawing rest = CircuitDrawing.of(c, c.states().get(0));
        CircuitDrawing lift = CircuitDrawing.of(c, c.states().get(1));
        Symbol r = rest.symbols().get(3);
        Symbol l = lift.symbols().get(3);
        assertTrue(r.key().endsWith("@0") && l.key().endsWith("@a"), r.key() + " / " + l.key());
        assertEquals(r.anchors(), l.anchors());
        assertEquals(4, l.bounds().minX() - r.bounds().minX(), 1e-9, "row slid one envelope to the right");
    }

    @Test
    void svgHasOneGroupPerComponentAndEscapesText() throws Exception {
        Circuit c = sample();
        String svg = SvgWriter.circuit(CircuitDrawing.of(c, null));
        Document doc = SvgWriterTest.parse(svg);
        NodeList groups = doc.getElementsByTagNameNS("http://www.w3.org/2000/svg", "g");
        int symbols = 0;
        for (int i = 0; i < groups.getLength(); i++) {
            if ("symbol".equals(((Element) groups.item(i)).getAttribute("class"))) {
                symbols++;
            }
        }
        assertEquals(6, symbols);
        assertTrue(svg.contains("Pump &amp; relief &lt;demo&gt;"));
    }
}
