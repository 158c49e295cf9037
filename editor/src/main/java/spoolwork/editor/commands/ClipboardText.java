package spoolwork.editor.commands;

import spoolwork.model.Circuit;
import spoolwork.model.io.CircuitFileException;
import spoolwork.model.io.CircuitFormat;

/**
 * The clipboard form of copied drawing parts: the circuit file format of a fragment (the copied elements
 * and the lines between them) behind a first line that marks it as ours, so pasting between documents and
 * between running editors works, and other text on the clipboard is never mistaken for a drawing.
 */
public final class ClipboardText {
    /** First line of a copied fragment. */
    public static final String MARK = "spoolwork-fragment 1";

    private ClipboardText() {
    }

    public static String write(Circuit fragment) {
        return MARK + "\n" + CircuitFormat.write(fragment);
    }

    /** True when the text looks like a copied fragment. */
    public static boolean isFragment(String text) {
        return text != null && text.startsWith(MARK + "\n");
    }

    /** @throws CircuitFileException when the text is not a readable fragment, naming the place */
    public static Circuit read(String text) throws CircuitFileException {
        if (!isFragment(text)) {
            throw new CircuitFileException("clipboard", "no copied drawing parts");
        }
        return CircuitFormat.read(text.substring(MARK.length() + 1), "clipboard");
    }
}
