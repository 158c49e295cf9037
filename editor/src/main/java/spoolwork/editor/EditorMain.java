package spoolwork.editor;

import javafx.application.Application;
import javafx.stage.Stage;

import spoolwork.editor.files.FxDialogs;
import spoolwork.editor.settings.EditorSettings;
import spoolwork.editor.window.EditorWindow;

/** The JavaFX application: one editor window, opening the file named on the command line if given. */
public final class EditorMain extends Application {

    public static void launchEditor(String[] args) {
        Application.launch(EditorMain.class, args);
    }

    @Override
    public void start(Stage stage) {
        EditorWindow w = new EditorWindow(stage, EditorSettings.forUser(), new FxDialogs());
        stage.show();
        w.openOnStart(getParameters().getRaw());
    }
}
