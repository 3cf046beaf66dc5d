package plumbline.review;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;
import plumbline.Models;
import plumbline.model.Model;
import plumbline.solve.stiffness.StiffnessEngine;

/**
 * Explanations of a whole claim set, each on a claim set with one planted, realistic slip.
 * The claimed numbers are statics by hand for the slipped model (formulas from any
 * structural analysis text, e.g. simple beam R = wL/2 and M = wL^2/8, fixed-ended beam
 * M = wL^2/12 at the ends and wL^2/24 at midspan (AISC Manual Table 3-23, cases 1 and 15,
 * from memory)); the explanation must name the slip and cover every flagged claim.
 */
class ExplanationsTest {

    /** Simple beam, L = 6 m, dead 10 kN/m, live 5 kN/m, ULS = 1.35 D + 1.5 L (w = 21 kN/m: R = 63 kN, M = 94.5 kN*m). */
    static final String SIMPLE = Models.HEAD + """
            nodes: {A: [0, 0], B: [6, 0]}
            supports: {A: pinned, B: roller}
            members: {M1: {from: A, to: B, section: G}}
            """;

    static Review review(String model, String claims) {
        Model m = Models.yaml(model + claims);
        return Review.of(Analysis.of(m, List.of(new StiffnessEngine())), new TolerancePolicy(Double.NaN), new StiffnessEngine());
    }

    static Explanation first(Review r) {
        assertFalse(r.explanations().isEmpty(), "no explanation found");
        return r.explanations().get(0);
    }

    static void everyFlaggedClaimCovered(Review r) {
        for (ClaimResult c : r.claims()) {
            if (c.status() == ClaimResult.Status.OK) continue;
            assertTrue(c.explanation() > 0, c.claim().id() + " is not covered");
            assertTrue(c.diagnosis().startsWith("E" + c.explanation() + ": "), c.diagnosis());
        }
    }

    static final String DL = """
            loads:
              D: {type: dead, member_loads: [{member: M1, w: -10}]}
              L: {type: live, member_loads: [{member: M1, w: -5}]}
            combinations: {ULS: {D: 1.35, L: 1.5}}
            """;

    @Test
    void everyClaimTwiceTheComputedValueAndTheReactionsTwiceTheLoad() {
        // a tributary width doubled: every number twice, R = 126, M = 189; the claimed reactions sum to 2 x 126
        Review r = review(SIMPLE + DL, """
                claims:
                  reactions:
                    - {node: A, combo: ULS, Fy: 126}
                    - {node: B, combo: ULS, Fy: 126}
                  members:
                    - {member: M1, combo: ULS, M_max: 189}
                """);
        Explanation e = first(r);
        assertTrue(e.allOkAfter());
        assertEquals(3, e.explains().size());
        assertTrue(e.sentence().contains("2.00 times"), e.sentence());
        assertTrue(e.sentence().contains("load take-down"), e.sentence());
        everyFlaggedClaimCovered(r);
    }

    @Test
    void reactionsTenPercentOverWithMomentsRight() {
        // R = 1.1 x 63 = 69.3 kN claimed, M = 94.5 kN*m right
        Review r = review(SIMPLE + DL, """
                claims:
                  reactions:
                    - {node: A, combo: ULS, Fy: 69.3}
                    - {node: B, combo: ULS, Fy: 69.3}
                  members:
                    - {member: M1, combo: ULS, M_max: 94.5}
                """);
        Explanation e = first(r);
        assertTrue(e.allOkAfter());
        assertTrue(e.sentence().startsWith("the reactions are 1.10 times"), e.sentence());
        assertTrue(e.sentence().contains("load take-down"), e.sentence());
    }

    @Test
    void beamBuiltInAtBothEndsCheckedAsSimplySupported() {
        // fixed-fixed, w = 10 kN/m on 6 m: claims of the simple beam, M_max = 45, M_min = 0, end moments 0
        Review r = review(Models.HEAD + """
                nodes: {A: [0, 0], B: [6, 0]}
                supports: {A: fixed, B: fixed}
                members: {M1: {from: A, to: B, section: G}}
                loads: {D: {type: dead, member_loads: [{member: M1, w: -10}]}}
                """, """
                claims:
                  reactions:
                    - {node: A, combo: D, Fy: 30}
                    - {node: A, combo: D, Mz: 0}
                    - {node: B, combo: D, Mz: 0}
                  members:
                    - {member: M1, combo: D, M_max: 45}
                    - {member: M1, combo: D, M_min: 0}
                """);
        Explanation e = first(r);
        assertTrue(e.allOkAfter());
        assertTrue(e.sentence().contains("every fixed support taken as pinned (A, B)"), e.sentence());
        assertEquals(4, e.explains().size());
        everyFlaggedClaimCovered(r);
    }

    @Test
    void aLoadOnTheWrongSpan() {
        // two 6 m spans, 60 kN at midspan: by the three-moment equation M_B = -3PL/32 = -33.75 kN*m;
        // with the load on span BC: R_A = -5.625, R_B = 41.25, R_C = 24.375 kN (on AB: A and C swap)
        Review r = review(Models.HEAD + """
                nodes: {A: [0, 0], B: [6, 0], C: [12, 0]}
                supports: {A: pinned, B: roller, C: roller}
                members: {M1: {from: A, to: B, section: G}, M2: {from: B, to: C, section: G}}
                loads: {P: {type: live, member_loads: [{member: M1, P: -60, at: 3}]}}
                """, """
                claims:
                  reactions:
                    - {node: A, combo: P, Fy: -5.625}
                    - {node: B, combo: P, Fy: 41.25}
                    - {node: C, combo: P, Fy: 24.375}
                """);
        Explanation e = first(r);
        assertTrue(e.allOkAfter());
        assertTrue(e.sentence().contains("on member M2 instead of M1"), e.sentence());
        assertEquals(List.of("R-A-P-Fy", "R-C-P-Fy"), e.explains());
    }

    @Test
    void momentsGivenHoggingPositive() {
        // fixed-fixed, w = 10 kN/m on 6 m: M = +15 at midspan, -30 at the ends; hogging-positive: M_max 30, M_min -15
        Review r = review(Models.HEAD + """
                nodes: {A: [0, 0], B: [6, 0]}
                supports: {A: fixed, B: fixed}
                members: {M1: {from: A, to: B, section: G}}
                loads: {D: {type: dead, member_loads: [{member: M1, w: -10}]}}
                """, """
                claims:
                  reactions:
                    - {node: A, combo: D, Fy: 30}
                  members:
                    - {member: M1, combo: D, M_max: 30}
                    - {member: M1, combo: D, M_min: -15}
                """);
        Explanation e = first(r);
        assertTrue(e.allOkAfter());
        assertTrue(e.sentence().startsWith("the moments are given hogging-positive"), e.sentence());
    }

    @Test
    void selfWeightCountedTwice() {
        // steel 78.5 kN/m3 x 0.01 m2 = 0.785 kN/m; twice: w = 10 + 1.57 = 11.57 kN/m, R = 34.71 kN, M = 52.065 kN*m
        Review r = review(Models.HEAD.replace("{s: {E: 200 GPa}}", "{s: {E: 200 GPa, density: 78.5 kN/m3}}") + """
                nodes: {A: [0, 0], B: [6, 0]}
                supports: {A: pinned, B: roller}
                members: {M1: {from: A, to: B, section: G}}
                loads: {D: {type: dead, self_weight: true, member_loads: [{member: M1, w: -10}]}}
                """, """
                claims:
                  reactions:
                    - {node: A, combo: D, Fy: 34.71}
                    - {node: B, combo: D, Fy: 34.71}
                  members:
                    - {member: M1, combo: D, M_max: 52.065}
                """);
        assertTrue(r.explanations().stream().anyMatch(e -> e.allOkAfter() && e.sentence().startsWith("self-weight counted twice")),
                r.explanations().toString());
        // the named change ranks before the scale fitted to the claims, which explains as much
        Explanation e = first(r);
        assertTrue(e.sentence().startsWith("self-weight counted twice"), e.sentence());
    }

    @Test
    void aCaseLeftOutOfOneCombination() {
        // 1.2 D + 1.0 W + 1.0 L with w_D = 10, w_W = 2, w_L = 5: w = 19 (R 57, M 85.5); without W: 17 (R 51, M 76.5)
        Review r = review(SIMPLE + """
                loads:
                  D: {type: dead, member_loads: [{member: M1, w: -10}]}
                  W: {type: wind, member_loads: [{member: M1, w: -2}]}
                  L: {type: live, member_loads: [{member: M1, w: -5}]}
                combinations: {C1: {D: 1.2, W: 1.0, L: 1.0}, C2: {D: 1.0, W: 1.0}}
                """, """
                claims:
                  reactions:
                    - {node: A, combo: C1, Fy: 51}
                    - {node: A, combo: C2, Fy: 36}
                  members:
                    - {member: M1, combo: C1, M_max: 76.5}
                """);
        Explanation e = first(r);
        assertTrue(e.allOkAfter());
        assertEquals("load case W left out of combination C1", e.sentence());
        assertEquals(List.of("R-A-C1-Fy", "M-M1-C1-M_max"), e.explains());
    }

    @Test
    void anEnvelopeClaimedFromTheUnfactoredLoads() {
        // unfactored D + L: w = 15, M = 67.5, R = 45 (factored: 94.5 and 63)
        Review r = review(SIMPLE + """
                loads:
                  D: {type: dead, member_loads: [{member: M1, w: -10}]}
                  L: {type: live, member_loads: [{member: M1, w: -5}]}
                combinations: {ULS1: {D: 1.35, L: 1.5}, ULS2: {D: 1.35}}
                """, """
                claims:
                  reactions:
                    - {node: A, combo: envelope, Fy: 45}
                  members:
                    - {member: M1, combo: envelope, M_max: 67.5}
                """);
        assertTrue(r.explanations().stream().anyMatch(e -> e.allOkAfter()
                && e.sentence().startsWith("the load factors left out of every combination")), r.explanations().toString());
        everyFlaggedClaimCovered(r);
    }

    @Test
    void momentsCopiedInKiloNewtonCentimetres() {
        // M = 45 kN*m under D and 22.5 under L: 4500 and 2250 kN*cm, written as kN*m
        Review r = review(SIMPLE + DL, """
                claims:
                  members:
                    - {member: M1, combo: D, M_max: 4500}
                    - {member: M1, combo: L, M_max: 2250}
                  reactions:
                    - {node: A, combo: D, Fy: 30}
                """);
        Explanation e = first(r);
        assertTrue(e.allOkAfter());
        assertTrue(e.sentence().startsWith("every moment claimed is the computed value expressed in kN*cm"), e.sentence());
    }

    @Test
    void rightClaimsNeedNoExplanation() {
        Review r = review(SIMPLE + DL, """
                claims:
                  reactions:
                    - {node: A, combo: ULS, Fy: 63}
                  members:
                    - {member: M1, combo: ULS, M_max: 94.5}
                """);
        assertTrue(r.explanations().isEmpty());
        for (ClaimResult c : r.claims()) assertEquals(ClaimResult.Status.OK, c.status());
    }

    @Test
    void aNumberNoChangeReproducesIsLeftUnexplained() {
        // R_A = 63 kN; 47.3 is no unit, sign, line, case or support slip of it
        Review r = review(SIMPLE + DL, """
                claims:
                  reactions:
                    - {node: A, combo: ULS, Fy: 47.3}
                    - {node: B, combo: ULS, Fy: 63}
                """);
        ClaimResult a = r.claims().get(0);
        assertEquals(ClaimResult.Status.MISMATCH, a.status());
        assertEquals(0, a.explanation());
        assertNull(a.diagnosis(), a.diagnosis());
        assertTrue(r.explanations().stream().noneMatch(e -> e.explains().contains(a.claim().id())), r.explanations().toString());
    }
}
