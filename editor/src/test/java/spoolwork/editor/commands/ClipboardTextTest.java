package spoolwork.editor.commands;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.api.Test;

import spoolwork.editor.canvas.LibraryGeometry;
import spoolwork.model.Circuit;
import spoolwork.model.ComponentType;
import spoolwork.model.Endpoint;
import spoolwork.model.io.CircuitFileException;

class ClipboardTextTest {
    @Test
    void aCopiedFragmentReadsBackEqualAndOtherTextIsRefused() throws Exception {
        Edits edits = new Edits(new LibraryGeometry());
        Circuit c = edits.place(ComponentType.FIXED_PUMP, 10, 10).change().apply(Circuit.empty());
        c = edits.place(ComponentType.RESERVOIR, 10, 20).change().apply(c);
        c = edits.connect(Endpoint.port("c2", "S"), Endpoint.port("c1", "S")).change().apply(c);
        Circuit fragment = Edits.fragment(c, List.of("c1", "c2", "l1"));
        String text = ClipboardText.write(fragment);
        assertTrue(ClipboardText.isFragment(text));
        assertEquals(fragment, ClipboardText.read(text));
        assertFalse(ClipboardText.isFragment("P1 pump"));
        assertThrows(CircuitFileException.class, () -> ClipboardText.read("P1 pump"));
        CircuitFileException e = assertThrows(CircuitFileException.class,
                () -> ClipboardText.read(ClipboardText.MARK + "\n{\"format\": 5}"));
        assertTrue(e.getMessage().startsWith("clipboard"), e.getMessage());
    }
}
