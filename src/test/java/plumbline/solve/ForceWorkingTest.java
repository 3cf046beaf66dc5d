package plumbline.solve;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import plumbline.Models;
import plumbline.io.ModelReader;
import plumbline.model.Model;
import plumbline.solve.force.ForceEngine;

/** The force method's working, as a checker compares it with a hand calculation. */
class ForceWorkingTest {

    static final String PROPPED = plumbline.Models.HEAD + """
            nodes: {A: [0, 0], B: [6, 0]}
            supports: {A: fixed, B: roller}
            members: {M1: {from: A, to: B, section: G}}
            loads: {W: {type: dead, member_loads: [{member: M1, w: -10}]}}
            """;

    @Test
    void namedRedundantMirrorsTheHandCalculation() {
        // propped cantilever with the prop reaction as redundant: delta_11 = L^3/3EI, Delta_10 = -wL^4/8EI,
        // so R_B = 3wL/8 (AISC Table 3-23 case 12, from memory)
        Model m = Models.yaml(PROPPED + "force_method: {redundants: [B.Fy]}\n");
        EngineResult r = new ForceEngine().solve(m);
        assertTrue(r.notes().get(0).contains("redundants: B.Fy"), r.notes().toString());
        double ei = 200e9 * 1e-4, len = 6;
        String delta = r.notes().get(1);
        assertTrue(delta.contains(String.format(java.util.Locale.ROOT, "%.6g", len * len * len / (3 * ei))), delta);
        assertEquals(3 * 10e3 * len / 8, r.cases().get("W").reactions().get("B")[1], 1e-6);
        // an end moment as redundant instead (the fixed-end moment): same answer
        EngineResult r2 = new ForceEngine().solve(Models.yaml(PROPPED + "force_method: {redundants: [A.Mz]}\n"));
        assertTrue(r2.notes().get(0).contains("redundants: A.Mz"));
        assertEquals(3 * 10e3 * len / 8, r2.cases().get("W").reactions().get("B")[1], 1e-6);
    }

    @Test
    void unknownRedundantIsRefusedByName() {
        EngineResult r = new ForceEngine().solve(Models.yaml(PROPPED + "force_method: {redundants: [C.Fy]}\n"));
        assertFalse(r.stable());
        assertTrue(r.instability().contains("'C.Fy' is not an unknown"), r.instability());
    }

    @Test
    void determinateTrussRecordsTheMethodOfJoints() throws Exception {
        Model m = ModelReader.read(Path.of("checks/13-pratt-truss-joints.yaml"));
        EngineResult r = new ForceEngine().solve(m);
        String order = r.notes().stream().filter(n -> n.startsWith("method of joints order")).findFirst().orElseThrow();
        assertFalse(order.contains("no joint with two unknowns"), order);
        for (String node : m.nodes().keySet()) assertTrue(order.contains("joint " + node + " "), node + " in " + order);
    }
}
