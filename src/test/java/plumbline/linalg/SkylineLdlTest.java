package plumbline.linalg;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Random;
import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.ArrayRealVector;
import org.apache.commons.math3.linear.LUDecomposition;
import org.apache.commons.math3.linear.RealMatrix;
import org.apache.commons.math3.linear.SingularValueDecomposition;
import org.junit.jupiter.api.Test;

/**
 * The skyline L D L^T against Commons Math (a general-purpose reference library) on seeded
 * random symmetric matrices: solutions against LU, determinants against LU, nullity against
 * the rank of the singular value decomposition.
 */
class SkylineLdlTest {

    /** A random skyline profile: column j starts at a row between j - band and j. */
    static int[] profile(Random rnd, int n, int band) {
        int[] first = new int[n];
        for (int j = 0; j < n; j++) first[j] = Math.max(0, j - rnd.nextInt(band + 1));
        return first;
    }

    /** A symmetric positive definite matrix within the profile (strictly diagonally dominant, positive diagonal). */
    static double[][] definite(Random rnd, int[] first) {
        int n = first.length;
        double[][] a = new double[n][n];
        for (int j = 0; j < n; j++) {
            for (int i = first[j]; i < j; i++) {
                double v = rnd.nextDouble() * 2 - 1;
                a[i][j] = v;
                a[j][i] = v;
            }
        }
        for (int i = 0; i < n; i++) {
            double off = 0;
            for (int j = 0; j < n; j++) if (j != i) off += Math.abs(a[i][j]);
            a[i][i] = off + 0.1 + rnd.nextDouble();
        }
        return a;
    }

    static SkylineMatrix skyline(int[] first, double[][] a) {
        SkylineMatrix m = new SkylineMatrix(first);
        for (int j = 0; j < first.length; j++) for (int i = first[j]; i <= j; i++) m.add(i, j, a[i][j]);
        return m;
    }

    @Test
    void solvesLikeCommonsMathLuOnRandomDefiniteMatrices() {
        Random rnd = new Random(20261202);
        for (int trial = 0; trial < 200; trial++) {
            int n = 1 + rnd.nextInt(40);
            int[] first = profile(rnd, n, 1 + rnd.nextInt(8));
            double[][] a = definite(rnd, first);
            SkylineLdl f = skyline(first, a).factor();
            assertTrue(f.isNonSingular(), "trial " + trial);
            assertEquals(-1, f.singularAt());
            RealMatrix ref = new Array2DRowRealMatrix(a);
            LUDecomposition lu = new LUDecomposition(ref);
            for (int rhs = 0; rhs < 3; rhs++) {
                double[] b = new double[n];
                for (int i = 0; i < n; i++) b[i] = rnd.nextGaussian() * Math.pow(10, rnd.nextInt(7) - 3);
                double[] before = b.clone();
                double[] x = f.solve(b);
                double[] y = lu.getSolver().solve(new ArrayRealVector(b)).toArray();
                double scale = 0;
                for (double v : y) scale = Math.max(scale, Math.abs(v));
                for (int i = 0; i < n; i++) assertEquals(y[i], x[i], 1e-12 * scale, "trial " + trial + " entry " + i);
                for (int i = 0; i < n; i++) assertEquals(before[i], b[i], 0.0, "the right-hand side is not changed");
                // and the residual A x - b is rounding
                double[] ax = ref.operate(x);
                for (int i = 0; i < n; i++) assertEquals(b[i], ax[i], 1e-11 * (Math.abs(b[i]) + scale * a[i][i]));
            }
            // a pivot ratio is a fraction of its diagonal: positive, at most 1
            assertTrue(f.smallestPivotRatio() > 0 && f.smallestPivotRatio() <= 1, "pivot ratio " + f.smallestPivotRatio());
        }
    }

    /**
     * The factorization's inner sums, taken four products a pass, are the plain loop's sums to
     * the bit: the active-column scheme (Bathe, Finite Element Procedures, 1996, section 8.2.3)
     * written out here with plain loops on a full array gives the same solutions bit for bit,
     * for column heights that are and are not multiples of four.
     */
    @Test
    void innerSumsAreThePlainLoopsToTheBit() {
        Random rnd = new Random(41);
        for (int trial = 0; trial < 100; trial++) {
            int n = 1 + rnd.nextInt(60);
            int[] first = profile(rnd, n, 1 + rnd.nextInt(24));
            double[][] a = definite(rnd, first);
            double[][] f = new double[n][n]; // f[i][j], i <= j: l_ij below the diagonal, d_j on it
            for (int j = 0; j < n; j++) {
                for (int i = first[j]; i <= j; i++) f[i][j] = a[i][j];
                for (int i = first[j] + 1; i < j; i++) {
                    double sum = 0;
                    for (int r = Math.max(first[i], first[j]); r < i; r++) sum += f[r][i] * f[r][j];
                    f[i][j] -= sum;
                }
                double d = f[j][j];
                for (int i = first[j]; i < j; i++) {
                    double g = f[i][j], l = g / f[i][i];
                    f[i][j] = l;
                    d -= g * l;
                }
                f[j][j] = d;
            }
            double[] b = new double[n];
            for (int i = 0; i < n; i++) b[i] = rnd.nextGaussian();
            double[] expected = solveByHand(first, f, b);
            double[] got = skyline(first, a).factor().solve(b);
            for (int i = 0; i < n; i++) {
                assertEquals(Double.doubleToRawLongBits(expected[i]), Double.doubleToRawLongBits(got[i]), "trial " + trial + " entry " + i);
            }
        }
    }

    /** Forward, diagonal and back substitution with the factors, as SkylineLdl.solve takes them. */
    private static double[] solveByHand(int[] first, double[][] f, double[] b) {
        int n = b.length;
        double[] x = b.clone();
        for (int j = 0; j < n; j++) {
            double s = 0;
            for (int r = first[j]; r < j; r++) s += f[r][j] * x[r];
            x[j] -= s;
        }
        for (int j = 0; j < n; j++) x[j] /= f[j][j];
        for (int j = n - 1; j >= 0; j--) for (int r = first[j]; r < j; r++) x[r] -= f[r][j] * x[j];
        return x;
    }

    @Test
    void findsTheSingularColumnAndRefusesToSolve() {
        // a_22 set to what the first two columns already account for: column 2's pivot (its Schur complement) vanishes
        double[][] a = {{4, 1, 2}, {1, 3, 1}, {2, 1, 1.25 + 0.75}};
        a[2][2] = a[0][2] * a[0][2] / a[0][0] + (a[1][2] - a[0][1] * a[0][2] / a[0][0]) * (a[1][2] - a[0][1] * a[0][2] / a[0][0])
                / (a[1][1] - a[0][1] * a[0][1] / a[0][0]);
        SkylineLdl f = skyline(new int[]{0, 0, 0}, a).factor();
        assertFalse(f.isNonSingular());
        assertEquals(2, f.singularAt());
        assertThrows(IllegalStateException.class, () -> f.solve(new double[3]));
        assertEquals(0.0, new LUDecomposition(new Array2DRowRealMatrix(a)).getDeterminant(), 1e-12, "Commons Math agrees it is singular");
    }

    @Test
    void aNonPositiveDiagonalIsSingularAtOnce() {
        SkylineLdl f = skyline(new int[]{0, 1}, new double[][]{{1, 0}, {0, -2}}).factor();
        assertEquals(1, f.singularAt());
    }

    @Test
    void semidefiniteNullityMatchesTheRankOfCommonsMathSvd() {
        Random rnd = new Random(7);
        for (int trial = 0; trial < 60; trial++) {
            int n = 2 + rnd.nextInt(20), r = 1 + rnd.nextInt(n - 1);
            double[][] c = new double[n][r];
            for (double[] row : c) for (int k = 0; k < r; k++) row[k] = rnd.nextGaussian();
            RealMatrix cm = new Array2DRowRealMatrix(c);
            double[][] a = cm.multiply(cm.transpose()).getData();
            int[] full = new int[n];
            SkylineLdl f = skyline(full, a).factorSemidefinite(1e-9);
            int rank = new SingularValueDecomposition(new Array2DRowRealMatrix(a)).getRank();
            assertEquals(n - rank, f.zeroPivots().length, "trial " + trial);
            double norm = 0;
            for (double[] row : a) for (double v : row) norm = Math.max(norm, Math.abs(v));
            for (int z : f.zeroPivots()) {
                double[] x = f.nullVector(z);
                double[] ax = new Array2DRowRealMatrix(a).operate(x);
                double xs = 0;
                for (double v : x) xs = Math.max(xs, Math.abs(v));
                for (double v : ax) assertEquals(0, v, 1e-9 * norm * xs, "A x = 0 for the null vector of pivot " + z);
            }
        }
    }

    @Test
    void entriesOutsideTheSkylineAreRefusedAndTheMatrixIsLeftAsAssembled() {
        SkylineMatrix m = new SkylineMatrix(new int[]{0, 0, 1});
        assertThrows(IllegalStateException.class, () -> m.add(0, 2, 1.0));
        assertThrows(IllegalArgumentException.class, () -> new SkylineMatrix(new int[]{0, 2}));
        m.add(0, 0, 2);
        m.add(1, 0, 1); // the lower triangle lands on the upper
        m.add(1, 1, 2);
        m.add(2, 2, 3);
        assertEquals(1, m.get(0, 1));
        assertEquals(0, m.get(0, 2));
        assertEquals(5, m.storedEntries());
        SkylineLdl f = m.factor();
        assertEquals(2, m.get(0, 0), "factoring works on a copy");
        assertEquals(3, f.size());
        assertThrows(IllegalArgumentException.class, () -> f.solve(new double[2]));
        double[] x = f.solve(new double[]{3, 3, 3});
        assertEquals(1, x[0], 1e-15);
        assertEquals(1, x[1], 1e-15);
        assertEquals(1, x[2], 1e-15);
    }
}
