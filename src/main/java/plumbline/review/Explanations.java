package plumbline.review;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import java.util.function.Function;
import java.util.function.Predicate;
import java.util.function.ToDoubleFunction;
import plumbline.model.Claim;
import plumbline.model.LimitState;
import plumbline.model.LoadCase;
import plumbline.model.Material;
import plumbline.model.Member;
import plumbline.model.MemberLoad;
import plumbline.model.Model;
import plumbline.model.Quantity;
import plumbline.model.Section;
import plumbline.model.Support;
import plumbline.solve.Engine;
import plumbline.solve.EngineResult;
import plumbline.solve.MemberFunctions;
import plumbline.solve.Solution;
import plumbline.solve.Superposition;
import plumbline.statics.ClaimedEquilibrium;
import plumbline.units.Dimension;

/**
 * The search for what went wrong with the claim set as a whole: the checker's question
 * "which one slip makes these numbers right?". Each trial is one change,
 * <ul>
 * <li>to the claims: a sign convention for a kind of quantity (reactions as forces on the
 * supports, moments hogging-positive, compression positive, displacements downward
 * positive), one unit for every claim of a dimension, or one scale over the whole set;</li>
 * <li>to the loads, by superposition of the load-case solutions already made (linear
 * elasticity): a load case or one member load left out, doubled or scaled, a case missing
 * from or added to one combination, the load factors left out of one or every combination,
 * a standard set read as its counterpart (allowable stress against strength),
 * self-weight counted twice, pattern loading omitted;</li>
 * <li>to the structure, solved again: self-weight omitted, loads per sloped length instead
 * of per plan, one support's fixity or all of them, a member load put on another member of
 * the same length and direction, a material's E or a section's I or A in another unit.</li>
 * </ul>
 * Each trial is scored on every claim: the flagged claims it brings within their own
 * tolerance and the agreeing claims it would push out. A trial is kept when it explains two
 * or more flagged claims and more than it breaks, or when with it every claim agrees and
 * there was at least one agreeing claim to keep; the
 * best come first: every claim agreeing, then the most explained net of those broken.
 */
final class Explanations {

    /** Trials that superpose or re-solve are made for models up to this size (common practice: seconds, not minutes). */
    static final int MODEL_TRIAL_MEMBER_LIMIT = 300;
    /** At most this many member-load moves are tried. */
    static final int MOVED_LOAD_TRIALS = 60;
    /** Section and material properties in another unit are solved again for models up to this size. */
    static final int PROPERTY_TRIAL_MEMBER_LIMIT = 100;
    /** ksi in MPa (NIST SP 811 Appendix B: 1 ksi = 6.894757 MPa). */
    static final double KSI_IN_MPA = 6.894757;
    /** Loads are moved only in load cases with at most this many member loads. */
    static final int MOVABLE_LOADS_PER_CASE = 12;
    /** The explanations reported, best first. */
    static final int SHOWN = 5;

    /**
     * One change and the value each claim is compared with under it (SI; NaN when the change
     * leaves it alone). A fitted change takes its size from the claims themselves, so it is
     * weaker evidence than a change named in advance and ranks after one that does as well.
     */
    private record Trial(String sentence, List<String> changes, ToDoubleFunction<ClaimResult> candidate, boolean fitted) {
        Trial(String sentence, List<String> changes, ToDoubleFunction<ClaimResult> candidate) {
            this(sentence, changes, candidate, false);
        }
    }

    private final Analysis a;
    private final String engine;
    private final List<ClaimResult> results;
    private final Engine variantEngine;
    private final Map<String, Analysis> variants;
    private final List<Trial> trials = new ArrayList<>();

    private Explanations(Analysis a, String engine, List<ClaimResult> results, Engine variantEngine,
                         Map<String, Analysis> variants) {
        this.a = a;
        this.engine = engine;
        this.results = results;
        this.variantEngine = variantEngine;
        this.variants = variants;
    }

    /**
     * The explanations of the flagged claims among {@code results}, best first (empty when
     * none is flagged or nothing explains them).
     *
     * @param variants variant models solved already, by the change's words (shared with the per-claim diagnosis)
     */
    static List<Explanation> search(Analysis a, String engine, List<ClaimResult> results, Engine variantEngine,
                                    Map<String, Analysis> variants, List<ClaimedEquilibrium> claimedEquilibrium) {
        if (results.stream().allMatch(r -> r.status() == ClaimResult.Status.OK)) return List.of();
        Explanations x = new Explanations(a, engine, results, variantEngine, variants);
        x.conventions();
        x.units();
        x.wholeSetScale(claimedEquilibrium);
        if (a.model().members().size() <= MODEL_TRIAL_MEMBER_LIMIT) {
            x.loadCases(claimedEquilibrium);
            x.combinations();
            x.otherStandardSets();
            x.patternOmitted();
            if (variantEngine != null) x.resolved();
        }
        return x.best();
    }

    // ---- scoring

    /** Whether {@code candidate} reproduces the claim within its tolerance (the same rule as the comparison). */
    static boolean within(ClaimResult r, double candidate) {
        if (!Double.isFinite(candidate)) return false;
        double allowed = Math.max(r.tolerance().relative() * Math.abs(candidate), r.absoluteFloor());
        return Math.abs(r.claim().valueInternal() - candidate) <= allowed;
    }

    private Explanation score(Trial t) {
        List<String> explains = new ArrayList<>(), breaks = new ArrayList<>();
        boolean allOk = true;
        int flagged = 0;
        for (ClaimResult r : results) {
            double c = t.candidate.applyAsDouble(r);
            boolean ok = within(r, Double.isNaN(c) ? r.computed() : c);
            allOk &= ok;
            boolean wasOk = r.status() == ClaimResult.Status.OK;
            if (!wasOk) flagged++;
            if (!wasOk && ok) explains.add(r.claim().id());
            if (wasOk && !ok) breaks.add(r.claim().id());
        }
        return new Explanation(t.sentence, t.changes, explains, breaks, allOk, flagged, results.size() - flagged);
    }

    private List<Explanation> best() {
        List<Explanation> scored = new ArrayList<>();
        List<Boolean> fitted = new ArrayList<>();
        for (Trial t : trials) {
            scored.add(score(t));
            fitted.add(t.fitted);
        }
        return rank(scored, fitted);
    }

    /**
     * Whether an explanation is worth a checker's time: it explains two or more flagged
     * claims and more than it breaks, or with it every claim agrees and there was at least
     * one agreeing claim to keep (one flagged claim alone is the per-claim diagnosis's business).
     */
    static boolean kept(Explanation e) {
        boolean several = e.explains().size() >= 2 && e.explains().size() > e.breaks().size();
        boolean whole = e.allOkAfter() && !e.explains().isEmpty() && e.agreeing() > 0;
        return several || whole;
    }

    /**
     * The kept explanations, best first, at most {@link #SHOWN}, each sentence once: every
     * claim agreeing first, then the most explained net of those broken, then the fewest
     * broken, then a change named in advance before one fitted to the claims, then the order
     * the trials were made in (claims, loads, structure).
     */
    static List<Explanation> rank(List<Explanation> scored, List<Boolean> fitted) {
        record Scored(Explanation e, boolean fitted) {
        }
        List<Scored> kept = new ArrayList<>();
        Set<String> seen = new LinkedHashSet<>();
        for (int i = 0; i < scored.size(); i++) {
            Explanation e = scored.get(i);
            if (kept(e) && seen.add(e.sentence())) kept.add(new Scored(e, fitted.get(i)));
        }
        kept.sort(Comparator.comparing((Scored x) -> !x.e.allOkAfter())
                .thenComparing(x -> -(x.e.explains().size() - x.e.breaks().size()))
                .thenComparing(x -> x.e.breaks().size())
                .thenComparing(x -> x.fitted));
        return kept.subList(0, Math.min(SHOWN, kept.size())).stream().map(Scored::e).toList();
    }

    // ---- changes to the claims

    private double computed(ClaimResult r, Quantity q) {
        if (q == r.claim().quantity()) return r.computed();
        Claim c = r.claim();
        return Review.value(a.loadSets(), a.solutions().get(engine), c.retarget(c.name(), c.combo(), q)).value();
    }

    private void conventions() {
        trials.add(new Trial("the reactions are given as forces on the supports (every reaction's sign reversed)",
                List.of("claims: the sign of every reaction reversed"),
                r -> r.claim().item() == Claim.Kind.REACTION ? -r.computed() : Double.NaN));
        record Convention(Quantity.Function f, String sentence) {
        }
        for (Convention k : List.of(
                new Convention(Quantity.Function.M, "the moments are given hogging-positive (M_max is the computed -M_min, and the reverse)"),
                new Convention(Quantity.Function.N, "the axial forces are given compression-positive (N_max is the computed -N_min, and the reverse)"),
                new Convention(Quantity.Function.V, "the shear forces are given with the opposite sign convention (V_max is the computed -V_min)"))) {
            trials.add(new Trial(k.sentence, List.of("claims: the sign convention of " + k.f + " reversed"), r -> {
                Quantity q = r.claim().quantity();
                if (q.function != k.f || q.extreme == Quantity.Extreme.ABS) return Double.NaN;
                return -computed(r, q.otherExtreme());
            }));
        }
        trials.add(new Trial("the displacements are given positive downwards and to the left (every ux, uy, rz sign reversed)",
                List.of("claims: the sign of every displacement reversed"),
                r -> r.claim().item() == Claim.Kind.DISPLACEMENT ? -r.computed() : Double.NaN));
    }

    private void units() {
        Set<Dimension> dims = new LinkedHashSet<>();
        for (ClaimResult r : results) if (r.status() != ClaimResult.Status.OK) dims.add(r.claim().dimension());
        for (Dimension d : dims) {
            String kind = d.describe().replaceAll(" \\(.*\\)", ""); // "moment", not "moment (force*length)"
            for (Diagnosis.Slip s : Diagnosis.slips(d)) {
                trials.add(new Trial(String.format(Locale.ROOT, "every %s claimed is the computed value expressed in %s "
                        + "(the claims' unit is %s, not the one written)", kind, s.label(), s.label()),
                        List.of("claims: every " + kind + " read in " + s.label()),
                        r -> {
                            Claim c = r.claim();
                            if (!c.dimension().equals(d) || !Double.isFinite(c.writtenValue()) || Diagnosis.sameUnit(s, c.writtenUnit())) {
                                return Double.NaN;
                            }
                            return r.computed() / s.toSi() * Diagnosis.factorOfWritten(c);
                        }));
            }
        }
    }

    /** The median ratio claimed / computed over the flagged claims {@code of} picks (NaN when none has a computed value). */
    private double medianRatio(Predicate<ClaimResult> of) {
        List<Double> ratios = new ArrayList<>();
        for (ClaimResult r : results) {
            if (r.status() == ClaimResult.Status.OK || !of.test(r) || Math.abs(r.computed()) <= r.absoluteFloor()) continue;
            ratios.add(r.claim().valueInternal() / r.computed());
        }
        if (ratios.isEmpty()) return Double.NaN;
        ratios.sort(Double::compare);
        double k = round3(ratios.get(ratios.size() / 2));
        return k > 0 && Math.abs(k - 1) >= 1e-3 ? k : Double.NaN;
    }

    private void wholeSetScale(List<ClaimedEquilibrium> eq) {
        double k = medianRatio(r -> true);
        if (Double.isFinite(k)) {
            trials.add(new Trial(String.format(Locale.ROOT, "every claimed value is %s times the computed one: as if every load "
                            + "(or the loaded width) were %s times the model's%s", fmt(k), fmt(k), takeDown(eq, k, null)),
                    List.of("claims: every value times " + fmt(k)), r -> k * r.computed(), true));
        }
        double kr = medianRatio(r -> r.claim().item() == Claim.Kind.REACTION);
        if (Double.isFinite(kr)) {
            trials.add(new Trial(String.format(Locale.ROOT, "the reactions are %s times the computed ones: the load "
                            + "take-down, not the analysis, carries %s times the load%s", fmt(kr), fmt(kr),
                    takeDown(eq, kr, null)), List.of("claims: every reaction times " + fmt(kr)),
                    r -> r.claim().item() == Claim.Kind.REACTION ? kr * r.computed() : Double.NaN, true));
        }
    }

    /**
     * Evidence from the claimed reactions: when those of a combination are out of balance in y
     * by the same fraction as the change scales the vertical load, the slip happened in the
     * load take-down, before the analysis.
     */
    private static String takeDown(List<ClaimedEquilibrium> eq, double k, Set<String> sets) {
        List<String> agreeing = new ArrayList<>();
        for (ClaimedEquilibrium e : eq) {
            if (sets != null && !sets.contains(e.combo())) continue;
            if (e.checkedFy() && !e.balanced() && Math.abs(e.relFy() - (k - 1)) <= 0.01 * Math.max(1, Math.abs(k))) {
                agreeing.add(e.combo());
            }
        }
        if (agreeing.isEmpty()) return "";
        return "; the claimed reactions of " + String.join(", ", agreeing) + " also sum to " + fmt(k)
                + " times the applied vertical load, so the slip is in the load take-down, not the analysis";
    }

    // ---- changes to the loads, by superposition

    private MemberFunctions functions() {
        return variantEngine != null ? variantEngine.memberFunctions() : MemberFunctions.SHARED;
    }

    /** The value of each claim when the engine's load-case solutions are {@code cases} and the sets' factors {@code sets}. */
    private ToDoubleFunction<ClaimResult> world(Map<String, Solution> cases, List<LoadSet> sets, Set<String> changed) {
        return world(cases, sets, changed, a.engineModel());
    }

    /** As above, with {@code em} the engine model whose load cases the solutions' factors name. */
    private ToDoubleFunction<ClaimResult> world(Map<String, Solution> cases, List<LoadSet> sets, Set<String> changed, Model em) {
        EngineResult modified = new EngineResult(engine, true, null, cases, List.of());
        Map<String, LoadSetResult> base = a.solutions().get(engine), made = new HashMap<>();
        Map<String, LoadSet> byName = new HashMap<>();
        for (LoadSet s : sets) byName.put(s.name(), s);
        // a changed set is superposed when a claim first asks for it, and kept
        Function<String, LoadSetResult> sols = name -> !changed.contains(name) ? base.get(name)
                : made.computeIfAbsent(name, k -> Analysis.result(a.model(), em, modified, byName.get(k), functions()));
        return r -> Review.value(sets, sols, r.claim()).value();
    }

    /** The engine's cases with those of {@code caseName} (and its pattern parts) replaced by {@code f}. */
    private Map<String, Solution> casesWith(String caseName, Function<Solution, Solution> f) {
        Map<String, Solution> out = new LinkedHashMap<>(a.engines().get(engine).cases());
        for (var e : out.entrySet()) {
            if (e.getKey().equals(caseName) || e.getKey().startsWith(caseName + Analysis.PART)) e.setValue(f.apply(e.getValue()));
        }
        return out;
    }

    private Set<String> setsWith(String caseName) {
        Set<String> out = new LinkedHashSet<>();
        for (LoadSet s : a.loadSets()) if (s.factors().containsKey(caseName)) out.add(s.name());
        return out;
    }

    private Solution scaled(Solution s, double k) {
        return Superposition.combine(a.engineModel(), s.name(), Map.of(s, k), functions());
    }

    private void loadCases(List<ClaimedEquilibrium> eq) {
        for (LoadCase lc : a.model().loadCases()) {
            Set<String> sets = setsWith(lc.name());
            List<Double> ks = new ArrayList<>(List.of(0.0, 2.0));
            double fitted = round3(fittedScale(lc.name()));
            if (Double.isFinite(fitted) && fitted > 0 && Math.abs(fitted - 1) >= 1e-3 && !ks.contains(fitted)) ks.add(fitted);
            for (double k : ks) {
                String what = k == 0 ? "load case " + lc.name() + " left out everywhere"
                        : k == 2 ? "load case " + lc.name() + " counted twice everywhere"
                        : "load case " + lc.name() + " taken " + fmt(k) + " times its value everywhere (a load intensity or loaded width slip)";
                String evidence = k == 0 ? "" : takeDown(eq, k, Set.of(lc.name()));
                trials.add(new Trial(what + evidence, List.of("model: load case " + lc.name() + " times " + fmt(k)),
                        world(casesWith(lc.name(), s -> scaled(s, k)), a.loadSets(), sets), k != 0 && k != 2));
            }
        }
        Analysis noSelfWeight = variant("self-weight omitted", Diagnosis::withoutSelfWeight,
                a.model().loadCases().stream().anyMatch(LoadCase::selfWeight));
        if (noSelfWeight != null) {
            Map<String, Solution> cases = new LinkedHashMap<>(a.engines().get(engine).cases());
            Set<String> changed = new LinkedHashSet<>();
            for (LoadCase lc : a.model().loadCases()) {
                if (!lc.selfWeight()) continue;
                Solution with = cases.get(lc.name()), without = noSelfWeight.engines().get(variantEngine.name()).cases().get(lc.name());
                Map<Solution, Double> parts = new LinkedHashMap<>();
                parts.put(with, 2.0);
                parts.put(without, -1.0);
                cases.put(lc.name(), Superposition.combine(a.engineModel(), lc.name(), parts, functions()));
                changed.addAll(setsWith(lc.name()));
            }
            trials.add(new Trial("self-weight counted twice (once by the program, once among the loads)",
                    List.of("model: self-weight doubled"), world(cases, a.loadSets(), changed)));
        }
    }

    /**
     * The scale k of a load case that best fits the flagged claims, by least squares on the
     * linear claims (reactions and displacements): claimed - computed = (k - 1) times the
     * case's factored contribution.
     */
    private double fittedScale(String caseName) {
        double num = 0, den = 0;
        for (ClaimResult r : results) {
            Claim c = r.claim();
            if (r.status() == ClaimResult.Status.OK || c.item() == Claim.Kind.MEMBER || LimitState.isEnvelope(c.combo())) continue;
            Map<String, Double> f = a.factors(c.combo());
            if (f == null || !f.containsKey(caseName) || a.model().loadCase(caseName).pattern()) continue;
            LoadSetResult alone = a.solutions().get(engine).get(caseName);
            double part = f.get(caseName) * Review.of(alone, c.retarget(c.name(), caseName, c.quantity())).value();
            num += part * (c.valueInternal() - r.computed());
            den += part * part;
        }
        return den == 0 ? Double.NaN : 1 + num / den;
    }

    private void combinations() {
        List<LoadSet> sets = a.loadSets();
        Map<String, Solution> cases = a.engines().get(engine).cases();
        boolean anyFactored = false;
        for (int i = 0; i < sets.size(); i++) {
            LoadSet s = sets.get(i);
            if (!s.combination()) continue;
            for (String cs : s.factors().keySet()) {
                if (s.factors().size() < 2) break;
                Map<String, Double> f = new LinkedHashMap<>(s.factors());
                f.remove(cs);
                trials.add(new Trial("load case " + cs + " left out of combination " + s.name(),
                        List.of("model: " + cs + " removed from " + s.name()), world(cases, replaced(sets, i, f), Set.of(s.name()))));
            }
            for (LoadCase lc : a.model().loadCases()) {
                if (s.factors().containsKey(lc.name())) continue;
                Map<String, Double> f = new LinkedHashMap<>(s.factors());
                f.put(lc.name(), 1.0);
                trials.add(new Trial("load case " + lc.name() + " added to combination " + s.name() + " (factor 1.0)",
                        List.of("model: " + lc.name() + " added to " + s.name()), world(cases, replaced(sets, i, f), Set.of(s.name()))));
            }
            if (s.factors().values().stream().anyMatch(v -> v != 1.0)) {
                anyFactored = true;
                trials.add(new Trial("combination " + s.name() + " with its load factors left out (the loads unfactored)",
                        List.of("model: factors of " + s.name() + " set to 1"), world(cases, replaced(sets, i, unit(s.factors())), Set.of(s.name()))));
            }
        }
        if (anyFactored) {
            List<LoadSet> unfactored = new ArrayList<>();
            Set<String> changed = new LinkedHashSet<>();
            for (LoadSet s : sets) {
                unfactored.add(s.combination() ? new LoadSet(s.name(), unit(s.factors()), s.origin(), true, s.limitState()) : s);
                if (s.combination()) changed.add(s.name());
            }
            trials.add(new Trial("the load factors left out of every combination (service-level values claimed against "
                    + "factored combinations, the envelope included)", List.of("model: every load factor set to 1"),
                    world(cases, unfactored, changed)));
        }
    }

    /** Standard sets a claimed combination may really belong to: strength against allowable stress, 6.10 against 6.10a/b. */
    private static final List<String[]> OTHER_SET = List.of(new String[]{"asce7-strength", "asce7-asd"},
            new String[]{"asce7-asd", "asce7-strength"}, new String[]{"en1990-6.10", "en1990-6.10ab"},
            new String[]{"en1990-6.10ab", "en1990-6.10"});

    /**
     * The claims worked with another standard's set: each claimed combination of set S read as
     * the combination of the same number (and actions) of set T, formed from the load cases
     * already solved (ASD loads against strength combinations, or the reverse).
     */
    private void otherStandardSets() {
        Model m = a.model();
        EngineResult er = a.engines().get(engine);
        for (String[] pair : OTHER_SET) {
            String from = pair[0], to = pair[1];
            if (!m.standardCombinations().contains(from)) continue;
            Map<String, LoadSet> byName = new HashMap<>();
            for (LoadSet s : StandardCombinations.expand(m, to)) byName.put(s.name(), s);
            Map<String, LoadSetResult> made = new HashMap<>();
            trials.add(new Trial("the claims of the " + from + " combinations are those of the " + to + " combinations of the same "
                    + "number (" + (from.startsWith("asce7") ? "allowable-stress against strength design, or the reverse"
                    : "expression 6.10 against 6.10a/6.10b") + ")", List.of("model: " + from + " read as " + to), r -> {
                        String combo = r.claim().combo();
                        if (!combo.startsWith(from + "/")) return Double.NaN;
                        LoadSet s = byName.get(to + combo.substring(from.length()));
                        if (s == null) return Double.NaN;
                        LoadSetResult res = made.computeIfAbsent(s.name(), k -> Analysis.result(m, a.engineModel(), er, s, functions()));
                        return Review.of(res, r.claim()).value();
                    }));
        }
    }

    private static Map<String, Double> unit(Map<String, Double> factors) {
        Map<String, Double> out = new LinkedHashMap<>();
        for (String k : factors.keySet()) out.put(k, 1.0);
        return out;
    }

    private static List<LoadSet> replaced(List<LoadSet> sets, int i, Map<String, Double> factors) {
        List<LoadSet> out = new ArrayList<>(sets);
        LoadSet s = sets.get(i);
        out.set(i, new LoadSet(s.name(), factors, s.origin(), s.combination(), s.limitState()));
        return out;
    }

    private void patternOmitted() {
        Map<String, LoadSetResult> base = a.solutions().get(engine);
        if (base.values().stream().noneMatch(LoadSetResult::patterned)) return;
        Map<String, LoadSetResult> sols = new HashMap<>(base);
        for (var e : base.entrySet()) {
            if (e.getValue().patterned()) sols.put(e.getKey(), new LoadSetResult.Plain(e.getValue().representative()));
        }
        trials.add(new Trial("pattern loading omitted (every span loaded at once)", List.of("model: pattern loading off"),
                r -> Review.value(a.loadSets(), sols, r.claim()).value()));
    }

    // ---- changes to the structure, solved again

    /** A variant model solved by the variant engine (cached by its words), or null when not stable or not asked for. */
    private Analysis variant(String words, Function<Model, Model> change, boolean applies) {
        if (!applies || variantEngine == null) return null;
        Analysis v = variants.computeIfAbsent(words, k -> Analysis.variantOf(a, change.apply(a.model()), List.of(variantEngine)));
        // (a variant of the loads or properties alone takes the model's statics; one of the supports has its own)
        return v.stable() && v.solutions().containsKey(variantEngine.name()) ? v : null;
    }

    private void resolvedTrial(String words, Function<Model, Model> change, boolean applies) {
        Analysis v = variant(words, change, applies);
        if (v == null) return;
        Map<String, LoadSetResult> sols = v.solutions().get(variantEngine.name());
        trials.add(new Trial("the model solved with " + words, List.of("model: " + words),
                r -> Review.value(v.loadSets(), sols, r.claim()).value()));
    }

    private void resolved() {
        Model m = a.model();
        resolvedTrial("self-weight omitted", Diagnosis::withoutSelfWeight, m.loadCases().stream().anyMatch(LoadCase::selfWeight));
        resolvedTrial(Diagnosis.PER_SLOPE, Diagnosis::perSlope, Diagnosis.hasPerPlan(m));
        List<Support> fixed = new ArrayList<>(), pinned = new ArrayList<>();
        for (Support s : m.supports().values()) {
            if (Diagnosis.isFixed(s)) fixed.add(s);
            else if (Diagnosis.isPinned(s)) pinned.add(s);
        }
        for (Support s : m.supports().values()) {
            if (fixed.contains(s) || pinned.contains(s)) {
                resolvedTrial(Diagnosis.fixityWords(s), x -> Diagnosis.withFixity(x, List.of(s)), true);
            }
        }
        if (fixed.size() >= 2) {
            resolvedTrial("every fixed support taken as pinned (" + names(fixed) + ")", x -> Diagnosis.withFixity(x, fixed), true);
        }
        if (pinned.size() >= 2) {
            resolvedTrial("every pinned support taken as fixed (" + names(pinned) + ")", x -> Diagnosis.withFixity(x, pinned), true);
        }
        movedLoads();
        if (m.members().size() <= PROPERTY_TRIAL_MEMBER_LIMIT) properties();
    }

    /**
     * A section or material property entered in another unit: E a thousand times off (GPa
     * and MPa) or by 6.895 (ksi and MPa), I by 10^4 (cm4 and mm4), A by 100 (cm2 and mm2).
     * Deflections scale with them, and in an indeterminate structure the forces move too.
     */
    private void properties() {
        Model m = a.model();
        record Slip(double factor, String words) {
        }
        List<Slip> eSlips = List.of(new Slip(1e3, "1000 times the model's (GPa and MPa)"), new Slip(1e-3, "1/1000 of the model's (MPa and GPa)"),
                new Slip(KSI_IN_MPA, "6.895 times the model's (ksi read as MPa)"), new Slip(1 / KSI_IN_MPA, "1/6.895 of the model's (MPa read as ksi)"));
        for (Material mat : m.materials().values()) {
            for (Slip sl : eSlips) {
                resolvedTrial("E of material " + mat.name() + " " + sl.words, x -> withMaterial(x, new Material(mat.name(),
                        mat.ePa() * sl.factor, mat.weightDensityNPerM3(), mat.alphaPerK(), mat.at())), true);
            }
        }
        for (Section sec : m.sections().values()) {
            for (Slip sl : List.of(new Slip(1e4, "10^4 times the model's (cm4 and mm4)"), new Slip(1e-4, "1/10^4 of the model's (mm4 and cm4)"))) {
                if (!Double.isFinite(sec.inertiaM4())) continue;
                resolvedTrial("I of section " + sec.name() + " " + sl.words, x -> withSection(x, new Section(sec.name(), sec.areaM2(),
                        sec.inertiaM4() * sl.factor, sec.depthM(), sec.material(), sec.at())), true);
            }
            for (Slip sl : List.of(new Slip(100, "100 times the model's (cm2 and mm2)"), new Slip(0.01, "1/100 of the model's (mm2 and cm2)"))) {
                resolvedTrial("A of section " + sec.name() + " " + sl.words, x -> withSection(x, new Section(sec.name(),
                        sec.areaM2() * sl.factor, sec.inertiaM4(), sec.depthM(), sec.material(), sec.at())), true);
            }
        }
    }

    private static Model withMaterial(Model x, Material mat) {
        Map<String, Material> ms = new LinkedHashMap<>(x.materials());
        ms.put(mat.name(), mat);
        return new Model(x.file(), x.job(), x.units(), ms, x.sections(), x.nodes(), x.supports(), x.members(), x.loadCases(),
                x.combinations(), x.standardCombinations(), x.redundants(), List.of());
    }

    private static Model withSection(Model x, Section sec) {
        Map<String, Section> ss = new LinkedHashMap<>(x.sections());
        ss.put(sec.name(), sec);
        return new Model(x.file(), x.job(), x.units(), x.materials(), ss, x.nodes(), x.supports(), x.members(), x.loadCases(),
                x.combinations(), x.standardCombinations(), x.redundants(), List.of());
    }

    private static String names(List<Support> ss) {
        return String.join(", ", ss.stream().map(Support::node).toList());
    }

    /**
     * Each member load put on another member of the same length and direction (a load on the
     * wrong span), by superposition: one solve of the same structure with each moved load and
     * each original load as a case of its own, then case' = case - (load where it is) + (load
     * where it was perhaps meant to be). Pattern cases are left alone.
     */
    private void movedLoads() {
        Model m = a.model();
        record Move(LoadCase lc, int load, Member from, Member to) {
        }
        record One(LoadCase lc, MemberLoad load) {
        }
        List<One> singles = new ArrayList<>();
        List<Move> moves = new ArrayList<>();
        for (LoadCase lc : m.loadCases()) {
            // a load spread over many members (a floor load on every span) is not "on the wrong span"
            if (lc.pattern() || lc.memberLoads().size() > MOVABLE_LOADS_PER_CASE) continue;
            for (MemberLoad l : lc.memberLoads()) {
                singles.add(new One(lc, l));
                Member from = m.member(l.member());
                for (Member to : m.members().values()) {
                    if (to != from && alike(m, from, to) && moves.size() < MOVED_LOAD_TRIALS) {
                        moves.add(new Move(lc, singles.size() - 1, from, to));
                    }
                }
            }
        }
        if (singles.isEmpty()) return;
        List<LoadCase> probes = new ArrayList<>();
        for (int k = 0; k < singles.size(); k++) {
            One o = singles.get(k);
            probes.add(new LoadCase("load#" + k, o.lc.type(), false, false, List.of(o.load), List.of(), List.of(), List.of(), o.lc.at()));
        }
        for (int k = 0; k < moves.size(); k++) {
            Move mv = moves.get(k);
            MemberLoad l = singles.get(mv.load).load;
            probes.add(new LoadCase("moved#" + k, mv.lc.type(), false, false, List.of(l.on(mv.to.name())), List.of(), List.of(),
                    List.of(), mv.lc.at()));
        }
        Model probe = new Model(m.file(), m.job(), m.units(), m.materials(), m.sections(), m.nodes(), m.supports(), m.members(),
                probes, List.of(), List.of(), m.redundants(), List.of());
        EngineResult solved = variantEngine.solve(probe);
        if (!solved.stable()) return;
        // superpositions name the probe cases among their loads: the equilibrium check needs them in the model
        Model em = a.engineModel();
        List<LoadCase> all = new ArrayList<>(em.loadCases());
        all.addAll(probes);
        Model withProbes = new Model(em.file(), em.job(), em.units(), em.materials(), em.sections(), em.nodes(), em.supports(),
                em.members(), all, List.of(), List.of(), em.redundants(), List.of());
        // each member load left out, or counted twice: case' = case -/+ (the load alone)
        for (int k = 0; k < singles.size(); k++) {
            One o = singles.get(k);
            Solution alone = solved.cases().get("load#" + k);
            String what = "the " + kind(o.load) + " load of case " + o.lc.name() + " on member " + o.load.member();
            for (double extra : new double[]{-1, 1}) {
                trials.add(new Trial(what + (extra < 0 ? " left out" : " counted twice"), List.of("model: " + what
                        + (extra < 0 ? " removed" : " doubled")), world(casesWith(o.lc.name(), s -> {
                            Map<Solution, Double> parts = new LinkedHashMap<>();
                            parts.put(s, 1.0);
                            parts.put(alone, extra);
                            return Superposition.combine(withProbes, s.name(), parts, functions());
                        }), a.loadSets(), setsWith(o.lc.name()), withProbes)));
            }
        }
        for (int k = 0; k < moves.size(); k++) {
            Move mv = moves.get(k);
            MemberLoad l = singles.get(mv.load).load;
            Solution where = solved.cases().get("load#" + mv.load), moved = solved.cases().get("moved#" + k);
            trials.add(new Trial("the " + kind(l) + " load of case " + mv.lc.name() + " on member " + mv.to.name() + " instead of "
                    + mv.from.name(), List.of("model: a load of " + mv.lc.name() + " moved from " + mv.from.name() + " to " + mv.to.name()),
                    world(casesWith(mv.lc.name(), s -> {
                        Map<Solution, Double> parts = new LinkedHashMap<>();
                        parts.put(s, 1.0);
                        parts.put(where, -1.0);
                        parts.put(moved, 1.0);
                        return Superposition.combine(withProbes, s.name(), parts, functions());
                    }), a.loadSets(), setsWith(mv.lc.name()), withProbes)));
        }
    }

    private static String kind(MemberLoad l) {
        return l instanceof MemberLoad.Distributed ? "distributed" : l instanceof MemberLoad.Point ? "point" : "couple";
    }

    /** Same length within 1% and the same direction: a load moved between them keeps its meaning. */
    static boolean alike(Model m, Member a, Member b) {
        double la = m.lengthM(a), lb = m.lengthM(b);
        double[] da = m.directionOf(a), db = m.directionOf(b);
        return Math.abs(la - lb) <= 0.01 * la && da[0] * db[0] + da[1] * db[1] > 0.9999;
    }

    // ---- words

    static double round3(double v) {
        if (!Double.isFinite(v) || v == 0) return v;
        double scale = Math.pow(10, 2 - Math.floor(Math.log10(Math.abs(v))));
        return Math.round(v * scale) / scale;
    }

    static String fmt(double k) {
        return String.format(Locale.ROOT, "%.3g", k);
    }
}
