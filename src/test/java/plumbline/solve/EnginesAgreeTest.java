package plumbline.solve;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Locale;
import java.util.Random;
import org.junit.jupiter.api.Test;
import plumbline.Models;
import plumbline.model.Model;
import plumbline.review.Agreement;
import plumbline.solve.force.ForceEngine;
import plumbline.solve.stiffness.StiffnessEngine;
import plumbline.statics.Determinacy;

/**
 * Property test over seeded random stable frames, trusses and pitched frames (inclined
 * members, loads of every kind and direction, loads and settlements at inclined and sprung
 * supports): the stiffness and force
 * engines, which share no solving code, agree to 1e-8 relative on reactions, end forces,
 * peaks and displacements, and each solution's equilibrium residual is below 1e-9.
 */
class EnginesAgreeTest {

    static final int MODELS = 200;

    @Test
    void randomFramesAndTrussesAgree() {
        Random rnd = new Random(20261201L);
        int solved = 0, tried = 0;
        while (solved < MODELS) {
            tried++;
            int kind = rnd.nextInt(3);
            String yaml = kind == 0 ? frame(rnd) : kind == 1 ? truss(rnd) : pitched(rnd);
            Model m = Models.yaml(yaml);
            assertEquals(List.of(), plumbline.validate.StructureCheck.check(m), "the generated model is valid input:\n" + yaml);
            if (Determinacy.of(m).classification() == Determinacy.Classification.UNSTABLE) continue;
            EngineResult s = new StiffnessEngine().solve(m), f = new ForceEngine().solve(m);
            assertTrue(s.stable() && f.stable(), yaml);
            double agree = Agreement.maxRelativeDifference(m, s.cases(), f.cases());
            assertTrue(agree < 1e-8, "engines differ by " + agree + " on\n" + yaml);
            for (Solution x : s.cases().values()) assertTrue(x.equilibriumResidual() < 1e-9, "stiffness residual " + x.name() + " " + x.equilibriumResidual() + "\n" + yaml);
            for (Solution x : f.cases().values()) assertTrue(x.equilibriumResidual() < 1e-9, "force residual\n" + yaml);
            solved++;
        }
        assertEquals(MODELS, solved);
        assertTrue(tried < 4 * MODELS, "the generator makes mostly stable models");
    }

    static String head() {
        return """
                format: plumbline/1
                units: {force: kN, length: m}
                materials: {s: {E: 200 GPa, density: 77 kN/m3, alpha: 1.2e-5 /degC}}
                sections:
                  A: {A: 0.008, I: 2.0e-4, depth: 0.45, material: s}
                  B: {A: 0.005, I: 6.0e-5, depth: 0.3, material: s}
                """;
    }

    static String f(double v) {
        return String.format(Locale.ROOT, "%.4f", v);
    }

    static String frame(Random rnd) {
        int bays = 1 + rnd.nextInt(3), storeys = 1 + rnd.nextInt(3);
        StringBuilder n = new StringBuilder("nodes:\n"), mem = new StringBuilder("members:\n"), sup = new StringBuilder("supports:\n");
        double[] xs = new double[bays + 1];
        for (int i = 1; i <= bays; i++) xs[i] = xs[i - 1] + 3 + 5 * rnd.nextDouble();
        double[] ys = new double[storeys + 1];
        for (int j = 1; j <= storeys; j++) ys[j] = ys[j - 1] + 2.5 + 2 * rnd.nextDouble();
        for (int j = 0; j <= storeys; j++) for (int i = 0; i <= bays; i++) n.append("  N").append(i).append('_').append(j)
                .append(": [").append(f(xs[i])).append(", ").append(f(ys[j])).append("]\n");
        String[] kinds = {"fixed", "pinned", "{fix: [ux, uy], springs: {rz: 5.0e4}}", "{fix: [uy], angle: 20 deg}"};
        for (int i = 0; i <= bays; i++) sup.append("  N").append(i).append("_0: ").append(kinds[i == 0 ? rnd.nextInt(3) : rnd.nextInt(4)]).append('\n');
        int k = 0;
        StringBuilder loads = new StringBuilder("loads:\n  D:\n    type: dead\n    self_weight: true\n    member_loads:\n");
        StringBuilder wind = new StringBuilder("  W:\n    type: wind\n    node_loads:\n");
        for (int j = 1; j <= storeys; j++) {
            for (int i = 0; i <= bays; i++) {
                String c = "C" + (k++);
                mem.append("  ").append(c).append(": {from: N").append(i).append('_').append(j - 1).append(", to: N").append(i).append('_').append(j)
                        .append(", section: A}\n");
            }
            for (int i = 0; i < bays; i++) {
                String b = "B" + (k++);
                String hinge = rnd.nextInt(5) == 0 ? ", hinge: end" : "";
                mem.append("  ").append(b).append(": {from: N").append(i).append('_').append(j).append(", to: N").append(i + 1).append('_').append(j)
                        .append(", section: B").append(hinge).append("}\n");
                loads.append("      - {member: ").append(b).append(", w: [").append(f(-5 - 10 * rnd.nextDouble())).append(", ")
                        .append(f(-5 - 10 * rnd.nextDouble())).append("], from: ").append(f(rnd.nextDouble())).append("}\n");
                loads.append("      - {member: ").append(b).append(", P: ").append(f(-20 * rnd.nextDouble())).append(", at: '")
                        .append(f(100 * rnd.nextDouble())).append("%'}\n");
                if (rnd.nextBoolean()) loads.append("      - {member: ").append(b).append(", M: ").append(f(10 * rnd.nextDouble() - 5))
                        .append(", at: '50%'}\n");
            }
            wind.append("      - {node: N0_").append(j).append(", Fx: ").append(f(5 + 10 * rnd.nextDouble())).append("}\n");
        }
        loads.append(wind);
        loads.append("  T:\n    type: thermal\n    temperatures:\n      - {member: B").append(storeys * (bays + 1) - 0 + 0 > 0 ? String.valueOf(bays + 1) : "0")
                .append(", uniform: 20 degC, gradient: 8 degC}\n");
        return head() + n + sup + mem + loads;
    }

    static String truss(Random rnd) {
        int panels = 2 + 2 * rnd.nextInt(3);
        double w = 2 + 2 * rnd.nextDouble(), h = 1.5 + 2 * rnd.nextDouble();
        StringBuilder n = new StringBuilder("nodes:\n"), mem = new StringBuilder("members:\n");
        for (int i = 0; i <= panels; i++) n.append("  L").append(i).append(": [").append(f(i * w)).append(", 0]\n");
        for (int i = 1; i < panels; i++) n.append("  U").append(i).append(": [").append(f(i * w)).append(", ").append(f(h)).append("]\n");
        int k = 0;
        for (int i = 0; i < panels; i++) mem.append("  T").append(k++).append(": {from: L").append(i).append(", to: L").append(i + 1).append(", section: A, truss: true}\n");
        for (int i = 1; i < panels - 1; i++) mem.append("  T").append(k++).append(": {from: U").append(i).append(", to: U").append(i + 1).append(", section: A, truss: true}\n");
        mem.append("  T").append(k++).append(": {from: L0, to: U1, section: B, truss: true}\n");
        mem.append("  T").append(k++).append(": {from: U").append(panels - 1).append(", to: L").append(panels).append(", section: B, truss: true}\n");
        for (int i = 1; i < panels; i++) mem.append("  T").append(k++).append(": {from: L").append(i).append(", to: U").append(i).append(", section: B, truss: true}\n");
        for (int i = 1; i < panels - 1; i++) {
            boolean left = i < panels / 2;
            mem.append("  T").append(k++).append(": {from: ").append(left ? "U" + i : "L" + i).append(", to: ").append(left ? "L" + (i + 1) : "U" + (i + 1))
                    .append(", section: B, truss: true}\n");
        }
        if (panels >= 4 && rnd.nextBoolean()) mem.append("  T").append(k).append(": {from: L1, to: U2, section: B, truss: true}\n");
        String sup = "supports:\n  L0: pinned\n  L" + panels + ": " + (rnd.nextBoolean() ? "roller" : "pinned") + "\n";
        StringBuilder loads = new StringBuilder("loads:\n  P:\n    type: live\n    node_loads:\n");
        for (int i = 1; i < panels; i++) loads.append("      - {node: L").append(i).append(", Fy: ").append(f(-5 - 20 * rnd.nextDouble())).append("}\n");
        loads.append("      - {node: U1, Fx: ").append(f(10 * rnd.nextDouble())).append("}\n");
        loads.append("  S:\n    type: settlement\n    settlements:\n      - {node: L0, uy: -5 mm}\n");
        return head() + n + sup + mem + loads;
    }

    /**
     * A pitched portal with a random apex offset: inclined rafters, an inclined or sprung
     * support, node loads and couples at supported and free nodes, loads in every direction
     * and per plan, partial trapezoids, point loads and couples on members, hinges at either
     * end, settlements that translate and rotate, and a thermal gradient on a sloping member.
     */
    static String pitched(Random rnd) {
        double span = 6 + 6 * rnd.nextDouble(), eaves = 3 + 2 * rnd.nextDouble(), rise = 0.5 + 2.5 * rnd.nextDouble();
        double apex = span * (0.3 + 0.4 * rnd.nextDouble());
        String[] left = {"fixed", "pinned", "{fix: [ux, uy], springs: {rz: 2.0e4}}", "{fix: [ux, uy, rz], angle: 15 deg}"};
        String[] right = {"fixed", "pinned", "{fix: [uy], angle: " + f(10 + 30 * rnd.nextDouble()) + " deg}",
                "{fix: [uy], springs: {ux: 8.0e3}}", "{fix: [ux, uy, rz], angle: -20 deg}"};
        String[] dirs = {"y", "x", "local-y", "local-x", "gravity"};
        String[] hinges = {"", "", ", hinge: start", ", hinge: end", ", hinge: both"};
        String hingeR1 = hinges[rnd.nextInt(hinges.length)], hingeR2 = rnd.nextInt(4) == 0 ? ", hinge: end" : "";
        StringBuilder y = new StringBuilder(head());
        y.append("nodes: {A: [0, 0], B: [0, ").append(f(eaves)).append("], C: [").append(f(apex)).append(", ").append(f(eaves + rise))
                .append("], D: [").append(f(span)).append(", ").append(f(eaves)).append("], E: [").append(f(span)).append(", 0]}\n");
        int e = rnd.nextInt(right.length);
        y.append("supports: {A: ").append(left[rnd.nextInt(left.length)]).append(", E: ").append(right[e]).append("}\n");
        y.append("members:\n  C1: {from: A, to: B, section: A}\n  R1: {from: B, to: C, section: B").append(hingeR1)
                .append("}\n  R2: {from: D, to: C, section: B").append(hingeR2).append("}\n  C2: {from: E, to: D, section: A}\n");
        y.append("loads:\n  G:\n    type: dead\n    self_weight: true\n    member_loads:\n");
        for (String m : new String[]{"R1", "R2", "C1", "C2"}) {
            String dir = dirs[rnd.nextInt(dirs.length)];
            boolean plan = dir.equals("gravity") || dir.equals("y") ? rnd.nextBoolean() : false;
            y.append("      - {member: ").append(m).append(", w: [").append(f(-1 - 4 * rnd.nextDouble())).append(", ").append(f(-1 - 4 * rnd.nextDouble()))
                    .append("], from: '").append(f(40 * rnd.nextDouble())).append("%', to: '").append(f(60 + 40 * rnd.nextDouble()))
                    .append("%', dir: ").append(dir).append(plan ? ", per: plan" : "").append("}\n");
            y.append("      - {member: ").append(m).append(", P: ").append(f(-10 * rnd.nextDouble())).append(", at: '").append(f(100 * rnd.nextDouble()))
                    .append("%', dir: ").append(dirs[rnd.nextInt(dirs.length)]).append("}\n");
            if (rnd.nextBoolean()) y.append("      - {member: ").append(m).append(", M: ").append(f(8 * rnd.nextDouble() - 4)).append(", at: '")
                    .append(f(100 * rnd.nextDouble())).append("%'}\n");
        }
        y.append("    node_loads:\n");
        for (String n : new String[]{"A", "B", "C", "D", "E"}) {
            // no couple at the apex: both rafters may be hinged there, and a pin cannot take a couple (refused on input)
            if (rnd.nextBoolean()) y.append("      - {node: ").append(n).append(", Fx: ").append(f(10 * rnd.nextDouble() - 5)).append(", Fy: ")
                    .append(f(-10 * rnd.nextDouble())).append(n.equals("C") ? "" : ", Mz: " + f(6 * rnd.nextDouble() - 3)).append("}\n");
        }
        y.append("      - {node: D, Fx: -2.5}\n");
        y.append("  T:\n    type: thermal\n    temperatures:\n      - {member: R").append(1 + rnd.nextInt(2))
                .append(", uniform: ").append(f(30 * rnd.nextDouble() - 10)).append(" degC, gradient: ").append(f(20 * rnd.nextDouble() - 10)).append(" degC}\n");
        // settle E in the directions it restrains: all three when fixed, ux and uy when pinned, uy otherwise
        y.append("  S:\n    type: settlement\n    settlements:\n      - {node: E, uy: ").append(f(-8 * rnd.nextDouble())).append(" mm");
        if (e == 0 || e == 1 || e == 4) y.append(", ux: ").append(f(4 * rnd.nextDouble() - 2)).append(" mm");
        if (e == 0 || e == 4) y.append(", rz: ").append(f(0.004 * rnd.nextDouble() - 0.002)).append(" rad");
        y.append("}\n");
        y.append("      - {node: A, uy: ").append(f(-5 * rnd.nextDouble())).append(" mm}\n");
        return y.toString();
    }
}
