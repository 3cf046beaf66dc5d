package plumbline;

import plumbline.io.ModelReader;
import plumbline.model.InputException;
import plumbline.model.Model;

/** Test helper: a model from YAML text. */
public final class Models {
    /**
     * The head of most test models: kN and m, steel E = 200 GPa, one section G with
     * A = 0.01 m2 and I = 1.0e-4 m4 (EI = 20000 kN*m2).
     */
    public static final String HEAD = """
            format: plumbline/1
            units: {force: kN, length: m}
            materials: {s: {E: 200 GPa}}
            sections: {G: {A: 0.01, I: 1.0e-4, material: s}}
            """;

    /** {@link #HEAD} and a simple beam A (0, 0) pinned to B (6, 0) on a roller, one member M1. */
    public static final String SIMPLE_BEAM = HEAD + """
            nodes: {A: [0, 0], B: [6, 0]}
            supports: {A: pinned, B: roller}
            members: {M1: {from: A, to: B, section: G}}
            """;

    /** {@link #HEAD} and three equal 6 m spans S1, S2, S3 on supports A (pinned), B, C, D (rollers). */
    public static final String THREE_SPANS = HEAD + """
            nodes: {A: [0, 0], B: [6, 0], C: [12, 0], D: [18, 0]}
            supports: {A: pinned, B: roller, C: roller, D: roller}
            members:
              S1: {from: A, to: B, section: G}
              S2: {from: B, to: C, section: G}
              S3: {from: C, to: D, section: G}
            """;

    private Models() {
    }

    public static Model yaml(String text) {
        try {
            return ModelReader.read("test.yaml", text, true);
        } catch (InputException e) {
            throw new AssertionError(e.problems().toString(), e);
        }
    }
}
