package plumbline.solve.force;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import plumbline.Models;
import plumbline.model.Model;
import plumbline.solve.EngineResult;
import plumbline.solve.MemberActions;

/**
 * The pieces of the force method a checker reads in its working, each against statics by hand:
 * the released (simple-beam) end forces of a member, the count of node equations, the method
 * of joints order for a determinate truss, and the number formats of the working.
 */
class ForceEngineInternalsTest {

    @Test
    void theReleasedMemberCarriesItsLoadsAsASimpleBeam() {
        // 6 m member, 30 kN down (local -y) at 2 m: R_j = 30 x 2 / 6 = 10 kN, R_i = 20 kN (statics by hand);
        // an axial 5 kN at the start goes straight into the start node, one of 4 kN at 3 m into the end (N = 0 at the start)
        MemberActions a = new MemberActions(6, List.of(),
                List.of(new MemberActions.Point(2, 0, -30e3), new MemberActions.Point(0, 5e3, 0), new MemberActions.Point(3, 4e3, 0)),
                List.of(), 0, 0);
        assertArrayEquals(new double[]{-5e3, 20e3, 0, -4e3, 10e3, 0}, ForceEngine.released(a), 1e-9);
    }

    @Test
    void aCoupleOnTheReleasedMemberIsCarriedByAPairOfShears() {
        // 12 kN*m anticlockwise on a 4 m simple beam: end shears -3 kN at i and +3 kN at j (statics by hand)
        MemberActions a = new MemberActions(4, List.of(), List.of(), List.of(new MemberActions.Couple(1, 12e3)), 0, 0);
        assertArrayEquals(new double[]{0, 3e3, 0, 0, -3e3, 0}, ForceEngine.released(a), 1e-9);
    }

    @ParameterizedTest(name = "{0}")
    @CsvSource(delimiter = '|', textBlock = """
            frame: three equations a node             | A: fixed; C: fixed  | M1: {from: A; to: B; section: G}; M2: {from: B; to: C; section: G}                         | 9
            truss: two a joint                        | A: pinned; C: roller | M1: {from: A; to: B; section: G; truss: true}; M2: {from: B; to: C; section: G; truss: true} | 6
            hinged both sides of B: B has no rotation | A: fixed; C: fixed  | M1: {from: A; to: B; section: G; hinge: end}; M2: {from: B; to: C; section: G; hinge: start} | 8
            """)
    void nodeEquationsAreCountedPerFreedom(String name, String supports, String members, int equations) {
        Model m = Models.yaml(Models.HEAD + "nodes: {A: [0,0], B: [4,0], C: [8,0]}\nsupports: {" + supports.replace(";", ",")
                + "}\nmembers: {" + members.replace(";", ",") + "}\n");
        assertEquals(equations, ForceEngine.equations(m), name);
        assertNull(ForceEngine.tooLarge(m));
    }

    @Test
    void theSizeLimitIsNamedWithTheCount() {
        assertNull(ForceEngine.tooLarge(ForceEngine.MAX_EQUATIONS));
        assertEquals("the model has 200001 node equations; the force method takes at most 200000",
                ForceEngine.tooLarge(ForceEngine.MAX_EQUATIONS + 1));
    }

    @Test
    void theMethodOfJointsOrderForAKingPostTruss() {
        // A (0,0) pinned, B (8,0) roller, C (4,3) apex, D (4,0) mid-joint: joints A (2 bars + 2 reactions) and
        // B (2 bars + 1 reaction) have too many unknowns at first; D has the bottom chords and the post (3)...
        // none has two, so the reactions come first from the whole truss; then A (AD, AC), D (DB, DC), then C and B check
        Model m = Models.yaml(Models.HEAD + """
                nodes: {A: [0,0], D: [4,0], B: [8,0], C: [4,3]}
                supports: {A: pinned, B: roller}
                members:
                  AD: {from: A, to: D, section: G, truss: true}
                  DB: {from: D, to: B, section: G, truss: true}
                  AC: {from: A, to: C, section: G, truss: true}
                  CB: {from: C, to: B, section: G, truss: true}
                  DC: {from: D, to: C, section: G, truss: true}
                loads:
                  P: {type: live, node_loads: [{node: D, Fy: -10}]}
                """);
        EngineResult r = new ForceEngine().solve(m);
        assertEquals("method of joints order: reactions from the equilibrium of the whole truss; joint A (AD, AC); "
                + "joint D (DB, DC); joint B (CB); joint C (check)", r.notes().get(1));
    }
}
