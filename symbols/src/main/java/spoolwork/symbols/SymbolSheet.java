package spoolwork.symbols;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;

import spoolwork.model.ComponentType;
import spoolwork.model.LineKind;
import spoolwork.model.Point;
import spoolwork.model.SpoolPosition;

/**
 * The review sheet: every component type in every variant, each with its name and port letters, and the
 * directional valves also drawn shifted into each of their other positions.
 */
public final class SymbolSheet {
    /** Width of the sheet before a row wraps, grid units. */
    static final double ROW_WIDTH = 150;

    private SymbolSheet() {
    }

    /** The entries of the review sheet, laid out in rows on grid points. */
    public static List<SvgWriter.Entry> entries() {
        List<Item> items = new ArrayList<>();
        for (ComponentType t : ComponentType.values()) {
            for (Map<String, String> v : SymbolLibrary.variants(t)) {
                items.add(new Item(SymbolLibrary.symbolFor(t, v, null), caption(t, v, null), t));
            }
            if (t.isDirectionalValve()) {
                for (Map<String, String> v : shiftedExamples(t)) {
                    for (SpoolPosition p : t.spoolPositions(v)) {
                        if (!p.name().equals(SpoolPosition.REST)) {
                            items.add(new Item(SymbolLibrary.symbolFor(t, v, p.name()), caption(t, v, p.name()), t));
                        }
                    }
                }
            }
        }
        items.addAll(transformExamples());
        items.addAll(lineLegend());
        return layout(items);
    }

    /** One pump and one valve turned and mirrored, to check that text stays upright and letters follow the ports. */
    private static List<Item> transformExamples() {
        List<Item> out = new ArrayList<>();
        for (ComponentType t : List.of(ComponentType.COMPENSATED_PUMP, ComponentType.DIRECTIONAL_4_3)) {
            Symbol base = SymbolLibrary.symbolFor(t, Map.of(), null);
            for (boolean m : new boolean[] {false, true}) {
                for (int r = m ? 0 : 90; r < 360; r += m ? 180 : 90) {
                    Symbol s = base.transformed(new Transform(r, m, 0, 0));
                    String tag = "rotated " + r + "°" + (m ? ", mirrored" : "");
                    out.add(new Item(new Symbol(s.key() + "/" + r + (m ? "m" : ""), s.shapes(), s.anchors(), s.bounds(),
                            s.hitAreas()), t.label() + ", " + tag, null));
                }
            }
        }
        return out;
    }

    /** The line conventions: the kinds of line, a joined tee with its dot, and a crossing without one. */
    private static List<Item> lineLegend() {
        List<Item> out = new ArrayList<>();
        List<Point> straight = List.of(new Point(0, 0), new Point(6, 0));
        for (LineKind k : List.of(LineKind.PRESSURE, LineKind.PILOT, LineKind.DRAIN, LineKind.SHAFT)) {
            String name = k == LineKind.PRESSURE ? "Working line" : k == LineKind.PILOT ? "Pilot line"
                    : k == LineKind.DRAIN ? "Drain line" : "Shaft";
            out.add(new Item(legend("line:" + k.key(), LineArt.line(straight, k)), name, null));
        }
        List<Shape> tee = new ArrayList<>(LineArt.line(List.of(new Point(0, 0), new Point(6, 0)), LineKind.PRESSURE));
        tee.addAll(LineArt.line(List.of(new Point(3, 0), new Point(3, 3)), LineKind.PRESSURE));
        tee.add(LineArt.junctionDot(new Point(3, 0)));
        out.add(new Item(legend("line:junction", tee), "Junction (joined)", null));
        List<Shape> cross = new ArrayList<>(LineArt.line(List.of(new Point(0, 0), new Point(6, 0)), LineKind.PRESSURE));
        cross.addAll(LineArt.line(List.of(new Point(3, -3), new Point(3, 3)), LineKind.PRESSURE));
        out.add(new Item(legend("line:crossing", cross), "Crossing (not joined)", null));
        out.add(new Item(legend("line:enclosure", List.of(LineArt.enclosure(new Box(0, 0, 6, 4)))), "Assembly outline", null));
        return out;
    }

    private static Symbol legend(String key, List<Shape> shapes) {
        Box b = null;
        for (Shape s : shapes) {
            b = b == null ? s.bounds() : b.union(s.bounds());
        }
        return new Symbol(key, shapes, List.of(), b, List.of(b));
    }

    /** The review sheet as an SVG document. */
    public static String svg() {
        return SvgWriter.sheet(entries(), "Spoolwork symbol library (ISO 1219-style), 1 grid unit = "
                + SvgWriter.n(SvgWriter.MM_PER_UNIT) + " mm");
    }

    private static List<Map<String, String>> shiftedExamples(ComponentType t) {
        return List.of(SymbolLibrary.variants(t).get(0));
    }

    private record Item(Symbol symbol, String caption, ComponentType type) {
        String group() {
            return type != null ? type.category().name() : symbol.key().startsWith("line:") ? "lines" : "transforms";
        }
    }

    private static List<SvgWriter.Entry> layout(List<Item> items) {
        List<SvgWriter.Entry> out = new ArrayList<>();
        double x = 0;
        double y = 0;
        double rowHeight = 0;
        String last = null;
        for (Item it : items) {
            Box b = it.symbol().bounds();
            double captionWidth = 0.45 * it.caption().length();
            double w = Math.ceil(Math.max(b.width(), captionWidth) + 3);
            double h = Math.ceil(b.height() + 4);
            String group = it.group();
            boolean newCategory = last != null && !last.equals(group);
            if (x > 0 && (x + w > ROW_WIDTH || newCategory)) {
                x = 0;
                y += rowHeight;
                rowHeight = 0;
            }
            // Origin on a grid point so the anchors stay on grid points.
            double ox = Math.ceil(x + (w - b.width()) / 2 - b.minX());
            double oy = Math.ceil(y + 1 - b.minY());
            out.add(new SvgWriter.Entry(it.symbol().transformed(Transform.translation(ox, oy)), it.caption(), true));
            x += w;
            rowHeight = Math.max(rowHeight, h);
            last = group;
        }
        return out;
    }

    static String caption(ComponentType t, Map<String, String> options, String shown) {
        StringBuilder b = new StringBuilder(t.label());
        for (String v : options.values()) {
            b.append(", ").append(v.replace('_', ' '));
        }
        if (shown != null) {
            b.append(" (shown in ").append(shown).append(")");
        }
        return b.toString();
    }
}
