package spoolwork.editor.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

import javax.xml.parsers.DocumentBuilderFactory;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.w3c.dom.Document;

import spoolwork.model.Circuit;
import spoolwork.model.Component;
import spoolwork.model.ComponentType;
import spoolwork.model.Endpoint;
import spoolwork.model.Line;
import spoolwork.model.LineKind;
import spoolwork.model.OperatingState;
import spoolwork.model.io.CircuitFiles;

class RenderCommandTest {

    private static Circuit circuit() {
        Circuit c = Circuit.empty()
                .withComponent(Component.of("c1", "T1", ComponentType.RESERVOIR, 0, 30))
                .withComponent(Component.of("c2", "P1", ComponentType.FIXED_PUMP, 0, 20))
                .withComponent(Component.of("c3", "V1", ComponentType.DIRECTIONAL_4_3, 0, 8));
        c = c.withLine(new Line("l1", Endpoint.port("c1", "S"), Endpoint.port("c2", "S"), List.of(), 0.02, 0.5,
                LineKind.SUCTION, false));
        c = c.withLine(new Line("l2", Endpoint.port("c2", "P"), Endpoint.port("c3", "P"), List.of(), 0.012, 1,
                LineKind.PRESSURE, false));
        return c.withState(OperatingState.named("Raise").withPosition("c3", "a"));
    }

    private record Run(int code, String out, String err) {
    }

    private static Run run(String... args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        int code = Cli.run(args, new PrintWriter(out, true), new PrintWriter(err, true));
        return new Run(code, out.toString(), err.toString());
    }

    @Test
    void drawsEveryComponentAsOneGroup(@TempDir Path dir) throws Exception {
        Path file = dir.resolve("c.spool.json");
        CircuitFiles.save(circuit(), file);
        Path svg = dir.resolve("c.svg");
        Run r = run("render", file.toString(), "-o", svg.toString(), "--state", "Raise");
        assertEquals(0, r.code(), r.err());
        Document d = DocumentBuilderFactory.newInstance().newDocumentBuilder().parse(svg.toFile());
        int symbols = 0;
        var groups = d.getElementsByTagName("g");
        for (int i = 0; i < groups.getLength(); i++) {
            if ("symbol".equals(((org.w3c.dom.Element) groups.item(i)).getAttribute("class"))) {
                symbols++;
            }
        }
        assertEquals(3, symbols);
    }

    @Test
    void unreadableFileAndUnknownStateExitWithTwo(@TempDir Path dir) throws Exception {
        Path bad = dir.resolve("bad.spool.json");
        Files.writeString(bad, "{ nope");
        Run r = run("render", bad.toString(), "-o", dir.resolve("x.svg").toString());
        assertEquals(2, r.code());
        assertTrue(r.err().contains("bad.spool.json: not valid JSON"), r.err());
        assertFalse(Files.exists(dir.resolve("x.svg")));

        Path good = dir.resolve("good.spool.json");
        CircuitFiles.save(circuit(), good);
        r = run("render", good.toString(), "-o", dir.resolve("x.svg").toString(), "--state", "Lower");
        assertEquals(2, r.code());
        assertTrue(r.err().contains("has no operating state 'Lower'; it has [Rest, Raise]"), r.err());
    }
}
