package spoolwork.symbols;

import spoolwork.model.Point;

/** An axis-aligned rectangle in grid units, min corner top left (y down). */
public record Box(double minX, double minY, double maxX, double maxY) {
    public Box {
        if (!(minX <= maxX && minY <= maxY)) {
            throw new IllegalArgumentException("empty box " + minX + "," + minY + " " + maxX + "," + maxY);
        }
    }

    public static Box around(Point a, Point b) {
        return new Box(Math.min(a.x(), b.x()), Math.min(a.y(), b.y()), Math.max(a.x(), b.x()), Math.max(a.y(), b.y()));
    }

    public double width() {
        return maxX - minX;
    }

    public double height() {
        return maxY - minY;
    }

    public Point centre() {
        return new Point((minX + maxX) / 2, (minY + maxY) / 2);
    }

    public boolean contains(Point p) {
        return p.x() >= minX && p.x() <= maxX && p.y() >= minY && p.y() <= maxY;
    }

    public Box union(Box o) {
        return new Box(Math.min(minX, o.minX), Math.min(minY, o.minY), Math.max(maxX, o.maxX), Math.max(maxY, o.maxY));
    }

    /** The box grown by {@code d} grid units on every side. */
    public Box grow(double d) {
        return new Box(minX - d, minY - d, maxX + d, maxY + d);
    }

    /** The box after a transform; still axis-aligned because rotations are in 90° steps. */
    public Box transformed(Transform t) {
        return around(t.apply(new Point(minX, minY)), t.apply(new Point(maxX, maxY)));
    }
}
