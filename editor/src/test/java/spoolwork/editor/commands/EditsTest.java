package spoolwork.editor.commands;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Set;

import org.junit.jupiter.api.Test;

import spoolwork.editor.canvas.LibraryGeometry;
import spoolwork.editor.document.EditorDocument;
import spoolwork.editor.geometry.Box;
import spoolwork.model.Circuit;
import spoolwork.model.Component;
import spoolwork.model.ComponentType;
import spoolwork.model.Endpoint;
import spoolwork.model.Line;
import spoolwork.model.LineKind;
import spoolwork.model.ModelException;
import spoolwork.model.Point;

class EditsTest {
    private final LibraryGeometry geometry = new LibraryGeometry();
    private final Edits edits = new Edits(geometry);
    private final EditorDocument doc = new EditorDocument();

    private String place(ComponentType t, double x, double y) {
        String id = doc.getCircuit().freshId("c");
        assertTrue(doc.execute(edits.place(t, x, y)));
        return id;
    }

    private String connect(Endpoint a, Endpoint b) {
        String id = doc.getCircuit().freshId("l");
        assertTrue(doc.execute(edits.connect(a, b)));
        return id;
    }

    @Test
    void placesWithAutomaticTagsAndConnectsWithOrthogonalLines() {
        String tank = place(ComponentType.RESERVOIR, 10, 40);
        String pump = place(ComponentType.FIXED_PUMP, 10, 30);
        String relief = place(ComponentType.RELIEF_VALVE, 24, 28);
        String valve = place(ComponentType.DIRECTIONAL_4_3, 20, 15);
        String cyl = place(ComponentType.DOUBLE_ACTING_CYLINDER, 20, 4);
        Circuit c = doc.getCircuit();
        assertEquals("T1", c.component(tank).orElseThrow().tag());
        assertEquals("P1", c.component(pump).orElseThrow().tag());
        assertEquals("V1", c.component(relief).orElseThrow().tag());
        assertEquals("V2", c.component(valve).orElseThrow().tag());
        assertEquals("C1", c.component(cyl).orElseThrow().tag());

        String suction = connect(Endpoint.port(tank, "S"), Endpoint.port(pump, "S"));
        String supply = connect(Endpoint.port(pump, "P"), Endpoint.port(valve, "P"));
        connect(Endpoint.port(valve, "A"), Endpoint.port(cyl, "A"));
        connect(Endpoint.port(valve, "B"), Endpoint.port(cyl, "B"));
        c = doc.getCircuit();
        assertEquals(LineKind.SUCTION, c.line(suction).orElseThrow().kind());
        assertEquals(LineKind.PRESSURE, c.line(supply).orElseThrow().kind());
        for (Line l : c.lines()) {
            List<Point> pts = edits.polyline(c, l);
            for (int i = 0; i + 1 < pts.size(); i++) {
                Point a = pts.get(i);
                Point b = pts.get(i + 1);
                assertTrue(a.x() == b.x() || a.y() == b.y(), l.id() + " has a slanted run " + a + " " + b);
            }
        }
        // A port takes one line; a branch goes through a junction.
        assertThrows(ModelException.class, () -> doc.execute(edits.connect(Endpoint.port(pump, "P"), Endpoint.port(relief, "P"))));
        assertEquals(c, doc.getCircuit());
    }

    @Test
    void connectingOntoALineMakesAJunctionAndDeletingTheBranchMergesItBack() {
        String pump = place(ComponentType.FIXED_PUMP, 10, 30);
        String valve = place(ComponentType.DIRECTIONAL_4_3, 30, 12);
        String relief = place(ComponentType.RELIEF_VALVE, 40, 30);
        String supply = connect(Endpoint.port(pump, "P"), Endpoint.port(valve, "P"));
        Circuit before = doc.getCircuit();
        List<Point> pts = edits.polyline(before, before.line(supply).orElseThrow());
        Point mid = new Point((pts.get(1).x() + pts.get(2).x()) / 2, (pts.get(1).y() + pts.get(2).y()) / 2);
        assertTrue(doc.execute(edits.connectToLine(Endpoint.port(relief, "P"), supply, mid)));
        Circuit c = doc.getCircuit();
        assertEquals(1, c.junctions().size());
        String j = c.junctions().iterator().next().id();
        assertEquals(3, c.linesAt(j).size());
        String branch = c.linesAt(j).stream().filter(l -> l.from().ownerId().equals(relief)).findFirst().orElseThrow().id();

        assertTrue(doc.execute(edits.delete(List.of(branch))));
        Circuit after = doc.getCircuit();
        assertTrue(after.junctions().isEmpty(), "junction with two lines left is removed");
        assertEquals(1, after.lines().size());
        Line merged = after.lines().iterator().next();
        assertEquals(Set.of(pump, valve), Set.of(merged.from().ownerId(), merged.to().ownerId()));
    }

    @Test
    void movingCarriesLinesRotatingAndDeletingAreUndoneToEmptyAndRedoneToTheSameDocument() {
        Circuit empty = doc.getCircuit();
        String pump = place(ComponentType.FIXED_PUMP, 10, 30);
        String tank = place(ComponentType.RESERVOIR, 10, 40);
        String line = connect(Endpoint.port(tank, "S"), Endpoint.port(pump, "S"));
        Point before = edits.position(doc.getCircuit(), Endpoint.port(pump, "S"));
        assertTrue(doc.execute(edits.move(List.of(pump), 6, -3)));
        Circuit moved = doc.getCircuit();
        assertEquals(new Point(16, 27), new Point(moved.component(pump).orElseThrow().x(), moved.component(pump).orElseThrow().y()));
        List<Point> pts = edits.polyline(moved, moved.line(line).orElseThrow());
        assertEquals(new Point(before.x() + 6, before.y() - 3), pts.get(pts.size() - 1), "the line follows the port");

        assertTrue(doc.execute(edits.rotate(List.of(pump))));
        assertEquals(90, doc.getCircuit().component(pump).orElseThrow().rotation());
        assertTrue(doc.execute(edits.mirror(List.of(pump))));
        assertTrue(doc.getCircuit().component(pump).orElseThrow().mirrored());
        assertTrue(doc.execute(edits.delete(List.of(pump))));
        assertTrue(doc.getCircuit().lines().isEmpty(), "the pump's line goes with it");
        Circuit end = doc.getCircuit();

        while (doc.undo()) {
            // back to the start
        }
        assertEquals(empty, doc.getCircuit());
        assertFalse(doc.isDirty());
        while (doc.redo()) {
            // forward to the end
        }
        assertEquals(end, doc.getCircuit());
    }

    @Test
    void duplicateAndPasteGiveFreshIdsAndTagsAndKeepInternalLines() {
        String pump = place(ComponentType.FIXED_PUMP, 10, 30);
        String tank = place(ComponentType.RESERVOIR, 10, 40);
        String line = connect(Endpoint.port(tank, "S"), Endpoint.port(pump, "S"));
        Edits.Paste p = edits.duplicate(doc.getCircuit(), List.of(pump, tank, line));
        assertTrue(doc.execute(p.command()));
        Circuit c = doc.getCircuit();
        assertEquals(4, c.components().size());
        assertEquals(2, c.lines().size());
        assertEquals(3, p.newIds().size());
        assertTrue(c.componentByTag("P2").isPresent());
        assertTrue(c.componentByTag("T2").isPresent());
        Component copy = c.componentByTag("P2").orElseThrow();
        assertEquals(12, copy.x());

        // Into another document the tags are kept when free.
        Circuit fragment = Edits.fragment(c, List.of(pump, tank, line));
        Edits.Paste q = edits.paste(fragment, 0, 0, "Paste");
        Circuit other = q.command().change().apply(Circuit.empty());
        assertTrue(other.componentByTag("P1").isPresent());
        assertEquals(1, other.lines().size());
    }

    @Test
    void valuesAreCheckedByTheModelAndARefusedEditChangesNothing() {
        String relief = place(ComponentType.RELIEF_VALVE, 10, 10);
        Circuit c = doc.getCircuit();
        assertThrows(ModelException.class, () -> doc.execute(Edits.setParam(relief, "cracking_pressure", -5)));
        assertEquals(c, doc.getCircuit());
        assertTrue(doc.execute(Edits.setParam(relief, "cracking_pressure", 120e5)));
        assertEquals(120e5, doc.getCircuit().component(relief).orElseThrow().param("cracking_pressure"));
        String other = place(ComponentType.RELIEF_VALVE, 20, 10);
        Circuit c2 = doc.getCircuit();
        assertThrows(ModelException.class, () -> doc.execute(Edits.setTag(other, "V1")));
        assertEquals(c2, doc.getCircuit());
        assertTrue(doc.execute(Edits.setTag(other, "V10")));
        assertEquals("V10", doc.getCircuit().component(other).orElseThrow().tag());
    }

    @Test
    void routeKeepsClearOfASymbolInTheWay() {
        String tank = place(ComponentType.RESERVOIR, 0, 20);
        String cyl = place(ComponentType.DOUBLE_ACTING_CYLINDER, 30, 20);
        String block = place(ComponentType.FILTER, 15, 18);
        String line = connect(Endpoint.port(tank, "T"), Endpoint.port(cyl, "A"));
        Circuit c = doc.getCircuit();
        Box b = geometry.bounds(c.component(block).orElseThrow());
        List<Point> pts = edits.polyline(c, c.line(line).orElseThrow());
        for (int i = 0; i + 1 < pts.size(); i++) {
            Point p = pts.get(i);
            Point q = pts.get(i + 1);
            int n = (int) Math.max(Math.abs(q.x() - p.x()), Math.abs(q.y() - p.y())) * 4;
            for (int k = 0; k <= n; k++) {
                double t = n == 0 ? 0 : (double) k / n;
                double x = p.x() + t * (q.x() - p.x());
                double y = p.y() + t * (q.y() - p.y());
                assertFalse(b.containsInside(x, y), "run " + p + "–" + q + " crosses the filter at " + x + "," + y);
            }
        }
    }

    @Test
    void movingALineRunSidewaysKeepsItsEndsOnThePorts() {
        String pump = place(ComponentType.FIXED_PUMP, 10, 30);
        String valve = place(ComponentType.DIRECTIONAL_4_3, 30, 12);
        String line = connect(Endpoint.port(pump, "P"), Endpoint.port(valve, "P"));
        Circuit c = doc.getCircuit();
        List<Point> before = edits.polyline(c, c.line(line).orElseThrow());
        assertTrue(doc.execute(edits.moveSegment(line, 1, 2)));
        Circuit d = doc.getCircuit();
        List<Point> after = edits.polyline(d, d.line(line).orElseThrow());
        assertEquals(before.get(0), after.get(0));
        assertEquals(before.get(before.size() - 1), after.get(after.size() - 1));
        assertNotEquals(before, after);
    }

    @Test
    void aGroupTurnsAndMirrorsAsOneKeepingItsLinesAttached() {
        String pump = place(ComponentType.FIXED_PUMP, 10, 30);
        String tank = place(ComponentType.RESERVOIR, 10, 40);
        String line = connect(Endpoint.port(tank, "S"), Endpoint.port(pump, "S"));
        for (boolean rotate : new boolean[] {true, false}) {
            Circuit before = doc.getCircuit();
            assertTrue(doc.execute(rotate ? edits.rotate(List.of(pump, tank, line)) : edits.mirror(List.of(pump, tank, line))));
            Circuit c = doc.getCircuit();
            List<Point> pts = edits.polyline(c, c.line(line).orElseThrow());
            assertEquals(edits.position(c, Endpoint.port(tank, "S")), pts.get(0));
            assertEquals(edits.position(c, Endpoint.port(pump, "S")), pts.get(pts.size() - 1));
            for (int i = 0; i + 1 < pts.size(); i++) {
                assertTrue(pts.get(i).x() == pts.get(i + 1).x() || pts.get(i).y() == pts.get(i + 1).y());
            }
            // The drawn length of the line is unchanged: the group moved as a rigid piece.
            List<Point> old = edits.polyline(before, before.line(line).orElseThrow());
            assertEquals(length(old), length(pts), 1e-9);
        }
        // A turned pump keeps its pair: pump above tank becomes pump left of tank after a quarter turn.
        Component p = doc.getCircuit().component(pump).orElseThrow();
        Component t = doc.getCircuit().component(tank).orElseThrow();
        assertEquals(p.y(), t.y());
        // Mirroring a turned part left to right reverses its rotation.
        assertTrue(p.mirrored());
        assertEquals(270, p.rotation());
    }

    private static double length(List<Point> pts) {
        double s = 0;
        for (int i = 0; i + 1 < pts.size(); i++) {
            s += Math.abs(pts.get(i + 1).x() - pts.get(i).x()) + Math.abs(pts.get(i + 1).y() - pts.get(i).y());
        }
        return s;
    }
}
