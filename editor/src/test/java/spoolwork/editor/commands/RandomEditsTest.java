package spoolwork.editor.commands;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.Random;

import org.junit.jupiter.api.Test;

import spoolwork.editor.canvas.LibraryGeometry;
import spoolwork.editor.document.EditorDocument;
import spoolwork.model.Circuit;
import spoolwork.model.Component;
import spoolwork.model.ComponentType;
import spoolwork.model.Endpoint;
import spoolwork.model.Line;
import spoolwork.model.ModelException;
import spoolwork.model.ParameterSpec;
import spoolwork.model.PortSpec;
import spoolwork.model.TitleBlock;

/**
 * Several hundred seeded random edits, with undo and redo mixed in; undoing everything must give back the
 * starting document and redoing everything the final one.
 */
class RandomEditsTest {
    private final Edits edits = new Edits(new LibraryGeometry());

    @Test
    void undoingEveryRandomEditRestoresTheStart() {
        for (long seed : new long[] {1L, 20261201L}) {
            run(seed, 400);
        }
    }

    private void run(long seed, int steps) {
        Random rnd = new Random(seed);
        EditorDocument doc = new EditorDocument();
        Circuit start = Circuit.empty().withTitle(new TitleBlock("Random " + seed, "", "A", "", ""));
        doc.replace(start, null);
        int changes = 0;
        for (int i = 0; i < steps; i++) {
            Command cmd = randomCommand(doc.getCircuit(), rnd);
            if (cmd == null) {
                continue;
            }
            Circuit before = doc.getCircuit();
            try {
                if (doc.execute(cmd)) {
                    changes++;
                    // Every step on its own: undo gives the value before, redo the value after.
                    Circuit after = doc.getCircuit();
                    if (rnd.nextInt(10) == 0) {
                        doc.undo();
                        assertEquals(before, doc.getCircuit(), "seed " + seed + " step " + i + " " + cmd.description());
                        doc.redo();
                        assertEquals(after, doc.getCircuit());
                    }
                }
            } catch (ModelException e) {
                assertEquals(before, doc.getCircuit(), "a refused edit leaves the document as it was");
            }
        }
        assertTrue(changes > steps / 2, "most random edits changed the drawing: " + changes);
        Circuit end = doc.getCircuit();
        assertTrue(end.components().size() > 3);
        while (doc.undo()) {
            // all the way back
        }
        assertEquals(start, doc.getCircuit(), "seed " + seed);
        while (doc.redo()) {
            // all the way forward
        }
        assertEquals(end, doc.getCircuit(), "seed " + seed);
    }

    private Command randomCommand(Circuit c, Random rnd) {
        List<Component> comps = new ArrayList<>(c.components());
        List<Line> lines = new ArrayList<>(c.lines());
        int pick = rnd.nextInt(100);
        if (comps.size() < 4 || pick < 22) {
            ComponentType[] types = ComponentType.values();
            return edits.place(types[rnd.nextInt(types.length)], rnd.nextInt(120), rnd.nextInt(80));
        }
        Component k = comps.get(rnd.nextInt(comps.size()));
        if (pick < 42) {
            Component o = comps.get(rnd.nextInt(comps.size()));
            PortSpec a = k.type().ports().get(rnd.nextInt(k.type().ports().size()));
            PortSpec b = o.type().ports().get(rnd.nextInt(o.type().ports().size()));
            return edits.connect(Endpoint.port(k.id(), a.name()), Endpoint.port(o.id(), b.name()));
        }
        if (pick < 50 && !lines.isEmpty()) {
            Line l = lines.get(rnd.nextInt(lines.size()));
            PortSpec a = k.type().ports().get(rnd.nextInt(k.type().ports().size()));
            return edits.connectToLine(Endpoint.port(k.id(), a.name()), l.id(),
                    edits.polyline(c, l).get(0));
        }
        if (pick < 62) {
            return edits.move(List.of(k.id()), rnd.nextInt(11) - 5, rnd.nextInt(11) - 5);
        }
        if (pick < 68) {
            return edits.rotate(List.of(k.id()));
        }
        if (pick < 72) {
            return edits.mirror(List.of(k.id()));
        }
        if (pick < 78) {
            List<String> ids = new ArrayList<>();
            ids.add(k.id());
            if (!lines.isEmpty() && rnd.nextBoolean()) {
                ids.add(lines.get(rnd.nextInt(lines.size())).id());
            }
            return edits.delete(ids);
        }
        if (pick < 84) {
            List<String> ids = new ArrayList<>();
            for (int n = 1 + rnd.nextInt(3); n > 0; n--) {
                ids.add(comps.get(rnd.nextInt(comps.size())).id());
            }
            lines.forEach(l -> ids.add(l.id()));
            return ids.isEmpty() ? null : edits.duplicate(c, ids).command();
        }
        if (pick < 92 && !k.type().params().isEmpty()) {
            List<ParameterSpec> specs = new ArrayList<>(k.type().params().values());
            ParameterSpec s = specs.get(rnd.nextInt(specs.size()));
            // Sometimes out of range, which the model must refuse without a change.
            double v = s.min() + (s.max() - s.min()) * (rnd.nextDouble() * 1.2 - 0.1);
            return Edits.setParam(k.id(), s.key(), v);
        }
        if (pick < 95) {
            return Edits.setTag(k.id(), k.type().tagPrefix() + (100 + rnd.nextInt(20)));
        }
        if (pick < 98) {
            return Edits.addNote(rnd.nextInt(100), rnd.nextInt(60), "note " + rnd.nextInt(1000));
        }
        if (!lines.isEmpty()) {
            Line l = lines.get(rnd.nextInt(lines.size()));
            return edits.moveSegment(l.id(), rnd.nextInt(Math.max(1, l.bends().size() + 1)), rnd.nextInt(5) - 2);
        }
        return null;
    }
}
