package plumbline.review;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Set;
import org.junit.jupiter.api.Test;
import plumbline.Models;
import plumbline.model.LimitState;
import plumbline.model.Model;
import plumbline.solve.stiffness.StiffnessEngine;
import plumbline.validate.ClaimCheck;

/**
 * Combinations with a limit state and the envelope of one limit state (format reference
 * section 4.1). Simple beam, L = 6 m, EI = 20,000 kN*m2, dead 10 and live 5 kN/m: ULS
 * 1.35 D + 1.5 L = 21 kN/m (M = wL^2/8 = 94.5 kN*m, deflection 5wL^4/384EI = 17.72 mm);
 * SLS D + L = 15 kN/m (deflection 12.66 mm) (AISC Manual Table 3-23 case 1, from memory).
 */
class LimitStateTest {

    static final String JOIST = Models.SIMPLE_BEAM + """
            loads:
              D: {type: dead, member_loads: [{member: M1, w: -10}]}
              L: {type: live, member_loads: [{member: M1, w: -5}]}
            combinations:
              ULS1: {factors: {D: 1.35, L: 1.5}, limit_state: ULS}
              SLS1: {factors: {D: 1.0, L: 1.0}, limit_state: SLS}
            """;

    @Test
    void theServiceabilityEnvelopeLeavesTheUltimateCombinationsOut() {
        Model m = Models.yaml(JOIST + """
                claims:
                  members:
                    - {member: M1, combo: envelope:SLS, deflection: 12.66 mm}
                    - {member: M1, combo: envelope, deflection: 17.72 mm}
                    - {member: M1, combo: envelope:ULS, M_max: 94.5}
                """);
        Review r = Review.of(Analysis.of(m, List.of(new StiffnessEngine())), new TolerancePolicy(Double.NaN));
        double wSls = 15e3, wUls = 21e3, ei = 2e7, len = 6;
        assertEquals(5 * wSls * Math.pow(len, 4) / (384 * ei), r.claims().get(0).computed(), 1e-12);
        assertEquals("SLS1", r.claims().get(0).governing());
        assertEquals(5 * wUls * Math.pow(len, 4) / (384 * ei), r.claims().get(1).computed(), 1e-12);
        assertEquals("ULS1", r.claims().get(1).governing());
        assertEquals(wUls * len * len / 8, r.claims().get(2).computed(), 1e-6);
        for (ClaimResult c : r.claims()) assertEquals(ClaimResult.Status.OK, c.status(), c.claim().id());
        assertEquals(LimitState.SLS, m.combinations().get(1).limitState());
    }

    @Test
    void anEnvelopeOfALimitStateWithoutCombinationsIsRefused() {
        Model m = Models.yaml(Models.SIMPLE_BEAM + """
                loads: {D: {type: dead, member_loads: [{member: M1, w: -10}]}}
                combinations: {C1: {D: 1.35}}
                claims:
                  reactions:
                    - {node: A, combo: envelope:SLS, Fy: 30}
                """);
        var problems = ClaimCheck.check(m, List.of("D", "C1"), Set.of(LimitState.NONE));
        assertEquals(1, problems.size());
        assertTrue(problems.get(0).message().contains("envelope:SLS is over the SLS combinations, and the model has none"),
                problems.get(0).message());
    }

    @Test
    void aLimitStateIsUlsOrSls() {
        AssertionError e = org.junit.jupiter.api.Assertions.assertThrows(AssertionError.class, () -> Models.yaml(
                JOIST.replace("limit_state: SLS", "limit_state: service")));
        assertTrue(e.getMessage().contains("expected ULS (ultimate) or SLS (serviceability)"), e.getMessage());
    }
}
