package plumbline.review;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import plumbline.model.Quantity;
import plumbline.solve.SideBySide;
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

    @ParameterizedTest(name = "side by side: {0}")
    @ValueSource(booleans = {false, true})
    void anUnstableModelKeepsNoEngineResult(boolean sideBySide) throws Exception {
        Analysis a = Analysis.of(beam("roller"), List.of(new StiffnessEngine(), FAILING), sideBySide);
        assertEquals(Determinacy.Classification.UNSTABLE, a.determinacy().classification());
        assertEquals(1, a.determinacy().mechanisms());
        assertTrue(a.engines().isEmpty(), "the engines' work on an unstable model is discarded: " + a.engines().keySet());
        assertTrue(a.solutions().isEmpty());
        assertFalse(a.stable());
    }

    @ParameterizedTest(name = "side by side: {0}")
    @ValueSource(booleans = {false, true})
    void onAStableModelAnEnginesFailureIsNotHidden(boolean sideBySide) throws Exception {
        Analysis a = Analysis.of(beam("pinned"), List.of(new StiffnessEngine()), sideBySide);
        assertEquals(30e3, a.engines().get("stiffness").cases().get("W").reactions().get("A")[1], 1e-9, "wL/2");
        IllegalStateException e = assertThrows(IllegalStateException.class,
                () -> Analysis.of(beam("pinned"), List.of(new StiffnessEngine(), FAILING), sideBySide));
        assertEquals("planted engine failure", e.getMessage());
    }

    /**
     * Side by side or in one thread, every number is the same: the portal-frame sample's
     * reactions and every member peak of every load set, by both engines, compared exactly.
     */
    @Test
    void sideBySideChangesNoNumber() throws Exception {
        Model m = ModelReader.read(java.nio.file.Path.of("samples/portal-frame.yaml"));
        List<Engine> engines = List.of(new StiffnessEngine(), new plumbline.solve.force.ForceEngine());
        Analysis one = Analysis.of(m, engines, false), both = Analysis.of(m, engines, true);
        assertEquals(one.solutions().keySet(), both.solutions().keySet());
        int compared = 0;
        for (var e : one.solutions().entrySet()) {
            for (var s : e.getValue().entrySet()) {
                LoadSetResult x = s.getValue(), y = both.solutions().get(e.getKey()).get(s.getKey());
                for (var r : x.representative().reactions().entrySet()) {
                    assertArrayEquals(r.getValue(), y.representative().reactions().get(r.getKey()), 0.0, s.getKey() + " " + r.getKey());
                    compared++;
                }
                for (String member : m.members().keySet()) {
                    for (Quantity q : Quantity.values()) {
                        if (!q.isPeak()) continue;
                        assertEquals(x.peak(member, q).value(), y.peak(member, q).value(), 0.0, s.getKey() + " " + member + " " + q);
                        compared++;
                    }
                }
            }
        }
        assertTrue(compared > 100, "compared " + compared);
    }

    /**
     * A diagnosis's variant that keeps the model's very nodes, members and supports (only its
     * claims, loads or properties changed) takes the model's statics; any other variant has its
     * own worked out: the beam on two rollers read as a variant of the pinned beam is found
     * unstable (a mechanism of degree 1), not given the pinned beam's "determinate".
     */
    @Test
    void aVariantTakesTheModelsStaticsOnlyWhenItKeepsItsFrame() throws Exception {
        Model pinned = beam("pinned");
        List<Engine> engines = List.of(new StiffnessEngine());
        Analysis base = Analysis.of(pinned, engines);
        assertEquals(Determinacy.Classification.DETERMINATE, base.determinacy().classification());
        Model sameFrame = pinned.withClaims(List.of());
        assertTrue(sameFrame.hasTheSameFrameAs(pinned));
        org.junit.jupiter.api.Assertions.assertSame(base.determinacy(), Analysis.variantOf(base, sameFrame, engines).determinacy());
        // the pinned beam's own nodes and members on the two rollers' supports (a diagnosis's support trial)
        Model p = pinned, r = beam("roller");
        Model rollers = new Model(p.file(), p.job(), p.units(), p.materials(), p.sections(), p.nodes(), r.supports(), p.members(),
                p.loadCases(), p.combinations(), p.standardCombinations(), p.redundants(), p.claims());
        assertFalse(rollers.hasTheSameFrameAs(pinned));
        Analysis v = Analysis.variantOf(base, rollers, engines);
        assertEquals(Determinacy.Classification.UNSTABLE, v.determinacy().classification());
        assertFalse(v.stable());
        Model rebuilt = beam("pinned"); // equal, but rebuilt: its statics are worked out again (the careful answer)
        assertFalse(rebuilt.hasTheSameFrameAs(pinned));
        Analysis w = Analysis.variantOf(base, rebuilt, engines);
        assertFalse(w.determinacy() == base.determinacy());
        assertEquals(base.determinacy().classification(), w.determinacy().classification());
    }

    @Test
    void onlyWorkOfSomeSizeIsSpreadOverTheCores() {
        assertFalse(SideBySide.worth(3, 4), "a sample: one thread");
        assertTrue(SideBySide.worth(10_100, 13), "a 10,000-member frame: side by side");
        assertFalse(SideBySide.worth(1_999, 1));
        assertTrue(SideBySide.worth(2_000, 1));
        assertTrue(SideBySide.worth(2_000, 0), "no pieces counts as one");
    }
}
