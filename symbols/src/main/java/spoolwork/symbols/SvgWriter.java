package spoolwork.symbols;

import java.util.List;
import java.util.Locale;

import spoolwork.model.Point;
import spoolwork.model.PortSpec;
import spoolwork.symbols.Shape.Arc;
import spoolwork.symbols.Shape.Circle;
import spoolwork.symbols.Shape.Polygon;
import spoolwork.symbols.Shape.Polyline;
import spoolwork.symbols.Shape.Text;

/**
 * Writes symbols as SVG: user units are grid units, and the document size is given in millimetres at
 * {@link #MM_PER_UNIT} per grid unit, so a 1:1 print has the symbol sizes of a drawing. Monochrome line art:
 * black strokes of one weight, black fills. Each symbol is one {@code <g class="symbol">} group.
 */
public final class SvgWriter {
    /** Printed size of one grid unit, mm. */
    public static final double MM_PER_UNIT = 2.5;
    /** Stroke width, grid units (0.25 mm at print). */
    public static final double STROKE = 0.1;
    /** Cap height of port letters, grid units. */
    public static final double PORT_LETTER = 0.7;

    private SvgWriter() {
    }

    /** A sheet entry: a symbol already placed in sheet coordinates, with a caption drawn under it (may be empty). */
    public record Entry(Symbol symbol, String caption, boolean portLetters) {
    }

    /** One symbol as a standalone SVG document, about its own origin, with its port letters. */
    public static String symbol(Symbol s) {
        Box view = s.bounds().grow(1);
        StringBuilder b = new StringBuilder();
        open(b, view);
        group(b, s, "symbol-0", true);
        b.append("</svg>\n");
        return b.toString();
    }

    /** A whole sheet: every entry as its own group, its caption beneath, and an optional title at the top left. */
    public static String sheet(List<Entry> entries, String title) {
        Box view = null;
        for (Entry e : entries) {
            Box bx = e.symbol().bounds().grow(1.2);
            if (!e.caption().isEmpty()) {
                bx = bx.union(captionBox(e));
            }
            view = view == null ? bx : view.union(bx);
        }
        if (view == null) {
            view = new Box(0, 0, 10, 10);
        }
        if (title != null && !title.isEmpty()) {
            view = view.union(new Box(view.minX(), view.minY() - 3, view.maxX(), view.maxY()));
        }
        view = view.grow(1);
        StringBuilder b = new StringBuilder();
        open(b, view);
        if (title != null && !title.isEmpty()) {
            text(b, new Text(new Point(view.minX() + 1, view.minY() + 1.5), title, 1.2, Shape.TextAnchor.START), "title");
        }
        int i = 0;
        for (Entry e : entries) {
            group(b, e.symbol(), "symbol-" + i++, e.portLetters());
            if (!e.caption().isEmpty()) {
                Box bb = e.symbol().bounds();
                text(b, new Text(new Point(bb.centre().x(), bb.maxY() + 1.3), e.caption(), 0.6, Shape.TextAnchor.MIDDLE), "caption");
            }
        }
        b.append("</svg>\n");
        return b.toString();
    }

    /**
     * A circuit drawing as an SVG document: one group per symbol (with its tag and port letters), the lines in
     * a group of their own, junction dots and notes.
     */
    public static String circuit(CircuitDrawing drawing) {
        Box view = drawing.bounds().grow(2);
        StringBuilder b = new StringBuilder();
        open(b, view);
        b.append("<g class=\"lines\" fill=\"none\" stroke=\"black\" stroke-width=\"").append(n(STROKE))
                .append("\" stroke-linejoin=\"round\">\n");
        for (Shape s : drawing.lines()) {
            shape(b, s);
        }
        for (Shape s : drawing.dots()) {
            shape(b, s);
        }
        b.append("</g>\n");
        for (int i = 0; i < drawing.symbols().size(); i++) {
            group(b, drawing.symbols().get(i), "symbol-" + i, true);
            text(b, drawing.tags().get(i), "tag");
        }
        for (Text t : drawing.notes()) {
            text(b, t, "note");
        }
        b.append("</svg>\n");
        return b.toString();
    }

    private static Box captionBox(Entry e) {
        Box bb = e.symbol().bounds();
        return new Text(new Point(bb.centre().x(), bb.maxY() + 1.3), e.caption(), 0.6, Shape.TextAnchor.MIDDLE).bounds();
    }

    private static void open(StringBuilder b, Box view) {
        b.append("<?xml version=\"1.0\" encoding=\"UTF-8\"?>\n");
        b.append("<svg xmlns=\"http://www.w3.org/2000/svg\" version=\"1.1\"")
                .append(" width=\"").append(n(view.width() * MM_PER_UNIT)).append("mm\"")
                .append(" height=\"").append(n(view.height() * MM_PER_UNIT)).append("mm\"")
                .append(" viewBox=\"").append(n(view.minX())).append(' ').append(n(view.minY())).append(' ')
                .append(n(view.width())).append(' ').append(n(view.height())).append("\">\n");
        b.append("<rect x=\"").append(n(view.minX())).append("\" y=\"").append(n(view.minY()))
                .append("\" width=\"").append(n(view.width())).append("\" height=\"").append(n(view.height()))
                .append("\" fill=\"white\"/>\n");
    }

    /** Appends one symbol as a group with the given id; port letters beside each fluid port when asked. */
    public static void group(StringBuilder b, Symbol s, String id, boolean portLetters) {
        b.append("<g class=\"symbol\" id=\"").append(esc(id)).append("\" data-key=\"").append(esc(s.key()))
                .append("\" fill=\"none\" stroke=\"black\" stroke-width=\"").append(n(STROKE))
                .append("\" stroke-linejoin=\"round\">\n");
        for (Shape sh : s.shapes()) {
            shape(b, sh);
        }
        if (portLetters) {
            for (Anchor a : s.anchors()) {
                if (!a.port().equals(PortSpec.SHAFT)) {
                    text(b, portLetter(a), "port");
                }
            }
        }
        b.append("</g>\n");
    }

    /** Where the letter of a port goes: just inside the anchor, beside the line. */
    static Text portLetter(Anchor a) {
        Direction o = a.outward();
        double x = a.at().x() - o.dx() * 0.45;
        double y = a.at().y() - o.dy() * 0.45;
        if (o.dx() == 0) {
            x += 0.45;
            return new Text(new Point(x, y), a.port(), PORT_LETTER, Shape.TextAnchor.START);
        }
        y -= 0.55;
        return new Text(new Point(x, y), a.port(), PORT_LETTER, Shape.TextAnchor.MIDDLE);
    }

    private static void shape(StringBuilder b, Shape sh) {
        if (sh instanceof Polyline p) {
            b.append(p.closed() ? "<polygon" : "<polyline").append(" points=\"");
            points(b, p.points());
            b.append('"');
            dash(b, p.stroke());
            b.append("/>\n");
        } else if (sh instanceof Polygon p) {
            b.append("<polygon points=\"");
            points(b, p.points());
            b.append('"');
            if (p.filled()) {
                b.append(" fill=\"black\" stroke-width=\"").append(n(STROKE / 2)).append('"');
            }
            b.append("/>\n");
        } else if (sh instanceof Circle c) {
            b.append("<circle cx=\"").append(n(c.centre().x())).append("\" cy=\"").append(n(c.centre().y()))
                    .append("\" r=\"").append(n(c.radius())).append('"');
            if (c.filled()) {
                b.append(" fill=\"black\" stroke=\"none\"");
            } else {
                dash(b, c.stroke());
            }
            b.append("/>\n");
        } else if (sh instanceof Arc a) {
            Point s = a.start();
            Point e = a.end();
            b.append("<path d=\"M ").append(n(s.x())).append(' ').append(n(s.y()))
                    .append(" A ").append(n(a.radius())).append(' ').append(n(a.radius())).append(" 0 ")
                    .append(Math.abs(a.sweepDeg()) > 180 ? 1 : 0).append(' ').append(a.sweepDeg() > 0 ? 1 : 0)
                    .append(' ').append(n(e.x())).append(' ').append(n(e.y())).append('"');
            dash(b, a.stroke());
            b.append("/>\n");
        } else if (sh instanceof Text t) {
            text(b, t, null);
        }
    }

    private static void text(StringBuilder b, Text t, String cls) {
        String anchor = t.anchor() == Shape.TextAnchor.START ? "start" : t.anchor() == Shape.TextAnchor.END ? "end" : "middle";
        b.append("<text");
        if (cls != null) {
            b.append(" class=\"").append(cls).append('"');
        }
        // The reference point is the vertical middle of the capitals: the baseline sits half a cap height below.
        b.append(" x=\"").append(n(t.at().x())).append("\" y=\"").append(n(t.at().y() + t.size() / 2))
                .append("\" font-family=\"sans-serif\" font-size=\"").append(n(t.size() / 0.72))
                .append("\" text-anchor=\"").append(anchor).append("\" fill=\"black\" stroke=\"none\">")
                .append(esc(t.text())).append("</text>\n");
    }

    private static void dash(StringBuilder b, Stroke s) {
        double[] d = s.dashes();
        if (d.length == 0) {
            return;
        }
        b.append(" stroke-dasharray=\"");
        for (int i = 0; i < d.length; i++) {
            b.append(i == 0 ? "" : " ").append(n(d[i]));
        }
        b.append('"');
    }

    private static void points(StringBuilder b, List<Point> pts) {
        for (int i = 0; i < pts.size(); i++) {
            b.append(i == 0 ? "" : " ").append(n(pts.get(i).x())).append(',').append(n(pts.get(i).y()));
        }
    }

    /** A number with at most three decimals and no trailing zeros, locale-independent. */
    static String n(double v) {
        double r = Math.round(v * 1000) / 1000.0;
        if (r == 0) {
            return "0";
        }
        String s = String.format(Locale.ROOT, "%.3f", r);
        s = s.replaceAll("0+$", "");
        return s.endsWith(".") ? s.substring(0, s.length() - 1) : s;
    }

    static String esc(String s) {
        return s.replace("&", "&amp;").replace("<", "&lt;").replace(">", "&gt;").replace("\"", "&quot;");
    }
}
