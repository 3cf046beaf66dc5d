package plumbline.units;

/**
 * A unit: its symbol as written, its dimension, and the factor that takes a value in this
 * unit to the internal system (newton, metre, kelvin difference, radian).
 */
public record Unit(String symbol, Dimension dimension, double toInternal) {

    public Unit {
        if (!(toInternal > 0) || !Double.isFinite(toInternal)) {
            throw new IllegalArgumentException("unit factor must be positive and finite: " + symbol);
        }
    }

    public Unit times(Unit o) {
        return new Unit(symbol + "*" + o.symbol, dimension.times(o.dimension), toInternal * o.toInternal);
    }

    public Unit power(int p) {
        return new Unit(symbol + (p == 1 ? "" : "^" + p), dimension.power(p), Math.pow(toInternal, p));
    }

    public double toInternal(double value) {
        return value * toInternal;
    }

    public double fromInternal(double value) {
        return value / toInternal;
    }
}
