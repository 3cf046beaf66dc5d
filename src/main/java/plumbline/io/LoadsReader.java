package plumbline.io;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import plumbline.model.LoadCase;
import plumbline.model.LoadDirection;
import plumbline.model.Member;
import plumbline.model.MemberLoad;
import plumbline.model.Node;
import plumbline.model.NodeLoad;
import plumbline.model.Problem;
import plumbline.model.Settlement;
import plumbline.model.Support;
import plumbline.model.Temperature;
import plumbline.units.Dimension;
import plumbline.units.UnitSystem;

/**
 * Reads the {@code loads} of a model file (format reference section 4): per load case its
 * type, self-weight and pattern flags, member loads (distributed, point, couple), node loads,
 * temperatures and settlements, each checked against the members and supports it names.
 */
final class LoadsReader {

    private final List<Problem> problems;

    LoadsReader(List<Problem> problems) {
        this.problems = problems;
    }

    List<LoadCase> loadCases(Tree t, UnitSystem u, Map<String, Node> nodes, Map<String, Member> members,
                                     Map<String, Support> supports) {
        List<LoadCase> out = new ArrayList<>();
        for (Tree.Entry e : Fields.named(t, problems, "loads", false, null, "a map of named load cases")) {
            String path = "loads." + e.key();
            Fields f = Fields.of(e.value(), path, problems, List.of("type", "self_weight", "pattern", "member_loads",
                    "node_loads", "temperatures", "settlements"), "a map with type and loads");
            if (f == null) continue;
            String type = f.text("type", true, "one of " + String.join(", ", LoadCase.TYPES));
            if (type != null && !LoadCase.TYPES.contains(type)) {
                f.problem(f.at("type"), "type", Fields.unknown("load case type", type, LoadCase.TYPES,
                        "expected one of " + String.join(", ", LoadCase.TYPES)));
            }
            boolean sw = f.bool("self_weight", false);
            boolean pattern = f.bool("pattern", false);
            List<MemberLoad> ml = new ArrayList<>();
            List<Tree> items = f.list("member_loads", false, "a list of member loads");
            for (int i = 0; i < items.size(); i++) {
                memberLoad(items.get(i), path + ".member_loads[" + i + "]", u, members, nodes, ml);
            }
            List<NodeLoad> nl = new ArrayList<>();
            for (Fields g : entries(f, path, "node_loads", "a list of node loads", List.of("node", "Fx", "Fy", "Mz"),
                    "a map such as {node: B, Fy: -20}")) {
                String node = g.text("node", true, "a node name");
                GeometryReader.nodeRef(g, "node", node, nodes);
                double fx = orZero(g, "Fx", Dimension.FORCE, u);
                double fy = orZero(g, "Fy", Dimension.FORCE, u);
                double mz = orZero(g, "Mz", Dimension.MOMENT, u);
                if (!g.has("Fx") && !g.has("Fy") && !g.has("Mz")) g.missing("Fy", "at least one of Fx, Fy, Mz");
                nl.add(new NodeLoad(node, fx, fy, mz, g.map.at()));
            }
            List<Temperature> temps = new ArrayList<>();
            for (Fields g : entries(f, path, "temperatures", "a list of member temperatures", List.of("member", "members", "uniform",
                    "gradient"), "a map such as {member: M1, uniform: 25 degC, gradient: 10 degC}")) {
                double uni = orZero(g, "uniform", Dimension.TEMPERATURE, u);
                double grad = orZero(g, "gradient", Dimension.TEMPERATURE, u);
                if (!g.has("uniform") && !g.has("gradient")) g.missing("uniform", "uniform and/or gradient");
                for (String m : memberNames(g, members)) temps.add(new Temperature(m, uni, grad, g.map.at()));
            }
            List<Settlement> sets = new ArrayList<>();
            for (Fields g : entries(f, path, "settlements", "a list of support settlements", List.of("node", "ux", "uy", "rz"),
                    "a map such as {node: B, uy: -10 mm}")) {
                String node = g.text("node", true, "a node name");
                GeometryReader.nodeRef(g, "node", node, nodes);
                double[] v = {g.quantity("ux", Dimension.LENGTH, u, false), g.quantity("uy", Dimension.LENGTH, u, false),
                        g.quantity("rz", Dimension.ANGLE, u, false)};
                String[] keys = {"ux", "uy", "rz"};
                if (!g.has("ux") && !g.has("uy") && !g.has("rz")) g.missing("uy", "at least one of ux, uy, rz");
                Support s = node == null ? null : supports.get(node);
                for (int k = 0; k < 3; k++) {
                    if (!g.has(keys[k])) continue;
                    if (s == null || !s.fixed(k)) {
                        g.problem(g.at(keys[k]), keys[k], "node " + node + " is not fixed in " + keys[k]
                                + "; a settlement is a movement of a restrained direction");
                    }
                }
                sets.add(new Settlement(node, v[0], v[1], v[2], g.map.at()));
            }
            out.add(new LoadCase(e.key(), type, sw, pattern, ml, nl, temps, sets, e.keyAt()));
        }
        return out;
    }

    /** Each map of the list under {@code key}, opened with its field path ("loads.D.node_loads[2]"); a problem for each that is not a map. */
    private List<Fields> entries(Fields f, String path, String key, String what, List<String> allowed, String example) {
        List<Fields> out = new ArrayList<>();
        List<Tree> items = f.list(key, false, what);
        for (int i = 0; i < items.size(); i++) {
            Fields g = Fields.of(items.get(i), path + "." + key + "[" + i + "]", problems, allowed, example);
            if (g != null) out.add(g);
        }
        return out;
    }

    private static double orZero(Fields g, String key, Dimension d, UnitSystem u) {
        return g.has(key) ? g.quantity(key, d, u, false) : 0.0;
    }

    /** The member names of a {@code member} or {@code members} key, each checked to exist. */
    private List<String> memberNames(Fields g, Map<String, Member> members) {
        List<String> names = new ArrayList<>();
        if (g.has("member") && g.has("members")) {
            g.problem(g.at("members"), "members", "both member and members given; expected one of them");
        }
        if (g.has("member")) {
            String m = g.text("member", true, "a member name");
            if (m != null) names.add(m);
        } else if (g.has("members")) {
            for (Tree t : g.list("members", true, "a list of member names")) {
                if (t instanceof Tree.Scalar s && s.kind() != Tree.Scalar.Kind.NULL) names.add(s.text());
                else g.problem(t.at(), "members", "found " + t.describe() + "; expected a member name");
            }
        } else {
            g.missing("member", "member (one name) or members (a list)");
        }
        List<String> ok = new ArrayList<>();
        for (String m : names) {
            if (members.containsKey(m)) {
                ok.add(m);
            } else {
                String key = g.has("member") ? "member" : "members";
                g.problem(g.at(key), key, Fields.unknown("member", m, members.keySet(),
                        "expected a member defined under members"));
            }
        }
        return ok;
    }

    private void memberLoad(Tree t, String path, UnitSystem u, Map<String, Member> members, Map<String, Node> nodes,
                            List<MemberLoad> out) {
        Fields g = Fields.of(t, path, problems, List.of("member", "members", "w", "P", "M", "at", "from", "to", "dir", "per"),
                "a map such as {member: M1, w: -3.2}");
        if (g == null) return;
        int kinds = (g.has("w") ? 1 : 0) + (g.has("P") ? 1 : 0) + (g.has("M") ? 1 : 0);
        if (kinds != 1) {
            g.problem(t.at(), kinds == 0 ? "w" : "P", kinds == 0 ? "missing; expected one of w (distributed), P (point force), M (moment)"
                    : "more than one of w, P, M; expected exactly one load per entry");
            return;
        }
        String dirText = g.text("dir", false, "y, x, local-y, local-x or gravity");
        LoadDirection dir = LoadDirection.Y;
        if (dirText != null) {
            dir = LoadDirection.of(dirText);
            if (dir == null) {
                g.problem(g.at("dir"), "dir", "found '" + dirText + "'; expected y, x, local-y, local-x or gravity");
                dir = LoadDirection.Y;
            }
        }
        String per = g.text("per", false, "length or plan");
        boolean perPlan = false;
        if (per != null) {
            if (per.equals("plan")) perPlan = true;
            else if (!per.equals("length")) g.problem(g.at("per"), "per", "found '" + per + "'; expected length or plan");
        }
        List<String> names = memberNames(g, members);
        for (String name : names) {
            Member m = members.get(name);
            double len = lengthOf(m, nodes);
            if (g.has("w")) {
                if (g.has("at")) g.problem(g.at("at"), "at", "a distributed load takes from/to, not at");
                Tree w = g.get("w");
                double w1, w2;
                if (w instanceof Tree.ListNode l) {
                    if (l.items().size() != 2) {
                        g.problem(w.at(), "w", "found a list of " + l.items().size() + "; expected [w_start, w_end]");
                        return;
                    }
                    w1 = Fields.quantityOf(l.items().get(0), g.field("w") + "[0]", Dimension.FORCE_PER_LENGTH, u, problems);
                    w2 = Fields.quantityOf(l.items().get(1), g.field("w") + "[1]", Dimension.FORCE_PER_LENGTH, u, problems);
                } else {
                    w1 = w2 = g.quantity("w", Dimension.FORCE_PER_LENGTH, u, true);
                }
                double a = g.has("from") ? position(g, "from", len, u) : 0.0;
                double b = g.has("to") ? position(g, "to", len, u) : len;
                if (!Double.isNaN(a) && !Double.isNaN(b) && !(b > a) && len > 0) {
                    g.problem(g.at("to"), "to", "load ends at " + fmt(b) + " m, not after its start " + fmt(a)
                            + " m; expected from < to");
                }
                if (perPlan && (dir == LoadDirection.X || dir == LoadDirection.LOCAL_X)) {
                    g.problem(g.at("per"), "per", "per: plan applies to vertical loads; expected dir y, gravity or local-y");
                }
                out.add(new MemberLoad.Distributed(name, dir, perPlan, a, b, w1, w2, t.at()));
            } else {
                if (g.has("from") || g.has("to")) g.problem(g.at(g.has("from") ? "from" : "to"), g.has("from") ? "from" : "to",
                        "a concentrated load takes at, not from/to");
                if (perPlan) g.problem(g.at("per"), "per", "per applies to distributed loads only");
                double a = g.has("at") ? position(g, "at", len, u) : Double.NaN;
                if (!g.has("at")) g.missing("at", "the distance from the member start, or a percentage such as '50%'");
                if (g.has("P")) {
                    out.add(new MemberLoad.Point(name, dir, a, g.quantity("P", Dimension.FORCE, u, true), t.at()));
                } else {
                    if (dirText != null) g.problem(g.at("dir"), "dir", "a concentrated moment has no direction; expected no dir key");
                    out.add(new MemberLoad.Couple(name, a, g.quantity("M", Dimension.MOMENT, u, true), t.at()));
                }
            }
        }
    }

    static String fmt(double v) {
        return String.format(Locale.ROOT, "%.6g", v);
    }

    private static double lengthOf(Member m, Map<String, Node> nodes) {
        Node a = nodes.get(m.from()), b = nodes.get(m.to());
        if (a == null || b == null) return Double.NaN;
        return Math.hypot(b.xM() - a.xM(), b.yM() - a.yM());
    }

    /** A position along a member: a length from its start, or "NN%" of its length; checked to lie on it. */
    static double position(Fields g, String key, double lengthM, UnitSystem u) {
        Tree t = g.get(key);
        double x;
        if (t instanceof Tree.Scalar s && s.kind() == Tree.Scalar.Kind.STRING && s.text().trim().endsWith("%")) {
            String num = s.text().trim();
            num = num.substring(0, num.length() - 1).trim();
            try {
                x = Double.parseDouble(num) / 100.0 * lengthM;
            } catch (NumberFormatException e) {
                g.problem(t.at(), key, "'" + s.text() + "' is not a percentage; expected e.g. '50%'");
                return Double.NaN;
            }
        } else {
            x = g.quantity(key, Dimension.LENGTH, u, true);
        }
        if (Double.isNaN(x) || Double.isNaN(lengthM) || !(lengthM > 0)) return x; // a zero length is reported on the member
        double slack = 1e-9 * lengthM;
        if (x < -slack || x > lengthM + slack) {
            g.problem(t.at(), key, "position " + fmt(u.fromInternal(x, Dimension.LENGTH)) + " " + u.length().symbol()
                    + " is outside the member (length " + fmt(u.fromInternal(lengthM, Dimension.LENGTH)) + " "
                    + u.length().symbol() + "); expected 0 to the member length");
            return Double.NaN;
        }
        return Math.min(Math.max(x, 0.0), lengthM);
    }
}
