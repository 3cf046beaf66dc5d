package plumbline.review;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import plumbline.model.Combination;
import plumbline.model.LoadCase;
import plumbline.model.Model;
import plumbline.solve.Engine;
import plumbline.solve.EngineResult;
import plumbline.solve.Solution;
import plumbline.solve.Superposition;
import plumbline.statics.Determinacy;

/**
 * The model solved: statics first (a model that statics finds unstable is not handed to an
 * engine), then each requested engine, every load set formed by superposition of the
 * engine's load-case solutions.
 */
public record Analysis(Model model, Determinacy.Result determinacy, List<LoadSet> loadSets,
                       Map<String, EngineResult> engines, Map<String, Map<String, Solution>> solutions) {

    public static List<LoadSet> loadSets(Model model) {
        List<LoadSet> out = new ArrayList<>();
        for (LoadCase c : model.loadCases()) out.add(new LoadSet(c.name(), Map.of(c.name(), 1.0), "load case " + c.type(), false));
        for (Combination c : model.combinations()) out.add(new LoadSet(c.name(), c.factors(), c.origin(), true));
        out.addAll(StandardCombinations.expand(model));
        return out;
    }

    public static Analysis of(Model model, List<Engine> engines) {
        Determinacy.Result det = Determinacy.of(model);
        List<LoadSet> sets = loadSets(model);
        Map<String, EngineResult> results = new LinkedHashMap<>();
        Map<String, Map<String, Solution>> sols = new LinkedHashMap<>();
        if (det.classification() != Determinacy.Classification.UNSTABLE) {
            for (Engine e : engines) {
                EngineResult r = e.solve(model);
                results.put(e.name(), r);
                if (!r.stable()) continue;
                Map<String, Solution> byName = new LinkedHashMap<>();
                for (LoadSet s : sets) {
                    Map<Solution, Double> parts = new LinkedHashMap<>();
                    for (var f : s.factors().entrySet()) parts.put(r.cases().get(f.getKey()), f.getValue());
                    Solution bare = r.cases().get(s.name()); // a load case on its own needs no superposition
                    byName.put(s.name(), bare != null ? bare : Superposition.combine(model, s.name(), parts));
                }
                sols.put(e.name(), byName);
            }
        }
        return new Analysis(model, det, sets, results, sols);
    }

    public boolean stable() {
        return determinacy.classification() != Determinacy.Classification.UNSTABLE
                && engines.values().stream().allMatch(EngineResult::stable);
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
