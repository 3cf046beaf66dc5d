package plumbline.review;

import plumbline.model.Claim;

/**
 * One claim compared: the computed value by each engine (SI; NaN where an engine did not
 * run), the difference relative to the computed value, the tolerance that applied and
 * why, the status, where the envelope governed, and the diagnosis (null if none): the
 * explanation of the claim set that covers this claim ({@code explanation}, 1-based in
 * {@link Review#explanations()}, 0 when none does) followed by what this claim alone
 * suggests ({@code ownDiagnosis}, null when nothing does).
 */
public record ClaimResult(Claim claim, String claimsFile, double computed, double computedForce,
                          double relativeDifference, TolerancePolicy.Applied tolerance, double absoluteFloor,
                          Status status, String governing, String diagnosis, int explanation, String ownDiagnosis) {

    public enum Status {
        OK("ok"), MARGINAL("marginal"), MISMATCH("mismatch");
        public final String word;

        Status(String w) {
            word = w;
        }
    }
}
