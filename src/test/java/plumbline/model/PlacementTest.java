package plumbline.model;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotSame;
import static org.junit.jupiter.api.Assertions.assertSame;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import plumbline.Models;

/**
 * Where a member lies, worked out once per model and found by the member object itself:
 * the values are those of plane geometry by hand (a 3-4-5 triangle: length 5, direction
 * {0.6, 0.8}), a member that is not one of the model's very objects (a variant's, placed
 * between other nodes) is placed from the model's nodes and never given the stored
 * placement of a member of the same name, and the largest axial stiffness is E A by hand.
 */
class PlacementTest {

    /** The usual head with a second section H of three times the area. */
    static final String MODEL = Models.HEAD.replace("sections: {G: {A: 0.01, I: 1.0e-4, material: s}}\n", "") + """
            sections:
              G: {A: 0.01, I: 1.0e-4, material: s}
              H: {A: 0.03, I: 1.0e-4, material: s}
            nodes: {A: [0, 0], B: [3, 4], C: [9, 4]}
            supports: {A: fixed, C: pinned}
            members:
              M1: {from: A, to: B, section: G}
              M2: {from: B, to: C, section: H}
            """;

    @Test
    void aMembersPlacementIsItsGeometryByHand() {
        Model m = Models.yaml(MODEL);
        Model.Placement p = m.placementOf(m.member("M1"));
        assertEquals(5.0, p.lengthM(), 0.0, "3-4-5 triangle");
        assertEquals(0.6, p.cx(), 1e-16);
        assertEquals(0.8, p.cy(), 1e-16);
        assertEquals(3.0, p.dxM(), 0.0);
        assertEquals(4.0, p.dyM(), 0.0);
        assertSame(p, m.placementOf(m.member("M1")), "worked out once, then found");
        assertEquals(5.0, m.lengthM(m.member("M1")), 0.0);
        assertEquals(6.0, m.lengthM(m.member("M2")), 0.0);
        assertEquals(1.0, m.directionOf(m.member("M2"))[0], 0.0);
        // E A = 200 GPa x 0.03 m2 = 6.0e9 N, the larger of the two sections
        assertEquals(6.0e9, m.largestAxialStiffnessN(), 1e-6);
    }

    @Test
    void aMemberNotOfTheModelIsPlacedFromTheModelsNodesNotByItsName() {
        Model m = Models.yaml(MODEL);
        Member m1 = m.member("M1");
        // the same name and section, but from A to C: a variant's member, equal in nothing but the name
        Member moved = new Member("M1", "A", "C", m1.section(), false, false, false, m1.at());
        Model.Placement p = m.placementOf(moved);
        assertEquals(Math.hypot(9, 4), p.lengthM(), 0.0);
        assertEquals(9.0, p.dxM(), 0.0);
        // an equal copy of M1 (another object) is placed from the nodes too, to the same numbers
        Member copy = new Member(m1.name(), m1.from(), m1.to(), m1.section(), m1.hingeStart(), m1.hingeEnd(), m1.truss(), m1.at());
        assertNotSame(m.placementOf(m1), m.placementOf(copy));
        assertEquals(m.placementOf(m1), m.placementOf(copy));
        // a variant with a moved node: its own members (the same objects) get its own placement
        Map<String, Node> nodes = new LinkedHashMap<>(m.nodes());
        nodes.put("B", new Node("B", 3, 5, m.node("B").at()));
        Model variant = new Model(m.file(), m.job(), m.units(), m.materials(), m.sections(), nodes, m.supports(), m.members(),
                m.loadCases(), m.combinations(), m.standardCombinations(), m.redundants(), m.claims());
        assertEquals(Math.hypot(3, 5), variant.lengthM(m1), 0.0);
        assertEquals(5.0, m.lengthM(m1), 0.0, "the model's own placement is unchanged");
        // the model with more claims has the very same frame: its placements are the model's own
        Model claimed = m.withClaims(List.of());
        assertSame(m.placementOf(m1), claimed.placementOf(claimed.member("M1")));
        assertEquals(6.0e9, claimed.largestAxialStiffnessN(), 1e-6);
    }

    /** Members read in the model's order take the next one; out of order, or past the end, they are looked up by name. */
    @Test
    void membersAreReadInStepOrByName() {
        Model m = Models.yaml(MODEL);
        java.util.Iterator<String> names = m.members().keySet().iterator();
        java.util.Iterator<Member> inOrder = m.members().values().iterator();
        assertSame(m.member("M1"), Model.inStep(names, inOrder, "M1", m.members()));
        assertSame(m.member("M2"), Model.inStep(names, inOrder, "M2", m.members()));
        assertSame(m.member("M1"), Model.inStep(names, inOrder, "M1", m.members()), "past the end: by name");
        java.util.Iterator<String> freshNames = m.members().keySet().iterator();
        java.util.Iterator<Member> fresh = m.members().values().iterator();
        assertSame(m.member("M2"), Model.inStep(freshNames, fresh, "M2", m.members()), "out of order: by name, not the next one");
        assertEquals(null, Model.inStep(freshNames, fresh, "M9", m.members()), "no such member");
    }
}
