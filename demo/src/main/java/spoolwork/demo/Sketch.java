package spoolwork.demo;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import spoolwork.model.Circuit;
import spoolwork.model.Component;
import spoolwork.model.ComponentType;
import spoolwork.model.Endpoint;
import spoolwork.model.Fluid;
import spoolwork.model.Junction;
import spoolwork.model.Line;
import spoolwork.model.LineKind;
import spoolwork.model.Note;
import spoolwork.model.OperatingState;
import spoolwork.model.Point;
import spoolwork.model.TitleBlock;
import spoolwork.symbols.routing.AutoRoute;

/** Draws an example circuit in code: components by tag at grid positions, lines between "TAG.PORT" ends. */
final class Sketch {
    private final List<Component> components = new ArrayList<>();
    private final List<Junction> junctions = new ArrayList<>();
    private final List<Line> lines = new ArrayList<>();
    private final List<Note> notes = new ArrayList<>();
    private final Map<String, String> ids = new LinkedHashMap<>();
    private int next;

    /** Places a component; settings are key/value pairs, numbers for parameters and strings for options. */
    Sketch place(String tag, ComponentType type, double x, double y, Object... settings) {
        String id = "c" + (++next);
        ids.put(tag, id);
        components.add(Component.of(id, tag, type, x, y, settings));
        return this;
    }

    /** Turns the last placed component clockwise by the given multiple of 90°. */
    Sketch turned(int degrees) {
        Component last = components.remove(components.size() - 1);
        components.add(last.withRotation(degrees));
        return this;
    }

    Sketch junction(String name, double x, double y) {
        String id = "j" + (++next);
        ids.put(name, id);
        junctions.add(new Junction(id, x, y));
        return this;
    }

    String id(String tag) {
        return ids.get(tag);
    }

    private Endpoint end(String s) {
        int dot = s.indexOf('.');
        if (dot < 0) {
            return Endpoint.junction(ids.get(s));
        }
        return Endpoint.port(ids.get(s.substring(0, dot)), s.substring(dot + 1));
    }

    /** A line with no loss (short, generously sized pipework). */
    Sketch ideal(String from, String to, LineKind kind, Point... bends) {
        lines.add(new Line("w" + (++next), end(from), end(to), List.of(bends), 0.016, 0.5, kind, true));
        return this;
    }

    /** A pipe or hose whose loss is calculated. */
    Sketch pipe(String id, String from, String to, double diameter, double length, LineKind kind, Point... bends) {
        lines.add(new Line(id, end(from), end(to), List.of(bends), diameter, length, kind, false));
        return this;
    }

    Sketch shaft(String from, String to) {
        lines.add(new Line("s" + (++next), end(from), end(to), List.of(), 0, 0, LineKind.SHAFT, true));
        return this;
    }

    Sketch note(double x, double y, String text) {
        notes.add(new Note("n" + (++next), x, y, text));
        return this;
    }

    Circuit build(TitleBlock title, Fluid fluid, List<OperatingState> states) {
        // Lines are drawn without bends here; the shared router gives them orthogonal routes round the symbols.
        return AutoRoute.routeUnbent(new Circuit(title, fluid, components, junctions, lines, notes, states));
    }
}
