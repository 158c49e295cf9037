package spoolwork.solver;

import java.util.List;
import java.util.Objects;

/**
 * A finding about the circuit or the solve.
 *
 * @param elements component tags, line ids and node names involved
 */
public record Diagnostic(Severity severity, String message, List<String> elements) {
    public Diagnostic {
        Objects.requireNonNull(severity);
        Objects.requireNonNull(message);
        elements = List.copyOf(elements);
    }
}
