package spoolwork.editor.files;

import java.io.File;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Optional;

import javafx.scene.control.Alert;
import javafx.scene.control.ButtonBar;
import javafx.scene.control.ButtonType;
import javafx.stage.FileChooser;
import javafx.stage.Window;

import spoolwork.model.io.CircuitFiles;

/** The file questions asked with the platform's file chooser and plain alerts. */
public final class FxDialogs implements Dialogs {
    private static FileChooser chooser(String title, Path folder) {
        FileChooser fc = new FileChooser();
        fc.setTitle(title);
        fc.getExtensionFilters().addAll(
                new FileChooser.ExtensionFilter("Circuits (*" + CircuitFiles.EXTENSION + ")", "*" + CircuitFiles.EXTENSION),
                new FileChooser.ExtensionFilter("All files", "*"));
        if (folder != null && Files.isDirectory(folder)) {
            fc.setInitialDirectory(folder.toFile());
        }
        return fc;
    }

    @Override
    public Optional<Path> chooseOpen(Window owner, Path folder) {
        File f = chooser("Open circuit", folder).showOpenDialog(owner);
        return Optional.ofNullable(f).map(File::toPath);
    }

    @Override
    public Optional<Path> chooseSave(Window owner, Path folder, String suggestedName) {
        FileChooser fc = chooser("Save circuit", folder);
        fc.setInitialFileName(suggestedName);
        File f = fc.showSaveDialog(owner);
        return Optional.ofNullable(f).map(File::toPath);
    }

    @Override
    public Unsaved askUnsaved(Window owner, String documentName) {
        ButtonType save = new ButtonType("Save", ButtonBar.ButtonData.YES);
        ButtonType discard = new ButtonType("Don't save", ButtonBar.ButtonData.NO);
        ButtonType cancel = new ButtonType("Cancel", ButtonBar.ButtonData.CANCEL_CLOSE);
        Alert a = new Alert(Alert.AlertType.CONFIRMATION, "", save, discard, cancel);
        a.initOwner(owner);
        a.setTitle("Unsaved changes");
        a.setHeaderText("\"" + documentName + "\" has changes that are not saved.");
        a.setContentText("Save them before going on?");
        ButtonType r = a.showAndWait().orElse(cancel);
        return r == save ? Unsaved.SAVE : r == discard ? Unsaved.DISCARD : Unsaved.CANCEL;
    }

    @Override
    public void error(Window owner, String heading, String detail) {
        Alert a = new Alert(Alert.AlertType.ERROR);
        a.initOwner(owner);
        a.setTitle("Spoolwork");
        a.setHeaderText(heading);
        a.setContentText(detail);
        a.showAndWait();
    }
}
