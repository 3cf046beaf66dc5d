package plumbline.solve;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Random;
import org.junit.jupiter.api.Test;
import plumbline.Models;
import plumbline.bench.FrameGenerator;
import plumbline.io.ModelReader;
import plumbline.model.Model;
import plumbline.review.Agreement;
import plumbline.solve.force.ForceEngine;
import plumbline.solve.stiffness.StiffnessEngine;
import plumbline.statics.Determinacy;

/**
 * The sparse force method (self-stress states of the closed rings) against the stiffness
 * method: wherever it takes a model on, the two agree below 1e-10; where its rings cannot
 * give the states it declines, never answers wrongly.
 */
class SparseForceTest {

    static void agreeOrDecline(Model m, String what, int[] counts) {
        EngineResult f = new ForceEngine().solveSparse(m);
        if (f.declined()) {
            counts[1]++;
            return;
        }
        assertTrue(f.stable(), what + ": " + f.instability());
        EngineResult s = new StiffnessEngine().solve(m);
        double d = Agreement.maxRelativeDifference(m, s.cases(), f.cases());
        // measured: at most 8e-13 over these models; 1e-10 leaves room for platform rounding only
        assertTrue(d < 1e-10, what + ": sparse force method differs by " + d);
        for (Solution x : f.cases().values()) assertTrue(x.equilibriumResidual() < 1e-9, what + " residual " + x.equilibriumResidual());
        counts[0]++;
    }

    @Test
    void checkCasesAndSamples() throws Exception {
        int[] counts = new int[2];
        for (Path p : Files.list(Path.of("checks")).sorted().toList()) agreeOrDecline(ModelReader.read(p), p.toString(), counts);
        for (Path p : Files.list(Path.of("samples")).filter(x -> !x.toString().contains("claims")).sorted().toList()) {
            if (p.toString().endsWith(".yaml")) agreeOrDecline(ModelReader.read(p), p.toString(), counts);
        }
        assertTrue(counts[0] >= 12, "the sparse path takes most reference models: solved " + counts[0] + ", declined " + counts[1]);
    }

    @Test
    void randomFramesAndTrusses() {
        Random rnd = new Random(4242);
        int[] counts = new int[2];
        int seen = 0;
        while (seen < 80) {
            int kind = rnd.nextInt(3);
            String yaml = kind == 0 ? EnginesAgreeTest.frame(rnd) : kind == 1 ? EnginesAgreeTest.truss(rnd) : EnginesAgreeTest.pitched(rnd);
            Model m = Models.yaml(yaml);
            if (Determinacy.of(m).classification() == Determinacy.Classification.UNSTABLE) continue;
            seen++;
            agreeOrDecline(m, yaml, counts);
        }
        assertTrue(counts[0] >= 40, "solved " + counts[0] + ", declined " + counts[1]);
    }

    @Test
    void largeFrameTakesTheSparsePathByDefault() {
        Model m = Models.yaml(FrameGenerator.frame(20, 30)); // 1230 members, about 1900 equations
        EngineResult f = new ForceEngine().solve(m);
        assertTrue(f.stable(), String.valueOf(f.instability()));
        assertTrue(f.notes().get(0).contains("closed rings"), f.notes().toString());
        EngineResult s = new StiffnessEngine().solve(m);
        double d = Agreement.maxRelativeDifference(m, s.cases(), f.cases());
        // measured 1.6e-11; without the refinement steps after each normal-equation solve, 1.5e-9
        assertTrue(d < 1e-10, "differs by " + d);
        // agreement over no load case would be vacuous: the generated frame's cases are all there
        assertTrue(f.cases().keySet().equals(s.cases().keySet()) && !f.cases().isEmpty(), f.cases().keySet().toString());
    }

    @Test
    void aBadlyScaledFrameStillAgreesClosely() {
        // a 0.1 m stub and a 20 m rafter, sections whose I differ by 1e4: the normal equations square a
        // condition number of about 1e8, which the refinement steps recover
        Model m = Models.yaml("""
                format: plumbline/1
                units: {force: kN, length: m}
                materials: {s: {E: 200 GPa}}
                sections:
                  HEAVY: {A: 0.05, I: 2.0e-2, material: s}
                  LIGHT: {A: 0.001, I: 2.0e-6, material: s}
                nodes: {A: [0, 0], B: [0, 6], S: [0.1, 6], C: [20.1, 7], D: [20.1, 0], E: [10, 0]}
                supports: {A: fixed, D: fixed, E: pinned}
                members:
                  C1: {from: A, to: B, section: HEAVY}
                  ST: {from: B, to: S, section: HEAVY}
                  R1: {from: S, to: C, section: LIGHT}
                  C2: {from: D, to: C, section: HEAVY}
                  P1: {from: E, to: S, section: LIGHT, hinge: both}
                loads:
                  G:
                    type: dead
                    member_loads: [{member: R1, w: 3, dir: gravity}, {member: ST, P: -50, at: 0.05}]
                    node_loads: [{node: B, Fx: 12}]
                """);
        int[] counts = new int[2];
        agreeOrDecline(m, "badly scaled frame", counts);
        assertEquals(1, counts[0], "the sparse path takes it");
    }
}
