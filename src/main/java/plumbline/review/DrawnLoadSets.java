package plumbline.review;

import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Set;
import plumbline.model.LimitState;
import plumbline.model.Quantity;

/**
 * Which load sets the report draws diagrams for, chosen once for the PDF and the figure
 * files alike: the load sets of flagged claims first, then those that govern envelope
 * claims, then those of the other claims; with no claims, the combination (else load
 * case) with the largest bending moment. At most {@link #AT_MOST} are drawn.
 */
public final class DrawnLoadSets {

    /** The number of load sets drawn. */
    public static final int AT_MOST = 2;

    private DrawnLoadSets() {
    }

    public static List<String> choose(Review review) {
        Analysis a = review.analysis();
        Set<String> out = new LinkedHashSet<>();
        for (ClaimResult c : review.claims()) if (c.status() != ClaimResult.Status.OK && !LimitState.isEnvelope(c.claim().combo())) out.add(c.claim().combo());
        for (ClaimResult c : review.claims()) if (LimitState.isEnvelope(c.claim().combo()) && c.governing() != null) out.add(c.governing().split(" with ")[0]);
        for (ClaimResult c : review.claims()) if (!LimitState.isEnvelope(c.claim().combo())) out.add(c.claim().combo());
        if (a.stable() && out.isEmpty()) {
            String best = null;
            double bestM = -1;
            for (LoadSet s : a.loadSets()) {
                double mm = 0;
                for (var ms : a.solutions().get(a.primaryEngine()).get(s.name()).representative().members().values()) {
                    mm = Math.max(mm, ms.peaks().value(Quantity.M_ABS));
                }
                boolean preferred = best == null || (s.combination() && !isCombination(a, best)) || (s.combination() == isCombination(a, best) && mm > bestM);
                if (preferred) {
                    bestM = mm;
                    best = s.name();
                }
            }
            if (best != null) out.add(best);
        }
        List<String> l = new ArrayList<>(out);
        return l.subList(0, Math.min(AT_MOST, l.size()));
    }

    private static boolean isCombination(Analysis a, String name) {
        return a.loadSets().stream().anyMatch(s -> s.name().equals(name) && s.combination());
    }
}
