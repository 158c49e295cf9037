package spoolwork.symbols;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayInputStream;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;

import javax.xml.parsers.DocumentBuilderFactory;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.w3c.dom.Document;
import org.w3c.dom.Element;
import org.w3c.dom.NodeList;

import spoolwork.model.ComponentType;

class SvgWriterTest {
    /** Set -Dspoolwork.golden.update=true to rewrite the golden files after an intended change of a drawing. */
    private static final boolean UPDATE = Boolean.getBoolean("spoolwork.golden.update");

    static Document parse(String svg) throws Exception {
        DocumentBuilderFactory f = DocumentBuilderFactory.newInstance();
        f.setNamespaceAware(true);
        return f.newDocumentBuilder().parse(new ByteArrayInputStream(svg.getBytes(StandardCharsets.UTF_8)));
    }

    @Test
    void sheetParsesWithOneGroupPerSymbol() throws Exception {
        List<SvgWriter.Entry> entries = SymbolSheet.entries();
        Document doc = parse(SvgWriter.sheet(entries, "Review & check <all>"));
        assertEquals("svg", doc.getDocumentElement().getLocalName());
        NodeList groups = doc.getElementsByTagNameNS("http://www.w3.org/2000/svg", "g");
        int symbols = 0;
        Set<String> keys = new HashSet<>();
        for (int i = 0; i < groups.getLength(); i++) {
            Element g = (Element) groups.item(i);
            if ("symbol".equals(g.getAttribute("class"))) {
                symbols++;
                keys.add(g.getAttribute("data-key"));
            }
        }
        assertEquals(entries.size(), symbols);
        assertEquals(entries.size(), keys.size(), "no symbol drawn twice");
        for (ComponentType t : ComponentType.values()) {
            for (Map<String, String> v : SymbolLibrary.variants(t)) {
                assertTrue(keys.contains(SymbolLibrary.symbolFor(t, v, null).key()), "sheet lacks " + t.key() + " " + v);
            }
        }
    }

    @Test
    void sheetEntriesDoNotOverlap() {
        List<SvgWriter.Entry> e = SymbolSheet.entries();
        for (int i = 0; i < e.size(); i++) {
            for (int j = i + 1; j < e.size(); j++) {
                Box a = e.get(i).symbol().bounds();
                Box b = e.get(j).symbol().bounds();
                boolean overlap = a.minX() < b.maxX() && b.minX() < a.maxX() && a.minY() < b.maxY() && b.minY() < a.maxY();
                assertTrue(!overlap, e.get(i).symbol().key() + " overlaps " + e.get(j).symbol().key());
            }
        }
    }

    @Test
    void portLettersAreWrittenForFluidPortsOnly() throws Exception {
        Document doc = parse(SvgWriter.symbol(SymbolLibrary.symbolFor(ComponentType.FIXED_PUMP, Map.of(), null)));
        NodeList texts = doc.getElementsByTagNameNS("http://www.w3.org/2000/svg", "text");
        Set<String> letters = new HashSet<>();
        for (int i = 0; i < texts.getLength(); i++) {
            Element t = (Element) texts.item(i);
            if ("port".equals(t.getAttribute("class"))) {
                letters.add(t.getTextContent());
            }
        }
        assertEquals(Set.of("P", "S"), letters);
    }

    @Test
    void numbersAreShortAndLocaleFree() {
        assertEquals("0", SvgWriter.n(-0.0001));
        assertEquals("1.5", SvgWriter.n(1.5));
        assertEquals("-2", SvgWriter.n(-2.0));
        assertEquals("0.333", SvgWriter.n(1.0 / 3));
    }

    @Test
    void goldenTurnedAndMirroredSymbol() throws IOException {
        Symbol s = SymbolLibrary.symbolFor(ComponentType.PILOT_CHECK_VALVE, Map.of(), null)
                .transformed(new Transform(90, true, 0, 0));
        compareWithGolden("pilot_check_valve-r90m.svg", SvgWriter.symbol(s));
    }

    private static void compareWithGolden(String name, String svg) throws IOException {
        Path golden = Path.of("src/test/resources/golden", name);
        if (UPDATE) {
            Files.writeString(golden, svg, StandardCharsets.UTF_8);
        }
        assertTrue(Files.exists(golden), "missing golden file " + golden + "; run with -Dspoolwork.golden.update=true");
        assertEquals(Files.readString(golden, StandardCharsets.UTF_8), svg,
                "the drawing of " + name + " changed; if intended, rerun with -Dspoolwork.golden.update=true and review the diff");
    }

    @ParameterizedTest(name = "{0}")
    @CsvSource({
        "relief_valve,,",
        "fixed_pump,,",
        "check_valve,,",
        "directional_4_3,centre=tandem,b",
        "compensated_pump,,",
    })
    void goldenSymbols(String key, String options, String shown) throws IOException {
        ComponentType t = ComponentType.byKey(key).orElseThrow();
        Map<String, String> o = new java.util.TreeMap<>();
        if (options != null) {
            for (String kv : options.split(";")) {
                String[] p = kv.split("=");
                o.put(p[0], p[1]);
            }
        }
        String svg = SvgWriter.symbol(SymbolLibrary.symbolFor(t, o, shown));
        compareWithGolden(key + (shown == null ? "" : "-" + shown) + ".svg", svg);
    }
}
