package spoolwork.model.io;

import java.util.Iterator;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.node.ObjectNode;

/**
 * Upgrades the JSON tree of an older format version, one version at a time, before it is read.
 *
 * <p>Version 1 (the first pre-release layout) stored the fluid temperature in kelvin as
 * {@code fluid.temperature_k} and had no {@code kind} on lines; version 2 stores °C as
 * {@code fluid.temperature_c} and gives every line a kind (version-1 lines become pressure lines).
 */
final class Migration {
    private Migration() {
    }

    /** Returns the tree upgraded to {@link CircuitFormat#VERSION}; the input is not changed. */
    static ObjectNode upgrade(ObjectNode root, int version) {
        ObjectNode t = root.deepCopy();
        if (version < 2) {
            t = from1to2(t);
        }
        t.put("version", CircuitFormat.VERSION);
        return t;
    }

    private static ObjectNode from1to2(ObjectNode t) {
        JsonNode fluid = t.get("fluid");
        if (fluid instanceof ObjectNode f && f.has("temperature_k")) {
            JsonNode k = f.remove("temperature_k");
            if (k.isNumber()) {
                f.put("temperature_c", k.doubleValue() - 273.15);
            } else {
                f.set("temperature_c", k);
            }
        }
        JsonNode lines = t.get("lines");
        if (lines != null && lines.isArray()) {
            Iterator<JsonNode> it = lines.elements();
            while (it.hasNext()) {
                JsonNode l = it.next();
                if (l instanceof ObjectNode lo && !lo.has("kind")) {
                    lo.put("kind", "pressure");
                }
            }
        }
        return t;
    }
}
