package plumbline.solve;

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
 * method: wherever it takes a model on, the two agree below 1e-8; where its rings cannot
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
        assertTrue(d < 1e-8, what + ": sparse force method differs by " + d);
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
            String yaml = rnd.nextBoolean() ? EnginesAgreeTest.frame(rnd) : EnginesAgreeTest.truss(rnd);
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
        assertTrue(d < 1e-8, "differs by " + d);
        // agreement over no load case would be vacuous: the generated frame's cases are all there
        assertTrue(f.cases().keySet().equals(s.cases().keySet()) && !f.cases().isEmpty(), f.cases().keySet().toString());
    }
}
