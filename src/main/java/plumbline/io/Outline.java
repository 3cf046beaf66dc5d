package plumbline.io;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import plumbline.model.InputException;
import plumbline.model.Model;
import plumbline.model.Problem;

/**
 * A YAML or JSON document's values with the line and column each is written at, as plain
 * maps and lists (for the workbench, whose tables edit the text in place so that the
 * user's layout and comments survive). A map is {@code {"line", "col", "entries": [{"key",
 * "line", "col", "value"}]}}, a list {@code {"line", "col", "items": [...]}}, a value
 * {@code {"line", "col", "text", "kind"}}; lines and columns count from 1.
 */
public final class Outline {

    private Outline() {
    }

    /**
     * A model's text read once for both uses: its outline (null when the text does not read as
     * YAML or JSON), the model (null when it has problems) and the problems found.
     */
    public record Reading(Map<String, Object> outline, Model model, List<Problem> problems) {
        public Reading {
            problems = List.copyOf(problems);
        }
    }

    public static Reading model(String name, String text) {
        Tree root;
        try {
            root = TreeReader.read(name, text, ModelReader.isYaml(name));
        } catch (InputException e) {
            return new Reading(null, null, e.problems());
        }
        try {
            return new Reading(outline(root), ModelReader.fromTree(name, root), List.of());
        } catch (InputException e) {
            return new Reading(outline(root), null, e.problems());
        }
    }

    private static Map<String, Object> outline(Tree t) {
        Map<String, Object> out = new LinkedHashMap<>();
        out.put("line", t.at().line());
        out.put("col", t.at().column());
        if (t instanceof Tree.MapNode m) {
            List<Object> entries = new ArrayList<>();
            for (Tree.Entry e : m.entries().values()) {
                Map<String, Object> entry = new LinkedHashMap<>();
                entry.put("key", e.key());
                entry.put("line", e.keyAt().line());
                entry.put("col", e.keyAt().column());
                entry.put("value", outline(e.value()));
                entries.add(entry);
            }
            out.put("entries", entries);
        } else if (t instanceof Tree.ListNode l) {
            List<Object> items = new ArrayList<>();
            for (Tree item : l.items()) items.add(outline(item));
            out.put("items", items);
        } else if (t instanceof Tree.Scalar s) {
            out.put("text", s.text());
            out.put("kind", s.kind().name().toLowerCase(java.util.Locale.ROOT));
        }
        return out;
    }
}
