package spoolwork.solver.numeric;

import java.util.ArrayDeque;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

/**
 * Reverse Cuthill–McKee numbering of a square sparsity pattern (symmetrised). EJML's sparse LU has no
 * usable fill-reducing ordering, so the unknowns are renumbered here, which keeps the factor banded.
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
}
