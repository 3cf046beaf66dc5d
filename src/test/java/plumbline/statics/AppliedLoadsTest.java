package plumbline.statics;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Map;
import java.util.Random;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import plumbline.Models;
import plumbline.model.Model;
import plumbline.solve.EngineResult;
import plumbline.solve.Solution;
import plumbline.solve.stiffness.StiffnessEngine;

/**
 * Resultants of applied loads, by statics by hand on a member from A (0, 0) to B (4, 3)
 * (length 5 m, unit vector (0.8, 0.6)), one load of each kind per case; and, on seeded
 * random frames, the global equilibrium of the resultant with the stiffness method's
 * reactions (an independent route).
 */
class AppliedLoadsTest {

    static final Model MEMBER = Models.yaml("""
            format: plumbline/1
            units: {force: kN, length: m}
            materials: {s: {E: 200 GPa, density: 78.5 kN/m3}}
            sections: {G: {A: 0.01, I: 1.0e-4, material: s}}
            nodes: {A: [0, 0], B: [4, 3]}
            supports: {A: pinned, B: roller}
            members: {M1: {from: A, to: B, section: G}}
            loads:
              UY: {type: dead, member_loads: [{member: M1, w: -2}]}
              PLAN: {type: snow, member_loads: [{member: M1, w: 2, dir: gravity, per: plan}]}
              LY: {type: wind, member_loads: [{member: M1, w: 1, dir: local-y}]}
              PX: {type: other, member_loads: [{member: M1, P: 10, at: 2.5, dir: x}]}
              TRI: {type: other, member_loads: [{member: M1, w: [0, -6], from: 1, to: 3}]}
              CPL: {type: other, member_loads: [{member: M1, M: 7, at: 1}]}
              LXEND: {type: other, member_loads: [{member: M1, P: 5, at: 5, dir: local-x}]}
              SW: {type: dead, self_weight: true}
              NODE: {type: other, node_loads: [{node: B, Fx: 1, Fy: -2, Mz: 3}]}
            """);

    /**
     * case, Fx, Fy (kN) and moment about A (kN*m), by hand:
     * UY: 2 x 5 = 10 down at (2, 1.5): M = 2 x -10; PLAN: 2 per plan metre over 4 m = 8 down at x = 2;
     * LY: 5 kN along (-0.6, 0.8) at mid-length, (e x d) = 1, first moment 12.5; PX: 10 at (2, 1.5), M = -1.5 x 10;
     * TRI: 6 kN down, centroid 1 + 2 x 2/3 m along = x 1.8667; CPL: the couple; LXEND: along the member through A;
     * SW: 78.5 x 0.01 x 5 = 3.925 down at x = 2; NODE: at (4, 3): 4 x -2 - 3 x 1 + 3.
     */
    @ParameterizedTest(name = "{0}")
    @CsvSource({
            "UY, 0, -10, -20",
            "PLAN, 0, -8, -16",
            "LY, -3, 4, 12.5",
            "PX, 10, 0, -15",
            "TRI, 0, -6, -11.2",
            "CPL, 0, 0, 7",
            "LXEND, 4, 3, 0",
            "SW, 0, -3.925, -7.85",
            "NODE, 1, -2, -8",
    })
    void oneLoadOfEachKindByHand(String c, double fxKn, double fyKn, double mKnm) {
        for (double factor : new double[]{1.0, -1.5}) {
            AppliedLoads a = AppliedLoads.of(MEMBER, Map.of(c, factor), 0, 0);
            assertEquals(factor * fxKn * 1e3, a.fxN(), 1e-9, c + " Fx");
            assertEquals(factor * fyKn * 1e3, a.fyN(), 1e-9, c + " Fy");
            assertEquals(factor * mKnm * 1e3, a.momentNm(), 1e-6, c + " M about A");
            assertEquals(Math.abs(factor) * Math.hypot(fxKn, fyKn) * 1e3, a.magnitudeN(), 1e-9, c + " magnitude");
            // about B instead: M_B = M_A - (B - A) x F
            AppliedLoads b = AppliedLoads.of(MEMBER, Map.of(c, factor), 4, 3);
            assertEquals(factor * (mKnm - (4 * fyKn - 3 * fxKn)) * 1e3, b.momentNm(), 1e-6, c + " M about B");
        }
    }

    @Test
    void memberResultantsAreAboutTheMembersStartAndAbsentWhereNothingActs() {
        Map<String, double[]> r = AppliedLoads.memberResultants(MEMBER, Map.of("TRI", 2.0, "CPL", 1.0));
        assertEquals(List.of("M1"), List.copyOf(r.keySet()));
        assertEquals(0, r.get("M1")[0], 1e-9);
        assertEquals(-12e3, r.get("M1")[1], 1e-9);
        assertEquals((2 * -11.2 + 7) * 1e3, r.get("M1")[2], 1e-6);
        assertEquals(12e3, r.get("M1")[3], 1e-9, "magnitude: the couple adds no force");
        assertTrue(AppliedLoads.memberResultants(MEMBER, Map.of("NODE", 1.0)).isEmpty());
    }

    @Test
    void randomFramesBalanceTheirReactions() {
        Random rnd = new Random(42);
        for (int trial = 0; trial < 30; trial++) {
            double h = 3 + rnd.nextDouble() * 2, span = 4 + rnd.nextDouble() * 4, rise = rnd.nextDouble() * 2;
            String yaml = Models.HEAD.replace("materials: {s: {E: 200 GPa}}", "materials: {s: {E: 200 GPa, density: 77 kN/m3}}")
                    + "nodes: {A: [0, 0], B: [0, %s], C: [%s, %s], D: [%s, %s], E: [%s, 0]}\n".formatted(h, span / 2, h + rise, span, h, span)
                    + """
                    supports: {A: fixed, E: pinned}
                    members:
                      C1: {from: A, to: B, section: G}
                      R1: {from: B, to: C, section: G}
                      R2: {from: C, to: D, section: G}
                      C2: {from: E, to: D, section: G}
                    loads:
                      P:
                        type: other
                        self_weight: true
                        member_loads:
                          - {member: R1, w: %s, dir: gravity, per: plan}
                          - {member: R2, w: [%s, %s], from: 0.5, to: 2, dir: local-y}
                          - {member: C1, P: %s, at: 1.2, dir: x}
                          - {member: R1, M: %s, at: 0.7}
                          - {member: C2, w: %s, dir: local-x}
                        node_loads: [{node: C, Fx: %s, Fy: %s, Mz: %s}]
                    """.formatted(r(rnd), r(rnd), r(rnd), r(rnd), r(rnd), r(rnd), r(rnd), r(rnd), r(rnd));
            Model m = Models.yaml(yaml);
            EngineResult e = new StiffnessEngine().solve(m);
            Solution s = e.cases().get("P");
            AppliedLoads a = AppliedLoads.of(m, Map.of("P", 1.0), 0, 0);
            double fx = a.fxN(), fy = a.fyN(), mz = a.momentNm();
            for (var re : s.reactions().entrySet()) {
                var n = m.node(re.getKey());
                double[] v = re.getValue();
                fx += v[0];
                fy += v[1];
                mz += n.xM() * v[1] - n.yM() * v[0] + v[2];
            }
            double scale = a.magnitudeN();
            assertEquals(0, fx, 1e-9 * scale, "sum Fx, trial " + trial);
            assertEquals(0, fy, 1e-9 * scale, "sum Fy, trial " + trial);
            assertEquals(0, mz, 1e-9 * scale * 10, "sum M, trial " + trial);
            assertTrue(s.equilibriumResidual() < 1e-9, "member by member too: " + s.equilibriumResidual());
        }
    }

    private static String r(Random rnd) {
        return String.format(java.util.Locale.ROOT, "%.3f", rnd.nextGaussian() * 5);
    }
}
