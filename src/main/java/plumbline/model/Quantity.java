package plumbline.model;

import java.util.ArrayList;
import java.util.List;
import plumbline.units.Dimension;

/**
 * What a claim measures, with its dimension: a reaction component (on the structure, global
 * axes) or its upper or lower bound over pattern arrangements or an envelope's combinations,
 * a member peak, or a node displacement. A member peak is taken along the whole member
 * of one function (axial force N, shear V, moment M, or the deflection) and is its most positive
 * value (max), its most negative (min) or its largest magnitude (abs); the deflection is always a
 * magnitude. The symbol is what files, reports and the results JSON write.
 */
public enum Quantity {
    FX("Fx", Claim.Kind.REACTION, Dimension.FORCE, null, null, 0),
    FY("Fy", Claim.Kind.REACTION, Dimension.FORCE, null, null, 1),
    MZ("Mz", Claim.Kind.REACTION, Dimension.MOMENT, null, null, 2),
    FX_MAX("Fx_max", Claim.Kind.REACTION, Dimension.FORCE, null, Extreme.MAX, 0),
    FX_MIN("Fx_min", Claim.Kind.REACTION, Dimension.FORCE, null, Extreme.MIN, 0),
    FY_MAX("Fy_max", Claim.Kind.REACTION, Dimension.FORCE, null, Extreme.MAX, 1),
    FY_MIN("Fy_min", Claim.Kind.REACTION, Dimension.FORCE, null, Extreme.MIN, 1),
    MZ_MAX("Mz_max", Claim.Kind.REACTION, Dimension.MOMENT, null, Extreme.MAX, 2),
    MZ_MIN("Mz_min", Claim.Kind.REACTION, Dimension.MOMENT, null, Extreme.MIN, 2),
    N_MAX("N_max", Claim.Kind.MEMBER, Dimension.FORCE, Function.N, Extreme.MAX, -1),
    N_MIN("N_min", Claim.Kind.MEMBER, Dimension.FORCE, Function.N, Extreme.MIN, -1),
    N_ABS("N_abs", Claim.Kind.MEMBER, Dimension.FORCE, Function.N, Extreme.ABS, -1),
    V_MAX("V_max", Claim.Kind.MEMBER, Dimension.FORCE, Function.V, Extreme.MAX, -1),
    V_MIN("V_min", Claim.Kind.MEMBER, Dimension.FORCE, Function.V, Extreme.MIN, -1),
    V_ABS("V_abs", Claim.Kind.MEMBER, Dimension.FORCE, Function.V, Extreme.ABS, -1),
    M_MAX("M_max", Claim.Kind.MEMBER, Dimension.MOMENT, Function.M, Extreme.MAX, -1),
    M_MIN("M_min", Claim.Kind.MEMBER, Dimension.MOMENT, Function.M, Extreme.MIN, -1),
    M_ABS("M_abs", Claim.Kind.MEMBER, Dimension.MOMENT, Function.M, Extreme.ABS, -1),
    DEFLECTION("deflection", Claim.Kind.MEMBER, Dimension.LENGTH, Function.DEFLECTION, Extreme.ABS, -1),
    N_START("N_start", Claim.Kind.MEMBER, Dimension.FORCE, Function.N, Place.START),
    N_END("N_end", Claim.Kind.MEMBER, Dimension.FORCE, Function.N, Place.END),
    V_START("V_start", Claim.Kind.MEMBER, Dimension.FORCE, Function.V, Place.START),
    V_END("V_end", Claim.Kind.MEMBER, Dimension.FORCE, Function.V, Place.END),
    M_START("M_start", Claim.Kind.MEMBER, Dimension.MOMENT, Function.M, Place.START),
    M_END("M_end", Claim.Kind.MEMBER, Dimension.MOMENT, Function.M, Place.END),
    N_AT("N", Claim.Kind.MEMBER, Dimension.FORCE, Function.N, Place.AT),
    V_AT("V", Claim.Kind.MEMBER, Dimension.FORCE, Function.V, Place.AT),
    M_AT("M", Claim.Kind.MEMBER, Dimension.MOMENT, Function.M, Place.AT),
    /** The deflection at a position, signed along the member's local y (written "deflection" with at). */
    DEFLECTION_AT("deflection", Claim.Kind.MEMBER, Dimension.LENGTH, Function.DEFLECTION, Place.AT),
    UX("ux", Claim.Kind.DISPLACEMENT, Dimension.LENGTH, null, null, 0),
    UY("uy", Claim.Kind.DISPLACEMENT, Dimension.LENGTH, null, null, 1),
    RZ("rz", Claim.Kind.DISPLACEMENT, Dimension.ANGLE, null, null, 2);

    /** The function along a member a peak is taken of. */
    public enum Function { N, V, M, DEFLECTION }

    /** Which extreme of it: the most positive, the most negative, or the largest magnitude. */
    public enum Extreme { MAX, MIN, ABS }

    /**
     * Where along a member a member quantity is taken: its peak over the whole member, its
     * value at the start or at the end, or at a position the claim gives ({@code at}).
     */
    public enum Place { PEAK, START, END, AT }

    /** values() copies its array on every call; the lookups below run once per claim and member, so they share one. */
    private static final Quantity[] ALL = values();

    public final String symbol;
    public final Claim.Kind item;
    public final Dimension dimension;
    /** For a member peak, the function and the extreme; null otherwise. */
    public final Function function;
    public final Extreme extreme;
    /** For a reaction or a displacement, the component {x, y, rotation} = {0, 1, 2}; -1 for a peak. */
    public final int component;
    /** For a member quantity, where along the member; null otherwise. */
    public final Place place;

    Quantity(String symbol, Claim.Kind item, Dimension dimension, Function function, Extreme extreme, int component) {
        this.symbol = symbol;
        this.item = item;
        this.dimension = dimension;
        this.function = function;
        this.extreme = extreme;
        this.component = component;
        this.place = item == Claim.Kind.MEMBER ? Place.PEAK : null;
    }

    /** A member's value at one place (an end, or a position): no extreme. */
    Quantity(String symbol, Claim.Kind item, Dimension dimension, Function function, Place place) {
        this.symbol = symbol;
        this.item = item;
        this.dimension = dimension;
        this.function = function;
        this.extreme = null;
        this.component = -1;
        this.place = place;
    }

    /** A member peak (over the whole member), as opposed to a value at an end or a position. */
    public boolean isPeak() {
        return place == Place.PEAK;
    }

    /** The member peaks, in the order of the format (what the results list per member). */
    public static List<Quantity> peaks() {
        List<Quantity> out = new ArrayList<>();
        for (Quantity q : ALL) if (q.isPeak()) out.add(q);
        return out;
    }

    /** The quantities a claim of this kind may name, in the order of the format. */
    public static List<Quantity> of(Claim.Kind item) {
        List<Quantity> out = new ArrayList<>();
        for (Quantity q : ALL) if (q.item == item) out.add(q);
        return out;
    }

    /** The quantity of this kind written {@code symbol}, or null when there is none. */
    public static Quantity of(Claim.Kind item, String symbol) {
        for (Quantity q : ALL) if (q.item == item && q.symbol.equals(symbol)) return q;
        return null;
    }

    /** The symbols of a kind's quantities, in order. */
    public static List<String> symbols(Claim.Kind item) {
        return of(item).stream().map(q -> q.symbol).distinct().toList();
    }

    /** The other extreme of the same function (M_min for M_max); a magnitude or a component is its own. */
    public Quantity otherExtreme() {
        if (extreme == null || extreme == Extreme.ABS) return this;
        for (Quantity q : ALL) {
            if (q.item == item && q.function == function && q.component == component && q.extreme != null
                    && q.extreme != extreme && q.extreme != Extreme.ABS) {
                return q;
            }
        }
        throw new IllegalStateException(symbol);
    }

    /** A reaction's upper or lower value (under pattern loading or an envelope) rather than the value itself. */
    public boolean isBound() {
        return item == Claim.Kind.REACTION && extreme != null;
    }

    /** The largest magnitude of the same function (M_abs for M_max); the deflection is its own. */
    public Quantity magnitude() {
        for (Quantity q : ALL) if (q.function == function && q.extreme == Extreme.ABS && function != null) return q;
        throw new IllegalStateException(symbol + " is not a member peak");
    }

    @Override
    public String toString() {
        return symbol;
    }
}
