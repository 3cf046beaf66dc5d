package plumbline.review;

import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Set;
import plumbline.model.LimitState;
import plumbline.model.Quantity;

/**
 * Which load sets the report draws diagrams for, chosen once for the PDF and the figure
 * files alike: every load set with a flagged claim (for a flagged envelope claim, the
 * load set that governs it), up to {@link #FLAGGED_LIMIT}; with nothing flagged, the load
 * sets that govern envelope claims and those of the other claims, up to {@link #AT_MOST};
 * with no claims, the combination (else load case) with the largest bending moment. The
 * choice says why, and names what it leaves out.
 */
public final class DrawnLoadSets {

    /** The number of load sets drawn when no claim is flagged. */
    public static final int AT_MOST = 2;
    /** The number of flagged load sets drawn at most (each takes about a page). */
    public static final int FLAGGED_LIMIT = 20;

    /** The load sets to draw, and a phrase saying why (for "drawn for ..."). */
    public record Choice(List<String> names, String why) {
        public Choice {
            names = List.copyOf(names);
        }
    }

    private DrawnLoadSets() {
    }

    private static String governingSet(ClaimResult c) {
        return c.governing().split(" with ")[0];
    }

    public static Choice choose(Review review) {
        Analysis a = review.analysis();
        Set<String> flagged = new LinkedHashSet<>();
        for (ClaimResult c : review.claims()) {
            if (c.status() == ClaimResult.Status.OK) continue;
            if (!LimitState.isEnvelope(c.claim().combo())) flagged.add(c.claim().combo());
            else if (c.governing() != null) flagged.add(governingSet(c));
        }
        if (!flagged.isEmpty()) {
            List<String> l = new ArrayList<>(flagged);
            List<String> drawn = l.subList(0, Math.min(FLAGGED_LIMIT, l.size()));
            String why = l.size() == 1 ? "the load set with a flagged claim, " + l.get(0)
                    : drawn.size() == l.size() ? "every load set with a flagged claim (" + l.size() + ": " + String.join(", ", l) + ")"
                    : "the first " + drawn.size() + " of the " + l.size() + " load sets with a flagged claim; not drawn: "
                    + String.join(", ", l.subList(drawn.size(), l.size())) + " (see the tables and the JSON)";
            return new Choice(drawn, why);
        }
        Set<String> out = new LinkedHashSet<>();
        for (ClaimResult c : review.claims()) if (LimitState.isEnvelope(c.claim().combo()) && c.governing() != null) out.add(governingSet(c));
        for (ClaimResult c : review.claims()) if (!LimitState.isEnvelope(c.claim().combo())) out.add(c.claim().combo());
        if (!out.isEmpty()) {
            List<String> l = new ArrayList<>(out);
            List<String> drawn = l.subList(0, Math.min(AT_MOST, l.size()));
            return new Choice(drawn, "the load sets of the claims (none flagged): " + String.join(", ", drawn)
                    + (drawn.size() < l.size() ? "; not drawn: " + String.join(", ", l.subList(drawn.size(), l.size())) : ""));
        }
        if (!a.stable()) return new Choice(List.of(), "no load set (the model is unstable)");
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
        return best == null ? new Choice(List.of(), "no load set (the model has none)")
                : new Choice(List.of(best), "the " + (isCombination(a, best) ? "combination" : "load case") + " with the largest "
                + "bending moment, " + best + " (no claims were given)");
    }

    private static boolean isCombination(Analysis a, String name) {
        return a.loadSets().stream().anyMatch(s -> s.name().equals(name) && s.combination());
    }
}
