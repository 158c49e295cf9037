package spoolwork.symbols;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

import spoolwork.model.ComponentType;
import spoolwork.model.Point;
import spoolwork.model.SpoolPosition;
import spoolwork.model.SpoolPosition.FlowPath;

/**
 * Directional valves: one 4 × 4 envelope per spool position, side by side, left envelope first as the
 * model lists them. The ports stay fixed on the symbol (anchors at y = ±3) and the row of envelopes slides
 * so that the envelope of the shown position meets them; its centre is always the origin. Actuators sit
 * at the outer ends of the row, springs and detents beside them.
 */
final class DirectionalValveSymbols {
    static final double SIZE = 4;
    private static final double HALF = SIZE / 2;

    private DirectionalValveSymbols() {
    }

    /** Port positions relative to the centre of an envelope, on its top (y = −2) or bottom (y = 2) edge. */
    static Map<String, Point> portPositions(ComponentType type) {
        Map<String, Point> m = new HashMap<>();
        switch (type) {
            case DIRECTIONAL_2_2:
                m.put("P", Draw.p(0, HALF));
                m.put("A", Draw.p(0, -HALF));
                break;
            case DIRECTIONAL_3_2:
                m.put("P", Draw.p(-1, HALF));
                m.put("T", Draw.p(1, HALF));
                m.put("A", Draw.p(-1, -HALF));
                break;
            default:
                m.put("P", Draw.p(-1, HALF));
                m.put("T", Draw.p(1, HALF));
                m.put("A", Draw.p(-1, -HALF));
                m.put("B", Draw.p(1, -HALF));
        }
        return m;
    }

    static Draw valve(ComponentType type, Map<String, String> options, String shown) {
        List<SpoolPosition> positions = type.spoolPositions(options);
        int s = indexOf(positions, shown);
        Map<String, Point> ports = portPositions(type);
        Draw d = new Draw();
        for (int i = 0; i < positions.size(); i++) {
            double cx = (i - s) * SIZE;
            d.rect(cx - HALF, -HALF, cx + HALF, HALF);
            envelope(d, cx, positions.get(i), ports);
        }
        for (var e : ports.entrySet()) {
            Point p = e.getValue();
            double ay = Math.signum(p.y()) * (HALF + 1);
            d.port(e.getKey(), p.x(), p.y(), p.x(), ay, ay < 0 ? Direction.UP : Direction.DOWN);
        }
        ends(d, options, positions.size() == 3, -s * SIZE - HALF, (positions.size() - 1 - s) * SIZE + HALF);
        return d;
    }

    static int indexOf(List<SpoolPosition> positions, String shown) {
        String want = shown == null ? SpoolPosition.REST : shown;
        for (int i = 0; i < positions.size(); i++) {
            if (positions.get(i).name().equals(want)) {
                return i;
            }
        }
        List<String> names = new ArrayList<>();
        positions.forEach(p -> names.add(p.name()));
        throw new IllegalArgumentException("no spool position '" + want + "'; the valve has " + names);
    }

    /** The inside of one envelope: arrows for single paths, joined lines with a dot where three or more ports meet, tees for blocked ports. */
    private static void envelope(Draw d, double cx, SpoolPosition pos, Map<String, Point> ports) {
        Map<String, String> root = new HashMap<>();
        for (FlowPath f : pos.paths()) {
            union(root, f.from(), f.to());
        }
        Map<String, List<String>> groups = new java.util.TreeMap<>();
        for (FlowPath f : pos.paths()) {
            for (String port : List.of(f.from(), f.to())) {
                List<String> g = groups.computeIfAbsent(find(root, port), k -> new ArrayList<>());
                if (!g.contains(port)) {
                    g.add(port);
                }
            }
        }
        for (List<String> g : groups.values()) {
            if (g.size() == 2) {
                FlowPath f = pos.paths().stream()
                        .filter(p -> g.contains(p.from()) && g.contains(p.to())).findFirst().orElseThrow();
                path(d, cx, at(ports, f.from()), at(ports, f.to()));
            } else {
                joined(d, cx, g, ports);
            }
        }
        for (String b : new java.util.TreeSet<>(pos.blocked())) {
            Point p = at(ports, b);
            d.tee(cx + p.x(), p.y(), -Math.signum(p.y()) * 0.7);
        }
    }

    private static Point at(Map<String, Point> ports, String name) {
        Point p = ports.get(name);
        if (p == null) {
            throw new IllegalStateException("no drawn position for port " + name);
        }
        return p;
    }

    /** One flow path: straight or slanted across the envelope, or a loop when both ports are on one edge. */
    private static void path(Draw d, double cx, Point from, Point to) {
        if (Math.signum(from.y()) != Math.signum(to.y())) {
            d.arrow(cx + from.x(), from.y(), cx + to.x(), to.y());
        } else {
            double turn = from.y() * 0.4;
            d.line(cx + from.x(), from.y(), cx + from.x(), turn, cx + to.x(), turn, cx + to.x(), from.y() * 0.75);
            d.head(cx + to.x(), to.y(), cx + to.x(), turn);
        }
    }

    /** Three or more ports joined: lines to one node with a connection dot. */
    private static void joined(Draw d, double cx, List<String> group, Map<String, Point> ports) {
        int top = 0;
        int bottom = 0;
        for (String g : group) {
            if (ports.get(g).y() < 0) {
                top++;
            } else {
                bottom++;
            }
        }
        double nx = 0;
        for (String g : group) {
            Point p = ports.get(g);
            boolean lone = (p.y() < 0 && top == 1) || (p.y() > 0 && bottom == 1);
            if (lone && top != bottom) {
                nx = p.x();
            }
        }
        for (String g : group) {
            Point p = ports.get(g);
            d.line(cx + p.x(), p.y(), cx + nx, 0);
        }
        d.dot(cx + nx, 0, 0.18);
    }

    private static void union(Map<String, String> root, String a, String b) {
        String ra = find(root, a);
        String rb = find(root, b);
        if (!ra.equals(rb)) {
            root.put(ra.compareTo(rb) < 0 ? rb : ra, ra.compareTo(rb) < 0 ? ra : rb);
        }
    }

    private static String find(Map<String, String> root, String a) {
        String r = a;
        while (root.containsKey(r) && !root.get(r).equals(r)) {
            r = root.get(r);
        }
        return r;
    }

    private enum Item { LEVER, SOLENOID, PILOT, SPRING, DETENT }

    /** The actuators, springs and detents at the two ends of the envelope row. */
    private static void ends(Draw d, Map<String, String> options, boolean threePosition, double left, double right) {
        String act = options.getOrDefault("actuation", "solenoid");
        String ret = options.getOrDefault("return", threePosition ? "spring_centred" : "spring");
        Item actuator = "manual".equals(act) ? Item.LEVER : "pilot".equals(act) ? Item.PILOT : Item.SOLENOID;
        boolean detent = "detent".equals(ret);
        List<Item> l = new ArrayList<>();
        List<Item> r = new ArrayList<>();
        l.add(actuator);
        if (actuator != Item.LEVER && (threePosition || detent)) {
            r.add(actuator);
        }
        if (detent) {
            r.add(Item.DETENT);
        } else {
            if (threePosition) {
                l.add(Item.SPRING);
            }
            r.add(Item.SPRING);
        }
        end(d, l, left, -1);
        end(d, r, right, 1);
    }

    private static void end(Draw d, List<Item> items, double edge, int out) {
        boolean stacked = items.size() > 1;
        for (int i = 0; i < items.size(); i++) {
            double yc = stacked ? (i == 0 ? -0.95 : 0.95) : 0;
            double h = stacked ? 0.55 : 0.75;
            item(d, items.get(i), edge, out, yc, h);
        }
    }

    private static void item(Draw d, Item item, double e, int o, double yc, double h) {
        switch (item) {
            case SOLENOID:
                d.rect(Math.min(e, e + o * 1.1), yc - h, Math.max(e, e + o * 1.1), yc + h);
                d.line(e, yc + h, e + o * 1.1, yc - h);
                break;
            case LEVER:
                d.line(e, yc, e + o * 0.5, yc);
                d.line(e + o * 0.5, yc + 0.5, e + o * 1.1, yc - 1.0);
                d.circle(e + o * 1.19, yc - 1.22, 0.22);
                break;
            case PILOT:
                d.stroke(Stroke.PILOT, e + o * 1.9, yc, e + o * 0.7, yc);
                d.fill(e, yc, e + o * 0.7, yc - 0.35, e + o * 0.7, yc + 0.35);
                break;
            case SPRING:
                d.spring(e, yc, e + o * 1.8, yc, Math.min(0.45, h * 0.75), 5);
                break;
            case DETENT:
                d.line(e, yc, e + o * 0.4, yc, e + o * 0.6, yc + 0.3, e + o * 0.8, yc,
                        e + o * 1.0, yc, e + o * 1.2, yc + 0.3, e + o * 1.4, yc, e + o * 1.7, yc);
                d.line(e + o * 1.2, yc - 0.8, e + o * 1.2, yc + 0.2);
                d.line(e + o * 0.95, yc - 0.8, e + o * 1.45, yc - 0.8);
                break;
            default:
                throw new IllegalStateException(item.name());
        }
    }
}
