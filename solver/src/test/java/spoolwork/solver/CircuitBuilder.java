package spoolwork.solver;

import java.util.ArrayList;
import java.util.List;

import spoolwork.model.Circuit;
import spoolwork.model.Component;
import spoolwork.model.ComponentType;
import spoolwork.model.Endpoint;
import spoolwork.model.Fluid;
import spoolwork.model.Junction;
import spoolwork.model.Line;
import spoolwork.model.LineKind;
import spoolwork.model.OperatingState;
import spoolwork.model.TitleBlock;

/** Builds circuits in code for tests: component id = tag, endpoints written "TAG.PORT" or a junction id. */
final class CircuitBuilder {
    private final List<Component> components = new ArrayList<>();
    private final List<Junction> junctions = new ArrayList<>();
    private final List<Line> lines = new ArrayList<>();
    private Fluid fluid = Fluid.standard();
    private int next = 1;

    /** Adds a component; settings are key/value pairs, numbers for parameters, strings for options. */
    CircuitBuilder add(String tag, ComponentType type, Object... settings) {
        components.add(Component.of(tag, tag, type, components.size() * 6, 0, settings));
        return this;
    }

    CircuitBuilder junction(String id) {
        junctions.add(new Junction(id, 0, 0));
        return this;
    }

    CircuitBuilder fluid(Fluid f) {
        fluid = f;
        return this;
    }

    private static Endpoint end(String s) {
        int dot = s.indexOf('.');
        return dot < 0 ? Endpoint.junction(s) : Endpoint.port(s.substring(0, dot), s.substring(dot + 1));
    }

    /** An ideal (lossless) line. */
    CircuitBuilder ideal(String from, String to) {
        lines.add(new Line("w" + next++, end(from), end(to), List.of(), 0.012, 1, LineKind.PRESSURE, true));
        return this;
    }

    /** A line with loss. */
    CircuitBuilder line(String id, String from, String to, double diameter, double length) {
        lines.add(new Line(id, end(from), end(to), List.of(), diameter, length, LineKind.PRESSURE, false));
        return this;
    }

    CircuitBuilder shaft(String from, String to) {
        lines.add(new Line("s" + next++, end(from), end(to), List.of(), 0, 0, LineKind.SHAFT, true));
        return this;
    }

    Circuit build(OperatingState... states) {
        List<OperatingState> s = states.length == 0 ? List.of(OperatingState.named("Run")) : List.of(states);
        return new Circuit(TitleBlock.empty(), fluid, components, junctions, lines, List.of(), s);
    }
}
