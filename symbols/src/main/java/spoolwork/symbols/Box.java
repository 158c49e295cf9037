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

    /** The smallest box holding the two corners (x1, y1) and (x2, y2), grid units, in either order. */
    public static Box around(double x1, double y1, double x2, double y2) {
        return new Box(Math.min(x1, x2), Math.min(y1, y2), Math.max(x1, x2), Math.max(y1, y2));
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
        return contains(p.x(), p.y());
    }

    /** True when the point (grid units) lies inside or on the outline. */
    public boolean contains(double x, double y) {
        return x >= minX && x <= maxX && y >= minY && y <= maxY;
    }

    /** True when the point lies strictly inside, not on the outline. */
    public boolean containsInside(double x, double y) {
        return x > minX && x < maxX && y > minY && y < maxY;
    }

    /** True when the boxes share at least one point; touching outlines count. */
    public boolean intersects(Box o) {
        return o.minX <= maxX && o.maxX >= minX && o.minY <= maxY && o.maxY >= minY;
    }

    public Box union(Box o) {
        return new Box(Math.min(minX, o.minX), Math.min(minY, o.minY), Math.max(maxX, o.maxX), Math.max(maxY, o.maxY));
    }

    /** The box grown by {@code d} grid units on every side. */
    public Box grow(double d) {
        return new Box(minX - d, minY - d, maxX + d, maxY + d);
    }

    /** The box moved by (dx, dy) grid units. */
    public Box translate(double dx, double dy) {
        return new Box(minX + dx, minY + dy, maxX + dx, maxY + dy);
    }

    /** The box after a transform; still axis-aligned because rotations are in 90° steps. */
    public Box transformed(Transform t) {
        return around(t.apply(new Point(minX, minY)), t.apply(new Point(maxX, maxY)));
    }
}
