package plumbline.review;

/**
 * The verdict of a run (format reference (src/site/markdown/formats.md) section 5), most severe first. A run whose own safeguards
 * fail (the model cannot carry load, the two methods disagree, a solution is out of
 * equilibrium) says so before anything about the claims: none of its numbers can be
 * vouched for. A run with no claims is never "ok": nothing was compared.
 */
public enum Verdict {
    /** The model is a mechanism (statics or an engine found it cannot carry load). */
    UNSTABLE("unstable", true),
    /** The force and stiffness methods differ beyond {@link Agreement#TOLERANCE}. */
    ENGINES_DISAGREE("engines-disagree", true),
    /** A solution fails the equilibrium check beyond {@link plumbline.solve.Equilibrium#TOLERANCE}. */
    UNBALANCED("unbalanced", true),
    /** Some claim is outside twice its tolerance. */
    MISMATCH("mismatch", true),
    /** Some claim is within twice its tolerance but not within it, or the claimed reactions do not balance the load. */
    MARGINAL("marginal", true),
    /** Nothing was claimed: the model was solved, not checked. */
    NO_CLAIMS("no-claims", false),
    /** Every claim agrees within its tolerance, and the safeguards hold. */
    OK("ok", false);

    /** The word written in the JSON {@code verdict} and, in capitals, on the console and the report. */
    public final String word;
    /** True when the run exits 1: something the checker must look at. */
    public final boolean flagged;

    Verdict(String word, boolean flagged) {
        this.word = word;
        this.flagged = flagged;
    }

    /** What the verdict means, in one sentence for the console and page 1 of the report. */
    public String meaning() {
        return switch (this) {
            case UNSTABLE -> "the model cannot carry its loads (a mechanism); no claim was compared.";
            case ENGINES_DISAGREE -> "the force and stiffness methods give different results; no number of this run "
                    + "can be vouched for, whatever the claims show.";
            case UNBALANCED -> "a computed solution is not in equilibrium with the applied loads; no number of this run "
                    + "can be vouched for, whatever the claims show.";
            case MISMATCH -> "at least one claim differs from the computed value by more than twice its tolerance.";
            case MARGINAL -> "no claim is beyond twice its tolerance, but some are beyond it, or the claimed reactions "
                    + "do not balance the load.";
            case NO_CLAIMS -> "nothing was claimed: the model was solved and checked, but no claim was compared.";
            case OK -> "every claim agrees with the computed value within its tolerance.";
        };
    }
}
