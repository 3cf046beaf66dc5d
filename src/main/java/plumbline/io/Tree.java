package plumbline.io;

import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import plumbline.model.SourceRef;

/**
 * A YAML or JSON document as read, every value with the place it was written. Built by
 * {@link TreeReader}; kept apart from Jackson's own tree, which forgets locations.
 */
sealed interface Tree {
    SourceRef at();

    /** What the value is, for messages ("a list", "a map", "the text 'x'"). */
    String describe();

    record Entry(String key, SourceRef keyAt, Tree value) {
    }

    record MapNode(Map<String, Entry> entries, SourceRef at) implements Tree {
        public MapNode {
            entries = Collections.unmodifiableMap(new LinkedHashMap<>(entries));
        }

        public String describe() {
            return "a map";
        }
    }

    record ListNode(List<Tree> items, SourceRef at) implements Tree {
        public ListNode {
            items = List.copyOf(items);
        }

        public String describe() {
            return "a list";
        }
    }

    /** A scalar; {@code kind} says how the reader saw it. */
    record Scalar(String text, Kind kind, SourceRef at) implements Tree {
        enum Kind { NUMBER, STRING, BOOLEAN, NULL }

        public String describe() {
            return kind == Kind.NULL ? "an empty value" : "'" + text + "'";
        }
    }
}
