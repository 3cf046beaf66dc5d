package plumbline.review;

import plumbline.model.Quantity;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;
import plumbline.Models;
import plumbline.solve.Engine;
import plumbline.solve.force.ForceEngine;
import plumbline.solve.stiffness.StiffnessEngine;

/**
 * Pattern loading on three equal spans (L = 6 m, live w = 10 kN/m span by span), every
 * value by the three-moment equation by hand. With M_A = M_D = 0:
 * M_A + 4 M_B + M_C = -(w1 + w2) L^2 / 4 and M_B + 4 M_C + M_D = -(w2 + w3) L^2 / 4.
 * Span 1 alone: M_B = -wL^2/15, M_C = wL^2/60; span 2 alone: M_B = M_C = -wL^2/20; span 3
 * alone: M_B = wL^2/60. Hence, for span S1:
 * <ul>
 * <li>largest sagging with spans 1 and 3 loaded: R_A = 0.45 wL, M = 0.10125 wL^2 = 36.45 kN*m at 0.45 L = 2.7 m;</li>
 * <li>largest hogging with spans 1 and 2 loaded: M_B = -7 wL^2 / 60 = -42 kN*m at B;</li>
 * <li>reaction at A: 13/30 wL (span 1), -wL/20 (span 2), +wL/60 (span 3): upper 0.45 wL = 27 kN,
 * lower -wL/20 = -3 kN (uplift with the middle span alone loaded);</li>
 * <li>shear: V_max = R_A upper = 27 kN at A; V_min = (13/30 - 1 - 1/20) wL = -37 kN at B.</li>
 * </ul>
 */
class PatternEnvelopeTest {

    static Analysis analysis(Engine engine) {
        return Analysis.of(Models.yaml(Models.THREE_SPANS + """
                loads:
                  L: {type: live, pattern: true, member_loads: [{members: [S1, S2, S3], w: -10}]}
                """), List.of(engine));
    }

    @Test
    void envelopeValuesTheirPlacesAndTheSpansLoaded() {
        for (Engine engine : List.of(new StiffnessEngine(), new ForceEngine())) {
            LoadSetResult r = analysis(engine).solutions().get(engine.name()).get("L");
            assertTrue(r.patterned());
            String e = engine.name() + ": ";
            LoadSetResult.Peak sag = r.peak("S1", Quantity.M_MAX);
            assertEquals(36.45e3, sag.value(), 1e-6, e + "M_max");
            assertEquals(2.7, sag.xM(), 1e-9, e + "at 0.45 L");
            assertEquals(List.of("S1", "S3"), sag.loadedMembers(), e);
            LoadSetResult.Peak hog = r.peak("S1", Quantity.M_MIN);
            assertEquals(-42e3, hog.value(), 1e-6, e + "M_min");
            assertEquals(6, hog.xM(), 1e-9);
            assertEquals(List.of("S1", "S2"), hog.loadedMembers(), e);
            LoadSetResult.Peak abs = r.peak("S1", Quantity.M_ABS);
            assertEquals(42e3, abs.value(), 1e-6, e + "M_abs is the larger magnitude");
            assertEquals(6, abs.xM(), 1e-9);
            assertEquals(List.of("S1", "S2"), abs.loadedMembers());
            assertEquals(27e3, r.peak("S1", Quantity.V_MAX).value(), 1e-6, e + "V_max");
            assertEquals(0, r.peak("S1", Quantity.V_MAX).xM(), 1e-9);
            assertEquals(-37e3, r.peak("S1", Quantity.V_MIN).value(), 1e-6, e + "V_min");
            assertEquals(37e3, r.peak("S1", Quantity.V_ABS).value(), 1e-6, e + "V_abs");
            assertEquals(0, r.peak("S1", Quantity.N_MAX).value(), 1e-6, "no axial load");
            assertEquals(27e3, r.reaction("A", 1, true), 1e-6, e + "upper reaction at A");
            assertEquals(-3e3, r.reaction("A", 1, false), 1e-6, e + "lower reaction at A");
            assertEquals(0, r.reaction("A", 0, true), 1e-6);
            assertEquals(0, r.reaction("nowhere", 1, true), 0, "a node without a support reacts nothing");
        }
    }

    @Test
    void theDeflectionEnvelopeIsTheLargestMagnitudeWithItsSign() {
        // end span with spans 1 and 3 loaded deflects down most; the result is a magnitude, never negative
        LoadSetResult r = analysis(new StiffnessEngine()).solutions().get("stiffness").get("L");
        LoadSetResult.Peak d = r.peak("S1", Quantity.DEFLECTION);
        assertTrue(d.value() > 0, "deflection is a magnitude: " + d.value());
        assertEquals(List.of("S1", "S3"), d.loadedMembers());
        // upward displacement of span 1 with the middle span alone loaded is smaller than the downward one
        double down = r.displacement("B", 2, false), up = r.displacement("B", 2, true);
        assertTrue(down < 0 && up > 0, "rotation at B turns both ways under the arrangements: " + down + ", " + up);
    }

    @Test
    void everyArrangementIsASolutionOfTheSet() {
        LoadSetResult r = analysis(new StiffnessEngine()).solutions().get("stiffness").get("L");
        // the fixed part, one part per loaded span, and every span on at once
        assertEquals(5, r.solutions().size());
        assertSame(r.representative(), r.solutions().get(4), "the representative is every span loaded");
        assertTrue(r.equilibriumResidual() < 1e-12, "residual " + r.equilibriumResidual());
        double worst = r.solutions().stream().mapToDouble(plumbline.solve.Solution::equilibriumResidual).max().orElseThrow();
        assertEquals(worst, r.equilibriumResidual(), 0, "the set's residual is its worst state's");
        LoadSetResult plain = new LoadSetResult.Plain(r.representative());
        assertFalse(plain.patterned());
        assertEquals(List.of(r.representative()), plain.solutions());
        assertSame(r.representative(), plain.representative());
        assertEquals(r.representative().equilibriumResidual(), plain.equilibriumResidual(), 0);
        // every span loaded: R_A = 0.4 wL = 24 kN (three equal spans, by the same equations: M_B = -wL^2/10)
        assertEquals(24e3, plain.reaction("A", 1, true), 1e-6);
        // all of a member's peaks at once (as the results list them) are its peaks one by one, in order,
        // for a plain set and for an envelope; M_B = -wL^2/10 = -36 kN*m hogging over B (w = 10 kN/m, L = 6 m)
        List<Quantity> all = Quantity.peaks();
        for (LoadSetResult x : List.of(plain, r)) {
            for (String mem : List.of("S1", "S2", "S3")) {
                LoadSetResult.Peak[] together = x.peaks(mem, all);
                assertEquals(all.size(), together.length);
                for (int i = 0; i < all.size(); i++) assertEquals(x.peak(mem, all.get(i)), together[i], mem + " " + all.get(i));
                // and written into two arrays (values, places), as the results writer reads them
                double[] values = new double[all.size()], places = new double[all.size()];
                x.peaks(mem, all, values, places);
                for (int i = 0; i < all.size(); i++) {
                    assertEquals(together[i].value(), values[i], 0, mem + " " + all.get(i));
                    assertEquals(together[i].xM(), places[i], 0, mem + " " + all.get(i) + " place");
                }
            }
        }
        assertEquals(-36e3, plain.peaks("S1", List.of(Quantity.M_MIN))[0].value(), 1e-6);
    }

    @Test
    void reactionBoundsAreClaimedByName() {
        // FORMAT 4.1: Fy_max and Fy_min at A are the upper 27 kN and lower -3 kN above; a minimum reaction of
        // 0.64 kN claimed as Fy (not Fy_min) would be compared with the upper bound and flagged
        String model = Models.THREE_SPANS + """
                loads:
                  L: {type: live, pattern: true, member_loads: [{members: [S1, S2, S3], w: -10}]}
                combinations: {C1: {L: 1.0}, C2: {L: 0.5}}
                claims:
                  conventions: {reactions: on-support}
                  reactions:
                    - {node: A, combo: L, Fy_max: 3, Fy_min: -27}
                    - {node: A, combo: envelope, Fy_min: 3}
                """;
        Review r = Review.of(Analysis.of(Models.yaml(model.replace("  conventions: {reactions: on-support}\n", "")
                .replace("Fy_max: 3, Fy_min: -27", "Fy_max: 27, Fy_min: -3").replace("Fy_min: 3}", "Fy_min: -3}")),
                List.of(new StiffnessEngine())), new TolerancePolicy(Double.NaN));
        assertEquals(27e3, r.claims().get(0).computed(), 1e-6);
        assertEquals(-3e3, r.claims().get(1).computed(), 1e-6);
        // the envelope's lower bound: the least of the combinations' lower bounds (C1: -3 kN; C2: -1.5 kN)
        assertEquals(-3e3, r.claims().get(2).computed(), 1e-6);
        assertEquals("C1", r.claims().get(2).governing());
        for (ClaimResult c : r.claims()) assertEquals(ClaimResult.Status.OK, c.status(), c.claim().id());
        // on the supports, the upper bound of the support force is minus the lower bound of the reaction
        Review onSupport = Review.of(Analysis.of(Models.yaml(model), List.of(new StiffnessEngine())), new TolerancePolicy(Double.NaN));
        assertEquals(Quantity.FY_MIN, onSupport.claims().get(0).claim().quantity());
        assertEquals(-3e3, onSupport.claims().get(0).claim().valueInternal(), 1e-9);
        assertEquals(ClaimResult.Status.OK, onSupport.claims().get(0).status());
        assertEquals(ClaimResult.Status.OK, onSupport.claims().get(1).status());
        assertEquals(Quantity.FY_MAX, onSupport.claims().get(2).claim().quantity());
        assertEquals(ClaimResult.Status.MISMATCH, onSupport.claims().get(2).status(), "-3 on the support is +3 up, not 27");
    }

    @Test
    void aMinimumReactionClaimedAsAPlainValueIsToldWhy() {
        // dead 5 kN/m on every span adds 0.4 wL = 12 kN at A: the bounds are 39 and 9 kN; "Fy: 9" is compared with 39
        Review r = Review.of(Analysis.of(Models.yaml(Models.THREE_SPANS + """
                loads:
                  L: {type: live, pattern: true, member_loads: [{members: [S1, S2, S3], w: -10}]}
                  G: {type: dead, member_loads: [{members: [S1, S2, S3], w: -5}]}
                combinations: {SLS: {G: 1.0, L: 1.0}}
                claims:
                  reactions:
                    - {node: A, combo: SLS, Fy: 9}
                """), List.of(new StiffnessEngine())), new TolerancePolicy(Double.NaN), new StiffnessEngine());
        ClaimResult c = r.claims().get(0);
        assertEquals(39e3, c.computed(), 1e-6);
        assertEquals(ClaimResult.Status.MISMATCH, c.status());
        assertTrue(c.diagnosis().contains("equals the lower bound under pattern loading (9.000 kN): claim it as Fy_min"), c.diagnosis());
    }
}
