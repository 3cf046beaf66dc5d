package plumbline.statics;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import plumbline.linalg.NodeOrdering;
import plumbline.linalg.SkylineMatrix;
import plumbline.model.Member;
import plumbline.model.Model;

/**
 * The equilibrium matrix A scaled so every entry is a ratio of forces of order one,
 * A_s = R A C: moment rows divided by the model's extent Lc, moment columns (member end
 * moments and reaction moments) multiplied by it. Its equations are also given places node
 * by node in reverse Cuthill-McKee order of the node graph, which keeps A_s A_s^T banded.
 * Both the rank test for large models and the sparse force method work on it.
 */
public final class ScaledEquilibrium {

    private final EquilibriumMatrix eq;
    private final double[] rowScale, colScale;
    private final int[][] colRows;
    private final double[][] colVals;
    private final int[] position;

    private ScaledEquilibrium(Model model, EquilibriumMatrix eq) {
        this.eq = eq;
        int m = eq.equations().size(), n = eq.unknowns().size();
        double lc = eq.lengthScale();
        rowScale = new double[m];
        for (int i = 0; i < m; i++) rowScale[i] = eq.equations().get(i).direction() == 2 ? 1 / lc : 1;
        colScale = new double[n];
        colRows = new int[n][];
        colVals = new double[n][];
        for (int j = 0; j < n; j++) {
            colScale[j] = isMoment(eq.unknowns().get(j)) ? lc : 1;
            colRows[j] = eq.columnRows(j);
            double[] v = eq.columnValues(j);
            for (int k = 0; k < v.length; k++) v[k] *= rowScale[colRows[j][k]] * colScale[j];
            colVals[j] = v;
        }
        position = equationOrder(model, eq);
    }

    public static ScaledEquilibrium of(Model model, EquilibriumMatrix eq) {
        return new ScaledEquilibrium(model, eq);
    }

    /** A member end moment or a reaction moment: a column scaled by Lc. */
    public static boolean isMoment(EquilibriumMatrix.Unknown u) {
        return u.kind() == EquilibriumMatrix.Kind.MOMENT_START || u.kind() == EquilibriumMatrix.Kind.MOMENT_END
                || (u.kind() == EquilibriumMatrix.Kind.REACTION && u.direction() == 2);
    }

    public EquilibriumMatrix matrix() {
        return eq;
    }

    public int equations() {
        return rowScale.length;
    }

    public int unknowns() {
        return colScale.length;
    }

    /** R_ii: 1 for a force equation, 1/Lc for a moment equation. */
    public double rowScale(int i) {
        return rowScale[i];
    }

    /** C_jj: Lc for a moment unknown, 1 for a force. */
    public double colScale(int j) {
        return colScale[j];
    }

    /** The equations (rows) unknown j enters; do not change the array. */
    public int[] columnRows(int j) {
        return colRows[j];
    }

    /** The scaled entries of column j, in the order of {@link #columnRows}; do not change the array. */
    public double[] columnValues(int j) {
        return colVals[j];
    }

    /** The place of equation i in the banded order. */
    public int position(int i) {
        return position[i];
    }

    /** A_s A_s^T in skyline form, rows and columns in the banded order of the equations. */
    public SkylineMatrix normalMatrix() {
        int m = equations(), n = unknowns();
        int[] first = new int[m];
        for (int i = 0; i < m; i++) first[i] = i;
        for (int j = 0; j < n; j++) {
            int min = Integer.MAX_VALUE;
            for (int i : colRows[j]) min = Math.min(min, position[i]);
            for (int i : colRows[j]) first[position[i]] = Math.min(first[position[i]], min);
        }
        SkylineMatrix k = new SkylineMatrix(first);
        for (int j = 0; j < n; j++) {
            for (int p = 0; p < colRows[j].length; p++) {
                for (int q = 0; q < colRows[j].length; q++) {
                    int a = position[colRows[j][p]], b = position[colRows[j][q]];
                    if (a <= b) k.add(a, b, colVals[j][p] * colVals[j][q]);
                }
            }
        }
        return k;
    }

    /** Each equation's place when the equations are taken node by node in reverse Cuthill-McKee order of the nodes. */
    private static int[] equationOrder(Model model, EquilibriumMatrix eq) {
        int m = eq.equations().size();
        List<String> names = new ArrayList<>(model.nodes().keySet());
        Map<String, Integer> index = new HashMap<>();
        for (int k = 0; k < names.size(); k++) index.put(names.get(k), k);
        List<int[]> edges = new ArrayList<>();
        for (Member mem : model.members().values()) edges.add(new int[]{index.get(mem.from()), index.get(mem.to())});
        int[] order = NodeOrdering.reverseCuthillMcKee(names.size(), edges);
        int[] rank = new int[names.size()];
        for (int k = 0; k < order.length; k++) rank[order[k]] = k;
        Integer[] eqs = new Integer[m];
        for (int i = 0; i < m; i++) eqs[i] = i;
        Arrays.sort(eqs, (p, q) -> {
            int a = rank[index.get(eq.equations().get(p).node())], b = rank[index.get(eq.equations().get(q).node())];
            return a != b ? Integer.compare(a, b) : Integer.compare(p, q);
        });
        int[] out = new int[m];
        for (int k = 0; k < m; k++) out[eqs[k]] = k;
        return out;
    }
}
