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
