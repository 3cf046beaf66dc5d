package plumbline.statics;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import plumbline.Models;
import plumbline.model.Model;

/**
 * Every figure of the claimed-reaction check against statics by hand, to the last digit:
 * sums, residual ratios, which sums were checked, the note's words, and the tolerance at
 * its edge.
 *
 * <p>The beam: A (0, 0) pinned, B (8, 0) roller, 40 kN down at 2 m from A and 10 kN to the
 * right at node B. By hand: R_B = 40 x 2 / 8 = 10 kN, R_A = 30 kN, A_x = -10 kN; the sum of
 * the load magnitudes is 50 kN and the model's extent (its diagonal) 8 m.
 */
class ClaimedEquilibriumHandTest {

    static Model beam(String reactions) {
        return Models.yaml(Models.HEAD + """
                nodes: {A: [0, 0], B: [8, 0]}
                supports: {A: pinned, B: roller}
                members: {M1: {from: A, to: B, section: G}}
                loads:
                  D:
                    type: dead
                    member_loads:
                      - {member: M1, P: -40, at: 2}
                    node_loads:
                      - {node: B, Fx: 10}
                claims:
                  reactions:
                """ + reactions);
    }

    static ClaimedEquilibrium check(Model m, double tolerance) {
        List<ClaimedEquilibrium> r = ClaimedEquilibrium.check(m, ClaimedEquilibrium.factorsByName(m, m.combinations()), tolerance);
        assertEquals(1, r.size());
        return r.get(0);
    }

    @Test
    void theHandReactionsBalanceExactly() {
        ClaimedEquilibrium r = check(beam("""
                    - {node: A, combo: D, Fx: -10, Fy: 30}
                    - {node: B, combo: D, Fy: 10}
                """), 1e-12);
        assertTrue(r.balanced());
        assertEquals("A", r.referenceNode());
        assertEquals(0, r.sumFxN(), 1e-9);
        assertEquals(0, r.sumFyN(), 1e-9);
        assertEquals(0, r.sumMomentNm(), 1e-9);
        assertTrue(r.checkedFx() && r.checkedFy() && r.checkedMoment());
        assertEquals(List.of(), r.missing());
        assertEquals("", r.note());
    }

    @Test
    void anOverstatedReactionGivesItsOwnResidualsAndFailsJustPastTheTolerance() {
        // R_B claimed 12 instead of 10: sum Fy = +2 kN, 2/50 = 0.04; moment about A = 8 x 12 - 2 x 40 = +16 kN*m,
        // 16 / (50 x 8) = 0.04
        Model m = beam("""
                    - {node: A, combo: D, Fx: -10, Fy: 30}
                    - {node: B, combo: D, Fy: 12}
                """);
        ClaimedEquilibrium r = check(m, 0.04);
        assertEquals(0, r.sumFxN(), 1e-9);
        assertEquals(2000, r.sumFyN(), 1e-9);
        assertEquals(16000, r.sumMomentNm(), 1e-9);
        assertEquals(0, r.relFx(), 1e-15);
        assertEquals(0.04, r.relFy(), 1e-15);
        assertEquals(0.04, r.relMoment(), 1e-15);
        assertTrue(r.balanced(), "a residual equal to the tolerance passes");
        assertFalse(check(m, 0.0399).balanced());
    }

    @Test
    void aHorizontalSlipIsJudgedOnTheXSum() {
        // A_x claimed -8 instead of -10: sum Fx = +2 kN, 2/50 = 0.04; the moment about A is untouched (A is on the line)
        Model m = beam("""
                    - {node: A, combo: D, Fx: -8, Fy: 30}
                    - {node: B, combo: D, Fy: 10}
                """);
        ClaimedEquilibrium r = check(m, 0.04);
        assertEquals(2000, r.sumFxN(), 1e-9);
        assertEquals(0.04, r.relFx(), 1e-15);
        assertEquals(0, r.sumMomentNm(), 1e-9);
        assertTrue(r.balanced());
        assertFalse(check(m, 0.0399).balanced());
    }

    @ParameterizedTest(name = "{0}")
    @CsvSource(delimiter = '|', textBlock = """
            A Fx missing     | {node: A, combo: D, Fy: 30}  | A.Fx       | false | true  | not claimed: A.Fx; the y sum was checked
            A Fy missing     | {node: A, combo: D, Fx: -10} | A.Fy       | true  | false | not claimed: A.Fy; the x sum was checked
            both missing     | {node: B, combo: D, Fy: 0}   | A.Fx, A.Fy | false | false | not claimed: A.Fx, A.Fy; no sum could be checked
            """)
    void aSumIsCheckedOnlyWhenEverySupportThatReactsInItIsClaimed(String name, String claimA, String missing, boolean x,
                                                                   boolean y, String note) {
        // B is claimed 10 throughout (0 in the last row): the unchecked sums are far out, yet they cannot unbalance the set
        String b = claimA.contains("node: B") ? "" : "    - {node: B, combo: D, Fy: 10}\n";
        ClaimedEquilibrium r = check(beam("    - " + claimA + "\n" + b), 1e-9);
        assertEquals(List.of(missing.split(", ")), r.missing(), name);
        assertEquals(x, r.checkedFx(), name);
        assertEquals(y, r.checkedFy(), name);
        assertFalse(r.checkedMoment(), name + ": the moment needs every component");
        assertEquals(note, r.note(), name);
        assertTrue(r.balanced(), name + ": only checked sums can unbalance");
    }

    @Test
    void anUncheckedSumHidesNothingInTheCheckedOne() {
        // A_x missing, R_B claimed 12: the y sum is checked and is 2 kN out
        ClaimedEquilibrium r = check(beam("""
                    - {node: A, combo: D, Fy: 30}
                    - {node: B, combo: D, Fy: 12}
                """), 0.01);
        assertFalse(r.checkedFx());
        assertEquals(0.2, r.relFx(), 1e-15, "the x sum is still reported: 10/50");
        assertFalse(r.balanced());
    }

    @Test
    void aHorizontalReactionAboveTheReferenceCarriesALeverArm() {
        // A (0, 0) pinned; B (4, 3) held horizontally only; 10 kN down at B.
        // Moments about A: -3 B_x + 4 x (-10) = 0 gives B_x = -40/3; then A_x = +40/3, A_y = 10.
        Model m = Models.yaml(Models.HEAD + """
                nodes: {A: [0, 0], B: [4, 3]}
                supports: {A: pinned, B: {fix: [ux]}}
                members: {M1: {from: A, to: B, section: G}}
                loads:
                  D:
                    type: dead
                    node_loads:
                      - {node: B, Fy: -10}
                claims:
                  reactions:
                    - {node: A, combo: D, Fx: 13.333333333333334, Fy: 10}
                    - {node: B, combo: D, Fx: -13.333333333333334}
                """);
        ClaimedEquilibrium r = check(m, 1e-9);
        assertEquals(0, r.sumMomentNm(), 1e-6);
        assertTrue(r.balanced());
        assertEquals(List.of(), r.missing(), "B reacts in x only, so its Fy is not asked for");
    }

    @Test
    void aFixedBaseMomentEntersTheMomentSum() {
        // cantilever fixed at A, 20 kN down at the tip B (5, 0): A_y = 20, M_A = +100 kN*m (ccw)
        String body = Models.HEAD + """
                nodes: {A: [0, 0], B: [5, 0]}
                supports: {A: fixed}
                members: {M1: {from: A, to: B, section: G}}
                loads:
                  D:
                    type: dead
                    node_loads:
                      - {node: B, Fy: -20}
                claims:
                  reactions:
                    - {node: A, combo: D, Fx: 0, Fy: 20, Mz: MZ}
                """;
        assertTrue(check(Models.yaml(body.replace("MZ", "100")), 1e-9).balanced());
        // the moment with its sign turned: -100 - 100 = -200 kN*m, over 20 kN x 5 m = 2.0
        ClaimedEquilibrium wrong = check(Models.yaml(body.replace("MZ", "-100")), 0.005);
        assertEquals(-200000, wrong.sumMomentNm(), 1e-6);
        assertEquals(2.0, wrong.relMoment(), 1e-12);
        assertFalse(wrong.balanced());
    }

    @Test
    void anEnvelopeOrAPatternCaseIsNotSummed() {
        Model env = beam("    - {node: A, combo: envelope, Fx: -10, Fy: 99}\n");
        ClaimedEquilibrium r = check(env, 0.005);
        assertEquals("not checked: envelope is an envelope, not one set of loads", r.note());
        assertTrue(r.balanced());
        assertFalse(r.checkedFy());
        Model pattern = Models.yaml(Models.HEAD + """
                nodes: {A: [0, 0], B: [8, 0]}
                supports: {A: pinned, B: roller}
                members: {M1: {from: A, to: B, section: G}}
                loads:
                  L:
                    type: live
                    pattern: true
                    member_loads:
                      - {member: M1, w: -5}
                claims:
                  reactions:
                    - {node: A, combo: L, Fx: 0, Fy: 99}
                """);
        ClaimedEquilibrium p = check(pattern, 0.005);
        assertTrue(p.note().startsWith("not checked: it holds a pattern-loaded case"), p.note());
        assertTrue(p.balanced());
    }

    @ParameterizedTest(name = "{0}")
    @CsvSource(delimiter = '|', textBlock = """
            pinned                          | pinned                         | true  | true  | false
            fixed                           | fixed                          | true  | true  | true
            roller                          | roller                         | false | true  | false
            horizontal restraint            | '{fix: [ux]}'                  | true  | false | false
            roller on a 30 deg slope        | '{fix: [uy], angle: 30 deg}'   | true  | true  | false
            roller turned a right angle     | '{fix: [uy], angle: 90 deg}'   | true  | false | false
            x restraint turned a right angle| '{fix: [ux], angle: 90 deg}'   | false | true  | false
            rotation only                   | '{fix: [rz]}'                  | false | false | true
            """)
    void theGlobalComponentsASupportCanExert(String name, String support, boolean x, boolean y, boolean m) {
        // a restraint along the local axis turned by angle t acts along (cos t, sin t) or (-sin t, cos t)
        Model model = Models.yaml(Models.HEAD + "nodes: {A: [0, 0], B: [8, 0]}\nsupports: {A: fixed, B: " + support
                + "}\nmembers: {M1: {from: A, to: B, section: G}}\n");
        assertArrayEquals(new boolean[]{x, y, m}, ClaimedEquilibrium.globalComponents(model.supports().get("B")), name);
    }

    @Test
    void momentsAreTakenAboutTheFirstSupportWhereverItIs() {
        // the same beam moved to A (10, 2), B (18, 2): the hand reactions still balance, about A, in every sum;
        // moments about the origin instead would be off by 2 x 10 kN (Fx at A) and 10 x 40 kN of the loads
        Model m = Models.yaml(Models.HEAD + """
                nodes: {A: [10, 2], B: [18, 2]}
                supports: {A: pinned, B: roller}
                members: {M1: {from: A, to: B, section: G}}
                loads:
                  D:
                    type: dead
                    member_loads:
                      - {member: M1, P: -40, at: 2}
                    node_loads:
                      - {node: B, Fx: 10}
                claims:
                  reactions:
                    - {node: A, combo: D, Fx: -10, Fy: 30}
                    - {node: B, combo: D, Fy: 10}
                """);
        ClaimedEquilibrium r = check(m, 1e-12);
        assertEquals(0, r.sumMomentNm(), 1e-9);
        assertTrue(r.balanced());
    }

    @Test
    void withNoLoadTheClaimedReactionsSetTheScale() {
        // a fixed-ended beam whose support B settles: no load, reactions that balance each other
        // (R = 12 EI d / L^3 = 11.111 kN, M = 6 EI d / L^2 = 33.333 kN*m for EI = 20,000 kN*m2, d = 10 mm, L = 6 m);
        // 1 N out of balance against 22 kN of claimed reactions is within 0.5%
        Model m = Models.yaml(Models.HEAD + """
                nodes: {A: [0, 0], B: [6, 0]}
                supports: {A: fixed, B: fixed}
                members: {M1: {from: A, to: B, section: G}}
                loads:
                  S: {type: other, settlements: [{node: B, uy: -10 mm}]}
                claims:
                  reactions:
                    - {node: A, combo: S, Fx: 0, Fy: 11.1111111, Mz: 33.3333333}
                    - {node: B, combo: S, Fx: 0, Fy: -11.1101111, Mz: 33.3333333}
                """);
        ClaimedEquilibrium r = check(m, ClaimedEquilibrium.DEFAULT_TOLERANCE);
        assertEquals(1.0, r.sumFyN(), 1e-6);
        assertEquals(1.0 / (2 * 11111.1111 - 1), r.relFy(), 1e-9, "scaled by the claimed reactions' magnitude");
        assertTrue(r.balanced());
    }
}
