package spoolwork.model.io;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;

import org.junit.jupiter.api.Test;

import spoolwork.model.Circuit;

/** The example in FORMAT.md is a real file of the current version. */
class FormatDocTest {

    @Test
    void theDocumentedExampleLoadsAndIsWrittenTheSameWay() throws Exception {
        String doc = Files.readString(Path.of("FORMAT.md"));
        int start = doc.indexOf("```json\n");
        int end = doc.indexOf("```", start + 8);
        assertTrue(start >= 0 && end > start, "FORMAT.md has a json example");
        String json = doc.substring(start + 8, end);
        Circuit c = CircuitFormat.read(json, "FORMAT.md");
        assertEquals(3, c.components().size());
        assertEquals(json, CircuitFormat.write(c));
    }
}
