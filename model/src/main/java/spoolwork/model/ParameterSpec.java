package spoolwork.model;

import java.util.Objects;

/**
 * One numeric parameter a component type declares: its key in the file, quantity (and so SI unit),
 * default, valid closed range and a one-line meaning for the user.
 */
public record ParameterSpec(String key, Quantity quantity, double defaultValue, double min, double max,
                            String meaning) {
    public ParameterSpec {
        Objects.requireNonNull(key);
        Objects.requireNonNull(quantity);
        Objects.requireNonNull(meaning);
        if (!(min <= defaultValue && defaultValue <= max)) {
            throw new IllegalArgumentException("default of " + key + " outside its range");
        }
    }

    /** True when the value is finite and inside the valid range. */
    public boolean accepts(double value) {
        return Double.isFinite(value) && value >= min && value <= max;
    }
}
