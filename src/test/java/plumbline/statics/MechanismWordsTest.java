package plumbline.statics;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import plumbline.Models;
import plumbline.model.Model;

/**
 * The words for each mechanism, word for word, on unstable arrangements whose motion is
 * found by hand (rigid-body kinematics: instantaneous centres of the members), by both the
 * dense and the sparse path.
 */
class MechanismWordsTest {

    static Model model(String body) {
        return Models.yaml(Models.HEAD + body.replace(";", ",") + "\n");
    }

    /**
     * Each row: nodes, supports, members, and the one mechanism in words. By hand:
     * two rollers leave x free; a pinned bar's free end B at (3, 4) moves perpendicular to AB,
     * along (-4, 3), 143.1 deg; a roller at A (vertical reaction, line x = 0) and one at B
     * turned 45 deg (reaction along (-1, 1) through (6, 0)) meet at (0, 6), the centre of
     * rotation; a pinned A and a horizontal restraint at B both pass through A; a square of
     * four bars sways, its top translating; a collinear two-bar linkage lets its middle joint drop.
     */
    @ParameterizedTest(name = "{0}")
    @CsvSource(delimiter = '|', textBlock = """
            beam on two rollers     | nodes: {A: [0,0]; B: [6,0]}  | supports: {A: roller; B: roller} | members: {M1: {from: A; to: B; section: G}} | the whole structure can translate horizontally as a rigid body: the supports do not hold it
            pinned bar, free end    | nodes: {A: [0,0]; B: [3,4]}  | supports: {A: pinned} | members: {T1: {from: A; to: B; section: G; truss: true}} | node B can translate along a line at 143.1 deg to the x axis: the whole structure can rotate about node A as a rigid body: the supports do not hold it
            concurrent at a point   | nodes: {A: [0,0]; B: [6,0]}  | supports: {A: roller; B: {fix: [uy]; angle: 45 deg}} | members: {M1: {from: A; to: B; section: G}} | the whole structure can rotate about the point (0.000, 6.000) m as a rigid body: the supports do not hold it
            concurrent at a node    | nodes: {A: [0,0]; B: [6,0]}  | supports: {A: pinned; B: {fix: [ux]}} | members: {M1: {from: A; to: B; section: G}} | node B can translate vertically: the whole structure can rotate about node A as a rigid body: the supports do not hold it
            square of four bars     | nodes: {A: [0,0]; B: [4,0]; C: [4,4]; D: [0,4]} | supports: {A: pinned; B: roller} | members: {T1: {from: A; to: B; section: G; truss: true}; T2: {from: B; to: C; section: G; truss: true}; T3: {from: C; to: D; section: G; truss: true}; T4: {from: D; to: A; section: G; truss: true}} | member T2 rotates about node B; member T3 translates horizontally; member T4 rotates about node A (together, as a linkage)
            collinear linkage       | nodes: {A: [0,0]; B: [4,0]; C: [8,0]} | supports: {A: pinned; C: pinned} | members: {T1: {from: A; to: B; section: G; truss: true}; T2: {from: B; to: C; section: G; truss: true}} | node B can translate vertically: member T1 rotates about node A; member T2 rotates about node C (together, as a linkage)
            hinged drop-in span     | nodes: {A: [0,0]; B: [4,0]; C: [8,0]; D: [12,0]} | supports: {A: fixed; D: roller} | members: {M1: {from: A; to: B; section: G; hinge: end}; M2: {from: B; to: C; section: G; hinge: end}; M3: {from: C; to: D; section: G}} | node C can translate vertically: member M2 rotates about node B; member M3 rotates about node D (together, as a linkage)
            portal hinged at eaves  | nodes: {A: [0,0]; B: [0,4]; C: [6,4]; D: [6,0]} | supports: {A: pinned; D: pinned} | members: {C1: {from: A; to: B; section: G; hinge: end}; R: {from: B; to: C; section: G}; C2: {from: D; to: C; section: G; hinge: end}} | member C1 rotates about node A; member R translates horizontally; member C2 rotates about node D (together, as a linkage)
            one beam of two loose   | nodes: {A: [0,0]; B: [6,0]; C: [20,0]; D: [26,0]} | supports: {A: roller; B: roller; C: pinned; D: roller} | members: {M1: {from: A; to: B; section: G}; M2: {from: C; to: D; section: G}} | member M1 translates horizontally
            """)
    void oneMechanismInWords(String name, String nodes, String supports, String members, String words) {
        Model m = model(nodes + "\n" + supports + "\n" + members);
        for (Determinacy.Result r : List.of(Determinacy.of(m), Determinacy.sparse(m, EquilibriumMatrix.of(m)))) {
            assertEquals(Determinacy.Classification.UNSTABLE, r.classification(), name);
            assertEquals(1, r.shapes().size(), name);
            assertEquals(words, r.shapes().get(0).description(), name);
        }
    }

    @Test
    void theMotionOfTheLinkageIsTheMiddleJointMovingAlone() {
        Model m = model("nodes: {A: [0,0]; B: [4,0]; C: [8,0]}\nsupports: {A: pinned; C: pinned}\n"
                + "members: {T1: {from: A; to: B; section: G; truss: true}; T2: {from: B; to: C; section: G; truss: true}}");
        var shape = Determinacy.of(m).shapes().get(0);
        assertEquals(List.of("B"), List.copyOf(shape.motion().keySet()), "only B moves");
        double[] b = shape.motion().get("B");
        assertEquals(0, b[0], 1e-12);
        assertEquals(1, Math.abs(b[1]), 1e-12, "normalized to a unit translation");
    }

    @Test
    void twoLooseBeamsAreTwoSeparateMechanisms() {
        // each beam on two rollers slides on its own: the basis is separated so each shape moves one beam
        Model m = model("nodes: {A: [0,0]; B: [6,0]; C: [20,0]; D: [26,0]}\nsupports: {A: roller; B: roller; C: roller; D: roller}\n"
                + "members: {M1: {from: A; to: B; section: G}; M2: {from: C; to: D; section: G}}");
        for (Determinacy.Result r : List.of(Determinacy.of(m), Determinacy.sparse(m, EquilibriumMatrix.of(m)))) {
            assertEquals(2, r.mechanisms());
            List<String> words = r.shapes().stream().map(Determinacy.Mechanism::description).sorted().toList();
            assertEquals(List.of("member M1 translates horizontally", "member M2 translates horizontally"), words);
            for (var s : r.shapes()) assertEquals(2, s.motion().size(), "one beam's two nodes: " + s.motion().keySet());
        }
    }

    @Test
    void aNearlyCollinearLinkageIsStableButNamedANearMechanism() {
        // middle joint 0.2 micrometres off the line of an 8 m pair of bars (sin of the kink 5e-8 < 1e-7): stable, but nearly a mechanism
        Model m = model("nodes: {A: [0,0]; B: [4,2.0e-7]; C: [8,0]}\nsupports: {A: pinned; C: pinned}\n"
                + "members: {T1: {from: A; to: B; section: G; truss: true}; T2: {from: B; to: C; section: G; truss: true}}");
        Determinacy.Result r = Determinacy.of(m);
        // 2 bars + 4 reaction components against 6 joint equations: determinate once the joint is off the line
        assertEquals(Determinacy.Classification.DETERMINATE, r.classification());
        assertEquals(0, r.degree());
        assertTrue(r.remark().startsWith("near-mechanism: the equilibrium equations are nearly dependent"), r.remark());
        assertTrue(r.conditionRatio() < Determinacy.NEAR_MECHANISM, "condition " + r.conditionRatio());
        Model straight = model("nodes: {A: [0,0]; B: [4,3]; C: [8,0]}\nsupports: {A: pinned; C: pinned}\n"
                + "members: {T1: {from: A; to: B; section: G; truss: true}; T2: {from: B; to: C; section: G; truss: true}}");
        Determinacy.Result ok = Determinacy.of(straight);
        assertEquals("", ok.remark());
        assertTrue(ok.conditionRatio() > Determinacy.NEAR_MECHANISM);
    }

    @Test
    void aBeamSwingingAboutItsOnlyPinTurnsAsOneBody() {
        // a 6 m frame member pinned at A and free at B swings about A: B moves vertically by L theta,
        // so at unit translation of B both ends turn by theta = 1/6 rad, anticlockwise when B rises (rigid-body kinematics)
        Model m = model("nodes: {A: [0,0]; B: [6,0]}\nsupports: {A: pinned}\nmembers: {M1: {from: A; to: B; section: G}}");
        for (Determinacy.Result r : List.of(Determinacy.of(m), Determinacy.sparse(m, EquilibriumMatrix.of(m)))) {
            var shape = r.shapes().get(0);
            double[] a = shape.motion().get("A"), b = shape.motion().get("B");
            assertEquals(0, a[0], 1e-12);
            assertEquals(0, a[1], 1e-12);
            assertEquals(0, b[0], 1e-12);
            assertEquals(1, Math.abs(b[1]), 1e-12);
            assertEquals(b[1] / 6, a[2], 1e-12, "A turns by uy_B / L");
            assertEquals(b[1] / 6, b[2], 1e-12, "B turns with the member");
        }
    }

    @Test
    void theDenseAndSparsePathsFindTheSameMotions() {
        // the reduced row-echelon basis of a mechanism space is unique, so both paths must give the same shapes
        Model m = model("nodes: {A: [0,0]; B: [4,0]; C: [4,4]; D: [0,4]; E: [10,0]; F: [16,0]}\n"
                + "supports: {A: pinned; B: roller; E: roller; F: roller}\n"
                + "members: {T1: {from: A; to: B; section: G; truss: true}; T2: {from: B; to: C; section: G; truss: true}; "
                + "T3: {from: C; to: D; section: G; truss: true}; T4: {from: D; to: A; section: G; truss: true}; "
                + "M5: {from: E; to: F; section: G}}");
        Determinacy.Result dense = Determinacy.of(m), sparse = Determinacy.sparse(m, EquilibriumMatrix.of(m));
        assertEquals(2, dense.mechanisms());
        assertEquals(dense.shapes().size(), sparse.shapes().size());
        for (int k = 0; k < dense.shapes().size(); k++) {
            var d = dense.shapes().get(k);
            var s = sparse.shapes().get(k);
            assertEquals(d.description(), s.description());
            assertEquals(d.motion().keySet(), s.motion().keySet());
            for (String node : d.motion().keySet()) {
                for (int c = 0; c < 3; c++) {
                    assertEquals(d.motion().get(node)[c], s.motion().get(node)[c], 1e-9, node + " component " + c);
                }
            }
        }
    }

    @ParameterizedTest(name = "({0}, {1}) {2}")
    @CsvSource(delimiter = '|', textBlock = """
            1    | 0       | horizontally
            -1   | 0       | horizontally
            1    | 1.0e-6  | horizontally
            -1   | 1.0e-6  | horizontally
            0    | 1       | vertically
            0    | -1      | vertically
            1    | 1       | along a line at 45.0 deg to the x axis
            -1   | 1       | along a line at 135.0 deg to the x axis
            1    | -1      | along a line at 135.0 deg to the x axis
            -4   | 3       | along a line at 143.1 deg to the x axis
            """)
    void aDirectionIsALineNotASense(double dx, double dy, String words) {
        // a line through the origin at angle a and at a + 180 deg is the same line: the angle is taken in [0, 180)
        assertEquals(words, Determinacy.direction(dx, dy));
    }
}
