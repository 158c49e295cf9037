package spoolwork.editor;

import spoolwork.editor.cli.Cli;

/**
 * Entry point of the runnable jar. It must not extend a JavaFX class: with no sub-command it opens the
 * editor (loading JavaFX only then); with a sub-command it runs headless and never touches JavaFX.
 */
public final class Launcher {
    private Launcher() {
    }

    public static void main(String[] args) {
        if (Cli.isSubcommand(args)) {
            System.exit(Cli.run(args));
        }
        EditorMain.launchEditor(args);
    }
}
