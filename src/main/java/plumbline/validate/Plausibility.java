package plumbline.validate;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import plumbline.model.LoadCase;
import plumbline.model.Material;
import plumbline.model.Member;
import plumbline.model.MemberLoad;
import plumbline.model.Model;
import plumbline.model.Node;
import plumbline.model.NodeLoad;
import plumbline.model.Section;

/**
 * Plausibility lint of a valid model: values that are legal but unusual, where a unit or
 * typing slip most often hides. Each warning names its rule of thumb. They never stop a
 * check; they are listed in the output and the report.
 */
public final class Plausibility {

    /** One warning: the rule it comes from, what it is about, and what was found. */
    public record Warning(String rule, String subject, String message) {
        @Override
        public String toString() {
            return subject + ": " + message + " [" + rule + "]";
        }
    }

    /** E of structural materials: timber about 5 GPa to steel about 210 GPa (common practice). */
    static final double E_MIN_PA = 4e9, E_MAX_PA = 220e9;
    /** Weight densities: timber about 4 kN/m3 to steel 78.5 kN/m3 (common practice). */
    static final double DENSITY_MIN = 2e3, DENSITY_MAX = 90e3;
    /** Radius of gyration over depth: about 0.29 for a rectangle, 0.4 for an I-section (common practice). */
    static final double GYRATION_MIN = 0.1, GYRATION_MAX = 0.6;
    /** Span over depth of a beam: usually 10 to 35 (common practice). */
    static final double SPAN_DEPTH_MAX = 40, SPAN_DEPTH_MIN = 2;
    /** Line loads beyond 1000 kN/m or a node load beyond 50 MN are rarely real (common practice). */
    static final double LINE_LOAD_MAX = 1e6, NODE_LOAD_MAX = 5e7;
    /** Bending stiffness ratio of members meeting at a node beyond which one acts as rigid (common practice). */
    static final double STIFFNESS_RATIO = 1e3;

    private Plausibility() {
    }

    public static List<Warning> check(Model m) {
        List<Warning> out = new ArrayList<>();
        for (Material mat : m.materials().values()) {
            if (mat.ePa() < E_MIN_PA || mat.ePa() > E_MAX_PA) {
                out.add(new Warning("usual E of timber, concrete and steel is about 5 to 210 GPa (common practice)",
                        "material " + mat.name(), String.format(Locale.ROOT, "E = %.4g GPa", mat.ePa() / 1e9)));
            }
            double g = mat.weightDensityNPerM3();
            if (Double.isFinite(g) && g > 0 && (g < DENSITY_MIN || g > DENSITY_MAX)) {
                out.add(new Warning("weight densities run from about 4 (timber) to 78.5 kN/m3 (steel) (common practice)",
                        "material " + mat.name(), String.format(Locale.ROOT, "density = %.4g kN/m3%s", g / 1e3,
                        g > 1e6 ? "; a mass density in kg/m3 written as kN/m3?" : "")));
            }
        }
        for (Section s : m.sections().values()) {
            if (s.hasDepth() && Double.isFinite(s.inertiaM4())) {
                double r = Math.sqrt(s.inertiaM4() / s.areaM2());
                double ratio = r / s.depthM();
                if (ratio < GYRATION_MIN || ratio > GYRATION_MAX) {
                    out.add(new Warning("radius of gyration sqrt(I/A) is usually 0.29 to 0.45 of the depth (common practice)",
                            "section " + s.name(), String.format(Locale.ROOT, "sqrt(I/A) = %.3g of the depth: check the units of I, A and depth", ratio)));
                }
            }
        }
        Map<String, List<Member>> atNode = new HashMap<>();
        for (Member mem : m.members().values()) {
            atNode.computeIfAbsent(mem.from(), k -> new ArrayList<>()).add(mem);
            atNode.computeIfAbsent(mem.to(), k -> new ArrayList<>()).add(mem);
            Section s = m.sectionOf(mem);
            Node a = m.node(mem.from()), b = m.node(mem.to());
            boolean horizontal = Math.abs(b.yM() - a.yM()) < 0.2 * Math.abs(b.xM() - a.xM());
            if (!mem.truss() && horizontal && s.hasDepth()) {
                double ld = m.lengthM(mem) / s.depthM();
                if (ld > SPAN_DEPTH_MAX || ld < SPAN_DEPTH_MIN) {
                    out.add(new Warning("beam span over depth is usually 10 to 35 (common practice)", "member " + mem.name(),
                            String.format(Locale.ROOT, "span/depth = %.3g", ld)));
                }
            }
        }
        for (var e : atNode.entrySet()) {
            Member stiff = null, soft = null;
            for (Member mem : e.getValue()) {
                if (mem.truss()) continue;
                double ei = m.bendingStiffnessNm2(mem) / m.lengthM(mem);
                if (stiff == null || ei > m.bendingStiffnessNm2(stiff) / m.lengthM(stiff)) stiff = mem;
                if (soft == null || ei < m.bendingStiffnessNm2(soft) / m.lengthM(soft)) soft = mem;
            }
            if (stiff != null && soft != null && stiff != soft) {
                double r = (m.bendingStiffnessNm2(stiff) / m.lengthM(stiff))
                        / (m.bendingStiffnessNm2(soft) / m.lengthM(soft));
                if (r > STIFFNESS_RATIO) {
                    out.add(new Warning("members meeting at a node rarely differ in EI/L by more than 1000 (common practice)",
                            "node " + e.getKey(), String.format(Locale.ROOT, "member %s is %.3g times as stiff (EI/L) as %s",
                            stiff.name(), r, soft.name())));
                }
            }
        }
        for (LoadCase c : m.loadCases()) {
            for (MemberLoad l : c.memberLoads()) {
                if (l instanceof MemberLoad.Distributed d && Math.max(Math.abs(d.w1NPerM()), Math.abs(d.w2NPerM())) > LINE_LOAD_MAX) {
                    out.add(new Warning("floor and roof line loads are rarely above 1000 kN/m (common practice)",
                            "load case " + c.name() + ", member " + d.member(), String.format(Locale.ROOT, "w = %.4g kN/m: N/m written as kN/m?",
                            Math.max(Math.abs(d.w1NPerM()), Math.abs(d.w2NPerM())) / 1e3)));
                }
            }
            for (NodeLoad nl : c.nodeLoads()) {
                if (Math.hypot(nl.fxN(), nl.fyN()) > NODE_LOAD_MAX) {
                    out.add(new Warning("node loads above 50 MN are rare in buildings and bridges (common practice)",
                            "load case " + c.name() + ", node " + nl.node(), String.format(Locale.ROOT, "%.4g kN", Math.hypot(nl.fxN(), nl.fyN()) / 1e3)));
                }
            }
        }
        return out;
    }
}
