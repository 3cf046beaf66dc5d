package plumbline.review;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;
import plumbline.Models;
import plumbline.solve.stiffness.StiffnessEngine;

/**
 * The load sets the report draws, on the simple beam of {@link ReviewTest} (L = 6 m, dead
 * 10 kN/m, live 5 kN/m, ASCE 7 strength combinations): by hand the largest factored load is
 * 1.2 D + 1.6 L = 20 kN/m (combination 2), M = wL^2/8 = 90 kN*m.
 */
class DrawnLoadSetsTest {

    @Test
    void withNoClaimsTheCombinationWithTheLargestMomentIsDrawn() {
        Review r = ReviewTest.review("", Double.NaN);
        assertEquals(List.of("asce7-strength/2"), DrawnLoadSets.choose(r).names());
    }

    @Test
    void everyLoadSetWithAFlaggedClaimIsDrawnAndNoOther() {
        // R_A under D is wL/2 = 10 * 6 / 2 = 30 kN and under L 5 * 6 / 2 = 15 kN (statics by hand): 45 and 30 are flagged;
        // the envelope's M_max = 1.2 * 10 + 1.6 * 5 = 20 kN/m * 6^2 / 8 = 90 kN*m (ASCE 7 2.3.1 combination 2) is right
        Review r = ReviewTest.review("""
                claims:
                  reactions:
                    - {node: A, combo: L, Fy: 30}
                    - {node: A, combo: D, Fy: 45}
                  members:
                    - {member: M1, combo: envelope, M_max: 90}
                """, Double.NaN);
        DrawnLoadSets.Choice c = DrawnLoadSets.choose(r);
        assertEquals(List.of("L", "D"), c.names());
        assertTrue(c.why().contains("every load set with a flagged claim (2: L, D)"), c.why());
    }

    @Test
    void aFlaggedEnvelopeClaimDrawsTheLoadSetThatGovernsIt() {
        Review r = ReviewTest.review("""
                claims:
                  reactions:
                    - {node: A, combo: L, Fy: 15}
                  members:
                    - {member: M1, combo: envelope, M_max: 60}
                """, Double.NaN);
        DrawnLoadSets.Choice c = DrawnLoadSets.choose(r);
        assertEquals(List.of("asce7-strength/2"), c.names());
        assertTrue(c.why().startsWith("the load set with a flagged claim, asce7-strength/2"), c.why());
    }

    @Test
    void withNothingFlaggedTheSetGoverningAnEnvelopeClaimComesFirstAndAtMostTwoAreDrawnNamingTheRest() {
        Review r = ReviewTest.review("""
                claims:
                  reactions:
                    - {node: A, combo: L, Fy: 15}
                    - {node: A, combo: D, Fy: 30}
                  members:
                    - {member: M1, combo: envelope, M_max: 90}
                """, Double.NaN);
        assertEquals(2, DrawnLoadSets.AT_MOST);
        DrawnLoadSets.Choice c = DrawnLoadSets.choose(r);
        assertEquals(List.of("asce7-strength/2", "L"), c.names());
        assertTrue(c.why().endsWith("; not drawn: D"), c.why());
    }

    static Review beam(String loads) {
        var m = Models.yaml(Models.SIMPLE_BEAM + loads);
        return Review.of(Analysis.of(m, List.of(new StiffnessEngine())), new TolerancePolicy(Double.NaN));
    }

    @Test
    void aCombinationIsPreferredToABiggerLoadCaseAndAmongCasesTheBiggestMomentWins() {
        // L alone (w = 100 kN/m, M = 450 kN*m) is bigger than the combination C = 1.0 D (M = 45 kN*m)
        String loads = """
                loads:
                  D: {type: dead, member_loads: [{member: M1, w: -10}]}
                  L: {type: live, member_loads: [{member: M1, w: -100}]}
                """;
        assertEquals(List.of("C"), DrawnLoadSets.choose(beam(loads + "combinations: {C: {D: 1.0}}\n")).names());
        assertEquals(List.of("L"), DrawnLoadSets.choose(beam(loads)).names());
        // a tie (two equal combinations) keeps the first
        assertEquals(List.of("C1"), DrawnLoadSets.choose(beam(loads + "combinations: {C1: {D: 1.0}, C2: {D: 1.0}}\n")).names());
    }
}
