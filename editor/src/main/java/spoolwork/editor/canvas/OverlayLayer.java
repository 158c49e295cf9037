package spoolwork.editor.canvas;

import java.util.HashMap;
import java.util.Map;

import javafx.scene.Group;
import javafx.scene.Node;

/**
 * The layer above the symbols where calculated values are shown. Entries are keyed by component tag or
 * line id, and the sheet places each at its anchor (beside the symbol, at the middle of the line's longest
 * run) whenever the drawing changes. Empty until a calculation fills it.
 */
public final class OverlayLayer extends Group {
    private final Map<String, Node> byTag = new HashMap<>();
    private final Map<String, Node> byLine = new HashMap<>();

    OverlayLayer() {
        getStyleClass().add("overlay");
        setMouseTransparent(true);
    }

    /** Shows a node beside the component with the tag (replacing what was there). */
    public void showAtComponent(String tag, Node n) {
        put(byTag, tag, n);
    }

    /** Shows a node at the middle of the line's longest run (replacing what was there). */
    public void showAtLine(String lineId, Node n) {
        put(byLine, lineId, n);
    }

    public void clearAll() {
        byTag.clear();
        byLine.clear();
        getChildren().clear();
    }

    Map<String, Node> componentEntries() {
        return byTag;
    }

    Map<String, Node> lineEntries() {
        return byLine;
    }

    private void put(Map<String, Node> m, String key, Node n) {
        Node old = m.put(key, n);
        if (old != null) {
            getChildren().remove(old);
        }
        getChildren().add(n);
    }
}
