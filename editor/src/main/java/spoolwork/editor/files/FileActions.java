package spoolwork.editor.files;

import java.io.IOException;
import java.nio.file.Path;
import java.util.function.Consumer;
import java.util.function.Supplier;

import javafx.stage.Window;

import spoolwork.editor.document.EditorDocument;
import spoolwork.editor.settings.EditorSettings;
import spoolwork.model.Circuit;
import spoolwork.model.io.CircuitFileException;
import spoolwork.model.io.CircuitFiles;

/**
 * New, Open, Save and Save As over the document, with the model's atomic save and a question before
 * unsaved work would be lost. A file that cannot be read leaves the open document as it was.
 */
public final class FileActions {
    private final EditorDocument doc;
    private final EditorSettings settings;
    private final Dialogs dialogs;
    private final Supplier<Window> owner;
    private final Consumer<String> notice;
    private final Runnable opened;

    /**
     * @param notice receives a one-line report for the messages panel
     * @param opened runs after a document was replaced (to fit the view)
     */
    public FileActions(EditorDocument doc, EditorSettings settings, Dialogs dialogs, Supplier<Window> owner,
                       Consumer<String> notice, Runnable opened) {
        this.doc = doc;
        this.settings = settings;
        this.dialogs = dialogs;
        this.owner = owner;
        this.notice = notice;
        this.opened = opened;
    }

    /** The name shown in the window title: the file name, or the drawing title for a new document. */
    public String documentName() {
        Path f = doc.getFile();
        if (f != null && f.getFileName() != null) {
            return f.getFileName().toString();
        }
        String t = doc.getCircuit().title().title();
        return t.isBlank() ? "Untitled circuit" : t;
    }

    public boolean newDocument() {
        if (!confirmDiscard()) {
            return false;
        }
        doc.replace(Circuit.empty(), null);
        opened.run();
        return true;
    }

    public boolean open() {
        if (!confirmDiscard()) {
            return false;
        }
        Path folder = doc.getFile() != null ? doc.getFile().toAbsolutePath().getParent() : null;
        return dialogs.chooseOpen(owner.get(), folder).map(this::load).orElse(false);
    }

    /** Opens a recent file, asking first about unsaved work. */
    public boolean openRecent(Path file) {
        if (!java.nio.file.Files.exists(file)) {
            settings.forget(file);
            notice.accept("Could not open " + file.getFileName() + ": the file is no longer there");
            return false;
        }
        return confirmDiscard() && load(file);
    }

    /** Reads the file into the document without asking; on failure reports it and keeps the document. */
    public boolean load(Path file) {
        try {
            Circuit c = CircuitFiles.load(file);
            doc.replace(c, file.toAbsolutePath());
            settings.remember(file);
            notice.accept("Opened " + file.getFileName());
            opened.run();
            return true;
        } catch (CircuitFileException e) {
            notice.accept("Could not open " + e.getMessage());
            dialogs.error(owner.get(), "Could not open " + file.getFileName(), e.getMessage());
            return false;
        }
    }

    public boolean save() {
        if (doc.getFile() == null) {
            return saveAs();
        }
        return write(doc.getFile());
    }

    public boolean saveAs() {
        Path folder = doc.getFile() != null ? doc.getFile().toAbsolutePath().getParent() : null;
        String suggested = doc.getFile() != null ? doc.getFile().getFileName().toString()
                : safeName(documentName()) + CircuitFiles.EXTENSION;
        return dialogs.chooseSave(owner.get(), folder, suggested).map(p -> {
            Path target = p.getFileName().toString().contains(".") ? p
                    : p.resolveSibling(p.getFileName() + CircuitFiles.EXTENSION);
            return write(target);
        }).orElse(false);
    }

    private static String safeName(String s) {
        String n = s.replaceAll("[^A-Za-z0-9 _.-]", "").strip();
        return n.isEmpty() ? "circuit" : n;
    }

    private boolean write(Path file) {
        try {
            CircuitFiles.save(doc.getCircuit(), file);
            doc.markSaved(file.toAbsolutePath());
            settings.remember(file);
            notice.accept("Saved " + file.getFileName());
            return true;
        } catch (IOException e) {
            notice.accept("Could not save " + file.getFileName() + ": " + e.getMessage());
            dialogs.error(owner.get(), "Could not save " + file.getFileName(),
                    e.getMessage() + "\nThe file on disk is unchanged.");
            return false;
        }
    }

    /** True when there is no unsaved work, or the user saved it or chose to let it go. */
    public boolean confirmDiscard() {
        if (!doc.isDirty()) {
            return true;
        }
        switch (dialogs.askUnsaved(owner.get(), documentName())) {
            case SAVE:
                return save();
            case DISCARD:
                return true;
            default:
                return false;
        }
    }
}
