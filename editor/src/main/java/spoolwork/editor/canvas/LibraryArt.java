package spoolwork.editor.canvas;

import java.util.Map;

import javafx.scene.Group;
import javafx.scene.Node;

import spoolwork.model.Component;
import spoolwork.model.ComponentType;
import spoolwork.symbols.Box;
import spoolwork.symbols.Symbol;
import spoolwork.symbols.SymbolLibrary;

/** Component drawings from the symbol library, painted by {@link SymbolPainter}. */
public final class LibraryArt implements ComponentArt {
    private final LibraryGeometry geometry;

    public LibraryArt(LibraryGeometry geometry) {
        this.geometry = geometry;
    }

    @Override
    public Node paint(Component c, double px) {
        return SymbolPainter.paint(geometry.oriented(c), px);
    }

    @Override
    public Node icon(ComponentType type, double size) {
        Symbol s = SymbolLibrary.symbolFor(type, Map.of(), null);
        Box b = s.bounds();
        double px = Math.min(size / Math.max(b.width(), 0.1), size / Math.max(b.height(), 0.1));
        px = Math.min(px, size / 3);
        Group g = SymbolPainter.paint(s, px);
        g.getStyleClass().add("palette-symbol");
        // The symbol's outline sits about its origin; move it so the icon's box starts at 0, 0.
        g.setTranslateX(-b.minX() * px + (size - b.width() * px) / 2);
        g.setTranslateY(-b.minY() * px + (size - b.height() * px) / 2);
        Group holder = new Group(g);
        javafx.scene.shape.Rectangle frame = new javafx.scene.shape.Rectangle(size, size);
        frame.getStyleClass().add("palette-icon-frame");
        return new Group(frame, holder);
    }
}
