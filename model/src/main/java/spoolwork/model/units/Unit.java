package spoolwork.model.units;

import java.util.List;
import java.util.Objects;

import spoolwork.model.Quantity;

/**
 * A unit of one quantity: SI value = value × factor + offset. Conversion factors for US customary units
 * are the exact or tabulated values of NIST SP 811 (2008), Appendix B.
 *
 * @param symbol  how the unit is written when formatting
 * @param aliases other spellings accepted when parsing (compared ignoring case and spaces)
 */
public record Unit(Quantity quantity, String symbol, double factor, double offset, List<String> aliases) {
    public Unit {
        Objects.requireNonNull(quantity);
        Objects.requireNonNull(symbol);
        aliases = List.copyOf(aliases);
    }

    public double toSi(double value) {
        return value * factor + offset;
    }

    public double fromSi(double si) {
        return (si - offset) / factor;
    }
}
