package spoolwork.solver;

import java.util.List;
import java.util.Map;
import java.util.Optional;

/**
 * The steady operating point of a circuit in one operating state. Immutable. When {@link #converged()} is
 * false, the diagnostics say why and the maps are empty: there are no numbers to trust.
 *
 * @param components results keyed by component tag, in drawing order
 * @param lines      results keyed by line id, in drawing order
 * @param power      power balance; null when not converged
 * @param iterations Newton iterations over all continuation stages
 */
public record Solution(String state, boolean converged, int iterations, List<Diagnostic> diagnostics,
                       Map<String, ComponentResult> components, Map<String, LineResult> lines, PowerBalance power) {
    public Solution {
        diagnostics = List.copyOf(diagnostics);
        components = Frozen.copyOf(components);
        lines = Frozen.copyOf(lines);
    }

    static Solution failed(String state, int iterations, List<Diagnostic> diagnostics) {
        return new Solution(state, false, iterations, diagnostics, Map.of(), Map.of(), null);
    }

    /** The component with the given tag. */
    public Optional<ComponentResult> component(String tag) {
        return Optional.ofNullable(components.get(tag));
    }

    /** The line with the given id. */
    public Optional<LineResult> line(String id) {
        return Optional.ofNullable(lines.get(id));
    }

    /** True when solved and no diagnostic is an error. */
    public boolean ok() {
        return converged && diagnostics.stream().noneMatch(d -> d.severity() == Severity.ERROR);
    }

    /** Shorthand for a component value by tag and key; throws when absent. */
    public double value(String tag, String key) {
        ComponentResult c = component(tag).orElseThrow(() -> new IllegalArgumentException("no component " + tag));
        return c.value(key).orElseThrow(() -> new IllegalArgumentException(tag + " has no result " + key));
    }

    /** Gauge pressure at a component port, Pa. */
    public double pressure(String tag, String port) {
        return component(tag).orElseThrow(() -> new IllegalArgumentException("no component " + tag))
                .port(port).pressure();
    }

    /** Flow into a component at a port, m³/s. */
    public double flow(String tag, String port) {
        return component(tag).orElseThrow(() -> new IllegalArgumentException("no component " + tag))
                .port(port).flow();
    }
}
