package plumbline.solve;

/**
 * Member peaks (SI) with where each occurs. Abs peaks derive from max and min; the
 * deflection is the largest magnitude of transverse displacement (>= 0).
 */
public record Peaks(Piecewise.Extreme nMax, Piecewise.Extreme nMin, Piecewise.Extreme vMax, Piecewise.Extreme vMin,
                    Piecewise.Extreme mMax, Piecewise.Extreme mMin, Piecewise.Extreme deflection) {

    /** The value of a claimable quantity (N_max ... deflection), in SI. */
    public double value(String quantity) {
        return switch (quantity) {
            case "N_max" -> nMax.value();
            case "N_min" -> nMin.value();
            case "N_abs" -> Math.max(Math.abs(nMax.value()), Math.abs(nMin.value()));
            case "V_max" -> vMax.value();
            case "V_min" -> vMin.value();
            case "V_abs" -> Math.max(Math.abs(vMax.value()), Math.abs(vMin.value()));
            case "M_max" -> mMax.value();
            case "M_min" -> mMin.value();
            case "M_abs" -> Math.max(Math.abs(mMax.value()), Math.abs(mMin.value()));
            case "deflection" -> deflection.value();
            default -> throw new IllegalArgumentException("unknown peak " + quantity);
        };
    }

    public double position(String quantity) {
        return switch (quantity) {
            case "N_max" -> nMax.xM();
            case "N_min" -> nMin.xM();
            case "N_abs" -> Math.abs(nMax.value()) >= Math.abs(nMin.value()) ? nMax.xM() : nMin.xM();
            case "V_max" -> vMax.xM();
            case "V_min" -> vMin.xM();
            case "V_abs" -> Math.abs(vMax.value()) >= Math.abs(vMin.value()) ? vMax.xM() : vMin.xM();
            case "M_max" -> mMax.xM();
            case "M_min" -> mMin.xM();
            case "M_abs" -> Math.abs(mMax.value()) >= Math.abs(mMin.value()) ? mMax.xM() : mMin.xM();
            case "deflection" -> deflection.xM();
            default -> throw new IllegalArgumentException("unknown peak " + quantity);
        };
    }
}
