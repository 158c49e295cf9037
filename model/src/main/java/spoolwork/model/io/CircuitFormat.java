package spoolwork.model.io;

import java.io.IOException;
import java.util.ArrayList;
import java.util.Iterator;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;

import com.fasterxml.jackson.core.JsonFactory;
import com.fasterxml.jackson.core.JsonParser;
import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.core.StreamReadConstraints;
import com.fasterxml.jackson.core.StreamReadFeature;
import com.fasterxml.jackson.databind.DeserializationFeature;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import com.fasterxml.jackson.databind.json.JsonMapper;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.JsonNodeFactory;
import com.fasterxml.jackson.databind.node.ObjectNode;

import spoolwork.model.ActuatorState;
import spoolwork.model.Circuit;
import spoolwork.model.Component;
import spoolwork.model.ComponentType;
import spoolwork.model.Endpoint;
import spoolwork.model.Fluid;
import spoolwork.model.Junction;
import spoolwork.model.Line;
import spoolwork.model.LineKind;
import spoolwork.model.ModelException;
import spoolwork.model.Note;
import spoolwork.model.OperatingState;
import spoolwork.model.Point;
import spoolwork.model.TitleBlock;

/**
 * The circuit file format: JSON of our own design, described in model/FORMAT.md. Keys are written in a
 * fixed order and elements refer to each other by id, so that files diff well. Reading walks a plain JSON
 * tree by hand (no polymorphic deserialisation, no class names in the file), so every refusal can name its
 * JSON path; nothing is half-loaded.
 */
public final class CircuitFormat {
    /** The value of the top-level "format" key. */
    public static final String FORMAT_NAME = "spoolwork-circuit";
    /** The version this build writes. */
    public static final int VERSION = 2;
    /** Files larger than this are refused before parsing. */
    public static final long MAX_FILE_BYTES = 32L * 1024 * 1024;
    public static final int MAX_STRING_CHARS = 100_000;
    public static final int MAX_NESTING = 64;
    public static final int MAX_NUMBER_CHARS = 64;
    public static final int MAX_ELEMENTS = 200_000;

    private static final ObjectMapper MAPPER = mapper();

    private CircuitFormat() {
    }

    private static ObjectMapper mapper() {
        JsonFactory f = JsonFactory.builder()
                .streamReadConstraints(StreamReadConstraints.builder()
                        .maxStringLength(MAX_STRING_CHARS)
                        .maxNestingDepth(MAX_NESTING)
                        .maxNumberLength(MAX_NUMBER_CHARS)
                        .maxDocumentLength(MAX_FILE_BYTES)
                        .build())
                .enable(StreamReadFeature.STRICT_DUPLICATE_DETECTION)
                .build();
        return JsonMapper.builder(f)
                .enable(SerializationFeature.INDENT_OUTPUT)
                .enable(DeserializationFeature.FAIL_ON_TRAILING_TOKENS)
                .disable(JsonParser.Feature.ALLOW_NON_NUMERIC_NUMBERS)
                .build();
    }

    // ------------------------------------------------------------------ writing

    /** The circuit as JSON text (UTF-8 when stored), ending in a newline. */
    public static String write(Circuit c) {
        JsonNodeFactory nf = JsonNodeFactory.instance;
        ObjectNode root = nf.objectNode();
        root.put("format", FORMAT_NAME);
        root.put("version", VERSION);
        ObjectNode t = root.putObject("title");
        t.put("title", c.title().title());
        t.put("drawing_number", c.title().drawingNumber());
        t.put("revision", c.title().revision());
        t.put("drawn_by", c.title().drawnBy());
        t.put("date", c.title().date());
        ObjectNode f = root.putObject("fluid");
        f.put("iso_vg", c.fluid().isoVg());
        f.put("viscosity_index", c.fluid().viscosityIndex());
        f.put("temperature_c", c.fluid().temperature());
        f.put("density_kg_m3", c.fluid().density());
        ArrayNode comps = root.putArray("components");
        for (Component k : c.components()) {
            ObjectNode o = comps.addObject();
            o.put("id", k.id());
            o.put("tag", k.tag());
            o.put("type", k.type().key());
            o.put("x", k.x());
            o.put("y", k.y());
            o.put("rotation", k.rotation());
            o.put("mirrored", k.mirrored());
            if (k.ratedPressure() != null) {
                o.put("rated_pressure_pa", k.ratedPressure());
            }
            ObjectNode p = o.putObject("params");
            k.params().forEach(p::put);
            if (!k.options().isEmpty()) {
                ObjectNode op = o.putObject("options");
                k.options().forEach(op::put);
            }
        }
        ArrayNode js = root.putArray("junctions");
        for (Junction j : c.junctions()) {
            ObjectNode o = js.addObject();
            o.put("id", j.id());
            o.put("x", j.x());
            o.put("y", j.y());
        }
        ArrayNode ls = root.putArray("lines");
        for (Line l : c.lines()) {
            ObjectNode o = ls.addObject();
            o.put("id", l.id());
            o.put("kind", l.kind().key());
            endpoint(o.putObject("from"), l.from());
            endpoint(o.putObject("to"), l.to());
            o.put("diameter_m", l.diameter());
            o.put("length_m", l.length());
            o.put("ideal", l.ideal());
            ArrayNode b = o.putArray("bends");
            for (Point pt : l.bends()) {
                b.addArray().add(pt.x()).add(pt.y());
            }
        }
        ArrayNode ns = root.putArray("notes");
        for (Note n : c.notes()) {
            ObjectNode o = ns.addObject();
            o.put("id", n.id());
            o.put("x", n.x());
            o.put("y", n.y());
            o.put("text", n.text());
        }
        ArrayNode ss = root.putArray("states");
        for (OperatingState s : c.states()) {
            ObjectNode o = ss.addObject();
            o.put("name", s.name());
            o.put("description", s.description());
            ObjectNode v = o.putObject("valves");
            s.valvePositions().forEach(v::put);
            ObjectNode a = o.putObject("actuators");
            s.actuators().forEach((id, st) -> {
                ObjectNode ao = a.putObject(id);
                ao.put("mode", st.mode().key());
                ao.put("load_kind", st.loadKind().key());
                ao.put("load", st.load());
            });
            ObjectNode sp = o.putObject("speeds_rev_s");
            s.speeds().forEach(sp::put);
        }
        try {
            return MAPPER.writeValueAsString(root) + "\n";
        } catch (JsonProcessingException e) {
            throw new IllegalStateException("cannot write JSON", e);
        }
    }

    private static void endpoint(ObjectNode o, Endpoint e) {
        if (e instanceof Endpoint.PortRef p) {
            o.put("component", p.componentId());
            o.put("port", p.port());
        } else {
            o.put("junction", ((Endpoint.JunctionRef) e).junctionId());
        }
    }

    // ------------------------------------------------------------------ reading

    /**
     * Reads a circuit from JSON text.
     *
     * @param source names the input in messages, e.g. the file name
     * @throws CircuitFileException naming the place of the first problem
     */
    public static Circuit read(String json, String source) throws CircuitFileException {
        if (json.length() > MAX_FILE_BYTES) {
            throw new CircuitFileException(source, "file larger than " + MAX_FILE_BYTES / (1024 * 1024) + " MiB");
        }
        JsonNode root;
        try {
            root = MAPPER.readTree(json);
        } catch (com.fasterxml.jackson.core.exc.StreamConstraintsException e) {
            throw new CircuitFileException(source, "too large: " + firstLine(e.getOriginalMessage()), e);
        } catch (JsonProcessingException e) {
            String where = e.getLocation() == null ? "" : " at line " + e.getLocation().getLineNr()
                    + ", column " + e.getLocation().getColumnNr();
            throw new CircuitFileException(source, "not valid JSON" + where + ": " + firstLine(e.getOriginalMessage()), e);
        }
        if (root == null || root.isMissingNode()) {
            throw new CircuitFileException(source, "the file is empty");
        }
        try {
            return new Reader(source).circuit(root);
        } catch (ModelException e) {
            throw new CircuitFileException(source + ": " + e.place(), stripPlace(e), e);
        } catch (IllegalArgumentException e) {
            throw new CircuitFileException(source, e.getMessage(), e);
        }
    }

    private static String stripPlace(ModelException e) {
        String m = e.getMessage();
        String prefix = e.place() + ": ";
        return m.startsWith(prefix) ? m.substring(prefix.length()) : m;
    }

    private static String firstLine(String s) {
        if (s == null) {
            return "";
        }
        int nl = s.indexOf('\n');
        return nl < 0 ? s : s.substring(0, nl);
    }

    /** Walks the JSON tree, keeping track of where it is for messages. */
    private static final class Reader {
        private final String source;
        private final Map<String, String> tagOfId = new LinkedHashMap<>();

        Reader(String source) {
            this.source = source;
        }

        private CircuitFileException fail(String path, String message) {
            return new CircuitFileException(source + ": " + path, message);
        }

        Circuit circuit(JsonNode root) throws CircuitFileException {
            if (!root.isObject()) {
                throw fail("$", "expected a JSON object at the top");
            }
            ObjectNode top = (ObjectNode) root;
            String format = text(top, "$", "format");
            if (!FORMAT_NAME.equals(format)) {
                throw fail("$.format", "not a Spoolwork circuit (format is '" + format + "')");
            }
            int version = integer(top, "$", "version", 1, Integer.MAX_VALUE);
            if (version > VERSION) {
                throw fail("$.version", "written by a newer Spoolwork (format version " + version
                        + "); this build reads up to version " + VERSION);
            }
            top = Migration.upgrade(top, version);
            allowOnly(top, "$", "format", "version", "title", "fluid", "components", "junctions", "lines", "notes",
                    "states");
            TitleBlock title = title(object(top, "$", "title"));
            Fluid fluid = fluid(object(top, "$", "fluid"));
            List<Component> comps = new ArrayList<>();
            ArrayNode ca = array(top, "$", "components");
            for (int i = 0; i < ca.size(); i++) {
                comps.add(component(ca.get(i), "$.components[" + i + "]"));
            }
            List<Junction> juncs = new ArrayList<>();
            ArrayNode ja = array(top, "$", "junctions");
            for (int i = 0; i < ja.size(); i++) {
                String p = "$.junctions[" + i + "]";
                ObjectNode o = asObject(ja.get(i), p);
                allowOnly(o, p, "id", "x", "y");
                juncs.add(new Junction(id(o, p), number(o, p, "x"), number(o, p, "y")));
            }
            List<Line> lines = new ArrayList<>();
            ArrayNode la = array(top, "$", "lines");
            for (int i = 0; i < la.size(); i++) {
                lines.add(line(la.get(i), "$.lines[" + i + "]"));
            }
            List<Note> notes = new ArrayList<>();
            ArrayNode na = array(top, "$", "notes");
            for (int i = 0; i < na.size(); i++) {
                String p = "$.notes[" + i + "]";
                ObjectNode o = asObject(na.get(i), p);
                allowOnly(o, p, "id", "x", "y", "text");
                notes.add(new Note(id(o, p), number(o, p, "x"), number(o, p, "y"), text(o, p, "text")));
            }
            List<OperatingState> states = new ArrayList<>();
            ArrayNode sa = array(top, "$", "states");
            for (int i = 0; i < sa.size(); i++) {
                states.add(state(sa.get(i), "$.states[" + i + "]"));
            }
            int total = comps.size() + juncs.size() + lines.size() + notes.size() + states.size();
            if (total > MAX_ELEMENTS) {
                throw fail("$", "too many elements (" + total + "; at most " + MAX_ELEMENTS + ")");
            }
            checkIds(comps, juncs, lines, notes);
            return new Circuit(title, fluid, comps, juncs, lines, notes, states);
        }

        private void checkIds(List<Component> comps, List<Junction> juncs, List<Line> lines, List<Note> notes)
                throws CircuitFileException {
            Set<String> seen = new LinkedHashSet<>();
            for (int i = 0; i < comps.size(); i++) {
                if (!seen.add(comps.get(i).id())) {
                    throw fail("$.components[" + i + "].id", "duplicate id '" + comps.get(i).id() + "'");
                }
            }
            for (int i = 0; i < juncs.size(); i++) {
                if (!seen.add(juncs.get(i).id())) {
                    throw fail("$.junctions[" + i + "].id", "duplicate id '" + juncs.get(i).id() + "'");
                }
            }
            for (int i = 0; i < lines.size(); i++) {
                Line l = lines.get(i);
                if (!seen.add(l.id())) {
                    throw fail("$.lines[" + i + "].id", "duplicate id '" + l.id() + "'");
                }
            }
            for (int i = 0; i < notes.size(); i++) {
                if (!seen.add(notes.get(i).id())) {
                    throw fail("$.notes[" + i + "].id", "duplicate id '" + notes.get(i).id() + "'");
                }
            }
            Map<String, Component> byId = new LinkedHashMap<>();
            comps.forEach(c -> byId.put(c.id(), c));
            Set<String> junctionIds = new LinkedHashSet<>();
            juncs.forEach(j -> junctionIds.add(j.id()));
            for (int i = 0; i < lines.size(); i++) {
                Line l = lines.get(i);
                endpointExists(l.from(), "$.lines[" + i + "].from", byId, junctionIds);
                endpointExists(l.to(), "$.lines[" + i + "].to", byId, junctionIds);
            }
        }

        private void endpointExists(Endpoint e, String p, Map<String, Component> byId, Set<String> junctionIds)
                throws CircuitFileException {
            if (e instanceof Endpoint.PortRef r) {
                Component c = byId.get(r.componentId());
                if (c == null) {
                    throw fail(p + ".component", "no component with id '" + r.componentId() + "'");
                }
                if (c.type().port(r.port()).isEmpty()) {
                    throw fail(p + ".port", c.tag() + " (" + c.type().label() + ") has no port '" + r.port()
                            + "'");
                }
            } else if (!junctionIds.contains(e.ownerId())) {
                throw fail(p + ".junction", "no junction with id '" + e.ownerId() + "'");
            }
        }

        private TitleBlock title(ObjectNode o) throws CircuitFileException {
            String p = "$.title";
            allowOnly(o, p, "title", "drawing_number", "revision", "drawn_by", "date");
            return new TitleBlock(text(o, p, "title"), text(o, p, "drawing_number"), text(o, p, "revision"),
                    text(o, p, "drawn_by"), text(o, p, "date"));
        }

        private Fluid fluid(ObjectNode o) throws CircuitFileException {
            String p = "$.fluid";
            allowOnly(o, p, "iso_vg", "viscosity_index", "temperature_c", "density_kg_m3");
            return new Fluid(ranged(o, p, "iso_vg", Fluid.MIN_VG, Fluid.MAX_VG),
                    ranged(o, p, "viscosity_index", Fluid.MIN_VI, Fluid.MAX_VI),
                    ranged(o, p, "temperature_c", Fluid.MIN_T, Fluid.MAX_T),
                    ranged(o, p, "density_kg_m3", Fluid.MIN_RHO, Fluid.MAX_RHO));
        }

        private Component component(JsonNode n, String p) throws CircuitFileException {
            ObjectNode o = asObject(n, p);
            allowOnly(o, p, "id", "tag", "type", "x", "y", "rotation", "mirrored", "rated_pressure_pa", "params",
                    "options");
            String id = id(o, p);
            String tag = text(o, p, "tag");
            if (tag.isBlank()) {
                throw fail(p + ".tag", "empty tag");
            }
            String where = p + " (" + tag + ")";
            String typeKey = text(o, p, "type");
            ComponentType type = ComponentType.byKey(typeKey).orElseThrow(
                    () -> fail(where + ".type", "unknown component type '" + typeKey + "'"));
            int rotation = integer(o, where, "rotation", 0, 270);
            if (rotation % 90 != 0) {
                throw fail(where + ".rotation", "must be 0, 90, 180 or 270");
            }
            Map<String, Double> params = new LinkedHashMap<>();
            ObjectNode po = object(o, where, "params");
            Iterator<Map.Entry<String, JsonNode>> it = po.fields();
            while (it.hasNext()) {
                Map.Entry<String, JsonNode> e = it.next();
                var spec = type.params().get(e.getKey());
                if (spec == null) {
                    throw fail(where + ".params." + e.getKey(), type.label() + " has no parameter '" + e.getKey()
                            + "'; it has " + type.params().keySet());
                }
                double v = ranged(po, where + ".params", e.getKey(), spec.min(), spec.max());
                params.put(e.getKey(), v);
            }
            Map<String, String> options = new LinkedHashMap<>();
            if (o.has("options")) {
                ObjectNode oo = object(o, where, "options");
                Iterator<Map.Entry<String, JsonNode>> oi = oo.fields();
                while (oi.hasNext()) {
                    Map.Entry<String, JsonNode> e = oi.next();
                    var spec = type.options().get(e.getKey());
                    if (spec == null) {
                        throw fail(where + ".options." + e.getKey(), type.label() + " has no option '" + e.getKey() + "'");
                    }
                    String v = text(oo, where + ".options", e.getKey());
                    if (!spec.choices().contains(v)) {
                        throw fail(where + ".options." + e.getKey(), "'" + v + "' is not one of " + spec.choices());
                    }
                    options.put(e.getKey(), v);
                }
            }
            Double rated = null;
            if (o.has("rated_pressure_pa")) {
                rated = ranged(o, where, "rated_pressure_pa", 1, 5000e5);
            }
            tagOfId.put(id, tag);
            return new Component(id, tag, type, number(o, where, "x"), number(o, where, "y"), rotation,
                    bool(o, where, "mirrored"), params, options, rated);
        }

        private Line line(JsonNode n, String p) throws CircuitFileException {
            ObjectNode o = asObject(n, p);
            allowOnly(o, p, "id", "kind", "from", "to", "diameter_m", "length_m", "ideal", "bends");
            String id = id(o, p);
            String kindKey = text(o, p, "kind");
            LineKind kind = LineKind.byKey(kindKey).orElseThrow(() -> fail(p + ".kind",
                    "unknown line kind '" + kindKey + "'"));
            boolean ideal = bool(o, p, "ideal");
            double d = number(o, p, "diameter_m");
            double len = number(o, p, "length_m");
            if (!ideal && kind != LineKind.SHAFT) {
                if (!(d >= Line.MIN_DIAMETER && d <= Line.MAX_DIAMETER)) {
                    throw fail(p + ".diameter_m", "inner diameter " + d + " m outside " + Line.MIN_DIAMETER + " … "
                            + Line.MAX_DIAMETER + " m");
                }
                if (!(len > 0 && len <= Line.MAX_LENGTH)) {
                    throw fail(p + ".length_m", "length " + len + " m must be above 0 and at most " + Line.MAX_LENGTH);
                }
            }
            List<Point> bends = new ArrayList<>();
            ArrayNode ba = array(o, p, "bends");
            for (int i = 0; i < ba.size(); i++) {
                String bp = p + ".bends[" + i + "]";
                JsonNode b = ba.get(i);
                if (!b.isArray() || b.size() != 2 || !b.get(0).isNumber() || !b.get(1).isNumber()) {
                    throw fail(bp, "expected a pair of numbers [x, y]");
                }
                bends.add(new Point(finite(b.get(0), bp + "[0]"), finite(b.get(1), bp + "[1]")));
            }
            return new Line(id, endpoint(object(o, p, "from"), p + ".from"), endpoint(object(o, p, "to"), p + ".to"),
                    bends, d, len, kind, ideal);
        }

        private Endpoint endpoint(ObjectNode o, String p) throws CircuitFileException {
            if (o.has("junction")) {
                allowOnly(o, p, "junction");
                return Endpoint.junction(text(o, p, "junction"));
            }
            allowOnly(o, p, "component", "port");
            return Endpoint.port(text(o, p, "component"), text(o, p, "port"));
        }

        private OperatingState state(JsonNode n, String p) throws CircuitFileException {
            ObjectNode o = asObject(n, p);
            allowOnly(o, p, "name", "description", "valves", "actuators", "speeds_rev_s");
            String name = text(o, p, "name");
            String where = p + " (" + name + ")";
            Map<String, String> valves = new LinkedHashMap<>();
            ObjectNode vo = object(o, where, "valves");
            Iterator<Map.Entry<String, JsonNode>> it = vo.fields();
            while (it.hasNext()) {
                Map.Entry<String, JsonNode> e = it.next();
                valves.put(known(e.getKey(), where + ".valves"), text(vo, where + ".valves", e.getKey()));
            }
            Map<String, ActuatorState> acts = new LinkedHashMap<>();
            ObjectNode ao = object(o, where, "actuators");
            it = ao.fields();
            while (it.hasNext()) {
                Map.Entry<String, JsonNode> e = it.next();
                String ap = where + ".actuators." + e.getKey();
                known(e.getKey(), where + ".actuators");
                ObjectNode a = asObject(e.getValue(), ap);
                allowOnly(a, ap, "mode", "load_kind", "load");
                String mk = text(a, ap, "mode");
                ActuatorState.Mode mode = ActuatorState.Mode.byKey(mk).orElseThrow(() -> fail(ap + ".mode",
                        "unknown mode '" + mk + "'; expected free, held_retracted or held_extended"));
                String lk = text(a, ap, "load_kind");
                ActuatorState.LoadKind kind = ActuatorState.LoadKind.byKey(lk).orElseThrow(() -> fail(
                        ap + ".load_kind", "unknown load kind '" + lk + "'; expected constant or resistive"));
                acts.put(e.getKey(), new ActuatorState(mode, kind, ranged(a, ap, "load", -1e9, 1e9)));
            }
            Map<String, Double> speeds = new LinkedHashMap<>();
            ObjectNode so = object(o, where, "speeds_rev_s");
            it = so.fields();
            while (it.hasNext()) {
                Map.Entry<String, JsonNode> e = it.next();
                speeds.put(known(e.getKey(), where + ".speeds_rev_s"), ranged(so, where + ".speeds_rev_s", e.getKey(), 0, 100));
            }
            return new OperatingState(name, text(o, p, "description"), valves, acts, speeds);
        }

        private String known(String id, String p) throws CircuitFileException {
            if (!tagOfId.containsKey(id)) {
                throw fail(p + "." + id, "no component with id '" + id + "'");
            }
            return id;
        }

        // -- primitive accessors, each naming the path on failure

        private ObjectNode asObject(JsonNode n, String p) throws CircuitFileException {
            if (n == null || !n.isObject()) {
                throw fail(p, "expected an object");
            }
            return (ObjectNode) n;
        }

        private JsonNode need(ObjectNode o, String p, String key) throws CircuitFileException {
            JsonNode n = o.get(key);
            if (n == null || n.isNull()) {
                throw fail(p + "." + key, "missing");
            }
            return n;
        }

        private ObjectNode object(ObjectNode o, String p, String key) throws CircuitFileException {
            return asObject(need(o, p, key), p + "." + key);
        }

        private ArrayNode array(ObjectNode o, String p, String key) throws CircuitFileException {
            JsonNode n = need(o, p, key);
            if (!n.isArray()) {
                throw fail(p + "." + key, "expected a list");
            }
            return (ArrayNode) n;
        }

        private String text(ObjectNode o, String p, String key) throws CircuitFileException {
            JsonNode n = need(o, p, key);
            if (!n.isTextual()) {
                throw fail(p + "." + key, "expected text, found " + describe(n));
            }
            return n.textValue();
        }

        private String id(ObjectNode o, String p) throws CircuitFileException {
            String id = text(o, p, "id");
            if (id.isEmpty() || id.length() > 64) {
                throw fail(p + ".id", "an id must have 1 to 64 characters");
            }
            return id;
        }

        private boolean bool(ObjectNode o, String p, String key) throws CircuitFileException {
            JsonNode n = need(o, p, key);
            if (!n.isBoolean()) {
                throw fail(p + "." + key, "expected true or false, found " + describe(n));
            }
            return n.booleanValue();
        }

        private double number(ObjectNode o, String p, String key) throws CircuitFileException {
            return finite(need(o, p, key), p + "." + key);
        }

        private double finite(JsonNode n, String p) throws CircuitFileException {
            if (!n.isNumber()) {
                throw fail(p, "expected a number, found " + describe(n));
            }
            double v = n.doubleValue();
            if (!Double.isFinite(v)) {
                throw fail(p, "number out of range");
            }
            return v;
        }

        private double ranged(ObjectNode o, String p, String key, double min, double max) throws CircuitFileException {
            double v = number(o, p, key);
            if (v < min || v > max) {
                throw fail(p + "." + key, "value " + v + " outside " + min + " … " + max);
            }
            return v;
        }

        private int integer(ObjectNode o, String p, String key, int min, int max) throws CircuitFileException {
            JsonNode n = need(o, p, key);
            if (!n.isIntegralNumber() || !n.canConvertToInt()) {
                throw fail(p + "." + key, "expected a whole number, found " + describe(n));
            }
            int v = n.intValue();
            if (v < min || v > max) {
                throw fail(p + "." + key, "value " + v + " outside " + min + " … " + max);
            }
            return v;
        }

        private void allowOnly(ObjectNode o, String p, String... keys) throws CircuitFileException {
            Set<String> allowed = Set.of(keys);
            Iterator<String> it = o.fieldNames();
            while (it.hasNext()) {
                String k = it.next();
                if (!allowed.contains(k)) {
                    throw fail(p + "." + k, "unknown key");
                }
            }
        }

        private static String describe(JsonNode n) {
            if (n.isTextual()) {
                return "text";
            }
            if (n.isNumber()) {
                return "a number";
            }
            if (n.isBoolean()) {
                return "true/false";
            }
            if (n.isArray()) {
                return "a list";
            }
            if (n.isObject()) {
                return "an object";
            }
            return n.getNodeType().toString().toLowerCase(java.util.Locale.ROOT);
        }
    }

    /** For tests and tools: parse JSON into a tree with the same limits as {@link #read}. */
    static JsonNode tree(String json) throws IOException {
        return MAPPER.readTree(json);
    }
}
