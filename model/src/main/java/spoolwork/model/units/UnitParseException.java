package spoolwork.model.units;

/** Text that is not a value with a known unit; the message is meant for the user. */
public class UnitParseException extends IllegalArgumentException {
    public UnitParseException(String message) {
        super(message);
    }
}
