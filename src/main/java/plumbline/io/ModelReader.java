package plumbline.io;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import plumbline.model.ClaimSet;
import plumbline.model.Combination;
import plumbline.model.InputException;
import plumbline.model.Job;
import plumbline.model.LoadCase;
import plumbline.model.LoadDirection;
import plumbline.model.Material;
import plumbline.model.Member;
import plumbline.model.MemberLoad;
import plumbline.model.Model;
import plumbline.model.Node;
import plumbline.model.NodeLoad;
import plumbline.model.Problem;
import plumbline.model.Section;
import plumbline.model.Settlement;
import plumbline.model.SourceRef;
import plumbline.model.Support;
import plumbline.model.Temperature;
import plumbline.units.Dimension;
import plumbline.units.Unit;
import plumbline.units.UnitParseException;
import plumbline.units.UnitSystem;
import plumbline.units.Units;

/**
 * Reads a model file (format reference (src/site/markdown/formats.md) sections 1 to 4) into a {@link Model} in SI units. Every
 * problem is collected with its file, line and column before one {@link InputException}
 * is thrown; nothing is half-read.
 */
public final class ModelReader {

    public static final String FORMAT_MAJOR = "plumbline/1";

    private static final List<String> TOP_KEYS = List.of("format", "job", "units", "materials", "sections",
            "nodes", "supports", "members", "loads", "combinations", "standard_combinations", "claims",
            "force_method");

    private final String file;
    private final List<Problem> problems = new ArrayList<>();

    private ModelReader(String file) {
        this.file = file;
    }

    /** Reads {@code path} (.yaml, .yml or .json). */
    public static Model read(Path path) throws InputException {
        String name = path.toString();
        String text = readText(path);
        return read(name, text, isYaml(name));
    }

    static boolean isYaml(String name) throws InputException {
        String lower = name.toLowerCase(Locale.ROOT);
        if (lower.endsWith(".yaml") || lower.endsWith(".yml")) return true;
        if (lower.endsWith(".json")) return false;
        throw new InputException(new Problem(SourceRef.none(name), "(file)",
                "unknown file type; expected a name ending in .yaml, .yml or .json"));
    }

    static String readText(Path path) throws InputException {
        String name = path.toString();
        try {
            if (!Files.isRegularFile(path)) {
                throw new InputException(new Problem(SourceRef.none(name), "(file)", "no such file"));
            }
            if (Files.size(path) > TreeReader.MAX_CHARS) {
                throw new InputException(new Problem(SourceRef.none(name), "(file)",
                        "file is " + Files.size(path) + " bytes; at most " + TreeReader.MAX_CHARS + " are read"));
            }
            byte[] bytes = Files.readAllBytes(path);
            String text = new String(bytes, StandardCharsets.UTF_8);
            if (text.indexOf('\0') >= 0) {
                throw new InputException(new Problem(SourceRef.none(name), "(file)",
                        "the file holds binary data; expected a YAML, JSON or CSV text file"));
            }
            if (!text.isEmpty() && text.charAt(0) == '\uFEFF') text = text.substring(1);
            return text;
        } catch (IOException e) {
            throw new InputException(new Problem(SourceRef.none(name), "(file)", "cannot read: " + e.getMessage()));
        }
    }

    public static Model read(String file, String text, boolean yaml) throws InputException {
        Tree root = TreeReader.read(file, text, yaml);
        ModelReader r = new ModelReader(file);
        Model m = r.model(root);
        if (!r.problems.isEmpty() || m == null) throw new InputException(r.problems);
        return m;
    }

    private Model model(Tree root) {
        if (root instanceof Tree.MapNode mn && mn.entries().containsKey("claims") && !mn.entries().containsKey("format")) {
            problems.add(new Problem(mn.at(), "(document)", "this is a claims file, not a model; expected a model "
                    + "with 'format: plumbline/1' (give claims files with --claims)"));
            return null;
        }
        Fields top = Fields.of(root, "", problems, TOP_KEYS, "a map with 'format: plumbline/1'");
        if (top == null) return null;
        String format = top.text("format", true, "'" + FORMAT_MAJOR + "'");
        if (format != null && !format.equals(FORMAT_MAJOR)) {
            String why = format.startsWith("plumbline/") ? "unknown major version '" + format + "'"
                    : "'" + format + "' is not a Plumbline model format";
            top.problem(top.at("format"), "format", why + "; this tool reads '" + FORMAT_MAJOR + "'");
        }
        UnitSystem units = unitSystem(top.get("units"), "units", true);
        if (units == null) return null;
        Job job = job(top.get("job"));
        Map<String, Material> materials = materials(top.get("materials"), units);
        Map<String, Section> sections = sections(top.get("sections"), units, materials);
        Map<String, Node> nodes = nodes(top.get("nodes"), top.map.at(), units);
        Map<String, Support> supports = supports(top.get("supports"), units, nodes);
        Map<String, Member> members = members(top.get("members"), top.map.at(), nodes, sections);
        List<LoadCase> cases = loadCases(top.get("loads"), units, nodes, members, supports);
        List<Combination> combos = combinations(top.get("combinations"), cases);
        List<String> standards = new ArrayList<>();
        for (Tree t : top.list("standard_combinations", false, "a list of standard combination sets")) {
            if (t instanceof Tree.Scalar s && Combination.STANDARD_SETS.contains(s.text())) {
                if (standards.contains(s.text())) problems.add(new Problem(t.at(), "standard_combinations", "'" + s.text() + "' listed twice"));
                else standards.add(s.text());
            } else if (t instanceof Tree.Scalar s) {
                String hint = Fields.closest(s.text(), Combination.STANDARD_SETS);
                problems.add(new Problem(t.at(), "standard_combinations", "unknown set '" + s.text() + "'"
                        + (hint != null ? "; did you mean '" + hint + "'?" : "; expected one of " + String.join(", ", Combination.STANDARD_SETS))));
            }
            else problems.add(new Problem(t.at(), "standard_combinations", "found " + t.describe() + "; expected a name"));
        }
        List<String> redundants = redundants(top.get("force_method"));
        Model partial = new Model(file, job, units, materials, sections, nodes, supports, members, cases, combos,
                standards, redundants, List.of());
        List<ClaimSet> claims = new ArrayList<>();
        if (top.has("claims")) {
            ClaimSet cs = ClaimsReader.claimSet(top.get("claims"), file, "claims", problems, partial);
            if (cs != null) claims.add(cs);
        }
        return partial.withClaims(claims);
    }

    static UnitSystem unitSystem(Tree t, String path, List<Problem> problems, boolean required, SourceRef where) {
        if (t == null) {
            if (required) problems.add(new Problem(where, path, "missing; expected e.g. {force: kN, length: m}"));
            return null;
        }
        Fields f = Fields.of(t, path, problems, List.of("force", "length"), "a map such as {force: kN, length: m}");
        if (f == null) return null;
        Unit force = unit(f, "force", Dimension.FORCE, problems);
        Unit length = unit(f, "length", Dimension.LENGTH, problems);
        return force == null || length == null ? null : new UnitSystem(force, length);
    }

    private UnitSystem unitSystem(Tree t, String path, boolean required) {
        return unitSystem(t, path, problems, required, new SourceRef(file, 1, 1));
    }

    private static Unit unit(Fields f, String key, Dimension d, List<Problem> problems) {
        String s = f.text(key, true, "a " + d.describe() + " unit such as " + (d == Dimension.FORCE ? "kN" : "m"));
        if (s == null) return null;
        try {
            Unit u = Units.parse(s);
            if (!u.dimension().equals(d)) {
                f.problem(f.at(key), key, "unit '" + s + "' is " + u.dimension().describe() + "; expected a " + d.describe() + " unit");
                return null;
            }
            return new Unit(s, u.dimension(), u.toInternal());
        } catch (UnitParseException e) {
            f.problem(f.at(key), key, e.getMessage());
            return null;
        }
    }

    private Job job(Tree t) {
        if (t == null) return Job.EMPTY;
        Fields f = Fields.of(t, "job", problems,
                List.of("title", "project", "calc_ref", "originator", "checker", "scope", "category"), "a map of text fields");
        if (f == null) return Job.EMPTY;
        return new Job(str(f, "title"), str(f, "project"), str(f, "calc_ref"), str(f, "originator"),
                str(f, "checker"), str(f, "scope"), str(f, "category"));
    }

    private static String str(Fields f, String key) {
        String s = f.text(key, false, "text");
        return s == null ? "" : s;
    }

    /** Each entry of a map of named parts; records a problem if {@code t} is not a map. */
    private List<Tree.Entry> named(Tree t, String path, boolean required, SourceRef where, String expected) {
        if (t == null) {
            if (required) problems.add(new Problem(where, path, "missing; expected " + expected));
            return List.of();
        }
        if (t instanceof Tree.MapNode m) return new ArrayList<>(m.entries().values());
        problems.add(new Problem(t.at(), path, "found " + t.describe() + "; expected " + expected));
        return List.of();
    }

    private Map<String, Material> materials(Tree t, UnitSystem u) {
        Map<String, Material> out = new LinkedHashMap<>();
        for (Tree.Entry e : named(t, "materials", false, null, "a map of named materials")) {
            String path = "materials." + e.key();
            Fields f = Fields.of(e.value(), path, problems, List.of("E", "density", "alpha"), "a map such as {E: 210 GPa}");
            if (f == null) continue;
            double eModulus = f.quantity("E", Dimension.STRESS, u, true);
            positive(f, "E", eModulus, "a positive modulus of elasticity");
            double density = f.quantity("density", Dimension.WEIGHT_DENSITY, u, false);
            if (f.has("density") && Double.isFinite(density) && density < 0) {
                f.problem(f.at("density"), "density", "is negative; expected a weight density >= 0");
            }
            double alpha = f.quantity("alpha", Dimension.PER_TEMPERATURE, u, false);
            out.put(e.key(), new Material(e.key(), eModulus, f.has("density") ? density : Double.NaN, alpha,
                    e.keyAt()));
        }
        return out;
    }

    private static void positive(Fields f, String key, double v, String expected) {
        if (f.has(key) && !Double.isNaN(v) && !(v > 0 && Double.isFinite(v))) {
            f.problem(f.at(key), key, "is " + v + " in SI; expected " + expected);
        }
    }

    private Map<String, Section> sections(Tree t, UnitSystem u, Map<String, Material> materials) {
        Map<String, Section> out = new LinkedHashMap<>();
        for (Tree.Entry e : named(t, "sections", false, null, "a map of named sections")) {
            String path = "sections." + e.key();
            Fields f = Fields.of(e.value(), path, problems, List.of("A", "I", "depth", "material"),
                    "a map such as {A: 6650 mm2, I: 1.42e8 mm4, material: steel}");
            if (f == null) continue;
            double a = f.quantity("A", Dimension.AREA, u, true);
            positive(f, "A", a, "a positive area");
            double i = f.quantity("I", Dimension.SECOND_MOMENT, u, false);
            positive(f, "I", i, "a positive second moment of area");
            double depth = f.quantity("depth", Dimension.LENGTH, u, false);
            positive(f, "depth", depth, "a positive depth");
            String mat = f.text("material", true, "the name of a material");
            if (mat != null && !materials.containsKey(mat)) {
                String hint = Fields.closest(mat, materials.keySet());
                f.problem(f.at("material"), "material", "unknown material '" + mat + "'"
                        + (hint != null ? "; did you mean '" + hint + "'?" : "; expected one of: " + Fields.sorted(materials.keySet())));
            }
            out.put(e.key(), new Section(e.key(), a, i, depth, mat, e.keyAt()));
        }
        return out;
    }

    private Map<String, Node> nodes(Tree t, SourceRef where, UnitSystem u) {
        Map<String, Node> out = new LinkedHashMap<>();
        for (Tree.Entry e : named(t, "nodes", true, where, "a map of named nodes, e.g. A: [0, 0]")) {
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

    private void nodeRef(Fields f, String key, String name, Map<String, ?> nodes, String what) {
        if (name != null && !nodes.containsKey(name)) {
            String hint = Fields.closest(name, nodes.keySet());
            f.problem(f.at(key), key, "unknown " + what + " '" + name + "'"
                    + (hint != null ? "; did you mean '" + hint + "'?" : "; expected a " + what + " defined under " + what + "s"));
        }
    }

    private Map<String, Support> supports(Tree t, UnitSystem u, Map<String, Node> nodes) {
        Map<String, Support> out = new LinkedHashMap<>();
        for (Tree.Entry e : named(t, "supports", false, null, "a map from node name to support")) {
            String path = "supports." + e.key();
            if (!nodes.containsKey(e.key())) {
                String hint = Fields.closest(e.key(), nodes.keySet());
                problems.add(new Problem(e.keyAt(), path, "unknown node '" + e.key() + "'"
                        + (hint != null ? "; did you mean '" + hint + "'?" : "; a support must name a node")));
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

    private Map<String, Member> members(Tree t, SourceRef where, Map<String, Node> nodes, Map<String, Section> sections) {
        Map<String, Member> out = new LinkedHashMap<>();
        for (Tree.Entry e : named(t, "members", true, where, "a map of named members, e.g. M1: {from: A, to: B, section: G1}")) {
            String path = "members." + e.key();
            Fields f = Fields.of(e.value(), path, problems, List.of("from", "to", "section", "hinge", "truss"),
                    "a map such as {from: A, to: B, section: G1}");
            if (f == null) continue;
            String from = f.text("from", true, "a node name");
            String to = f.text("to", true, "a node name");
            nodeRef(f, "from", from, nodes, "node");
            nodeRef(f, "to", to, nodes, "node");
            String sec = f.text("section", true, "a section name");
            if (sec != null && !sections.containsKey(sec)) {
                String hint = Fields.closest(sec, sections.keySet());
                f.problem(f.at("section"), "section", "unknown section '" + sec + "'"
                        + (hint != null ? "; did you mean '" + hint + "'?" : "; expected one of: " + Fields.sorted(sections.keySet())));
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
            if (from != null && from.equals(to)) {
                problems.add(new Problem(e.keyAt(), path, "starts and ends at node " + from + "; expected two different nodes"));
            } else if (from != null && to != null && nodes.containsKey(from) && nodes.containsKey(to)) {
                Node a = nodes.get(from), b = nodes.get(to);
                if (a.xM() == b.xM() && a.yM() == b.yM()) {
                    problems.add(new Problem(e.keyAt(), path, "has zero length (nodes " + from + " and " + to
                            + " are at the same point); expected a member of positive length"));
                }
            }
            out.put(e.key(), new Member(e.key(), from, to, sec, hs, he, truss, e.keyAt()));
        }
        if (t instanceof Tree.MapNode mn && mn.entries().isEmpty()) {
            problems.add(new Problem(t.at(), "members", "no members; expected at least one"));
        }
        return out;
    }

    private List<LoadCase> loadCases(Tree t, UnitSystem u, Map<String, Node> nodes, Map<String, Member> members,
                                     Map<String, Support> supports) {
        List<LoadCase> out = new ArrayList<>();
        for (Tree.Entry e : named(t, "loads", false, null, "a map of named load cases")) {
            String path = "loads." + e.key();
            Fields f = Fields.of(e.value(), path, problems, List.of("type", "self_weight", "pattern", "member_loads",
                    "node_loads", "temperatures", "settlements"), "a map with type and loads");
            if (f == null) continue;
            String type = f.text("type", true, "one of " + String.join(", ", LoadCase.TYPES));
            if (type != null && !LoadCase.TYPES.contains(type)) {
                String hint = Fields.closest(type, LoadCase.TYPES);
                f.problem(f.at("type"), "type", "unknown load case type '" + type + "'"
                        + (hint != null ? "; did you mean '" + hint + "'?" : "; expected one of " + String.join(", ", LoadCase.TYPES)));
            }
            boolean sw = f.bool("self_weight", false);
            boolean pattern = f.bool("pattern", false);
            List<MemberLoad> ml = new ArrayList<>();
            List<Tree> items = f.list("member_loads", false, "a list of member loads");
            for (int i = 0; i < items.size(); i++) {
                memberLoad(items.get(i), path + ".member_loads[" + i + "]", u, members, nodes, ml);
            }
            List<NodeLoad> nl = new ArrayList<>();
            items = f.list("node_loads", false, "a list of node loads");
            for (int i = 0; i < items.size(); i++) {
                String p = path + ".node_loads[" + i + "]";
                Fields g = Fields.of(items.get(i), p, problems, List.of("node", "Fx", "Fy", "Mz"), "a map such as {node: B, Fy: -20}");
                if (g == null) continue;
                String node = g.text("node", true, "a node name");
                nodeRef(g, "node", node, nodes, "node");
                double fx = orZero(g, "Fx", Dimension.FORCE, u);
                double fy = orZero(g, "Fy", Dimension.FORCE, u);
                double mz = orZero(g, "Mz", Dimension.MOMENT, u);
                if (!g.has("Fx") && !g.has("Fy") && !g.has("Mz")) g.missing("Fy", "at least one of Fx, Fy, Mz");
                nl.add(new NodeLoad(node, fx, fy, mz, items.get(i).at()));
            }
            List<Temperature> temps = new ArrayList<>();
            items = f.list("temperatures", false, "a list of member temperatures");
            for (int i = 0; i < items.size(); i++) {
                String p = path + ".temperatures[" + i + "]";
                Fields g = Fields.of(items.get(i), p, problems, List.of("member", "members", "uniform", "gradient"),
                        "a map such as {member: M1, uniform: 25 degC, gradient: 10 degC}");
                if (g == null) continue;
                double uni = orZero(g, "uniform", Dimension.TEMPERATURE, u);
                double grad = orZero(g, "gradient", Dimension.TEMPERATURE, u);
                if (!g.has("uniform") && !g.has("gradient")) g.missing("uniform", "uniform and/or gradient");
                for (String m : memberNames(g, members)) temps.add(new Temperature(m, uni, grad, items.get(i).at()));
            }
            List<Settlement> sets = new ArrayList<>();
            items = f.list("settlements", false, "a list of support settlements");
            for (int i = 0; i < items.size(); i++) {
                String p = path + ".settlements[" + i + "]";
                Fields g = Fields.of(items.get(i), p, problems, List.of("node", "ux", "uy", "rz"),
                        "a map such as {node: B, uy: -10 mm}");
                if (g == null) continue;
                String node = g.text("node", true, "a node name");
                nodeRef(g, "node", node, nodes, "node");
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
                sets.add(new Settlement(node, v[0], v[1], v[2], items.get(i).at()));
            }
            out.add(new LoadCase(e.key(), type, sw, pattern, ml, nl, temps, sets, e.keyAt()));
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
                String hint = Fields.closest(m, members.keySet());
                String key = g.has("member") ? "member" : "members";
                g.problem(g.at(key), key, "unknown member '" + m + "'"
                        + (hint != null ? "; did you mean '" + hint + "'?" : "; expected a member defined under members"));
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
    private double position(Fields g, String key, double lengthM, UnitSystem u) {
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

    private List<Combination> combinations(Tree t, List<LoadCase> cases) {
        List<Combination> out = new ArrayList<>();
        List<String> caseNames = cases.stream().map(LoadCase::name).toList();
        for (Tree.Entry e : named(t, "combinations", false, null, "a map of named combinations")) {
            String path = "combinations." + e.key();
            if (caseNames.contains(e.key())) {
                problems.add(new Problem(e.keyAt(), path, "combination '" + e.key()
                        + "' has the name of a load case; expected a name of its own"));
            }
            if (e.key().equals("envelope")) {
                problems.add(new Problem(e.keyAt(), path, "'envelope' is reserved for the envelope over all combinations"));
            }
            Fields f = Fields.of(e.value(), path, problems, caseNames, "a map from load case to factor, e.g. {D: 1.35, L: 1.5}");
            if (f == null) continue;
            Map<String, Double> factors = new LinkedHashMap<>();
            for (Tree.Entry c : f.map.entries().values()) {
                if (!caseNames.contains(c.key())) continue; // reported as unknown key
                if (c.value() instanceof Tree.Scalar s && s.kind() == Tree.Scalar.Kind.NUMBER) {
                    double v = Double.parseDouble(s.text());
                    if (!Double.isFinite(v)) f.problem(s.at(), c.key(), "factor is not finite");
                    factors.put(c.key(), v);
                } else {
                    f.problem(c.value().at(), c.key(), "found " + c.value().describe() + "; expected a load factor (a number)");
                }
            }
            if (f.map.entries().isEmpty()) problems.add(new Problem(e.value().at(), path, "no load cases; expected at least one"));
            out.add(new Combination(e.key(), factors, "user combination", e.keyAt()));
        }
        return out;
    }

    private List<String> redundants(Tree t) {
        if (t == null) return List.of();
        Fields f = Fields.of(t, "force_method", problems, List.of("redundants"), "a map such as {redundants: [B.Fy]}");
        if (f == null) return List.of();
        List<String> out = new ArrayList<>();
        for (Tree r : f.list("redundants", false, "a list such as [B.Fy, M2.M_end]")) {
            if (r instanceof Tree.Scalar s && s.kind() != Tree.Scalar.Kind.NULL) out.add(s.text());
            else problems.add(new Problem(r.at(), "force_method.redundants", "found " + r.describe() + "; expected a name such as B.Fy"));
        }
        return out;
    }
}
