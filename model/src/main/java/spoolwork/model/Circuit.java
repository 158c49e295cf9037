package spoolwork.model;

import java.util.ArrayList;
import java.util.Collection;
import java.util.Collections;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.Optional;
import java.util.Set;
import java.util.function.UnaryOperator;

/**
 * The circuit document: an immutable value. Every change returns a new circuit, which makes undo a matter
 * of keeping the old value and makes "equal" mean "same drawing, same data".
 *
 * <p>A circuit is always consistent: the constructor refuses duplicate ids or tags, lines whose ends name
 * a missing component, port or junction, values outside their declared ranges, NaN or infinities, and
 * operating states that refer to missing or unsuitable components. The refusal is a {@link ModelException}
 * naming the place.
 */
public final class Circuit {
    private final TitleBlock title;
    private final Fluid fluid;
    private final Map<String, Component> components;
    private final Map<String, Junction> junctions;
    private final Map<String, Line> lines;
    private final Map<String, Note> notes;
    private final List<OperatingState> states;
    /** The same components, junctions and lines in drawing order as lists, which iterate faster than maps. */
    private final List<Component> componentList;
    private final List<Junction> junctionList;
    private final List<Line> lineList;

    public Circuit(TitleBlock title, Fluid fluid, Collection<Component> components, Collection<Junction> junctions,
                   Collection<Line> lines, Collection<Note> notes, List<OperatingState> states) {
        this.title = Objects.requireNonNull(title);
        this.fluid = Objects.requireNonNull(fluid);
        Set<String> ids = new HashSet<>();
        this.components = index(components, Component::id, ids);
        this.junctions = index(junctions, Junction::id, ids);
        this.lines = index(lines, Line::id, ids);
        this.notes = index(notes, Note::id, ids);
        this.componentList = List.copyOf(this.components.values());
        this.junctionList = List.copyOf(this.junctions.values());
        this.lineList = List.copyOf(this.lines.values());
        this.states = List.copyOf(states);
        check();
    }

    public static Circuit empty() {
        return new Circuit(TitleBlock.empty(), Fluid.standard(), List.of(), List.of(), List.of(), List.of(),
                List.of(OperatingState.named("Rest")));
    }

    private static <T> Map<String, T> index(Collection<T> items, java.util.function.Function<T, String> id,
                                            Set<String> seen) {
        Map<String, T> m = new LinkedHashMap<>();
        for (T t : items) {
            String k = id.apply(t);
            if (k.isEmpty()) {
                throw new ModelException("id", "empty id");
            }
            if (!seen.add(k)) {
                throw new ModelException(k, "duplicate id");
            }
            m.put(k, t);
        }
        return Collections.unmodifiableMap(m);
    }

    private void check() {
        checkFluid();
        Set<String> tags = new HashSet<>();
        for (Component c : components.values()) {
            String place = c.tag().isBlank() ? c.id() : c.tag();
            if (c.tag().isBlank()) {
                throw new ModelException(c.id(), "component has no tag");
            }
            if (!tags.add(c.tag())) {
                throw new ModelException(c.tag(), "duplicate tag");
            }
            finite(place + " position", c.x());
            finite(place + " position", c.y());
            for (Map.Entry<String, Double> e : c.params().entrySet()) {
                ParameterSpec spec = c.type().params().get(e.getKey());
                double v = e.getValue();
                if (!spec.accepts(v)) {
                    throw new ModelException(place + "." + e.getKey(), "value " + v + " " + spec.quantity().siSymbol()
                            + " outside " + spec.min() + " … " + spec.max());
                }
            }
            for (Map.Entry<String, String> e : c.options().entrySet()) {
                if (!c.type().options().get(e.getKey()).choices().contains(e.getValue())) {
                    throw new ModelException(place + "." + e.getKey(), "unknown choice '" + e.getValue() + "', expected one of "
                            + c.type().options().get(e.getKey()).choices());
                }
            }
            if (c.ratedPressure() != null && !(Double.isFinite(c.ratedPressure()) && c.ratedPressure() > 0
                    && c.ratedPressure() <= 5000e5)) {
                throw new ModelException(place + ".rated_pressure", "must be a positive pressure up to 5000 bar");
            }
            if (c.type().params().containsKey("rod") && c.type().params().containsKey("bore")
                    && c.param("rod") >= c.param("bore")) {
                throw new ModelException(place + ".rod", "rod diameter must be smaller than the bore");
            }
        }
        for (Junction j : junctions.values()) {
            finite(j.id() + " position", j.x());
            finite(j.id() + " position", j.y());
        }
        for (Note n : notes.values()) {
            finite(n.id() + " position", n.x());
            finite(n.id() + " position", n.y());
            if (n.text().length() > Note.MAX_TEXT) {
                throw new ModelException(n.id(), "note text longer than " + Note.MAX_TEXT + " characters");
            }
        }
        for (Line l : lines.values()) {
            checkLine(l);
        }
        Set<String> names = new HashSet<>();
        for (OperatingState s : states) {
            if (s.name().isBlank()) {
                throw new ModelException("state", "operating state without a name");
            }
            if (!names.add(s.name())) {
                throw new ModelException("state " + s.name(), "duplicate operating state name");
            }
            checkState(s);
        }
    }

    private void checkFluid() {
        range("fluid.iso_vg", fluid.isoVg(), Fluid.MIN_VG, Fluid.MAX_VG);
        range("fluid.viscosity_index", fluid.viscosityIndex(), Fluid.MIN_VI, Fluid.MAX_VI);
        range("fluid.temperature", fluid.temperature(), Fluid.MIN_T, Fluid.MAX_T);
        range("fluid.density", fluid.density(), Fluid.MIN_RHO, Fluid.MAX_RHO);
    }

    private void checkLine(Line l) {
        boolean fromShaft = endpointIsShaft(l, l.from());
        boolean toShaft = endpointIsShaft(l, l.to());
        if (l.from().equals(l.to())) {
            throw new ModelException(l.id(), "line starts and ends at the same place");
        }
        if (fromShaft != toShaft) {
            throw new ModelException(l.id(), "a shaft can only be coupled to another shaft");
        }
        if (fromShaft != (l.kind() == LineKind.SHAFT)) {
            throw new ModelException(l.id(), fromShaft ? "a shaft coupling must be of kind shaft"
                    : "a line of kind shaft must join two shafts");
        }
        if (!l.ideal() && l.kind() != LineKind.SHAFT) {
            range(l.id() + ".diameter", l.diameter(), Line.MIN_DIAMETER, Line.MAX_DIAMETER);
            if (!(Double.isFinite(l.length()) && l.length() > 0 && l.length() <= Line.MAX_LENGTH)) {
                throw new ModelException(l.id() + ".length", "length must be above 0 and at most " + Line.MAX_LENGTH + " m");
            }
        } else {
            finite(l.id() + ".diameter", l.diameter());
            finite(l.id() + ".length", l.length());
        }
        for (Point p : l.bends()) {
            finite(l.id() + " bend", p.x());
            finite(l.id() + " bend", p.y());
        }
    }

    private boolean endpointIsShaft(Line l, Endpoint e) {
        if (e instanceof Endpoint.JunctionRef j) {
            if (!junctions.containsKey(j.junctionId())) {
                throw new ModelException(l.id(), "ends at missing junction " + j.junctionId());
            }
            return false;
        }
        Endpoint.PortRef p = (Endpoint.PortRef) e;
        Component c = components.get(p.componentId());
        if (c == null) {
            throw new ModelException(l.id(), "ends at missing component " + p.componentId());
        }
        PortSpec spec = c.type().port(p.port()).orElseThrow(
                () -> new ModelException(l.id(), c.tag() + " has no port " + p.port()));
        return spec.mechanical();
    }

    private void checkState(OperatingState s) {
        String where = "state " + s.name();
        for (Map.Entry<String, String> e : s.valvePositions().entrySet()) {
            Component c = components.get(e.getKey());
            if (c == null) {
                throw new ModelException(where, "sets the position of missing component " + e.getKey());
            }
            if (!c.type().isDirectionalValve()) {
                throw new ModelException(where, c.tag() + " is not a directional valve");
            }
            boolean known = c.type().spoolPositions(c.options()).stream().anyMatch(p -> p.name().equals(e.getValue()));
            if (!known) {
                throw new ModelException(where, c.tag() + " has no spool position '" + e.getValue() + "'");
            }
        }
        for (Map.Entry<String, ActuatorState> e : s.actuators().entrySet()) {
            Component c = components.get(e.getKey());
            if (c == null) {
                throw new ModelException(where, "sets the load of missing component " + e.getKey());
            }
            if (!c.type().isActuator()) {
                throw new ModelException(where, c.tag() + " is not a cylinder or motor");
            }
            range(where + " " + c.tag() + " load", e.getValue().load(), -1e9, 1e9);
        }
        for (Map.Entry<String, Double> e : s.speeds().entrySet()) {
            Component c = components.get(e.getKey());
            if (c == null) {
                throw new ModelException(where, "sets the speed of missing component " + e.getKey());
            }
            if (c.type() != ComponentType.PRIME_MOVER) {
                throw new ModelException(where, c.tag() + " is not a prime mover");
            }
            range(where + " " + c.tag() + " speed", e.getValue(), 0, 100);
        }
    }

    private static void finite(String place, double v) {
        if (!Double.isFinite(v)) {
            throw new ModelException(place, "not a finite number");
        }
    }

    private static void range(String place, double v, double min, double max) {
        if (!(Double.isFinite(v) && v >= min && v <= max)) {
            throw new ModelException(place, "value " + v + " outside " + min + " … " + max);
        }
    }

    public TitleBlock title() {
        return title;
    }

    public Fluid fluid() {
        return fluid;
    }

    /** Components in drawing order (unmodifiable); a list, so that a walk by index needs no iterator. */
    public List<Component> components() {
        return componentList;
    }

    /** Junctions in drawing order (unmodifiable). */
    public List<Junction> junctions() {
        return junctionList;
    }

    /** Lines in drawing order (unmodifiable). */
    public List<Line> lines() {
        return lineList;
    }

    public Collection<Note> notes() {
        return notes.values();
    }

    public List<OperatingState> states() {
        return states;
    }

    public Optional<Component> component(String id) {
        return Optional.ofNullable(components.get(id));
    }

    public Optional<Component> componentByTag(String tag) {
        return components.values().stream().filter(c -> c.tag().equals(tag)).findFirst();
    }

    public Optional<Junction> junction(String id) {
        return Optional.ofNullable(junctions.get(id));
    }

    public Optional<Line> line(String id) {
        return Optional.ofNullable(lines.get(id));
    }

    public Optional<Note> note(String id) {
        return Optional.ofNullable(notes.get(id));
    }

    public Optional<OperatingState> state(String name) {
        return states.stream().filter(s -> s.name().equals(name)).findFirst();
    }

    /** Lines with an end on the given component or junction id. */
    public List<Line> linesAt(String ownerId) {
        List<Line> out = new ArrayList<>();
        for (Line l : lines.values()) {
            if (l.from().ownerId().equals(ownerId) || l.to().ownerId().equals(ownerId)) {
                out.add(l);
            }
        }
        return out;
    }

    /** True when any element (component, junction, line or note) has this id. */
    public boolean hasId(String id) {
        return components.containsKey(id) || junctions.containsKey(id) || lines.containsKey(id) || notes.containsKey(id);
    }

    /** A fresh id with the given prefix, e.g. "c7", not used by any element. */
    public String freshId(String prefix) {
        for (int i = 1; ; i++) {
            String id = prefix + i;
            if (!hasId(id)) {
                return id;
            }
        }
    }

    /** The lowest free tag for a new component of the type, e.g. "V3". */
    public String freshTag(ComponentType type) {
        Set<String> used = new HashSet<>();
        components.values().forEach(c -> used.add(c.tag()));
        for (int i = 1; ; i++) {
            String tag = type.tagPrefix() + i;
            if (!used.contains(tag)) {
                return tag;
            }
        }
    }

    // ---- changes, each returning a new circuit ----

    /** Adds the component, or replaces the one with the same id. */
    public Circuit withComponent(Component c) {
        Map<String, Component> m = new LinkedHashMap<>(components);
        m.put(c.id(), c);
        return new Circuit(title, fluid, m.values(), junctions.values(), lines.values(), notes.values(), states);
    }

    /** Removes a component, the lines attached to it, and every operating state's reference to it. */
    public Circuit withoutComponent(String id) {
        Map<String, Component> m = new LinkedHashMap<>(components);
        m.remove(id);
        List<Line> keep = new ArrayList<>();
        for (Line l : lines.values()) {
            if (!l.from().ownerId().equals(id) && !l.to().ownerId().equals(id)) {
                keep.add(l);
            }
        }
        List<OperatingState> st = new ArrayList<>();
        states.forEach(s -> st.add(s.without(id)));
        return new Circuit(title, fluid, m.values(), junctions.values(), keep, notes.values(), st);
    }

    public Circuit withJunction(Junction j) {
        Map<String, Junction> m = new LinkedHashMap<>(junctions);
        m.put(j.id(), j);
        return new Circuit(title, fluid, components.values(), m.values(), lines.values(), notes.values(), states);
    }

    /** Removes a junction and the lines attached to it. */
    public Circuit withoutJunction(String id) {
        Map<String, Junction> m = new LinkedHashMap<>(junctions);
        m.remove(id);
        List<Line> keep = new ArrayList<>();
        for (Line l : lines.values()) {
            if (!l.from().ownerId().equals(id) && !l.to().ownerId().equals(id)) {
                keep.add(l);
            }
        }
        return new Circuit(title, fluid, components.values(), m.values(), keep, notes.values(), states);
    }

    public Circuit withLine(Line l) {
        Map<String, Line> m = new LinkedHashMap<>(lines);
        m.put(l.id(), l);
        return new Circuit(title, fluid, components.values(), junctions.values(), m.values(), notes.values(), states);
    }

    public Circuit withoutLine(String id) {
        Map<String, Line> m = new LinkedHashMap<>(lines);
        m.remove(id);
        return new Circuit(title, fluid, components.values(), junctions.values(), m.values(), notes.values(), states);
    }

    public Circuit withNote(Note n) {
        Map<String, Note> m = new LinkedHashMap<>(notes);
        m.put(n.id(), n);
        return new Circuit(title, fluid, components.values(), junctions.values(), lines.values(), m.values(), states);
    }

    public Circuit withoutNote(String id) {
        Map<String, Note> m = new LinkedHashMap<>(notes);
        m.remove(id);
        return new Circuit(title, fluid, components.values(), junctions.values(), lines.values(), m.values(), states);
    }

    public Circuit withTitle(TitleBlock t) {
        return new Circuit(t, fluid, components.values(), junctions.values(), lines.values(), notes.values(), states);
    }

    public Circuit withFluid(Fluid f) {
        return new Circuit(title, f, components.values(), junctions.values(), lines.values(), notes.values(), states);
    }

    public Circuit withStates(List<OperatingState> s) {
        return new Circuit(title, fluid, components.values(), junctions.values(), lines.values(), notes.values(), s);
    }

    /** Replaces the state of the same name, or appends it. */
    public Circuit withState(OperatingState s) {
        List<OperatingState> out = new ArrayList<>(states);
        boolean replaced = false;
        for (int i = 0; i < out.size(); i++) {
            if (out.get(i).name().equals(s.name())) {
                out.set(i, s);
                replaced = true;
            }
        }
        if (!replaced) {
            out.add(s);
        }
        return withStates(out);
    }

    /** Applies a change to the named state. */
    public Circuit updateState(String name, UnaryOperator<OperatingState> change) {
        OperatingState s = state(name).orElseThrow(() -> new ModelException("state " + name, "no such operating state"));
        return withState(change.apply(s));
    }

    @Override
    public boolean equals(Object o) {
        if (this == o) {
            return true;
        }
        if (!(o instanceof Circuit)) {
            return false;
        }
        Circuit c = (Circuit) o;
        return title.equals(c.title) && fluid.equals(c.fluid) && components.equals(c.components)
                && junctions.equals(c.junctions) && lines.equals(c.lines) && notes.equals(c.notes)
                && states.equals(c.states);
    }

    @Override
    public int hashCode() {
        return Objects.hash(title, fluid, components, junctions, lines, notes, states);
    }

    @Override
    public String toString() {
        return "Circuit[" + title.title() + ": " + components.size() + " components, " + lines.size() + " lines]";
    }
}
