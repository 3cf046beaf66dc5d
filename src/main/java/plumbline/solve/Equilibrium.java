package plumbline.solve;

import java.util.HashMap;
import java.util.Map;
import plumbline.model.LoadCase;
import plumbline.model.Member;
import plumbline.model.Model;
import plumbline.model.Node;
import plumbline.model.NodeLoad;

/**
 * The equilibrium check run on every solution, whichever engine made it: each member must
 * balance its end forces against its loads, and each node its applied loads, its reaction
 * and the forces of the members framing into it. The residual is the largest imbalance
 * relative to the largest force (moments divided by the model's extent) in play.
 */
public final class Equilibrium {

    private Equilibrium() {
    }

    /** Node loads of a load case or a factored set of cases, global {Fx, Fy, Mz} per node. */
    public static Map<String, double[]> nodeLoads(Model model, Map<String, Double> factors) {
        Map<String, double[]> out = new HashMap<>();
        for (var f : factors.entrySet()) {
            LoadCase c = model.loadCase(f.getKey());
            for (NodeLoad nl : c.nodeLoads()) {
                double[] a = out.computeIfAbsent(nl.node(), k -> new double[3]);
                a[0] += f.getValue() * nl.fxN();
                a[1] += f.getValue() * nl.fyN();
                a[2] += f.getValue() * nl.mzNm();
            }
        }
        return out;
    }

    public static double residual(Model model, Solution s, Map<String, double[]> nodeLoads) {
        double lc = model.extentM();
        Map<String, double[]> sum = new HashMap<>();
        double scale = 0, worst = 0;
        for (var e : nodeLoads.entrySet()) {
            double[] a = sum.computeIfAbsent(e.getKey(), k -> new double[3]);
            for (int i = 0; i < 3; i++) a[i] += e.getValue()[i];
            scale = Math.max(scale, Math.max(Math.hypot(e.getValue()[0], e.getValue()[1]), Math.abs(e.getValue()[2]) / lc));
        }
        for (var e : s.reactions().entrySet()) {
            double[] a = sum.computeIfAbsent(e.getKey(), k -> new double[3]);
            for (int i = 0; i < 3; i++) a[i] += e.getValue()[i];
            scale = Math.max(scale, Math.max(Math.hypot(e.getValue()[0], e.getValue()[1]), Math.abs(e.getValue()[2]) / lc));
        }
        double[] memberResidual = new double[s.members().size()];
        int idx = 0;
        for (var e : s.members().entrySet()) {
            Member m = model.member(e.getKey());
            MemberSolution ms = e.getValue();
            double[] f = ms.endForcesLocal();
            double[] d = MemberActions.direction(model, m);
            double cx = d[0], cy = d[1], len = model.lengthM(m);
            double[] r = ms.actions().resultantAboutStart();
            double rx = f[0] + f[3] + r[0], ry = f[1] + f[4] + r[1], rm = f[2] + f[5] + f[4] * len + r[2];
            memberResidual[idx++] = Math.max(Math.hypot(rx, ry), Math.abs(rm) / lc);
            scale = Math.max(scale, Math.max(Math.max(Math.hypot(f[0], f[1]), Math.hypot(f[3], f[4])),
                    Math.max(Math.abs(f[2]), Math.abs(f[5])) / lc));
            scale = Math.max(scale, Math.max(Math.hypot(r[0], r[1]), Math.abs(r[2]) / lc));
            // the member pushes on its nodes with the opposite of the forces on its ends
            double[] ai = sum.computeIfAbsent(m.from(), k -> new double[3]);
            ai[0] -= f[0] * cx - f[1] * cy;
            ai[1] -= f[0] * cy + f[1] * cx;
            ai[2] -= f[2];
            double[] aj = sum.computeIfAbsent(m.to(), k -> new double[3]);
            aj[0] -= f[3] * cx - f[4] * cy;
            aj[1] -= f[3] * cy + f[4] * cx;
            aj[2] -= f[5];
        }
        for (double v : memberResidual) worst = Math.max(worst, v);
        // A floor for load cases that strain nothing (a settlement of a determinate structure):
        // forces below 1e-5 of those that would strain the stiffest member by the
        // largest displacement over the model's extent are rounding, not imbalance.
        double ea = 0, u = 0;
        for (Member m : model.members().values()) ea = Math.max(ea, model.materialOf(m).ePa() * model.sectionOf(m).areaM2());
        for (double[] d : s.displacements().values()) u = Math.max(u, Math.hypot(d[0], d[1]));
        scale = Math.max(scale, Math.max(1e-12 * ea, 1e-5 * ea * u / lc));
        for (var e : sum.entrySet()) {
            double[] a = e.getValue();
            worst = Math.max(worst, Math.max(Math.hypot(a[0], a[1]), Math.abs(a[2]) / lc));
        }
        if (scale == 0) return worst == 0 ? 0 : 1;
        return worst / scale;
    }

}
