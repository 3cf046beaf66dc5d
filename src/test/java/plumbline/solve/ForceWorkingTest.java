package plumbline.solve;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import org.junit.jupiter.api.Test;
import plumbline.Models;
import plumbline.io.ModelReader;
import plumbline.model.Model;
import plumbline.solve.force.ForceEngine;

/** The force method's working, as a checker compares it with a hand calculation. */
class ForceWorkingTest {

    static final String PROPPED = Models.HEAD + """
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
        assertEquals(len * len * len / (3 * ei), r.working().flexibility()[0][0], 1e-12 * len * len * len / (3 * ei));
        String delta = r.working().lines().get(0);
        assertTrue(delta.startsWith("flexibility coefficients delta_ij (SI): [[" + String.format(Locale.ROOT, "%.6g", len * len * len / (3 * ei))), delta);
        // Delta_10 = -wL^4/8EI and z = R_B (upward positive), in the case's line
        assertEquals("case W: Delta_i0 = " + ForceWorking.vectorText(new double[]{-10e3 * Math.pow(len, 4) / (8 * ei)})
                + "; redundants = " + ForceWorking.vectorText(new double[]{3 * 10e3 * len / 8}), r.working().lines().get(1));
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

    @Test
    void theWorkingPrintsSixSignificantFigures() {
        assertEquals("[1.00000, -2.50000e-07, 123457]", ForceWorking.vectorText(new double[]{1, -2.5e-7, 123456.7}));
        assertEquals("[]", ForceWorking.vectorText(new double[0]));
        assertEquals("[[1.00000, 2.00000]; [3.00000, 4.00000]]", ForceWorking.matrixText(new double[][]{{1, 2}, {3, 4}}));
    }

    @Test
    void aMatrixTooLargeToListIsStatedBySize() {
        List<String> thirteen = java.util.stream.IntStream.range(0, 13).mapToObj(i -> "R" + i).toList();
        ForceWorking w = new ForceWorking(thirteen, new double[0][], java.util.Map.of(), java.util.Map.of());
        assertFalse(w.listed());
        assertEquals(List.of("flexibility coefficients: a 13 x 13 matrix (listed for up to 12 redundants)"), w.lines());
        ForceWorking none = new ForceWorking(List.of(), new double[0][], java.util.Map.of(), java.util.Map.of());
        assertFalse(none.listed());
        assertEquals(List.of(), none.lines());
        assertTrue(new ForceWorking(thirteen.subList(0, 12), new double[12][12], java.util.Map.of(), java.util.Map.of()).listed());
    }
}
