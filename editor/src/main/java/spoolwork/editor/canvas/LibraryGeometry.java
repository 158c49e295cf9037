package spoolwork.editor.canvas;

import java.util.HashMap;
import java.util.Map;

import spoolwork.editor.geometry.Box;
import spoolwork.editor.geometry.SheetGeometry;
import spoolwork.model.Component;
import spoolwork.model.Point;
import spoolwork.symbols.Anchor;
import spoolwork.symbols.Symbol;
import spoolwork.symbols.SymbolLibrary;
import spoolwork.symbols.Transform;

/**
 * Sheet geometry read from the symbol library. Symbols are turned once per (type, options, rotation,
 * mirror) and kept, so that hit testing and routing in a large drawing do not rebuild them.
 */
public final class LibraryGeometry implements SheetGeometry {
    private record Key(Object type, Map<String, String> options, int rotation, boolean mirrored) {
    }

    private final Map<Key, Symbol> oriented = new HashMap<>();

    /** The component's symbol turned and mirrored about its origin, not yet moved to its position. */
    public synchronized Symbol oriented(Component c) {
        Key k = new Key(c.type(), c.options(), c.rotation(), c.mirrored());
        return oriented.computeIfAbsent(k, x -> SymbolLibrary.symbolFor(c.at(0, 0))
                .transformed(new Transform(c.rotation(), c.mirrored(), 0, 0)));
    }

    @Override
    public Box bounds(Component c) {
        spoolwork.symbols.Box b = oriented(c).bounds();
        return new Box(b.minX() + c.x(), b.minY() + c.y(), b.maxX() + c.x(), b.maxY() + c.y());
    }

    @Override
    public Point port(Component c, String port) {
        Anchor a = oriented(c).anchor(port).orElseThrow(
                () -> new IllegalArgumentException(c.tag() + " has no port " + port));
        return new Point(a.at().x() + c.x(), a.at().y() + c.y());
    }

    @Override
    public Point exitDirection(Component c, String port) {
        Anchor a = oriented(c).anchor(port).orElseThrow(
                () -> new IllegalArgumentException(c.tag() + " has no port " + port));
        return new Point(a.outward().dx(), a.outward().dy());
    }

    @Override
    public boolean hits(Component c, Point p) {
        return oriented(c).hits(new Point(p.x() - c.x(), p.y() - c.y()));
    }
}
