package plumbline.linalg;

import java.util.ArrayDeque;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

/**
 * Reverse Cuthill-McKee ordering of the node graph (E. Cuthill and J. McKee, "Reducing the
 * bandwidth of sparse symmetric matrices", Proc. 24th ACM National Conference, 1969; the
 * reversal after A. George, 1971): breadth-first from a low-degree node, neighbours by
 * increasing degree, the whole order reversed. Keeps the skyline of K narrow.
 */
public final class NodeOrdering {

    private NodeOrdering() {
    }

    /** @return order[k] = the node placed k-th */
    public static int[] reverseCuthillMcKee(int nodes, List<int[]> edges) {
        List<List<Integer>> adj = new ArrayList<>();
        for (int i = 0; i < nodes; i++) adj.add(new ArrayList<>());
        for (int[] e : edges) {
            if (e[0] == e[1]) continue;
            adj.get(e[0]).add(e[1]);
            adj.get(e[1]).add(e[0]);
        }
        int[] degree = new int[nodes];
        for (int i = 0; i < nodes; i++) degree[i] = adj.get(i).size();
        for (List<Integer> l : adj) l.sort((p, q) -> Integer.compare(degree[p], degree[q]));
        boolean[] seen = new boolean[nodes];
        int[] order = new int[nodes];
        int k = 0;
        Integer[] byDegree = new Integer[nodes];
        for (int i = 0; i < nodes; i++) byDegree[i] = i;
        Arrays.sort(byDegree, (p, q) -> degree[p] != degree[q] ? Integer.compare(degree[p], degree[q]) : Integer.compare(p, q));
        for (int s : byDegree) {
            if (seen[s]) continue;
            int root = peripheral(s, adj);
            ArrayDeque<Integer> queue = new ArrayDeque<>();
            queue.add(root);
            seen[root] = true;
            while (!queue.isEmpty()) {
                int v = queue.poll();
                order[k++] = v;
                for (int w : adj.get(v)) {
                    if (!seen[w]) {
                        seen[w] = true;
                        queue.add(w);
                    }
                }
            }
        }
        for (int i = 0; i < nodes / 2; i++) {
            int t = order[i];
            order[i] = order[nodes - 1 - i];
            order[nodes - 1 - i] = t;
        }
        return order;
    }

    /** A pseudo-peripheral node of s's component: the last node reached by a breadth-first search, twice. */
    private static int peripheral(int s, List<List<Integer>> adj) {
        int far = s;
        for (int pass = 0; pass < 2; pass++) {
            Map<Integer, Boolean> seen = new HashMap<>();
            ArrayDeque<Integer> q = new ArrayDeque<>();
            q.add(far);
            seen.put(far, true);
            int last = far;
            while (!q.isEmpty()) {
                last = q.poll();
                for (int w : adj.get(last)) if (seen.putIfAbsent(w, true) == null) q.add(w);
            }
            far = last;
        }
        return far;
    }
}
