package spoolwork.editor.canvas;

import java.util.ArrayList;
import java.util.List;

import javafx.geometry.VPos;
import javafx.scene.Group;
import javafx.scene.Node;
import javafx.scene.shape.ArcType;
import javafx.scene.shape.StrokeLineCap;
import javafx.scene.shape.StrokeLineJoin;
import javafx.scene.text.Font;
import javafx.scene.text.Text;
import javafx.scene.text.TextAlignment;

import spoolwork.model.Point;
import spoolwork.symbols.Shape;
import spoolwork.symbols.Stroke;
import spoolwork.symbols.Symbol;

/**
 * Turns a symbol's shapes (grid units) into JavaFX nodes at a given scale (pixels per grid unit). The
 * nodes carry style classes only for what CSS may change; the geometry comes from the symbol alone.
 */
public final class SymbolPainter {
    /** Stroke width of symbol outlines, grid units. */
    public static final double LINE_WEIGHT = 0.11;

    private SymbolPainter() {
    }

    /** The symbol's shapes as a group, at {@code px} pixels per grid unit, about the symbol's own origin. */
    public static Group paint(Symbol s, double px) {
        List<Node> nodes = new ArrayList<>(s.shapes().size());
        for (Shape sh : s.shapes()) {
            nodes.add(node(sh, px));
        }
        Group g = new Group(nodes);
        g.getStyleClass().add("symbol");
        return g;
    }

    static Node node(Shape sh, double px) {
        if (sh instanceof Shape.Polyline p) {
            javafx.scene.shape.Shape n;
            if (p.closed()) {
                javafx.scene.shape.Polygon poly = new javafx.scene.shape.Polygon(coords(p.points(), px));
                poly.getStyleClass().add("sym-open");
                n = poly;
            } else {
                javafx.scene.shape.Polyline pl = new javafx.scene.shape.Polyline(coords(p.points(), px));
                pl.getStyleClass().add("sym-open");
                n = pl;
            }
            stroke(n, p.stroke(), px);
            return n;
        }
        if (sh instanceof Shape.Polygon p) {
            javafx.scene.shape.Polygon poly = new javafx.scene.shape.Polygon(coords(p.points(), px));
            poly.getStyleClass().add(p.filled() ? "sym-filled" : "sym-open");
            stroke(poly, Stroke.SOLID, px);
            return poly;
        }
        if (sh instanceof Shape.Circle c) {
            javafx.scene.shape.Circle n = new javafx.scene.shape.Circle(c.centre().x() * px, c.centre().y() * px, c.radius() * px);
            n.getStyleClass().add(c.filled() ? "sym-filled" : "sym-open");
            stroke(n, c.stroke(), px);
            return n;
        }
        if (sh instanceof Shape.Arc a) {
            // JavaFX angles run counter-clockwise with y up; the symbol's run clockwise on the sheet.
            javafx.scene.shape.Arc n = new javafx.scene.shape.Arc(a.centre().x() * px, a.centre().y() * px,
                    a.radius() * px, a.radius() * px, -a.startDeg(), -a.sweepDeg());
            n.setType(ArcType.OPEN);
            n.getStyleClass().add("sym-open");
            stroke(n, a.stroke(), px);
            return n;
        }
        Shape.Text t = (Shape.Text) sh;
        Text n = new Text(t.text());
        n.setFont(Font.font("SansSerif", t.size() * px * 1.4));
        n.setTextOrigin(VPos.CENTER);
        n.getStyleClass().add("sym-text");
        double w = n.getLayoutBounds().getWidth();
        double x = t.at().x() * px;
        switch (t.anchor()) {
            case MIDDLE -> {
                x -= w / 2;
                n.setTextAlignment(TextAlignment.CENTER);
            }
            case END -> x -= w;
            default -> {
            }
        }
        n.setX(x);
        n.setY(t.at().y() * px);
        return n;
    }

    private static void stroke(javafx.scene.shape.Shape n, Stroke s, double px) {
        n.setStrokeWidth(LINE_WEIGHT * px);
        n.setStrokeLineCap(StrokeLineCap.BUTT);
        n.setStrokeLineJoin(StrokeLineJoin.MITER);
        for (double d : s.dashes()) {
            n.getStrokeDashArray().add(d * px);
        }
    }

    private static double[] coords(List<Point> pts, double px) {
        double[] out = new double[pts.size() * 2];
        for (int i = 0; i < pts.size(); i++) {
            out[2 * i] = pts.get(i).x() * px;
            out[2 * i + 1] = pts.get(i).y() * px;
        }
        return out;
    }
}
