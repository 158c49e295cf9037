package spoolwork.editor.settings;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.prefs.BackingStoreException;
import java.util.prefs.Preferences;

import javafx.beans.property.ObjectProperty;
import javafx.beans.property.SimpleObjectProperty;
import javafx.collections.FXCollections;
import javafx.collections.ObservableList;

import spoolwork.model.units.UnitSystem;

/**
 * What the editor remembers between runs: the unit system and the recently opened files. Stored with
 * java.util.prefs under a node that tests replace (system property {@code spoolwork.prefs}), so a test
 * run never touches a user's settings.
 */
public final class EditorSettings {
    private static final int RECENT_LIMIT = 8;
    private final Preferences prefs;
    private final ObjectProperty<UnitSystem> unitSystem = new SimpleObjectProperty<>(this, "unitSystem", UnitSystem.SI);
    private final ObservableList<Path> recent = FXCollections.observableArrayList();

    public EditorSettings(Preferences prefs) {
        this.prefs = prefs;
        unitSystem.set(UnitSystem.byKey(prefs.get("units", "si")).orElse(UnitSystem.SI));
        for (int i = 0; i < RECENT_LIMIT; i++) {
            String s = prefs.get("recent." + i, null);
            if (s != null) {
                recent.add(Path.of(s));
            }
        }
        unitSystem.addListener((o, a, b) -> {
            prefs.put("units", b.key());
            flush();
        });
    }

    /** The settings node of this user, or the one named by the {@code spoolwork.prefs} system property. */
    public static EditorSettings forUser() {
        String node = System.getProperty("spoolwork.prefs", "spoolwork/editor");
        return new EditorSettings(Preferences.userRoot().node(node));
    }

    public ObjectProperty<UnitSystem> unitSystemProperty() {
        return unitSystem;
    }

    public UnitSystem getUnitSystem() {
        return unitSystem.get();
    }

    public void setUnitSystem(UnitSystem s) {
        unitSystem.set(s);
    }

    /** Recently opened or saved files, newest first (live list). */
    public ObservableList<Path> recentFiles() {
        return recent;
    }

    public void remember(Path file) {
        Path abs = file.toAbsolutePath().normalize();
        List<Path> next = new ArrayList<>(recent);
        next.remove(abs);
        next.add(0, abs);
        while (next.size() > RECENT_LIMIT) {
            next.remove(next.size() - 1);
        }
        recent.setAll(next);
        for (int i = 0; i < RECENT_LIMIT; i++) {
            if (i < next.size()) {
                prefs.put("recent." + i, next.get(i).toString());
            } else {
                prefs.remove("recent." + i);
            }
        }
        flush();
    }

    public void forget(Path file) {
        List<Path> next = new ArrayList<>(recent);
        if (next.remove(file.toAbsolutePath().normalize())) {
            recent.setAll(next);
            prefs.remove("recent." + (next.size()));
            for (int i = 0; i < next.size(); i++) {
                prefs.put("recent." + i, next.get(i).toString());
            }
            flush();
        }
    }

    private void flush() {
        try {
            prefs.flush();
        } catch (BackingStoreException e) {
            // Settings are a convenience; losing them must not stop the editor.
        }
    }
}
