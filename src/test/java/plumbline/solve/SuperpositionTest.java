package plumbline.solve;

import plumbline.model.Quantity;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.junit.jupiter.api.Test;
import plumbline.Models;
import plumbline.model.Model;
import plumbline.solve.force.ForceEngine;
import plumbline.solve.stiffness.StiffnessEngine;

/**
 * Superposition of linear-elastic solutions (small displacements): a combination
 * 1.5 D - 0.5 E of two solved cases must equal, in every displacement, reaction, end force
 * and member peak, the one case F written with every load of D times 1.5 and every load of
 * E times -0.5, solved directly. Every load kind takes part (uniform, trapezoidal over part,
 * point, couple, axial, per plan, node force and couple, thermal) so a slip in how any
 * of them is scaled or added shows.
 */
class SuperpositionTest {

    /** One load line per kind, with %s where the factored value goes. */
    static final String[] MEMBER_LOADS = {
            "{member: R1, w: [%s, %s], from: '10%%', to: '80%%', dir: gravity, per: plan}",
            "{member: R2, w: %s, dir: local-y}",
            "{member: C1, w: %s, dir: x}",
            "{member: R1, P: %s, at: '30%%', dir: local-x}",
            "{member: R2, P: %s, at: 1.5}",
            "{member: C2, M: %s, at: '40%%'}",
    };
    static final double[][] D = {{3, 5}, {-2}, {4}, {6}, {-9}, {7}};
    static final double[][] E = {{-1, 2}, {3}, {-5}, {-2}, {4}, {-3}};

    static String loads(String name, double kd, double ke, boolean withD, boolean withE) {
        StringBuilder y = new StringBuilder("  " + name + ":\n    type: other\n    member_loads:\n");
        for (int k = 0; k < MEMBER_LOADS.length; k++) {
            if (withD) y.append("      - ").append(fill(MEMBER_LOADS[k], D[k], kd)).append('\n');
            if (withE) y.append("      - ").append(fill(MEMBER_LOADS[k], E[k], ke)).append('\n');
        }
        y.append("    node_loads:\n");
        if (withD) y.append(String.format(Locale.ROOT, "      - {node: B, Fx: %.12g, Mz: %.12g}%n", 8 * kd, 2 * kd));
        if (withE) y.append(String.format(Locale.ROOT, "      - {node: D, Fy: %.12g, Mz: %.12g}%n", -6 * ke, -1 * ke));
        y.append("    temperatures:\n");
        if (withD) y.append(String.format(Locale.ROOT, "      - {member: R1, uniform: %.12g degC, gradient: %.12g degC}%n", 20 * kd, 10 * kd));
        if (withE) y.append(String.format(Locale.ROOT, "      - {member: R2, uniform: %.12g degC, gradient: %.12g degC}%n", -15 * ke, 6 * ke));
        return y.toString();
    }

    static String fill(String line, double[] values, double k) {
        Object[] v = new Object[values.length];
        for (int i = 0; i < values.length; i++) v[i] = String.format(Locale.ROOT, "%.12g", values[i] * k);
        return String.format(Locale.ROOT, line, v);
    }

    static Model model() {
        return Models.yaml("""
                format: plumbline/1
                units: {force: kN, length: m}
                materials: {s: {E: 200 GPa, alpha: 1.2e-5 /degC}}
                sections:
                  C: {A: 0.008, I: 2.0e-4, depth: 0.45, material: s}
                  R: {A: 0.005, I: 6.0e-5, depth: 0.3, material: s}
                nodes: {A: [0, 0], B: [0, 4], C: [4.5, 5.5], D: [10, 4], E: [10, 0]}
                supports: {A: fixed, E: pinned}
                members:
                  C1: {from: A, to: B, section: C}
                  R1: {from: B, to: C, section: R}
                  R2: {from: D, to: C, section: R}
                  C2: {from: E, to: D, section: C}
                loads:
                """ + loads("D", 1, 0, true, false) + loads("E", 0, 1, false, true) + loads("F", 1.5, -0.5, true, true));
    }

    static final Quantity[] PEAKS = {Quantity.N_MAX, Quantity.N_MIN, Quantity.V_MAX, Quantity.V_MIN, Quantity.M_MAX, Quantity.M_MIN,
            Quantity.DEFLECTION};

    @Test
    void aCombinationEqualsItsLoadsSolvedTogether() {
        Model m = model();
        for (Engine engine : List.of(new StiffnessEngine(), new ForceEngine())) {
            EngineResult r = engine.solve(m);
            assertTrue(r.stable(), engine.name());
            Map<Solution, Double> parts = new LinkedHashMap<>();
            parts.put(r.cases().get("D"), 1.5);
            parts.put(r.cases().get("E"), -0.5);
            Solution combined = Superposition.combine(m, "1.5D-0.5E", parts, engine.memberFunctions());
            Solution direct = r.cases().get("F");
            double scale = 0;
            for (MemberSolution ms : direct.members().values()) for (double f : ms.endForcesLocal()) scale = Math.max(scale, Math.abs(f));
            for (String node : m.nodes().keySet()) {
                for (int d = 0; d < 3; d++) {
                    double a = direct.displacements().get(node)[d];
                    assertEquals(a, combined.displacements().get(node)[d], 1e-9 * Math.max(1e-3, Math.abs(a)), engine.name() + " " + node + " " + d);
                }
            }
            for (String s : List.of("A", "E")) {
                for (int d = 0; d < 3; d++) {
                    assertEquals(direct.reactions().get(s)[d], combined.reactions().get(s)[d], 1e-9 * scale, engine.name() + " reaction " + s);
                }
            }
            for (String mem : m.members().keySet()) {
                MemberSolution a = direct.members().get(mem), b = combined.members().get(mem);
                for (int i = 0; i < 6; i++) assertEquals(a.endForcesLocal()[i], b.endForcesLocal()[i], 1e-9 * scale, mem + " end force " + i);
                for (Quantity q : PEAKS) {
                    double x = a.peaks().value(q);
                    double tol = q == Quantity.DEFLECTION ? 1e-9 * Math.max(1e-6, Math.abs(x)) : 1e-9 * scale;
                    assertEquals(x, b.peaks().value(q), tol, engine.name() + " " + mem + " " + q);
                }
            }
            assertTrue(combined.equilibriumResidual() < 1e-9, "the combination is in equilibrium: " + combined.equilibriumResidual());
        }
    }

    /**
     * A superposition reads each part's members in step with the model's and looks a member
     * up by name only where the part lists them in another order: a part listed backwards
     * (and one missing a member's entry in step) gives the very same combination, to the bit.
     */
    @Test
    void aPartListedInAnotherOrderGivesTheSameCombination() {
        Model m = model();
        EngineResult r = new StiffnessEngine().solve(m);
        Solution d = r.cases().get("D"), e = r.cases().get("E");
        Map<String, MemberSolution> backwards = new LinkedHashMap<>();
        List<String> names = new java.util.ArrayList<>(d.members().keySet());
        java.util.Collections.reverse(names);
        for (String n : names) backwards.put(n, d.members().get(n));
        Solution dBackwards = new Solution("D", d.displacements(), d.reactions(), backwards, d.equilibriumResidual());
        Map<Solution, Double> inOrder = new LinkedHashMap<>(), outOfOrder = new LinkedHashMap<>();
        inOrder.put(d, 1.5);
        inOrder.put(e, -0.5);
        outOfOrder.put(dBackwards, 1.5);
        outOfOrder.put(e, -0.5);
        Solution a = Superposition.combine(m, "C", inOrder, MemberFunctions.SHARED);
        Solution b = Superposition.combine(m, "C", outOfOrder, MemberFunctions.SHARED);
        assertEquals(List.copyOf(m.members().keySet()), List.copyOf(b.members().keySet()), "the combination lists the model's order");
        for (String mem : m.members().keySet()) {
            for (int i = 0; i < 6; i++) {
                assertEquals(a.members().get(mem).endForceLocal(i), b.members().get(mem).endForceLocal(i), 0.0, mem + " end force " + i);
            }
            for (Quantity q : PEAKS) assertEquals(a.members().get(mem).peaks().value(q), b.members().get(mem).peaks().value(q), 0.0, mem + " " + q);
        }
        assertEquals(a.equilibriumResidual(), b.equilibriumResidual(), 0.0);
        // the equilibrium check reads a solution's members in step with the model's too: listed backwards
        // they still balance (a member taken for another would leave an imbalance of the order of the loads)
        double backwardsResidual = Equilibrium.residual(m, dBackwards, Map.of("D", 1.0));
        assertTrue(backwardsResidual < 1e-12, "residual of the members listed backwards: " + backwardsResidual);
        assertEquals(Equilibrium.residual(m, d, Map.of("D", 1.0)), backwardsResidual, 1e-14);
        // and the combination is the one solved directly (so neither order is wrong the same way)
        Solution direct = r.cases().get("F");
        for (String mem : m.members().keySet()) {
            assertEquals(direct.members().get(mem).endForceLocal(2), b.members().get(mem).endForceLocal(2),
                    1e-9 * Math.max(1, Math.abs(direct.members().get(mem).endForceLocal(2))), mem);
        }
    }

    @Test
    void scalingAndAddingMemberActionsByHand() {
        MemberActions a = new MemberActions(6, List.of(new MemberActions.Linear(1, 3, 10, 20, 30, 40)),
                List.of(new MemberActions.Point(2, 5, 7)), List.of(new MemberActions.Couple(1, 3)), 1e-4, 2e-3);
        MemberActions twice = new MemberActions.Sum(6).add(a, -2).result();
        assertEquals(new MemberActions.Linear(1, 3, -20, -40, -60, -80), twice.distributed().get(0));
        assertEquals(new MemberActions.Point(2, -10, -14), twice.points().get(0));
        assertEquals(new MemberActions.Couple(1, -6), twice.couples().get(0));
        assertEquals(-2e-4, twice.thermalStrain(), 1e-18);
        assertEquals(-4e-3, twice.thermalCurvaturePerM(), 1e-18);
        MemberActions sum = new MemberActions.Sum(6).add(a, 1).add(twice, 1).result();
        assertEquals(List.of(a.distributed().get(0), twice.distributed().get(0)), sum.distributed());
        assertEquals(List.of(a.points().get(0), twice.points().get(0)), sum.points());
        assertEquals(List.of(a.couples().get(0), twice.couples().get(0)), sum.couples());
        assertEquals(-1e-4, sum.thermalStrain(), 1e-18);
        assertEquals(-2e-3, sum.thermalCurvaturePerM(), 1e-18);
        // the factored sum is, load by load and in order, each part's loads scaled by its factor (by hand)
        MemberActions b = new MemberActions(6, List.of(new MemberActions.Linear(0, 6, 1, 1, 2, 4)), List.of(),
                List.of(new MemberActions.Couple(4, -5)), -3e-4, 5e-3);
        MemberActions byHand = new MemberActions(6,
                List.of(new MemberActions.Linear(1, 3, 10 * 1.35, 20 * 1.35, 30 * 1.35, 40 * 1.35), new MemberActions.Linear(0, 6, -0.9, -0.9, -1.8, 4 * -0.9)),
                List.of(new MemberActions.Point(2, 5 * 1.35, 7 * 1.35)),
                List.of(new MemberActions.Couple(1, 3 * 1.35), new MemberActions.Couple(4, -5 * -0.9)),
                1e-4 * 1.35 + -3e-4 * -0.9, 2e-3 * 1.35 + 5e-3 * -0.9);
        assertEquals(byHand, new MemberActions.Sum(6).add(a, 1.35).add(b, -0.9).result());
        assertEquals(MemberActions.none(6), new MemberActions.Sum(6).result());
        assertTrue(MemberActions.none(6).isEmpty());
        assertFalse(new MemberActions(6, List.of(), List.of(), List.of(), 1e-4, 0).isEmpty(), "a thermal strain alone is a load");
        assertFalse(new MemberActions(6, List.of(), List.of(), List.of(), 0, 1e-4).isEmpty(), "a thermal curvature alone is a load");
        assertFalse(new MemberActions(6, List.of(), List.of(), List.of(new MemberActions.Couple(1, 3)), 0, 0).isEmpty());
    }
}
