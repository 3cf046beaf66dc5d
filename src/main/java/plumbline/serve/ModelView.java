package plumbline.serve;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import plumbline.model.Combination;
import plumbline.model.LoadCase;
import plumbline.model.Member;
import plumbline.model.MemberLoad;
import plumbline.model.Model;
import plumbline.model.Node;
import plumbline.model.NodeLoad;
import plumbline.model.Settlement;
import plumbline.model.Support;
import plumbline.model.Temperature;
import plumbline.report.Console;
import plumbline.units.Dimension;
import plumbline.units.UnitSystem;

/**
 * What the workbench's drawing needs of a validated model, in the model's own units (as the
 * user wrote them): nodes, members with their direction and hinges, supports, and each load
 * case's loads with their values as labels. A load's direction is the global unit vector
 * (x right, y up) in which a positive value acts; the drawing multiplies by the value's sign.
 */
final class ModelView {

    private ModelView() {
    }

    static Map<String, Object> of(Model m) {
        UnitSystem u = m.units();
        Map<String, Object> out = new LinkedHashMap<>();
        out.put("units", Map.of("force", u.force().symbol(), "length", u.length().symbol()));
        out.put("title", m.job() == null || m.job().title() == null ? "" : m.job().title());
        List<Object> nodes = new ArrayList<>();
        for (Node n : m.nodes().values()) {
            nodes.add(map("name", n.name(), "x", len(u, n.xM()), "y", len(u, n.yM())));
        }
        out.put("nodes", nodes);
        List<Object> members = new ArrayList<>();
        for (Member mem : m.members().values()) {
            members.add(map("name", mem.name(), "from", mem.from(), "to", mem.to(), "section", mem.section(),
                    "hingeStart", mem.hingeStart(), "hingeEnd", mem.hingeEnd(), "truss", mem.truss(),
                    "length", Console.fmt(len(u, m.lengthM(mem))) + " " + u.length().symbol()));
        }
        out.put("members", members);
        List<Object> supports = new ArrayList<>();
        for (Support s : m.supports().values()) {
            supports.add(map("node", s.node(), "fix", List.of(s.fixUx(), s.fixUy(), s.fixRz()),
                    "angleDeg", Math.toDegrees(s.angleRad()),
                    "springs", List.of(s.springUxNPerM() > 0, s.springUyNPerM() > 0, s.springRzNmPerRad() > 0)));
        }
        out.put("supports", supports);
        List<Object> cases = new ArrayList<>();
        for (LoadCase c : m.loadCases()) cases.add(loadCase(m, c));
        out.put("cases", cases);
        List<Object> combos = new ArrayList<>();
        for (Combination c : m.combinations()) combos.add(map("name", c.name(), "factors", c.factors()));
        out.put("combinations", combos);
        return out;
    }

    private static Map<String, Object> loadCase(Model m, LoadCase c) {
        UnitSystem u = m.units();
        List<Object> loads = new ArrayList<>();
        for (MemberLoad l : c.memberLoads()) {
            Member mem = m.member(l.member());
            double[] e = m.directionOf(mem);
            if (l instanceof MemberLoad.Distributed d) {
                double[] dir = d.dir().unit(e[0], e[1]);
                String unit = u.symbol(Dimension.FORCE_PER_LENGTH);
                String label = d.w1NPerM() == d.w2NPerM() ? show(u, d.w1NPerM(), Dimension.FORCE_PER_LENGTH) + " " + unit
                        : show(u, d.w1NPerM(), Dimension.FORCE_PER_LENGTH) + " to " + show(u, d.w2NPerM(), Dimension.FORCE_PER_LENGTH)
                        + " " + unit;
                loads.add(map("kind", "distributed", "member", l.member(), "from", len(u, d.fromM()), "to", len(u, d.toM()),
                        "w1", u.fromInternal(d.w1NPerM(), Dimension.FORCE_PER_LENGTH),
                        "w2", u.fromInternal(d.w2NPerM(), Dimension.FORCE_PER_LENGTH), "dir", List.of(dir[0], dir[1]),
                        "label", label + (d.perPlan() ? " on plan" : "") + " (" + d.dir().word + ")", "line", d.at().line()));
            } else if (l instanceof MemberLoad.Point p) {
                double[] dir = p.dir().unit(e[0], e[1]);
                loads.add(map("kind", "point", "member", l.member(), "at", len(u, p.atM()),
                        "value", u.fromInternal(p.forceN(), Dimension.FORCE), "dir", List.of(dir[0], dir[1]),
                        "label", show(u, p.forceN(), Dimension.FORCE) + " " + u.force().symbol() + " (" + p.dir().word + ")",
                        "line", p.at().line()));
            } else if (l instanceof MemberLoad.Couple cp) {
                loads.add(map("kind", "couple", "member", l.member(), "at", len(u, cp.atM()),
                        "value", u.fromInternal(cp.momentNm(), Dimension.MOMENT),
                        "label", show(u, cp.momentNm(), Dimension.MOMENT) + " " + u.symbol(Dimension.MOMENT), "line", cp.at().line()));
            }
        }
        for (NodeLoad n : c.nodeLoads()) {
            List<String> parts = new ArrayList<>();
            if (n.fxN() != 0) parts.add("Fx " + show(u, n.fxN(), Dimension.FORCE) + " " + u.force().symbol());
            if (n.fyN() != 0) parts.add("Fy " + show(u, n.fyN(), Dimension.FORCE) + " " + u.force().symbol());
            if (n.mzNm() != 0) parts.add("Mz " + show(u, n.mzNm(), Dimension.MOMENT) + " " + u.symbol(Dimension.MOMENT));
            loads.add(map("kind", "node", "node", n.node(), "fx", u.fromInternal(n.fxN(), Dimension.FORCE),
                    "fy", u.fromInternal(n.fyN(), Dimension.FORCE), "mz", u.fromInternal(n.mzNm(), Dimension.MOMENT),
                    "label", String.join(", ", parts), "line", n.at().line()));
        }
        for (Settlement s : c.settlements()) {
            List<String> parts = new ArrayList<>();
            String[] names = {"ux", "uy", "rz"};
            double[] values = {s.uxM(), s.uyM(), s.rzRad()};
            for (int d = 0; d < 3; d++) {
                if (Double.isNaN(values[d])) continue;
                parts.add(names[d] + " " + (d < 2 ? Console.fmt(len(u, values[d])) + " " + u.length().symbol() : Console.fmt(values[d]) + " rad"));
            }
            loads.add(map("kind", "note", "node", s.node(), "label", "settlement " + String.join(", ", parts), "line", s.at().line()));
        }
        for (Temperature t : c.temperatures()) {
            // temperature differences: kelvin and degrees Celsius are the same size
            loads.add(map("kind", "note", "member", t.member(), "label", "temperature: uniform " + Console.fmt(t.uniformK())
                    + " degC, gradient " + Console.fmt(t.gradientK()) + " degC", "line", t.at().line()));
        }
        return map("name", c.name(), "type", c.type(), "pattern", c.pattern(), "selfWeight", c.selfWeight(), "loads", loads);
    }

    private static double len(UnitSystem u, double metres) {
        return u.fromInternal(metres, Dimension.LENGTH);
    }

    private static String show(UnitSystem u, double si, Dimension d) {
        return Console.fmt(u.fromInternal(si, d));
    }

    /** An ordered map from alternating keys and values. */
    static Map<String, Object> map(Object... kv) {
        Map<String, Object> out = new LinkedHashMap<>();
        for (int i = 0; i < kv.length; i += 2) out.put((String) kv[i], kv[i + 1]);
        return out;
    }
}
