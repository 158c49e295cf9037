package spoolwork.editor.inspector;

import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.function.Consumer;

import javafx.scene.Node;
import javafx.scene.control.CheckBox;
import javafx.scene.control.ComboBox;
import javafx.scene.control.Label;
import javafx.scene.control.ScrollPane;
import javafx.scene.control.TextArea;
import javafx.scene.control.TextField;
import javafx.scene.control.Tooltip;
import javafx.scene.layout.ColumnConstraints;
import javafx.scene.layout.GridPane;
import javafx.scene.layout.Priority;
import javafx.scene.layout.VBox;
import javafx.util.Duration;

import spoolwork.editor.commands.Command;
import spoolwork.editor.commands.Edits;
import spoolwork.editor.document.EditorDocument;
import spoolwork.editor.document.Selection;
import spoolwork.editor.settings.EditorSettings;
import spoolwork.model.Circuit;
import spoolwork.model.Component;
import spoolwork.model.Line;
import spoolwork.model.LineKind;
import spoolwork.model.ModelException;
import spoolwork.model.Note;
import spoolwork.model.OptionSpec;
import spoolwork.model.ParameterSpec;
import spoolwork.model.Quantity;
import spoolwork.model.TitleBlock;
import spoolwork.model.units.UnitSystem;
import spoolwork.model.units.Units;

/**
 * The inspector: the values of the one selected component, line or note, or the title block when
 * nothing is selected. It rebuilds only when the selection changes or the inspected element's value
 * changes, so an inline error stays visible after a refused edit.
 */
public final class InspectorPane extends VBox {
    private final EditorDocument doc;
    private final Selection selection;
    private final EditorSettings settings;
    private final Consumer<String> refused;
    private final VBox body = new VBox(6);
    private Object shown = new Object();
    private UnitSystem shownSystem;

    /** @param refused receives the message of an edit the model refused, for the messages panel */
    public InspectorPane(EditorDocument doc, Selection selection, EditorSettings settings, Consumer<String> refused) {
        this.doc = doc;
        this.selection = selection;
        this.settings = settings;
        this.refused = refused;
        getStyleClass().add("inspector");
        setId("inspector");
        Label title = new Label("Inspector");
        title.getStyleClass().add("panel-title");
        body.getStyleClass().add("inspector-body");
        ScrollPane scroll = new ScrollPane(body);
        scroll.setFitToWidth(true);
        VBox.setVgrow(scroll, Priority.ALWAYS);
        getChildren().addAll(title, scroll);
        doc.revisionProperty().addListener((o, a, b) -> refresh());
        selection.revisionProperty().addListener((o, a, b) -> refresh());
        settings.unitSystemProperty().addListener((o, a, b) -> refresh());
        refresh();
    }

    private void refresh() {
        Circuit c = doc.getCircuit();
        Object target;
        if (selection.size() == 1) {
            String id = selection.ordered().get(0);
            target = c.component(id).map(Object.class::cast)
                    .or(() -> c.line(id).map(Object.class::cast))
                    .or(() -> c.note(id).map(Object.class::cast))
                    .or(() -> c.junction(id).map(Object.class::cast))
                    .orElse(c.title());
        } else if (selection.isEmpty()) {
            target = c.title();
        } else {
            target = selection.size();
        }
        if (target.equals(shown) && settings.getUnitSystem() == shownSystem) {
            return;
        }
        shown = target;
        shownSystem = settings.getUnitSystem();
        body.getChildren().clear();
        if (target instanceof Component k) {
            showComponent(k);
        } else if (target instanceof Line l) {
            showLine(l);
        } else if (target instanceof Note n) {
            showNote(n);
        } else if (target instanceof TitleBlock t) {
            showTitle(t);
        } else if (target instanceof spoolwork.model.Junction j) {
            body.getChildren().add(heading("Junction", "where " + doc.getCircuit().linesAt(j.id()).size() + " lines meet"));
        } else {
            body.getChildren().add(heading(target + " items selected", "select one item to see its values"));
        }
    }

    private Node heading(String main, String sub) {
        Label a = new Label(main);
        a.getStyleClass().add("inspector-heading");
        Label b = new Label(sub);
        b.getStyleClass().add("inspector-sub");
        b.setWrapText(true);
        return new VBox(2, a, b);
    }

    private GridPane grid() {
        GridPane g = new GridPane();
        g.setHgap(8);
        g.setVgap(6);
        ColumnConstraints c0 = new ColumnConstraints();
        c0.setMinWidth(110);
        c0.setMaxWidth(140);
        ColumnConstraints c1 = new ColumnConstraints();
        c1.setHgrow(Priority.ALWAYS);
        c1.setFillWidth(true);
        g.getColumnConstraints().addAll(c0, c1);
        return g;
    }

    private static String words(String key) {
        String s = key.replace('_', ' ');
        return s.substring(0, 1).toUpperCase(Locale.ROOT) + s.substring(1);
    }

    private boolean run(Command cmd) {
        try {
            return doc.execute(cmd);
        } catch (ModelException e) {
            refused.accept(e.getMessage());
            throw e;
        }
    }

    private void showComponent(Component k) {
        body.getChildren().add(heading(k.tag(), k.type().label()));
        GridPane g = grid();
        int row = 0;
        TextField tag = new TextField(k.tag());
        tag.setId("field-tag");
        Label tagError = new Label();
        tagError.getStyleClass().add("field-error");
        tagError.setVisible(false);
        tagError.setManaged(false);
        tag.setOnAction(e -> {
            if (tag.getText().strip().equals(k.tag())) {
                return;
            }
            try {
                run(Edits.setTag(k.id(), tag.getText()));
            } catch (ModelException ex) {
                tagError.setText(ex.getMessage());
                tagError.setVisible(true);
                tagError.setManaged(true);
                tag.getStyleClass().add("invalid");
            }
        });
        tag.setOnKeyPressed(e -> {
            if (e.getCode() == javafx.scene.input.KeyCode.ESCAPE) {
                tag.setText(k.tag());
                tagError.setVisible(false);
                tagError.setManaged(false);
                tag.getStyleClass().remove("invalid");
                e.consume();
            }
        });
        tag.focusedProperty().addListener((o, was, now) -> {
            if (!now && tag.getScene() != null) {
                tag.getOnAction().handle(null);
            }
        });
        addRow(g, row++, "Tag", new VBox(2, tag, tagError), "the label on the drawing, unique in the circuit");
        for (Map.Entry<String, ParameterSpec> e : k.type().params().entrySet()) {
            ParameterSpec spec = e.getValue();
            UnitField f = valueField(spec.quantity(), k.param(e.getKey()), spec.min(), spec.max(),
                    si -> run(Edits.setParam(k.id(), e.getKey(), si)));
            f.textField().setId("param-" + e.getKey());
            addRow(g, row++, words(e.getKey()), f, help(k, spec));
        }
        for (Map.Entry<String, OptionSpec> e : k.type().options().entrySet()) {
            ComboBox<String> box = new ComboBox<>();
            box.getItems().addAll(e.getValue().choices().stream().map(s -> s.replace('_', ' ')).toList());
            box.setValue(k.option(e.getKey()).replace('_', ' '));
            box.setId("option-" + e.getKey());
            box.setMaxWidth(Double.MAX_VALUE);
            box.setOnAction(ev -> {
                String choice = box.getValue().replace(' ', '_');
                if (!choice.equals(k.option(e.getKey()))) {
                    run(Edits.setOption(k.id(), e.getKey(), choice));
                }
            });
            addRow(g, row++, words(e.getKey()), box, e.getValue().meaning());
        }
        UnitSystem sys = settings.getUnitSystem();
        TextField rated = new TextField(k.ratedPressure() == null ? "" : Units.format(k.ratedPressure(), Quantity.PRESSURE, sys));
        rated.setPromptText("not given");
        rated.setId("field-rated-pressure");
        Label ratedError = new Label();
        ratedError.getStyleClass().add("field-error");
        ratedError.setVisible(false);
        ratedError.setManaged(false);
        rated.setOnAction(ev -> {
            String t = rated.getText().strip();
            try {
                Double v = t.isEmpty() ? null : Units.parse(t, Quantity.PRESSURE, sys);
                if (v != null && !(v > 0 && v <= 5000e5)) {
                    throw new ModelException("rated pressure", "must be above 0 and at most "
                            + Units.format(5000e5, Quantity.PRESSURE, sys));
                }
                run(Edits.setRatedPressure(k.id(), v));
            } catch (IllegalArgumentException | ModelException ex) {
                ratedError.setText(ex.getMessage());
                ratedError.setVisible(true);
                ratedError.setManaged(true);
            }
        });
        addRow(g, row++, "Rated pressure", new VBox(2, rated, ratedError),
                "maximum pressure the part is rated for; leave empty when not known");
        body.getChildren().add(g);
        Label ports = new Label("Ports: " + String.join(", ", k.type().ports().stream()
                .map(p -> p.name() + " (" + p.meaning() + ")").toList()));
        ports.setWrapText(true);
        ports.getStyleClass().add("inspector-sub");
        body.getChildren().add(ports);
    }

    private String help(Component k, ParameterSpec spec) {
        UnitSystem sys = settings.getUnitSystem();
        StringBuilder sb = new StringBuilder(spec.meaning().substring(0, 1).toUpperCase(Locale.ROOT) + spec.meaning().substring(1));
        sb.append(".\nAccepted: ").append(Units.format(spec.min(), spec.quantity(), sys)).append(" to ")
                .append(Units.format(spec.max(), spec.quantity(), sys)).append("; default ")
                .append(Units.format(spec.defaultValue(), spec.quantity(), sys)).append('.');
        TypicalValues.of(k.type(), spec.key()).ifPresent(t -> sb.append("\nTypical: ").append(t)
                .append(" (common practice)."));
        sb.append("\nAny unit may be typed, e.g. ").append(example(spec.quantity())).append('.');
        return sb.toString();
    }

    private static String example(Quantity q) {
        return switch (q) {
            case PRESSURE -> "\"120 bar\" or \"1740 psi\"";
            case FLOW -> "\"30 L/min\" or \"8 gpm\"";
            case LENGTH -> "\"63 mm\" or \"2.5 in\"";
            case DISPLACEMENT -> "\"16 cm³/rev\" or \"1 in³/rev\"";
            case SPEED -> "\"1450 rpm\"";
            case POWER -> "\"7.5 kW\" or \"10 hp\"";
            default -> "a number with its unit";
        };
    }

    private UnitField valueField(Quantity q, double value, double min, double max, java.util.function.DoubleConsumer commit) {
        UnitSystem sys = settings.getUnitSystem();
        return new UnitField(q, sys, value, si -> {
            if (!(si >= min && si <= max)) {
                return "must be between " + Units.format(min, q, sys) + " and " + Units.format(max, q, sys);
            }
            return null;
        }, commit);
    }

    private void addRow(GridPane g, int row, String label, Node field, String help) {
        Label l = new Label(label);
        l.getStyleClass().add("field-label");
        l.setWrapText(true);
        Tooltip tip = new Tooltip(help);
        tip.setWrapText(true);
        tip.setMaxWidth(360);
        tip.setShowDelay(Duration.millis(350));
        tip.setShowDuration(Duration.seconds(30));
        l.setTooltip(tip);
        if (field instanceof javafx.scene.control.Control ctl) {
            ctl.setTooltip(tip);
        } else if (field instanceof UnitField uf) {
            uf.textField().setTooltip(tip);
        } else if (field instanceof VBox v && !v.getChildren().isEmpty()
                && v.getChildren().get(0) instanceof javafx.scene.control.Control ctl) {
            ctl.setTooltip(tip);
        }
        g.add(l, 0, row);
        g.add(field, 1, row);
        GridPane.setFillWidth(field, true);
    }

    private void showLine(Line l) {
        body.getChildren().add(heading("Line " + l.id(), describe(l)));
        GridPane g = grid();
        int row = 0;
        ComboBox<LineKind> kind = new ComboBox<>();
        kind.getItems().addAll(l.kind() == LineKind.SHAFT ? List.of(LineKind.SHAFT)
                : List.of(LineKind.PRESSURE, LineKind.RETURN, LineKind.SUCTION, LineKind.PILOT, LineKind.DRAIN));
        kind.setValue(l.kind());
        kind.setId("line-kind");
        kind.setMaxWidth(Double.MAX_VALUE);
        kind.setConverter(new javafx.util.StringConverter<>() {
            @Override
            public String toString(LineKind k) {
                return k == null ? "" : words(k.key());
            }

            @Override
            public LineKind fromString(String s) {
                return LineKind.byKey(s.toLowerCase(Locale.ROOT)).orElse(LineKind.PRESSURE);
            }
        });
        kind.setOnAction(e -> {
            if (kind.getValue() != l.kind()) {
                run(Edits.changeLine(l.id(), x -> x.withKind(kind.getValue()), "kind"));
            }
        });
        addRow(g, row++, "Kind", kind, "what the line carries: working lines solid, pilot and drain dashed");
        if (l.kind() != LineKind.SHAFT) {
            UnitField d = valueField(Quantity.LENGTH, l.diameter(), Line.MIN_DIAMETER, Line.MAX_DIAMETER,
                    si -> run(Edits.changeLine(l.id(), x -> x.withSize(si, x.length()), "diameter")));
            d.textField().setId("line-diameter");
            addRow(g, row++, "Inner diameter", d, "bore of the pipe or hose, for the pressure loss.\n"
                    + "Typical velocities: suction 0.6–1.2 m/s, return 2–4 m/s, pressure 2–6 m/s (common practice).");
            // A run of pipe is read in metres or feet, not in the millimetres or inches of a bore.
            UnitSystem sys = settings.getUnitSystem();
            spoolwork.model.units.Unit runUnit = Units.find(Quantity.LENGTH, sys == UnitSystem.US ? "ft" : "m").orElseThrow();
            UnitField len = new UnitField(Quantity.LENGTH, runUnit, l.length(), si -> si > 0 && si <= Line.MAX_LENGTH ? null
                    : "must be above 0 and at most " + Units.format(Line.MAX_LENGTH, runUnit),
                    si -> run(Edits.changeLine(l.id(), x -> x.withSize(x.diameter(), si), "length")));
            len.textField().setId("line-length");
            addRow(g, row++, "Length", len, "run of the pipe or hose on the machine, for the pressure loss; "
                    + "the drawn length does not count");
            CheckBox ideal = new CheckBox("no pressure loss");
            ideal.setSelected(l.ideal());
            ideal.setId("line-ideal");
            ideal.setOnAction(e -> run(Edits.changeLine(l.id(), x -> x.withIdeal(ideal.isSelected()), "loss")));
            addRow(g, row++, "Ideal", ideal, "treat the line as having no pressure loss");
        }
        body.getChildren().add(g);
    }

    private String describe(Line l) {
        Circuit c = doc.getCircuit();
        return "from " + endName(c, l.from()) + " to " + endName(c, l.to()) + "; drag one of its runs sideways to move it";
    }

    private static String endName(Circuit c, spoolwork.model.Endpoint e) {
        if (e instanceof spoolwork.model.Endpoint.PortRef p) {
            return c.component(p.componentId()).map(k -> k.tag() + "." + p.port()).orElse(p.toString());
        }
        return "a junction";
    }

    private void showNote(Note n) {
        body.getChildren().add(heading("Note", "text on the sheet; Ctrl+Enter or leaving the box keeps it"));
        TextArea text = new TextArea(n.text());
        text.setId("note-text");
        text.setWrapText(true);
        text.setPrefRowCount(6);
        Runnable commit = () -> {
            if (!text.getText().equals(n.text()) && doc.getCircuit().note(n.id()).isPresent()) {
                run(Edits.setNoteText(n.id(), text.getText()));
            }
        };
        text.focusedProperty().addListener((o, was, now) -> {
            if (!now) {
                commit.run();
            }
        });
        text.setOnKeyPressed(e -> {
            if (e.isShortcutDown() && e.getCode() == javafx.scene.input.KeyCode.ENTER) {
                commit.run();
            }
        });
        body.getChildren().add(text);
    }

    private void showTitle(TitleBlock t) {
        body.getChildren().add(heading("Drawing", "the title block on the sheet; select an item to see its values"));
        GridPane g = grid();
        String[][] fields = {{"Title", t.title()}, {"Drawing no.", t.drawingNumber()}, {"Revision", t.revision()},
                {"Drawn by", t.drawnBy()}, {"Date", t.date()}};
        TextField[] boxes = new TextField[fields.length];
        for (int i = 0; i < fields.length; i++) {
            TextField f = new TextField(fields[i][1]);
            f.setId("title-" + i);
            boxes[i] = f;
            Runnable commit = () -> {
                TitleBlock next = new TitleBlock(boxes[0].getText(), boxes[1].getText(), boxes[2].getText(),
                        boxes[3].getText(), boxes[4].getText());
                if (!next.equals(doc.getCircuit().title())) {
                    run(Edits.setTitle(next));
                }
            };
            f.setOnAction(e -> commit.run());
            f.focusedProperty().addListener((o, was, now) -> {
                if (!now) {
                    commit.run();
                }
            });
            addRow(g, i, fields[i][0], f, i == 4 ? "date of the drawing, ISO 8601 (2026-12-01)" : "shown in the title block");
        }
        body.getChildren().add(g);
        Circuit c = doc.getCircuit();
        Label count = new Label(c.components().size() + " components, " + c.lines().size() + " lines, "
                + c.junctions().size() + " junctions, " + c.notes().size() + " notes");
        count.getStyleClass().add("inspector-sub");
        count.setWrapText(true);
        body.getChildren().add(count);
    }
}
