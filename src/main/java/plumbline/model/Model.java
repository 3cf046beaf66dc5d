package plumbline.model;

import java.util.ArrayList;
import java.util.Collections;
import java.util.HashSet;
import java.util.IdentityHashMap;
import java.util.Iterator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.function.BiPredicate;
import plumbline.units.UnitSystem;

/**
 * A validated plane model in SI units (N, m, Pa, rad, K). Nodes, members and the other
 * named parts keep the order in which they were written; maps are keyed by name.
 * {@code redundants} names the force-method redundants chosen by the user (may be empty).
 */
public record Model(String file, Job job, UnitSystem units, Map<String, Material> materials,
                    Map<String, Section> sections, Map<String, Node> nodes, Map<String, Support> supports,
                    Map<String, Member> members, List<LoadCase> loadCases, List<Combination> combinations,
                    List<String> standardCombinations, List<String> redundants, List<ClaimSet> claims, Geometry geometry) {

    /**
     * What the nodes' coordinates and the sections give, worked out once per model (the solvers
     * and the equilibrium check ask for a member's length and direction many times per load
     * set): each member's placement, keyed by the member object itself (the very members of
     * this model; an identity lookup needs no name comparison), the model's extent, and the
     * largest axial stiffness EA of its members.
     */
    public record Geometry(Map<Member, Placement> members, double extentM, double largestAxialStiffnessN) {
        static Geometry of(Map<String, Node> nodes, Map<String, Member> members, Map<String, Section> sections,
                           Map<String, Material> materials) {
            Map<Member, Placement> out = new IdentityHashMap<>(members.size());
            double ea = 0;
            for (Member m : members.values()) {
                Node a = nodes.get(m.from()), b = nodes.get(m.to());
                if (a != null && b != null) out.put(m, Placement.between(a, b)); // an unknown node is reported by the structure check
                Section s = sections.get(m.section());
                Material mat = s == null ? null : materials.get(s.material());
                if (mat != null) ea = Math.max(ea, mat.ePa() * s.areaM2());
            }
            double minX = Double.POSITIVE_INFINITY, maxX = Double.NEGATIVE_INFINITY;
            double minY = Double.POSITIVE_INFINITY, maxY = Double.NEGATIVE_INFINITY;
            for (Node n : nodes.values()) {
                minX = Math.min(minX, n.xM());
                maxX = Math.max(maxX, n.xM());
                minY = Math.min(minY, n.yM());
                maxY = Math.max(maxY, n.yM());
            }
            double extent = nodes.isEmpty() ? 1.0 : Math.max(Math.hypot(maxX - minX, maxY - minY), 1e-9);
            return new Geometry(Collections.unmodifiableMap(out), extent, ea);
        }
    }

    /**
     * Where a member lies: its end relative to its start {dxM, dyM} (m, global), its length
     * (m) and its unit vector from start to end {cx, cy} (its local x axis in global axes).
     */
    public record Placement(double lengthM, double cx, double cy, double dxM, double dyM) {
        static Placement between(Node a, Node b) {
            double dx = b.xM() - a.xM(), dy = b.yM() - a.yM(), len = Math.hypot(dx, dy);
            return new Placement(len, dx / len, dy / len, dx, dy);
        }
    }

    /** A model; its geometry is worked out from the nodes and members. */
    public Model(String file, Job job, UnitSystem units, Map<String, Material> materials,
                 Map<String, Section> sections, Map<String, Node> nodes, Map<String, Support> supports,
                 Map<String, Member> members, List<LoadCase> loadCases, List<Combination> combinations,
                 List<String> standardCombinations, List<String> redundants, List<ClaimSet> claims) {
        this(file, job, units, materials, sections, nodes, supports, members, loadCases, combinations, standardCombinations,
                redundants, claims, Geometry.of(nodes, members, sections, materials));
    }

    public Model {
        materials = Collections.unmodifiableMap(new LinkedHashMap<>(materials));
        sections = Collections.unmodifiableMap(new LinkedHashMap<>(sections));
        nodes = Collections.unmodifiableMap(new LinkedHashMap<>(nodes));
        supports = Collections.unmodifiableMap(new LinkedHashMap<>(supports));
        members = Collections.unmodifiableMap(new LinkedHashMap<>(members));
        loadCases = List.copyOf(loadCases);
        combinations = List.copyOf(combinations);
        standardCombinations = List.copyOf(standardCombinations);
        redundants = List.copyOf(redundants);
        claims = List.copyOf(claims);
    }

    public Node node(String name) {
        return nodes.get(name);
    }

    public Member member(String name) {
        return members.get(name);
    }

    /**
     * The part named {@code name} of a map read in step with another list in the same order:
     * the next of {@code names} and {@code parts} (iterators over the map's names and parts,
     * advanced together one step) when it has that name, else the part looked up in
     * {@code byName}. How an engine's solution, listed in the model's order, is read member by
     * member without a lookup each (two iterators: an entry iterator of an unmodifiable map
     * wraps every entry).
     */
    public static <T> T inStep(Iterator<String> names, Iterator<T> parts, String name, Map<String, T> byName) {
        if (names.hasNext()) {
            String next = names.next();
            T part = parts.next();
            if (next.equals(name)) return part;
        }
        return byName.get(name);
    }

    public LoadCase loadCase(String name) {
        for (LoadCase c : loadCases) if (c.name().equals(name)) return c;
        return null;
    }

    public Section sectionOf(Member m) {
        return sections.get(m.section());
    }

    public Material materialOf(Member m) {
        return materials.get(sectionOf(m).material());
    }

    /** Where the member lies (its length, direction and extent along x and y); any member, this model's found at once. */
    public Placement placementOf(Member m) {
        Placement p = geometry.members().get(m);
        return p != null ? p : Placement.between(node(m.from()), node(m.to())); // a member not of this model (a variant's)
    }

    public double lengthM(Member m) {
        return placementOf(m).lengthM();
    }

    /** The member's unit vector from its start to its end, {cx, cy}: its local x axis in global axes. */
    public double[] directionOf(Member m) {
        Placement p = placementOf(m);
        return new double[]{p.cx(), p.cy()};
    }

    /** The largest axial stiffness EA of the model's members (N), 0 with none. */
    public double largestAxialStiffnessN() {
        return geometry.largestAxialStiffnessN();
    }

    /** Axial stiffness EA of a member (N). */
    public double axialStiffnessN(Member m) {
        return materialOf(m).ePa() * sectionOf(m).areaM2();
    }

    /** Bending stiffness EI of a member (N*m2); NaN when its section gives no I. */
    public double bendingStiffnessNm2(Member m) {
        return materialOf(m).ePa() * sectionOf(m).inertiaM4();
    }

    /**
     * The largest distance across the model's nodes, at least 1e-9 m: the length that makes
     * moments commensurate with forces in residuals and rank tests.
     */
    public double extentM() {
        return geometry.extentM();
    }

    /**
     * The nodes that carry a rotation freedom and a moment equation: those where some member
     * end is rigid (neither hinged nor truss) or a support restrains or springs rotation. At
     * any other node every member end turns freely, so its rotation is not a freedom.
     */
    public Set<String> rotationalNodes() {
        Set<String> out = new HashSet<>();
        for (Member m : members.values()) {
            if (!m.releasedStart()) out.add(m.from());
            if (!m.releasedEnd()) out.add(m.to());
        }
        for (Support s : supports.values()) if (s.reacts(2)) out.add(s.node());
        return out;
    }

    /**
     * Whether the other model has this one's nodes, members and supports, the very objects in
     * the same order: all that the statics (determinacy and stability) reads. A variant that
     * changes only loads, properties or claims shares them; one that changes a support or a
     * member does not (objects are compared as the same object only, so a rebuilt but equal
     * part counts as different: the careful answer).
     */
    public boolean hasTheSameFrameAs(Model other) {
        BiPredicate<Object, Object> sameObject = (x, y) -> x == y;
        return sameParts(nodes, other.nodes, sameObject) && sameParts(members, other.members, sameObject)
                && sameParts(supports, other.supports, sameObject);
    }

    /** The same names in the same order, the parts under each name {@code alike}: how variants of a model are compared. */
    public static <T> boolean sameParts(Map<String, T> a, Map<String, T> b, BiPredicate<? super T, ? super T> alike) {
        if (a == b) return true;
        if (a.size() != b.size()) return false;
        Iterator<Map.Entry<String, T>> ia = a.entrySet().iterator(), ib = b.entrySet().iterator();
        while (ia.hasNext()) {
            Map.Entry<String, T> x = ia.next(), y = ib.next();
            if (!x.getKey().equals(y.getKey()) || !alike.test(x.getValue(), y.getValue())) return false;
        }
        return true;
    }

    /** This model with more claims; the very nodes, members and sections, so its geometry is this one's. */
    public Model withClaims(List<ClaimSet> more) {
        List<ClaimSet> all = new ArrayList<>(claims);
        all.addAll(more);
        return new Model(file, job, units, materials, sections, nodes, supports, members, loadCases,
                combinations, standardCombinations, redundants, all, geometry);
    }
}
