package plumbline.review;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Locale;
import org.junit.jupiter.api.Test;
import plumbline.Models;
import plumbline.model.Model;
import plumbline.solve.stiffness.StiffnessEngine;

/**
 * The review of claims on a simple beam whose values are statics by hand: L = 6 m, dead
 * 10 kN/m and live 5 kN/m, so R = wL/2 per case (30 and 15 kN).
 */
class ReviewTest {

    static Review review(String claims, double cliTolerance) {
        Model m = Models.yaml(Models.SIMPLE_BEAM + """
                loads:
                  D: {type: dead, member_loads: [{member: M1, w: -10}]}
                  L: {type: live, member_loads: [{member: M1, w: -5}]}
                standard_combinations: [asce7-strength]
                """ + claims);
        Analysis a = Analysis.of(m, List.of(new StiffnessEngine()));
        return Review.of(a, new TolerancePolicy(cliTolerance), new StiffnessEngine());
    }

    @Test
    void allowableStressLevelAgainstStrengthIsNamed() {
        // ASCE 7 2.3.1(2): 1.2 D + 1.6 L gives R = 36 + 24 = 60 kN; the ASD D + L gives 45 kN
        Review r = review("claims:\n  reactions:\n    - {node: B, combo: asce7-strength/2, Fy: 45}\n", Double.NaN);
        ClaimResult c = r.claims().get(0);
        assertEquals(60e3, c.computed(), 1e-6);
        assertTrue(c.diagnosis().contains("allowable-stress combination asce7-asd/2"), c.diagnosis());
    }

    @Test
    void claimsInTheirOwnUnits() {
        // 30 kN = 6.744 kip (NIST SP 811: 1 kip = 4.448222 kN); a midspan moment wL^2/8 = 45 kN*m = 33.19 kip*ft
        Review r = review("""
                claims:
                  units: {force: kip, length: ft}
                  reactions:
                    - {node: A, combo: D, Fy: 6.744}
                  members:
                    - {member: M1, combo: D, M_max: 33.19}
                """, Double.NaN);
        for (ClaimResult c : r.claims()) assertEquals(ClaimResult.Status.OK, c.status(), c.claim().id());
    }

    @Test
    void toleranceOrderClaimThenFileThenCommandLineThenDefault() {
        String claims = """
                claims:
                  tolerance: {reaction: 1%}
                  reactions:
                    - {node: A, combo: D, Fy: 30.5}
                    - {node: B, combo: D, Fy: 30.5, tolerance: 0.5%}
                """;
        // 30.5 against 30: 1.7% off; within twice 1% is marginal, beyond twice 0.5% a mismatch
        Review fileOnly = review(claims, Double.NaN);
        assertEquals(0.01, fileOnly.claims().get(0).tolerance().relative());
        assertEquals("claims file, reaction", fileOnly.claims().get(0).tolerance().why());
        assertEquals(ClaimResult.Status.MARGINAL, fileOnly.claims().get(0).status());
        assertEquals(0.005, fileOnly.claims().get(1).tolerance().relative());
        assertEquals("set on the claim", fileOnly.claims().get(1).tolerance().why());
        assertEquals(ClaimResult.Status.MISMATCH, fileOnly.claims().get(1).status());
        // --tolerance does not override what the claims file sets: the file is more specific
        Review cli = review(claims, 0.05);
        assertEquals(0.01, cli.claims().get(0).tolerance().relative(), "the file's tolerance wins over --tolerance");
        assertEquals(ClaimResult.Status.MARGINAL, cli.claims().get(0).status());
        assertEquals(0.005, cli.claims().get(1).tolerance().relative(), "the claim's own tolerance wins");
        // a file's default is still more specific than --tolerance
        Review fileDefault = review(claims.replace("{reaction: 1%}", "{default: 1%}"), 0.05);
        assertEquals(0.01, fileDefault.claims().get(0).tolerance().relative());
        assertEquals("claims file, default", fileDefault.claims().get(0).tolerance().why());
        // with nothing in the file, --tolerance applies to every claim without its own
        String bare = claims.replace("  tolerance: {reaction: 1%}\n", "");
        Review cliOnly = review(bare, 0.05);
        assertEquals(0.05, cliOnly.claims().get(0).tolerance().relative());
        assertEquals("--tolerance", cliOnly.claims().get(0).tolerance().why());
        assertEquals(ClaimResult.Status.OK, cliOnly.claims().get(0).status());
        assertEquals(0.005, cliOnly.claims().get(1).tolerance().relative());
        Review dflt = review(bare, Double.NaN);
        assertEquals(TolerancePolicy.REACTION_DEFAULT, dflt.claims().get(0).tolerance().relative());
        assertEquals(ClaimResult.Status.OK, dflt.claims().get(0).status());
        assertEquals("default for reactions (common practice)", dflt.claims().get(0).tolerance().why());
    }

    @Test
    void envelopeNamesTheGoverningCombination() {
        // the largest midspan moment over the ASCE combinations: 1.2 D + 1.6 L, (12 + 8) x 36 / 8 = 90 kN*m
        Review r = review("claims:\n  members:\n    - {member: M1, combo: envelope, M_max: 90}\n", Double.NaN);
        ClaimResult c = r.claims().get(0);
        assertEquals(ClaimResult.Status.OK, c.status());
        assertEquals("asce7-strength/2", c.governing());
    }

    @Test
    void modulusInTheWrongUnitsIsNamedForADeflection() {
        // simple beam deflection 5wL^4/384EI = 5 x 10 x 1296 / (384 x 20000) = 8.4375 mm (AISC Table 3-23 case 1,
        // from memory); with E = 29000 written in MPa where ksi were meant, E is 6.895 times too small and the
        // originator's deflection 6.895 times larger
        double d = 5 * 10 * Math.pow(6, 4) / (384 * 20000.0) * 6.894757;
        Review r = review("claims:\n  members:\n    - {member: M1, combo: D, deflection: " + String.format(Locale.ROOT, "%.6f", d) + "}\n", Double.NaN);
        ClaimResult c = r.claims().get(0);
        assertEquals(ClaimResult.Status.MISMATCH, c.status());
        assertTrue(c.diagnosis().contains("E in the originator's run appears to be in MPa where ksi were meant"), c.diagnosis());
    }
}
