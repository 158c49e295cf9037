package spoolwork.symbols;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;

import spoolwork.model.ComponentType;
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
        return layout(items);
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
    }

    private static List<SvgWriter.Entry> layout(List<Item> items) {
        List<SvgWriter.Entry> out = new ArrayList<>();
        double x = 0;
        double y = 0;
        double rowHeight = 0;
        ComponentType last = null;
        for (Item it : items) {
            Box b = it.symbol().bounds();
            double captionWidth = 0.45 * it.caption().length();
            double w = Math.ceil(Math.max(b.width(), captionWidth) + 3);
            double h = Math.ceil(b.height() + 4);
            boolean newCategory = last != null && last.category() != it.type().category();
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
            last = it.type();
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
