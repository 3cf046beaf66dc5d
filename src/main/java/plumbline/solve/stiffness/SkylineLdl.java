package plumbline.solve.stiffness;

/**
 * A symmetric matrix in skyline (variable band) storage and its L D L^T factorization,
 * column by column (the active-column scheme). Factored once; every load case is then
 * another right-hand side.
 */
final class SkylineLdl {

    /**
     * A pivot below this fraction of its original diagonal means the stiffness matrix is
     * singular to working precision: the structure has a mechanism at that freedom.
     * 1e-11 leaves about five digits above double rounding for stiffness ratios of 1e6.
     */
    static final double PIVOT_TOLERANCE = 1e-11;

    private final int n;
    private final int[] first;   // first row stored in column j
    private final int[] start;   // offset of column j's entries (rows first[j]..j)
    private final double[] a;
    private int singularAt = -1;

    SkylineLdl(int[] firstRow) {
        n = firstRow.length;
        first = firstRow.clone();
        start = new int[n + 1];
        for (int j = 0; j < n; j++) start[j + 1] = start[j] + (j - first[j] + 1);
        a = new double[start[n]];
    }

    int size() {
        return n;
    }

    long storedEntries() {
        return start[n];
    }

    /** Adds v to entry (i, j); only the upper triangle within the skyline is stored. */
    void add(int i, int j, double v) {
        if (i > j) {
            int t = i;
            i = j;
            j = t;
        }
        if (i < first[j]) throw new IllegalStateException("entry outside the skyline");
        a[start[j] + i - first[j]] += v;
    }

    private double get(int i, int j) {
        return i < first[j] ? 0 : a[start[j] + i - first[j]];
    }

    /** Factors in place; returns false (and remembers where) if a pivot vanishes. */
    boolean factor() {
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
            if (!(d > PIVOT_TOLERANCE * Math.abs(original)) || !(original > 0)) {
                singularAt = j;
                return false;
            }
            a[sj + j - mj] = d;
        }
        return true;
    }

    int singularAt() {
        return singularAt;
    }

    /** Solves (L D L^T) x = b after {@link #factor()}; b is not changed. */
    double[] solve(double[] b) {
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
