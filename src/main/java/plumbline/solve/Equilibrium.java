package plumbline.solve;

import java.util.HashMap;
import java.util.Iterator;
import java.util.Map;
import plumbline.model.LoadCase;
import plumbline.model.Member;
import plumbline.model.Model;
import plumbline.model.NodeLoad;
import plumbline.statics.AppliedLoads;

/**
 * The equilibrium check run on every solution, whichever engine made it: each member must
 * balance its end forces against its loads, the loads its member functions carry must have
 * the resultant of the model's loads on it, and each node must balance its applied loads,
 * its reaction and the forces of the members framing into it. The residual is the largest imbalance
 * relative to the largest force (moments divided by the model's extent) in play.
 */
public final class Equilibrium {

    /**
     * A residual above this fraction of the largest force in play means the solution is not
     * in equilibrium with the loads as the model gives them: the verdict is {@code unbalanced}.
     * Correct solutions balance to about 1e-12; a slip in the load description or the end
     * forces leaves a residual of the order of the load it touches.
     */
    public static final double TOLERANCE = 1e-6;

    private Equilibrium() {
    }

    /** The resultant of a member without loads (never written to). */
    private static final double[] NO_LOAD = new double[3];

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

    /**
     * The largest imbalance of solution {@code s} under the load cases {@code factors} (case
     * name to factor), relative to the largest force in play (moments divided by the model's
     * extent). Each member's loads are resolved straight from the model's load records
     * (global components, positions along the member, per-plan intensities, self-weight) by
     * statics ({@link AppliedLoads#memberResultants}), not by the load description the engines
     * share, so a slip there shows as an imbalance rather than being balanced by both alike.
     */
    public static double residual(Model model, Solution s, Map<String, Double> factors) {
        return residual(model, s.displacements(), s.reactions(), s.members(), factors);
    }

    /** The same, of a solution's parts before the solution is formed (a superposition forms it once, with its residual). */
    static double residual(Model model, Map<String, double[]> displacements, Map<String, double[]> reactions,
                           Map<String, MemberSolution> members, Map<String, Double> factors) {
        double lc = model.extentM();
        Map<String, double[]> memberLoads = AppliedLoads.memberResultants(model, factors);
        Map<String, double[]> sum = new HashMap<>();
        double scale = 0, worst = 0;
        for (var e : nodeLoads(model, factors).entrySet()) {
            double[] a = sum.computeIfAbsent(e.getKey(), k -> new double[3]);
            for (int i = 0; i < 3; i++) a[i] += e.getValue()[i];
            scale = Math.max(scale, magnitude(e.getValue(), lc));
        }
        for (var e : reactions.entrySet()) {
            double[] a = sum.computeIfAbsent(e.getKey(), k -> new double[3]);
            for (int i = 0; i < 3; i++) a[i] += e.getValue()[i];
            scale = Math.max(scale, magnitude(e.getValue(), lc));
        }
        // the solution's members are read in step with the model's (the engines list them in its order),
        // looked up by name only where the order differs
        Iterator<String> modelNames = model.members().keySet().iterator();
        Iterator<Member> modelMembers = model.members().values().iterator();
        for (var e : members.entrySet()) {
            Member m = Model.inStep(modelNames, modelMembers, e.getKey(), model.members());
            Model.Placement at = model.placementOf(m);
            double dx = at.dxM(), dy = at.dyM(), cx = at.cx(), cy = at.cy();
            MemberSolution f = e.getValue(); // its end forces read in place (no copy)
            // end forces on the member, local {fx, fy} turned to global {gx, gy} = {fx cx - fy cy, fx cy + fy cx}
            double[] gi = {f.endForceLocal(0) * cx - f.endForceLocal(1) * cy, f.endForceLocal(0) * cy + f.endForceLocal(1) * cx,
                    f.endForceLocal(2)};
            double[] gj = {f.endForceLocal(3) * cx - f.endForceLocal(4) * cy, f.endForceLocal(3) * cy + f.endForceLocal(4) * cx,
                    f.endForceLocal(5)};
            double[] load = memberLoads.getOrDefault(m.name(), NO_LOAD);
            // the member balances: forces, and moments about its start (the end force acts at dx, dy)
            double rx = gi[0] + gj[0] + load[0], ry = gi[1] + gj[1] + load[1];
            double rm = gi[2] + gj[2] + dx * gj[1] - dy * gj[0] + load[2];
            worst = Math.max(worst, Math.max(Math.hypot(rx, ry), Math.abs(rm) / lc));
            // the loads the member functions carry (the description the peaks are drawn from) must be
            // the model's own loads: their resultant, local {fx, fy, m about the start} turned to global
            double[] carried = e.getValue().actions().resultantAboutStart();
            double cgx = carried[0] * cx - carried[1] * cy, cgy = carried[0] * cy + carried[1] * cx;
            worst = Math.max(worst, Math.max(Math.hypot(cgx - load[0], cgy - load[1]), Math.abs(carried[2] - load[2]) / lc));
            scale = Math.max(scale, Math.max(magnitude(gi, lc), magnitude(gj, lc)));
            scale = Math.max(scale, magnitude(load, lc));
            // the member pushes on its nodes with the opposite of the forces on its ends
            double[] ai = sum.computeIfAbsent(m.from(), k -> new double[3]);
            double[] aj = sum.computeIfAbsent(m.to(), k -> new double[3]);
            for (int i = 0; i < 3; i++) {
                ai[i] -= gi[i];
                aj[i] -= gj[i];
            }
        }
        // A floor for load cases that strain nothing (a settlement of a determinate structure):
        // forces below 1e-5 of those that would strain the stiffest member by the
        // largest displacement over the model's extent are rounding, not imbalance.
        double ea = model.largestAxialStiffnessN(), u = 0;
        for (double[] d : displacements.values()) u = Math.max(u, Math.hypot(d[0], d[1]));
        scale = Math.max(scale, Math.max(1e-12 * ea, 1e-5 * ea * u / lc));
        for (double[] a : sum.values()) worst = Math.max(worst, magnitude(a, lc));
        if (scale == 0) return worst == 0 ? 0 : 1;
        return worst / scale;
    }

    private static double magnitude(double[] forceAndMoment, double lengthScaleM) {
        return Math.max(Math.hypot(forceAndMoment[0], forceAndMoment[1]), Math.abs(forceAndMoment[2]) / lengthScaleM);
    }

}
