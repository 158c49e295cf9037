package spoolwork.editor.gui;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

import javafx.stage.Window;

import spoolwork.editor.files.Dialogs;

/** Answers the editor's file questions from fields set by the test, and records what was asked. */
final class FakeDialogs implements Dialogs {
    Path nextOpen;
    Path nextSave;
    Unsaved answer = Unsaved.CANCEL;
    final List<String> asked = new ArrayList<>();
    final List<String> errors = new ArrayList<>();

    @Override
    public Optional<Path> chooseOpen(Window owner, Path folder) {
        return Optional.ofNullable(nextOpen);
    }

    @Override
    public Optional<Path> chooseSave(Window owner, Path folder, String suggestedName) {
        return Optional.ofNullable(nextSave);
    }

    @Override
    public Unsaved askUnsaved(Window owner, String documentName) {
        asked.add(documentName);
        return answer;
    }

    @Override
    public void error(Window owner, String heading, String detail) {
        errors.add(heading + ": " + detail);
    }
}
