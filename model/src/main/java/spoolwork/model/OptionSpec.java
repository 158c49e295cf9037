package spoolwork.model;

import java.util.List;
import java.util.Objects;

/** A choice among named variants that a component type declares, e.g. the centre condition of a 4/3 valve. */
public record OptionSpec(String key, List<String> choices, String defaultChoice, String meaning) {
    public OptionSpec {
        Objects.requireNonNull(key);
        choices = List.copyOf(choices);
        if (!choices.contains(defaultChoice)) {
            throw new IllegalArgumentException("default of " + key + " is not one of its choices");
        }
        Objects.requireNonNull(meaning);
    }
}
