package plumbline.solve;

import java.util.Arrays;
import plumbline.model.Quantity;

/**
 * Member peaks (SI) with where each occurs. Abs peaks derive from max and min; the
 * deflection is the largest magnitude of transverse displacement (>= 0).
 *
 * <p>Held as fourteen numbers (each peak's value and place) rather than seven objects: a
 * large check keeps the peaks of every member in every load set of both engines, and the
 * collector copies every object that stays alive. The accessors give the same values as the
 * extremes it was made from.
 */
public final class Peaks {

    // {value, xM} of N max, N min, V max, V min, M max, M min, deflection, in that order
    private static final int N_MAX = 0, N_MIN = 2, V_MAX = 4, V_MIN = 6, M_MAX = 8, M_MIN = 10, DEFLECTION = 12;
    private final double[] valueAndPlace = new double[14];

    public Peaks(Piecewise.Extreme nMax, Piecewise.Extreme nMin, Piecewise.Extreme vMax, Piecewise.Extreme vMin,
                 Piecewise.Extreme mMax, Piecewise.Extreme mMin, Piecewise.Extreme deflection) {
        Piecewise.Extreme[] all = {nMax, nMin, vMax, vMin, mMax, mMin, deflection};
        for (int k = 0; k < all.length; k++) {
            valueAndPlace[2 * k] = all[k].value();
            valueAndPlace[2 * k + 1] = all[k].xM();
        }
    }

    public Piecewise.Extreme nMax() {
        return extremeAt(N_MAX);
    }

    public Piecewise.Extreme nMin() {
        return extremeAt(N_MIN);
    }

    public Piecewise.Extreme vMax() {
        return extremeAt(V_MAX);
    }

    public Piecewise.Extreme vMin() {
        return extremeAt(V_MIN);
    }

    public Piecewise.Extreme mMax() {
        return extremeAt(M_MAX);
    }

    public Piecewise.Extreme mMin() {
        return extremeAt(M_MIN);
    }

    public Piecewise.Extreme deflection() {
        return extremeAt(DEFLECTION);
    }

    private Piecewise.Extreme extremeAt(int at) {
        return new Piecewise.Extreme(valueAndPlace[at], valueAndPlace[at + 1]);
    }

    /** The peak a member quantity names (N_max ... deflection), in SI. */
    public double value(Quantity q) {
        double v = valueAndPlace[slot(q)];
        return q.extreme == Quantity.Extreme.ABS ? Math.abs(v) : v;
    }

    /** Where along the member (m from its start) that peak occurs; for an abs peak, where the larger magnitude is. */
    public double position(Quantity q) {
        return valueAndPlace[slot(q) + 1];
    }

    /** Where the quantity's peak is held: its value there, its place next. */
    private int slot(Quantity q) {
        if (q.function == null) throw new IllegalArgumentException(q.symbol + " is not a member peak");
        if (q.function == Quantity.Function.DEFLECTION) return DEFLECTION;
        int max = switch (q.function) {
            case N -> N_MAX;
            case V -> V_MAX;
            default -> M_MAX;
        };
        int min = max + 2;
        return switch (q.extreme) {
            case MAX -> max;
            case MIN -> min;
            // the larger magnitude; a tie goes to the maximum
            case ABS -> Math.abs(valueAndPlace[max]) >= Math.abs(valueAndPlace[min]) ? max : min;
        };
    }

    /** Equal when every peak and every place is the same number (as the record it replaces compared them). */
    @Override
    public boolean equals(Object o) {
        if (this == o) return true;
        if (!(o instanceof Peaks p)) return false;
        for (int i = 0; i < valueAndPlace.length; i++) {
            if (Double.compare(valueAndPlace[i], p.valueAndPlace[i]) != 0) return false;
        }
        return true;
    }

    @Override
    public int hashCode() {
        return Arrays.hashCode(valueAndPlace);
    }

    @Override
    public String toString() {
        return "Peaks[nMax=" + nMax() + ", nMin=" + nMin() + ", vMax=" + vMax() + ", vMin=" + vMin() + ", mMax=" + mMax()
                + ", mMin=" + mMin() + ", deflection=" + deflection() + "]";
    }
}
