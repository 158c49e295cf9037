package spoolwork.editor.geometry;

import java.util.ArrayList;
import java.util.List;

import spoolwork.model.Point;

/**
 * Orthogonal routing of a line on the sheet's grid, around symbol outlines. The search runs over grid
 * points in a window around the two ends, each point taken twice (travelling across or along) so that a
 * change of direction can carry a cost: the shortest path is then short and has few bends. The search is
 * a plain A* over arrays rather than a general graph library, because it runs on every release of a drag
 * and must stay well under a frame.
 * Coordinates are grid units.
 */
public final class Router {
    /** Cost of one bend, in grid units of length: a bend is worth this much extra run. */
    static final double BEND_COST = 4;
    /** Extra cost per grid step of running along another line. */
    static final int OVERLAP_COST = 6;
    private static final int MARGIN = 6;
    private static final int MAX_CELLS = 90_000;

    private Router() {
    }

    /** One end of a line to route: where it is, and the direction it must leave in (null = any). */
    public record End(Point at, Point exit) {
        Point stub() {
            return exit == null ? at : new Point(at.x() + exit.x(), at.y() + exit.y());
        }
    }

    /**
     * The bend points of an orthogonal route from one end to the other that keeps clear of the obstacles;
     * falls back to {@link #quick} when no clear route exists within the search window.
     */
    public static List<Point> route(End from, End to, List<Box> obstacles) {
        return route(from, to, obstacles, List.of());
    }

    /**
     * As {@link #route(End, End, List)}, and keeping off the runs of other lines where it can: running along
     * another line costs {@link #OVERLAP_COST} per grid step, so lines share a run only when there is no
     * other way, and a crossing costs nothing extra.
     */
    public static List<Point> route(End from, End to, List<Box> obstacles, List<List<Point>> others) {
        Point a = snap(from.stub());
        Point b = snap(to.stub());
        int ox = (int) Math.min(a.x(), b.x()) - MARGIN;
        int oy = (int) Math.min(a.y(), b.y()) - MARGIN;
        int w = (int) Math.abs(a.x() - b.x()) + 2 * MARGIN + 1;
        int h = (int) Math.abs(a.y() - b.y()) + 2 * MARGIN + 1;
        if ((long) w * h > MAX_CELLS) {
            return quick(from, to);
        }
        boolean[] blocked = new boolean[w * h];
        for (Box o : obstacles) {
            Box g = o.grow(0.5);
            int x0 = Math.max(0, (int) Math.ceil(g.minX()) - ox);
            int x1 = Math.min(w - 1, (int) Math.floor(g.maxX()) - ox);
            int y0 = Math.max(0, (int) Math.ceil(g.minY()) - oy);
            int y1 = Math.min(h - 1, (int) Math.floor(g.maxY()) - oy);
            for (int x = x0; x <= x1; x++) {
                for (int y = y0; y <= y1; y++) {
                    blocked[y * w + x] = true;
                }
            }
        }
        int ia = index(a, ox, oy, w);
        int ib = index(b, ox, oy, w);
        blocked[ia] = false;
        blocked[ib] = false;
        boolean[] alongX = new boolean[w * h];
        boolean[] alongY = new boolean[w * h];
        for (List<Point> line : others) {
            for (int i = 0; i + 1 < line.size(); i++) {
                mark(line.get(i), line.get(i + 1), ox, oy, w, h, alongX, alongY);
            }
        }
        int[] cells = search(blocked, alongX, alongY, w, h, ia, ib, from.exit(), to.exit());
        if (cells == null) {
            return quick(from, to);
        }
        List<Point> pts = new ArrayList<>();
        pts.add(from.at());
        for (int cell : cells) {
            pts.add(new Point(cell % w + ox, cell / w + oy));
        }
        pts.add(to.at());
        return inner(simplify(pts));
    }

    /**
     * A quick route with at most three bends between the stubs, ignoring obstacles: used while dragging,
     * when a clear route is found only on release.
     */
    public static List<Point> quick(End from, End to) {
        Point a = from.stub();
        Point b = to.stub();
        List<Point> pts = new ArrayList<>();
        pts.add(from.at());
        pts.add(a);
        boolean horizontal = from.exit() == null ? Math.abs(b.x() - a.x()) >= Math.abs(b.y() - a.y())
                : from.exit().y() == 0;
        if (horizontal) {
            double mx = Math.round((a.x() + b.x()) / 2);
            if (from.exit() != null && Math.signum(mx - a.x()) == -from.exit().x()) {
                mx = a.x();
            }
            pts.add(new Point(mx, a.y()));
            pts.add(new Point(mx, b.y()));
        } else {
            double my = Math.round((a.y() + b.y()) / 2);
            if (from.exit() != null && Math.signum(my - a.y()) == -from.exit().y()) {
                my = a.y();
            }
            pts.add(new Point(a.x(), my));
            pts.add(new Point(b.x(), my));
        }
        pts.add(b);
        pts.add(to.at());
        return inner(simplify(pts));
    }

    /** The full polyline through a line's ends and bends, as drawn. */
    public static List<Point> polyline(Point from, List<Point> bends, Point to) {
        List<Point> pts = new ArrayList<>(bends.size() + 2);
        pts.add(from);
        pts.addAll(bends);
        pts.add(to);
        return pts;
    }

    /** Removes repeated points and points in the middle of a straight run. */
    public static List<Point> simplify(List<Point> pts) {
        List<Point> out = new ArrayList<>();
        for (Point p : pts) {
            if (!out.isEmpty() && same(out.get(out.size() - 1), p)) {
                continue;
            }
            while (out.size() >= 2 && collinear(out.get(out.size() - 2), out.get(out.size() - 1), p)) {
                out.remove(out.size() - 1);
            }
            out.add(p);
        }
        return out;
    }

    private static List<Point> inner(List<Point> pts) {
        if (pts.size() <= 2) {
            return List.of();
        }
        return List.copyOf(pts.subList(1, pts.size() - 1));
    }

    private static boolean same(Point a, Point b) {
        return Math.abs(a.x() - b.x()) < 1e-9 && Math.abs(a.y() - b.y()) < 1e-9;
    }

    private static boolean collinear(Point a, Point b, Point c) {
        boolean vertical = Math.abs(a.x() - b.x()) < 1e-9 && Math.abs(b.x() - c.x()) < 1e-9;
        boolean horizontal = Math.abs(a.y() - b.y()) < 1e-9 && Math.abs(b.y() - c.y()) < 1e-9;
        if (!(vertical || horizontal)) {
            return false;
        }
        // Only a point between the other two is redundant; a reversal is kept so no segment is lost.
        double d1 = (b.x() - a.x()) + (b.y() - a.y());
        double d2 = (c.x() - b.x()) + (c.y() - b.y());
        return Math.signum(d1) == Math.signum(d2);
    }

    private static Point snap(Point p) {
        return new Point(Math.round(p.x()), Math.round(p.y()));
    }

    private static int index(Point p, int ox, int oy, int w) {
        return ((int) p.y() - oy) * w + ((int) p.x() - ox);
    }

    /**
     * A* over (grid point, travel axis) states: a step along the axis costs 1, a change of axis
     * {@link #BEND_COST}. Returns the cells of the cheapest path from a to b, or null when b cannot be reached.
     */
    private static void mark(Point p, Point q, int ox, int oy, int w, int h, boolean[] alongX, boolean[] alongY) {
        boolean horizontal = Math.abs(p.y() - q.y()) < 1e-9;
        boolean vertical = Math.abs(p.x() - q.x()) < 1e-9;
        if (!horizontal && !vertical) {
            return;
        }
        int x0 = (int) Math.round(Math.min(p.x(), q.x())) - ox;
        int x1 = (int) Math.round(Math.max(p.x(), q.x())) - ox;
        int y0 = (int) Math.round(Math.min(p.y(), q.y())) - oy;
        int y1 = (int) Math.round(Math.max(p.y(), q.y())) - oy;
        for (int x = Math.max(0, x0); x <= Math.min(w - 1, x1); x++) {
            for (int y = Math.max(0, y0); y <= Math.min(h - 1, y1); y++) {
                if (horizontal) {
                    alongX[y * w + x] = true;
                } else {
                    alongY[y * w + x] = true;
                }
            }
        }
    }

    private static int[] search(boolean[] blocked, boolean[] alongX, boolean[] alongY, int w, int h, int a, int b,
                                Point exitA, Point exitB) {
        int n = w * h * 2;
        int[] g = new int[n];
        int[] parent = new int[n];
        java.util.Arrays.fill(g, Integer.MAX_VALUE);
        java.util.PriorityQueue<long[]> open = new java.util.PriorityQueue<>((x, y) -> Long.compare(x[0], y[0]));
        int bx = b % w;
        int by = b / w;
        int bend = (int) BEND_COST;
        for (int d = 0; d < 2; d++) {
            int s = 2 * a + d;
            g[s] = axisCost(exitA, d, bend);
            parent[s] = -1;
            open.add(new long[] {g[s] + manhattan(a, bx, by, w), s});
        }
        int best = Integer.MAX_VALUE;
        int bestState = -1;
        while (!open.isEmpty()) {
            long[] top = open.poll();
            int s = (int) top[1];
            if (top[0] >= best) {
                break;
            }
            int cost = g[s];
            if (top[0] > cost + manhattan(s / 2, bx, by, w)) {
                continue;
            }
            int cell = s / 2;
            int d = s % 2;
            if (cell == b) {
                int total = cost + axisCost(exitB, d, bend);
                if (total < best) {
                    best = total;
                    bestState = s;
                }
                continue;
            }
            relax(open, g, parent, s, 2 * cell + (1 - d), cost + bend, bx, by, w);
            int x = cell % w;
            int y = cell / w;
            if (d == 0) {
                if (x > 0 && !blocked[cell - 1]) {
                    relax(open, g, parent, s, 2 * (cell - 1), cost + step(alongX, cell, cell - 1), bx, by, w);
                }
                if (x + 1 < w && !blocked[cell + 1]) {
                    relax(open, g, parent, s, 2 * (cell + 1), cost + step(alongX, cell, cell + 1), bx, by, w);
                }
            } else {
                if (y > 0 && !blocked[cell - w]) {
                    relax(open, g, parent, s, 2 * (cell - w) + 1, cost + step(alongY, cell, cell - w), bx, by, w);
                }
                if (y + 1 < h && !blocked[cell + w]) {
                    relax(open, g, parent, s, 2 * (cell + w) + 1, cost + step(alongY, cell, cell + w), bx, by, w);
                }
            }
        }
        if (bestState < 0) {
            return null;
        }
        List<Integer> out = new ArrayList<>();
        for (int s = bestState; s >= 0; s = parent[s]) {
            int cell = s / 2;
            if (out.isEmpty() || out.get(out.size() - 1) != cell) {
                out.add(cell);
            }
        }
        java.util.Collections.reverse(out);
        return out.stream().mapToInt(Integer::intValue).toArray();
    }

    /** One grid step, dearer when both cells lie on a run of another line along the same axis. */
    private static int step(boolean[] along, int from, int to) {
        return along[from] && along[to] ? 1 + OVERLAP_COST : 1;
    }

    private static void relax(java.util.PriorityQueue<long[]> open, int[] g, int[] parent, int from, int to, int cost,
                              int bx, int by, int w) {
        if (cost < g[to]) {
            g[to] = cost;
            parent[to] = from;
            open.add(new long[] {cost + manhattan(to / 2, bx, by, w), to});
        }
    }

    private static int manhattan(int cell, int bx, int by, int w) {
        return Math.abs(cell % w - bx) + Math.abs(cell / w - by);
    }

    /** Cost of travelling along axis d (0 across, 1 along y) at an end that must leave in the exit direction. */
    private static int axisCost(Point exit, int d, int bend) {
        if (exit == null) {
            return 0;
        }
        boolean horizontal = exit.y() == 0;
        return (d == 0) == horizontal ? 0 : bend;
    }
}
