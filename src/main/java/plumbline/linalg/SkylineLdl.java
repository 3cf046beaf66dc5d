package plumbline.linalg;

/**
 * A symmetric matrix in skyline (variable band) storage and its L D L^T factorization,
 * column by column (the active-column scheme of K.J. Bathe, Finite Element Procedures,
 * 1996, section 8.2.3). Factored once; every right-hand side is then a forward and a
 * back substitution. General numerics with no structural knowledge: the stiffness engine
 * factors K with it, statics factors A A^T with it for large models.
 */
public final class SkylineLdl {

    /**
     * A pivot below this fraction of its original diagonal means the stiffness matrix is
     * singular to working precision: the structure has a mechanism at that freedom.
     * 1e-11 leaves about five digits above double rounding for stiffness ratios of 1e6.
     */
    public static final double PIVOT_TOLERANCE = 1e-11;

    private final int n;
    private final int[] first;   // first row stored in column j
    private final int[] start;   // offset of column j's entries (rows first[j]..j)
    private final double[] a;
    private int singularAt = -1;

    public SkylineLdl(int[] firstRow) {
        n = firstRow.length;
        first = firstRow.clone();
        start = new int[n + 1];
        for (int j = 0; j < n; j++) start[j + 1] = start[j] + (j - first[j] + 1);
        a = new double[start[n]];
    }

    public int size() {
        return n;
    }

    public long storedEntries() {
        return start[n];
    }

    /** Adds v to entry (i, j); only the upper triangle within the skyline is stored. */
    public void add(int i, int j, double v) {
        if (i > j) {
            int t = i;
            i = j;
            j = t;
        }
        if (i < first[j]) throw new IllegalStateException("entry outside the skyline");
        a[start[j] + i - first[j]] += v;
    }

    /** Factors in place; returns false (and remembers where) if a pivot vanishes. */
    public boolean factor() {
        return eliminate(PIVOT_TOLERANCE, null);
    }

    /**
     * Factors a positive semi-definite matrix, treating every pivot below
     * {@code relativeTolerance} of its original diagonal as zero (its row of the Schur
     * complement is then zero to rounding, so it is dropped). Returns the indices of the
     * zero pivots; their number is the nullity.
     */
    public int[] factorSemidefinite(double relativeTolerance) {
        java.util.List<Integer> zeros = new java.util.ArrayList<>();
        eliminate(relativeTolerance, zeros);
        zeroPivots = zeros.stream().mapToInt(Integer::intValue).toArray();
        return zeroPivots.clone();
    }

    /**
     * The active-column L D L^T. A pivot below {@code tol} of its original diagonal stops a
     * definite factorization (returns false), or, when {@code zeros} collects them, is
     * recorded and dropped (later columns take nothing from its row).
     */
    private boolean eliminate(double tol, java.util.List<Integer> zeros) {
        for (int j = 0; j < n; j++) {
            int mj = first[j], sj = start[j];
            double original = a[sj + j - mj];
            for (int i = mj + 1; i < j; i++) {
                int mi = first[i], si = start[i];
                int m = Math.max(mi, mj);
                double s = 0;
                for (int r = m; r < i; r++) s += a[si + r - mi] * a[sj + r - mj];
                a[sj + i - mj] -= s;
            }
            double d = original;
            for (int i = mj; i < j; i++) {
                double g = a[sj + i - mj];
                double l = g / a[start[i] + i - first[i]];
                a[sj + i - mj] = l;
                d -= g * l;
            }
            if (!(d > tol * Math.abs(original)) || !(original > 0)) {
                if (zeros == null) {
                    singularAt = j;
                    return false;
                }
                zeros.add(j);
                d = Double.POSITIVE_INFINITY;
            } else if (d / original < smallestPivotRatio) {
                smallestPivotRatio = d / original;
                smallestPivotAt = j;
            }
            a[sj + j - mj] = d;
        }
        return true;
    }

    private int[] zeroPivots = new int[0];

    /** A null vector for zero pivot {@code j} after {@link #factorSemidefinite}: L^T x = e_j. */
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

    private double smallestPivotRatio = 1;
    private int smallestPivotAt = -1;

    /**
     * The smallest ratio of a pivot to its original diagonal after {@link #factor()}: a cheap
     * condition indicator (about 1/condition for the freedom where it occurs); digits lost
     * there are about -log10 of it.
     */
    public double smallestPivotRatio() {
        return smallestPivotRatio;
    }

    public int smallestPivotAt() {
        return smallestPivotAt;
    }

    public int singularAt() {
        return singularAt;
    }

    /** Solves (L D L^T) x = b after {@link #factor()}; b is not changed. */
    public double[] solve(double[] b) {
        double[] x = b.clone();
        for (int j = 0; j < n; j++) {
            int mj = first[j], sj = start[j];
            double s = 0;
            for (int r = mj; r < j; r++) s += a[sj + r - mj] * x[r];
            x[j] -= s;
        }
        for (int j = 0; j < n; j++) x[j] /= a[start[j] + j - first[j]];
        for (int j = n - 1; j >= 0; j--) {
            int mj = first[j], sj = start[j];
            double xj = x[j];
            for (int r = mj; r < j; r++) x[r] -= a[sj + r - mj] * xj;
        }
        return x;
    }
}
