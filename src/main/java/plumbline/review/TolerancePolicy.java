package plumbline.review;

import java.util.Map;
import plumbline.model.Claim;
import plumbline.model.ClaimSet;
import plumbline.model.Quantity;

/**
 * Which relative tolerance applies to a claim, and why. Defaults by quantity kind are
 * common practice for an independent check of a linear model: reactions 3%, member forces
 * 5%, deflections and displacements 10%. The most specific setting wins: a tolerance on
 * the claim itself, then the claims file's setting for the kind of quantity, then the
 * file's {@code default}, then the checker's {@code --tolerance} for the whole run, then the
 * built-in default for the kind. A difference beyond the tolerance but within
 * {@link #MARGINAL_FACTOR} times it is marginal; beyond that, a mismatch.
 */
public record TolerancePolicy(double commandLine) {

    public static final double REACTION_DEFAULT = 0.03;
    public static final double MEMBER_DEFAULT = 0.05;
    public static final double DEFLECTION_DEFAULT = 0.10;
    /**
     * Differences below this fraction of the largest value of the same kind in the same
     * load set are taken as agreement, so a claimed zero against rounding noise is not a
     * discrepancy (common practice).
     */
    public static final double ABSOLUTE_FLOOR_FRACTION = 0.002;
    /**
     * Displacements below this fraction of the model's extent are rounding noise, not
     * movement (1e-9 of a 10 m frame is 10 nm).
     */
    public static final double DISPLACEMENT_NOISE_FRACTION = 1e-9;
    /** Beyond the tolerance but within this multiple of it: marginal. */
    public static final double MARGINAL_FACTOR = 2.0;

    public static TolerancePolicy none() {
        return new TolerancePolicy(Double.NaN);
    }

    public record Applied(double relative, String why) {
    }

    static String kindKey(Claim c) {
        if (c.item() == Claim.Kind.REACTION) return "reaction";
        if (c.item() == Claim.Kind.DISPLACEMENT) return "displacement";
        return c.quantity() == Quantity.DEFLECTION ? "deflection" : "member";
    }

    public Applied forClaim(Claim c, ClaimSet file) {
        if (!Double.isNaN(c.toleranceOverride())) return new Applied(c.toleranceOverride(), "set on the claim");
        String key = kindKey(c);
        Map<String, Double> t = file.tolerances();
        if (t.containsKey(key)) return new Applied(t.get(key), "claims file, " + key);
        if (key.equals("displacement") && t.containsKey("deflection")) return new Applied(t.get("deflection"), "claims file, deflection");
        if (t.containsKey("default")) return new Applied(t.get("default"), "claims file, default");
        if (!Double.isNaN(commandLine)) return new Applied(commandLine, "--tolerance");
        return switch (key) {
            case "reaction" -> new Applied(REACTION_DEFAULT, "default for reactions (common practice)");
            case "member" -> new Applied(MEMBER_DEFAULT, "default for member forces (common practice)");
            default -> new Applied(DEFLECTION_DEFAULT, "default for " + key + "s (common practice)");
        };
    }
}
