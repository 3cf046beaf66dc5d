package plumbline.review;

import java.util.List;

/**
 * One change to the model or to the claims, scored on every claim at once: the flagged
 * claims it brings within their tolerance ({@code explains}), the agreeing claims it would
 * push out of theirs ({@code breaks}), and whether with it every claim agrees. Claims are
 * named by their ids; {@code flagged} is how many claims were flagged in all, so that a
 * sentence never presents a guess as a finding without saying how many claims support it.
 */
public record Explanation(String sentence, List<String> changes, List<String> explains, List<String> breaks,
                          boolean allOkAfter, int flagged, int agreeing) {

    public Explanation {
        changes = List.copyOf(changes);
        explains = List.copyOf(explains);
        breaks = List.copyOf(breaks);
    }

    /** The support for the change in words: "explains 4 of 4 flagged claims, breaks none of 3 that agree". */
    public String support() {
        String b = breaks.isEmpty() ? "breaks none" : "breaks " + breaks.size();
        return "explains " + explains.size() + " of " + flagged + " flagged claim" + (flagged == 1 ? "" : "s") + ", " + b
                + " of " + agreeing + " that agree" + (agreeing == 1 ? "s" : "") + (allOkAfter ? "; with it every claim agrees" : "");
    }
}
