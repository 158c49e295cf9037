package spoolwork.editor.canvas;

import java.util.ArrayList;
import java.util.List;

import javafx.geometry.VPos;
import javafx.scene.Node;
import javafx.scene.shape.Line;
import javafx.scene.shape.Rectangle;
import javafx.scene.text.Font;
import javafx.scene.text.FontWeight;
import javafx.scene.text.Text;

import spoolwork.editor.geometry.Box;
import spoolwork.model.TitleBlock;

/** The sheet's border and the title block in its lower right corner, as nodes in sheet pixels. */
final class SheetFrame {
    private SheetFrame() {
    }

    static List<Node> nodes(Box sheet, TitleBlock t, double w, double h, double px) {
        List<Node> out = new ArrayList<>();
        Rectangle border = new Rectangle((sheet.minX() + 1) * px, (sheet.minY() + 1) * px,
                (sheet.width() - 2) * px, (sheet.height() - 2) * px);
        border.getStyleClass().add("sheet-border");
        out.add(border);
        double x0 = sheet.maxX() - 1 - w;
        double y0 = sheet.maxY() - 1 - h;
        Rectangle box = new Rectangle(x0 * px, y0 * px, w * px, h * px);
        box.getStyleClass().add("title-box");
        out.add(box);
        // Rows: title across the top half; then number | revision, drawn by | date.
        double rowH = h / 4;
        out.add(rule(x0, y0 + 2 * rowH, x0 + w, y0 + 2 * rowH, px));
        out.add(rule(x0, y0 + 3 * rowH, x0 + w, y0 + 3 * rowH, px));
        double split = x0 + w * 0.62;
        out.add(rule(split, y0 + 2 * rowH, split, y0 + h, px));
        out.add(field("Title", t.title().isEmpty() ? "Untitled circuit" : t.title(), x0, y0, w, 2 * rowH, 1.9, px));
        out.add(field("Drawing no.", t.drawingNumber(), x0, y0 + 2 * rowH, split - x0, rowH, 1.15, px));
        out.add(field("Revision", t.revision(), split, y0 + 2 * rowH, x0 + w - split, rowH, 1.15, px));
        out.add(field("Drawn by", t.drawnBy(), x0, y0 + 3 * rowH, split - x0, rowH, 1.15, px));
        out.add(field("Date", t.date(), split, y0 + 3 * rowH, x0 + w - split, rowH, 1.15, px));
        Text mark = new Text("Spoolwork hydraulic circuit");
        mark.getStyleClass().add("title-caption");
        mark.setFont(Font.font("SansSerif", 0.8 * px));
        mark.setTextOrigin(VPos.BOTTOM);
        mark.setX((x0 + w) * px - mark.getLayoutBounds().getWidth() - 0.5 * px);
        mark.setY((y0 + 2 * rowH) * px - 0.4 * px);
        out.add(mark);
        return out;
    }

    private static Line rule(double x1, double y1, double x2, double y2, double px) {
        Line l = new Line(x1 * px, y1 * px, x2 * px, y2 * px);
        l.getStyleClass().add("title-rule");
        return l;
    }

    private static Node field(String caption, String value, double x, double y, double w, double h, double size, double px) {
        Text c = new Text(caption);
        c.getStyleClass().add("title-caption");
        c.setFont(Font.font("SansSerif", 0.8 * px));
        c.setTextOrigin(VPos.TOP);
        c.setX((x + 0.5) * px);
        c.setY((y + 0.3) * px);
        Text v = new Text(value);
        v.getStyleClass().add("title-value");
        v.setFont(Font.font("SansSerif", size > 1.5 ? FontWeight.BOLD : FontWeight.NORMAL, size * px));
        v.setTextOrigin(VPos.BOTTOM);
        v.setX((x + 0.5) * px);
        v.setY((y + h - 0.35) * px);
        javafx.scene.shape.Rectangle clip = new javafx.scene.shape.Rectangle(x * px, y * px, w * px, h * px);
        javafx.scene.Group g = new javafx.scene.Group(c, v);
        g.setClip(clip);
        return g;
    }
}
