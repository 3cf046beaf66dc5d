package plumbline.units;

/**
 * The units of every bare number in a file (format reference (src/site/markdown/formats.md) section 1): a force unit and a length
 * unit, carried to derived dimensions. Bare angles and rotations are in radians (a
 * support's {@code angle} alone reads a bare number as degrees), bare temperatures in degC.
 */
public record UnitSystem(Unit force, Unit length) {

    public static final UnitSystem SI_KN_M = new UnitSystem(new Unit("kN", Dimension.FORCE, 1e3),
            new Unit("m", Dimension.LENGTH, 1.0));

    public UnitSystem {
        if (!force.dimension().equals(Dimension.FORCE)) throw new IllegalArgumentException("force unit " + force.symbol());
        if (!length.dimension().equals(Dimension.LENGTH)) throw new IllegalArgumentException("length unit " + length.symbol());
    }

    /** Factor from a bare number of dimension {@code d} in this system to internal units. */
    public double factor(Dimension d) {
        return power(force.toInternal(), d.force()) * power(length.toInternal(), d.length());
    }

    /**
     * {@code Math.pow(x, n)} to the bit, without calling it for the exponents of the common
     * dimensions (force, length, moment, none): pow returns 1.0 for a zero exponent and x itself
     * for 1. A large model's results convert millions of numbers, each with a factor.
     */
    static double power(double x, int n) {
        if (n == 0) return 1.0;
        if (n == 1) return x;
        return Math.pow(x, n);
    }

    public double toInternal(double bare, Dimension d) {
        return bare * factor(d);
    }

    /** Internal value expressed as a bare number of this system (angles in radians). */
    public double fromInternal(double internal, Dimension d) {
        return internal / factor(d);
    }

    /** The written symbol of a derived dimension in this system, e.g. kN*m, kN/m. */
    public String symbol(Dimension d) {
        StringBuilder num = new StringBuilder(), den = new StringBuilder();
        part(d.force(), force.symbol(), num, den);
        part(d.length(), length.symbol(), num, den);
        if (d.angle() < 0) part(d.angle(), "rad", num, den);
        if (d.temperature() != 0) part(d.temperature(), "degC", num, den);
        String n = num.length() == 0 ? "1" : num.toString();
        if (d.equals(Dimension.NONE)) return "";
        if (d.equals(Dimension.ANGLE)) return "rad"; // a rotation on its own, not a stiffness per radian
        return den.length() == 0 ? n : n + "/" + den;
    }

    private static void part(int exp, String sym, StringBuilder num, StringBuilder den) {
        if (exp == 0) return;
        StringBuilder sb = exp > 0 ? num : den;
        if (sb.length() > 0) sb.append('*');
        sb.append(sym);
        if (Math.abs(exp) != 1) sb.append(Math.abs(exp));
    }
}
