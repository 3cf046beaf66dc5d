package plumbline.review;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import plumbline.model.Claim;
import plumbline.model.ClaimSet;
import plumbline.solve.MemberSolution;
import plumbline.solve.Solution;
import plumbline.statics.ClaimedEquilibrium;

/**
 * Compares every claim with the computed value and gives the verdict: the worst status, or
 * unstable. Envelope claims take the most severe value over all combinations.
 */
public record Review(Analysis analysis, List<ClaimResult> claims, List<ClaimedEquilibrium> equilibrium,
                     String verdict) {

    public static Review of(Analysis a, TolerancePolicy policy) {
        List<ClaimResult> out = new ArrayList<>();
        String primary = a.primaryEngine();
        for (ClaimSet cs : a.model().claims()) {
            for (Claim c : cs.claims()) {
                if (primary == null) continue;
                Value v = value(a, primary, c);
                double force = a.solutions().containsKey("force") ? value(a, "force", c).value : Double.NaN;
                TolerancePolicy.Applied tol = policy.forClaim(c, cs);
                double floor = TolerancePolicy.ABSOLUTE_FLOOR_FRACTION * largestOfKind(a, primary, c, v.governing);
                if (c.dimension().equals(plumbline.units.Dimension.LENGTH)) {
                    floor = Math.max(floor, TolerancePolicy.DISPLACEMENT_NOISE_FRACTION * a.model().extentM());
                }
                double diff = Math.abs(c.valueInternal() - v.value);
                double allowed = Math.max(tol.relative() * Math.abs(v.value), floor);
                ClaimResult.Status st = diff <= allowed ? ClaimResult.Status.OK
                        : diff <= TolerancePolicy.MARGINAL_FACTOR * allowed ? ClaimResult.Status.MARGINAL
                        : ClaimResult.Status.MISMATCH;
                double rel = v.value == 0 ? (diff == 0 ? 0 : Double.POSITIVE_INFINITY) : diff / Math.abs(v.value);
                out.add(new ClaimResult(c, cs.file(), v.value, force, rel, tol, floor, st, v.governing, null));
            }
        }
        Map<String, Map<String, Double>> factors = new java.util.LinkedHashMap<>();
        for (LoadSet s : a.loadSets()) factors.put(s.name(), s.factors());
        List<ClaimedEquilibrium> eq = ClaimedEquilibrium.check(a.model(), factors, ClaimedEquilibrium.DEFAULT_TOLERANCE);
        String verdict;
        if (!a.stable()) verdict = "unstable";
        else if (out.stream().anyMatch(r -> r.status() == ClaimResult.Status.MISMATCH)) verdict = "mismatch";
        else if (out.stream().anyMatch(r -> r.status() == ClaimResult.Status.MARGINAL)) verdict = "marginal";
        else verdict = "ok";
        if (verdict.equals("ok") && eq.stream().anyMatch(e -> !e.balanced())) verdict = "marginal";
        return new Review(a, out, eq, verdict);
    }

    record Value(double value, String governing) {
    }

    /** The computed value of the claimed quantity (SI); for envelope, the most severe over the combinations. */
    static Value value(Analysis a, String engine, Claim c) {
        Map<String, Solution> sols = a.solutions().get(engine);
        if (!c.combo().equals("envelope")) return new Value(of(sols.get(c.combo()), c), c.combo());
        double best = Double.NaN;
        String gov = null;
        for (LoadSet s : a.loadSets()) {
            if (!s.combination()) continue;
            double v = of(sols.get(s.name()), c);
            boolean better;
            if (Double.isNaN(best)) better = true;
            else if (c.quantity().endsWith("_max")) better = v > best;
            else if (c.quantity().endsWith("_min")) better = v < best;
            else better = Math.abs(v) > Math.abs(best);
            if (better) {
                best = v;
                gov = s.name();
            }
        }
        return new Value(best, gov);
    }

    static double of(Solution s, Claim c) {
        String[] comps = {"Fx", "Fy", "Mz"};
        String[] disp = {"ux", "uy", "rz"};
        switch (c.item()) {
            case REACTION: {
                double[] r = s.reactions().get(c.name());
                return r == null ? 0.0 : r[java.util.Arrays.asList(comps).indexOf(c.quantity())];
            }
            case DISPLACEMENT:
                return s.displacements().get(c.name())[java.util.Arrays.asList(disp).indexOf(c.quantity())];
            default: {
                MemberSolution m = s.members().get(c.name());
                return m.peaks().value(c.quantity());
            }
        }
    }

    /** The largest magnitude of the same kind of quantity (reaction force, moment, ...) in the load set. */
    static double largestOfKind(Analysis a, String engine, Claim c, String set) {
        Solution s = a.solutions().get(engine).get(set);
        if (s == null) return 0;
        double max = 0;
        switch (c.item()) {
            case REACTION:
                for (double[] r : s.reactions().values()) {
                    max = c.quantity().equals("Mz") ? Math.max(max, Math.abs(r[2])) : Math.max(max, Math.hypot(r[0], r[1]));
                }
                return max;
            case DISPLACEMENT:
                for (double[] d : s.displacements().values()) {
                    max = c.quantity().equals("rz") ? Math.max(max, Math.abs(d[2])) : Math.max(max, Math.hypot(d[0], d[1]));
                }
                return max;
            default:
                for (MemberSolution m : s.members().values()) {
                    String q = c.quantity();
                    String abs = q.equals("deflection") ? "deflection" : q.charAt(0) + "_abs";
                    max = Math.max(max, m.peaks().value(abs));
                }
                return max;
        }
    }
}
