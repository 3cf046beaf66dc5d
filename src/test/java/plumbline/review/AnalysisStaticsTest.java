package plumbline.review;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;
import plumbline.io.ModelReader;
import plumbline.model.Model;
import plumbline.solve.Engine;
import plumbline.solve.EngineResult;
import plumbline.solve.MemberFunctions;
import plumbline.solve.stiffness.StiffnessEngine;
import plumbline.statics.Determinacy;

/**
 * The statics run beside the engines; on an unstable model the engines' work is discarded,
 * as if they had not run, and an engine that fails there does not stop the run; on a stable
 * model an engine's failure is not hidden. Models: a beam on two rollers (uy only), free to
 * slide along its axis (a mechanism of degree 1, statics by hand), and the same beam pinned
 * at one end (determinate).
 */
class AnalysisStaticsTest {

    static Model beam(String supportA) throws Exception {
        String text = "format: plumbline/1\nunits: {force: kN, length: m}\nmaterials: {steel: {E: 200 GPa}}\n"
                + "sections: {G: {A: 0.01, I: 1.0e-4, material: steel}}\nnodes: {A: [0, 0], B: [6, 0]}\n"
                + "supports: {A: " + supportA + ", B: roller}\nmembers: {M1: {from: A, to: B, section: G}}\n"
                + "loads: {W: {type: dead, member_loads: [{member: M1, w: -10}]}}\n";
        return ModelReader.read("beam.yaml", text, true);
    }

    /** An engine that fails whatever it is given (a planted fault). */
    static final Engine FAILING = new Engine() {
        public String name() {
            return "failing";
        }

        public EngineResult solve(Model model) {
            throw new IllegalStateException("planted engine failure");
        }

        public MemberFunctions memberFunctions() {
            return MemberFunctions.SHARED;
        }
    };

    @Test
    void anUnstableModelKeepsNoEngineResult() throws Exception {
        Analysis a = Analysis.of(beam("roller"), List.of(new StiffnessEngine(), FAILING));
        assertEquals(Determinacy.Classification.UNSTABLE, a.determinacy().classification());
        assertEquals(1, a.determinacy().mechanisms());
        assertTrue(a.engines().isEmpty(), "the engines' work on an unstable model is discarded: " + a.engines().keySet());
        assertTrue(a.solutions().isEmpty());
        assertFalse(a.stable());
    }

    @Test
    void onAStableModelAnEnginesFailureIsNotHidden() throws Exception {
        Analysis a = Analysis.of(beam("pinned"), List.of(new StiffnessEngine()));
        assertEquals(30e3, a.engines().get("stiffness").cases().get("W").reactions().get("A")[1], 1e-9, "wL/2");
        IllegalStateException e = assertThrows(IllegalStateException.class,
                () -> Analysis.of(beam("pinned"), List.of(new StiffnessEngine(), FAILING)));
        assertEquals("planted engine failure", e.getMessage());
    }
}
