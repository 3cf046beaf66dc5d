package plumbline.solve;

import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import plumbline.Models;
import plumbline.review.Analysis;
import plumbline.review.Review;
import plumbline.review.TolerancePolicy;
import plumbline.solve.stiffness.StiffnessEngine;

/**
 * A beam held horizontally only by a spring: as the spring softens against the beam's
 * axial stiffness EA/L (3.3e8 N/m), the solution first carries a warning naming the place,
 * then is refused as a near-mechanism; never a silent loss of digits.
 */
class ConditioningTest {

    static String model(String k) {
        return plumbline.Models.HEAD + """
                nodes: {A: [0, 0], B: [6, 0], C: [12, 0]}
                supports: {A: {fix: [uy, rz], springs: {ux: %s}}, C: roller}
                members: {M1: {from: A, to: B, section: G}, M2: {from: B, to: C, section: G}}
                loads: {D: {type: dead, node_loads: [{node: B, Fy: -10}]}}
                """.formatted(k);
    }

    @ParameterizedTest(name = "spring {0} kN/m: warned {1}, solved {2}")
    @CsvSource({"1.0e5, false, true", "1.0e-3, true, true", "1.0e-9, false, false"})
    void softnessIsReported(String k, boolean warned, boolean solved) {
        Analysis a = Analysis.of(Models.yaml(model(k)), List.of(new StiffnessEngine()));
        Review r = Review.of(a, TolerancePolicy.none());
        boolean w = r.warnings().stream().anyMatch(x -> x.message().contains("nearly singular at A ux"));
        if (warned) assertTrue(w, r.warnings().toString());
        else assertFalse(w, r.warnings().toString());
        if (solved) assertTrue(a.stable());
        else assertTrue(!a.stable() && a.engines().get("stiffness").instability().contains("near-mechanism"));
    }
}
