package spoolwork.model;

/**
 * A circuit that breaks a rule of the model (dangling reference, duplicate id, value out of range). The
 * message names the place: a component tag, a line id or a path in the file.
 */
public class ModelException extends RuntimeException {
    private final String place;

    public ModelException(String place, String message) {
        super(place + ": " + message);
        this.place = place;
    }

    /** Where the problem is: a component tag, element id or JSON path. */
    public String place() {
        return place;
    }
}
