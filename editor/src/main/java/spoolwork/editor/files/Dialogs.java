package spoolwork.editor.files;

import java.nio.file.Path;
import java.util.Optional;

import javafx.stage.Window;

/** The questions the editor asks the user about files; tests answer them without a dialog. */
public interface Dialogs {
    /** What to do with unsaved work before it would be lost. */
    enum Unsaved { SAVE, DISCARD, CANCEL }

    Optional<Path> chooseOpen(Window owner, Path folder);

    Optional<Path> chooseSave(Window owner, Path folder, String suggestedName);

    Unsaved askUnsaved(Window owner, String documentName);

    void error(Window owner, String heading, String detail);
}
