package spoolwork.editor.window;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Set;

import javafx.application.Platform;
import javafx.beans.binding.Bindings;
import javafx.collections.ListChangeListener;
import javafx.geometry.Insets;
import javafx.geometry.Orientation;
import javafx.scene.Node;
import javafx.scene.Scene;
import javafx.scene.control.Button;
import javafx.scene.control.Label;
import javafx.scene.control.Menu;
import javafx.scene.control.MenuBar;
import javafx.scene.control.MenuItem;
import javafx.scene.control.RadioMenuItem;
import javafx.scene.control.Separator;
import javafx.scene.control.SeparatorMenuItem;
import javafx.scene.control.SplitPane;
import javafx.scene.control.TextInputControl;
import javafx.scene.control.ToggleGroup;
import javafx.scene.control.ToolBar;
import javafx.scene.control.Tooltip;
import javafx.scene.input.Clipboard;
import javafx.scene.input.ClipboardContent;
import javafx.scene.input.DataFormat;
import javafx.scene.input.KeyCode;
import javafx.scene.input.KeyCodeCombination;
import javafx.scene.input.KeyCombination;
import javafx.scene.layout.BorderPane;
import javafx.scene.layout.HBox;
import javafx.scene.layout.Priority;
import javafx.scene.layout.Region;
import javafx.scene.layout.VBox;
import javafx.stage.Stage;

import spoolwork.editor.canvas.LibraryArt;
import spoolwork.editor.canvas.LibraryGeometry;
import spoolwork.editor.canvas.SheetView;
import spoolwork.editor.commands.ClipboardText;
import spoolwork.editor.commands.Command;
import spoolwork.editor.commands.Edits;
import spoolwork.editor.document.EditorDocument;
import spoolwork.editor.document.Selection;
import spoolwork.editor.files.Dialogs;
import spoolwork.editor.files.FileActions;
import spoolwork.editor.inspector.InspectorPane;
import spoolwork.editor.messages.MessagesPane;
import spoolwork.editor.palette.PalettePane;
import spoolwork.editor.settings.EditorSettings;
import spoolwork.model.Circuit;
import spoolwork.model.ModelException;
import spoolwork.model.io.CircuitFileException;
import spoolwork.model.units.UnitSystem;

/**
 * The editor window: menu bar and toolbar on top, the palette on the left, the sheet in the middle, the
 * inspector on the right, messages below the sheet and a status bar at the foot. Owns one document.
 */
public final class EditorWindow {
    /** The clipboard format of copied drawing parts. */
    public static final DataFormat FRAGMENT_FORMAT = lookupOrCreate("application/x-spoolwork-fragment");

    private static DataFormat lookupOrCreate(String mime) {
        DataFormat f = DataFormat.lookupMimeType(mime);
        return f != null ? f : new DataFormat(mime);
    }

    private final Stage stage;
    private final EditorSettings settings;
    private final EditorDocument doc = new EditorDocument();
    private final Selection selection = new Selection();
    private final LibraryGeometry geometry = new LibraryGeometry();
    private final Edits edits = new Edits(geometry);
    private final MessagesPane messages = new MessagesPane();
    private final SheetView sheet;
    private final InspectorPane inspector;
    private final PalettePane palette;
    private final FileActions files;
    private final BorderPane root = new BorderPane();
    private final Menu recentMenu = new Menu("Open recent");
    private String localClipboard;
    private int pasteCount;

    public EditorWindow(Stage stage, EditorSettings settings, Dialogs dialogs) {
        this.stage = stage;
        this.settings = settings;
        LibraryArt art = new LibraryArt(geometry);
        sheet = new SheetView(doc, selection, edits, art, this::refused);
        inspector = new InspectorPane(doc, selection, settings, m -> { });
        palette = new PalettePane(art, sheet);
        files = new FileActions(doc, settings, dialogs, () -> stage,
                m -> messages.notice(m.startsWith("Could not") ? MessagesPane.Level.ERROR : MessagesPane.Level.NOTE, "", m),
                () -> Platform.runLater(sheet::fitSheet));

        root.getStyleClass().add("editor-root");
        VBox top = new VBox(menuBar(), toolBar());
        root.setTop(top);
        SplitPane centre = new SplitPane(sheet, messages);
        centre.setOrientation(Orientation.VERTICAL);
        centre.setDividerPositions(0.82);
        SplitPane.setResizableWithParent(messages, false);
        palette.setPrefWidth(270);
        palette.setMinWidth(180);
        inspector.setPrefWidth(300);
        inspector.setMinWidth(220);
        SplitPane main = new SplitPane(palette, centre, inspector);
        main.setDividerPositions(0.19, 0.79);
        SplitPane.setResizableWithParent(palette, false);
        SplitPane.setResizableWithParent(inspector, false);
        root.setCenter(main);
        root.setBottom(statusBar());

        var screen = javafx.stage.Screen.getPrimary().getVisualBounds();
        Scene scene = new Scene(root, Math.min(1440, screen.getWidth() * 0.94), Math.min(900, screen.getHeight() * 0.92));
        var css = EditorWindow.class.getResource("/spoolwork/editor/editor.css");
        if (css != null) {
            scene.getStylesheets().add(css.toExternalForm());
        }
        scene.getAccelerators().put(new KeyCodeCombination(KeyCode.Z, KeyCombination.SHORTCUT_DOWN, KeyCombination.SHIFT_DOWN),
                () -> guarded(this::redo));
        scene.getAccelerators().put(new KeyCodeCombination(KeyCode.BACK_SPACE), () -> guarded(this::delete));
        stage.setScene(scene);
        stage.titleProperty().bind(Bindings.createStringBinding(
                () -> (doc.isDirty() ? "• " : "") + files.documentName() + " — Spoolwork",
                doc.dirtyProperty(), doc.fileProperty(), doc.revisionProperty()));
        stage.setOnCloseRequest(e -> {
            if (!files.confirmDiscard()) {
                e.consume();
            }
        });
        doc.revisionProperty().addListener((o, a, b) -> messages.check(doc.getCircuit()));
        messages.check(doc.getCircuit());
        messages.setOnPick(place -> doc.getCircuit().componentByTag(place).ifPresent(k -> selection.set(List.of(k.id()))));
        settings.recentFiles().addListener((ListChangeListener<Path>) c -> rebuildRecent());
        rebuildRecent();
    }

    public Stage stage() {
        return stage;
    }

    public EditorDocument document() {
        return doc;
    }

    public Selection selection() {
        return selection;
    }

    public SheetView sheet() {
        return sheet;
    }

    public Edits edits() {
        return edits;
    }

    public FileActions files() {
        return files;
    }

    public MessagesPane messages() {
        return messages;
    }

    public EditorSettings settings() {
        return settings;
    }

    private void refused(String message) {
        messages.notice(MessagesPane.Level.ERROR, "", "Not done: " + message);
    }

    // ------------------------------------------------------------------ menus

    private MenuBar menuBar() {
        Menu file = new Menu("File");
        file.getItems().addAll(
                item("New", "Ctrl+N", () -> files.newDocument()),
                item("Open…", "Ctrl+O", () -> files.open()),
                recentMenu,
                new SeparatorMenuItem(),
                item("Save", "Ctrl+S", () -> files.save()),
                item("Save as…", "Ctrl+Shift+S", () -> files.saveAs()),
                new SeparatorMenuItem(),
                item("Quit", "Ctrl+Q", this::quit));

        MenuItem undo = item("Undo", "Ctrl+Z", () -> guarded(this::undo));
        undo.disableProperty().bind(doc.canUndoProperty().not());
        undo.textProperty().bind(Bindings.createStringBinding(() -> doc.undoTextProperty().get().isEmpty() ? "Undo"
                : "Undo " + lower(doc.undoTextProperty().get()), doc.undoTextProperty()));
        MenuItem redo = item("Redo", "Ctrl+Y", () -> guarded(this::redo));
        redo.disableProperty().bind(doc.canRedoProperty().not());
        redo.textProperty().bind(Bindings.createStringBinding(() -> doc.redoTextProperty().get().isEmpty() ? "Redo"
                : "Redo " + lower(doc.redoTextProperty().get()), doc.redoTextProperty()));
        Menu edit = new Menu("Edit");
        edit.getItems().addAll(undo, redo, new SeparatorMenuItem(),
                item("Cut", "Ctrl+X", () -> guarded(this::cut)),
                item("Copy", "Ctrl+C", () -> guarded(this::copy)),
                item("Paste", "Ctrl+V", () -> guarded(this::paste)),
                item("Duplicate", "Ctrl+D", () -> guarded(this::duplicate)),
                item("Delete", "Delete", () -> guarded(this::delete)),
                item("Select all", "Ctrl+A", () -> guarded(this::selectAll)),
                new SeparatorMenuItem(),
                item("Rotate a quarter turn", "R", () -> guarded(this::rotate)),
                item("Mirror", "M", () -> guarded(this::mirror)),
                item("Route selected lines again", null, () -> guarded(this::reroute)),
                item("Add a note", "N", () -> guarded(() -> sheet.toolProperty().set(SheetView.Tool.NOTE))));

        ToggleGroup units = new ToggleGroup();
        RadioMenuItem si = new RadioMenuItem("SI units (bar, L/min, mm)");
        RadioMenuItem us = new RadioMenuItem("US customary units (psi, gpm, in)");
        si.setToggleGroup(units);
        us.setToggleGroup(units);
        si.setId("units-si");
        us.setId("units-us");
        (settings.getUnitSystem() == UnitSystem.US ? us : si).setSelected(true);
        si.setOnAction(e -> settings.setUnitSystem(UnitSystem.SI));
        us.setOnAction(e -> settings.setUnitSystem(UnitSystem.US));
        Menu view = new Menu("View");
        view.getItems().addAll(
                item("Zoom in", "Ctrl+Plus", sheet::zoomIn),
                item("Zoom out", "Ctrl+Minus", sheet::zoomOut),
                item("Fit the drawing", "Ctrl+0", sheet::fit),
                item("Whole sheet", null, sheet::fitSheet),
                new SeparatorMenuItem(), si, us);

        Menu help = new Menu("Help");
        help.getItems().add(item("Keys and pointer", "F1", this::showKeys));
        MenuBar bar = new MenuBar(file, edit, view, help);
        bar.setId("menu-bar");
        return bar;
    }

    private static String lower(String s) {
        return s.isEmpty() ? s : Character.toLowerCase(s.charAt(0)) + s.substring(1);
    }

    private MenuItem item(String text, String keys, Runnable action) {
        MenuItem m = new MenuItem(text);
        if (keys != null) {
            m.setAccelerator(KeyCombination.keyCombination(keys.replace("Ctrl", "Shortcut")));
        }
        m.setOnAction(e -> action.run());
        return m;
    }

    private void rebuildRecent() {
        recentMenu.getItems().clear();
        for (Path p : settings.recentFiles()) {
            MenuItem m = new MenuItem(p.getFileName() + "   " + (p.getParent() == null ? "" : p.getParent()));
            m.setMnemonicParsing(false);
            m.setOnAction(e -> files.openRecent(p));
            recentMenu.getItems().add(m);
        }
        if (recentMenu.getItems().isEmpty()) {
            MenuItem none = new MenuItem("No recent files");
            none.setDisable(true);
            recentMenu.getItems().add(none);
        }
    }

    private ToolBar toolBar() {
        Button note = button("Note", "Add a text note: click where it goes (N)", () -> sheet.toolProperty().set(SheetView.Tool.NOTE));
        Button undo = button("Undo", "Undo the last change (Ctrl+Z)", this::undo);
        undo.disableProperty().bind(doc.canUndoProperty().not());
        Button redo = button("Redo", "Redo (Ctrl+Y or Ctrl+Shift+Z)", this::redo);
        redo.disableProperty().bind(doc.canRedoProperty().not());
        Button rotate = button("Rotate", "Turn the selection a quarter turn (R)", this::rotate);
        Button mirror = button("Mirror", "Mirror the selection (M)", this::mirror);
        Button delete = button("Delete", "Delete the selection (Del)", this::delete);
        for (Button b : List.of(rotate, mirror, delete)) {
            b.disableProperty().bind(Bindings.createBooleanBinding(selection::isEmpty, selection.revisionProperty()));
        }
        ToolBar tb = new ToolBar(
                button("New", "New circuit (Ctrl+N)", () -> files.newDocument()),
                button("Open", "Open a circuit file (Ctrl+O)", () -> files.open()),
                button("Save", "Save (Ctrl+S)", () -> files.save()),
                new Separator(), undo, redo,
                new Separator(), rotate, mirror, delete, note,
                new Separator(),
                button("Fit", "Fit the drawing in the window (Ctrl+0)", sheet::fit));
        tb.setId("tool-bar");
        return tb;
    }

    private Button button(String text, String tip, Runnable action) {
        Button b = new Button(text);
        b.setTooltip(new Tooltip(tip));
        b.setOnAction(e -> action.run());
        b.setFocusTraversable(false);
        b.setId("tool-" + text.toLowerCase());
        return b;
    }

    private Node statusBar() {
        Label hint = new Label();
        hint.textProperty().bind(sheet.hintProperty());
        hint.setId("status-hint");
        Label sel = new Label();
        sel.textProperty().bind(Bindings.createStringBinding(() -> selection.isEmpty() ? "" : selection.size() + " selected",
                selection.revisionProperty()));
        Label pos = new Label();
        pos.textProperty().bind(Bindings.createStringBinding(() -> sheet.pointerProperty().get() == null ? ""
                : String.format("x %d  y %d", Math.round(sheet.pointerProperty().get().x()),
                Math.round(sheet.pointerProperty().get().y())), sheet.pointerProperty()));
        Label zoom = new Label();
        zoom.textProperty().bind(Bindings.createStringBinding(() -> Math.round(sheet.zoomProperty().get() * 100) + " %",
                sheet.zoomProperty()));
        Label units = new Label();
        units.textProperty().bind(Bindings.createStringBinding(() -> settings.getUnitSystem() == UnitSystem.US
                ? "US customary" : "SI", settings.unitSystemProperty()));
        Region gap = new Region();
        HBox.setHgrow(gap, Priority.ALWAYS);
        HBox bar = new HBox(18, hint, gap, sel, pos, zoom, units);
        bar.getStyleClass().add("status-bar");
        bar.setPadding(new Insets(3, 10, 3, 10));
        return bar;
    }

    private void showKeys() {
        javafx.scene.control.Alert a = new javafx.scene.control.Alert(javafx.scene.control.Alert.AlertType.INFORMATION);
        a.initOwner(stage);
        a.setTitle("Keys and pointer");
        a.setHeaderText("Drawing with Spoolwork");
        a.setContentText(String.join("\n",
                "Place: click a symbol, then click on the sheet (Shift keeps placing), or drag it onto the sheet.",
                "Connect: drag from a port to another port, a junction or onto a line (which makes a junction).",
                "Select: click; Shift+click adds; drag on empty sheet for an area.",
                "Move: drag a selected item; arrow keys nudge by one grid step (Shift: five).",
                "Edit a line: drag one of its runs sideways.",
                "R rotate, M mirror, Del delete, Ctrl+D duplicate, Ctrl+X/C/V cut, copy, paste, Ctrl+A select all.",
                "Ctrl+Z undo, Ctrl+Y or Ctrl+Shift+Z redo.",
                "Wheel zooms, Ctrl+0 fits the drawing; pan with the middle button or Space+drag."));
        a.show();
    }

    // ------------------------------------------------------------------ actions

    /** Runs an editing action unless a text field has the keyboard, where the key belongs to the field. */
    private void guarded(Runnable r) {
        Scene s = stage.getScene();
        if (s != null && s.getFocusOwner() instanceof TextInputControl) {
            return;
        }
        r.run();
    }

    private boolean run(Command c) {
        try {
            return doc.execute(c);
        } catch (ModelException e) {
            refused(e.getMessage());
            return false;
        }
    }

    public void undo() {
        doc.undo();
    }

    public void redo() {
        doc.redo();
    }

    public void delete() {
        if (!selection.isEmpty()) {
            run(edits.delete(selection.ordered()));
        }
    }

    public void rotate() {
        if (!selection.isEmpty()) {
            run(edits.rotate(selection.ordered()));
        }
    }

    public void mirror() {
        if (!selection.isEmpty()) {
            run(edits.mirror(selection.ordered()));
        }
    }

    public void reroute() {
        Circuit c = doc.getCircuit();
        Command all = null;
        for (String id : selection.ordered()) {
            if (c.line(id).isPresent()) {
                all = all == null ? edits.reroute(id) : all.then(edits.reroute(id));
            }
        }
        if (all != null) {
            run(all);
        }
    }

    public void selectAll() {
        Circuit c = doc.getCircuit();
        List<String> ids = new ArrayList<>();
        c.components().forEach(k -> ids.add(k.id()));
        c.junctions().forEach(j -> ids.add(j.id()));
        c.lines().forEach(l -> ids.add(l.id()));
        c.notes().forEach(n -> ids.add(n.id()));
        selection.set(ids);
    }

    public void duplicate() {
        if (selection.isEmpty()) {
            return;
        }
        Edits.Paste p = edits.duplicate(doc.getCircuit(), selection.ordered());
        if (run(p.command())) {
            selection.set(p.newIds());
        }
    }

    public void copy() {
        if (selection.isEmpty()) {
            return;
        }
        Circuit fragment = Edits.fragment(doc.getCircuit(), selection.ordered());
        String text = ClipboardText.write(fragment);
        localClipboard = text;
        pasteCount = 0;
        ClipboardContent cc = new ClipboardContent();
        cc.put(FRAGMENT_FORMAT, text);
        Clipboard.getSystemClipboard().setContent(cc);
    }

    public void cut() {
        if (selection.isEmpty()) {
            return;
        }
        copy();
        Command del = edits.delete(selection.ordered());
        run(new Command("Cut", del.change()));
    }

    public void paste() {
        String text = null;
        Clipboard cb = Clipboard.getSystemClipboard();
        if (cb.hasContent(FRAGMENT_FORMAT) && cb.getContent(FRAGMENT_FORMAT) instanceof String s) {
            text = s;
        }
        if (text == null) {
            text = localClipboard;
        }
        if (text == null) {
            return;
        }
        try {
            Circuit fragment = ClipboardText.read(text);
            pasteCount++;
            // Pasting where the parts came from would hide the copy under the original, so each paste steps aside.
            Set<String> present = Set.copyOf(doc.getCircuit().components().stream().map(k -> k.id()).toList());
            boolean sameSpot = fragment.components().stream().anyMatch(k -> present.contains(k.id()));
            double step = sameSpot ? 2 * pasteCount : 2 * (pasteCount - 1);
            Edits.Paste p = edits.paste(fragment, step, step, "Paste");
            if (run(p.command())) {
                selection.set(p.newIds());
            }
        } catch (CircuitFileException e) {
            refused(e.getMessage());
        }
    }

    private void quit() {
        if (files.confirmDiscard()) {
            stage.getScene().getWindow().hide();
            Platform.exit();
        }
    }

    /** Opens the file given on the command line, if any. */
    public void openOnStart(List<String> args) {
        for (String a : args) {
            if (!a.startsWith("-")) {
                files.load(Path.of(a));
                Platform.runLater(sheet::requestFocus);
                return;
            }
        }
        Platform.runLater(() -> {
            sheet.fitSheet();
            sheet.requestFocus();
        });
    }
}
