package plumbline.review;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import plumbline.Models;
import plumbline.model.Model;

/**
 * Expansion of standard basic combinations over load cases by type. Reference factors:
 * ASCE/SEI 7-16 sections 2.3.1 and 2.4.1; EN 1990:2002+A1:2005 Tables A1.1 and A1.2(B)
 * (all from memory).
 */
class StandardCombinationsTest {

    static Model model(String sets) {
        return Models.yaml(Models.SIMPLE_BEAM + """
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

    /**
     * The complete expansion over one case of every type (two wind directions), each set's
     * names and factors as the standards give them (from memory): ASCE/SEI 7-16 2.3.1
     * (1) 1.4D, (2) 1.2D + 1.6L + 0.5(Lr or S or R), (3) 1.2D + 1.6(Lr or S or R) + (L or
     * 0.5W), (4) 1.2D + 1.0W + L + 0.5(Lr or S or R), (5) 1.2D + 1.0E + L + 0.2S, (6) 0.9D +
     * 1.0W, (7) 0.9D + 1.0E; 2.4.1 (1) D to (8) 0.6D + 0.7E; EN 1990 (6.10) 1.35G + 1.5Q_1 +
     * 1.5 psi_0 Q_i with psi_0 = 0.7 (imposed, category A), 0 (roofs, category H), 0.5
     * (snow), 0.6 (wind), G favourable at 1.0; (6.10a) 1.35G + 1.5 psi_0 Q; (6.10b) with
     * xi = 0.85. Wind directions are alternatives, never together.
     */
    @ParameterizedTest(name = "{0}")
    @CsvSource(delimiter = '|', textBlock = """
            asce7-strength/1               | D 1.4
            asce7-strength/2-Lr            | D 1.2 L 1.6 LR 0.5
            asce7-strength/2-S             | D 1.2 L 1.6 S 0.5
            asce7-strength/3-Lr            | D 1.2 L 1 LR 1.6
            asce7-strength/3-S             | D 1.2 L 1 S 1.6
            asce7-strength/3w-Lr-W(WL)     | D 1.2 LR 1.6 WL 0.5
            asce7-strength/3w-Lr-W(WR)     | D 1.2 LR 1.6 WR 0.5
            asce7-strength/3w-S-W(WL)      | D 1.2 S 1.6 WL 0.5
            asce7-strength/3w-S-W(WR)      | D 1.2 S 1.6 WR 0.5
            asce7-strength/4-W(WL)-Lr      | D 1.2 L 1 LR 0.5 WL 1
            asce7-strength/4-W(WL)-S       | D 1.2 L 1 S 0.5 WL 1
            asce7-strength/4-W(WR)-Lr      | D 1.2 L 1 LR 0.5 WR 1
            asce7-strength/4-W(WR)-S       | D 1.2 L 1 S 0.5 WR 1
            asce7-strength/6-W(WL)         | D 0.9 WL 1
            asce7-strength/6-W(WR)         | D 0.9 WR 1
            asce7-strength/5               | D 1.2 E 1 L 1 S 0.2
            asce7-strength/7               | D 0.9 E 1
            asce7-asd/1                    | D 1
            asce7-asd/2                    | D 1 L 1
            asce7-asd/3-Lr                 | D 1 LR 1
            asce7-asd/3-S                  | D 1 S 1
            asce7-asd/4-Lr                 | D 1 L 0.75 LR 0.75
            asce7-asd/4-S                  | D 1 L 0.75 S 0.75
            asce7-asd/5-W(WL)              | D 1 WL 0.6
            asce7-asd/5-W(WR)              | D 1 WR 0.6
            asce7-asd/6a-W(WL)-Lr          | D 1 L 0.75 LR 0.75 WL 0.45
            asce7-asd/6a-W(WL)-S           | D 1 L 0.75 S 0.75 WL 0.45
            asce7-asd/6a-W(WR)-Lr          | D 1 L 0.75 LR 0.75 WR 0.45
            asce7-asd/6a-W(WR)-S           | D 1 L 0.75 S 0.75 WR 0.45
            asce7-asd/7-W(WL)              | D 0.6 WL 0.6
            asce7-asd/7-W(WR)              | D 0.6 WR 0.6
            asce7-asd/5e                   | D 1 E 0.7
            asce7-asd/6b                   | D 1 E 0.525 L 0.75 S 0.75
            asce7-asd/8                    | D 0.6 E 0.7
            en1990-6.10/Q-W(WL)            | D 1.35 L 1.5 S 0.75 WL 0.9
            en1990-6.10/Q-W(WR)            | D 1.35 L 1.5 S 0.75 WR 0.9
            en1990-6.10/Q-inf              | D 1 L 1.5
            en1990-6.10/Qr-W(WL)           | D 1.35 L 1.05 LR 1.5 S 0.75 WL 0.9
            en1990-6.10/Qr-W(WR)           | D 1.35 L 1.05 LR 1.5 S 0.75 WR 0.9
            en1990-6.10/Qr-inf             | D 1 LR 1.5
            en1990-6.10/S-W(WL)            | D 1.35 L 1.05 S 1.5 WL 0.9
            en1990-6.10/S-W(WR)            | D 1.35 L 1.05 S 1.5 WR 0.9
            en1990-6.10/S-inf              | D 1 S 1.5
            en1990-6.10/W-W(WL)            | D 1.35 L 1.05 S 0.75 WL 1.5
            en1990-6.10/W-W(WR)            | D 1.35 L 1.05 S 0.75 WR 1.5
            en1990-6.10/W-inf-W(WL)        | D 1 WL 1.5
            en1990-6.10/W-inf-W(WR)        | D 1 WR 1.5
            en1990-6.10ab/a-W(WL)          | D 1.35 L 1.05 S 0.75 WL 0.9
            en1990-6.10ab/a-W(WR)          | D 1.35 L 1.05 S 0.75 WR 0.9
            en1990-6.10ab/b-Q-W(WL)        | D 1.1475 L 1.5 S 0.75 WL 0.9
            en1990-6.10ab/b-Q-W(WR)        | D 1.1475 L 1.5 S 0.75 WR 0.9
            en1990-6.10ab/b-Q-inf          | D 1 L 1.5
            en1990-6.10ab/b-Qr-W(WL)       | D 1.1475 L 1.05 LR 1.5 S 0.75 WL 0.9
            en1990-6.10ab/b-Qr-W(WR)       | D 1.1475 L 1.05 LR 1.5 S 0.75 WR 0.9
            en1990-6.10ab/b-Qr-inf         | D 1 LR 1.5
            en1990-6.10ab/b-S-W(WL)        | D 1.1475 L 1.05 S 1.5 WL 0.9
            en1990-6.10ab/b-S-W(WR)        | D 1.1475 L 1.05 S 1.5 WR 0.9
            en1990-6.10ab/b-S-inf          | D 1 S 1.5
            en1990-6.10ab/b-W-W(WL)        | D 1.1475 L 1.05 S 0.75 WL 1.5
            en1990-6.10ab/b-W-W(WR)        | D 1.1475 L 1.05 S 0.75 WR 1.5
            en1990-6.10ab/b-W-inf-W(WL)    | D 1 WL 1.5
            en1990-6.10ab/b-W-inf-W(WR)    | D 1 WR 1.5
            """)
    void everyCombinationOfEverySet(String name, String factors) {
        String set = name.substring(0, name.indexOf('/'));
        List<LoadSet> all = StandardCombinations.expand(everyType(set));
        Map<String, Double> expected = new java.util.TreeMap<>();
        String[] f = factors.trim().split(" ");
        for (int i = 0; i < f.length; i += 2) expected.put(f[i], Double.parseDouble(f[i + 1]));
        Map<String, Double> got = new java.util.TreeMap<>(find(all, name));
        assertEquals(expected.keySet(), got.keySet(), name);
        for (var e : expected.entrySet()) assertEquals(e.getValue(), got.get(e.getKey()), 1e-12, name + " " + e.getKey());
        assertEquals(1, all.stream().filter(s -> s.name().equals(name)).count(), "names are unique");
        assertTrue(all.stream().filter(s -> s.name().equals(name)).allMatch(LoadSet::combination));
    }

    @Test
    void theSetsHoldExactlyTheseCombinations() {
        assertEquals(17, StandardCombinations.expand(everyType("asce7-strength")).size());
        assertEquals(17, StandardCombinations.expand(everyType("asce7-asd")).size());
        assertEquals(13, StandardCombinations.expand(everyType("en1990-6.10")).size());
        assertEquals(15, StandardCombinations.expand(everyType("en1990-6.10ab")).size());
        for (String set : StandardCombinations.SETS) {
            List<LoadSet> sets = StandardCombinations.expand(everyType(set));
            assertEquals(sets.size(), sets.stream().map(LoadSet::name).distinct().count(), set + ": names are unique");
            assertEquals(sets.size(), sets.stream().map(LoadSet::factors).distinct().count(), set + ": no combination repeats another");
        }
        for (String set : StandardCombinations.SETS) {
            for (LoadSet s : StandardCombinations.expand(everyType(set))) {
                assertTrue(s.origin().startsWith(set.startsWith("asce7") ? "ASCE/SEI 7-16 section 2." : "EN 1990:2002+A1:2005"), s.origin());
            }
        }
    }

    @Test
    void withoutDeadLoadNothingIsFormedAndDeadAloneGivesItsOwnCombination() {
        Model noDead = Models.yaml(Models.SIMPLE_BEAM + """
                loads: {L: {type: live, member_loads: [{member: M1, w: -4}]}}
                standard_combinations: [asce7-strength, asce7-asd, en1990-6.10, en1990-6.10ab]
                """);
        assertTrue(StandardCombinations.expand(noDead).isEmpty());
        Model deadOnly = Models.yaml(Models.SIMPLE_BEAM + """
                loads: {D: {type: dead, member_loads: [{member: M1, w: -4}]}}
                standard_combinations: [asce7-strength, asce7-asd, en1990-6.10]
                """);
        List<String> names = StandardCombinations.expand(deadOnly).stream().map(LoadSet::name).toList();
        assertEquals(List.of("asce7-strength/1", "asce7-asd/1", "en1990-6.10/G"), names);
        assertEquals(Map.of("D", 1.35), find(StandardCombinations.expand(deadOnly), "en1990-6.10/G"));
    }

    static Model everyType(String set) {
        return Models.yaml(Models.SIMPLE_BEAM + """
                loads:
                  D: {type: dead, member_loads: [{member: M1, w: -5}]}
                  L: {type: live, member_loads: [{member: M1, w: -4}]}
                  LR: {type: roof-live, member_loads: [{member: M1, w: -1}]}
                  S: {type: snow, member_loads: [{member: M1, w: -2}]}
                  WL: {type: wind, node_loads: [{node: B, Fx: 3}]}
                  WR: {type: wind, node_loads: [{node: B, Fx: -3}]}
                  E: {type: seismic, node_loads: [{node: B, Fx: 2}]}
                standard_combinations: [%s]
                """.formatted(set));
    }

    /** A model with a dead case and the cases of the types whose bits are set in {@code mask}. */
    static Model withTypes(int mask, String set) {
        String[][] types = {{"L", "live"}, {"Lr", "roof-live"}, {"S", "snow"}, {"R", "rain"}, {"W1", "wind"}, {"W2", "wind"}, {"E", "seismic"}};
        StringBuilder loads = new StringBuilder("  D: {type: dead, member_loads: [{member: M1, w: -5}]}\n");
        for (int b = 0; b < types.length; b++) {
            if ((mask & (1 << b)) != 0) loads.append("  ").append(types[b][0]).append(": {type: ").append(types[b][1])
                    .append(", node_loads: [{node: B, Fx: 1}]}\n");
        }
        return Models.yaml(plumbline.Models.HEAD + "nodes: {A: [0, 0], B: [6, 0]}\nsupports: {A: pinned, B: roller}\n"
                + "members: {M1: {from: A, to: B, section: G}}\nloads:\n" + loads + "standard_combinations: [" + set + "]\n");
    }

    @Test
    void whateverTheTypesPresentNoCombinationRepeatsAnotherAndNoneIsEmpty() {
        for (String set : StandardCombinations.SETS) {
            for (int mask = 0; mask < 128; mask++) {
                List<LoadSet> sets = StandardCombinations.expand(withTypes(mask, set));
                assertTrue(!sets.isEmpty(), set + " " + mask);
                assertEquals(sets.size(), sets.stream().map(LoadSet::name).distinct().count(), set + " " + mask + ": names unique");
                assertEquals(sets.size(), sets.stream().map(LoadSet::factors).distinct().count(), set + " " + mask + ": factors unique "
                        + sets.stream().map(x -> x.name() + x.factors()).toList());
                for (LoadSet x : sets) assertTrue(x.factors().get("D") > 0, x.name() + " carries the dead load");
            }
        }
    }

    @Test
    void theClauseOfEachEurocodeCombinationNamesItsFactors() {
        // EN 1990 (6.10) with live (psi_0 0.7), snow (0.5) and wind (0.6): accompanying factors 1.5 psi_0 = 1.05, 0.75, 0.90
        List<LoadSet> s = StandardCombinations.expand(everyType("en1990-6.10"));
        String ed = "EN 1990:2002+A1:2005, Table A1.2(B), ";
        assertEquals(ed + "expression (6.10): 1.35G + 1.5Q (leading) + 0.75S + 0.90W", origin(s, "en1990-6.10/Q-W(WL)"));
        assertEquals(ed + "expression (6.10): 1.35G + 1.5S (leading) + 1.05Q + 0.90W", origin(s, "en1990-6.10/S-W(WR)"));
        assertEquals(ed + "expression (6.10), permanent action favourable: 1.0G + 1.5Q", origin(s, "en1990-6.10/Q-inf"));
        // roof live load has psi_0 = 0 (Table A1.1, category H roofs): it leads, but never accompanies
        List<LoadSet> r = StandardCombinations.expand(withTypes(1 | 2, "en1990-6.10ab"));
        assertEquals(ed + "expression (6.10b): 1.1475G + 1.5Q (leading)", origin(r, "en1990-6.10ab/b-Q"));
        assertEquals(ed + "expression (6.10b): 1.1475G + 1.5Qr (leading) + 1.05Q", origin(r, "en1990-6.10ab/b-Qr"));
        Map<String, Double> a = find(r, "en1990-6.10ab/a");
        assertEquals(java.util.Set.of("D", "L"), a.keySet(), "6.10a: no roof live load at psi_0 = 0");
        assertEquals(1.35, a.get("D"), 1e-12);
        assertEquals(1.05, a.get("L"), 1e-12);
        // dead load alone
        List<LoadSet> g = StandardCombinations.expand(withTypes(0, "en1990-6.10"));
        assertEquals(List.of("en1990-6.10/G"), g.stream().map(LoadSet::name).toList());
        assertEquals(ed + "permanent actions only: 1.35G", g.get(0).origin());
    }

    static String origin(List<LoadSet> sets, String name) {
        for (LoadSet s : sets) if (s.name().equals(name)) return s.origin();
        throw new AssertionError("no " + name + " in " + sets.stream().map(LoadSet::name).toList());
    }
}
