package spoolwork.solver.numeric;

import java.util.ArrayDeque;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

/**
 * Numberings of a square sparsity pattern (symmetrised, the diagonal ignored) for sparse LU: reverse
 * Cuthill–McKee, which keeps the factor banded, and minimum degree, which keeps it sparse.
 */
final class Ordering {
    private Ordering() {
    }

    /** perm[newIndex] = oldIndex. */
    static int[] reverseCuthillMcKee(int n, int[] rows, int[] cols, int count) {
        List<int[]> adjacency = new ArrayList<>(n);
        int[] degree = new int[n];
        for (int k = 0; k < count; k++) {
            if (rows[k] != cols[k]) {
                degree[rows[k]]++;
                degree[cols[k]]++;
            }
        }
        int[][] adj = new int[n][];
        for (int i = 0; i < n; i++) {
            adj[i] = new int[degree[i]];
        }
        int[] fill = new int[n];
        for (int k = 0; k < count; k++) {
            int r = rows[k];
            int c = cols[k];
            if (r != c) {
                adj[r][fill[r]++] = c;
                adj[c][fill[c]++] = r;
            }
        }
        for (int i = 0; i < n; i++) {
            int[] a = Arrays.stream(adj[i]).distinct().toArray();
            adj[i] = a;
            degree[i] = a.length;
        }
        adjacency.clear();
        boolean[] seen = new boolean[n];
        int[] order = new int[n];
        int at = 0;
        Integer[] byDegree = new Integer[n];
        for (int i = 0; i < n; i++) {
            byDegree[i] = i;
        }
        Arrays.sort(byDegree, (p, q) -> Integer.compare(degree[p], degree[q]));
        ArrayDeque<Integer> queue = new ArrayDeque<>();
        for (int start : byDegree) {
            if (seen[start]) {
                continue;
            }
            seen[start] = true;
            queue.add(start);
            while (!queue.isEmpty()) {
                int v = queue.poll();
                order[at++] = v;
                int[] next = Arrays.stream(adj[v]).filter(w -> !seen[w]).boxed()
                        .sorted((p, q) -> Integer.compare(degree[p], degree[q])).mapToInt(Integer::intValue).toArray();
                for (int w : next) {
                    seen[w] = true;
                    queue.add(w);
                }
            }
        }
        int[] perm = new int[n];
        for (int i = 0; i < n; i++) {
            perm[i] = order[n - 1 - i];
        }
        return perm;
    }

    /**
     * Minimum degree numbering of the pattern of A + Aᵀ, perm[newIndex] = oldIndex. Works on the elimination
     * graph itself: eliminating a node joins its remaining neighbours into a clique and drops it from their
     * lists; the next node is one of least current (exact) degree, taken from degree buckets. Cheap when the
     * elimination fills little, as in circuit matrices.
     */
    static int[] minimumDegree(int n, int[] rows, int[] cols, int count) {
        return minimumDegree(n, rows, cols, count, null);
    }

    /**
     * Minimum degree where each node marked in {@code delayed} may only be numbered after one of its
     * neighbours. The solver delays the unknowns of complementarity rows: such a row holds only its own
     * unknown on one side and may lack it on the other, but once a neighbouring pressure is eliminated its
     * diagonal is non-zero on both sides, so one pivot order serves whichever side the row is on.
     */
    static int[] minimumDegree(int n, int[] rows, int[] cols, int count, boolean[] delayed) {
        return minimumDegree(n, rows, cols, count, delayed, null);
    }

    /**
     * What the elimination of {@link #minimumDegree} found besides the order: the neighbours each node had
     * when it was eliminated, which are the rows of its column of L (and the columns of its row of U) in
     * an LU factorisation along that order with diagonal pivots, for the pattern of A + Aᵀ.
     */
    static final class Elimination {
        /** Neighbours of the k-th eliminated node are rows[start[k] .. start[k + 1]), in the old numbering. */
        int[] start;
        int[] rows;
    }

    /** The same, also recording the elimination's pattern into {@code pattern} when it is not null. */
    static int[] minimumDegree(int n, int[] rows, int[] cols, int count, boolean[] delayed,
                               Elimination pattern) {
        int[] len = new int[n];
        for (int k = 0; k < count; k++) {
            int r = rows[k];
            int c = cols[k];
            if (r < 0 || c < 0 || r >= n || c >= n) {
                throw new IllegalArgumentException("ordering: entry (" + r + ", " + c + ") outside 0.." + (n - 1));
            }
            if (r != c) {
                len[r]++;
                len[c]++;
            }
        }
        // every list in one array: node i's neighbours are adj[at[i] .. at[i] + len[i]), with room for
        // cap[i]; a list that outgrows its room moves to the end of the array
        int[] at = new int[n];
        int[] cap = new int[n];
        int used = 0;
        for (int i = 0; i < n; i++) {
            at[i] = used;
            cap[i] = len[i] + SLACK;
            used += cap[i];
            len[i] = 0;
        }
        int[] adj = new int[used + used / 4 + 16];
        int[] mark = new int[n];
        int stamp = 0;
        for (int k = 0; k < count; k++) {
            int r = rows[k];
            int c = cols[k];
            if (r != c) {
                adj[at[r] + len[r]++] = c;
                adj[at[c] + len[c]++] = r;
            }
        }
        // drop repeated neighbours
        for (int i = 0; i < n; i++) {
            stamp++;
            int a = at[i];
            int m = 0;
            for (int t = 0; t < len[i]; t++) {
                int j = adj[a + t];
                if (mark[j] != stamp) {
                    mark[j] = stamp;
                    adj[a + m++] = j;
                }
            }
            len[i] = m;
        }
        // degree buckets: doubly linked lists, head[d] = first node of degree d
        int[] head = new int[n];
        int[] nextInBucket = new int[n];
        int[] prevInBucket = new int[n];
        int[] degree = new int[n];
        Arrays.fill(head, -1);
        boolean[] waiting = new boolean[n];
        for (int i = n - 1; i >= 0; i--) {
            degree[i] = len[i];
            if (delayed != null && delayed[i] && len[i] > 0) {
                waiting[i] = true;
            } else {
                insert(head, nextInBucket, prevInBucket, i, degree[i]);
            }
        }
        int[] perm = new int[n];
        int[] patternStart = pattern == null ? null : new int[n + 1];
        int[] patternRows = pattern == null ? null : new int[Math.max(16, count)];
        int patternSize = 0;
        int minDegree = 0;
        for (int k = 0; k < n; k++) {
            while (minDegree < n && head[minDegree] < 0) {
                minDegree++;
            }
            if (minDegree == n) {
                // only delayed nodes are left (their neighbours too are all delayed): release them
                for (int i = 0; i < n; i++) {
                    if (waiting[i]) {
                        waiting[i] = false;
                        insert(head, nextInBucket, prevInBucket, i, degree[i]);
                    }
                }
                minDegree = 0;
                k--;
                continue;
            }
            int v = head[minDegree];
            remove(head, nextInBucket, prevInBucket, v, degree[v]);
            perm[k] = v;
            int nv = at[v];
            int lv = len[v];
            if (pattern != null) {
                if (patternSize + lv > patternRows.length) {
                    patternRows = Arrays.copyOf(patternRows, Math.max(2 * patternRows.length, patternSize + lv));
                }
                patternStart[k] = patternSize;
                System.arraycopy(adj, nv, patternRows, patternSize, lv);
                patternSize += lv;
            }
            // v's neighbours carry vStamp, so that a neighbour already joined to all the others (usual after
            // condensation) only loses v, without a second pass
            int vStamp = ++stamp;
            for (int t = 0; t < lv; t++) {
                mark[adj[nv + t]] = vStamp;
            }
            for (int t = 0; t < lv; t++) {
                int u = adj[nv + t];
                // u's new neighbours: its old ones without v, and v's other neighbours
                int au = at[u];
                int lu = 0;
                int common = 0;
                for (int s = 0; s < len[u]; s++) {
                    int w = adj[au + s];
                    if (w != v) {
                        adj[au + lu++] = w;
                        if (mark[w] == vStamp) {
                            common++;
                        }
                    }
                }
                if (common < lv - 1) {
                    stamp++;
                    for (int s = 0; s < lu; s++) {
                        mark[adj[au + s]] = stamp;
                    }
                    mark[u] = stamp;
                    for (int s = 0; s < lv; s++) {
                        int w = adj[nv + s];
                        if (mark[w] != stamp) {
                            if (lu == cap[u]) {
                                // move u's list to the end, with twice the room
                                int room = 2 * cap[u];
                                if (used + room > adj.length) {
                                    adj = Arrays.copyOf(adj, Math.max(2 * adj.length, used + room));
                                }
                                System.arraycopy(adj, au, adj, used, lu);
                                au = used;
                                at[u] = au;
                                cap[u] = room;
                                used += room;
                            }
                            adj[au + lu++] = w;
                        }
                    }
                    for (int s = 0; s < lv; s++) {
                        mark[adj[nv + s]] = vStamp;
                    }
                }
                len[u] = lu;
                if (waiting[u]) {
                    waiting[u] = false;
                    degree[u] = lu;
                    insert(head, nextInBucket, prevInBucket, u, lu);
                    minDegree = Math.min(minDegree, lu);
                } else if (lu != degree[u]) {
                    remove(head, nextInBucket, prevInBucket, u, degree[u]);
                    degree[u] = lu;
                    insert(head, nextInBucket, prevInBucket, u, lu);
                    minDegree = Math.min(minDegree, lu);
                }
            }
            len[v] = 0;
        }
        if (pattern != null) {
            patternStart[n] = patternSize;
            pattern.start = patternStart;
            pattern.rows = patternRows;
        }
        return perm;
    }

    /** Room for fill-in each node's list has beyond its first neighbours. */
    private static final int SLACK = 4;

    private static void insert(int[] head, int[] next, int[] prev, int node, int d) {
        next[node] = head[d];
        prev[node] = -1;
        if (head[d] >= 0) {
            prev[head[d]] = node;
        }
        head[d] = node;
    }

    private static void remove(int[] head, int[] next, int[] prev, int node, int d) {
        if (prev[node] >= 0) {
            next[prev[node]] = next[node];
        } else {
            head[d] = next[node];
        }
        if (next[node] >= 0) {
            prev[next[node]] = prev[node];
        }
    }
}
