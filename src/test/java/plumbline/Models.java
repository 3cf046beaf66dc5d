package plumbline;

import plumbline.io.ModelReader;
import plumbline.model.InputException;
import plumbline.model.Model;

/** Test helper: a model from YAML text. */
public final class Models {
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
