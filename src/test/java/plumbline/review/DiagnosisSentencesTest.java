package plumbline.review;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Locale;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import plumbline.Models;
import plumbline.model.Model;
import plumbline.solve.stiffness.StiffnessEngine;

/**
 * The diagnosis of one planted slip per family of hypotheses, sentence by sentence, with the
 * numbers in the sentence worked by hand. Values: propped cantilever (fixed A, prop B, span
 * L = 6 m) under w: R_B = 3wL/8, R_A = 5wL/8, M_A = -wL^2/8, rotation at the prop
 * wL^3/(48 EI) (AISC Manual Table 3-23 case 12, from memory); simple beam R = wL/2
 * (statics by hand). EI = 200 GPa x 1.0e-4 m4 = 20,000 kN*m2.
 */
class DiagnosisSentencesTest {

    /** Dead 10 kN/m and live 6 kN/m, no self-weight; ULS = 1.35 D + 1.5 L gives w = 22.5 kN/m. */
    static String propped(String supportA, String claims) {
        return Models.HEAD + "nodes: {A: [0, 0], B: [6, 0]}\nsupports: {A: " + supportA + ", B: roller}\n" + """
                members: {M1: {from: A, to: B, section: G}}
                loads:
                  D: {type: dead, member_loads: [{member: M1, w: -10}]}
                  L: {type: live, member_loads: [{member: M1, w: -6}]}
                combinations:
                  ULS: {D: 1.35, L: 1.5}
                  SLS: {D: 1.0, L: 1.0}
                claims:
                """ + claims;
    }

    static ClaimResult only(String yaml) {
        Model m = Models.yaml(yaml);
        Analysis a = Analysis.of(m, List.of(new StiffnessEngine()));
        Review r = Review.of(a, TolerancePolicy.none(), new StiffnessEngine());
        assertEquals(1, r.claims().size());
        ClaimResult c = r.claims().get(0);
        assertTrue(c.status() == ClaimResult.Status.MISMATCH, "the slip is flagged: " + c.status());
        assertNotNull(c.diagnosis(), "a cause is named");
        return c;
    }

    static final double W_ULS = 1.35 * 10 + 1.5 * 6; // 22.5 kN/m

    @Test
    void aUnitSlipSaysWhichUnitAndBothNumbers() {
        // R_B = 3 x 22.5 x 6 / 8 = 50.625 kN = 11.381 kip (1 kip = 4.448222 kN)
        double kip = 50.625 / 4.4482216152605;
        ClaimResult c = only(propped("fixed", String.format(Locale.ROOT,
                "  reactions:\n    - {node: B, combo: ULS, Fy: %.4f}\n", kip)));
        assertTrue(c.diagnosis().startsWith("claimed Fy at B (ULS) = 11.38 kN equals the computed 50.63 kN expressed in kip (11.38): "
                + "likely unit slip"), c.diagnosis());
    }

    @Test
    void swappedComponentsOfOneReaction() {
        // Fx at A is zero under vertical load; the claim carries R_A = 5 x 22.5 x 6 / 8 = 84.375 kN
        ClaimResult c = only(propped("fixed", "  reactions:\n    - {node: A, combo: ULS, Fx: 84.375}\n"));
        assertTrue(c.diagnosis().contains("claimed Fx at A (ULS) matches the computed Fy of the same node (84.38 kN): "
                + "components or quantities swapped"), c.diagnosis());
    }

    @Test
    void swappedQuantitiesOfOneMember() {
        // the fixed-end moment wL^2/8 = 22.5 x 36 / 8 = 101.25 kN*m hogging, claimed as M_max
        ClaimResult c = only(propped("fixed", "  members:\n    - {member: M1, combo: ULS, M_max: -101.25}\n"));
        assertTrue(c.diagnosis().contains("claimed M_max of M1 (ULS) matches the computed M_min of the same member (-101.3 kN*m): "
                + "components or quantities swapped"), c.diagnosis());
    }

    @Test
    void aValueReadFromTheWrongLine() {
        ClaimResult c = only(propped("fixed", "  reactions:\n    - {node: B, combo: ULS, Fy: 84.375}\n"));
        assertTrue(c.diagnosis().contains("claimed Fy at B (ULS) is the computed value at node A (84.38 kN): read from the wrong line"),
                c.diagnosis());
    }

    @Test
    void anotherCombinationAndTheFactorsLeftOut() {
        // SLS: w = 16, R_B = 3 x 16 x 6 / 8 = 36 kN, which is also ULS with its factors left out
        ClaimResult c = only(propped("fixed", "  reactions:\n    - {node: B, combo: ULS, Fy: 36}\n"));
        assertTrue(c.diagnosis().contains("claimed Fy at B (ULS) equals the computed value under combination SLS (36.00 kN): "
                + "another combination was used"), c.diagnosis());
        assertTrue(c.diagnosis().contains("claimed Fy at B (ULS) equals the value with the loads of ULS unfactored (36.00 kN): "
                + "load factors left out, or service-level (ASD) loads against a strength combination"), c.diagnosis());
        // at most three causes, joined by "; or "
        assertTrue(c.diagnosis().split("; or ").length <= 3, c.diagnosis());
    }

    @Test
    void aLoadCaseOnItsOwn() {
        // D alone: R_B = 3 x 10 x 6 / 8 = 22.5 kN
        ClaimResult c = only(propped("fixed", "  reactions:\n    - {node: B, combo: ULS, Fy: 22.5}\n"));
        assertTrue(c.diagnosis().contains("under load case D (22.50 kN): another combination was used"), c.diagnosis());
    }

    @Test
    void aSupportTakenAsFixedInsteadOfPinned() {
        // the model is a simple beam (R_B = wL/2 = 67.5); the claim is the propped value 3wL/8 = 50.625
        ClaimResult c = only(propped("pinned", "  reactions:\n    - {node: B, combo: ULS, Fy: 50.625}\n"));
        assertTrue(c.diagnosis().contains("claimed Fy at B (ULS) equals the value with support A taken as fixed instead of pinned (50.63 kN)"),
                c.diagnosis());
    }

    @ParameterizedTest(name = "{0}")
    @CsvSource(delimiter = '|', textBlock = """
            E a thousand times too small | 1000     | times 1000: E in the originator's run appears a thousand times too small (written in MPa where GPa were meant)
            E a thousand times too large | 0.001    | times 0.001000: E in the originator's run appears a thousand times too large (written in GPa where MPa were meant)
            E in MPa for ksi             | 6.894757 | times 6.895: E in the originator's run appears to be in MPa where ksi were meant (deflections scale by 6.895)
            E in ksi for MPa             | 0.1450377| times 0.1450: E in the originator's run appears to be in ksi where MPa were meant
            """)
    void aRotationScaledByAnEUnitSlip(String name, double factor, String words) {
        // SLS w = 16 kN/m: rotation at the prop wL^3/(48 EI) = 16 x 216 / (48 x 20000) = 0.0036 rad (anticlockwise: the
        // beam rises toward the prop)
        double claimed = 0.0036 * factor;
        ClaimResult c = only(propped("fixed", String.format(Locale.ROOT,
                "  displacements:\n    - {node: B, combo: SLS, rz: %.6e}\n", claimed)));
        assertTrue(c.diagnosis().contains("claimed rz at B (SLS) is the computed 0.003600 rad " + words), c.diagnosis());
    }

    @Test
    void aLoadPerSlopedLengthInsteadOfPerPlan() {
        // rafter A (0, 0) to B (4, 3), 2 kN/m per plan over 4 m = 8 kN, R_B = 4 kN; per sloped length 2 x 5 = 10 kN, R_B = 5 kN
        String yaml = Models.HEAD + """
                nodes: {A: [0, 0], B: [4, 3]}
                supports: {A: pinned, B: roller}
                members: {R1: {from: A, to: B, section: G}}
                loads:
                  D: {type: dead, member_loads: [{member: R1, w: 2, dir: gravity, per: plan}]}
                claims:
                  reactions:
                    - {node: B, combo: D, Fy: 5}
                """;
        ClaimResult c = only(yaml);
        assertTrue(c.diagnosis().contains("claimed Fy at B (D) equals the value with the load taken per sloped length instead of per plan "
                + "(the 1/cos factor) (5.000 kN)"), c.diagnosis());
    }

    @Test
    void selfWeightOmitted() {
        // 0.01 m2 x 78.5 kN/m3 = 0.785 kN/m self-weight on a 6 m simple beam: R_B = (10 + 0.785) x 3 = 32.355 kN, without it 30
        String yaml = """
                format: plumbline/1
                units: {force: kN, length: m}
                materials: {s: {E: 200 GPa, density: 78.5 kN/m3}}
                sections: {G: {A: 0.01, I: 1.0e-4, material: s}}
                nodes: {A: [0, 0], B: [6, 0]}
                supports: {A: pinned, B: roller}
                members: {M1: {from: A, to: B, section: G}}
                loads:
                  D: {type: dead, self_weight: true, member_loads: [{member: M1, w: -10}]}
                claims:
                  reactions:
                    - {node: B, combo: D, Fy: 30}
                """;
        ClaimResult c = only(yaml);
        assertTrue(c.diagnosis().startsWith("claimed Fy at B (D) equals the value with self-weight omitted (30.00 kN)"), c.diagnosis());
    }

    @Test
    void patternLoadingOmittedAndTheServiceCombination() {
        // three equal 6 m spans, live load patterned span by span: the claim is the centre-span moment with every span
        // loaded, which falls short of the pattern envelope; the sentence names the omission and gives the all-spans value
        String yaml = Models.HEAD + """
                nodes: {A: [0, 0], B: [6, 0], C: [12, 0], D: [18, 0]}
                supports: {A: pinned, B: roller, C: roller, D: roller}
                members:
                  S1: {from: A, to: B, section: G}
                  S2: {from: B, to: C, section: G}
                  S3: {from: C, to: D, section: G}
                loads:
                  L: {type: live, pattern: true, member_loads: [{members: [S1, S2, S3], w: -10}]}
                claims:
                  members:
                    - {member: S2, combo: L, M_max: 9}
                """;
        // every span loaded: centre-span midspan moment = wL^2/8 - M_support = 45 - 36 = 9 kN*m (three equal spans, support
        // moment wL^2/10 = 36, Roark/handbook continuous-beam coefficients, from memory); centre span alone loaded gives more
        ClaimResult c = only(yaml);
        assertTrue(c.diagnosis().contains("claimed M_max of S2 (L) equals the value with every span loaded (9.000 kN*m): "
                + "pattern loading omitted"), c.diagnosis());
    }

    @ParameterizedTest(name = "{0} -> {1}")
    @CsvSource({
            "0, 0", "12.3456, 12.35", "-2.5, -2.500", "0.001, 0.001000", "0.000999, 9.990e-04", "1234.4, 1234",
            "9999999, 9999999", "10000000, 1.000e+07", "-0.5, -0.5000",
    })
    void numbersInSentencesKeepFourSignificantFigures(double v, String shown) {
        assertEquals(shown, Diagnosis.fmt(v));
    }
}
