package spoolwork.editor.palette;

import java.util.ArrayList;
import java.util.EnumMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;

import javafx.geometry.Pos;
import javafx.scene.control.Button;
import javafx.scene.control.Label;
import javafx.scene.control.ScrollPane;
import javafx.scene.control.TextField;
import javafx.scene.control.TitledPane;
import javafx.scene.control.Tooltip;
import javafx.scene.input.ClipboardContent;
import javafx.scene.input.Dragboard;
import javafx.scene.input.TransferMode;
import javafx.scene.layout.Priority;
import javafx.scene.layout.VBox;

import spoolwork.editor.canvas.ComponentArt;
import spoolwork.editor.canvas.SheetView;
import spoolwork.model.Category;
import spoolwork.model.ComponentType;

/**
 * The symbol palette: every catalogue type grouped by trade category, with a search box. Clicking an
 * entry arms it (the next click on the sheet places it); dragging an entry onto the sheet places it
 * where it is dropped.
 */
public final class PalettePane extends VBox {
    private final TextField search = new TextField();
    private final VBox groups = new VBox(2);
    private final Map<Category, TitledPane> panes = new EnumMap<>(Category.class);
    private final Map<ComponentType, Button> entries = new java.util.HashMap<>();
    private final Label lines = new Label();
    private final Label none = new Label("Nothing matches");

    public PalettePane(ComponentArt art, SheetView sheet) {
        getStyleClass().add("palette");
        setId("palette");
        Label title = new Label("Symbols");
        title.getStyleClass().add("panel-title");
        search.setPromptText("Search symbols");
        search.setId("palette-search");
        search.textProperty().addListener((o, a, b) -> filter(b));
        for (Category cat : Category.values()) {
            VBox list = new VBox(1);
            for (ComponentType t : ComponentType.values()) {
                if (t.category() != cat) {
                    continue;
                }
                Button b = new Button(t.label(), art.icon(t, 30));
                b.getStyleClass().add("palette-entry");
                b.setId("palette-" + t.key());
                b.setMaxWidth(Double.MAX_VALUE);
                b.setAlignment(Pos.CENTER_LEFT);
                b.setGraphicTextGap(8);
                b.setWrapText(true);
                b.setFocusTraversable(false);
                Tooltip tip = new Tooltip(t.label() + " — ports " + String.join(", ",
                        t.ports().stream().map(p -> p.name()).toList()) + ". Click, then click on the sheet; or drag it there.");
                tip.setWrapText(true);
                tip.setMaxWidth(320);
                b.setTooltip(tip);
                b.setOnAction(e -> sheet.armedProperty().set(sheet.armedProperty().get() == t ? null : t));
                b.setOnDragDetected(e -> {
                    Dragboard db = b.startDragAndDrop(TransferMode.COPY);
                    ClipboardContent cc = new ClipboardContent();
                    cc.putString(SheetView.DRAG_PREFIX + t.key());
                    db.setContent(cc);
                    e.consume();
                });
                list.getChildren().add(b);
                entries.put(t, b);
            }
            TitledPane p = new TitledPane(cat.label(), list);
            p.setAnimated(false);
            p.getStyleClass().add("palette-group");
            panes.put(cat, p);
            groups.getChildren().add(p);
        }
        lines.setText("Lines and junctions: drag from a port to another port to draw a line; drop it on a line "
                + "to branch with a junction. Pilot, drain and return are chosen in the inspector.");
        lines.setWrapText(true);
        lines.getStyleClass().add("palette-hint");
        TitledPane linePane = new TitledPane("Lines and junctions", lines);
        linePane.setAnimated(false);
        linePane.setExpanded(false);
        linePane.getStyleClass().add("palette-group");
        groups.getChildren().add(linePane);
        none.setVisible(false);
        none.setManaged(false);
        groups.getChildren().add(none);
        ScrollPane scroll = new ScrollPane(groups);
        scroll.setFitToWidth(true);
        scroll.setHbarPolicy(ScrollPane.ScrollBarPolicy.NEVER);
        VBox.setVgrow(scroll, Priority.ALWAYS);
        getChildren().addAll(title, search, scroll);
        sheet.armedProperty().addListener((o, a, b) -> entries.forEach((t, btn) -> {
            btn.getStyleClass().remove("armed");
            if (t == b) {
                btn.getStyleClass().add("armed");
            }
        }));
    }

    /** Shows only entries whose name, category or tag prefix contains every word of the query. */
    void filter(String query) {
        String[] words = query.toLowerCase(Locale.ROOT).trim().split("\\s+");
        boolean any = false;
        for (Map.Entry<Category, TitledPane> e : panes.entrySet()) {
            List<ComponentType> shown = new ArrayList<>();
            for (Map.Entry<ComponentType, Button> en : entries.entrySet()) {
                if (en.getKey().category() != e.getKey()) {
                    continue;
                }
                String hay = (en.getKey().label() + " " + e.getKey().label() + " " + en.getKey().key().replace('_', ' '))
                        .toLowerCase(Locale.ROOT);
                boolean match = true;
                for (String w : words) {
                    if (!w.isEmpty() && !hay.contains(w)) {
                        match = false;
                    }
                }
                en.getValue().setVisible(match);
                en.getValue().setManaged(match);
                if (match) {
                    shown.add(en.getKey());
                }
            }
            boolean visible = !shown.isEmpty();
            e.getValue().setVisible(visible);
            e.getValue().setManaged(visible);
            if (visible && !query.isBlank()) {
                e.getValue().setExpanded(true);
            }
            any |= visible;
        }
        none.setVisible(!any);
        none.setManaged(!any);
    }

    public TextField searchField() {
        return search;
    }
}
