package plumbline.model;

import plumbline.units.Dimension;

/**
 * One claimed value: a reaction component, a member peak or a node displacement under a
 * combination (or load case, or {@code envelope}). {@code valueInternal} is in SI; the
 * written value and unit are kept for the report and for the diagnosis of unit slips.
 * {@code toleranceOverride} is a relative tolerance given on the claim itself, NaN if none.
 */
public record Claim(Kind item, String name, String combo, Quantity quantity, double valueInternal,
                    double writtenValue, String writtenUnit, double toleranceOverride, SourceRef at) {

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
        return prefix + "-" + name + "-" + combo + "-" + quantity;
    }
}
