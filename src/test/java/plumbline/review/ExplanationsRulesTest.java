package plumbline.review;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;
import plumbline.Models;
import plumbline.model.Claim;
import plumbline.model.Quantity;
import plumbline.model.SourceRef;

/**
 * The rules by which explanations are kept, ranked and worded, on explanations made up for
 * the purpose (the counts are the test data), and more planted slips worked by hand on
 * small models (simple beam L = 6 m, w = 10 kN/m: R = 30 kN, M = 45 kN*m; AISC Manual
 * Table 3-23, from memory).
 */
class ExplanationsRulesTest {

    static Explanation e(String sentence, int explains, int breaks, boolean allOk, int flagged, int agreeing) {
        List<String> ex = new java.util.ArrayList<>(), br = new java.util.ArrayList<>();
        for (int i = 0; i < explains; i++) ex.add("F" + i);
        for (int i = 0; i < breaks; i++) br.add("K" + i);
        return new Explanation(sentence, List.of("claims: " + sentence), ex, br, allOk, flagged, agreeing);
    }

    @Test
    void theSupportIsWordedWithItsCounts() {
        assertEquals("explains 2 of 3 flagged claims, breaks none of 4 that agree", e("a", 2, 0, false, 3, 4).support());
        assertEquals("explains 1 of 1 flagged claim, breaks 1 of 1 that agrees", e("a", 1, 1, false, 1, 1).support());
        assertEquals("explains 2 of 2 flagged claims, breaks none of 3 that agree; with it every claim agrees",
                e("a", 2, 0, true, 2, 3).support());
    }

    @Test
    void whatIsKept() {
        assertTrue(Explanations.kept(e("two net of one", 2, 1, false, 3, 3)));
        assertFalse(Explanations.kept(e("two against two", 2, 2, false, 3, 3)));
        assertFalse(Explanations.kept(e("one alone", 1, 0, false, 2, 3)));
        assertTrue(Explanations.kept(e("one, and all agree", 1, 0, true, 1, 3)));
        assertFalse(Explanations.kept(e("one, all agree, nothing to keep", 1, 0, true, 1, 0)));
        assertFalse(Explanations.kept(e("nothing explained", 0, 0, true, 0, 3)));
    }

    @Test
    void theRanking() {
        Explanation allOk = e("all ok", 2, 0, true, 2, 1), net3 = e("net three", 4, 1, false, 5, 1),
                net2fewerBroken = e("net two, none broken", 2, 0, false, 5, 1), net2 = e("net two, one broken", 3, 1, false, 5, 1),
                fitted = e("fitted", 2, 0, true, 2, 1), dropped = e("dropped", 1, 0, false, 5, 1);
        List<Explanation> r = Explanations.rank(List.of(net2, dropped, net3, fitted, net2fewerBroken, allOk, allOk),
                List.of(false, false, false, true, false, false, false));
        assertEquals(List.of("all ok", "fitted", "net three", "net two, none broken", "net two, one broken"),
                r.stream().map(Explanation::sentence).toList());
        List<Explanation> many = new java.util.ArrayList<>();
        List<Boolean> f = new java.util.ArrayList<>();
        for (int i = 0; i < 8; i++) {
            many.add(e("s" + i, 2, 0, false, 2, 1));
            f.add(false);
        }
        assertEquals(Explanations.SHOWN, Explanations.rank(many, f).size());
        assertEquals("s0", Explanations.rank(many, f).get(0).sentence(), "equals keep the order the trials were made in");
    }

    @Test
    void withinIsTheComparisonsRule() {
        Claim c = new Claim(Claim.Kind.REACTION, "A", "D", Quantity.FY, 103, 103, "N", Double.NaN, SourceRef.none("c"));
        ClaimResult r = new ClaimResult(c, "c", 50, 50, 1, new TolerancePolicy.Applied(0.03, "default"), 0.5,
                ClaimResult.Status.MISMATCH, "D", null, 0, null);
        assertTrue(Explanations.within(r, 100)); // |103 - 100| = 3 = 3% of 100
        assertFalse(Explanations.within(r, 99.9));
        assertFalse(Explanations.within(r, Double.NaN));
        ClaimResult floor = new ClaimResult(c, "c", 50, 50, 1, new TolerancePolicy.Applied(0.0, "default"), 3.5,
                ClaimResult.Status.MISMATCH, "D", null, 0, null);
        assertTrue(Explanations.within(floor, 100), "the absolute floor counts too");
    }

    @Test
    void roundingToThreeFigures() {
        assertEquals(1.23, Explanations.round3(1.23456), 1e-15);
        assertEquals(-0.0123, Explanations.round3(-0.0123456), 1e-15);
        assertEquals(1230, Explanations.round3(1234.5), 1e-9);
        assertEquals(0, Explanations.round3(0), 0);
        assertTrue(Double.isNaN(Explanations.round3(Double.NaN)));
        assertEquals("1.25", Explanations.fmt(1.25));
    }

    static final String SIMPLE = Models.HEAD + """
            nodes: {A: [0, 0], C: [3, 0], B: [6, 0]}
            supports: {A: pinned, B: roller}
            members: {M1: {from: A, to: C, section: G}, M2: {from: C, to: B, section: G}}
            """;

    static Explanation named(Review r, String start) {
        return r.explanations().stream().filter(x -> x.sentence().startsWith(start)).findFirst()
                .orElseThrow(() -> new AssertionError("no '" + start + "' in " + r.explanations()));
    }

    @Test
    void displacementsGivenPositiveDownwards() {
        // uy at midspan -5wL^4/384EI = -8.4375 mm, rz at A -wL^3/24EI = -4.5e-3 rad (EI = 20,000 kN*m2)
        Review r = ExplanationsTest.review(SIMPLE + "loads: {D: {type: dead, member_loads: [{members: [M1, M2], w: -10}]}}\n", """
                claims:
                  reactions:
                    - {node: A, combo: D, Fy: 30}
                  displacements:
                    - {node: C, combo: D, uy: 8.4375 mm}
                    - {node: A, combo: D, rz: 0.0045}
                """);
        Explanation x = named(r, "the displacements are given positive downwards");
        assertTrue(x.allOkAfter());
        assertEquals(2, x.explains().size());
    }

    @Test
    void shearsWithTheOppositeSign() {
        // cantilever fixed at A, w = 10 kN/m on 6 m: V = w(L - x) from 60 to 0 kN; the other sign: V_max 0, V_min -60
        Review r = ExplanationsTest.review(Models.HEAD + """
                nodes: {A: [0, 0], B: [6, 0]}
                supports: {A: fixed}
                members: {M1: {from: A, to: B, section: G}}
                loads: {D: {type: dead, member_loads: [{member: M1, w: -10}]}}
                """, """
                claims:
                  reactions:
                    - {node: A, combo: D, Fy: 60}
                  members:
                    - {member: M1, combo: D, V_max: 0.0001, V_min: -60}
                """);
        assertTrue(named(r, "the shear forces are given with the opposite sign convention").allOkAfter());
    }

    @Test
    void theSetScaleIsTheMedianOfTheFlaggedRatios() {
        // R_A = R_B = 30, M = 45 under D: claims 15, 90 and 22.5 are ratios 0.5, 2, 0.5 in that order: the median is 0.5
        Review r = ExplanationsTest.review(SIMPLE + "loads: {D: {type: dead, member_loads: [{members: [M1, M2], w: -10}]}}\n", """
                claims:
                  reactions:
                    - {node: A, combo: D, Fy: 15}
                    - {node: B, combo: D, Fy: 60}
                  members:
                    - {member: M1, combo: D, M_max: 22.5}
                    - {member: M1, combo: D, V_max: 30}
                """);
        Explanation x = named(r, "every claimed value is 0.500 times");
        assertEquals(List.of("R-A-D-Fy", "M-M1-D-M_max"), x.explains());
        assertEquals(List.of("M-M1-D-V_max"), x.breaks());
    }

    @Test
    void aLoadCaseScaledByAFittedFactor() {
        // ULS = 1.35 D + 1.5 L with L taken 1.25 times: w = 13.5 + 9.375 = 22.875, R = 68.625, M = 102.94 kN*m
        Review r = ExplanationsTest.review(SIMPLE + """
                loads:
                  D: {type: dead, member_loads: [{members: [M1, M2], w: -10}]}
                  L: {type: live, member_loads: [{members: [M1, M2], w: -5}]}
                combinations: {ULS: {D: 1.35, L: 1.5}}
                """, """
                claims:
                  reactions:
                    - {node: A, combo: ULS, Fy: 68.625}
                    - {node: B, combo: ULS, Fy: 68.625}
                    - {node: A, combo: D, Fy: 30}
                  members:
                    - {member: M1, combo: ULS, M_max: 102.94}
                """);
        Explanation x = named(r, "load case L taken 1.25 times its value everywhere");
        assertTrue(x.allOkAfter());
        assertEquals(3, x.explains().size());
    }

    @Test
    void aCaseAddedToACombination() {
        // C2 = D alone (R 30, M 45); with L added at 1.0: w = 15, R = 45, M = 67.5
        Review r = ExplanationsTest.review(SIMPLE + """
                loads:
                  D: {type: dead, member_loads: [{members: [M1, M2], w: -10}]}
                  L: {type: live, member_loads: [{members: [M1, M2], w: -5}]}
                combinations: {C1: {D: 1.35, L: 1.5}, C2: {D: 1.0}}
                """, """
                claims:
                  reactions:
                    - {node: A, combo: C2, Fy: 45}
                    - {node: A, combo: C1, Fy: 63}
                  members:
                    - {member: M1, combo: C2, M_max: 67.5}
                """);
        Explanation x = r.explanations().get(0);
        assertEquals("load case L added to combination C2 (factor 1.0)", x.sentence());
        assertTrue(x.allOkAfter());
    }

    @Test
    void patternLoadingOmitted() {
        // three equal 6 m spans, live 10 kN/m patterned: every span on gives R_A = 0.4 wL = 24 kN (upper bound 27);
        // dead 5 kN/m on every span: R_A = 12 kN
        Review r = ExplanationsTest.review(Models.THREE_SPANS + """
                loads:
                  L: {type: live, pattern: true, member_loads: [{members: [S1, S2, S3], w: -10}]}
                  G: {type: dead, member_loads: [{members: [S1, S2, S3], w: -5}]}
                """, """
                claims:
                  reactions:
                    - {node: A, combo: L, Fy: 24}
                    - {node: D, combo: L, Fy: 24}
                    - {node: A, combo: G, Fy: 12}
                """);
        Explanation x = named(r, "pattern loading omitted");
        assertTrue(x.allOkAfter());
        assertEquals(List.of("R-A-L-Fy", "R-D-L-Fy"), x.explains());
    }

    @Test
    void everyPinnedSupportTakenAsFixed() {
        // pinned at both ends; claims of the fixed-ended beam: M = +15 at midspan, -30 at the ends
        Review r = ExplanationsTest.review(Models.HEAD + """
                nodes: {A: [0, 0], B: [6, 0]}
                supports: {A: pinned, B: pinned}
                members: {M1: {from: A, to: B, section: G}}
                loads: {D: {type: dead, member_loads: [{member: M1, w: -10}]}}
                """, """
                claims:
                  reactions:
                    - {node: A, combo: D, Fy: 30}
                  members:
                    - {member: M1, combo: D, M_max: 15, M_min: -30}
                """);
        Explanation x = r.explanations().get(0);
        assertEquals("the model solved with every pinned support taken as fixed (A, B)", x.sentence());
        assertTrue(x.allOkAfter());
    }

    @Test
    void loadsMoveOnlyBetweenMembersOfTheSameLengthAndDirection() {
        // spans of 6, 6 and 4 m, a 6 m span drawn right to left, a 6 m column, a 6.05 m span and a 6.1 m column
        var m = Models.yaml(Models.HEAD + """
                nodes: {A: [0, 0], B: [6, 0], C: [12, 0], D: [16, 0], E: [6, 6], F: [22, 0], G: [28.05, 0], H: [28.05, -6.1]}
                supports: {A: pinned, B: roller, C: roller, D: roller, F: roller, G: roller}
                members:
                  M1: {from: A, to: B, section: G}
                  M2: {from: B, to: C, section: G}
                  M3: {from: C, to: D, section: G}
                  M4: {from: B, to: E, section: G}
                  M5: {from: F, to: D, section: G}
                  M6: {from: F, to: G, section: G}
                  M7: {from: H, to: G, section: G}
                """);
        assertTrue(Explanations.alike(m, m.member("M1"), m.member("M2")));
        assertFalse(Explanations.alike(m, m.member("M1"), m.member("M3")), "another length");
        assertFalse(Explanations.alike(m, m.member("M1"), m.member("M4")), "another direction");
        assertFalse(Explanations.alike(m, m.member("M1"), m.member("M5")), "drawn the other way: start and end swap");
        assertTrue(Explanations.alike(m, m.member("M1"), m.member("M6")), "within 1% is the same length");
        assertFalse(Explanations.alike(m, m.member("M4"), m.member("M7")), "a column 1.7% longer is not");
    }

    @Test
    void aModulusInTheWrongUnit() {
        // E = 200 MPa where 200 GPa was meant: 5wL^4/384EI = 8.4375 mm becomes 8.4375 m; the reaction does not move
        Review r = ExplanationsTest.review(SIMPLE + "loads: {D: {type: dead, member_loads: [{members: [M1, M2], w: -10}]}}\n", """
                claims:
                  reactions:
                    - {node: A, combo: D, Fy: 30}
                  members:
                    - {member: M1, combo: D, deflection: 8.4375}
                  displacements:
                    - {node: C, combo: D, uy: -8.4375}
                """);
        Explanation x = named(r, "the model solved with E of material s 1/1000 of the model's (MPa and GPa)");
        assertTrue(x.allOkAfter());
        assertEquals(2, x.explains().size());
    }

    @Test
    void allowableStressValuesAgainstStrengthCombinations() {
        // ASCE 7-16 2.3.1(2) 1.2 D + 1.6 L against 2.4.1(2) D + L: w = 20 against 15 kN/m, R = 60 against 45 kN,
        // M = 90 against 67.5 kN*m; (1) 1.4 D against D: R = 42 against 30 kN
        Review r = ReviewTest.review("""
                claims:
                  reactions:
                    - {node: A, combo: asce7-strength/2, Fy: 45}
                    - {node: A, combo: asce7-strength/1, Fy: 30}
                    - {node: A, combo: D, Fy: 30}
                  members:
                    - {member: M1, combo: asce7-strength/2, M_max: 67.5}
                """, Double.NaN);
        Explanation x = named(r, "the claims of the asce7-strength combinations are those of the asce7-asd combinations");
        assertTrue(x.allOkAfter());
        assertEquals(3, x.explains().size());
    }

    @Test
    void oneMemberLoadLeftOut() {
        // 10 kN/m on the left half only (M1, 0 to 3 m of 6): R_A = w a (L - a/2) / L = 22.5 kN, R_B = 7.5 kN
        Review r = ExplanationsTest.review(SIMPLE + """
                loads:
                  D: {type: dead, member_loads: [{members: [M1, M2], w: -10}]}
                  L: {type: live, member_loads: [{members: [M1, M2], w: -5}]}
                """, """
                claims:
                  reactions:
                    - {node: A, combo: D, Fy: 22.5}
                    - {node: B, combo: D, Fy: 7.5}
                    - {node: A, combo: L, Fy: 15}
                """);
        Explanation x = r.explanations().get(0);
        assertEquals("the distributed load of case D on member M2 left out", x.sentence());
        assertTrue(x.allOkAfter());
    }

    @Test
    void oneMemberLoadCountedTwice() {
        // the left half's 10 kN/m doubled: R_A = 2 x 22.5 + 7.5 = 52.5 kN, R_B = 2 x 7.5 + 22.5 = 37.5 kN
        Review r = ExplanationsTest.review(SIMPLE + """
                loads:
                  D: {type: dead, member_loads: [{members: [M1, M2], w: -10}]}
                  L: {type: live, member_loads: [{members: [M1, M2], w: -5}]}
                """, """
                claims:
                  reactions:
                    - {node: A, combo: D, Fy: 52.5}
                    - {node: B, combo: D, Fy: 37.5}
                    - {node: A, combo: L, Fy: 15}
                """);
        Explanation x = r.explanations().get(0);
        assertEquals("the distributed load of case D on member M1 counted twice", x.sentence());
        assertTrue(x.allOkAfter());
    }

    @Test
    void aSecondMomentOfAreaInTheWrongUnit() {
        // I 10^4 times the model's (cm4 read as mm4, or the reverse): midspan deflection 8.4375 mm / 10^4
        Review r = ExplanationsTest.review(SIMPLE + "loads: {D: {type: dead, member_loads: [{members: [M1, M2], w: -10}]}}\n", """
                claims:
                  reactions:
                    - {node: A, combo: D, Fy: 30}
                  displacements:
                    - {node: C, combo: D, uy: -8.4375e-7}
                  members:
                    - {member: M1, combo: D, deflection: 8.4375e-7}
                """);
        Explanation x = named(r, "the model solved with I of section G 10^4 times the model's (cm4 and mm4)");
        assertTrue(x.allOkAfter());
    }
}
