package plumbline.linalg;

import java.util.ArrayList;
import java.util.List;

/**
 * The L D L^T factorization of a symmetric {@link SkylineMatrix}, column by column (the
 * active-column scheme of K.J. Bathe, Finite Element Procedures, 1996, section 8.2.3).
 * Made once by {@link SkylineMatrix#factor()}, then only used: every right-hand side is a
 * forward and a back substitution. Immutable; a factorization that met a vanishing pivot
 * says where ({@link #singularAt()}) and refuses to solve. General numerics with no
 * structural knowledge: the stiffness engine factors K with it, statics and the sparse
 * force method factor A A^T and their compatibility matrices with it.
 */
public final class SkylineLdl {

    /**
     * A pivot below this fraction of its original diagonal means the stiffness matrix is
     * singular to working precision: the structure has a mechanism at that freedom.
     * 1e-11 leaves about five digits above double rounding for stiffness ratios of 1e6.
     */
    public static final double PIVOT_TOLERANCE = 1e-11;

    private final int n;
    private final int[] first, start;
    private final double[] a;            // L below the diagonal, D on it
    private final int singularAt;        // -1 when every pivot held (definite factorization)
    private final int[] zeroPivots;      // semi-definite factorization: the dropped pivots
    private final double smallestPivotRatio;
    private final int smallestPivotAt;

    private SkylineLdl(SkylineMatrix m, double[] a, int singularAt, int[] zeroPivots, double smallestPivotRatio,
                       int smallestPivotAt) {
        this.n = m.n;
        this.first = m.first;
        this.start = m.start;
        this.a = a;
        this.singularAt = singularAt;
        this.zeroPivots = zeroPivots;
        this.smallestPivotRatio = smallestPivotRatio;
        this.smallestPivotAt = smallestPivotAt;
    }

    /**
     * The active-column L D L^T of a copy of m. A pivot below {@code tol} of its original
     * diagonal stops a definite factorization, or, when {@code semidefinite}, is recorded and
     * dropped (later columns take nothing from its row).
     */
    static SkylineLdl of(SkylineMatrix m, double tol, boolean semidefinite) {
        int n = m.n;
        int[] first = m.first, start = m.start;
        double[] a = m.a.clone();
        List<Integer> zeros = new ArrayList<>();
        double smallest = 1;
        int smallestAt = -1;
        for (int j = 0; j < n; j++) {
            int mj = first[j], sj = start[j];
            double original = a[sj + j - mj];
            // g_ij = a_ij - sum_r l_ri d_r l_rj, stored in place of a_ij (rows above the diagonal)
            for (int i = mj + 1; i < j; i++) {
                int mi = first[i], r0 = Math.max(mi, mj);
                // the two column segments from row r0 to row i-1, summed in row order
                int pi = start[i] + r0 - mi, pj = sj + r0 - mj, end = pi + (i - r0);
                double s = 0;
                // four products a pass, added one at a time in row order: the plain loop's sum to
                // the bit, with a quarter of its loop steps (the quick compiler unrolls nothing)
                for (int end4 = end - 3; pi < end4; pi += 4, pj += 4) {
                    s += a[pi] * a[pj];
                    s += a[pi + 1] * a[pj + 1];
                    s += a[pi + 2] * a[pj + 2];
                    s += a[pi + 3] * a[pj + 3];
                }
                for (; pi < end; pi++, pj++) s += a[pi] * a[pj];
                a[sj + i - mj] -= s;
            }
            // l_ij = g_ij / d_i; d_j = a_jj - sum_i g_ij l_ij
            double d = original;
            for (int i = mj; i < j; i++) {
                double g = a[sj + i - mj];
                double l = g / a[start[i] + i - first[i]];
                a[sj + i - mj] = l;
                d -= g * l;
            }
            if (!(d > tol * Math.abs(original)) || !(original > 0)) {
                if (!semidefinite) return new SkylineLdl(m, a, j, new int[0], smallest, smallestAt);
                zeros.add(j);
                d = Double.POSITIVE_INFINITY; // 1/d = 0: the dropped row contributes nothing
            } else if (d / original < smallest) {
                smallest = d / original;
                smallestAt = j;
            }
            a[sj + j - mj] = d;
        }
        return new SkylineLdl(m, a, -1, zeros.stream().mapToInt(Integer::intValue).toArray(), smallest, smallestAt);
    }

    public int size() {
        return n;
    }

    public long storedEntries() {
        return start[n];
    }

    /** True when every pivot held: {@link #solve(double[])} may be used. */
    public boolean isNonSingular() {
        return singularAt < 0;
    }

    /** The column whose pivot vanished in a definite factorization, or -1. */
    public int singularAt() {
        return singularAt;
    }

    /** The zero pivots of a semi-definite factorization; their number is the nullity. */
    public int[] zeroPivots() {
        return zeroPivots.clone();
    }

    /**
     * The smallest ratio of a pivot to its original diagonal: a cheap condition indicator
     * (about 1/condition for the freedom where it occurs); digits lost there are about
     * -log10 of it.
     */
    public double smallestPivotRatio() {
        return smallestPivotRatio;
    }

    public int smallestPivotAt() {
        return smallestPivotAt;
    }

    /** A null vector for zero pivot {@code j} of a semi-definite factorization: L^T x = e_j. */
    public double[] nullVector(int j) {
        double[] x = new double[n];
        x[j] = 1;
        for (int k = j; k >= 0; k--) {
            double xk = x[k];
            if (xk == 0) continue;
            int mk = first[k], sk = start[k];
            for (int r = mk; r < k; r++) x[r] -= a[sk + r - mk] * xk;
        }
        return x;
    }

    /** Solves (L D L^T) x = b; b is not changed. */
    public double[] solve(double[] b) {
        if (singularAt >= 0) throw new IllegalStateException("the matrix is singular at column " + singularAt + "; nothing to solve with");
        if (b.length != n) throw new IllegalArgumentException("right-hand side of " + b.length + " entries for a matrix of " + n);
        double[] x = b.clone();
        for (int j = 0; j < n; j++) {           // L y = b
            int mj = first[j], p = start[j] - mj;
            double s = 0;
            for (int r = mj; r < j; r++) s += a[p + r] * x[r];
            x[j] -= s;
        }
        for (int j = 0; j < n; j++) x[j] /= a[start[j] + j - first[j]]; // D z = y
        for (int j = n - 1; j >= 0; j--) {      // L^T x = z
            int mj = first[j], p = start[j] - mj;
            double xj = x[j];
            for (int r = mj; r < j; r++) x[r] -= a[p + r] * xj;
        }
        return x;
    }
}
