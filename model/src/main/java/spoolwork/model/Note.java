package spoolwork.model;

import java.util.Objects;

/** A free text note on the sheet. */
public record Note(String id, double x, double y, String text) {
    public static final int MAX_TEXT = 10_000;

    public Note {
        Objects.requireNonNull(id);
        Objects.requireNonNull(text);
    }

    public Note at(double nx, double ny) {
        return new Note(id, nx, ny, text);
    }

    public Note withText(String t) {
        return new Note(id, x, y, t);
    }
}
