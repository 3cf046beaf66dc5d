package plumbline.statics;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.RealMatrix;
import org.apache.commons.math3.linear.SingularValueDecomposition;
import plumbline.linalg.SkylineLdl;
import plumbline.model.Member;
import plumbline.model.Model;
import plumbline.model.Node;

/**
 * Static determinacy and stability by equilibrium alone, from the rank r of the
 * equilibrium matrix A (m equations, n unknowns): degree of static indeterminacy n - r,
 * independent mechanisms m - r. The classic count n - m is reported beside it; the two
 * differ exactly when the arrangement is geometrically unstable (parallel or concurrent
 * reactions, a collinear linkage) although it has enough restraints.
 *
 * <p>Rank is taken from the singular values of A after moment rows are divided and
 * moment columns multiplied by the model's extent Lc, so every entry is a ratio of forces
 * of order one and the tolerance is scale-free.
 */
public final class Determinacy {

    /**
     * A singular value below this fraction of the largest counts as zero. The scaled
     * entries are O(1) and exact to about 1e-16; 1e-10 leaves six orders of margin for
     * members whose lengths differ by up to 1e4 from the model's extent.
     */
    public static final double RANK_TOLERANCE = 1e-10;
    /** A smallest non-zero singular value below this fraction of the largest: a near-mechanism. */
    public static final double NEAR_MECHANISM = 1e-7;

    public enum Classification {
        DETERMINATE("determinate"), INDETERMINATE("indeterminate"), UNSTABLE("unstable");
        public final String word;

        Classification(String w) {
            word = w;
        }
    }

    /** A mechanism shape: displacement per node {ux, uy, rz}, scaled so the largest translation is 1. */
    public record Mechanism(Map<String, double[]> motion, String description) {
    }

    public record Result(Classification classification, int degree, int mechanisms, int equations, int unknowns,
                         int rank, int countingDegree, boolean countingDisagrees, List<Mechanism> shapes,
                         double conditionRatio, String remark) {
    }

    private Determinacy() {
    }

    public static Result of(Model model) {
        return of(model, EquilibriumMatrix.of(model));
    }

    /**
     * Above this many equations the rank comes from a sparse L D L^T of A A^T (in
     * reverse Cuthill-McKee node order) instead of a dense SVD, whose cost grows as the
     * cube of the size.
     */
    public static final int DENSE_LIMIT = 200;
    /**
     * Zero-pivot threshold of the sparse path, relative to the original diagonal of A A^T.
     * Its pivots are squares of singular-value-like quantities, so 1e-12 here corresponds
     * to about 1e-6 in the dense path's singular values; genuine mechanisms give pivots of
     * rounding size (1e-16), well below.
     */
    public static final double SPARSE_PIVOT_TOLERANCE = 1e-12;

    public static Result of(Model model, EquilibriumMatrix eq) {
        return eq.equations().size() > DENSE_LIMIT ? sparse(model, eq) : dense(model, eq);
    }

    static Result sparse(Model model, EquilibriumMatrix eq) {
        int m = eq.equations().size(), n = eq.unknowns().size();
        double lc = eq.lengthScale();
        ScaledEquilibrium scaled = ScaledEquilibrium.of(model, eq);
        SkylineLdl ldl = scaled.normalMatrix().factorSemidefinite(SPARSE_PIVOT_TOLERANCE);
        int[] zeros = ldl.zeroPivots();
        List<Mechanism> shapes = new ArrayList<>();
        List<double[]> basis = new ArrayList<>();
        for (int z : zeros) {
            double[] x = ldl.nullVector(z);
            double[] vec = new double[m];
            for (int i = 0; i < m; i++) vec[i] = x[scaled.position(i)];
            basis.add(vec);
        }
        if (basis.size() <= 50) basis = separated(basis);
        for (double[] vec : basis) shapes.add(describe(model, eq, vec, lc));
        int r = m - zeros.length;
        return classify(m, n, r, shapes, 1.0, false);
    }

    static Result dense(Model model, EquilibriumMatrix eq) {
        int m = eq.equations().size(), n = eq.unknowns().size();
        ScaledEquilibrium scaled = ScaledEquilibrium.of(model, eq);
        double lc = eq.lengthScale();
        int size = Math.max(m, n);
        double[][] s = new double[m][size];
        for (int j = 0; j < n; j++) {
            int[] r = scaled.columnRows(j);
            double[] v = scaled.columnValues(j);
            for (int p = 0; p < r.length; p++) s[r[p]][j] = v[p];
        }
        int rank;
        List<Mechanism> shapes = new ArrayList<>();
        double condition = 1;
        if (m == 0) {
            rank = 0;
        } else {
            RealMatrix a = new Array2DRowRealMatrix(s, false);
            SingularValueDecomposition svd = new SingularValueDecomposition(a);
            double[] sv = svd.getSingularValues();
            double max = sv.length == 0 ? 0 : sv[0];
            rank = 0;
            for (double v : sv) if (v > RANK_TOLERANCE * max) rank++;
            if (rank > 0) condition = sv[rank - 1] / max;
            RealMatrix u = svd.getU();
            List<double[]> basis = new ArrayList<>();
            for (int k = rank; k < m; k++) basis.add(u.getColumn(k));
            for (double[] vec : separated(basis)) shapes.add(describe(model, eq, vec, lc));
        }
        return classify(m, n, rank, shapes, condition, true);
    }

    private static Result classify(int m, int n, int rank, List<Mechanism> shapes, double condition, boolean conditionKnown) {
        int degree = n - rank, mech = m - rank;
        Classification c = mech > 0 ? Classification.UNSTABLE : degree == 0 ? Classification.DETERMINATE
                : Classification.INDETERMINATE;
        int counting = n - m;
        boolean disagrees = mech > 0 && counting >= 0;
        String remark = "";
        if (disagrees) {
            remark = "the count of unknowns less equations gives " + counting + " (" + (counting == 0 ? "determinate"
                    : "indeterminate") + "), but the equations are not independent: the arrangement is geometrically "
                    + "unstable (parallel or concurrent reactions, or a collinear linkage)";
        } else if (mech == 0 && conditionKnown && condition < NEAR_MECHANISM) {
            remark = String.format(Locale.ROOT, "near-mechanism: the equilibrium equations are nearly dependent "
                    + "(smallest to largest singular value %.1e); check for nearly collinear or nearly parallel members or reactions", condition);
        }
        return new Result(c, degree, mech, m, n, rank, counting, disagrees, shapes, condition, remark);
    }

    /**
     * A basis of the same mechanism space in reduced row-echelon form (Gauss-Jordan with
     * the largest pivot of each column): each vector is zero at the others' pivots, which
     * separates independent mechanisms (a loose stick and a separate linkage) that an SVD
     * basis mixes.
     */
    static List<double[]> separated(List<double[]> basis) {
        int k = basis.size();
        if (k <= 1) return basis;
        int m = basis.get(0).length;
        double[][] r = new double[k][];
        for (int i = 0; i < k; i++) r[i] = basis.get(i).clone();
        double max = 0;
        for (double[] v : r) for (double x : v) max = Math.max(max, Math.abs(x));
        int row = 0;
        for (int col = 0; col < m && row < k; col++) {
            int best = row;
            for (int i = row; i < k; i++) if (Math.abs(r[i][col]) > Math.abs(r[best][col])) best = i;
            if (Math.abs(r[best][col]) <= 1e-9 * max) continue;
            double[] t = r[row];
            r[row] = r[best];
            r[best] = t;
            double p = r[row][col];
            for (int j = 0; j < m; j++) r[row][j] /= p;
            for (int i = 0; i < k; i++) {
                if (i == row || r[i][col] == 0) continue;
                double f = r[i][col];
                for (int j = 0; j < m; j++) r[i][j] -= f * r[row][j];
            }
            row++;
        }
        List<double[]> out = new ArrayList<>();
        for (double[] v : r) out.add(v);
        return out;
    }

    /** Words for one mechanism shape (node motions in the equation space, the null space of A^T). */
    static Mechanism describe(Model model, EquilibriumMatrix eq, double[] vec, double lc) {
        Map<String, double[]> motion = new LinkedHashMap<>();
        for (Node nd : model.nodes().values()) motion.put(nd.name(), new double[3]);
        for (int i = 0; i < vec.length; i++) {
            EquilibriumMatrix.Equation e = eq.equations().get(i);
            // moment rows were divided by lc, so their null-vector entries are rotations times lc
            motion.get(e.node())[e.direction()] = e.direction() == 2 ? vec[i] / lc : vec[i];
        }
        double maxT = 0, maxR = 0;
        for (double[] d : motion.values()) {
            maxT = Math.max(maxT, Math.hypot(d[0], d[1]));
            maxR = Math.max(maxR, Math.abs(d[2]));
        }
        double scale = maxT > 1e-9 * maxR * lc ? maxT : maxR;
        for (double[] d : motion.values()) for (int k = 0; k < 3; k++) d[k] = Math.abs(d[k] / scale) < 1e-9 ? 0 : d[k] / scale;
        // Each member-end moment (or rotational reaction) enters its node's moment row with a
        // coefficient of one and otherwise only translation rows, so a motion with no translation
        // has no rotation either: some node always moves.
        List<String> moving = new ArrayList<>();
        for (var e : motion.entrySet()) if (Math.hypot(e.getValue()[0], e.getValue()[1]) > 1e-6) moving.add(e.getKey());
        String text = members(model, motion, lc);
        if (moving.size() == 1) {
            double[] d = motion.get(moving.get(0));
            text = "node " + moving.get(0) + " can translate " + direction(d[0], d[1]) + ": " + text;
        }
        Map<String, double[]> kept = new LinkedHashMap<>();
        for (var e : motion.entrySet()) {
            double[] d = e.getValue();
            if (d[0] != 0 || d[1] != 0 || d[2] != 0) kept.put(e.getKey(), d);
        }
        return new Mechanism(kept, text);
    }

    static String direction(double dx, double dy) {
        double ang = Math.toDegrees(Math.atan2(dy, dx));
        double a = ((ang % 180) + 180) % 180;
        if (a < 1e-3 || a > 180 - 1e-3) return "horizontally";
        if (Math.abs(a - 90) < 1e-3) return "vertically";
        return String.format(Locale.ROOT, "along a line at %.1f deg to the x axis", a);
    }

    /** Describes rigid motions of the members: translation, or rotation about a node or a point. */
    private static String members(Model model, Map<String, double[]> motion, double lc) {
        List<String> parts = new ArrayList<>();
        Map<String, List<String>> groups = new LinkedHashMap<>();
        for (Member m : model.members().values()) {
            Node a = model.node(m.from()), b = model.node(m.to());
            double[] ua = motion.get(a.name()), ub = motion.get(b.name());
            double len = model.lengthM(m);
            double cx = model.directionOf(m)[0], cy = model.directionOf(m)[1];
            double theta = ((ub[1] - ua[1]) * cx - (ub[0] - ua[0]) * cy) / len;
            double ta = Math.hypot(ua[0], ua[1]), tb = Math.hypot(ub[0], ub[1]);
            if (ta < 1e-6 && tb < 1e-6) continue;
            String key;
            if (Math.abs(theta) * lc < 1e-6) {
                key = "translate " + direction(ua[0], ua[1]);
            } else {
                // instantaneous centre: u = theta x (p - c)  =>  c = p + (-u_y, u_x)/theta ... solved from node a
                double px = a.xM() - ua[1] / theta, py = a.yM() + ua[0] / theta;
                String at = null;
                for (Node nd : model.nodes().values()) {
                    if (Math.hypot(nd.xM() - px, nd.yM() - py) < 1e-6 * lc) at = "node " + nd.name();
                }
                key = "rotate about " + (at != null ? at : String.format(Locale.ROOT, "the point (%.4g, %.4g) m", px, py));
            }
            groups.computeIfAbsent(key, k -> new ArrayList<>()).add(m.name());
        }
        if (groups.size() == 1 && groups.values().iterator().next().size() == model.members().size()) {
            return "the whole structure can " + groups.keySet().iterator().next() + " as a rigid body: the supports do not hold it";
        }
        for (var g : groups.entrySet()) {
            parts.add((g.getValue().size() == 1 ? "member " : "members ") + String.join(", ", g.getValue()) + " "
                    + g.getKey().replace("translate", g.getValue().size() == 1 ? "translates" : "translate")
                    .replace("rotate about", g.getValue().size() == 1 ? "rotates about" : "rotate about"));
        }
        return String.join("; ", parts) + (groups.size() > 1 ? " (together, as a linkage)" : "");
    }
}
