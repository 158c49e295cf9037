package spoolwork.model;

import java.util.LinkedHashMap;
import java.util.Map;
import java.util.Objects;
import java.util.TreeMap;

/**
 * A placed component.
 *
 * @param id            stable identity used by lines and states (never shown, never changes)
 * @param tag           the user's label, unique in a circuit, e.g. "P1"
 * @param x             position of the symbol origin on the sheet, grid units
 * @param y             position of the symbol origin on the sheet, grid units (down is positive)
 * @param rotation      clockwise rotation in degrees: 0, 90, 180 or 270
 * @param mirrored      mirrored about the symbol's vertical axis before rotation
 * @param params        numeric parameters by key, SI; every key the type declares is present
 * @param options       option choices by key; every key the type declares is present
 * @param ratedPressure maximum rated pressure, Pa, or {@code null} when not given
 */
public record Component(String id, String tag, ComponentType type, double x, double y, int rotation,
                        boolean mirrored, Map<String, Double> params, Map<String, String> options,
                        Double ratedPressure) {
    public Component {
        Objects.requireNonNull(id);
        Objects.requireNonNull(tag);
        Objects.requireNonNull(type);
        if (rotation % 90 != 0) {
            throw new IllegalArgumentException("rotation must be a multiple of 90°: " + rotation);
        }
        rotation = ((rotation % 360) + 360) % 360;
        Map<String, Double> p = new LinkedHashMap<>();
        for (String k : type.params().keySet()) {
            Double v = params.get(k);
            p.put(k, v != null ? v : type.params().get(k).defaultValue());
        }
        for (String k : new TreeMap<>(params).keySet()) {
            if (!p.containsKey(k)) {
                throw new IllegalArgumentException(type.key() + " has no parameter " + k);
            }
        }
        Map<String, String> o = new LinkedHashMap<>();
        for (String k : type.options().keySet()) {
            String v = options.get(k);
            o.put(k, v != null ? v : type.options().get(k).defaultChoice());
        }
        for (String k : new TreeMap<>(options).keySet()) {
            if (!o.containsKey(k)) {
                throw new IllegalArgumentException(type.key() + " has no option " + k);
            }
        }
        // read by key many times per solve: a few keys scanned beat two wrappers and a hash table
        params = new SmallMap<>(p);
        options = new SmallMap<>(o);
    }

    /**
     * A new component, unrotated. Settings are key/value pairs, a number for a parameter (SI) and a string
     * for an option, e.g. {@code of("c1", "V1", RELIEF_VALVE, 0, 0, "cracking_pressure", 150e5)}; every
     * parameter and option not given takes its default.
     */
    public static Component of(String id, String tag, ComponentType type, double x, double y, Object... settings) {
        if (settings.length % 2 != 0) {
            throw new IllegalArgumentException("settings of " + tag + " must come in key/value pairs");
        }
        Map<String, Double> p = new LinkedHashMap<>();
        Map<String, String> o = new LinkedHashMap<>();
        for (int i = 0; i < settings.length; i += 2) {
            if (!(settings[i] instanceof String key)) {
                throw new IllegalArgumentException("setting " + i / 2 + " of " + tag + " has no key");
            }
            Object v = settings[i + 1];
            if (v instanceof Number n) {
                p.put(key, n.doubleValue());
            } else if (v instanceof String choice) {
                o.put(key, choice);
            } else {
                throw new IllegalArgumentException("setting " + key + " of " + tag
                        + " must be a number (parameter) or a string (option)");
            }
        }
        return new Component(id, tag, type, x, y, 0, false, p, o, null);
    }

    public double param(String key) {
        Double v = params.get(key);
        if (v == null) {
            throw new IllegalArgumentException(type.key() + " has no parameter " + key);
        }
        return v;
    }

    public String option(String key) {
        String v = options.get(key);
        if (v == null) {
            throw new IllegalArgumentException(type.key() + " has no option " + key);
        }
        return v;
    }

    public Component withParam(String key, double value) {
        Map<String, Double> p = new LinkedHashMap<>(params);
        p.put(key, value);
        return new Component(id, tag, type, x, y, rotation, mirrored, p, options, ratedPressure);
    }

    public Component withOption(String key, String value) {
        Map<String, String> o = new LinkedHashMap<>(options);
        o.put(key, value);
        return new Component(id, tag, type, x, y, rotation, mirrored, params, o, ratedPressure);
    }

    public Component withTag(String newTag) {
        return new Component(id, newTag, type, x, y, rotation, mirrored, params, options, ratedPressure);
    }

    public Component at(double nx, double ny) {
        return new Component(id, tag, type, nx, ny, rotation, mirrored, params, options, ratedPressure);
    }

    public Component withRotation(int r) {
        return new Component(id, tag, type, x, y, r, mirrored, params, options, ratedPressure);
    }

    public Component withMirrored(boolean m) {
        return new Component(id, tag, type, x, y, rotation, m, params, options, ratedPressure);
    }

    public Component withRatedPressure(Double p) {
        return new Component(id, tag, type, x, y, rotation, mirrored, params, options, p);
    }

    public Component withId(String newId) {
        return new Component(newId, tag, type, x, y, rotation, mirrored, params, options, ratedPressure);
    }
}
