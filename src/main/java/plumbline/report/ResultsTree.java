package plumbline.report;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import plumbline.model.Claim;
import plumbline.model.Model;
import plumbline.review.Analysis;
import plumbline.review.ClaimResult;
import plumbline.review.LoadSet;
import plumbline.review.Review;
import plumbline.solve.MemberSolution;
import plumbline.solve.Solution;
import plumbline.statics.ClaimedEquilibrium;
import plumbline.statics.Determinacy;
import plumbline.units.Dimension;
import plumbline.units.UnitSystem;

/**
 * The results of FORMAT.md section 5 as a plain tree of maps, lists, strings and numbers
 * (in the model's units), ready for the JSON writer. No NaN or infinity is ever put in:
 * a value that is not finite becomes null.
 */
public final class ResultsTree {

    public static final String TOOL_VERSION = "1.0.0";
    static final String[] PEAKS = {"N_max", "N_min", "N_abs", "V_max", "V_min", "V_abs", "M_max", "M_min", "M_abs", "deflection"};

    private ResultsTree() {
    }

    public record Inputs(List<String> files, List<String> sha256) {
    }

    public static Map<String, Object> of(Review review, Inputs inputs, String engineShown, Double agreement) {
        Analysis a = review.analysis();
        Model m = a.model();
        UnitSystem u = m.units();
        Map<String, Object> root = new LinkedHashMap<>();
        root.put("tool", map("name", "plumbline", "version", TOOL_VERSION));
        root.put("input", map("files", inputs.files(), "sha256", inputs.sha256()));
        root.put("units", map("force", u.force().symbol(), "length", u.length().symbol()));
        root.put("determinacy", determinacy(a.determinacy()));
        Map<String, Object> combos = new LinkedHashMap<>();
        Map<String, Solution> sols = engineShown == null ? null : a.solutions().get(engineShown);
        if (sols != null) {
            for (LoadSet s : a.loadSets()) combos.put(s.name(), solution(m, s, sols.get(s.name())));
        }
        root.put("combinations", combos);
        root.put("engine", engineShown);
        Map<String, Object> engines = new LinkedHashMap<>();
        a.engines().forEach((k, v) -> engines.put(k, map("stable", v.stable(), "instability", v.instability(), "notes", v.notes())));
        root.put("engines", engines);
        root.put("agreement", agreement == null ? null : map("max_relative_difference", num(agreement)));
        List<Object> claims = new ArrayList<>();
        for (ClaimResult r : review.claims()) claims.add(claim(u, r));
        root.put("claims", claims);
        List<Object> eq = new ArrayList<>();
        for (ClaimedEquilibrium e : review.equilibrium()) eq.add(equilibrium(u, e));
        root.put("claimed_equilibrium", eq);
        root.put("verdict", review.verdict());
        return root;
    }

    static Map<String, Object> determinacy(Determinacy.Result d) {
        Map<String, Object> o = new LinkedHashMap<>();
        o.put("classification", d.classification().word);
        o.put("degree", d.degree());
        o.put("mechanisms", d.mechanisms());
        o.put("equations", d.equations());
        o.put("unknowns", d.unknowns());
        o.put("rank", d.rank());
        o.put("counting_degree", d.countingDegree());
        o.put("counting_disagrees", d.countingDisagrees());
        List<Object> shapes = new ArrayList<>();
        for (Determinacy.Mechanism s : d.shapes()) {
            Map<String, Object> motion = new LinkedHashMap<>();
            s.motion().forEach((k, v) -> motion.put(k, map("ux", num(v[0]), "uy", num(v[1]), "rz", num(v[2]))));
            shapes.add(map("description", s.description(), "motion", motion));
        }
        o.put("mechanism_shapes", shapes);
        o.put("remark", d.remark());
        return o;
    }

    static Map<String, Object> solution(Model m, LoadSet set, Solution s) {
        UnitSystem u = m.units();
        Map<String, Object> o = new LinkedHashMap<>();
        o.put("factors", new LinkedHashMap<>(set.factors()));
        o.put("origin", set.origin());
        Map<String, Object> r = new LinkedHashMap<>();
        s.reactions().forEach((k, v) -> r.put(k, map("Fx", out(u, v[0], Dimension.FORCE), "Fy", out(u, v[1], Dimension.FORCE),
                "Mz", out(u, v[2], Dimension.MOMENT))));
        o.put("reactions", r);
        Map<String, Object> mem = new LinkedHashMap<>();
        for (var e : s.members().entrySet()) {
            MemberSolution ms = e.getValue();
            Map<String, Object> p = new LinkedHashMap<>();
            Map<String, Object> at = new LinkedHashMap<>();
            for (String q : PEAKS) {
                Claim.Kind k = Claim.Kind.MEMBER;
                Dimension d = plumbline.io.ClaimsReader.dimensionOf(k, q);
                p.put(q, out(u, ms.peaks().value(q), d));
                at.put(q, out(u, ms.peaks().position(q), Dimension.LENGTH));
            }
            p.put("at", at);
            mem.put(e.getKey(), p);
        }
        o.put("members", mem);
        Map<String, Object> d = new LinkedHashMap<>();
        s.displacements().forEach((k, v) -> d.put(k, map("ux", out(u, v[0], Dimension.LENGTH), "uy", out(u, v[1], Dimension.LENGTH),
                "rz", num(v[2]))));
        o.put("displacements", d);
        o.put("equilibrium", map("residual", num(s.equilibriumResidual())));
        return o;
    }

    static Map<String, Object> claim(UnitSystem u, ClaimResult r) {
        Claim c = r.claim();
        Map<String, Object> o = new LinkedHashMap<>();
        o.put("id", c.id());
        o.put("combo", c.combo());
        o.put("item", c.item().word);
        o.put("name", c.name());
        o.put("quantity", c.quantity());
        o.put("claimed", out(u, c.valueInternal(), c.dimension()));
        o.put("computed", out(u, r.computed(), c.dimension()));
        o.put("computed_force_method", out(u, r.computedForce(), c.dimension()));
        o.put("written", map("value", num(c.writtenValue()), "unit", c.writtenUnit()));
        o.put("relative_difference", num(r.relativeDifference()));
        o.put("status", r.status().word);
        o.put("tolerance", num(r.tolerance().relative()));
        o.put("tolerance_source", r.tolerance().why());
        o.put("absolute_floor", out(u, r.absoluteFloor(), c.dimension()));
        o.put("governing", r.governing());
        o.put("diagnosis", r.diagnosis());
        o.put("source", r.claimsFile() + ":" + c.at().line());
        return o;
    }

    static Map<String, Object> equilibrium(UnitSystem u, ClaimedEquilibrium e) {
        Map<String, Object> o = new LinkedHashMap<>();
        o.put("combo", e.combo());
        o.put("moments_about", e.referenceNode());
        o.put("sum_Fx", e.checkedFx() ? out(u, e.sumFxN(), Dimension.FORCE) : null);
        o.put("sum_Fy", e.checkedFy() ? out(u, e.sumFyN(), Dimension.FORCE) : null);
        o.put("sum_M", e.checkedMoment() ? out(u, e.sumMomentNm(), Dimension.MOMENT) : null);
        o.put("relative_Fx", e.checkedFx() ? num(e.relFx()) : null);
        o.put("relative_Fy", e.checkedFy() ? num(e.relFy()) : null);
        o.put("relative_M", e.checkedMoment() ? num(e.relMoment()) : null);
        o.put("tolerance", ClaimedEquilibrium.DEFAULT_TOLERANCE);
        o.put("balanced", e.balanced());
        o.put("missing", e.missing());
        o.put("note", e.note());
        return o;
    }

    static Object out(UnitSystem u, double si, Dimension d) {
        return num(u.fromInternal(si, d));
    }

    static Object num(double v) {
        return Double.isFinite(v) ? (Object) v : null;
    }

    static Map<String, Object> map(Object... kv) {
        Map<String, Object> m = new LinkedHashMap<>();
        for (int i = 0; i < kv.length; i += 2) m.put((String) kv[i], kv[i + 1]);
        return m;
    }
}
