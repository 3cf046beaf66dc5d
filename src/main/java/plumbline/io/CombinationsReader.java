package plumbline.io;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import plumbline.model.Combination;
import plumbline.model.LimitState;
import plumbline.model.LoadCase;
import plumbline.model.Problem;

/**
 * Reads the user {@code combinations} of a model file (a load factor per load case) and the
 * names of the {@code standard_combinations} sets to generate.
 */
final class CombinationsReader {

    private final List<Problem> problems;

    CombinationsReader(List<Problem> problems) {
        this.problems = problems;
    }

    List<Combination> combinations(Tree t, List<LoadCase> cases) {
        List<Combination> out = new ArrayList<>();
        List<String> caseNames = cases.stream().map(LoadCase::name).toList();
        for (Tree.Entry e : Fields.named(t, problems, "combinations", false, null, "a map of named combinations")) {
            String path = "combinations." + e.key();
            if (caseNames.contains(e.key())) {
                problems.add(new Problem(e.keyAt(), path, "combination '" + e.key()
                        + "' has the name of a load case; expected a name of its own"));
            }
            if (LimitState.isEnvelope(e.key())) {
                problems.add(new Problem(e.keyAt(), path, "'" + e.key() + "' is reserved for an envelope over combinations"));
            }
            LimitState state = LimitState.NONE;
            Tree factorsTree = e.value();
            String factorsPath = path;
            if (e.value() instanceof Tree.MapNode mn && mn.entries().containsKey("factors")) {
                // {factors: {D: 1.35, L: 1.5}, limit_state: ULS}
                Fields outer = Fields.of(e.value(), path, problems, List.of("factors", "limit_state"),
                        "a map {factors: {D: 1.35, L: 1.5}, limit_state: ULS}");
                String ls = outer.text("limit_state", false, "ULS or SLS");
                if (ls != null) {
                    if (ls.equals("ULS") || ls.equals("SLS")) state = LimitState.valueOf(ls);
                    else outer.problem(outer.at("limit_state"), "limit_state", "found '" + ls + "'; expected ULS (ultimate) or SLS (serviceability)");
                }
                factorsTree = outer.get("factors");
                factorsPath = path + ".factors";
            }
            Fields f = Fields.of(factorsTree, factorsPath, problems, caseNames, "a map from load case to factor, e.g. {D: 1.35, L: 1.5}");
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
            out.add(new Combination(e.key(), factors, "user combination", e.keyAt(), state));
        }
        return out;
    }

    /** The standard combination sets named under {@code standard_combinations}, each once. */
    List<String> standardSets(Fields top) {
        List<String> standards = new ArrayList<>();
        for (Tree t : top.list("standard_combinations", false, "a list of standard combination sets")) {
            if (t instanceof Tree.Scalar s && Combination.STANDARD_SETS.contains(s.text())) {
                if (standards.contains(s.text())) problems.add(new Problem(t.at(), "standard_combinations", "'" + s.text() + "' listed twice"));
                else standards.add(s.text());
            } else if (t instanceof Tree.Scalar s) {
                problems.add(new Problem(t.at(), "standard_combinations", Fields.unknown("set", s.text(), Combination.STANDARD_SETS,
                        "expected one of " + String.join(", ", Combination.STANDARD_SETS))));
            }
            else problems.add(new Problem(t.at(), "standard_combinations", "found " + t.describe() + "; expected a name"));
        }
        return standards;
    }
}
