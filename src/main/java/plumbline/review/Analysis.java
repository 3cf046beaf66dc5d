package plumbline.review;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.concurrent.CompletableFuture;
import plumbline.model.Combination;
import plumbline.model.LoadCase;
import plumbline.model.MemberLoad;
import plumbline.model.Model;
import plumbline.solve.Engine;
import plumbline.solve.EngineResult;
import plumbline.solve.MemberFunctions;
import plumbline.solve.SideBySide;
import plumbline.solve.Solution;
import plumbline.solve.Superposition;
import plumbline.statics.Determinacy;

/**
 * The model solved: statics first (a model that statics finds unstable is not handed to an
 * engine), then each requested engine, every load set formed by superposition of the
 * engine's load-case solutions. A pattern-loaded case is handed to the engines split into
 * its fixed part (node loads, temperatures, settlements) and one case per member carrying
 * its member loads, so every arrangement is a superposition (the matrix is still factored
 * once).
 */
public record Analysis(Model model, Model engineModel, Determinacy.Result determinacy, List<LoadSet> loadSets,
                       Map<String, EngineResult> engines, Map<String, Map<String, LoadSetResult>> solutions) {

    /** Separates a pattern case's name from the member whose loads a sub-case holds. */
    static final String PART = "\u27e8";

    public static List<LoadSet> loadSets(Model model) {
        List<LoadSet> out = new ArrayList<>();
        for (LoadCase c : model.loadCases()) out.add(new LoadSet(c.name(), Map.of(c.name(), 1.0), "load case " + c.type(), false));
        for (Combination c : model.combinations()) out.add(new LoadSet(c.name(), c.factors(), c.origin(), true, c.limitState()));
        out.addAll(StandardCombinations.expand(model));
        return out;
    }

    /** The model the engines solve: each pattern case split into its fixed part and one case per loaded member. */
    static Model engineModel(Model model) {
        if (model.loadCases().stream().noneMatch(LoadCase::pattern)) return model;
        List<LoadCase> cases = new ArrayList<>();
        for (LoadCase c : model.loadCases()) {
            if (!c.pattern()) {
                cases.add(c);
                continue;
            }
            cases.add(new LoadCase(c.name(), c.type(), c.selfWeight(), false, List.of(), c.nodeLoads(), c.temperatures(),
                    c.settlements(), c.at()));
            Map<String, List<MemberLoad>> byMember = new LinkedHashMap<>();
            for (MemberLoad l : c.memberLoads()) byMember.computeIfAbsent(l.member(), k -> new ArrayList<>()).add(l);
            for (var e : byMember.entrySet()) {
                cases.add(new LoadCase(c.name() + PART + e.getKey(), c.type(), false, false, e.getValue(), List.of(), List.of(),
                        List.of(), c.at()));
            }
        }
        return new Model(model.file(), model.job(), model.units(), model.materials(), model.sections(), model.nodes(),
                model.supports(), model.members(), cases, List.of(), List.of(), model.redundants(), List.of());
    }

    public static Analysis of(Model model, List<Engine> engines) {
        List<LoadSet> sets = loadSets(model);
        return of(model, engines, sets, SideBySide.worth(model.members().size(), sets.size()), null);
    }

    /**
     * A variant of an analysed model (the diagnosis's trials) solved by {@code engines}: when the
     * variant has the analysed model's very nodes, members and supports (it changes loads,
     * properties or units only), the statics found for the model are its statics too and are
     * not worked out again.
     */
    static Analysis variantOf(Analysis base, Model variant, List<Engine> engines) {
        Determinacy.Result known = variant.hasTheSameFrameAs(base.model()) ? base.determinacy() : null;
        List<LoadSet> sets = loadSets(variant);
        return of(variant, engines, sets, SideBySide.worth(variant.members().size(), sets.size()), known);
    }

    /** The analysis with its pieces run side by side ({@code parallel}) or in the calling thread: the same numbers. */
    static Analysis of(Model model, List<Engine> engines, boolean parallel) {
        return of(model, engines, loadSets(model), parallel, null);
    }

    private static Analysis of(Model model, List<Engine> engines, List<LoadSet> sets, boolean parallel,
                               Determinacy.Result knownStatics) {
        Model em = engineModel(model);
        // the statics (determinacy and stability) on one core while the engines start on the other
        // (on a large model); on an unstable model the engines' work is discarded, as if they had not run
        CompletableFuture<Determinacy.Result> statics = knownStatics != null ? CompletableFuture.completedFuture(knownStatics)
                : parallel ? CompletableFuture.supplyAsync(() -> Determinacy.of(model))
                : CompletableFuture.completedFuture(Determinacy.of(model));
        // the engines, and the load sets of each, are independent of one another (pure functions of the
        // model): they run side by side on the machine's cores and are gathered back in their order, so
        // every number is the same as in one thread. Each engine's load sets follow its own solution at
        // once (a quick engine's sets are formed while a slower one still solves). A model the statics
        // already found unstable (one thread) has no sets formed.
        boolean setsWanted = parallel || SideBySide.joined(statics).classification() != Determinacy.Classification.UNSTABLE;
        List<Object> attempts = SideBySide.stream(engines, parallel).map(e -> {
            try {
                EngineResult r = e.solve(em);
                if (!r.stable() || !setsWanted) return (Object) new Solved(r, null);
                List<LoadSetResult> rs = SideBySide.stream(sets, parallel).map(s -> result(model, em, r, s, e.memberFunctions())).toList();
                Map<String, LoadSetResult> byName = new LinkedHashMap<>();
                for (int k = 0; k < sets.size(); k++) byName.put(sets.get(k).name(), rs.get(k));
                return new Solved(r, byName);
            } catch (RuntimeException ex) {
                return ex; // an engine may fail on a mechanism; the statics decide below whether that matters
            }
        }).toList();
        Determinacy.Result det = SideBySide.joined(statics);
        Map<String, EngineResult> results = new LinkedHashMap<>();
        Map<String, Map<String, LoadSetResult>> sols = new LinkedHashMap<>();
        if (det.classification() != Determinacy.Classification.UNSTABLE) {
            for (Object a : attempts) if (a instanceof RuntimeException ex) throw ex;
            for (int i = 0; i < engines.size(); i++) {
                Solved sv = (Solved) attempts.get(i);
                results.put(engines.get(i).name(), sv.result());
                if (sv.sets() != null) sols.put(engines.get(i).name(), sv.sets());
            }
        }
        return new Analysis(model, em, det, sets, results, sols);
    }

    /** One engine's solution and its load sets (null when it found the model unstable). */
    private record Solved(EngineResult result, Map<String, LoadSetResult> sets) {
    }

    /** The result of load set {@code s} from the engine's load-case solutions, by superposition (pattern parts kept apart). */
    static LoadSetResult result(Model model, Model em, EngineResult r, LoadSet s, MemberFunctions fn) {
        boolean patterned = s.factors().keySet().stream().anyMatch(c -> model.loadCase(c).pattern());
        if (!patterned) {
            Solution bare = r.cases().get(s.name()); // a load case on its own needs no superposition
            if (bare != null && !s.combination()) return new LoadSetResult.Plain(bare);
            Map<Solution, Double> parts = new LinkedHashMap<>();
            for (var f : s.factors().entrySet()) parts.put(r.cases().get(f.getKey()), f.getValue());
            return new LoadSetResult.Plain(Superposition.combine(em, s.name(), parts, fn));
        }
        Map<Solution, Double> fixed = new LinkedHashMap<>(), all = new LinkedHashMap<>();
        List<LoadSetResult.Part> parts = new ArrayList<>();
        for (var f : s.factors().entrySet()) {
            fixed.put(r.cases().get(f.getKey()), f.getValue());
            all.put(r.cases().get(f.getKey()), f.getValue());
            if (!model.loadCase(f.getKey()).pattern()) continue;
            for (var c : r.cases().entrySet()) {
                if (!c.getKey().startsWith(f.getKey() + PART)) continue;
                String member = c.getKey().substring(f.getKey().length() + PART.length());
                parts.add(new LoadSetResult.Part(member, Superposition.combine(em, s.name() + PART + member,
                        Map.of(c.getValue(), f.getValue()), fn)));
                all.put(c.getValue(), f.getValue());
            }
        }
        return new LoadSetResult.Pattern(s.name(), Superposition.combine(em, s.name(), fixed, fn), parts,
                Superposition.combine(em, s.name(), all, fn));
    }

    public boolean stable() {
        return determinacy.classification() != Determinacy.Classification.UNSTABLE
                && engines.values().stream().allMatch(e -> e.stable() || e.declined());
    }

    /** The engine whose numbers are reported first: stiffness when it ran, else the first. */
    public String primaryEngine() {
        if (solutions.containsKey("stiffness")) return "stiffness";
        return solutions.keySet().stream().findFirst().orElse(null);
    }

    public Map<String, Double> factors(String name) {
        for (LoadSet s : loadSets) if (s.name().equals(name)) return s.factors();
        return null;
    }
}
