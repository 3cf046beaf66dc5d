package plumbline.solve;

import java.util.Arrays;

/**
 * A real polynomial c0 + c1 t + c2 t^2 + ... in a local coordinate t (a segment's own
 * origin keeps the coefficients well conditioned). Immutable.
 */
public final class Poly {

    public static final Poly ZERO = new Poly(new double[]{0.0});

    private final double[] c;

    public Poly(double... coefficients) {
        this(coefficients, false);
    }

    /**
     * The polynomial of these coefficients, trailing zeros left out. An array formed by an
     * operation here ({@code owned}) is kept as it is when it has none (every member function's
     * arithmetic forms new polynomials, millions in a large model); a caller's array is copied.
     */
    private Poly(double[] coefficients, boolean owned) {
        int n = coefficients.length;
        while (n > 1 && coefficients[n - 1] == 0.0) n--;
        this.c = owned && n == coefficients.length && n > 0 ? coefficients : Arrays.copyOf(coefficients, Math.max(n, 1));
    }

    public int degree() {
        return c.length - 1;
    }

    public double coefficient(int k) {
        return k < c.length ? c[k] : 0.0;
    }

    /**
     * The value at t by Horner's rule, v = (...(0 t + c_n) t + ... ) t + c_0. The degrees a member's
     * functions have (up to 4) are written out: the same operations in the same order, so the
     * same bits (the zero first, too: it turns a leading -0.0 into 0.0 as the loop does), at half
     * the cost of the loop in the quick compiler's code; the peaks' root finding evaluates
     * millions of them.
     */
    public double at(double t) {
        double[] k = c;
        return switch (k.length) {
            case 1 -> 0 * t + k[0];
            case 2 -> (0 * t + k[1]) * t + k[0];
            case 3 -> ((0 * t + k[2]) * t + k[1]) * t + k[0];
            case 4 -> (((0 * t + k[3]) * t + k[2]) * t + k[1]) * t + k[0];
            case 5 -> ((((0 * t + k[4]) * t + k[3]) * t + k[2]) * t + k[1]) * t + k[0];
            default -> horner(t);
        };
    }

    private double horner(double t) {
        double v = 0;
        for (int k = c.length - 1; k >= 0; k--) v = v * t + c[k];
        return v;
    }

    public Poly plus(Poly o) {
        double[] r = new double[Math.max(c.length, o.c.length)];
        for (int k = 0; k < r.length; k++) r[k] = coefficient(k) + o.coefficient(k);
        return new Poly(r, true);
    }

    public Poly times(double s) {
        double[] r = c.clone();
        for (int k = 0; k < r.length; k++) r[k] *= s;
        return new Poly(r, true);
    }

    public Poly times(Poly o) {
        double[] r = new double[c.length + o.c.length - 1];
        for (int i = 0; i < c.length; i++) for (int j = 0; j < o.c.length; j++) r[i + j] += c[i] * o.c[j];
        return new Poly(r, true);
    }

    /** The antiderivative that is {@code value0} at t = 0. */
    public Poly integral(double value0) {
        double[] r = new double[c.length + 1];
        r[0] = value0;
        for (int k = 0; k < c.length; k++) r[k + 1] = c[k] / (k + 1);
        return new Poly(r, true);
    }

    public Poly derivative() {
        if (c.length == 1) return ZERO;
        double[] r = new double[c.length - 1];
        for (int k = 1; k < c.length; k++) r[k - 1] = c[k] * k;
        return new Poly(r, true);
    }

    /** The same polynomial written in s = t - shift (a Taylor shift). */
    public Poly shifted(double shift) {
        double[] r = c.clone();
        int n = r.length;
        for (int i = 0; i < n; i++) for (int k = n - 2; k >= i; k--) r[k] += shift * r[k + 1];
        return new Poly(r, true);
    }

    /** Exact integral over [0, h]. */
    public double integrate(double h) {
        return integral(0.0).at(h);
    }

    /**
     * The real roots in the open interval (0, h), found by isolating them between the
     * roots of the derivative (on each monotone piece there is at most one) and narrowing
     * each to machine precision: to two neighbouring doubles between which the computed
     * value changes sign (their midpoint, which rounds to one of them, is returned), or to a
     * double where it is zero.
     */
    public double[] rootsIn(double h) {
        if (degree() == 0) return new double[0];
        if (degree() == 1) {
            double t = -c[0] / c[1];
            return t > 0 && t < h ? new double[]{t} : new double[0];
        }
        double[] crit = derivative().rootsIn(h);
        double[] pts = new double[crit.length + 2];
        pts[0] = 0;
        System.arraycopy(crit, 0, pts, 1, crit.length);
        pts[pts.length - 1] = h;
        double[] out = new double[pts.length];
        int n = 0;
        for (int i = 0; i + 1 < pts.length; i++) {
            double a = pts[i], b = pts[i + 1], fa = at(a), fb = at(b);
            if (fa == 0 && a > 0) {
                if (n == 0 || out[n - 1] != a) out[n++] = a;
                continue;
            }
            if (fa * fb >= 0) continue;
            // False position with the Illinois rule (M. Dowell and P. Jarratt, BIT 11, 1971; from
            // memory): the next point is where the chord through the ends' weighted values crosses
            // zero, and an end kept twice in a row has its weight halved, so that both ends close in
            // (about 13 values a root in trials on polynomials of degree 1 to 4, bisection's 55). A
            // point that does not fall strictly inside (a, b) (the ends are neighbouring doubles, or
            // rounding put it on an end) is the midpoint instead.
            double wa = fa, wb = fb;  // the ends' weights: their values, halved while the other end moves
            int kept = 0;             // the end the last step kept: -1 a, +1 b
            for (int it = 0; it < 200; it++) {
                double mid = 0.5 * (a + b);
                if (mid <= a || mid >= b) break;
                double x = (wb * a - wa * b) / (wb - wa);
                if (!(x > a && x < b)) x = mid;
                double fx = at(x);
                if (fx == 0) {
                    a = b = x;
                    break;
                }
                if ((fx < 0) == (fa < 0)) {
                    a = x;
                    fa = wa = fx;
                    if (kept == 1) wb *= 0.5;
                    kept = 1;
                } else {
                    b = x;
                    wb = fx;
                    if (kept == -1) wa *= 0.5;
                    kept = -1;
                }
            }
            double r = 0.5 * (a + b);
            if (r > 0 && r < h) out[n++] = r;
        }
        return Arrays.copyOf(out, n);
    }

    @Override
    public String toString() {
        return Arrays.toString(c);
    }
}
