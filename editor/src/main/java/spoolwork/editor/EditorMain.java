package spoolwork.editor;

import javafx.application.Application;
import javafx.scene.Scene;
import javafx.scene.control.Menu;
import javafx.scene.control.MenuBar;
import javafx.scene.layout.BorderPane;
import javafx.scene.layout.Pane;
import javafx.stage.Stage;

/** The JavaFX application: the editor window. */
public final class EditorMain extends Application {

    public static void launchEditor(String[] args) {
        Application.launch(EditorMain.class, args);
    }

    @Override
    public void start(Stage stage) {
        BorderPane root = new BorderPane();
        root.setTop(new MenuBar(new Menu("File"), new Menu("Edit"), new Menu("View")));
        root.setCenter(new Pane());
        stage.setTitle("Spoolwork");
        stage.setScene(new Scene(root, 1200, 800));
        stage.show();
    }
}
