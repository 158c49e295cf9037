package spoolwork.editor.geometry;

import spoolwork.model.Component;
import spoolwork.model.Point;

/**
 * Where a placed component sits on the sheet: its outline and the positions of its ports, grid units,
 * after the component's rotation and mirroring. The editor's routing, hit testing and lines read this;
 * the answers come from the symbol library so that geometry is defined in one place.
 */
public interface SheetGeometry {

    /** The component's outline on the sheet, grid units. */
    Box bounds(Component c);

    /** The sheet position of a port, grid units; throws IllegalArgumentException for an unknown port. */
    Point port(Component c, String port);

    /** The unit direction a line leaves the port in, one of (±1, 0) or (0, ±1). */
    default Point exitDirection(Component c, String port) {
        Point p = port(c, port);
        Box b = bounds(c);
        double left = Math.abs(p.x() - b.minX());
        double right = Math.abs(b.maxX() - p.x());
        double top = Math.abs(p.y() - b.minY());
        double bottom = Math.abs(b.maxY() - p.y());
        double m = Math.min(Math.min(left, right), Math.min(top, bottom));
        if (m == bottom) {
            return new Point(0, 1);
        }
        if (m == top) {
            return new Point(0, -1);
        }
        return m == left ? new Point(-1, 0) : new Point(1, 0);
    }

    /** True when the sheet point (grid units) picks the component. */
    default boolean hits(Component c, Point p) {
        return bounds(c).contains(p.x(), p.y());
    }
}
