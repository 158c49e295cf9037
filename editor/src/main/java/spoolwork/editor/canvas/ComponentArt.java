package spoolwork.editor.canvas;

import javafx.scene.Node;

import spoolwork.model.Component;
import spoolwork.model.ComponentType;

/** Draws components for the sheet and the palette; the drawing itself comes from the symbol library. */
public interface ComponentArt {

    /** The component's symbol, turned and mirrored, about its own origin, at {@code px} pixels per grid unit. */
    Node paint(Component c, double px);

    /** A small picture of the type with default options, fitted into a square of {@code size} pixels. */
    Node icon(ComponentType type, double size);
}
