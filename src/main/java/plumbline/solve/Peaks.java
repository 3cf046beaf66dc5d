package plumbline.solve;

import plumbline.model.Quantity;

/**
 * Member peaks (SI) with where each occurs. Abs peaks derive from max and min; the
 * deflection is the largest magnitude of transverse displacement (>= 0).
 */
public record Peaks(Piecewise.Extreme nMax, Piecewise.Extreme nMin, Piecewise.Extreme vMax, Piecewise.Extreme vMin,
                    Piecewise.Extreme mMax, Piecewise.Extreme mMin, Piecewise.Extreme deflection) {

    /** The peak a member quantity names (N_max ... deflection), in SI. */
    public double value(Quantity q) {
        Piecewise.Extreme e = extreme(q);
        return q.extreme == Quantity.Extreme.ABS ? Math.abs(e.value()) : e.value();
    }

    /** Where along the member (m from its start) that peak occurs; for an abs peak, where the larger magnitude is. */
    public double position(Quantity q) {
        return extreme(q).xM();
    }

    private Piecewise.Extreme extreme(Quantity q) {
        if (q.function == null) throw new IllegalArgumentException(q.symbol + " is not a member peak");
        if (q.function == Quantity.Function.DEFLECTION) return deflection;
        Piecewise.Extreme max = switch (q.function) {
            case N -> nMax;
            case V -> vMax;
            default -> mMax;
        };
        Piecewise.Extreme min = switch (q.function) {
            case N -> nMin;
            case V -> vMin;
            default -> mMin;
        };
        return switch (q.extreme) {
            case MAX -> max;
            case MIN -> min;
            // the larger magnitude; a tie goes to the maximum
            case ABS -> Math.abs(max.value()) >= Math.abs(min.value()) ? max : min;
        };
    }
}
