package plumbline.linalg;

/**
 * A symmetric matrix in skyline (variable band) storage, being assembled: entries are
 * added, then {@link #factor()} or {@link #factorSemidefinite(double)} hands out an
 * immutable {@link SkylineLdl} that solves. Only the upper triangle within the skyline is
 * stored: column j holds rows {@code firstRow[j]} to j.
 */
public final class SkylineMatrix {

    final int n;
    final int[] first;   // first row stored in column j
    final int[] start;   // offset of column j's entries (rows first[j]..j)
    final double[] a;

    /** @param firstRow for each column, the first row with a non-zero entry (at most the column itself) */
    public SkylineMatrix(int[] firstRow) {
        n = firstRow.length;
        first = firstRow.clone();
        start = new int[n + 1];
        for (int j = 0; j < n; j++) {
            if (first[j] < 0 || first[j] > j) throw new IllegalArgumentException("first row " + first[j] + " of column " + j);
            start[j + 1] = start[j] + (j - first[j] + 1);
        }
        a = new double[start[n]];
    }

    public int size() {
        return n;
    }

    public long storedEntries() {
        return start[n];
    }

    /** Adds v to entry (i, j) and so to (j, i). */
    public void add(int i, int j, double v) {
        int row = Math.min(i, j), col = Math.max(i, j);
        if (row < first[col]) throw new IllegalStateException("entry (" + row + ", " + col + ") outside the skyline");
        a[start[col] + row - first[col]] += v;
    }

    /** Entry (i, j) as assembled (0 outside the skyline). */
    public double get(int i, int j) {
        int row = Math.min(i, j), col = Math.max(i, j);
        return row < first[col] ? 0 : a[start[col] + row - first[col]];
    }

    /**
     * L D L^T of a matrix expected to be positive definite; the result says where a pivot
     * fell below {@link SkylineLdl#PIVOT_TOLERANCE} of its diagonal, if one did. This matrix
     * is left as assembled.
     */
    public SkylineLdl factor() {
        return SkylineLdl.of(this, SkylineLdl.PIVOT_TOLERANCE, false);
    }

    /**
     * L D L^T of a positive semi-definite matrix, treating every pivot below
     * {@code relativeTolerance} of its original diagonal as zero (its row of the Schur
     * complement is then zero to rounding, so it is dropped); the zero pivots' number is the
     * nullity.
     */
    public SkylineLdl factorSemidefinite(double relativeTolerance) {
        return SkylineLdl.of(this, relativeTolerance, true);
    }
}
