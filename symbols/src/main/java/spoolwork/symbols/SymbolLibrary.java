package spoolwork.symbols;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import java.util.concurrent.ConcurrentHashMap;

import spoolwork.model.Component;
import spoolwork.model.ComponentType;
import spoolwork.model.OptionSpec;
import spoolwork.model.PortSpec;
import spoolwork.model.SpoolPosition;

/**
 * The symbol of every component type and variant, about the symbol origin (grid units, y down). Symbols
 * are immutable and cached; place one on the sheet with {@link Symbol#placed(Component)}.
 */
public final class SymbolLibrary {
    private static final Map<String, Symbol> CACHE = new ConcurrentHashMap<>();

    private SymbolLibrary() {
    }

    /** The symbol of a component with its options, a directional valve shown at rest. */
    public static Symbol symbolFor(Component c) {
        return symbolFor(c.type(), c.options(), SpoolPosition.REST);
    }

    /** The symbol of a component, a directional valve shown with the envelope of {@code shownPosition} at its ports. */
    public static Symbol symbolFor(Component c, String shownPosition) {
        return symbolFor(c.type(), c.options(), shownPosition);
    }

    /** The component's symbol placed on the sheet (mirrored, rotated, moved), shown at the given spool position. */
    public static Symbol placed(Component c, String shownPosition) {
        return symbolFor(c, shownPosition).placed(c);
    }

    /**
     * The symbol of a type with the given option choices (missing ones take their defaults; unknown keys or
     * choices are an error). {@code shownPosition} names the spool position drawn at the ports ("a", "0",
     * "b"); null means rest, and other types ignore it.
     *
     * @throws IllegalArgumentException naming the type and the bad option or position
     */
    public static Symbol symbolFor(ComponentType type, Map<String, String> options, String shownPosition) {
        Map<String, String> chosen = resolve(type, options == null ? Map.of() : options);
        String shown = type.isDirectionalValve() ? (shownPosition == null ? SpoolPosition.REST : shownPosition) : null;
        String key = key(type, chosen, shown);
        Symbol s = CACHE.get(key);
        if (s == null) {
            s = draw(type, chosen, shown).build(key);
            s = new Symbol(key, s.shapes(), ordered(type, s), s.bounds(), s.hitAreas());
            CACHE.put(key, s);
        }
        return s;
    }

    /** Every combination of option choices a type has, each map in option declaration order; one empty map for a type without options. */
    public static List<Map<String, String>> variants(ComponentType type) {
        List<Map<String, String>> out = new ArrayList<>();
        out.add(new LinkedHashMap<>());
        for (OptionSpec o : type.options().values()) {
            List<Map<String, String>> next = new ArrayList<>();
            for (Map<String, String> m : out) {
                for (String choice : o.choices()) {
                    Map<String, String> n = new LinkedHashMap<>(m);
                    n.put(o.key(), choice);
                    next.add(n);
                }
            }
            out = next;
        }
        List<Map<String, String>> frozen = new ArrayList<>();
        out.forEach(m -> frozen.add(java.util.Collections.unmodifiableMap(m)));
        return List.copyOf(frozen);
    }

    private static Map<String, String> resolve(ComponentType type, Map<String, String> options) {
        Map<String, String> out = new TreeMap<>();
        for (Map.Entry<String, String> e : options.entrySet()) {
            OptionSpec o = type.options().get(e.getKey());
            if (o == null) {
                throw new IllegalArgumentException(type.key() + " has no option " + e.getKey());
            }
            if (!o.choices().contains(e.getValue())) {
                throw new IllegalArgumentException(type.key() + " option " + e.getKey() + " has no choice '"
                        + e.getValue() + "'; choices are " + o.choices());
            }
        }
        for (OptionSpec o : type.options().values()) {
            out.put(o.key(), options.getOrDefault(o.key(), o.defaultChoice()));
        }
        return out;
    }

    private static String key(ComponentType type, Map<String, String> chosen, String shown) {
        StringBuilder b = new StringBuilder(type.key());
        if (!chosen.isEmpty()) {
            b.append('[');
            boolean first = true;
            for (Map.Entry<String, String> e : chosen.entrySet()) {
                b.append(first ? "" : ",").append(e.getKey()).append('=').append(e.getValue());
                first = false;
            }
            b.append(']');
        }
        if (shown != null) {
            b.append('@').append(shown);
        }
        return b.toString();
    }

    private static List<Anchor> ordered(ComponentType type, Symbol s) {
        List<Anchor> out = new ArrayList<>();
        for (PortSpec p : type.ports()) {
            List<Anchor> found = s.anchors().stream().filter(a -> a.port().equals(p.name())).toList();
            if (found.size() != 1) {
                throw new IllegalStateException(s.key() + " draws " + found.size() + " anchors for port " + p.name());
            }
            out.add(found.get(0));
        }
        if (out.size() != s.anchors().size()) {
            throw new IllegalStateException(s.key() + " draws anchors for ports the type does not have");
        }
        return out;
    }

    private static Draw draw(ComponentType type, Map<String, String> o, String shown) {
        switch (type) {
            case RESERVOIR:
                return ConditioningSymbols.reservoir();
            case PRIME_MOVER:
                return RotatingSymbols.primeMover(o);
            case FIXED_PUMP:
                return RotatingSymbols.fixedPump();
            case COMPENSATED_PUMP:
                return RotatingSymbols.compensatedPump();
            case HYDRAULIC_MOTOR:
                return RotatingSymbols.motor(o);
            case DOUBLE_ACTING_CYLINDER:
                return ConditioningSymbols.doubleActing();
            case SINGLE_ACTING_CYLINDER:
                return ConditioningSymbols.singleActing(o);
            case DOUBLE_ROD_CYLINDER:
                return ConditioningSymbols.doubleRod();
            case RELIEF_VALVE:
                return PressureValveSymbols.relief();
            case REDUCING_VALVE:
                return PressureValveSymbols.reducing();
            case SEQUENCE_VALVE:
                return PressureValveSymbols.sequence();
            case COUNTERBALANCE_VALVE:
                return PressureValveSymbols.counterbalance();
            case CHECK_VALVE:
                return CheckSymbols.check();
            case PILOT_CHECK_VALVE:
                return CheckSymbols.pilotCheck();
            case ORIFICE:
                return CheckSymbols.orifice();
            case THROTTLE:
                return CheckSymbols.throttle();
            case FLOW_CONTROL:
                return CheckSymbols.flowControl();
            case DIRECTIONAL_2_2:
            case DIRECTIONAL_3_2:
            case DIRECTIONAL_4_2:
            case DIRECTIONAL_4_3:
                return DirectionalValveSymbols.valve(type, o, shown);
            case ACCUMULATOR:
                return ConditioningSymbols.accumulator();
            case FILTER:
                return ConditioningSymbols.filter();
            case COOLER:
                return ConditioningSymbols.cooler();
            case PRESSURE_GAUGE:
                return ConditioningSymbols.gauge();
            case FLOW_METER:
                return ConditioningSymbols.flowMeter();
            case PLUG:
                return ConditioningSymbols.plug();
            default:
                throw new IllegalArgumentException("no symbol for component type " + type.key());
        }
    }
}
