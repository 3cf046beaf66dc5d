package plumbline.review;

import plumbline.model.Quantity;

import java.util.List;
import java.util.Map;
import plumbline.model.Member;
import plumbline.model.Model;
import plumbline.solve.Equilibrium;
import plumbline.solve.MemberSolution;
import plumbline.solve.Peaks;
import plumbline.solve.SideBySide;
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

    /**
     * Values below this fraction of the model's own force and length scales (largest EA,
     * extent) are taken as zero: a settlement of a determinate structure strains nothing,
     * and one engine's 1e-11 N of rounding against the other's exact 0 is agreement.
     */
    public static final double ZERO_FRACTION = 1e-12;

    /**
     * Above this largest relative difference the two methods are taken to disagree and the
     * verdict is {@code engines-disagree}. On every stable model of the test suite they agree
     * to about 1e-9 (rounding of two different factorizations); a thousand times that still
     * leaves a margin for a conditioned model, while any slip in the mechanics (a sign, a
     * factor, a misplaced load) moves results by far more than 1e-6.
     */
    public static final double TOLERANCE = 1e-6;

    public static double maxRelativeDifference(Model model, Map<String, Solution> a, Map<String, Solution> b) {
        return maxRelativeDifference(model, a, b, SideBySide.worth(model.members().size(), a.size()));
    }

    /** The same, its load sets read side by side ({@code sideBySide}) or one after another: the same figure. */
    static double maxRelativeDifference(Model model, Map<String, Solution> a, Map<String, Solution> b, boolean sideBySide) {
        double extent = model.extentM(), ea = model.largestAxialStiffnessN();
        // each load set is read on its own and the largest values of all are taken: a largest value is the
        // same whatever the order, so a large model's load sets are read side by side
        List<String> sets = List.copyOf(a.keySet());
        // force, moment, translation, rotation: the largest of each kind over every load set
        double[] scale = {ZERO_FRACTION * ea, ZERO_FRACTION * ea * extent, ZERO_FRACTION * extent, ZERO_FRACTION};
        for (double[] s : SideBySide.stream(sets, sideBySide).map(k -> scales(model, a.get(k), b.get(k), ea, extent)).toList()) {
            for (int i = 0; i < 4; i++) scale[i] = Math.max(scale[i], s[i]);
        }
        // a rotation is judged against the translations over the model's size too: where every node
        // rotation is zero (a beam fixed at both ends) one engine's 1e-18 rad is not a difference
        scale[3] = Math.max(scale[3], scale[2] / extent);
        double worst = 0;
        for (double w : SideBySide.stream(sets, sideBySide).map(k -> worst(a.get(k), b.get(k), scale)).toList()) {
            worst = Math.max(worst, w);
        }
        return worst;
    }

    /** The largest magnitudes of each kind (force, moment, translation, rotation) in one load set of both engines. */
    private static double[] scales(Model model, Solution s, Solution t, double ea, double extent) {
        double[] scale = new double[4];
        for (double[] d : s.displacements().values()) {
            // the same floor as the equilibrium check: rigid motion strains nothing
            scale[0] = Math.max(scale[0], 1e-5 * ea * Math.hypot(d[0], d[1]) / extent);
            scale[1] = Math.max(scale[1], 1e-5 * ea * Math.hypot(d[0], d[1]));
        }
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
                // end forces read in place (no copy per member and load set)
                scale[0] = Math.max(scale[0], Math.max(Math.max(Math.abs(m.endForceLocal(0)), Math.abs(m.endForceLocal(1))),
                        Math.max(Math.abs(m.endForceLocal(3)), Math.abs(m.endForceLocal(4)))));
                scale[1] = Math.max(scale[1], Math.max(Math.max(Math.abs(m.endForceLocal(2)), Math.abs(m.endForceLocal(5))),
                        m.peaks().value(Quantity.M_ABS)));
                scale[2] = Math.max(scale[2], m.peaks().deflection().value());
            }
        }
        // translations are also judged against the members' own elastic deformations |N| L/EA + |M| L^2/EI,
        // so that where nothing moves (a restrained temperature change) rounding is not a difference
        for (var ms : s.members().entrySet()) {
            Member mem = model.member(ms.getKey());
            double len = model.lengthM(mem), e = model.materialOf(mem).ePa();
            double axial = Math.abs(ms.getValue().peaks().value(Quantity.N_ABS)) * len / (e * model.sectionOf(mem).areaM2());
            double ei = e * model.sectionOf(mem).inertiaM4();
            double bending = Double.isFinite(ei) && ei > 0 ? ms.getValue().peaks().value(Quantity.M_ABS) * len * len / ei : 0;
            scale[2] = Math.max(scale[2], axial + bending);
        }
        return scale;
    }

    /** The largest relative difference between the engines in one load set, each kind against its scale. */
    private static double worst(Solution s, Solution t, double[] scale) {
        double worst = 0;
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
            MemberSolution f = m.getValue(), g = t.members().get(m.getKey());
            for (int k = 0; k < 6; k++) worst = Math.max(worst, rel(f.endForceLocal(k), g.endForceLocal(k), k % 3 == 2 ? scale[1] : scale[0]));
            Peaks p = f.peaks(), q = g.peaks();
            for (Quantity k : FORCES) worst = Math.max(worst, rel(p.value(k), q.value(k), scale[0]));
            for (Quantity k : MOMENTS) worst = Math.max(worst, rel(p.value(k), q.value(k), scale[1]));
            worst = Math.max(worst, rel(p.value(Quantity.DEFLECTION), q.value(Quantity.DEFLECTION), scale[2]));
        }
        return worst;
    }

    private static final Quantity[] FORCES = {Quantity.N_MAX, Quantity.N_MIN, Quantity.V_MAX, Quantity.V_MIN};
    private static final Quantity[] MOMENTS = {Quantity.M_MAX, Quantity.M_MIN};

    private static double rel(double x, double y, double scale) {
        double d = Math.abs(x - y);
        if (d == 0) return 0;
        return scale == 0 ? Double.POSITIVE_INFINITY : d / scale;
    }
}
