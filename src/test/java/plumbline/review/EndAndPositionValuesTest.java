package plumbline.review;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;
import plumbline.Models;
import plumbline.model.Model;
import plumbline.model.Quantity;
import plumbline.solve.stiffness.StiffnessEngine;

/**
 * Values at a member's ends and at a position (format reference section 4.1). Fixed-ended
 * beam, L = 6 m, w = 10 kN/m, EI = 20,000 kN*m2, by hand: M(x) = w(Lx - x^2)/2 - wL^2/12, so
 * M = -30 kN*m at both ends and M(1.5) = 33.75 - 30 = 3.75 kN*m; V = dM/dx = w(L/2 - x): +30
 * kN at the start, -30 kN at the end; midspan deflection wL^4/384EI = 1.6875 mm down (AISC
 * Manual Table 3-23 case 15, from memory).
 */
class EndAndPositionValuesTest {

    static final String FIXED = Models.HEAD + """
            nodes: {A: [0, 0], B: [6, 0]}
            supports: {A: fixed, B: fixed}
            members: {M1: {from: A, to: B, section: G}}
            loads: {D: {type: dead, member_loads: [{member: M1, w: -10}]}}
            """;

    static Review review(String claims) {
        Model m = Models.yaml(FIXED + claims);
        return Review.of(Analysis.of(m, List.of(new StiffnessEngine())), new TolerancePolicy(Double.NaN));
    }

    @Test
    void endValuesAndValuesAtAPositionAgainstTheFormulas() {
        Review r = review("""
                claims:
                  members:
                    - {member: M1, combo: D, M_start: -30, M_end: -30, V_start: 30, V_end: -30, N_start: 0}
                    - {member: M1, combo: D, at: 1.5, M: 3.75, V: 15}
                    - {member: M1, combo: D, at: 50%, deflection: -1.6875 mm, M: 15}
                """);
        java.util.Map<String, Double> expected = java.util.Map.of("M-M1-D-M_start", -30e3, "M-M1-D-M_end", -30e3,
                "M-M1-D-V_start", 30e3, "M-M1-D-V_end", -30e3, "M-M1-D-N_start", 0.0, "M-M1-D-M@1.5", 3.75e3,
                "M-M1-D-V@1.5", 15e3, "M-M1-D-deflection@3.0", -1.6875e-3, "M-M1-D-M@3.0", 15e3);
        assertEquals(expected.size(), r.claims().size());
        for (ClaimResult c : r.claims()) {
            double e = expected.get(c.claim().id());
            assertEquals(e, c.computed(), 1e-9 * Math.max(Math.abs(e), 1e-3), c.claim().id());
            assertEquals(ClaimResult.Status.OK, c.status(), c.claim().id());
        }
        ClaimResult m15 = r.claims().stream().filter(c -> c.claim().id().equals("M-M1-D-M@1.5")).findFirst().orElseThrow();
        ClaimResult mid = r.claims().stream().filter(c -> c.claim().id().equals("M-M1-D-deflection@3.0")).findFirst().orElseThrow();
        assertEquals(Quantity.M_AT, m15.claim().quantity());
        assertEquals(Quantity.DEFLECTION_AT, mid.claim().quantity());
        assertEquals(3.0, mid.claim().atM(), 0);
    }

    @Test
    void hoggingPositiveEndMomentsChangeSign() {
        Review r = review("""
                claims:
                  conventions: {moment: hogging-positive}
                  members:
                    - {member: M1, combo: D, M_start: 30}
                    - {member: M1, combo: D, at: 1.5, M: -3.75}
                """);
        for (ClaimResult c : r.claims()) assertEquals(ClaimResult.Status.OK, c.status(), c.claim().id());
    }

    @Test
    void aPositionNeedsAValueAtAPositionAndTheReverse() {
        AssertionError e = assertThrows(AssertionError.class, () -> Models.yaml(FIXED + """
                claims:
                  members:
                    - {member: M1, combo: D, at: 2, M_max: 45}
                """));
        assertTrue(e.getMessage().contains("with at, claim N, V, M or deflection"), e.getMessage());
        AssertionError none = assertThrows(AssertionError.class, () -> Models.yaml(FIXED + """
                claims:
                  members:
                    - {member: M1, combo: D, M: 45}
                """));
        assertTrue(none.getMessage().contains("is a value at a position; expected at:"), none.getMessage());
        AssertionError outside = assertThrows(AssertionError.class, () -> Models.yaml(FIXED + """
                claims:
                  members:
                    - {member: M1, combo: D, at: 7, M: 45}
                """));
        assertTrue(outside.getMessage().contains("outside the member"), outside.getMessage());
    }
}
