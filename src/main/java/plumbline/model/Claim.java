package plumbline.model;

import plumbline.units.Dimension;

/**
 * One claimed value: a reaction component, a member peak or a node displacement under a
 * combination (or load case, or {@code envelope}). {@code valueInternal} is in SI; the
 * written value and unit are kept for the report and for the diagnosis of unit slips.
 * {@code toleranceOverride} is a relative tolerance given on the claim itself, NaN if none.
 */
public record Claim(Kind item, String name, String combo, String quantity, double valueInternal,
                    Dimension dimension, double writtenValue, String writtenUnit,
                    double toleranceOverride, SourceRef at) {

    public enum Kind {
        REACTION("reaction"), MEMBER("member"), DISPLACEMENT("displacement");
        public final String word;

        Kind(String w) {
            word = w;
        }
    }

    /** The dimension of a claimed quantity: force or moment for reactions and member forces, length or angle else. */
    public static Dimension dimensionOf(Kind kind, String quantity) {
        if (kind == Kind.REACTION) return quantity.equals("Mz") ? Dimension.MOMENT : Dimension.FORCE;
        if (kind == Kind.DISPLACEMENT) return quantity.equals("rz") ? Dimension.ANGLE : Dimension.LENGTH;
        if (quantity.equals("deflection")) return Dimension.LENGTH;
        return quantity.startsWith("M") ? Dimension.MOMENT : Dimension.FORCE;
    }

    public String id() {
        String prefix = item == Kind.REACTION ? "R" : item == Kind.MEMBER ? "M" : "D";
        return prefix + "-" + name + "-" + combo + "-" + quantity;
    }
}
