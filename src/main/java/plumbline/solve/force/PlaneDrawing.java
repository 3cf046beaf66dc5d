package plumbline.solve.force;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import plumbline.model.Member;
import plumbline.model.Model;
import plumbline.model.Node;
import plumbline.model.Support;

/**
 * The plane drawing of a model with the ground as one more vertex far below, joined to
 * every support: its edges are the members (by index, in the model's order) and then one
 * edge per support; its bounded faces are the closed rings of the structure, each a list
 * of edge ids. A face runs counter-clockwise inside; the outer face is the one of most
 * negative area. When members cross, the drawing is not plane and {@code faces} is null.
 *
 * @param members      the members, edge ids 0 .. members.size() - 1
 * @param supportNodes the supported nodes, edge ids members.size() onward
 * @param faces        the bounded faces, or null when the drawing has crossings
 */
record PlaneDrawing(List<Member> members, List<String> supportNodes, List<int[]> faces) {

    PlaneDrawing {
        members = List.copyOf(members);
        supportNodes = List.copyOf(supportNodes);
        faces = faces == null ? null : List.copyOf(faces);
    }

    boolean plane() {
        return faces != null;
    }

    /** The member name or the supported node of edge {@code e}. */
    boolean isMember(int e) {
        return e < members.size();
    }

    static PlaneDrawing of(Model model) {
        List<Node> nodes = new ArrayList<>(model.nodes().values());
        Map<String, Integer> index = new HashMap<>();
        for (int k = 0; k < nodes.size(); k++) index.put(nodes.get(k).name(), k);
        int nv = nodes.size() + 1, ground = nodes.size();
        double minY = Double.POSITIVE_INFINITY, sumX = 0;
        for (Node nd : nodes) {
            minY = Math.min(minY, nd.yM());
            sumX += nd.xM();
        }
        double[] x = new double[nv], y = new double[nv];
        for (int k = 0; k < nodes.size(); k++) {
            x[k] = nodes.get(k).xM();
            y[k] = nodes.get(k).yM();
        }
        x[ground] = sumX / nodes.size();
        y[ground] = minY - 1e3 * model.extentM() - 1;
        List<int[]> edges = new ArrayList<>();
        List<Member> members = new ArrayList<>(model.members().values());
        for (Member mem : members) edges.add(new int[]{index.get(mem.from()), index.get(mem.to())});
        List<String> supportNodes = new ArrayList<>();
        for (Support s : model.supports().values()) {
            edges.add(new int[]{index.get(s.node()), ground});
            supportNodes.add(s.node());
        }
        int ne = edges.size();
        List<List<Integer>> out = new ArrayList<>();
        for (int v = 0; v < nv; v++) out.add(new ArrayList<>());
        for (int e = 0; e < ne; e++) {
            out.get(edges.get(e)[0]).add(2 * e);
            out.get(edges.get(e)[1]).add(2 * e + 1);
        }
        double[] angle = new double[2 * ne];
        int[] head = new int[2 * ne], tail = new int[2 * ne];
        for (int e = 0; e < ne; e++) {
            int a = edges.get(e)[0], b = edges.get(e)[1];
            tail[2 * e] = a;
            head[2 * e] = b;
            tail[2 * e + 1] = b;
            head[2 * e + 1] = a;
            angle[2 * e] = Math.atan2(y[b] - y[a], x[b] - x[a]);
            angle[2 * e + 1] = Math.atan2(y[a] - y[b], x[a] - x[b]);
        }
        int[] slot = new int[2 * ne];
        for (int v = 0; v < nv; v++) {
            List<Integer> l = out.get(v);
            l.sort((p, q) -> angle[p] != angle[q] ? Double.compare(angle[p], angle[q]) : Integer.compare(p, q));
            for (int k = 0; k < l.size(); k++) slot[l.get(k)] = k;
        }
        boolean[] used = new boolean[2 * ne];
        List<int[]> faces = new ArrayList<>();
        List<Double> areas = new ArrayList<>();
        for (int h0 = 0; h0 < 2 * ne; h0++) {
            if (used[h0]) continue;
            List<Integer> face = new ArrayList<>();
            double area = 0;
            int h = h0;
            int guard = 0;
            while (!used[h]) {
                used[h] = true;
                face.add(h / 2);
                area += x[tail[h]] * y[head[h]] - x[head[h]] * y[tail[h]];
                int v = head[h], twin = h ^ 1;
                List<Integer> l = out.get(v);
                int k = slot[twin];
                h = l.get((k - 1 + l.size()) % l.size()); // the next edge clockwise from the way back
                if (++guard > 4 * ne + 4) return new PlaneDrawing(members, supportNodes, null);
            }
            faces.add(face.stream().mapToInt(Integer::intValue).toArray());
            areas.add(area / 2);
        }
        // the outer face is the one of most negative area; Euler: bounded faces = E - V + 1 (connected)
        int outer = 0;
        for (int k = 1; k < areas.size(); k++) if (areas.get(k) < areas.get(outer)) outer = k;
        if (faces.size() - 1 != ne - nv + 1) return new PlaneDrawing(members, supportNodes, null);
        List<int[]> bounded = new ArrayList<>();
        for (int k = 0; k < faces.size(); k++) {
            if (k == outer) continue;
            if (areas.get(k) < -1e-9 * model.extentM() * model.extentM()) {
                return new PlaneDrawing(members, supportNodes, null); // a second negative face: crossings
            }
            bounded.add(faces.get(k));
        }
        return new PlaneDrawing(members, supportNodes, bounded);
    }

}
