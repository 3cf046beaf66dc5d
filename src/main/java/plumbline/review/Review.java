package plumbline.review;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.function.Function;
import plumbline.model.Claim;
import plumbline.model.ClaimSet;
import plumbline.model.LimitState;
import plumbline.model.Member;
import plumbline.model.Quantity;
import plumbline.solve.Engine;
import plumbline.solve.Equilibrium;
import plumbline.solve.MemberSolution;
import plumbline.solve.Solution;
import plumbline.statics.ClaimedEquilibrium;
import plumbline.units.Dimension;
import plumbline.validate.Plausibility;

/**
 * Compares every claim with the computed value and gives the verdict: the worst status, or
 * unstable. Envelope claims take the most severe value over all combinations.
 */
public record Review(Analysis analysis, List<ClaimResult> claims, List<ClaimedEquilibrium> equilibrium,
                     List<Plausibility.Warning> warnings, Safeguards safeguards, Verdict verdict,
                     List<Explanation> explanations) {

    /**
     * The run's own checks: the largest relative difference between the two methods over
     * every load case and every solution of every load set (null when only one ran), and the
     * largest equilibrium residual of any of those solutions of any engine.
     */
    public record Safeguards(Double agreement, double worstResidual, String worstResidualAt) {
        public boolean enginesAgree() {
            return agreement == null || agreement <= Agreement.TOLERANCE;
        }

        public boolean balanced() {
            return worstResidual <= Equilibrium.TOLERANCE;
        }

        static Safeguards of(Analysis a) {
            Double agreement = null;
            if (a.solutions().containsKey("stiffness") && a.solutions().containsKey("force")) {
                agreement = Agreement.maxRelativeDifference(a.engineModel(), everySolution(a, "stiffness"), everySolution(a, "force"));
            }
            double worst = 0;
            String at = "";
            for (String engine : a.solutions().keySet()) {
                for (Solution s : everySolution(a, engine).values()) {
                    if (!(s.equilibriumResidual() <= worst)) { // a NaN residual is the worst of all
                        worst = s.equilibriumResidual();
                        at = engine + " method, " + s.name();
                    }
                }
            }
            return new Safeguards(agreement, worst, at);
        }

        /** Every state an engine's numbers come from: its load cases and each solution of each load set. */
        private static Map<String, Solution> everySolution(Analysis a, String engine) {
            Map<String, Solution> out = new LinkedHashMap<>(a.engines().get(engine).cases());
            for (var e : a.solutions().get(engine).entrySet()) {
                List<Solution> parts = e.getValue().solutions();
                for (int i = 0; i < parts.size(); i++) out.put("set " + e.getKey() + " #" + i, parts.get(i));
            }
            return out;
        }
    }

    /** The verdict from the state of the model, the safeguards and the claims' statuses, most severe first. */
    static Verdict verdict(boolean stable, Safeguards g, List<ClaimResult> claims, boolean claimedReactionsBalance) {
        if (!stable) return Verdict.UNSTABLE;
        if (!g.enginesAgree()) return Verdict.ENGINES_DISAGREE;
        if (!g.balanced()) return Verdict.UNBALANCED;
        if (claims.stream().anyMatch(r -> r.status() == ClaimResult.Status.MISMATCH)) return Verdict.MISMATCH;
        if (claims.stream().anyMatch(r -> r.status() == ClaimResult.Status.MARGINAL)) return Verdict.MARGINAL;
        if (!claimedReactionsBalance) return Verdict.MARGINAL;
        if (claims.isEmpty()) return Verdict.NO_CLAIMS;
        return Verdict.OK;
    }

    /** A deflection beyond span/50 under any load set is a slip or a mechanism-like model (common practice). */
    public static final double SPAN_OVER_DEFLECTION_MIN = 50;

    public static Review of(Analysis a, TolerancePolicy policy) {
        return of(a, policy, null);
    }

    /**
     * @param variantEngine the engine that solves variant models when diagnosing a
     *                      discrepancy (null: no variants are tried)
     */
    public static Review of(Analysis a, TolerancePolicy policy, Engine variantEngine) {
        List<ClaimResult> out = new ArrayList<>();
        Map<String, Analysis> variantCache = new HashMap<>();
        Map<String, Map<String, Double>> readings = new HashMap<>(); // shared by the diagnoses of every claim
        Map<String, Double> largest = new HashMap<>(); // the largest value of a kind per load set, found once
        String primary = a.primaryEngine();
        // the same claim written twice with the same value is compared once, so it is not counted twice; a warning
        // names both places (contradicting values are refused on reading; a plain envelope claim may be written
        // once for the upper and once for the lower value, and then both are compared)
        Map<String, Claim> seen = new HashMap<>();
        List<Plausibility.Warning> repeats = new ArrayList<>();
        for (ClaimSet cs : a.model().claims()) {
            for (Claim c : cs.claims()) {
                Claim before = seen.putIfAbsent(c.id() + "=" + c.valueInternal(), c);
                if (before != null) {
                    repeats.add(new Plausibility.Warning("each quantity is claimed once", c.at().file() + ":" + c.at().line(),
                            "the same claim as " + before.at().file() + ":" + before.at().line() + " (" + c.id() + "); compared once"));
                    continue;
                }
                if (primary == null) continue;
                Value v = value(a, primary, c);
                double force = a.solutions().containsKey("force") ? value(a, "force", c).value : Double.NaN;
                TolerancePolicy.Applied tol = policy.forClaim(c, cs);
                double floor = TolerancePolicy.ABSOLUTE_FLOOR_FRACTION * largest.computeIfAbsent(kindKey(c, v.governing),
                        k -> largestOfKind(a, primary, c, v.governing));
                if (c.dimension().equals(Dimension.LENGTH)) {
                    floor = Math.max(floor, TolerancePolicy.DISPLACEMENT_NOISE_FRACTION * a.model().extentM());
                }
                double diff = Math.abs(c.valueInternal() - v.value);
                double allowed = Math.max(tol.relative() * Math.abs(v.value), floor);
                ClaimResult.Status st = diff <= allowed ? ClaimResult.Status.OK
                        : diff <= TolerancePolicy.MARGINAL_FACTOR * allowed ? ClaimResult.Status.MARGINAL
                        : ClaimResult.Status.MISMATCH;
                double rel = v.value == 0 ? (diff == 0 ? 0 : Double.POSITIVE_INFINITY) : diff / Math.abs(v.value);
                String gov = v.governing + (v.loaded.isEmpty() ? "" : " with loads on " + String.join(", ", v.loaded));
                String diagnosis = st == ClaimResult.Status.OK ? null
                        : Diagnosis.explain(a, primary, c, v.value, tol.relative(), variantEngine, variantCache, readings);
                out.add(new ClaimResult(c, cs.file(), v.value, force, rel, tol, floor, st, gov, diagnosis, 0, diagnosis));
            }
        }
        Map<String, Map<String, Double>> factors = new LinkedHashMap<>();
        for (LoadSet s : a.loadSets()) factors.put(s.name(), s.factors());
        List<ClaimedEquilibrium> eq = ClaimedEquilibrium.check(a.model(), factors, ClaimedEquilibrium.DEFAULT_TOLERANCE);
        List<Explanation> explanations = primary == null ? List.of()
                : Explanations.search(a, primary, out, variantEngine, variantCache, eq);
        out = withExplanations(out, explanations);
        Safeguards guards = Safeguards.of(a);
        Verdict verdict = verdict(a.stable(), guards, out, eq.stream().allMatch(ClaimedEquilibrium::balanced));
        List<Plausibility.Warning> warnings = new ArrayList<>(Plausibility.check(a.model()));
        warnings.addAll(repeats);
        for (var e : a.engines().values()) {
            for (var w : e.warnings()) warnings.add(new Plausibility.Warning(w.rule(), e.engine() + " method", w.found()));
        }
        if (primary != null) {
            String rule = "deflections beyond span/50 are not credible for a linear model (common practice)";
            int beyond = 0;
            for (LoadSet set : a.loadSets()) {
                LoadSetResult r = a.solutions().get(primary).get(set.name());
                for (Member mem : a.model().members().values()) {
                    double span = a.model().lengthM(mem);
                    double d = r.peak(mem.name(), Quantity.DEFLECTION).value();
                    if (d > span / SPAN_OVER_DEFLECTION_MIN && beyond++ < DEFLECTION_WARNINGS_LISTED) {
                        warnings.add(new Plausibility.Warning(rule, "member " + mem.name() + ", " + set.name(),
                                String.format(Locale.ROOT, "deflection = span/%.3g", span / d)));
                    }
                }
            }
            if (beyond > DEFLECTION_WARNINGS_LISTED) {
                warnings.add(new Plausibility.Warning(rule, "every load set", (beyond - DEFLECTION_WARNINGS_LISTED)
                        + " more member deflections beyond span/50 (the first " + DEFLECTION_WARNINGS_LISTED + " are listed)"));
            }
        }
        return new Review(a, out, eq, warnings, guards, verdict, explanations);
    }

    /**
     * Each flagged claim's diagnosis names the best explanation of the set that covers it
     * ("E1: ..."), with how many claims support it; the claim's own diagnosis follows.
     */
    static List<ClaimResult> withExplanations(List<ClaimResult> results, List<Explanation> explanations) {
        List<ClaimResult> out = new ArrayList<>();
        for (ClaimResult r : results) {
            String own = r.ownDiagnosis(), d = own;
            int covering = 0;
            for (int i = 0; i < explanations.size() && covering == 0; i++) {
                Explanation e = explanations.get(i);
                if (!e.explains().contains(r.claim().id())) continue;
                covering = i + 1;
                d = "E" + covering + ": " + e.sentence() + " (" + e.support() + ")" + (own == null ? "" : "; for this claim alone: " + own);
            }
            out.add(new ClaimResult(r.claim(), r.claimsFile(), r.computed(), r.computedForce(), r.relativeDifference(),
                    r.tolerance(), r.absoluteFloor(), r.status(), r.governing(), d, covering, own));
        }
        return out;
    }

    /** A computed value, the load set that governs it, and the members loaded for it (pattern loading). */
    record Value(double value, String governing, List<String> loaded) {
    }


    /**
     * The computed value of the claimed quantity (SI). Under pattern loading a reaction or
     * displacement has an upper and a lower value: a claim of zero or more is compared with
     * the upper, a negative claim with the lower. For {@code envelope}, the most severe
     * value over the combinations.
     */
    static Value value(Analysis a, String engine, Claim c) {
        return value(a.loadSets(), a.solutions().get(engine), c);
    }

    /** The computed value of the claimed quantity among the results {@code sols} of the load sets {@code sets}. */
    static Value value(List<LoadSet> sets, Map<String, LoadSetResult> sols, Claim c) {
        return value(sets, sols::get, c);
    }

    /** As above, the results found by name on demand (a change that recomputes only the sets a claim needs). */
    static Value value(List<LoadSet> sets, Function<String, LoadSetResult> sols, Claim c) {
        LimitState state = LimitState.ofEnvelope(c.combo());
        if (state == null) return of(sols.apply(c.combo()), c);
        Value best = null;
        for (LoadSet s : sets) {
            if (!s.combination() || state != LimitState.NONE && s.limitState() != state) continue;
            Value v = of(sols.apply(s.name()), c);
            boolean better;
            if (best == null) better = true;
            else if (c.quantity().extreme == Quantity.Extreme.MAX) better = v.value > best.value;
            else if (c.quantity().extreme == Quantity.Extreme.MIN) better = v.value < best.value;
            else if (c.item() != Claim.Kind.MEMBER || !c.quantity().isPeak()) {
                better = c.valueInternal() >= 0 ? v.value > best.value : v.value < best.value;
            }
            else better = Math.abs(v.value) > Math.abs(best.value);
            if (better) best = v;
        }
        return best;
    }

    static Value of(LoadSetResult s, Claim c) {
        // a bound names its side; a plain value of zero or more is compared with the upper one
        boolean upper = c.quantity().isBound() ? c.quantity().extreme == Quantity.Extreme.MAX : c.valueInternal() >= 0;
        switch (c.item()) {
            case REACTION:
                return new Value(s.reaction(c.name(), c.quantity().component, upper), s.name(),
                        List.of());
            case DISPLACEMENT:
                return new Value(s.displacement(c.name(), c.quantity().component, upper),
                        s.name(), List.of());
            default: {
                Quantity q = c.quantity();
                if (!q.isPeak()) {
                    // a value at an end or a position; the end value is the one just inside the member
                    double len = s.representative().members().get(c.name()).actions().lengthM();
                    double x = q.place == Quantity.Place.START ? 0 : q.place == Quantity.Place.END ? len : c.atM();
                    return new Value(s.valueAt(c.name(), q.function, x, q.place == Quantity.Place.END, upper), s.name(), List.of());
                }
                LoadSetResult.Peak p = s.peak(c.name(), q);
                return new Value(p.value(), s.name(), p.loadedMembers());
            }
        }
    }

    /** The largest magnitude of the same kind of quantity (reaction force, moment, ...) in the load set. */
    /** What {@link #largestOfKind} depends on: the load set, the item, and for reactions and displacements moment or force. */
    static String kindKey(Claim c, String set) {
        String kind = switch (c.item()) {
            case REACTION -> c.quantity().component == 2 ? "Mz" : "F";
            case DISPLACEMENT -> c.quantity() == Quantity.RZ ? "rz" : "u";
            default -> c.quantity().magnitude().name();
        };
        return set + "|" + c.item() + "|" + kind;
    }

    /** Deflection warnings listed one by one; the rest are counted in one more warning (a report of thousands helps no one). */
    static final int DEFLECTION_WARNINGS_LISTED = 20;

    static double largestOfKind(Analysis a, String engine, Claim c, String set) {
        LoadSetResult r = a.solutions().get(engine).get(set);
        if (r == null) return 0;
        Solution s = r.representative();
        double max = 0;
        switch (c.item()) {
            case REACTION:
                for (double[] x : s.reactions().values()) {
                    max = c.quantity().component == 2 ? Math.max(max, Math.abs(x[2])) : Math.max(max, Math.hypot(x[0], x[1]));
                }
                return max;
            case DISPLACEMENT:
                for (double[] d : s.displacements().values()) {
                    max = c.quantity() == Quantity.RZ ? Math.max(max, Math.abs(d[2])) : Math.max(max, Math.hypot(d[0], d[1]));
                }
                return max;
            default:
                for (MemberSolution m : s.members().values()) max = Math.max(max, m.peaks().value(c.quantity().magnitude()));
                return max;
        }
    }
}
