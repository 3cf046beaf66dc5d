package plumbline.review;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Locale;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import plumbline.Models;
import plumbline.model.Model;
import plumbline.solve.stiffness.StiffnessEngine;

/**
 * Planted slips on a propped cantilever whose correct values are known by hand (statics
 * and AISC Table 3-23 case 12, from memory): L = 6 m, w = 10 kN/m dead plus 0.785 kN/m
 * self-weight (7850 kg/m3 x 0.01 m2 x 9.81), live 6 kN/m, ULS = 1.35 D + 1.5 L. Each
 * claim is the correct value put through one slip; the diagnosis must name it.
 */
class DiagnosisTest {

    static final String MODEL = """
            format: plumbline/1
            units: {force: kN, length: m}
            materials: {s: {E: 200 GPa, density: 78.5 kN/m3}}
            sections: {G: {A: 0.01, I: 1.0e-4, material: s}}
            nodes: {A: [0, 0], B: [6, 0]}
            supports: {A: fixed, B: roller}
            members: {M1: {from: A, to: B, section: G}}
            loads:
              D: {type: dead, self_weight: true, member_loads: [{member: M1, w: -10}]}
              L: {type: live, member_loads: [{member: M1, w: -6}]}
            combinations:
              ULS: {D: 1.35, L: 1.5}
              SLS: {D: 1.0, L: 1.0}
            claims:
              reactions:
                - {node: B, combo: ULS, Fy: %s}
            """;

    static Review run(String claimedFy) {
        Model m = Models.yaml(String.format(Locale.ROOT, MODEL, claimedFy));
        Analysis a = Analysis.of(m, List.of(new StiffnessEngine()));
        return Review.of(a, TolerancePolicy.none(), new StiffnessEngine());
    }

    static double correctFyB() {
        // propped cantilever, uniform load: prop reaction 3wL/8
        double wD = 10 + 78.5 * 0.01, wL = 6;
        return 3 * (1.35 * wD + 1.5 * wL) * 6 / 8;
    }

    @ParameterizedTest(name = "{0}")
    @CsvSource({
            "kip for kN, 0.2248089, unit slip",
            "sign, -1, opposite sign",
            "unfactored, 0, unfactored",
            "SLS used, 0, combination SLS",
            "dead load alone, 0, load case D",
            "self-weight omitted, 0, self-weight omitted",
            "support taken as pinned, 0, support A taken as pinned instead of fixed",
            "loads in kPa for psf, 20.885, loads written in kPa where psf were meant",
    })
    void plantedSlipIsNamed(String slip, double factor, String words) {
        double wD = 10 + 78.5 * 0.01, wL = 6, len = 6;
        double claimed = switch (slip) {
            case "unfactored" -> 3 * (wD + wL) * len / 8;
            case "SLS used" -> 3 * (wD + wL) * len / 8;
            case "dead load alone" -> 3 * wD * len / 8;
            case "self-weight omitted" -> 3 * (1.35 * 10 + 1.5 * wL) * len / 8;
            case "support taken as pinned" -> (1.35 * wD + 1.5 * wL) * len / 2; // simple beam: wL/2
            default -> factor * correctFyB();
        };
        Review r = run(String.format(Locale.ROOT, "%.6f", claimed));
        ClaimResultAssert.flagged(r, words);
    }

    @ParameterizedTest(name = "correct claim stays ok")
    @CsvSource({"1.0"})
    void correctClaimIsOkWithNoDiagnosis(double factor) {
        Review r = run(String.format(Locale.ROOT, "%.6f", factor * correctFyB()));
        assertEquals(ClaimResult.Status.OK, r.claims().get(0).status());
        assertNull(r.claims().get(0).diagnosis());
    }

    static final class ClaimResultAssert {
        static void flagged(Review r, String words) {
            ClaimResult c = r.claims().get(0);
            assertTrue(c.status() != ClaimResult.Status.OK, "the slip is flagged");
            assertNotNull(c.diagnosis(), "a diagnosis is given");
            assertTrue(c.diagnosis().contains(words), c.diagnosis());
        }
    }
}
