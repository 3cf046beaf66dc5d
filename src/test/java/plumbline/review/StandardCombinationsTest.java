package plumbline.review;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import plumbline.Models;
import plumbline.model.Model;

/**
 * Expansion of standard basic combinations over load cases by type. Reference factors:
 * ASCE/SEI 7-16 sections 2.3.1 and 2.4.1; EN 1990:2002+A1:2005 Tables A1.1 and A1.2(B)
 * (all from memory).
 */
class StandardCombinationsTest {

    static Model model(String sets) {
        return Models.yaml(plumbline.Models.HEAD + """
                nodes: {A: [0, 0], B: [6, 0]}
                supports: {A: pinned, B: roller}
                members: {M1: {from: A, to: B, section: G}}
                loads:
                  D1: {type: dead, member_loads: [{member: M1, w: -5}]}
                  D2: {type: dead, member_loads: [{member: M1, w: -1}]}
                  L: {type: live, member_loads: [{member: M1, w: -4}]}
                  S: {type: snow, member_loads: [{member: M1, w: -2}]}
                  WL: {type: wind, node_loads: [{node: B, Fx: 3}]}
                  WR: {type: wind, node_loads: [{node: B, Fx: -3}]}
                standard_combinations: %s
                """.formatted(sets));
    }

    static Map<String, Double> find(List<LoadSet> sets, String name) {
        for (LoadSet s : sets) if (s.name().equals(name)) return s.factors();
        throw new AssertionError("no " + name + " in " + sets.stream().map(LoadSet::name).toList());
    }

    @Test
    void asceStrength() {
        List<LoadSet> s = StandardCombinations.expand(model("[asce7-strength]"));
        assertEquals(Map.of("D1", 1.4, "D2", 1.4), find(s, "asce7-strength/1"));
        assertEquals(Map.of("D1", 1.2, "D2", 1.2, "L", 1.6, "S", 0.5), find(s, "asce7-strength/2"));
        // wind cases are alternatives, never together
        assertEquals(Map.of("D1", 0.9, "D2", 0.9, "WL", 1.0), find(s, "asce7-strength/6-W(WL)"));
        assertEquals(Map.of("D1", 0.9, "D2", 0.9, "WR", 1.0), find(s, "asce7-strength/6-W(WR)"));
        for (LoadSet x : s) {
            assertTrue(!(x.factors().containsKey("WL") && x.factors().containsKey("WR")), x.name());
            assertTrue(x.origin().startsWith("ASCE/SEI 7-16 section 2.3.1"), x.origin());
        }
    }

    @Test
    void asceAllowableStress() {
        List<LoadSet> s = StandardCombinations.expand(model("[asce7-asd]"));
        assertEquals(Map.of("D1", 1.0, "D2", 1.0, "L", 0.75, "S", 0.75), find(s, "asce7-asd/4"));
        assertEquals(Map.of("D1", 0.6, "D2", 0.6, "WL", 0.6), find(s, "asce7-asd/7-W(WL)"));
    }

    @Test
    void en1990() {
        List<LoadSet> s = StandardCombinations.expand(model("[en1990-6.10]"));
        // imposed leading, snow and wind accompanying with psi_0 = 0.5 and 0.6
        Map<String, Double> q = find(s, "en1990-6.10/Q-W(WL)");
        assertEquals(1.35, q.get("D1"), 1e-12);
        assertEquals(1.5, q.get("L"), 1e-12);
        assertEquals(0.75, q.get("S"), 1e-12);
        assertEquals(0.9, q.get("WL"), 1e-12);
        List<LoadSet> ab = StandardCombinations.expand(model("[en1990-6.10ab]"));
        Map<String, Double> b = find(ab, "en1990-6.10ab/b-Q-W(WL)");
        assertEquals(0.85 * 1.35, b.get("D1"), 1e-12);
        assertEquals(1.05, find(ab, "en1990-6.10ab/a-W(WL)").get("L"), 1e-12);
    }
}
