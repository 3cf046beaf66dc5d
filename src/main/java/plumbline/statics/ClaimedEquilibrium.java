package plumbline.statics;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import plumbline.model.Claim;
import plumbline.model.ClaimSet;
import plumbline.model.Combination;
import plumbline.model.LoadCase;
import plumbline.model.Model;
import plumbline.model.Node;
import plumbline.model.Quantity;
import plumbline.model.Support;

/**
 * Global equilibrium of the claimed reactions of one combination, by statics alone: the
 * claimed reactions plus the applied loads must sum to zero in x, in y and in moment about
 * a reference point (the first support). Residuals are relative to the sum of the
 * magnitudes of the applied forces (moments also divided by the model's extent). A sum is
 * checked only when every support that can react in it has its component claimed.
 */
public record ClaimedEquilibrium(String combo, String referenceNode, double sumFxN, double sumFyN, double sumMomentNm,
                                 double relFx, double relFy, double relMoment, boolean checkedFx, boolean checkedFy,
                                 boolean checkedMoment, List<String> missing, boolean balanced, String note) {

    /** Claimed reactions must balance the loads to within 0.5% (common practice). */
    public static final double DEFAULT_TOLERANCE = 0.005;

    /** Checks every combination or load case named by some reaction claim. */
    public static List<ClaimedEquilibrium> check(Model model, Map<String, Map<String, Double>> combos, double tolerance) {
        Map<String, Map<String, Map<Quantity, Double>>> claimed = new LinkedHashMap<>(); // combo -> node -> component -> value
        for (ClaimSet cs : model.claims()) {
            for (Claim c : cs.claims()) {
                if (c.item() != Claim.Kind.REACTION) continue;
                claimed.computeIfAbsent(c.combo(), k -> new LinkedHashMap<>())
                        .computeIfAbsent(c.name(), k -> new LinkedHashMap<>()).put(c.quantity(), c.valueInternal());
            }
        }
        List<ClaimedEquilibrium> out = new ArrayList<>();
        if (model.supports().isEmpty()) return out;
        Support first = model.supports().values().iterator().next();
        Node ref = model.node(first.node());
        double lc = model.extentM();
        for (var e : claimed.entrySet()) {
            Map<String, Double> factors = combos.get(e.getKey());
            if (factors == null) {
                out.add(new ClaimedEquilibrium(e.getKey(), ref.name(), 0, 0, 0, 0, 0, 0, false, false, false, List.of(), true,
                        "not checked: " + e.getKey() + " is an envelope, not one set of loads"));
                continue;
            }
            boolean pattern = factors.keySet().stream().map(model::loadCase).anyMatch(LoadCase::pattern);
            if (pattern) {
                out.add(new ClaimedEquilibrium(e.getKey(), ref.name(), 0, 0, 0, 0, 0, 0, false, false, false, List.of(), true,
                        "not checked: it holds a pattern-loaded case, whose reactions are envelope values of different arrangements"));
                continue;
            }
            AppliedLoads loads = AppliedLoads.of(model, factors, ref.xM(), ref.yM());
            double sx = loads.fxN(), sy = loads.fyN(), sm = loads.momentNm();
            boolean okX = true, okY = true, okM = true;
            List<String> missing = new ArrayList<>();
            double claimedMag = 0;
            for (Support s : model.supports().values()) {
                Map<Quantity, Double> r = e.getValue().getOrDefault(s.node(), Map.of());
                Node n = model.node(s.node());
                boolean[] can = globalComponents(s);
                Quantity[] components = {Quantity.FX, Quantity.FY, Quantity.MZ};
                for (int d = 0; d < 3; d++) {
                    if (can[d] && !r.containsKey(components[d])) {
                        missing.add(s.node() + "." + components[d].symbol);
                        if (d == 0) okX = false;
                        if (d == 1) okY = false;
                        okM = false;
                    }
                }
                double fx = r.getOrDefault(Quantity.FX, 0.0), fy = r.getOrDefault(Quantity.FY, 0.0), mz = r.getOrDefault(Quantity.MZ, 0.0);
                sx += fx;
                sy += fy;
                sm += (n.xM() - ref.xM()) * fy - (n.yM() - ref.yM()) * fx + mz;
                claimedMag += Math.hypot(fx, fy);
            }
            double scale = loads.magnitudeN() > 0 ? loads.magnitudeN() : Math.max(claimedMag, 1e-30);
            double rx = Math.abs(sx) / scale, ry = Math.abs(sy) / scale, rm = Math.abs(sm) / (scale * lc);
            boolean balanced = (!okX || rx <= tolerance) && (!okY || ry <= tolerance) && (!okM || rm <= tolerance);
            String note = missing.isEmpty() ? "" : "not claimed: " + String.join(", ", missing)
                    + (okX || okY ? "; the " + (okX && okY ? "x and y sums were" : okX ? "x sum was" : "y sum was") + " checked"
                    : "; no sum could be checked");
            out.add(new ClaimedEquilibrium(e.getKey(), ref.name(), sx, sy, sm, rx, ry, rm, okX, okY, okM, missing,
                    balanced, note));
        }
        return out;
    }

    /** Which global components {Fx, Fy, Mz} a support can exert (an inclined restraint acts in both x and y). */
    public static boolean[] globalComponents(Support s) {
        double c = Math.cos(s.angleRad()), sn = Math.sin(s.angleRad());
        boolean x = (s.reacts(0) && Math.abs(c) > 1e-12) || (s.reacts(1) && Math.abs(sn) > 1e-12);
        boolean y = (s.reacts(0) && Math.abs(sn) > 1e-12) || (s.reacts(1) && Math.abs(c) > 1e-12);
        return new boolean[]{x, y, s.reacts(2)};
    }

    /** The factors of every combination and of every load case on its own. */
    public static Map<String, Map<String, Double>> factorsByName(Model model, List<Combination> combinations) {
        Map<String, Map<String, Double>> out = new LinkedHashMap<>();
        for (LoadCase c : model.loadCases()) out.put(c.name(), Map.of(c.name(), 1.0));
        for (Combination c : combinations) out.put(c.name(), c.factors());
        return out;
    }
}
