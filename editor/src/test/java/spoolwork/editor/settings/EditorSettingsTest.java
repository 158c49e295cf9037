package spoolwork.editor.settings;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.nio.file.Path;
import java.util.prefs.Preferences;

import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.Test;

import spoolwork.model.units.UnitSystem;

class EditorSettingsTest {
    private final Preferences node = Preferences.userRoot().node("spoolwork/test-settings-" + System.nanoTime());

    @AfterEach
    void clean() throws Exception {
        node.removeNode();
    }

    @Test
    void unitSystemAndRecentFilesAreRememberedBetweenRuns() {
        EditorSettings first = new EditorSettings(node);
        assertEquals(UnitSystem.SI, first.getUnitSystem());
        first.setUnitSystem(UnitSystem.US);
        for (int i = 0; i < 10; i++) {
            first.remember(Path.of("/tmp/circuit" + i + ".spool.json"));
        }
        first.remember(Path.of("/tmp/circuit3.spool.json"));
        EditorSettings next = new EditorSettings(node);
        assertEquals(UnitSystem.US, next.getUnitSystem());
        assertEquals(8, next.recentFiles().size(), "the list is bounded");
        assertEquals(Path.of("/tmp/circuit3.spool.json"), next.recentFiles().get(0), "reopened file moves to the top");
        assertEquals(Path.of("/tmp/circuit9.spool.json"), next.recentFiles().get(1));
        next.forget(Path.of("/tmp/circuit9.spool.json"));
        assertEquals(7, new EditorSettings(node).recentFiles().size());
    }
}
