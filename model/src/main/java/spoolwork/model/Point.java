package spoolwork.model;

/** A point on the sheet in grid units (one grid unit is the symbol grid pitch). */
public record Point(double x, double y) {
}
