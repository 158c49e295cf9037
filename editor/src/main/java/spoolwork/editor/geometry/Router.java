package spoolwork.editor.geometry;

import java.util.ArrayList;
import java.util.List;

import org.jgrapht.GraphPath;
import org.jgrapht.alg.shortestpath.AStarShortestPath;
import org.jgrapht.graph.DefaultUndirectedWeightedGraph;
import org.jgrapht.graph.DefaultWeightedEdge;

import spoolwork.model.Point;

/**
 * Orthogonal routing of a line on the sheet's grid, around symbol outlines. The search runs over grid
 * points in a window around the two ends, each point taken twice (travelling across or along) so that a
 * change of direction can carry a cost: the shortest path is then short and has few bends.
 * Coordinates are grid units.
 */
public final class Router {
    /** Cost of one bend, in grid units of length: a bend is worth this much extra run. */
    static final double BEND_COST = 4;
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

        DefaultUndirectedWeightedGraph<Integer, DefaultWeightedEdge> g =
                new DefaultUndirectedWeightedGraph<>(DefaultWeightedEdge.class);
        for (int i = 0; i < w * h; i++) {
            if (!blocked[i]) {
                g.addVertex(2 * i);
                g.addVertex(2 * i + 1);
                edge(g, 2 * i, 2 * i + 1, BEND_COST);
            }
        }
        for (int y = 0; y < h; y++) {
            for (int x = 0; x < w; x++) {
                int i = y * w + x;
                if (blocked[i]) {
                    continue;
                }
                if (x + 1 < w && !blocked[i + 1]) {
                    edge(g, 2 * i, 2 * (i + 1), 1);
                }
                if (y + 1 < h && !blocked[i + w]) {
                    edge(g, 2 * i + 1, 2 * (i + w) + 1, 1);
                }
            }
        }
        int source = -1;
        int sink = -2;
        g.addVertex(source);
        g.addVertex(sink);
        attach(g, source, ia, from.exit());
        attach(g, sink, ib, to.exit());
        final int width = w;
        AStarShortestPath<Integer, DefaultWeightedEdge> astar = new AStarShortestPath<>(g, (u, v) -> {
            if (u < 0 || v < 0) {
                return 0;
            }
            int cu = u / 2;
            int cv = v / 2;
            return Math.abs(cu % width - cv % width) + Math.abs(cu / width - cv / width);
        });
        GraphPath<Integer, DefaultWeightedEdge> path = astar.getPath(source, sink);
        if (path == null) {
            return quick(from, to);
        }
        List<Point> pts = new ArrayList<>();
        pts.add(from.at());
        for (int v : path.getVertexList()) {
            if (v < 0) {
                continue;
            }
            int c = v / 2;
            pts.add(new Point(c % w + ox, c / w + oy));
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

    private static void edge(DefaultUndirectedWeightedGraph<Integer, DefaultWeightedEdge> g, int u, int v, double wgt) {
        DefaultWeightedEdge e = g.addEdge(u, v);
        if (e != null) {
            g.setEdgeWeight(e, wgt);
        }
    }

    private static void attach(DefaultUndirectedWeightedGraph<Integer, DefaultWeightedEdge> g, int terminal, int cell,
                               Point exit) {
        boolean horizontal = exit != null && exit.y() == 0;
        boolean vertical = exit != null && exit.x() == 0;
        edge(g, terminal, 2 * cell, vertical ? BEND_COST : 0);
        edge(g, terminal, 2 * cell + 1, horizontal ? BEND_COST : 0);
    }
}
