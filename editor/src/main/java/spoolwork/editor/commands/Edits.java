package spoolwork.editor.commands;

import java.util.ArrayList;
import java.util.Collection;
import java.util.HashMap;
import java.util.HashSet;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;

import spoolwork.editor.geometry.Box;
import spoolwork.editor.geometry.Router;
import spoolwork.editor.geometry.SheetGeometry;
import spoolwork.model.Circuit;
import spoolwork.model.Component;
import spoolwork.model.ComponentType;
import spoolwork.model.Endpoint;
import spoolwork.model.Junction;
import spoolwork.model.Line;
import spoolwork.model.LineKind;
import spoolwork.model.ModelException;
import spoolwork.model.Note;
import spoolwork.model.Point;
import spoolwork.model.PortSpec;
import spoolwork.model.TitleBlock;

/**
 * The editing operations of the drawing, each as a {@link Command} over the circuit. They need the sheet
 * geometry (where ports are, how big symbols are) to route lines, and nothing of the user interface,
 * so they are tested without a window. Positions are grid units.
 */
public final class Edits {
    /** Inner diameter given to a new line, m: a 12 mm bore is common practice for small industrial circuits. */
    public static final double NEW_LINE_DIAMETER = 0.012;
    /** Length given to a new line, m, until the user enters the real one. */
    public static final double NEW_LINE_LENGTH = 1.0;

    private final SheetGeometry geometry;

    public Edits(SheetGeometry geometry) {
        this.geometry = geometry;
    }

    public SheetGeometry geometry() {
        return geometry;
    }

    // ---------------------------------------------------------------- placing and connecting

    /** Places a new component with default values and the next free tag; its id is {@code c.freshId("c")}. */
    public Command place(ComponentType type, double x, double y) {
        return new Command("Place " + type.label().toLowerCase(), c -> {
            String id = c.freshId("c");
            return c.withComponent(Component.of(id, c.freshTag(type), type, Math.round(x), Math.round(y)));
        });
    }

    /** Joins two endpoints with a new routed line; its id is {@code c.freshId("l")}. */
    public Command connect(Endpoint from, Endpoint to) {
        return new Command("Connect", c -> {
            checkFree(c, from);
            checkFree(c, to);
            String id = c.freshId("l");
            LineKind kind = guessKind(c, from, to);
            Line l = new Line(id, from, to, List.of(), NEW_LINE_DIAMETER, NEW_LINE_LENGTH, kind, kind == LineKind.SHAFT);
            return c.withLine(l.withBends(route(c, l, Set.of())));
        });
    }

    /**
     * Joins an endpoint onto an existing line: a junction is placed on the line at the grid point nearest
     * to {@code at}, the line is split there, and a new line runs from the endpoint to the junction.
     */
    public Command connectToLine(Endpoint from, String lineId, Point at) {
        return new Command("Connect to line", c -> {
            checkFree(c, from);
            Line target = c.line(lineId).orElseThrow(() -> new ModelException(lineId, "no such line"));
            if (target.kind() == LineKind.SHAFT) {
                throw new ModelException(lineId, "a shaft coupling cannot branch");
            }
            if (from.equals(target.from()) || from.equals(target.to())) {
                throw new ModelException(lineId, "the line already ends here");
            }
            Split s = split(c, target, at);
            Circuit out = s.circuit;
            String id = out.freshId("l");
            Line l = new Line(id, from, Endpoint.junction(s.junctionId), List.of(), target.diameter(), NEW_LINE_LENGTH,
                    target.kind(), target.ideal());
            return out.withLine(l.withBends(route(out, l, Set.of())));
        });
    }

    private record Split(Circuit circuit, String junctionId) {
    }

    private Split split(Circuit c, Line l, Point at) {
        List<Point> pts = Router.polyline(position(c, l.from()), l.bends(), position(c, l.to()));
        int best = 0;
        double bestD = Double.MAX_VALUE;
        Point bestP = pts.get(0);
        for (int i = 0; i + 1 < pts.size(); i++) {
            Point p = nearestOnSegment(pts.get(i), pts.get(i + 1), at);
            double d = Math.hypot(p.x() - at.x(), p.y() - at.y());
            if (d < bestD) {
                bestD = d;
                best = i;
                bestP = p;
            }
        }
        Point a = pts.get(best);
        Point b = pts.get(best + 1);
        Point j = new Point(Math.round(bestP.x()), Math.round(bestP.y()));
        // Keep the junction on the segment even when rounding moves it off a half-unit run.
        if (a.x() == b.x()) {
            j = new Point(a.x(), clamp(j.y(), a.y(), b.y()));
        } else {
            j = new Point(clamp(j.x(), a.x(), b.x()), a.y());
        }
        String jid = c.freshId("j");
        Circuit out = c.withJunction(new Junction(jid, j.x(), j.y()));
        double total = length(pts);
        List<Point> first = new ArrayList<>(pts.subList(1, best + 1));
        List<Point> second = new ArrayList<>(pts.subList(best + 1, pts.size() - 1));
        List<Point> firstPoly = new ArrayList<>(pts.subList(0, best + 1));
        firstPoly.add(j);
        double share = total > 0 ? length(firstPoly) / total : 0.5;
        share = Math.min(0.95, Math.max(0.05, share));
        Line l1 = new Line(l.id(), l.from(), Endpoint.junction(jid), strip(first, j), l.diameter(),
                l.length() * share, l.kind(), l.ideal());
        out = out.withLine(l1);
        String id2 = out.freshId("l");
        Line l2 = new Line(id2, Endpoint.junction(jid), l.to(), strip(second, j), l.diameter(),
                l.length() * (1 - share), l.kind(), l.ideal());
        return new Split(out.withLine(l2), jid);
    }

    private static List<Point> strip(List<Point> bends, Point j) {
        List<Point> out = new ArrayList<>(bends);
        out.removeIf(p -> p.equals(j));
        return out;
    }

    // ---------------------------------------------------------------- moving and turning

    /**
     * Moves the components, junctions and notes among {@code ids} by (dx, dy) grid units. Lines with both
     * ends moving keep their shape; lines with one end moving are routed again.
     */
    public Command move(Collection<String> ids, double dx, double dy) {
        Set<String> set = new LinkedHashSet<>(ids);
        return new Command("Move " + count(set), c -> moved(c, set, dx, dy, true));
    }

    /**
     * The circuit with the items moved; with {@code routeCarefully} false, lines with one moving end get a
     * quick route instead of a clear one (the live preview of a drag).
     */
    public Circuit moved(Circuit c, Set<String> ids, double dx, double dy, boolean routeCarefully) {
        Draft d = new Draft(c);
        Set<String> owners = new HashSet<>();
        for (String id : ids) {
            Component comp = d.components.get(id);
            if (comp != null) {
                d.components.put(id, comp.at(comp.x() + dx, comp.y() + dy));
                owners.add(id);
                continue;
            }
            Junction j = d.junctions.get(id);
            if (j != null) {
                d.junctions.put(id, j.at(j.x() + dx, j.y() + dy));
                owners.add(id);
                continue;
            }
            Note n = d.notes.get(id);
            if (n != null) {
                d.notes.put(id, n.at(n.x() + dx, n.y() + dy));
            }
        }
        List<Line> rerouted = new ArrayList<>();
        for (Line l : c.lines()) {
            boolean a = owners.contains(l.from().ownerId());
            boolean b = owners.contains(l.to().ownerId());
            if (a && b) {
                List<Point> bends = new ArrayList<>();
                l.bends().forEach(p -> bends.add(new Point(p.x() + dx, p.y() + dy)));
                d.lines.put(l.id(), l.withBends(bends));
            } else if (a || b) {
                rerouted.add(l);
            }
        }
        Circuit out = d.build();
        if (rerouted.isEmpty()) {
            return out;
        }
        Draft r = new Draft(out);
        for (Line l : rerouted) {
            r.lines.put(l.id(), l.withBends(routeCarefully ? route(out, l, Set.of()) : quickRoute(out, l)));
        }
        return r.build();
    }

    /**
     * Turns the selection a quarter turn clockwise on the sheet: one component about its own origin, several
     * items together about the grid point nearest the middle of the selection, lines among them with them.
     */
    public Command rotate(Collection<String> ids) {
        Set<String> set = new LinkedHashSet<>(ids);
        return new Command("Rotate " + count(set), c -> turned(c, set, true));
    }

    /** Mirrors the selection left to right on the sheet, as {@link #rotate} does for turning. */
    public Command mirror(Collection<String> ids) {
        Set<String> set = new LinkedHashSet<>(ids);
        return new Command("Mirror " + count(set), c -> turned(c, set, false));
    }

    private static Component turn(Component k, boolean rotate) {
        // A component mirrors about its own vertical axis before it is rotated, so mirroring what is on the
        // sheet left to right also reverses the rotation.
        return rotate ? k.withRotation(k.rotation() + 90) : k.withMirrored(!k.mirrored()).withRotation(-k.rotation());
    }

    private Circuit turned(Circuit c, Set<String> ids, boolean rotate) {
        List<String> movable = new ArrayList<>();
        Box box = null;
        for (String id : ids) {
            Box b = null;
            if (c.component(id).isPresent()) {
                Component k = c.component(id).get();
                b = new Box(k.x(), k.y(), k.x(), k.y());
            } else if (c.junction(id).isPresent()) {
                Junction j = c.junction(id).get();
                b = new Box(j.x(), j.y(), j.x(), j.y());
            } else if (c.note(id).isPresent()) {
                Note n = c.note(id).get();
                b = new Box(n.x(), n.y(), n.x(), n.y());
            }
            if (b != null) {
                movable.add(id);
                box = box == null ? b : box.union(b);
            }
        }
        if (movable.size() <= 1) {
            return transformed(c, ids, k -> turn(k, rotate));
        }
        double cx = Math.round(box.centre().x());
        double cy = Math.round(box.centre().y());
        java.util.function.UnaryOperator<Point> map = p -> rotate
                ? new Point(cx - (p.y() - cy), cy + (p.x() - cx))
                : new Point(2 * cx - p.x(), p.y());
        Draft d = new Draft(c);
        Set<String> owners = new HashSet<>();
        for (String id : movable) {
            Component k = d.components.get(id);
            if (k != null) {
                Point p = map.apply(new Point(k.x(), k.y()));
                d.components.put(id, turn(k, rotate).at(p.x(), p.y()));
                owners.add(id);
                continue;
            }
            Junction j = d.junctions.get(id);
            if (j != null) {
                Point p = map.apply(new Point(j.x(), j.y()));
                d.junctions.put(id, j.at(p.x(), p.y()));
                owners.add(id);
                continue;
            }
            Note n = d.notes.get(id);
            Point p = map.apply(new Point(n.x(), n.y()));
            d.notes.put(id, n.at(p.x(), p.y()));
        }
        Set<String> hanging = new HashSet<>();
        for (Line l : c.lines()) {
            boolean a = owners.contains(l.from().ownerId());
            boolean b = owners.contains(l.to().ownerId());
            if (a && b) {
                List<Point> bends = new ArrayList<>();
                l.bends().forEach(p -> bends.add(map.apply(p)));
                d.lines.put(l.id(), l.withBends(bends));
            } else if (a || b) {
                hanging.add(l.id());
            }
        }
        Circuit out = d.build();
        Draft r = new Draft(out);
        for (String id : hanging) {
            Line l = out.line(id).orElseThrow();
            r.lines.put(id, l.withBends(route(out, l, Set.of())));
        }
        return hanging.isEmpty() ? out : r.build();
    }

    private Circuit transformed(Circuit c, Set<String> ids, java.util.function.UnaryOperator<Component> f) {
        Draft d = new Draft(c);
        Set<String> changed = new HashSet<>();
        for (String id : ids) {
            Component comp = d.components.get(id);
            if (comp != null) {
                d.components.put(id, f.apply(comp));
                changed.add(id);
            }
        }
        return rerouteAt(d.build(), changed);
    }

    /** Routes every line with an end on one of the owners again. */
    public Circuit rerouteAt(Circuit c, Set<String> owners) {
        Draft d = new Draft(c);
        boolean any = false;
        for (Line l : c.lines()) {
            if (owners.contains(l.from().ownerId()) || owners.contains(l.to().ownerId())) {
                d.lines.put(l.id(), l.withBends(route(c, l, Set.of())));
                any = true;
            }
        }
        return any ? d.build() : c;
    }

    /** Routes the given line again, dropping its bends. */
    public Command reroute(String lineId) {
        return new Command("Route line again", c -> {
            Line l = c.line(lineId).orElseThrow(() -> new ModelException(lineId, "no such line"));
            return c.withLine(l.withBends(route(c, l, Set.of())));
        });
    }

    /**
     * Moves segment {@code segment} (0 = from the start end) of a line sideways by the given offset, grid
     * units, keeping the line orthogonal: the way a user edits a bend.
     */
    public Command moveSegment(String lineId, int segment, double offset) {
        return new Command("Move line segment", c -> {
            Line l = c.line(lineId).orElseThrow(() -> new ModelException(lineId, "no such line"));
            return c.withLine(l.withBends(shiftedSegment(c, l, segment, offset)));
        });
    }

    /** The bends of a line after moving one of its segments sideways; ends stay where they are. */
    public List<Point> shiftedSegment(Circuit c, Line l, int segment, double offset) {
        List<Point> pts = new ArrayList<>(Router.polyline(position(c, l.from()), l.bends(), position(c, l.to())));
        if (segment < 0 || segment + 1 >= pts.size() || offset == 0) {
            return l.bends();
        }
        Point a = pts.get(segment);
        Point b = pts.get(segment + 1);
        boolean horizontal = a.y() == b.y();
        Point na = horizontal ? new Point(a.x(), a.y() + offset) : new Point(a.x() + offset, a.y());
        Point nb = horizontal ? new Point(b.x(), b.y() + offset) : new Point(b.x() + offset, b.y());
        // An end segment gets a new stub so the end itself stays on its port.
        List<Point> out = new ArrayList<>();
        for (int i = 0; i < pts.size(); i++) {
            if (i == segment) {
                if (i == 0) {
                    out.add(a);
                }
                out.add(na);
            } else if (i == segment + 1) {
                out.add(nb);
                if (i == pts.size() - 1) {
                    out.add(b);
                }
            } else {
                out.add(pts.get(i));
            }
        }
        List<Point> simple = Router.simplify(out);
        return simple.size() <= 2 ? List.of() : List.copyOf(simple.subList(1, simple.size() - 1));
    }

    // ---------------------------------------------------------------- deleting and copying

    /** Deletes the selected elements; lines of deleted components go with them, and junctions left with
     * fewer than three lines are tidied (two lines become one, a lone stub goes). */
    public Command delete(Collection<String> ids) {
        Set<String> set = new LinkedHashSet<>(ids);
        return new Command("Delete " + count(set), c -> {
            Draft d = new Draft(c);
            Set<String> gone = new HashSet<>();
            for (String id : set) {
                if (d.components.remove(id) != null || d.junctions.remove(id) != null) {
                    gone.add(id);
                } else if (d.lines.remove(id) == null) {
                    d.notes.remove(id);
                }
            }
            d.lines.values().removeIf(l -> gone.contains(l.from().ownerId()) || gone.contains(l.to().ownerId()));
            // Operating states must not name what is gone.
            List<spoolwork.model.OperatingState> states = new ArrayList<>();
            for (spoolwork.model.OperatingState s : c.states()) {
                spoolwork.model.OperatingState t = s;
                for (String id : gone) {
                    t = t.without(id);
                }
                states.add(t);
            }
            d.states = states;
            return tidyJunctions(d.build());
        });
    }

    /** Removes junctions with fewer than three lines, merging a pair of lines into one. */
    public Circuit tidyJunctions(Circuit c) {
        Circuit out = c;
        boolean again = true;
        while (again) {
            again = false;
            for (Junction j : new ArrayList<>(out.junctions())) {
                List<Line> at = out.linesAt(j.id());
                if (at.size() >= 3) {
                    continue;
                }
                again = true;
                if (at.size() == 2) {
                    out = merge(out, j, at.get(0), at.get(1));
                } else {
                    out = out.withoutJunction(j.id());
                }
                break;
            }
        }
        return out;
    }

    private Circuit merge(Circuit c, Junction j, Line l1, Line l2) {
        Endpoint jr = Endpoint.junction(j.id());
        Endpoint a = l1.from().equals(jr) ? l1.to() : l1.from();
        Endpoint b = l2.from().equals(jr) ? l2.to() : l2.from();
        Circuit out = c.withoutJunction(j.id());
        if (a.equals(b)) {
            return out;
        }
        List<Point> bends = new ArrayList<>();
        List<Point> firstHalf = new ArrayList<>(l1.bends());
        if (!l1.to().equals(jr)) {
            java.util.Collections.reverse(firstHalf);
        }
        bends.addAll(firstHalf);
        bends.add(new Point(j.x(), j.y()));
        List<Point> secondHalf = new ArrayList<>(l2.bends());
        if (!l2.from().equals(jr)) {
            java.util.Collections.reverse(secondHalf);
        }
        bends.addAll(secondHalf);
        Point pa = position(out, a);
        Point pb = position(out, b);
        List<Point> simple = Router.simplify(Router.polyline(pa, bends, pb));
        List<Point> inner = simple.size() <= 2 ? List.of() : simple.subList(1, simple.size() - 1);
        double len = Math.min(Line.MAX_LENGTH, l1.length() + l2.length());
        return out.withLine(new Line(l1.id(), a, b, inner, l1.diameter(), len, l1.kind(), l1.ideal()));
    }

    /**
     * The selected elements as a circuit of their own, for the clipboard: components, junctions and notes
     * among the ids, and every line whose two ends are both among them.
     */
    public static Circuit fragment(Circuit c, Collection<String> ids) {
        Set<String> set = new HashSet<>(ids);
        List<Component> comps = new ArrayList<>();
        List<Junction> juncs = new ArrayList<>();
        List<Note> notes = new ArrayList<>();
        List<Line> lines = new ArrayList<>();
        c.components().stream().filter(x -> set.contains(x.id())).forEach(comps::add);
        c.junctions().stream().filter(x -> set.contains(x.id())).forEach(juncs::add);
        c.notes().stream().filter(x -> set.contains(x.id())).forEach(notes::add);
        for (Line l : c.lines()) {
            if (set.contains(l.from().ownerId()) && set.contains(l.to().ownerId())) {
                lines.add(l);
            }
        }
        return new Circuit(c.title(), c.fluid(), comps, juncs, lines, notes,
                List.of(spoolwork.model.OperatingState.named("Rest")));
    }

    /** What a paste produced: the command and, once run, the ids of the new elements. */
    public static final class Paste {
        private final Command command;
        private final List<String> newIds = new ArrayList<>();

        private Paste(Command command) {
            this.command = command;
        }

        public Command command() {
            return command;
        }

        /** The ids given to the pasted elements (filled when the command runs). */
        public List<String> newIds() {
            return List.copyOf(newIds);
        }
    }

    /**
     * Inserts a fragment offset by (dx, dy) grid units. Every element gets a fresh id; a component keeps its
     * tag when the tag is free in the target, otherwise it gets the next free one.
     */
    public Paste paste(Circuit fragment, double dx, double dy, String description) {
        Paste[] holder = new Paste[1];
        holder[0] = new Paste(new Command(description, c -> {
            holder[0].newIds.clear();
            Map<String, String> ids = new HashMap<>();
            Draft d = new Draft(c);
            Set<String> tags = new HashSet<>();
            d.components.values().forEach(k -> tags.add(k.tag()));
            for (Component k : fragment.components()) {
                String id = d.freshId("c");
                String tag = k.tag();
                if (tags.contains(tag)) {
                    for (int i = 1; ; i++) {
                        tag = k.type().tagPrefix() + i;
                        if (!tags.contains(tag)) {
                            break;
                        }
                    }
                }
                tags.add(tag);
                d.components.put(id, k.withId(id).withTag(tag).at(k.x() + dx, k.y() + dy));
                ids.put(k.id(), id);
            }
            for (Junction j : fragment.junctions()) {
                String id = d.freshId("j");
                d.junctions.put(id, new Junction(id, j.x() + dx, j.y() + dy));
                ids.put(j.id(), id);
            }
            for (Note n : fragment.notes()) {
                String id = d.freshId("n");
                d.notes.put(id, new Note(id, n.x() + dx, n.y() + dy, n.text()));
                ids.put(n.id(), id);
            }
            for (Line l : fragment.lines()) {
                String id = d.freshId("l");
                List<Point> bends = new ArrayList<>();
                l.bends().forEach(p -> bends.add(new Point(p.x() + dx, p.y() + dy)));
                d.lines.put(id, new Line(id, remap(l.from(), ids), remap(l.to(), ids), bends, l.diameter(),
                        l.length(), l.kind(), l.ideal()));
                ids.put(l.id(), id);
            }
            Circuit out = d.build();
            holder[0].newIds.addAll(ids.values());
            return out;
        }));
        return holder[0];
    }

    /** Copies the selection offset by two grid units down and right, as one step. */
    public Paste duplicate(Circuit c, Collection<String> ids) {
        return paste(fragment(c, ids), 2, 2, "Duplicate " + count(new HashSet<>(ids)));
    }

    private static Endpoint remap(Endpoint e, Map<String, String> ids) {
        if (e instanceof Endpoint.PortRef p) {
            return Endpoint.port(ids.get(p.componentId()), p.port());
        }
        return Endpoint.junction(ids.get(e.ownerId()));
    }

    // ---------------------------------------------------------------- values

    public static Command setParam(String componentId, String key, double value) {
        return new Command("Change " + key.replace('_', ' '), c -> c.withComponent(component(c, componentId).withParam(key, value)));
    }

    public static Command setOption(String componentId, String key, String value) {
        return new Command("Change " + key.replace('_', ' '), c -> c.withComponent(component(c, componentId).withOption(key, value)));
    }

    /** Gives a component a new tag; a tag already in use is refused by the model. */
    public static Command setTag(String componentId, String tag) {
        return new Command("Rename " + tag, c -> {
            String t = tag.strip();
            if (t.isEmpty()) {
                throw new ModelException("tag", "a tag cannot be empty");
            }
            if (c.componentByTag(t).filter(o -> !o.id().equals(componentId)).isPresent()) {
                throw new ModelException(t, "tag already used by another component");
            }
            return c.withComponent(component(c, componentId).withTag(t));
        });
    }

    /** Sets a component's rated pressure, Pa, or clears it with null. */
    public static Command setRatedPressure(String componentId, Double pascal) {
        return new Command("Change rated pressure", c -> c.withComponent(component(c, componentId).withRatedPressure(pascal)));
    }

    public static Command changeLine(String lineId, java.util.function.UnaryOperator<Line> change, String what) {
        return new Command("Change line " + what, c -> {
            Line l = c.line(lineId).orElseThrow(() -> new ModelException(lineId, "no such line"));
            return c.withLine(change.apply(l));
        });
    }

    public static Command addNote(double x, double y, String text) {
        return new Command("Add note", c -> c.withNote(new Note(c.freshId("n"), Math.round(x), Math.round(y), text)));
    }

    public static Command setNoteText(String noteId, String text) {
        return new Command("Edit note", c -> c.withNote(c.note(noteId)
                .orElseThrow(() -> new ModelException(noteId, "no such note")).withText(text)));
    }

    public static Command setTitle(TitleBlock t) {
        return new Command("Edit title block", c -> c.withTitle(t));
    }

    // ---------------------------------------------------------------- geometry of the drawing

    /** The sheet position of an endpoint, grid units. */
    public Point position(Circuit c, Endpoint e) {
        if (e instanceof Endpoint.PortRef p) {
            return geometry.port(component(c, p.componentId()), p.port());
        }
        Junction j = c.junction(e.ownerId()).orElseThrow(() -> new ModelException(e.ownerId(), "no such junction"));
        return new Point(j.x(), j.y());
    }

    /** The drawn polyline of a line: its start, bends and end, grid units. */
    public List<Point> polyline(Circuit c, Line l) {
        return Router.polyline(position(c, l.from()), l.bends(), position(c, l.to()));
    }

    private Router.End end(Circuit c, Endpoint e) {
        if (e instanceof Endpoint.PortRef p) {
            Component k = component(c, p.componentId());
            return new Router.End(geometry.port(k, p.port()), geometry.exitDirection(k, p.port()));
        }
        return new Router.End(position(c, e), null);
    }

    /** A clear orthogonal route for the line in the circuit as it is, avoiding every symbol. */
    public List<Point> route(Circuit c, Line l, Set<String> ignore) {
        List<Box> obstacles = new ArrayList<>();
        for (Component k : c.components()) {
            if (!ignore.contains(k.id())) {
                obstacles.add(geometry.bounds(k));
            }
        }
        List<List<Point>> others = new ArrayList<>();
        Box window = Box.around(position(c, l.from()).x(), position(c, l.from()).y(),
                position(c, l.to()).x(), position(c, l.to()).y()).grow(12);
        for (Line o : c.lines()) {
            if (!o.id().equals(l.id())) {
                List<Point> pts = polyline(c, o);
                if (pts.stream().anyMatch(p -> window.contains(p.x(), p.y())) || crosses(pts, window)) {
                    others.add(pts);
                }
            }
        }
        return Router.route(end(c, l.from()), end(c, l.to()), obstacles, others);
    }

    private static boolean crosses(List<Point> pts, Box b) {
        for (int i = 0; i + 1 < pts.size(); i++) {
            if (Box.around(pts.get(i).x(), pts.get(i).y(), pts.get(i + 1).x(), pts.get(i + 1).y()).intersects(b)) {
                return true;
            }
        }
        return false;
    }

    public List<Point> quickRoute(Circuit c, Line l) {
        return Router.quick(end(c, l.from()), end(c, l.to()));
    }

    private static double clamp(double v, double a, double b) {
        return Math.max(Math.min(a, b), Math.min(Math.max(a, b), v));
    }

    private static Point nearestOnSegment(Point a, Point b, Point p) {
        double vx = b.x() - a.x();
        double vy = b.y() - a.y();
        double len2 = vx * vx + vy * vy;
        double t = len2 == 0 ? 0 : ((p.x() - a.x()) * vx + (p.y() - a.y()) * vy) / len2;
        t = Math.max(0, Math.min(1, t));
        return new Point(a.x() + t * vx, a.y() + t * vy);
    }

    private static double length(List<Point> pts) {
        double s = 0;
        for (int i = 0; i + 1 < pts.size(); i++) {
            s += Math.abs(pts.get(i + 1).x() - pts.get(i).x()) + Math.abs(pts.get(i + 1).y() - pts.get(i).y());
        }
        return s;
    }

    private static Component component(Circuit c, String id) {
        return c.component(id).orElseThrow(() -> new ModelException(id, "no such component"));
    }

    private static void checkFree(Circuit c, Endpoint e) {
        if (e instanceof Endpoint.PortRef p) {
            Component k = component(c, p.componentId());
            if (k.type().port(p.port()).isEmpty()) {
                throw new ModelException(k.tag(), "has no port " + p.port());
            }
            for (Line l : c.linesAt(k.id())) {
                if (l.from().equals(e) || l.to().equals(e)) {
                    throw new ModelException(k.tag() + "." + p.port(),
                            "port already has a line; connect onto that line to branch");
                }
            }
        } else if (c.junction(e.ownerId()).isEmpty()) {
            throw new ModelException(e.ownerId(), "no such junction");
        }
    }

    /** The kind a new line most likely is, from the ports it joins (ISO 9461 letters). */
    static LineKind guessKind(Circuit c, Endpoint a, Endpoint b) {
        List<String> letters = new ArrayList<>();
        for (Endpoint e : List.of(a, b)) {
            if (e instanceof Endpoint.PortRef p) {
                Component k = component(c, p.componentId());
                PortSpec spec = k.type().port(p.port()).orElseThrow();
                if (spec.mechanical()) {
                    return LineKind.SHAFT;
                }
                letters.add(k.type() == ComponentType.RESERVOIR ? "R" + p.port() : p.port());
            } else {
                c.linesAt(e.ownerId()).stream().findFirst().ifPresent(l -> letters.add("K" + l.kind().key()));
            }
        }
        for (String s : letters) {
            if (s.startsWith("K")) {
                return LineKind.byKey(s.substring(1)).orElse(LineKind.PRESSURE);
            }
        }
        if (letters.contains("RS") || letters.contains("S")) {
            return LineKind.SUCTION;
        }
        if (letters.contains("X")) {
            return LineKind.PILOT;
        }
        if (letters.contains("Y") || letters.contains("L")) {
            return LineKind.DRAIN;
        }
        if (letters.contains("RT") || letters.contains("T")) {
            return LineKind.RETURN;
        }
        return LineKind.PRESSURE;
    }

    private static String count(Set<String> ids) {
        return ids.size() == 1 ? "1 item" : ids.size() + " items";
    }
}
