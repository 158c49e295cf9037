package spoolwork.model;

import java.util.Objects;

/** The drawing's title block. Every field is free text; the date is conventionally ISO 8601 (2026-12-01). */
public record TitleBlock(String title, String drawingNumber, String revision, String drawnBy, String date) {
    public TitleBlock {
        Objects.requireNonNull(title);
        Objects.requireNonNull(drawingNumber);
        Objects.requireNonNull(revision);
        Objects.requireNonNull(drawnBy);
        Objects.requireNonNull(date);
    }

    public static TitleBlock empty() {
        return new TitleBlock("Untitled circuit", "", "A", "", "");
    }
}
