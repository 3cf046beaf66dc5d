package plumbline.review;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import plumbline.Models;
import plumbline.model.Claim;
import plumbline.model.Quantity;
import plumbline.report.Console;
import plumbline.report.ResultsTree;
import plumbline.solve.stiffness.StiffnessEngine;

/**
 * Claims copied from a source with other sign conventions (format reference section 4.1).
 * Fixed-ended beam, L = 6 m, w = 10 kN/m: R = wL/2 = 30 kN up on the structure, M = +wL^2/24
 * = +15 kN*m at midspan and -wL^2/12 = -30 kN*m at the ends (AISC Manual Table 3-23 case 15,
 * from memory); a cantilever column under 100 kN down at its top: N = -100 kN throughout.
 */
class ConventionsTest {

    static Review review(String model, String claims) {
        var m = Models.yaml(model + claims);
        return Review.of(Analysis.of(m, List.of(new StiffnessEngine())), new TolerancePolicy(Double.NaN));
    }

    static final String FIXED = Models.HEAD + """
            nodes: {A: [0, 0], B: [6, 0]}
            supports: {A: fixed, B: fixed}
            members: {M1: {from: A, to: B, section: G}}
            loads: {D: {type: dead, member_loads: [{member: M1, w: -10}]}}
            """;

    @Test
    void reactionsOnTheSupportsAndMomentsHoggingPositive() {
        Review r = review(FIXED, """
                claims:
                  conventions: {reactions: on-support, moment: hogging-positive}
                  reactions:
                    - {node: A, combo: D, Fy: -30}
                  members:
                    - {member: M1, combo: D, M_max: 30}
                    - {member: M1, combo: D, M_min: -15}
                    - {member: M1, combo: D, M_abs: 30}
                """);
        for (ClaimResult c : r.claims()) assertEquals(ClaimResult.Status.OK, c.status(), c.claim().id());
        Claim mMax = r.claims().get(1).claim();
        assertEquals(Quantity.M_MIN, mMax.quantity());
        assertEquals(Quantity.M_MAX, mMax.writtenQuantity());
        assertEquals(-30e3, mMax.valueInternal(), 1e-9);
        assertEquals("M-M1-D-M_max", mMax.id());
        assertEquals("moments hogging-positive", mMax.convention());
        assertEquals("", r.claims().get(3).claim().convention()); // a magnitude has no sign convention
        assertEquals("as written: M_max 30.00 kN*m, moments hogging-positive", Console.asWritten(mMax, r.analysis().model().units()));
        @SuppressWarnings("unchecked")
        Map<String, Object> json = (Map<String, Object>) ((List<Object>) ResultsTree.of(r, new ResultsTree.Inputs(List.of(), List.of()),
                "stiffness", null).get("claims")).get(1);
        assertEquals("M_max", json.get("quantity"));
        assertEquals("M_min", json.get("compared_as"));
        assertEquals(-30.0, (Double) json.get("claimed"), 1e-9);
    }

    @Test
    void theSameNumbersInTheToolsConventionAreFlagged() {
        // without the conventions key, -30 for R_A and +30 for M_max are mismatches
        Review r = review(FIXED, """
                claims:
                  reactions:
                    - {node: A, combo: D, Fy: -30}
                  members:
                    - {member: M1, combo: D, M_max: 30}
                """);
        for (ClaimResult c : r.claims()) assertEquals(ClaimResult.Status.MISMATCH, c.status(), c.claim().id());
    }

    @Test
    void axialForcesCompressionPositive() {
        Review r = review(Models.HEAD + """
                nodes: {A: [0, 0], B: [0, 3]}
                supports: {A: fixed}
                members: {C1: {from: A, to: B, section: G}}
                loads: {P: {type: dead, node_loads: [{node: B, Fy: -100}]}}
                """, """
                claims:
                  conventions: {axial: compression-positive}
                  members:
                    - {member: C1, combo: P, N_max: 100}
                    - {member: C1, combo: P, N_min: 100}
                """);
        for (ClaimResult c : r.claims()) assertEquals(ClaimResult.Status.OK, c.status(), c.claim().id());
        assertTrue(r.claims().get(0).claim().convention().contains("compression-positive"));
    }
}
