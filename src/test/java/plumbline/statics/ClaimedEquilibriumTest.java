package plumbline.statics;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;
import plumbline.Models;
import plumbline.model.Model;

/**
 * Equilibrium of claimed reactions by statics by hand. A 6 m simple beam with 10 kN/m
 * (60 kN) and a 4 m overhang-free rafter rising 3 m with 2 kN/m per plan over 4 m
 * horizontal (8 kN): claimed reactions that balance pass, a planted kip-for-kN slip fails.
 */
class ClaimedEquilibriumTest {

    static Model beam(String reactions) {
        return Models.yaml("""
                format: plumbline/1
                units: {force: kN, length: m}
                materials: {s: {E: 200 GPa, density: 0}}
                sections: {G: {A: 0.01, I: 1.0e-4, material: s}}
                nodes: {A: [0, 0], B: [6, 0], C: [10, 3]}
                supports: {A: pinned, B: roller, C: roller}
                members:
                  M1: {from: A, to: B, section: G}
                  R1: {from: B, to: C, section: G}
                loads:
                  D:
                    type: dead
                    member_loads:
                      - {member: M1, w: -10}
                      - {member: R1, w: 2, dir: gravity, per: plan}
                claims:
                  reactions:
                """ + reactions);
    }

    @Test
    void balancedClaimsPass() {
        // total load 60 + 2*4 = 68 kN; any split that sums to 68 with the right moment balances.
        // Moments about A: 60*3 + 8*8 = 244 = 6 R_B + 10 R_C; choose R_C = 4 (as for a simple rafter), R_B = 34, R_A = 30
        Model m = beam("""
                    - {node: A, combo: D, Fx: 0, Fy: 30}
                    - {node: B, combo: D, Fy: 34}
                    - {node: C, combo: D, Fy: 4}
                """);
        List<ClaimedEquilibrium> r = ClaimedEquilibrium.check(m, ClaimedEquilibrium.factorsByName(m, m.combinations()), 0.005);
        assertEquals(1, r.size());
        assertTrue(r.get(0).balanced(), r.get(0).toString());
        assertEquals(0, r.get(0).sumFyN(), 1e-9);
        assertEquals(0, r.get(0).sumMomentNm(), 1e-9);
    }

    @Test
    void unitSlipBreaksEquilibrium() {
        // R_B written as 34 kN / 4.448 = 7.64 (kip) in a kN column
        Model m = beam("""
                    - {node: A, combo: D, Fx: 0, Fy: 30}
                    - {node: B, combo: D, Fy: 7.64}
                    - {node: C, combo: D, Fy: 4}
                """);
        ClaimedEquilibrium r = ClaimedEquilibrium.check(m, ClaimedEquilibrium.factorsByName(m, m.combinations()), 0.005).get(0);
        assertFalse(r.balanced());
        assertEquals(-26.36e3, r.sumFyN(), 1e-6);
    }

    @Test
    void missingComponentsAreNamedAndTheRestChecked() {
        Model m = beam("""
                    - {node: B, combo: D, Fy: 34}
                    - {node: C, combo: D, Fy: 4}
                """);
        ClaimedEquilibrium r = ClaimedEquilibrium.check(m, ClaimedEquilibrium.factorsByName(m, m.combinations()), 0.005).get(0);
        assertEquals(List.of("A.Fx", "A.Fy"), r.missing());
        assertFalse(r.checkedFy());
        assertTrue(r.note().contains("A.Fx"));
    }
}
