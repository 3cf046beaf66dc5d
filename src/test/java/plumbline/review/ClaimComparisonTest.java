package plumbline.review;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;
import plumbline.Models;
import plumbline.model.Model;
import plumbline.solve.force.ForceEngine;
import plumbline.solve.stiffness.StiffnessEngine;

/**
 * How claims are compared: the envelope, the tolerance bands and the absolute floor, on a
 * simple beam whose values are statics by hand. L = 6 m, EI = 20000 kN*m2; D is 10 kN/m
 * down, U 4 kN/m up. C1 = D: w = 10 down, R = 30 kN, M = wL^2/8 = 45 kN*m, deflection
 * 5wL^4/384EI = 8.4375 mm, end rotation wL^3/24EI = 4.5e-3 rad. C2 = 0.9D + 1.5U: 3 kN/m
 * down, M = 13.5. C3 = D + 3U: 2 kN/m up, M = -9 kN*m, R = -6 kN, rotation at A +9e-4 rad.
 */
class ClaimComparisonTest {

    static Review review(String claims) {
        Model m = Models.yaml(Models.HEAD + """
                nodes: {A: [0, 0], B: [6, 0]}
                supports: {A: pinned, B: roller}
                members: {M1: {from: A, to: B, section: G}}
                loads:
                  D: {type: dead, member_loads: [{member: M1, w: -10}]}
                  U: {type: wind, member_loads: [{member: M1, w: 4}]}
                combinations:
                  C1: {D: 1.0}
                  C2: {D: 0.9, U: 1.5}
                  C3: {D: 1.0, U: 3.0}
                claims:
                """ + claims);
        return Review.of(Analysis.of(m, List.of(new StiffnessEngine(), new ForceEngine())), TolerancePolicy.none());
    }

    static ClaimResult only(Review r) {
        assertEquals(1, r.claims().size());
        return r.claims().get(0);
    }

    @Test
    void envelopeTakesTheMostSevereValueOfItsKind() {
        Review r = review("""
                  tolerance: {default: 0.1%}
                  members:
                    - {member: M1, combo: envelope, M_max: 45, M_min: -9, M_abs: 45, V_abs: 30, V_min: -30, deflection: 8.4375 mm}
                  reactions:
                    - {node: A, combo: envelope, Fy: 30}
                    - {node: B, combo: envelope, Fy: -6}
                  displacements:
                    - {node: A, combo: envelope, rz: -4.5e-3}
                    - {node: A, combo: envelope, rz: 9.0e-4}
                """);
        for (ClaimResult c : r.claims()) assertEquals(ClaimResult.Status.OK, c.status(), c.claim().id() + " computed " + c.computed());
        for (ClaimResult c : r.claims()) {
            String expected = c.claim().quantity() == plumbline.model.Quantity.M_MIN || c.claim().valueInternal() == -6e3
                    || c.claim().valueInternal() == 9.0e-4 ? "C3" : "C1";
            assertEquals(expected, c.governing(), c.claim().id());
        }
        assertEquals(Verdict.OK, r.verdict());
    }

    @Test
    void bandsOkMarginalMismatchAtTheirEdges() {
        // M = 45 at a 5% tolerance: 47.2 is ok, 47.3 and 49.4 marginal (within 2 x 5%), 49.6 mismatch
        String[] claims = {"47.2", "47.3", "49.4", "49.6", "42.8", "40.4"};
        ClaimResult.Status[] expected = {ClaimResult.Status.OK, ClaimResult.Status.MARGINAL, ClaimResult.Status.MARGINAL,
                ClaimResult.Status.MISMATCH, ClaimResult.Status.OK, ClaimResult.Status.MISMATCH};
        for (int i = 0; i < claims.length; i++) {
            ClaimResult c = only(review("  members: [{member: M1, combo: C1, M_max: " + claims[i] + "}]\n"));
            assertEquals(expected[i], c.status(), claims[i]);
            assertEquals(Math.abs(Double.parseDouble(claims[i]) - 45) / 45, c.relativeDifference(), 1e-9);
            assertEquals(0.05, c.tolerance().relative(), 0.0);
        }
        assertEquals(Verdict.MARGINAL, review("  members: [{member: M1, combo: C1, M_max: 48}]\n").verdict());
        assertEquals(Verdict.MISMATCH, review("  members: [{member: M1, combo: C1, M_max: 48}, {member: M1, combo: C1, M_min: 0.5}]\n")
                .verdict());
    }

    @Test
    void aClaimedZeroAgainstRoundingIsOkAndAgainstAValueIsNot() {
        // Fx at A is zero by statics: claims of 0 and of 0.05 kN (under 0.2% of the 30 kN largest reaction) are ok
        ClaimResult zero = only(review("  reactions: [{node: A, combo: C1, Fx: 0}]\n"));
        assertEquals(ClaimResult.Status.OK, zero.status());
        assertEquals(0.002 * 30e3, zero.absoluteFloor(), 1e-6, "the floor is 0.2% of the largest reaction in the set");
        ClaimResult small = only(review("  reactions: [{node: A, combo: C1, Fx: 0.05}]\n"));
        assertEquals(ClaimResult.Status.OK, small.status(), "under the floor");
        ClaimResult big = only(review("  reactions: [{node: A, combo: C1, Fx: 0.5}]\n"));
        assertEquals(ClaimResult.Status.MISMATCH, big.status(), "0.5 kN is 8 floors: a real discrepancy");
        assertEquals(Double.POSITIVE_INFINITY, big.relativeDifference());
        ClaimResult right = only(review("  reactions: [{node: A, combo: C1, Fy: 30}]\n"));
        assertEquals(0.0, right.relativeDifference(), 1e-12);
        assertEquals(30e3, right.computedForce(), 1e-6, "the force method's value stands beside it");
    }

    @Test
    void aDeflectionBeyondSpanOverFiftyIsWarned() {
        Model soft = Models.yaml(Models.HEAD.replace("I: 1.0e-4", "I: 1.0e-7") + """
                nodes: {A: [0, 0], B: [6, 0]}
                supports: {A: pinned, B: roller}
                members: {M1: {from: A, to: B, section: G}}
                loads: {D: {type: dead, member_loads: [{member: M1, w: -10}]}}
                """);
        Review r = Review.of(Analysis.of(soft, List.of(new StiffnessEngine())), TolerancePolicy.none());
        // 5 x 10e3 x 6^4 / (384 x 2e4) = 8.4 m: span/0.711
        assertTrue(r.warnings().stream().anyMatch(w -> w.subject().equals("member M1, D")
                && w.message().equals("deflection = span/0.711") && w.rule().contains("span/50")), r.warnings().toString());
        Review stiff = review("  reactions: [{node: A, combo: C1, Fy: 30}]\n");
        assertTrue(stiff.warnings().stream().noneMatch(w -> w.message().startsWith("deflection")), stiff.warnings().toString());
    }
}
