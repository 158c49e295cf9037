package spoolwork.editor.geometry;

import spoolwork.model.Point;

/** An axis-aligned rectangle on the sheet, grid units. */
public record Box(double minX, double minY, double maxX, double maxY) {
    public Box {
        if (maxX < minX || maxY < minY) {
            throw new IllegalArgumentException("inverted box");
        }
    }

    public static Box around(double x1, double y1, double x2, double y2) {
        return new Box(Math.min(x1, x2), Math.min(y1, y2), Math.max(x1, x2), Math.max(y1, y2));
    }

    public double width() {
        return maxX - minX;
    }

    public double height() {
        return maxY - minY;
    }

    public boolean contains(double x, double y) {
        return x >= minX && x <= maxX && y >= minY && y <= maxY;
    }

    /** True when the point lies strictly inside, not on the outline. */
    public boolean containsInside(double x, double y) {
        return x > minX && x < maxX && y > minY && y < maxY;
    }

    public boolean intersects(Box o) {
        return o.minX <= maxX && o.maxX >= minX && o.minY <= maxY && o.maxY >= minY;
    }

    public Box union(Box o) {
        return new Box(Math.min(minX, o.minX), Math.min(minY, o.minY), Math.max(maxX, o.maxX), Math.max(maxY, o.maxY));
    }

    public Box grow(double d) {
        return new Box(minX - d, minY - d, maxX + d, maxY + d);
    }

    public Box translate(double dx, double dy) {
        return new Box(minX + dx, minY + dy, maxX + dx, maxY + dy);
    }

    public Point centre() {
        return new Point((minX + maxX) / 2, (minY + maxY) / 2);
    }
}
