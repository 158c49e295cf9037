package spoolwork.model.io;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.function.Consumer;

import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import spoolwork.model.Circuit;
import spoolwork.model.Component;
import spoolwork.model.ComponentType;
import spoolwork.model.Endpoint;
import spoolwork.model.Line;
import spoolwork.model.LineKind;

/** Every kind of bad input is refused with a message naming the place; nothing half-loads. */
class BadInputTest {
    private static final ObjectMapper M = new ObjectMapper();

    private static Circuit sample() {
        Circuit c = Circuit.empty();
        c = c.withComponent(Component.of("c1", "P1", ComponentType.FIXED_PUMP, 0, 20));
        c = c.withComponent(Component.of("c2", "V1", ComponentType.RELIEF_VALVE, 10, 10));
        c = c.withComponent(Component.of("c3", "T1", ComponentType.RESERVOIR, 0, 30));
        c = c.withLine(new Line("l1", Endpoint.port("c1", "P"), Endpoint.port("c2", "P"), List.of(), 0.012, 1,
                LineKind.PRESSURE, false));
        c = c.withLine(new Line("l2", Endpoint.port("c3", "S"), Endpoint.port("c1", "S"), List.of(), 0.02, 0.5,
                LineKind.SUCTION, false));
        return c;
    }

    private static String mutate(Consumer<ObjectNode> change) throws Exception {
        ObjectNode root = (ObjectNode) M.readTree(CircuitFormat.write(sample()));
        change.accept(root);
        return M.writeValueAsString(root);
    }

    private static String refused(String json) {
        CircuitFileException e = assertThrows(CircuitFileException.class, () -> CircuitFormat.read(json, "test.spool.json"));
        assertTrue(e.getMessage().startsWith("test.spool.json"), e.getMessage());
        return e.getMessage();
    }

    private static ObjectNode component(ObjectNode root, int i) {
        return (ObjectNode) root.get("components").get(i);
    }

    @Test
    void sampleItselfLoads() throws Exception {
        assertEquals(sample(), CircuitFormat.read(mutate(r -> { }), "x"));
    }

    @Test
    void malformedJsonNamesLineAndColumn() {
        String m = refused("{\"format\": \"spoolwork-circuit\",\n \"version\": 2,,}");
        assertTrue(m.contains("not valid JSON at line 2"), m);
    }

    @Test
    void emptyAndNonObjectInputs() {
        assertTrue(refused("").contains("empty"));
        assertTrue(refused("[1,2]").contains("expected a JSON object"));
        assertTrue(refused("{\"format\":\"something-else\",\"version\":1}").contains("not a Spoolwork circuit"));
    }

    @Test
    void wrongTypesNameTheJsonPath() throws Exception {
        String m = refused(mutate(r -> component(r, 0).put("x", "ten")));
        assertEquals("test.spool.json: $.components[0] (P1).x: expected a number, found text", m);
        m = refused(mutate(r -> r.put("lines", "none")));
        assertTrue(m.contains("$.lines: expected a list"), m);
        m = refused(mutate(r -> component(r, 1).put("mirrored", 1)));
        assertTrue(m.contains("$.components[1] (V1).mirrored: expected true or false"), m);
    }

    @Test
    void unknownComponentType() throws Exception {
        String m = refused(mutate(r -> component(r, 1).put("type", "java.lang.Runtime")));
        assertTrue(m.contains("$.components[1] (V1).type: unknown component type 'java.lang.Runtime'"), m);
    }

    @Test
    void unknownKeysAndParametersAreRefused() throws Exception {
        assertTrue(refused(mutate(r -> component(r, 0).put("colour", "red")))
                .contains("$.components[0].colour: unknown key"));
        String m = refused(mutate(r -> ((ObjectNode) component(r, 0).get("params")).put("bore", 0.05)));
        assertTrue(m.contains("(P1).params.bore") && m.contains("has no parameter 'bore'"), m);
    }

    @Test
    void danglingReferences() throws Exception {
        String m = refused(mutate(r -> ((ObjectNode) r.get("lines").get(0).get("to")).put("component", "c99")));
        assertTrue(m.contains("$.lines[0].to.component: no component with id 'c99'"), m);
        m = refused(mutate(r -> ((ObjectNode) r.get("lines").get(0).get("to")).put("port", "Q")));
        assertTrue(m.contains("$.lines[0].to.port: V1 (Relief valve, direct) has no port 'Q'"), m);
        m = refused(mutate(r -> {
            ObjectNode to = (ObjectNode) r.get("lines").get(0).get("to");
            to.removeAll();
            to.put("junction", "j7");
        }));
        assertTrue(m.contains("$.lines[0].to.junction: no junction with id 'j7'"), m);
        m = refused(mutate(r -> ((ObjectNode) r.get("states").get(0).get("valves")).put("c42", "a")));
        assertTrue(m.contains("$.states[0] (Rest).valves.c42: no component with id 'c42'"), m);
    }

    @Test
    void duplicateIdsAndTags() throws Exception {
        String m = refused(mutate(r -> component(r, 1).put("id", "c1")));
        assertTrue(m.contains("$.components[1].id: duplicate id 'c1'"), m);
        m = refused(mutate(r -> ((ObjectNode) r.get("lines").get(1)).put("id", "c2")));
        assertTrue(m.contains("$.lines[1].id: duplicate id 'c2'"), m);
        m = refused(mutate(r -> component(r, 1).put("tag", "P1")));
        assertTrue(m.contains("P1: duplicate tag"), m);
    }

    @Test
    void duplicateJsonKeys() {
        String m = refused("{\"format\":\"spoolwork-circuit\",\"format\":\"spoolwork-circuit\",\"version\":2}");
        assertTrue(m.contains("Duplicate field 'format'"), m);
    }

    @Test
    void valuesOutOfRange() throws Exception {
        String m = refused(mutate(r -> ((ObjectNode) component(r, 1).get("params")).put("cracking_pressure", -5)));
        assertTrue(m.contains("$.components[1] (V1).params.cracking_pressure: value -5.0 outside"), m);
        m = refused(mutate(r -> ((ObjectNode) r.get("lines").get(0)).put("diameter_m", 0)));
        assertTrue(m.contains("$.lines[0].diameter_m: inner diameter 0.0 m outside"), m);
        m = refused(mutate(r -> component(r, 0).put("rotation", 45)));
        assertTrue(m.contains("(P1).rotation: must be 0, 90, 180 or 270"), m);
        m = refused(mutate(r -> ((ObjectNode) r.get("fluid")).put("temperature_c", 900)));
        assertTrue(m.contains("$.fluid.temperature_c: value 900.0 outside"), m);
    }

    @Test
    void nanAndInfinityAreRefused() throws Exception {
        String json = mutate(r -> { }).replaceFirst("\"x\":0\\.0", "\"x\":NaN");
        assertTrue(refused(json).contains("not valid JSON"), "NaN is not JSON");
        json = mutate(r -> { }).replaceFirst("\"x\":0\\.0", "\"x\":Infinity");
        assertTrue(refused(json).contains("not valid JSON"));
        json = mutate(r -> { }).replaceFirst("\"x\":0\\.0", "\"x\":1e999");
        assertTrue(refused(json).contains("$.components[0] (P1).x: number out of range"), refused(json));
    }

    @Test
    void newerFormatVersionIsRefused() throws Exception {
        String m = refused(mutate(r -> r.put("version", 99)));
        assertTrue(m.contains("$.version: written by a newer Spoolwork (format version 99)"), m);
    }

    @Test
    void tooLargeStringsAndNestingAreRefused() throws Exception {
        String longText = "x".repeat(CircuitFormat.MAX_STRING_CHARS + 10);
        String m = refused(mutate(r -> ((ObjectNode) r.get("title")).put("title", longText)));
        assertTrue(m.contains("too large"), m);
        String deep = "{\"a\":".repeat(200) + "1" + "}".repeat(200);
        assertTrue(refused(deep).contains("too large"));
        String manyDigits = mutate(r -> { }).replaceFirst("\"x\":0\\.0", "\"x\":1" + "0".repeat(200));
        assertTrue(refused(manyDigits).contains("too large"));
    }

    @Test
    void tooLargeFilesAreRefusedBeforeReading(@TempDir Path dir) throws Exception {
        Path big = dir.resolve("big.spool.json");
        byte[] chunk = " ".repeat(1 << 20).getBytes(StandardCharsets.US_ASCII);
        try (var out = Files.newOutputStream(big)) {
            for (int i = 0; i <= CircuitFormat.MAX_FILE_BYTES / chunk.length; i++) {
                out.write(chunk);
            }
        }
        CircuitFileException e = assertThrows(CircuitFileException.class, () -> CircuitFiles.load(big));
        assertTrue(e.getMessage().startsWith("big.spool.json: file of"), e.getMessage());
    }

    @Test
    void missingFileAndNonUtf8(@TempDir Path dir) throws Exception {
        CircuitFileException e = assertThrows(CircuitFileException.class,
                () -> CircuitFiles.load(dir.resolve("gone.spool.json")));
        assertEquals("gone.spool.json: no such file", e.getMessage());
        Path bin = dir.resolve("bin.spool.json");
        Files.write(bin, new byte[] {(byte) 0xff, (byte) 0xfe, 0x00, 0x41});
        e = assertThrows(CircuitFileException.class, () -> CircuitFiles.load(bin));
        assertEquals("bin.spool.json: not UTF-8 text", e.getMessage());
    }

    @Test
    void invalidStateReferencesNameTheState() throws Exception {
        String m = refused(mutate(r -> ((ObjectNode) r.get("states").get(0).get("valves")).put("c2", "a")));
        assertTrue(m.contains("state Rest: V1 is not a directional valve"), m);
        m = refused(mutate(r -> {
            ObjectNode a = ((ObjectNode) r.get("states").get(0).get("actuators")).putObject("c1");
            a.put("mode", "sideways");
            a.put("load_kind", "constant");
            a.put("load", 0);
        }));
        assertTrue(m.contains("$.states[0] (Rest).actuators.c1.mode: unknown mode 'sideways'"), m);
    }

    @Test
    void versionOneFilesAreMigrated() throws Exception {
        String v1 = mutate(r -> {
            r.put("version", 1);
            ObjectNode f = (ObjectNode) r.get("fluid");
            f.remove("temperature_c");
            f.put("temperature_k", 323.15);
            for (var l : (ArrayNode) r.get("lines")) {
                ((ObjectNode) l).remove("kind");
            }
        });
        Circuit c = CircuitFormat.read(v1, "old.spool.json");
        assertEquals(50.0, c.fluid().temperature(), 1e-9);
        c.lines().forEach(l -> assertEquals(LineKind.PRESSURE, l.kind()));
    }
}
