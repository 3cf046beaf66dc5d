package plumbline.model;

/**
 * The limit state a combination checks (format reference section 4.1): ultimate (strength;
 * the standard strength and allowable-stress sets count here) or serviceability; NONE when
 * the model does not say. {@code envelope:ULS} and {@code envelope:SLS} are the envelopes
 * over the combinations of one limit state; {@code envelope} is over all of them.
 */
public enum LimitState {
    ULS, SLS, NONE;

    /** The load-set name of the envelope over all combinations. */
    public static final String ENVELOPE = "envelope";

    /** Whether a claim's combination names an envelope (over all combinations, or those of one limit state). */
    public static boolean isEnvelope(String combo) {
        return combo.equals(ENVELOPE) || combo.equals(ENVELOPE + ":ULS") || combo.equals(ENVELOPE + ":SLS");
    }

    /** The limit state an envelope name keeps (NONE: every combination); null when the name is no envelope. */
    public static LimitState ofEnvelope(String combo) {
        if (combo.equals(ENVELOPE)) return NONE;
        if (combo.equals(ENVELOPE + ":ULS")) return ULS;
        if (combo.equals(ENVELOPE + ":SLS")) return SLS;
        return null;
    }
}
