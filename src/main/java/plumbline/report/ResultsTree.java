package plumbline.report;

import java.io.IOException;
import java.io.InputStream;
import java.util.ArrayList;
import java.io.IOException;
import java.util.Collection;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Properties;
import plumbline.model.Claim;
import plumbline.model.LimitState;
import plumbline.model.Model;
import plumbline.model.Quantity;
import plumbline.io.JsonOut;
import plumbline.review.Agreement;
import plumbline.review.Analysis;
import plumbline.review.ClaimResult;
import plumbline.review.LoadSet;
import plumbline.review.LoadSetResult;
import plumbline.review.Review;
import plumbline.solve.Equilibrium;
import plumbline.solve.Solution;
import plumbline.statics.ClaimedEquilibrium;
import plumbline.statics.Determinacy;
import plumbline.units.Dimension;
import plumbline.units.UnitSystem;

/**
 * The results of format reference (src/site/markdown/formats.md) section 5 as a plain tree of maps, lists, strings and numbers
 * (in the model's units), ready for the JSON writer. No NaN or infinity is ever put in:
 * a value that is not finite becomes null.
 */
public final class ResultsTree {

    public static final String TOOL_VERSION = toolVersion();

    /** The version written once in pom.xml, which the build copies into version.properties. */
    private static String toolVersion() {
        Properties p = new Properties();
        try (InputStream in = ResultsTree.class.getResourceAsStream("/plumbline/version.properties")) {
            if (in != null) p.load(in);
        } catch (IOException e) {
            // fall through: a jar without the file is a build error, shown as "unknown"
        }
        return p.getProperty("version", "unknown");
    }
    static final List<Quantity> PEAKS = Quantity.peaks();

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
        root.put("caution", PdfReport.CAUTION); // the same caution as every report page, for results read without the report
        root.put("input", map("files", inputs.files(), "sha256", inputs.sha256()));
        root.put("units", map("force", u.force().symbol(), "length", u.length().symbol()));
        root.put("determinacy", determinacy(a.determinacy()));
        Map<String, Object> combos = new LinkedHashMap<>();
        Map<String, LoadSetResult> sols = engineShown == null ? null : a.solutions().get(engineShown);
        if (sols != null) {
            for (LoadSet s : a.loadSets()) combos.put(s.name(), solution(m, s, sols.get(s.name())));
        }
        root.put("combinations", combos);
        if (sols != null) {
            root.put("envelope", envelope(m, a, sols));
            // the per-limit-state envelopes, where combinations state their limit state (format 4.1)
            Map<String, Object> byState = new LinkedHashMap<>();
            for (LimitState st : List.of(LimitState.ULS, LimitState.SLS)) {
                if (a.loadSets().stream().anyMatch(s -> s.combination() && s.limitState() == st)) {
                    byState.put(st.name(), envelope(m, a, sols, st));
                }
            }
            if (!byState.isEmpty()) root.put("envelopes_by_limit_state", byState);
        }
        root.put("engine", engineShown);
        Map<String, Object> engines = new LinkedHashMap<>();
        a.engines().forEach((k, v) -> {
            // the format's notes: the engine's remarks, the force-method working as text, then
            // the warnings, each beginning "warning:"
            List<String> notes = new ArrayList<>(v.notes());
            if (v.working() != null) notes.addAll(v.working().lines());
            for (var w : v.warnings()) notes.add("warning: " + w.found());
            Map<String, Object> e = map("stable", v.stable(), "declined", v.declined(), "instability", v.instability(), "notes", notes);
            if (v.working() != null) {
                List<Object> rows = new ArrayList<>();
                for (double[] row : v.working().flexibility()) {
                    List<Object> r = new ArrayList<>();
                    for (double x : row) r.add(num(x));
                    rows.add(r);
                }
                Map<String, Object> cases = new LinkedHashMap<>();
                v.working().deltaZero().forEach((c, d0) -> cases.put(c, map("Delta_i0", list(d0), "redundants", list(v.working().values().get(c)))));
                e.put("working", map("units", "SI (N, m, rad)", "redundants", v.working().redundants(), "flexibility", rows, "cases", cases));
            }
            engines.put(k, e);
        });
        root.put("engines", engines);
        root.put("agreement", agreement == null ? null : map("max_relative_difference", num(agreement),
                "tolerance", Agreement.TOLERANCE, "agree", agreement <= Agreement.TOLERANCE));
        Review.Safeguards g = review.safeguards();
        root.put("safeguards", map("equilibrium_residual", num(g.worstResidual()), "equilibrium_tolerance", Equilibrium.TOLERANCE,
                "balanced", g.balanced(), "worst_at", g.worstResidualAt(), "agreement_tolerance", Agreement.TOLERANCE,
                "engines_agree", g.enginesAgree()));
        List<Object> claims = new ArrayList<>();
        for (ClaimResult r : review.claims()) claims.add(claim(u, r));
        root.put("claims", claims);
        List<Object> explanations = new ArrayList<>();
        for (var e : review.explanations()) {
            explanations.add(map("sentence", e.sentence(), "changes", e.changes(), "explains", e.explains(), "breaks", e.breaks(),
                    "all_ok_after", e.allOkAfter()));
        }
        root.put("explanations", explanations);
        List<Object> eq = new ArrayList<>();
        for (ClaimedEquilibrium e : review.equilibrium()) eq.add(equilibrium(u, e));
        root.put("claimed_equilibrium", eq);
        List<Object> warn = new ArrayList<>();
        for (var w : review.warnings()) warn.add(map("subject", w.subject(), "message", w.message(), "rule", w.rule()));
        root.put("warnings", warn);
        root.put("verdict", review.verdict().word);
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

    /**
     * One load set. For a pattern-loaded set the reactions and displacements listed are the
     * envelope value of larger magnitude, with both bounds under "envelope", and each member
     * peak names the members loaded to produce it.
     */
    static Map<String, Object> solution(Model m, LoadSet set, LoadSetResult r) {
        UnitSystem u = m.units();
        Solution rep = r.representative();
        Map<String, Object> o = new LinkedHashMap<>();
        o.put("factors", new LinkedHashMap<>(set.factors()));
        o.put("origin", set.origin());
        if (set.limitState() != LimitState.NONE) o.put("limit_state", set.limitState().name());
        o.put("pattern_envelope", r.patterned());
        // the per-member and per-node parts are written as they are read, never held as a tree
        // (a frame of 10,000 members has 200,000 numbers per load set)
        String[] reactionKeys = {"Fx", "Fy", "Mz"}, displacementKeys = {"ux", "uy", "rz"};
        Dimension[] reactionDims = {Dimension.FORCE, Dimension.FORCE, Dimension.MOMENT};
        Dimension[] displacementDims = {Dimension.LENGTH, Dimension.LENGTH, Dimension.NONE};
        o.put("reactions", triples(u, rep.reactions().keySet(), reactionKeys, reactionDims, r::reaction, false));
        o.put("members", (JsonOut.Streamed) out -> members(u, rep.members().keySet(), r, out));
        o.put("displacements", triples(u, rep.displacements().keySet(), displacementKeys, displacementDims, r::displacement, false));
        if (r.patterned()) {
            o.put("envelope", map("reactions", triples(u, rep.reactions().keySet(), reactionKeys, reactionDims, r::reaction, true),
                    "displacements", triples(u, rep.displacements().keySet(), displacementKeys, displacementDims, r::displacement, true)));
        }
        o.put("equilibrium", map("residual", num(r.equilibriumResidual())));
        return o;
    }

    /** Every member's peaks of one load set, where each occurs, and (pattern envelope) the members loaded for it. */
    private static void members(UnitSystem u, Collection<String> names, LoadSetResult r, JsonOut out) throws IOException {
        out.startObject();
        int n = PEAKS.size();
        double[] values = new double[n], places = new double[n]; // refilled for each member
        for (String name : names) {
            out.name(name).startObject();
            // a pattern envelope's peaks come with the members loaded for each; a plain set's are read in place
            LoadSetResult.Peak[] withLoaded = r.patterned() ? r.peaks(name, PEAKS) : null;
            if (withLoaded == null) {
                r.peaks(name, PEAKS, values, places);
            } else {
                for (int i = 0; i < n; i++) {
                    values[i] = withLoaded[i].value();
                    places[i] = withLoaded[i].xM();
                }
            }
            for (int i = 0; i < n; i++) {
                Quantity q = PEAKS.get(i);
                out.name(q.symbol).number(u.fromInternal(values[i], q.dimension));
            }
            out.name("at").startObject();
            for (int i = 0; i < n; i++) out.name(PEAKS.get(i).symbol).number(u.fromInternal(places[i], Dimension.LENGTH));
            out.endObject();
            if (withLoaded != null) {
                out.name("loaded_members").startObject();
                for (int i = 0; i < n; i++) out.name(PEAKS.get(i).symbol).texts(withLoaded[i].loadedMembers());
                out.endObject();
            }
            out.endObject();
        }
        out.endObject();
    }

    /**
     * The envelope over all combinations (not the bare load cases): for every member peak
     * and every reaction component its most severe value and the combination that governs.
     */
    static Map<String, Object> envelope(Model m, Analysis a, Map<String, LoadSetResult> sols) {
        return envelope(m, a, sols, LimitState.NONE);
    }

    /** The envelope over the combinations of one limit state ({@code NONE}: over every combination). */
    static Map<String, Object> envelope(Model m, Analysis a, Map<String, LoadSetResult> sols, LimitState state) {
        UnitSystem u = m.units();
        List<LoadSet> combos = a.loadSets().stream().filter(LoadSet::combination)
                .filter(s -> state == LimitState.NONE || s.limitState() == state).toList();
        Map<String, Object> out = new LinkedHashMap<>();
        out.put("combinations", combos.stream().map(LoadSet::name).toList());
        if (combos.isEmpty()) return out;
        List<LoadSetResult> results = combos.stream().map(s -> sols.get(s.name())).toList();
        out.put("members", (JsonOut.Streamed) json -> {
            json.startObject();
            // every combination's peaks of one member, refilled member after member (the places are not listed)
            double[][] byCombination = new double[combos.size()][PEAKS.size()];
            double[] places = new double[PEAKS.size()];
            for (String mem : m.members().keySet()) {
                json.name(mem).startObject();
                for (int k = 0; k < combos.size(); k++) results.get(k).peaks(mem, PEAKS, byCombination[k], places);
                for (int i = 0; i < PEAKS.size(); i++) {
                    Quantity q = PEAKS.get(i);
                    double best = Double.NaN;
                    String gov = null;
                    for (int k = 0; k < combos.size(); k++) {
                        double v = byCombination[k][i];
                        boolean better = Double.isNaN(best) || (q.extreme == Quantity.Extreme.MIN ? v < best : v > best);
                        if (better) {
                            best = v;
                            gov = combos.get(k).name();
                        }
                    }
                    json.name(q.symbol).startObject().name("value").number(u.fromInternal(best, q.dimension)).name("governing").text(gov)
                            .endObject();
                }
                json.endObject();
            }
            json.endObject();
        });
        Map<String, Object> reactions = new LinkedHashMap<>();
        String[] keys = {"Fx", "Fy", "Mz"};
        Dimension[] dims = {Dimension.FORCE, Dimension.FORCE, Dimension.MOMENT};
        for (String node : m.supports().keySet()) {
            Map<String, Object> one = new LinkedHashMap<>();
            for (int c = 0; c < 3; c++) {
                double hi = Double.NEGATIVE_INFINITY, lo = Double.POSITIVE_INFINITY;
                String gHi = null, gLo = null;
                for (LoadSet s : combos) {
                    double h = sols.get(s.name()).reaction(node, c, true), l = sols.get(s.name()).reaction(node, c, false);
                    if (h > hi) {
                        hi = h;
                        gHi = s.name();
                    }
                    if (l < lo) {
                        lo = l;
                        gLo = s.name();
                    }
                }
                one.put(keys[c], map("max", out(u, hi, dims[c]), "max_governing", gHi, "min", out(u, lo, dims[c]), "min_governing", gLo));
            }
            reactions.put(node, one);
        }
        out.put("reactions", reactions);
        return out;
    }

    /** A value by node, component and bound: a reaction or a displacement of a load set. */
    interface Bounded {
        double value(String node, int component, boolean upper);
    }

    /**
     * Three components per node, written as they are read: the bound of larger magnitude
     * under its key, or ({@code ranges}) both bounds as {min, max} (they coincide unless the
     * set is a pattern envelope).
     */
    static JsonOut.Streamed triples(UnitSystem u, Collection<String> nodes, String[] keys, Dimension[] dims, Bounded value,
                                    boolean ranges) {
        return out -> {
            out.startObject();
            for (String node : nodes) {
                out.name(node).startObject();
                for (int c = 0; c < 3; c++) {
                    double hi = value.value(node, c, true), lo = value.value(node, c, false);
                    if (ranges) {
                        out.name(keys[c]).startObject().name("min").number(u.fromInternal(lo, dims[c]))
                                .name("max").number(u.fromInternal(hi, dims[c])).endObject();
                    } else {
                        out.name(keys[c]).number(u.fromInternal(Math.abs(lo) > Math.abs(hi) ? lo : hi, dims[c]));
                    }
                }
                out.endObject();
            }
            out.endObject();
        };
    }

    static Map<String, Object> claim(UnitSystem u, ClaimResult r) {
        Claim c = r.claim();
        Map<String, Object> o = new LinkedHashMap<>();
        o.put("id", c.id());
        o.put("combo", c.combo());
        o.put("item", c.item().word);
        o.put("name", c.name());
        o.put("quantity", c.writtenQuantity().symbol);
        // in another sign convention a claim is compared as the tool's quantity (hogging M_max is -M_min)
        if (c.writtenQuantity() != c.quantity()) o.put("compared_as", c.quantity().symbol);
        o.put("claimed", out(u, c.valueInternal(), c.dimension()));
        o.put("computed", out(u, r.computed(), c.dimension()));
        o.put("computed_force_method", out(u, r.computedForce(), c.dimension()));
        o.put("written", map("value", num(c.writtenValue()), "unit", c.writtenUnit()));
        o.put("claimed_as_written", map("quantity", c.writtenQuantity().symbol, "value", num(c.writtenValue()), "unit", c.writtenUnit(),
                "convention", c.convention().isEmpty() ? "the tool's" : c.convention()));
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

    static List<Object> list(double[] v) {
        List<Object> out = new ArrayList<>();
        for (double x : v) out.add(num(x));
        return out;
    }

    static Map<String, Object> map(Object... kv) {
        Map<String, Object> m = new LinkedHashMap<>();
        for (int i = 0; i < kv.length; i += 2) m.put((String) kv[i], kv[i + 1]);
        return m;
    }
}
