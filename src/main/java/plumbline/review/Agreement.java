package plumbline.review;

import java.util.Map;
import plumbline.solve.MemberSolution;
import plumbline.solve.Peaks;
import plumbline.solve.Solution;

/**
 * The largest relative difference between two engines' solutions over every load set:
 * reactions, node displacements, member end forces and member peaks. Each difference is
 * divided by the largest magnitude of its own kind in that load set (forces, moments,
 * translations, rotations), so a near-zero value does not inflate the figure.
 */
public final class Agreement {

    private Agreement() {
    }

    public static double maxRelativeDifference(Map<String, Solution> a, Map<String, Solution> b) {
        double worst = 0;
        for (var e : a.entrySet()) {
            Solution s = e.getValue(), t = b.get(e.getKey());
            double[] scale = new double[4]; // force, moment, translation, rotation
            for (Solution x : new Solution[]{s, t}) {
                for (double[] r : x.reactions().values()) {
                    scale[0] = Math.max(scale[0], Math.max(Math.abs(r[0]), Math.abs(r[1])));
                    scale[1] = Math.max(scale[1], Math.abs(r[2]));
                }
                for (double[] d : x.displacements().values()) {
                    scale[2] = Math.max(scale[2], Math.max(Math.abs(d[0]), Math.abs(d[1])));
                    scale[3] = Math.max(scale[3], Math.abs(d[2]));
                }
                for (MemberSolution m : x.members().values()) {
                    double[] f = m.endForcesLocal();
                    scale[0] = Math.max(scale[0], Math.max(Math.max(Math.abs(f[0]), Math.abs(f[1])), Math.max(Math.abs(f[3]), Math.abs(f[4]))));
                    scale[1] = Math.max(scale[1], Math.max(Math.max(Math.abs(f[2]), Math.abs(f[5])), m.peaks().value("M_abs")));
                    scale[2] = Math.max(scale[2], m.peaks().deflection().value());
                }
            }
            for (var r : s.reactions().entrySet()) {
                double[] p = r.getValue(), q = t.reactions().get(r.getKey());
                worst = Math.max(worst, rel(p[0], q[0], scale[0]));
                worst = Math.max(worst, rel(p[1], q[1], scale[0]));
                worst = Math.max(worst, rel(p[2], q[2], scale[1]));
            }
            for (var d : s.displacements().entrySet()) {
                double[] p = d.getValue(), q = t.displacements().get(d.getKey());
                worst = Math.max(worst, rel(p[0], q[0], scale[2]));
                worst = Math.max(worst, rel(p[1], q[1], scale[2]));
                worst = Math.max(worst, rel(p[2], q[2], scale[3]));
            }
            for (var m : s.members().entrySet()) {
                double[] f = m.getValue().endForcesLocal(), g = t.members().get(m.getKey()).endForcesLocal();
                for (int k = 0; k < 6; k++) worst = Math.max(worst, rel(f[k], g[k], k % 3 == 2 ? scale[1] : scale[0]));
                Peaks p = m.getValue().peaks(), q = t.members().get(m.getKey()).peaks();
                for (String k : new String[]{"N_max", "N_min", "V_max", "V_min"}) worst = Math.max(worst, rel(p.value(k), q.value(k), scale[0]));
                for (String k : new String[]{"M_max", "M_min"}) worst = Math.max(worst, rel(p.value(k), q.value(k), scale[1]));
                worst = Math.max(worst, rel(p.value("deflection"), q.value("deflection"), scale[2]));
            }
        }
        return worst;
    }

    private static double rel(double x, double y, double scale) {
        double d = Math.abs(x - y);
        if (d == 0) return 0;
        return scale == 0 ? Double.POSITIVE_INFINITY : d / scale;
    }
}
