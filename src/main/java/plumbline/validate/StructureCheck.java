package plumbline.validate;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
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
import plumbline.model.SourceRef;
import plumbline.model.Temperature;

/**
 * Checks of a read model that need its geometry as a whole: zero-length members,
 * coincident nodes, unconnected nodes, and load kinds that need a property the model
 * lacks. Returns every problem found; an empty list means the model can be analysed.
 */
public final class StructureCheck {

    /**
     * Two nodes closer than this fraction of the model's extent are taken as one point
     * (common practice: a coordinate slip, not an intended joint).
     */
    public static final double COINCIDENT_FRACTION = 1e-9;

    private StructureCheck() {
    }

    public static List<Problem> check(Model m) {
        List<Problem> out = new ArrayList<>();
        double extent = m.extentM();
        double tol = Math.max(extent * COINCIDENT_FRACTION, 1e-12);
        Set<String> connected = new HashSet<>();
        for (Member mem : m.members().values()) {
            connected.add(mem.from());
            connected.add(mem.to());
            if (mem.from().equals(mem.to())) {
                out.add(new Problem(mem.at(), "members." + mem.name(), "starts and ends at node " + mem.from()
                        + "; expected two different nodes"));
            } else if (m.lengthM(mem) <= tol) {
                double lm = m.lengthM(mem);
                String length = lm == 0 ? "zero length (nodes " + mem.from() + " and " + mem.to() + " coincide)"
                        : String.format(Locale.ROOT, "a length of %.3g %s, too short beside the model's extent of %.4g %s: "
                                + "members shorter than %.0e of the extent (%.3g %s) are taken as coincident nodes, since the "
                                + "solution would lose its accuracy", m.units().length().fromInternal(lm), m.units().length().symbol(),
                        m.units().length().fromInternal(extent), m.units().length().symbol(), COINCIDENT_FRACTION,
                        m.units().length().fromInternal(tol), m.units().length().symbol());
                out.add(new Problem(mem.at(), "members." + mem.name(), "has " + length + "; expected a member of positive length"
                        + (lm == 0 ? "" : " (merge the two nodes, or model the short piece in a separate model)")));
            }
        }
        Map<String, String> cells = new HashMap<>();
        for (Node n : m.nodes().values()) {
            if (!connected.contains(n.name())) {
                out.add(new Problem(n.at(), "nodes." + n.name(), "node " + n.name()
                        + " is connected to no member; expected every node to be the end of a member"));
            }
            String key = Math.round(n.xM() / tol) + ":" + Math.round(n.yM() / tol);
            String other = cells.putIfAbsent(key, n.name());
            if (other != null) {
                out.add(new Problem(n.at(), "nodes." + n.name(), "node " + n.name() + " is at the same point as node "
                        + other + "; expected distinct coordinates (join the members at one node)"));
            }
        }
        if (m.members().isEmpty()) {
            out.add(new Problem(SourceRef.none(m.file()), "members", "no members; expected at least one"));
        }
        Set<String> rotational = m.rotationalNodes();
        for (LoadCase c : m.loadCases()) {
            String path = "loads." + c.name();
            if (c.selfWeight()) {
                Set<String> told = new HashSet<>();
                for (Member mem : m.members().values()) {
                    Material mat = m.materialOf(mem);
                    if (mat != null && Double.isNaN(mat.weightDensityNPerM3()) && told.add(mat.name())) {
                        out.add(new Problem(c.at(), path + ".self_weight", "material " + mat.name()
                                + " has no density; expected materials." + mat.name() + ".density for self-weight"));
                    }
                }
            }
            for (Temperature t : c.temperatures()) {
                Member mem = m.member(t.member());
                Material mat = m.materialOf(mem);
                Section sec = m.sectionOf(mem);
                if (mat != null && Double.isNaN(mat.alphaPerK())) {
                    out.add(new Problem(t.at(), path + ".temperatures", "member " + mem.name() + ": material "
                            + mat.name() + " has no alpha; expected a coefficient of thermal expansion"));
                }
                if (t.gradientK() != 0 && sec != null && !sec.hasDepth()) {
                    out.add(new Problem(t.at(), path + ".temperatures", "member " + mem.name() + ": section " + sec.name()
                            + " has no depth; a temperature gradient needs the section depth"));
                }
                if (t.gradientK() != 0 && mem.truss()) {
                    out.add(new Problem(t.at(), path + ".temperatures", "member " + mem.name()
                            + " is a truss member; a gradient bends it, expected a frame member"));
                }
            }
            for (MemberLoad l : c.memberLoads()) {
                Member mem = m.member(l.member());
                Section sec = mem == null ? null : m.sectionOf(mem);
                if (sec != null && Double.isNaN(sec.inertiaM4()) && !(l instanceof MemberLoad.Distributed d && isAxial(d))) {
                    out.add(new Problem(l.at(), path + ".member_loads", "member " + mem.name() + " carries a load across it"
                            + " but section " + sec.name() + " has no I; expected I to find its bending"));
                }
            }
            for (NodeLoad nl : c.nodeLoads()) {
                if (nl.mzNm() != 0 && !rotational.contains(nl.node())) {
                    out.add(new Problem(nl.at(), path + ".node_loads", "a moment Mz at node " + nl.node()
                            + ", where every member end is hinged and no support restrains rotation; nothing can resist it"));
                }
            }
        }
        return out;
    }

    private static boolean isAxial(MemberLoad.Distributed d) {
        return d.dir() == LoadDirection.LOCAL_X;
    }


}
