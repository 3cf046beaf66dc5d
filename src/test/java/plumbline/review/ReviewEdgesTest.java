package plumbline.review;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.junit.jupiter.api.Test;
import plumbline.Models;
import plumbline.model.Claim;
import plumbline.model.ClaimSet;
import plumbline.model.Quantity;
import plumbline.model.SourceRef;
import plumbline.solve.stiffness.StiffnessEngine;

/**
 * Edges of the comparison that a reader of the code would ask about: which combination an
 * envelope names when two give the same value, which bound a claim of zero is compared with,
 * where each tolerance comes from, the absolute floor of a rotation, and the verdict's words.
 * Values are statics by hand on a simple beam, L = 6 m, w = 10 kN/m: R = 30 kN, M = 45 kN*m.
 */
class ReviewEdgesTest {

    static Review review(String combos, String claims) {
        var m = Models.yaml(Models.HEAD + """
                nodes: {A: [0, 0], C: [3, 0], B: [6, 0]}
                supports: {A: pinned, B: roller}
                members: {M1: {from: A, to: C, section: G}, M2: {from: C, to: B, section: G}}
                loads: {D: {type: dead, member_loads: [{members: [M1, M2], w: -10}]}}
                """ + combos + claims);
        return Review.of(Analysis.of(m, List.of(new StiffnessEngine())), new TolerancePolicy(Double.NaN));
    }

    @Test
    void anEnvelopeTieNamesTheFirstCombination() {
        // C1 and C2 are the same loads: every envelope value ties, and the first combination governs
        Review r = review("combinations: {C1: {D: 1.0}, C2: {D: 1.0}}\n", """
                claims:
                  reactions:
                    - {node: A, combo: envelope, Fy: 30}
                    - {node: A, combo: envelope, Fx: -0.0001}
                  members:
                    - {member: M1, combo: envelope, M_max: 45}
                    - {member: M1, combo: envelope, M_min: 0}
                    - {member: M1, combo: envelope, M_abs: 45}
                """);
        for (ClaimResult c : r.claims()) assertEquals("C1", c.governing(), c.claim().id());
        assertEquals(Map.of("D", 1.0), r.analysis().factors("C2"));
        assertEquals(Map.of("D", 1.0), r.analysis().factors("D"), "a load case on its own is itself at factor 1");
        assertEquals(null, r.analysis().factors("C3"));
        assertEquals(30e3, r.claims().get(0).computed(), 1e-6);
        assertEquals(45e3, r.claims().get(2).computed(), 1e-6);
    }

    @Test
    void anEnvelopeClaimOfZeroIsComparedWithTheUpperValue() {
        // C1 = D (R_A = +30), C2 = -D (R_A = -30): a claim of 0 or more takes the upper, a negative one the lower
        Review r = review("combinations: {C1: {D: 1.0}, C2: {D: -1.0}}\n", """
                claims:
                  reactions:
                    - {node: A, combo: envelope, Fy: 0}
                    - {node: A, combo: envelope, Fy: -30}
                """);
        assertEquals(30e3, r.claims().get(0).computed(), 1e-6);
        assertEquals("C1", r.claims().get(0).governing());
        assertEquals(-30e3, r.claims().get(1).computed(), 1e-6);
        assertEquals("C2", r.claims().get(1).governing());
    }

    @Test
    void theMidspanRotationOfASymmetricBeamIsZeroWithinTheFloor() {
        // by symmetry rz at C is zero; the computed value is round-off, within 0.2% of the largest rotation
        // (wL^3/24EI = 10e3 * 216 / (24 * 2e7) = 4.5e-3 rad at the supports)
        Review r = review("", """
                claims:
                  displacements:
                    - {node: C, combo: D, rz: 0}
                """);
        ClaimResult c = r.claims().get(0);
        assertEquals(ClaimResult.Status.OK, c.status());
        assertEquals(TolerancePolicy.ABSOLUTE_FLOOR_FRACTION * 10e3 * 216 / (24 * 2e7), c.absoluteFloor(), 1e-12);
    }

    static Claim claim(Claim.Kind kind, Quantity q, double tolerance) {
        return new Claim(kind, "A", "D", q, 1, 1, "kN", tolerance, SourceRef.none("c.yaml"));
    }

    @Test
    void eachToleranceSaysWhereItCameFrom() {
        TolerancePolicy cli = new TolerancePolicy(0.07), none = new TolerancePolicy(Double.NaN);
        ClaimSet empty = new ClaimSet("c.yaml", "", Map.of(), List.of());
        ClaimSet kinds = new ClaimSet("c.yaml", "", Map.of("reaction", 0.01, "deflection", 0.2, "member", 0.04), List.of());
        ClaimSet byDefault = new ClaimSet("c.yaml", "", Map.of("default", 0.02), List.of());
        assertEquals(new TolerancePolicy.Applied(0.5, "set on the claim"), none.forClaim(claim(Claim.Kind.REACTION, Quantity.FY, 0.5), kinds));
        assertEquals(new TolerancePolicy.Applied(0.01, "claims file, reaction"), none.forClaim(claim(Claim.Kind.REACTION, Quantity.FY, Double.NaN), kinds));
        assertEquals(new TolerancePolicy.Applied(0.04, "claims file, member"), none.forClaim(claim(Claim.Kind.MEMBER, Quantity.M_MAX, Double.NaN), kinds));
        assertEquals(new TolerancePolicy.Applied(0.2, "claims file, deflection"), none.forClaim(claim(Claim.Kind.MEMBER, Quantity.DEFLECTION, Double.NaN), kinds));
        // a displacement takes the file's deflection tolerance when the file has none for displacements
        assertEquals(new TolerancePolicy.Applied(0.2, "claims file, deflection"), none.forClaim(claim(Claim.Kind.DISPLACEMENT, Quantity.UY, Double.NaN), kinds));
        assertEquals(new TolerancePolicy.Applied(0.02, "claims file, default"), cli.forClaim(claim(Claim.Kind.MEMBER, Quantity.N_MAX, Double.NaN), byDefault));
        assertEquals(new TolerancePolicy.Applied(0.07, "--tolerance"), cli.forClaim(claim(Claim.Kind.REACTION, Quantity.FY, Double.NaN), empty));
        assertEquals(TolerancePolicy.REACTION_DEFAULT, none.forClaim(claim(Claim.Kind.REACTION, Quantity.MZ, Double.NaN), empty).relative());
        assertEquals(TolerancePolicy.MEMBER_DEFAULT, none.forClaim(claim(Claim.Kind.MEMBER, Quantity.V_MIN, Double.NaN), empty).relative());
        assertEquals(new TolerancePolicy.Applied(TolerancePolicy.DEFLECTION_DEFAULT, "default for deflections (common practice)"),
                none.forClaim(claim(Claim.Kind.MEMBER, Quantity.DEFLECTION, Double.NaN), empty));
        assertEquals(new TolerancePolicy.Applied(TolerancePolicy.DEFLECTION_DEFAULT, "default for displacements (common practice)"),
                none.forClaim(claim(Claim.Kind.DISPLACEMENT, Quantity.RZ, Double.NaN), empty));
    }

    @Test
    void everyVerdictHasAMeaningOfItsOwn() {
        Set<String> seen = new HashSet<>();
        for (Verdict v : Verdict.values()) {
            assertFalse(v.meaning().isBlank(), v.word);
            assertTrue(v.meaning().endsWith("."), v.word);
            assertTrue(seen.add(v.meaning()), v.word);
        }
        assertTrue(Verdict.NO_CLAIMS.meaning().contains("no claim was compared"));
        assertTrue(Verdict.ENGINES_DISAGREE.meaning().contains("force and stiffness methods"));
    }

    @Test
    void deflectionWarningsBeyondTwentyAreCountedNotListed() {
        // 30 simple spans of 6 m under 10 kN/m with EI = 200 GPa * 1e-4 m4 / 1000 (E in MPa where GPa were meant):
        // 5 w L^4 / (384 EI) = 5 * 10e3 * 1296 / (384 * 2e4) = 8.4 m, far beyond span/50 = 0.12 m (by hand)
        StringBuilder nodes = new StringBuilder("nodes: {"), sup = new StringBuilder("supports: {"), mem = new StringBuilder("members: {");
        StringBuilder all = new StringBuilder();
        for (int i = 0; i <= 30; i++) {
            nodes.append(i == 0 ? "" : ", ").append("N").append(i).append(": [").append(6 * i).append(", 0]");
            sup.append(i == 0 ? "" : ", ").append("N").append(i).append(i == 0 ? ": pinned" : ": roller");
            if (i > 0) {
                mem.append(i == 1 ? "" : ", ").append("M").append(i).append(": {from: N").append(i - 1).append(", to: N").append(i)
                        .append(", section: G, hinge: end}");
                all.append(i == 1 ? "" : ", ").append("M").append(i);
            }
        }
        var m = Models.yaml(Models.HEAD.replace("E: 200 GPa", "E: 200 MPa") + nodes + "}\n" + sup + "}\n" + mem + "}\n"
                + "loads: {D: {type: dead, member_loads: [{members: [" + all + "], w: -10}]}}\n");
        Review r = Review.of(Analysis.of(m, List.of(new StiffnessEngine())), new TolerancePolicy(Double.NaN));
        long listed = r.warnings().stream().filter(w -> w.message().startsWith("deflection = span/")).count();
        assertEquals(Review.DEFLECTION_WARNINGS_LISTED, listed);
        assertTrue(r.warnings().stream().anyMatch(w -> w.message().equals("10 more member deflections beyond span/50 (the first 20 "
                + "are listed)")), r.warnings().toString());
    }
}
