package plumbline.solve.force;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import plumbline.model.Member;
import plumbline.model.Model;
import plumbline.model.Support;
import plumbline.solve.MemberActions;
import plumbline.statics.EquilibriumMatrix;

/**
 * Flexibility of the independent forces, from the unit-load method. For a member with
 * unit diagrams n_N = 1, m_i(x) = -(1 - x/L), m_j(x) = x/L (M(0) = -m_i, M(L) = m_j):
 * f_NN = L/EA, f_ii = f_jj = L/3EI, f_ij = -L/6EI. A spring's force has flexibility 1/k.
 * Initial deformations are the integrals of the same unit diagrams against the released
 * member's N and M and the thermal strain and curvature, exact for the polynomial loads.
 */
final class Flexibility {

    private final double[][] block;   // per unknown: its member's block row, indexed by unknown
    private final int[][] group;      // per unknown: the unknowns of the same member (or itself)

    private Flexibility(double[][] block, int[][] group) {
        this.block = block;
        this.group = group;
    }

    static Flexibility of(Model model, EquilibriumMatrix eq) {
        int n = eq.unknowns().size();
        double[][] block = new double[n][];
        int[][] group = new int[n][];
        Map<String, List<Integer>> byMember = new LinkedHashMap<>();
        for (int j = 0; j < n; j++) {
            EquilibriumMatrix.Unknown u = eq.unknowns().get(j);
            if (u.kind() == EquilibriumMatrix.Kind.REACTION) {
                Support s = model.supports().get(u.owner());
                group[j] = new int[]{j};
                block[j] = new double[]{s.fixed(u.direction()) ? 0 : 1 / s.spring(u.direction())};
            } else {
                byMember.computeIfAbsent(u.owner(), k -> new ArrayList<>()).add(j);
            }
        }
        for (var e : byMember.entrySet()) {
            Member m = model.member(e.getKey());
            double len = model.lengthM(m);
            double ea = model.axialStiffnessN(m);
            double ei = model.bendingStiffnessNm2(m);
            int[] idx = e.getValue().stream().mapToInt(Integer::intValue).toArray();
            for (int a : idx) {
                double[] row = new double[idx.length];
                for (int b = 0; b < idx.length; b++) row[b] = coefficient(eq.unknowns().get(a).kind(), eq.unknowns().get(idx[b]).kind(), len, ea, ei);
                block[a] = row;
                group[a] = idx;
            }
        }
        return new Flexibility(block, group);
    }

    private static double coefficient(EquilibriumMatrix.Kind a, EquilibriumMatrix.Kind b, double len, double ea, double ei) {
        boolean axA = a == EquilibriumMatrix.Kind.AXIAL, axB = b == EquilibriumMatrix.Kind.AXIAL;
        if (axA && axB) return len / ea;
        if (axA || axB) return 0;
        return a == b ? len / (3 * ei) : -len / (6 * ei);
    }

    /** The unknowns that share unknown j's flexibility block (its member's, or j alone). */
    int[] group(int j) {
        return group[j];
    }

    /** Entry (j, group(j)[b]) of the flexibility. */
    double coefficient(int j, int b) {
        return block[j][b];
    }

    /** F v for a vector of unknowns. */
    double[] times(double[] v) {
        double[] out = new double[v.length];
        for (int j = 0; j < v.length; j++) {
            double s = 0;
            for (int b = 0; b < group[j].length; b++) s += block[j][b] * v[group[j][b]];
            out[j] = s;
        }
        return out;
    }

    /** F X for a matrix of unknowns (n x r). */
    double[][] times(double[][] x) {
        int n = x.length, r = n == 0 ? 0 : x[0].length;
        double[][] out = new double[n][r];
        double[] col = new double[n];
        for (int k = 0; k < r; k++) {
            for (int j = 0; j < n; j++) col[j] = x[j][k];
            double[] fc = times(col);
            for (int j = 0; j < n; j++) out[j][k] = fc[j];
        }
        return out;
    }

    /** e_j: the deformation conjugate to unknown j caused by the loads on its released member. */
    double[] initialDeformation(Model model, EquilibriumMatrix eq, Map<String, MemberActions> actions,
                               Map<String, double[]> released) {
        double[] e = new double[block.length];
        for (int j = 0; j < e.length; j++) {
            EquilibriumMatrix.Unknown u = eq.unknowns().get(j);
            if (u.kind() == EquilibriumMatrix.Kind.REACTION) continue;
            MemberActions a = actions.get(u.owner());
            if (a == null) continue;
            Member m = model.member(u.owner());
            double len = a.lengthM();
            double ea = model.axialStiffnessN(m);
            double ei = model.bendingStiffnessNm2(m);
            double[] fp = released.get(u.owner());
            // the released member's own diagrams in closed form, integrated exactly against the unit diagrams
            ClosedFormMember r = ClosedFormMember.of(new double[]{fp[0], fp[1], fp[2]}, a);
            double alpha, beta; // unit end-moment diagram m(x) = alpha + beta x
            switch (u.kind()) {
                case AXIAL -> {
                    e[j] = r.axialIntegral() / ea + a.thermalStrain() * len;
                    continue;
                }
                case MOMENT_START -> {
                    alpha = -1;
                    beta = 1 / len;
                }
                default -> {
                    alpha = 0;
                    beta = 1 / len;
                }
            }
            double bending = Double.isFinite(ei) && ei > 0 ? r.momentIntegral(alpha, beta) / ei : 0;
            e[j] = bending + a.thermalCurvaturePerM() * (alpha * len + beta * len * len / 2);
        }
        return e;
    }
}
