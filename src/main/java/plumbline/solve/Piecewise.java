package plumbline.solve;

import java.util.Arrays;

/**
 * A function along a member, x from 0 to L (metres): one {@link Poly} per segment between
 * breakpoints, each written in its own coordinate t = x - x_k. May jump at a breakpoint
 * (shear at a point load, moment at a couple), so values are taken one-sided there.
 */
public final class Piecewise {

    private final double[] x;
    private final Poly[] pieces;

    public Piecewise(double[] breakpoints, Poly[] pieces) {
        if (breakpoints.length != pieces.length + 1) throw new IllegalArgumentException("breakpoints and pieces");
        this.x = breakpoints.clone();
        this.pieces = pieces.clone();
    }

    public int segments() {
        return pieces.length;
    }

    public double start(int k) {
        return x[k];
    }

    public double end(int k) {
        return x[k + 1];
    }

    public Poly piece(int k) {
        return pieces[k];
    }

    /** Value at x, taking the segment to the right at an interior breakpoint. */
    public double at(double xm) {
        int k = Arrays.binarySearch(x, xm);
        if (k < 0) k = -k - 2;
        k = Math.max(0, Math.min(pieces.length - 1, k));
        return pieces[k].at(xm - x[k]);
    }

    /** Value at x approached from the left (for the end of the member, the value at L). */
    public double atLeft(double xm) {
        int k = Arrays.binarySearch(x, xm);
        if (k < 0) k = -k - 2;
        else k = k - 1;
        k = Math.max(0, Math.min(pieces.length - 1, k));
        return pieces[k].at(xm - x[k]);
    }

    /** An extreme value and where it occurs. */
    public record Extreme(double value, double xM) {
    }

    /** Largest value over [0, L], one-sided limits at breakpoints included; exact. */
    public Extreme max() {
        return range()[0];
    }

    public Extreme min() {
        return range()[1];
    }

    /**
     * The largest and the smallest value over [0, L] with where each first occurs, from one
     * pass over the candidates: each piece's ends and the roots of its derivative inside it
     * (the derivative's roots are found once for both).
     */
    public Extreme[] range() {
        double hi = Double.NEGATIVE_INFINITY, lo = Double.POSITIVE_INFINITY, hiAt = 0, loAt = 0;
        for (int k = 0; k < pieces.length; k++) {
            double h = x[k + 1] - x[k];
            Poly p = pieces[k];
            double[] cand = p.degree() <= 1 ? NONE : p.derivative().rootsIn(h);
            for (int i = 0; i < cand.length + 2; i++) {
                double t = i < cand.length ? cand[i] : i == cand.length ? 0 : h;
                double v = p.at(t);
                if (v > hi) {
                    hi = v;
                    hiAt = x[k] + t;
                }
                if (v < lo) {
                    lo = v;
                    loAt = x[k] + t;
                }
            }
        }
        return new Extreme[]{new Extreme(hi, hiAt), new Extreme(lo, loAt)};
    }

    private static final double[] NONE = new double[0];

    public double[] breakpoints() {
        return x.clone();
    }
}
