package plumbline.solve;

import plumbline.model.Quantity;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Random;
import org.junit.jupiter.api.RepeatedTest;
import org.junit.jupiter.api.RepetitionInfo;
import plumbline.Models;
import plumbline.model.Model;
import plumbline.solve.force.ForceEngine;
import plumbline.solve.stiffness.StiffnessEngine;
import plumbline.statics.Determinacy;
import plumbline.units.Units;

/**
 * Metamorphic tests on seeded random stable frames: the same physics written differently
 * must give the same answers. A change of units (kN and m against kip and ft), a rigid
 * rotation and translation, a mirror, renaming and reordering, and splitting a member at
 * an intermediate node; linearity, superposition and Maxwell-Betti reciprocity (the
 * displacement at j under a unit load at i equals that at i under a unit load at j).
 */
class MetamorphicTest {

    static final double TOL = 1e-8;

    /** A frame described abstractly, written as YAML under a transformation. */
    record Spec(List<double[]> nodes, List<int[]> members, List<String> supports, List<double[]> nodeLoads,
                List<double[]> memberLoads) {
    }

    static Spec random(Random rnd) {
        while (true) {
            int bays = 1 + rnd.nextInt(2), storeys = 1 + rnd.nextInt(2);
            List<double[]> nodes = new ArrayList<>();
            for (int j = 0; j <= storeys; j++) {
                for (int i = 0; i <= bays; i++) nodes.add(new double[]{i * (3 + rnd.nextDouble() * 3) + j * 0.3, j * (2.5 + rnd.nextDouble())});
            }
            List<int[]> members = new ArrayList<>();
            int w = bays + 1;
            for (int j = 1; j <= storeys; j++) {
                for (int i = 0; i <= bays; i++) members.add(new int[]{(j - 1) * w + i, j * w + i, rnd.nextInt(6) == 0 ? 1 : 0});
                for (int i = 0; i < bays; i++) members.add(new int[]{j * w + i, j * w + i + 1, rnd.nextInt(6) == 0 ? 2 : 0});
            }
            List<String> supports = new ArrayList<>();
            for (int i = 0; i <= bays; i++) supports.add(rnd.nextBoolean() ? "fixed" : "pinned");
            List<double[]> nl = new ArrayList<>();
            for (int j = 1; j <= storeys; j++) nl.add(new double[]{j * w, 5 + 10 * rnd.nextDouble(), -10 * rnd.nextDouble(), 5 * rnd.nextDouble()});
            List<double[]> ml = new ArrayList<>();
            for (int k = 0; k < members.size(); k++) {
                if (rnd.nextBoolean()) ml.add(new double[]{k, -2 - 8 * rnd.nextDouble(), 0.1 + 0.8 * rnd.nextDouble(), -10 * rnd.nextDouble()});
            }
            Spec s = new Spec(nodes, members, supports, nl, ml);
            if (Determinacy.of(Models.yaml(yaml(s, 0, 0, 0, false, false, 1.0, null))).classification()
                    != Determinacy.Classification.UNSTABLE) {
                return s;
            }
        }
    }

    static String f(double v) {
        return String.format(Locale.ROOT, "%.17g", v);
    }

    /**
     * @param theta rigid rotation (rad) about the origin, then a translation (dx, dy) in m
     * @param mirror reflect x to -x
     * @param us write in kip and ft
     * @param scale factor on every load
     * @param order member order and names (null: as generated)
     */
    static String yaml(Spec s, double theta, double dx, double dy, boolean mirror, boolean us, double scale, int[] order) {
        double lf = us ? Units.FOOT_IN_M : 1.0, ff = us ? 1e3 * Units.LBF_IN_N / 1e3 : 1.0; // length, force (kN per unit)
        StringBuilder sb = new StringBuilder("format: plumbline/1\nunits: {force: " + (us ? "kip" : "kN") + ", length: " + (us ? "ft" : "m") + "}\n");
        sb.append("materials: {s: {E: 200 GPa}}\nsections: {G: {A: 0.01 m2, I: 2.0e-4 m4, material: s}}\nnodes:\n");
        double c = Math.cos(theta), sn = Math.sin(theta);
        for (int i = 0; i < s.nodes().size(); i++) {
            double x = s.nodes().get(i)[0] * (mirror ? -1 : 1), y = s.nodes().get(i)[1];
            double xr = c * x - sn * y + dx, yr = sn * x + c * y + dy;
            sb.append("  N").append(i).append(": [").append(f(xr / lf)).append(", ").append(f(yr / lf)).append("]\n");
        }
        sb.append("supports:\n");
        for (int i = 0; i < s.supports().size(); i++) {
            sb.append("  N").append(i).append(": ").append(s.supports().get(i).equals("fixed") ? "fixed" : "pinned").append('\n');
        }
        sb.append("members:\n");
        int n = s.members().size();
        int[] ord = order == null ? java.util.stream.IntStream.range(0, n).toArray() : order;
        for (int k : ord) {
            int[] m = s.members().get(k);
            sb.append("  ").append(order == null ? "M" + k : "R" + (n - k)).append(": {from: N").append(m[0]).append(", to: N")
                    .append(m[1]).append(", section: G").append(m[2] == 1 ? ", hinge: start" : m[2] == 2 ? ", hinge: end" : "").append("}\n");
        }
        sb.append("loads:\n  P:\n    type: other\n    node_loads:\n");
        for (double[] l : s.nodeLoads()) {
            double fx = l[1] * (mirror ? -1 : 1), fy = l[2], mz = l[3] * (mirror ? -1 : 1);
            double fxr = c * fx - sn * fy, fyr = sn * fx + c * fy;
            sb.append("      - {node: N").append((int) l[0]).append(", Fx: ").append(f(scale * fxr / ff)).append(", Fy: ")
                    .append(f(scale * fyr / ff)).append(", Mz: ").append(f(scale * mz / (ff * lf))).append("}\n");
        }
        sb.append("    member_loads:\n");
        for (double[] l : s.memberLoads()) {
            int k = (int) l[0];
            String name = order == null ? "M" + k : "R" + (n - k);
            // local-y loads turn with the member; a mirror turns local y over
            double sign = mirror ? -1 : 1;
            sb.append("      - {member: ").append(name).append(", w: ").append(f(sign * scale * l[1] / (ff / lf)))
                    .append(", dir: local-y}\n");
            sb.append("      - {member: ").append(name).append(", P: ").append(f(sign * scale * l[3] / ff)).append(", at: '")
                    .append(f(100 * l[2])).append("%', dir: local-y}\n");
        }
        return sb.toString();
    }

    /** Both methods meet every relation: the stiffness method and the force method (its own member functions). */
    static final List<Engine> ENGINES = List.of(new StiffnessEngine(), new ForceEngine());

    static Solution solve(Engine engine, String yaml) {
        EngineResult r = engine.solve(Models.yaml(yaml));
        return r.cases().get("P");
    }

    static double scaleOf(Solution s) {
        double m = 0;
        for (double[] r : s.reactions().values()) m = Math.max(m, Math.max(Math.hypot(r[0], r[1]), Math.abs(r[2]) / 10));
        return m;
    }

    static void close(double expected, double actual, double scale, String what) {
        assertEquals(expected, actual, TOL * scale, what);
    }

    @RepeatedTest(25)
    void sameAnswersWhateverTheWriting(RepetitionInfo info) {
        for (Engine engine : ENGINES) sameAnswersWhateverTheWriting(engine, info);
    }

    private static void sameAnswersWhateverTheWriting(Engine engine, RepetitionInfo info) {
        Random rnd = new Random(9000L + info.getCurrentRepetition());
        Spec s = random(rnd);
        Solution base = solve(engine, yaml(s, 0, 0, 0, false, false, 1.0, null));
        double sc = scaleOf(base);
        // units: kip and ft
        Solution us = solve(engine, yaml(s, 0, 0, 0, false, true, 1.0, null));
        for (var e : base.reactions().entrySet()) {
            for (int k = 0; k < 3; k++) close(e.getValue()[k], us.reactions().get(e.getKey())[k], sc * (k == 2 ? 10 : 1), "units " + e.getKey());
        }
        // rigid rotation and translation: reactions turn with the model, member forces and moments do not change
        double th = 0.3 + rnd.nextDouble();
        Solution rot = solve(engine, yaml(s, th, 7.5, -3.25, false, false, 1.0, null));
        for (var e : base.reactions().entrySet()) {
            double[] a = e.getValue(), b = rot.reactions().get(e.getKey());
            close(Math.cos(th) * a[0] - Math.sin(th) * a[1], b[0], sc, "rotated Fx");
            close(Math.sin(th) * a[0] + Math.cos(th) * a[1], b[1], sc, "rotated Fy");
            close(a[2], b[2], sc * 10, "rotated Mz");
        }
        for (var e : base.members().entrySet()) {
            Peaks p = e.getValue().peaks(), q = rot.members().get(e.getKey()).peaks();
            for (Quantity k : new Quantity[]{Quantity.N_MAX, Quantity.N_MIN, Quantity.V_MAX, Quantity.V_MIN, Quantity.M_MAX,
                    Quantity.M_MIN, Quantity.DEFLECTION}) {
                close(p.value(k), q.value(k), sc * 10, "rotated " + e.getKey() + " " + k);
            }
        }
        // mirror: Fx and Mz change sign; N is unchanged; |M| and the deflection are unchanged
        Solution mir = solve(engine, yaml(s, 0, 0, 0, true, false, 1.0, null));
        for (var e : base.reactions().entrySet()) {
            double[] a = e.getValue(), b = mir.reactions().get(e.getKey());
            close(-a[0], b[0], sc, "mirror Fx");
            close(a[1], b[1], sc, "mirror Fy");
            close(-a[2], b[2], sc * 10, "mirror Mz");
        }
        for (var e : base.members().entrySet()) {
            Peaks p = e.getValue().peaks(), q = mir.members().get(e.getKey()).peaks();
            close(p.value(Quantity.N_MAX), q.value(Quantity.N_MAX), sc, "mirror N");
            close(p.value(Quantity.M_ABS), q.value(Quantity.M_ABS), sc * 10, "mirror |M|");
            close(p.value(Quantity.DEFLECTION), q.value(Quantity.DEFLECTION), sc, "mirror deflection");
        }
        // renaming and reordering members
        int n = s.members().size();
        List<Integer> perm = new ArrayList<>();
        for (int k = 0; k < n; k++) perm.add(k);
        Collections.shuffle(perm, rnd);
        Solution ren = solve(engine, yaml(s, 0, 0, 0, false, false, 1.0, perm.stream().mapToInt(Integer::intValue).toArray()));
        for (int k = 0; k < n; k++) {
            Peaks p = base.members().get("M" + k).peaks(), q = ren.members().get("R" + (n - k)).peaks();
            close(p.value(Quantity.M_MAX), q.value(Quantity.M_MAX), sc * 10, "renamed M_max");
            close(p.value(Quantity.V_MIN), q.value(Quantity.V_MIN), sc, "renamed V_min");
        }
        // linearity
        Solution twice = solve(engine, yaml(s, 0, 0, 0, false, false, 2.5, null));
        for (var e : base.reactions().entrySet()) {
            for (int k = 0; k < 3; k++) close(2.5 * e.getValue()[k], twice.reactions().get(e.getKey())[k], 2.5 * sc * 10, "linearity");
        }
    }

    @RepeatedTest(10)
    void splittingAMemberChangesNothing(RepetitionInfo info) {
        for (Engine engine : ENGINES) splittingAMemberChangesNothing(engine, info);
    }

    private static void splittingAMemberChangesNothing(Engine engine, RepetitionInfo info) {
        double len = 4 + info.getCurrentRepetition(), w = -7, p = -12;
        String whole = """
                format: plumbline/1
                units: {force: kN, length: m}
                materials: {s: {E: 200 GPa}}
                sections: {G: {A: 0.01, I: 2.0e-4, material: s}}
                nodes: {A: [0, 0], B: [%1$s, 0], C: [%1$s, 3]}
                supports: {A: fixed, C: pinned}
                members: {M1: {from: A, to: B, section: G}, M2: {from: B, to: C, section: G}}
                loads:
                  P: {type: other, member_loads: [{member: M1, w: %2$s}, {member: M1, P: %3$s, at: %4$s}]}
                """.formatted(f(len), f(w), f(p), f(0.7 * len));
        double cut = 0.4 * len;
        String split = """
                format: plumbline/1
                units: {force: kN, length: m}
                materials: {s: {E: 200 GPa}}
                sections: {G: {A: 0.01, I: 2.0e-4, material: s}}
                nodes: {A: [0, 0], X: [%5$s, 0], B: [%1$s, 0], C: [%1$s, 3]}
                supports: {A: fixed, C: pinned}
                members: {M1a: {from: A, to: X, section: G}, M1b: {from: X, to: B, section: G}, M2: {from: B, to: C, section: G}}
                loads:
                  P: {type: other, member_loads: [{members: [M1a, M1b], w: %2$s}, {member: M1b, P: %3$s, at: %4$s}]}
                """.formatted(f(len), f(w), f(p), f(0.7 * len - cut), f(cut));
        Solution a = solve(engine, whole), b = solve(engine, split);
        double sc = scaleOf(a);
        for (var e : a.reactions().entrySet()) for (int k = 0; k < 3; k++) close(e.getValue()[k], b.reactions().get(e.getKey())[k], sc * 10, "split reactions");
        Peaks p1 = a.members().get("M1").peaks(), pa = b.members().get("M1a").peaks(), pb = b.members().get("M1b").peaks();
        close(p1.value(Quantity.M_MAX), Math.max(pa.value(Quantity.M_MAX), pb.value(Quantity.M_MAX)), sc * 10, "split M_max");
        close(p1.value(Quantity.M_MIN), Math.min(pa.value(Quantity.M_MIN), pb.value(Quantity.M_MIN)), sc * 10, "split M_min");
        close(p1.value(Quantity.DEFLECTION), Math.max(pa.value(Quantity.DEFLECTION), pb.value(Quantity.DEFLECTION)), 1e-3, "split deflection");
    }

    @RepeatedTest(10)
    void superpositionAndReciprocity(RepetitionInfo info) {
        for (Engine engine : ENGINES) superpositionAndReciprocity(engine, info);
    }

    private static void superpositionAndReciprocity(Engine engine, RepetitionInfo info) {
        Random rnd = new Random(777L + info.getCurrentRepetition());
        Spec s = random(rnd);
        String base = yaml(s, 0, 0, 0, false, false, 1.0, null);
        int nodes = s.nodes().size();
        int i = s.supports().size() + rnd.nextInt(nodes - s.supports().size()), j = s.supports().size() + rnd.nextInt(nodes - s.supports().size());
        int a = rnd.nextInt(2), b = rnd.nextInt(2);
        String[] comp = {"Fx", "Fy"};
        String cases = base.substring(0, base.indexOf("loads:")) + "loads:\n"
                + "  UI: {type: other, node_loads: [{node: N" + i + ", " + comp[a] + ": 1}]}\n"
                + "  UJ: {type: other, node_loads: [{node: N" + j + ", " + comp[b] + ": 1}]}\n"
                + "  BOTH: {type: other, node_loads: [{node: N" + i + ", " + comp[a] + ": 1}, {node: N" + j + ", " + comp[b] + ": 1}]}\n";
        Model m = Models.yaml(cases);
        EngineResult r = engine.solve(m);
        double dji = r.cases().get("UI").displacements().get("N" + j)[b], dij = r.cases().get("UJ").displacements().get("N" + i)[a];
        double scale = Math.max(Math.abs(dji), Math.abs(dij));
        assertEquals(dji, dij, 1e-9 * scale + 1e-300, "Maxwell-Betti");
        Solution both = r.cases().get("BOTH");
        Solution sum = Superposition.combine(m, "sum", Map.of(r.cases().get("UI"), 1.0, r.cases().get("UJ"), 1.0),
                engine.memberFunctions());
        for (var e : both.displacements().entrySet()) {
            for (int k = 0; k < 3; k++) {
                assertEquals(e.getValue()[k], sum.displacements().get(e.getKey())[k], 1e-9 * (scale + Math.abs(e.getValue()[k])) + 1e-300, "superposition");
            }
        }
    }
}
