package plumbline.model;

import java.util.ArrayList;
import java.util.List;

/**
 * The sign conventions of the source a set of claims was copied from (format reference
 * section 4.1). The tool's own: reactions are forces on the structure, moments sagging-positive,
 * axial forces tension-positive. A claim written in another convention is turned into the
 * tool's before it is compared: a reaction on the support is minus the reaction on the
 * structure (every component, Mz included); a hogging-positive M_max is the tool's -M_min
 * (and M_min its -M_max); likewise compression-positive N. Magnitudes (M_abs, N_abs, the
 * deflection) and shears are unchanged.
 */
public record Conventions(boolean reactionsOnSupport, boolean momentHogging, boolean axialCompression) {

    public static final Conventions TOOL = new Conventions(false, false, false);

    /** The words of the conventions that differ from the tool's, e.g. "moments hogging-positive"; "" for none. */
    public String describe() {
        List<String> out = new ArrayList<>();
        if (reactionsOnSupport) out.add("reactions on the supports");
        if (momentHogging) out.add("moments hogging-positive");
        if (axialCompression) out.add("axial forces compression-positive");
        return String.join(", ", out);
    }

    /** The convention words that apply to a claim of {@code q} ("" when the tool's convention holds for it). */
    public String applying(Quantity q) {
        if (q.item == Claim.Kind.REACTION && reactionsOnSupport) return "reactions on the supports";
        if (q.function == Quantity.Function.M && q.extreme != Quantity.Extreme.ABS && momentHogging) return "moments hogging-positive";
        if (q.function == Quantity.Function.N && q.extreme != Quantity.Extreme.ABS && axialCompression) return "axial forces compression-positive";
        return "";
    }

    /** The quantity a claim of {@code q} in this convention is, in the tool's (M_max hogging-positive is -M_min). */
    public Quantity toolQuantity(Quantity q) {
        return applying(q).isEmpty() ? q : q.otherExtreme(); // a bound on the support is the other bound on the structure
    }

    /** The sign a claimed value takes in the tool's convention: -1 where the convention differs for it. */
    public double toolSign(Quantity q) {
        return applying(q).isEmpty() ? 1 : -1;
    }
}
