package plumbline.solve.stiffness;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import plumbline.io.ModelReader;
import plumbline.model.Model;
import plumbline.solve.EngineResult;

/**
 * The diagnosis re-solves variants of the checked model; one that changes only loads reuses
 * the check's factorization, one that changes stiffness is factored anew. Reference: the
 * simple beam of check case 01 under w = 10 kN/m over 6 m (reactions wL/2 = 30 kN, statics
 * by hand), doubled to 20 kN/m (60 kN); and a fresh engine's solution of each variant.
 */
class FactorizationReuseTest {

    static Model variant(String from, String to) throws Exception {
        String text = Files.readString(Path.of("checks/01-simple-beam-uniform.yaml"));
        assertTrue(text.contains(from), from);
        return ModelReader.read("01.yaml", text.replace(from, to), true);
    }

    static double[] reactionA(EngineResult r) {
        return r.cases().get("W").reactions().get("A");
    }

    @Test
    void aLoadVariantReusesTheFactorizationAndAStiffnessVariantDoesNot() throws Exception {
        Model base = variant("w: -10.0", "w: -10.0"), heavier = variant("w: -10.0", "w: -20.0");
        Model stiffer = variant("I: 1.0e-4", "I: 2.0e-4");
        assertTrue(StiffnessEngine.sameStructure(base, heavier));
        assertFalse(StiffnessEngine.sameStructure(base, stiffer));

        StiffnessEngine e = new StiffnessEngine();
        assertEquals(30e3, reactionA(e.solve(base))[1], 1e-9, "wL/2");
        EngineResult reused = e.solve(heavier);
        assertEquals(1, e.factorizations(), "the load variant is solved with the first factorization");
        assertEquals(60e3, reactionA(reused)[1], 1e-9, "2 wL/2");
        EngineResult fresh = new StiffnessEngine().solve(heavier);
        assertArrayEquals(fresh.cases().get("W").displacements().get("B"), reused.cases().get("W").displacements().get("B"),
                "the same numbers as a fresh factorization");

        // the midspan deflection 5wL^4/384EI halves with I doubled: only a new factorization can give it
        EngineResult stiff = e.solve(stiffer);
        assertEquals(2, e.factorizations());
        double rotationBase = reused.cases().get("W").displacements().get("A")[2] / 2; // w halved back to 10 kN/m
        assertEquals(rotationBase / 2, stiff.cases().get("W").displacements().get("A")[2], Math.abs(rotationBase) * 1e-9);
    }
}
