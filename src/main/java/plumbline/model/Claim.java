package plumbline.model;

import plumbline.units.Dimension;

/**
 * One claimed value: a reaction component, a member peak or a node displacement under a
 * combination (or load case, or {@code envelope}). {@code valueInternal} is in SI; the
 * written value and unit are kept for the report and for the diagnosis of unit slips.
 * {@code toleranceOverride} is a relative tolerance given on the claim itself, NaN if none.
 * {@code quantity} and {@code valueInternal} are in the tool's sign convention; a claim copied
 * from a source with another ({@link Conventions}) keeps what it was written as in
 * {@code writtenQuantity}, {@code writtenValue} and {@code convention} (its words, "" when the
 * tool's convention held).
 */
public record Claim(Kind item, String name, String combo, Quantity quantity, double valueInternal,
                    double writtenValue, String writtenUnit, double toleranceOverride, SourceRef at,
                    Quantity writtenQuantity, String convention, double atM) {

    /** A claim written in the tool's own sign convention, of a quantity that needs no position. */
    public Claim(Kind item, String name, String combo, Quantity quantity, double valueInternal, double writtenValue,
                 String writtenUnit, double toleranceOverride, SourceRef at) {
        this(item, name, combo, quantity, valueInternal, writtenValue, writtenUnit, toleranceOverride, at, quantity, "", Double.NaN);
    }

    /**
     * The claim as the source gave it, turned into the tool's sign convention ({@code value} in SI, as written);
     * {@code atM} the position along the member for a value at a position (NaN otherwise).
     */
    public static Claim inConvention(Conventions k, Kind item, String name, String combo, Quantity written, double siAsWritten,
                                     double writtenValue, String writtenUnit, double toleranceOverride, SourceRef at, double atM) {
        return new Claim(item, name, combo, k.toolQuantity(written), k.toolSign(written) * siAsWritten, writtenValue, writtenUnit,
                toleranceOverride, at, written, k.applying(written), atM);
    }

    /** The same claim read against another place, load set or quantity (for the diagnosis's what-ifs). */
    public Claim retarget(String otherName, String otherCombo, Quantity otherQuantity) {
        return new Claim(item, otherName, otherCombo, otherQuantity, valueInternal, writtenValue, writtenUnit, toleranceOverride, at,
                otherQuantity, convention, atM);
    }

    public enum Kind {
        REACTION("reaction"), MEMBER("member"), DISPLACEMENT("displacement");
        public final String word;

        Kind(String w) {
            word = w;
        }
    }

    /** Force, moment, length or angle: the dimension of what is claimed. */
    public Dimension dimension() {
        return quantity.dimension;
    }

    public String id() {
        String prefix = item == Kind.REACTION ? "R" : item == Kind.MEMBER ? "M" : "D";
        return prefix + "-" + name + "-" + combo + "-" + writtenQuantity + (Double.isNaN(atM) ? "" : "@" + (float) atM);
    }
}
