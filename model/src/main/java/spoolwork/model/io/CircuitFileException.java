package spoolwork.model.io;

/**
 * A circuit file that cannot be read. The message names the place: the file, a JSON path such as
 * {@code $.components[3].params.bore}, and the component tag where one is known.
 */
public class CircuitFileException extends Exception {
    private final String place;

    public CircuitFileException(String place, String message) {
        super(place + ": " + message);
        this.place = place;
    }

    public CircuitFileException(String place, String message, Throwable cause) {
        super(place + ": " + message, cause);
        this.place = place;
    }

    public String place() {
        return place;
    }
}
