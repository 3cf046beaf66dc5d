package plumbline.io;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import plumbline.model.Member;
import plumbline.model.Node;
import plumbline.model.Problem;
import plumbline.model.Section;
import plumbline.model.SourceRef;
import plumbline.model.Support;
import plumbline.units.Dimension;
import plumbline.units.UnitSystem;

/**
 * Reads the {@code nodes}, {@code supports} and {@code members} of a model file (format
 * reference section 3). Checks that need the geometry as a whole (zero-length members,
 * coincident nodes) are made once, after reading, by {@code validate.StructureCheck}.
 */
final class GeometryReader {

    private final List<Problem> problems;

    GeometryReader(List<Problem> problems) {
        this.problems = problems;
    }

    Map<String, Node> nodes(Tree t, SourceRef where, UnitSystem u) {
        Map<String, Node> out = new LinkedHashMap<>();
        for (Tree.Entry e : Fields.named(t, problems, "nodes", true, where, "a map of named nodes, e.g. A: [0, 0]")) {
            String path = "nodes." + e.key();
            if (!(e.value() instanceof Tree.ListNode l) || l.items().size() != 2) {
                problems.add(new Problem(e.value().at(), path, "found " + e.value().describe()
                        + (e.value() instanceof Tree.ListNode l2 ? " of " + l2.items().size() + " values" : "")
                        + "; expected two coordinates [x, y]"));
                continue;
            }
            double x = Fields.quantityOf(l.items().get(0), path + ".x", Dimension.LENGTH, u, problems);
            double y = Fields.quantityOf(l.items().get(1), path + ".y", Dimension.LENGTH, u, problems);
            out.put(e.key(), new Node(e.key(), x, y, e.keyAt()));
        }
        return out;
    }

    /** Records a problem if {@code name} is not a node of the model. */
    static void nodeRef(Fields f, String key, String name, Map<String, ?> nodes) {
        if (name != null && !nodes.containsKey(name)) {
            f.problem(f.at(key), key, Fields.unknown("node", name, nodes.keySet(),
                    "expected a node defined under nodes"));
        }
    }

    Map<String, Support> supports(Tree t, UnitSystem u, Map<String, Node> nodes) {
        Map<String, Support> out = new LinkedHashMap<>();
        for (Tree.Entry e : Fields.named(t, problems, "supports", false, null, "a map from node name to support")) {
            String path = "supports." + e.key();
            if (!nodes.containsKey(e.key())) {
                problems.add(new Problem(e.keyAt(), path, Fields.unknown("node", e.key(), nodes.keySet(),
                        "a support must name a node")));
            }
            Tree v = e.value();
            if (v instanceof Tree.Scalar s) {
                String kw = s.text();
                boolean[] fix = switch (kw) {
                    case "fixed" -> new boolean[]{true, true, true};
                    case "pinned" -> new boolean[]{true, true, false};
                    case "roller" -> new boolean[]{false, true, false};
                    default -> null;
                };
                if (fix == null) {
                    problems.add(new Problem(s.at(), path, "unknown support '" + kw + "'; expected fixed, pinned, roller or a map {fix: [ux, uy, rz], angle, springs}"));
                    continue;
                }
                out.put(e.key(), new Support(e.key(), fix[0], fix[1], fix[2], 0, 0, 0, 0, e.keyAt()));
                continue;
            }
            Fields f = Fields.of(v, path, problems, List.of("fix", "angle", "springs"),
                    "fixed, pinned, roller or a map {fix: [ux, uy, rz], angle, springs}");
            if (f == null) continue;
            boolean[] fix = new boolean[3];
            for (Tree d : f.list("fix", false, "a list of directions among ux, uy, rz")) {
                int k = dof(d, path + ".fix");
                if (k >= 0) {
                    if (fix[k]) problems.add(new Problem(d.at(), path + ".fix", "direction listed twice"));
                    fix[k] = true;
                }
            }
            double angle = 0;
            if (f.has("angle")) {
                Tree a = f.get("angle");
                if (a instanceof Tree.Scalar s && s.kind() == Tree.Scalar.Kind.NUMBER) {
                    angle = Math.toRadians(Double.parseDouble(s.text())); // a bare support angle is in degrees
                } else {
                    angle = f.quantity("angle", Dimension.ANGLE, u, false);
                }
            }
            double[] k = new double[3];
            if (f.has("springs")) {
                Fields sp = Fields.of(f.get("springs"), path + ".springs", problems, List.of("ux", "uy", "rz"),
                        "a map such as {uy: 5000, rz: 2.0e4 kN*m/rad}");
                if (sp != null) {
                    k[0] = sp.quantity("ux", Dimension.TRANSLATIONAL_STIFFNESS, u, false);
                    k[1] = sp.quantity("uy", Dimension.TRANSLATIONAL_STIFFNESS, u, false);
                    k[2] = sp.quantity("rz", Dimension.ROTATIONAL_STIFFNESS, u, false);
                    String[] keys = {"ux", "uy", "rz"};
                    for (int i = 0; i < 3; i++) {
                        if (!sp.has(keys[i])) k[i] = 0;
                        else if (!Double.isNaN(k[i]) && !(k[i] > 0)) {
                            sp.problem(sp.at(keys[i]), keys[i], "spring stiffness must be positive");
                        } else if (fix[i]) {
                            sp.problem(sp.at(keys[i]), keys[i], "direction " + keys[i] + " is both fixed and sprung; expected one or the other");
                        }
                    }
                }
            }
            out.put(e.key(), new Support(e.key(), fix[0], fix[1], fix[2], angle, k[0], k[1], k[2], e.keyAt()));
        }
        return out;
    }

    private int dof(Tree d, String field) {
        if (d instanceof Tree.Scalar s) {
            switch (s.text()) {
                case "ux": return 0;
                case "uy": return 1;
                case "rz": return 2;
                default:
            }
        }
        problems.add(new Problem(d.at(), field, "found " + d.describe() + "; expected ux, uy or rz"));
        return -1;
    }

    Map<String, Member> members(Tree t, SourceRef where, Map<String, Node> nodes, Map<String, Section> sections) {
        Map<String, Member> out = new LinkedHashMap<>();
        for (Tree.Entry e : Fields.named(t, problems, "members", true, where, "a map of named members, e.g. M1: {from: A, to: B, section: G1}")) {
            String path = "members." + e.key();
            Fields f = Fields.of(e.value(), path, problems, List.of("from", "to", "section", "hinge", "truss"),
                    "a map such as {from: A, to: B, section: G1}");
            if (f == null) continue;
            String from = f.text("from", true, "a node name");
            String to = f.text("to", true, "a node name");
            nodeRef(f, "from", from, nodes);
            nodeRef(f, "to", to, nodes);
            String sec = f.text("section", true, "a section name");
            if (sec != null && !sections.containsKey(sec)) {
                f.problem(f.at("section"), "section", Fields.unknown("section", sec, sections.keySet(),
                        "expected one of: " + Fields.sorted(sections.keySet())));
            }
            String hinge = f.text("hinge", false, "start, end or both");
            boolean hs = false, he = false;
            if (hinge != null) {
                switch (hinge) {
                    case "start" -> hs = true;
                    case "end" -> he = true;
                    case "both" -> { hs = true; he = true; }
                    default -> f.problem(f.at("hinge"), "hinge", "found '" + hinge + "'; expected start, end or both");
                }
            }
            boolean truss = f.bool("truss", false);
            if (truss && hinge != null) {
                f.problem(f.at("hinge"), "hinge", "a truss member is already pinned at both ends; expected no hinge key");
            }
            if (truss && sec != null && sections.containsKey(sec)) {
                // a truss member needs only the area
            } else if (sec != null && sections.containsKey(sec) && Double.isNaN(sections.get(sec).inertiaM4())) {
                f.problem(f.at("section"), "section", "section '" + sec + "' has no I; a frame member needs I (or set truss: true)");
            }
            out.put(e.key(), new Member(e.key(), from, to, sec, hs, he, truss, e.keyAt()));
        }
        if (t instanceof Tree.MapNode mn && mn.entries().isEmpty()) {
            problems.add(new Problem(t.at(), "members", "no members; expected at least one"));
        }
        return out;
    }
}
