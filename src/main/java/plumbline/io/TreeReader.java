package plumbline.io;

import com.fasterxml.jackson.core.JsonFactory;
import com.fasterxml.jackson.core.JsonLocation;
import com.fasterxml.jackson.core.JsonParser;
import com.fasterxml.jackson.core.JsonProcessingException;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.yaml.snakeyaml.error.Mark;
import org.yaml.snakeyaml.error.MarkedYAMLException;
import com.fasterxml.jackson.core.JsonToken;
import com.fasterxml.jackson.core.StreamReadConstraints;
import com.fasterxml.jackson.dataformat.yaml.YAMLFactory;
import java.io.IOException;
import java.io.Reader;
import java.io.StringReader;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import plumbline.model.InputException;
import plumbline.model.Problem;
import plumbline.model.SourceRef;

/**
 * Reads one YAML or JSON document into a located {@link Tree}, refusing duplicate keys,
 * deep nesting and oversized input with a message that names the place.
 */
final class TreeReader {

    /** Nesting deeper than this is no model a person wrote (a model needs five levels). */
    static final int MAX_DEPTH = 40;
    /** Largest input file accepted, in characters. */
    static final long MAX_CHARS = 64L * 1024 * 1024;
    /** Longest number accepted, in characters (a double holds 17 significant digits). */
    static final int MAX_NUMBER_LENGTH = 60;
    /** Longest text value accepted (a title or a source line, not a document). */
    static final int MAX_STRING_LENGTH = 10_000;

    private final String file;
    private final List<Problem> problems = new ArrayList<>();

    private TreeReader(String file) {
        this.file = file;
    }

    static Tree read(String file, String text, boolean yaml) throws InputException {
        TreeReader r = new TreeReader(file);
        Tree t = r.parse(text, yaml);
        if (!r.problems.isEmpty()) throw new InputException(r.problems);
        return t;
    }

    private Tree parse(String text, boolean yaml) throws InputException {
        if (text.length() > MAX_CHARS) {
            throw new InputException(new Problem(SourceRef.none(file), "(file)",
                    "file is " + text.length() + " characters; at most " + MAX_CHARS + " are read"));
        }
        StreamReadConstraints limits = StreamReadConstraints.builder()
                .maxNestingDepth(MAX_DEPTH + 10).maxNumberLength(MAX_NUMBER_LENGTH)
                .maxStringLength(1_000_000).build();
        JsonFactory f = yaml ? YAMLFactory.builder().streamReadConstraints(limits).build()
                : JsonFactory.builder().streamReadConstraints(limits).build();
        try (Reader in = new StringReader(text); JsonParser p = f.createParser(in)) {
            JsonToken t = p.nextToken();
            if (t == null) {
                throw new InputException(new Problem(new SourceRef(file, 1, 1), "(document)",
                        "the file is empty; expected a map with 'format: plumbline/1' or 'claims:'"));
            }
            Tree root = value(p, 0);
            JsonToken after = p.nextToken();
            if (after != null) {
                problems.add(new Problem(ref(p.currentTokenLocation()), "(document)",
                        "more than one document in the file; expected exactly one"));
            }
            return root;
        } catch (JsonProcessingException e) {
            if (yaml && e.getCause() instanceof MarkedYAMLException y) throw new InputException(yamlProblem(y, text));
            JsonLocation loc = e.getLocation();
            String msg = e.getOriginalMessage();
            if (msg != null) msg = msg.replaceAll("\\s+", " ").trim();
            throw new InputException(new Problem(loc == null ? SourceRef.none(file) : ref(loc), "(syntax)",
                    "cannot read the file as " + (yaml ? "YAML" : "JSON") + ": " + shorten(msg)));
        } catch (IOException e) {
            throw new InputException(new Problem(SourceRef.none(file), "(file)", "cannot read: " + e.getMessage()));
        } catch (RuntimeException e) {
            // The YAML layer reports some malformed input (bad aliases, tags) as unchecked errors.
            throw new InputException(new Problem(SourceRef.none(file), "(syntax)",
                    "cannot read the file as " + (yaml ? "YAML" : "JSON") + ": " + shorten(String.valueOf(e.getMessage()))));
        }
    }

    /**
     * A YAML syntax error in the tool's own words, at the place a reader must change: where
     * an unclosed bracket or quote was opened, where a key lacks its ": ", at the tab itself,
     * or at the line whose indentation breaks the block (the parser's own position is often
     * the token after the mistake, a line or two later).
     */
    Problem yamlProblem(MarkedYAMLException y, String text) {
        Mark problem = y.getProblemMark(), context = y.getContextMark();
        String what = String.valueOf(y.getProblem()), where = String.valueOf(y.getContext());
        Mark at = problem != null ? problem : context;
        String message;
        if (what.contains("TAB")) {
            message = "a tab character; YAML indents with spaces only: replace the tab with spaces";
        } else if (where.contains("flow sequence") || where.contains("flow mapping")) {
            boolean seq = where.contains("sequence");
            at = context != null ? context : at;
            message = "the '" + (seq ? "[" : "{") + "' opened here is not closed: expected ',' or '" + (seq ? "]" : "}")
                    + "' before line " + (problem == null ? "?" : problem.getLine() + 1);
        } else if (where.contains("quoted scalar")) {
            at = context != null ? context : at;
            message = "the quote opened here is not closed; expected a closing quote on the same value";
        } else if (what.contains("could not find expected ':'")) {
            at = context != null ? context : at;
            message = "expected 'key: value' here, with a space after the ':' (or the line below is indented too far)";
        } else if (what.contains("mapping values are not allowed")) {
            String line = line(text, at.getLine());
            int colon = line.indexOf(':');
            int before = previousLine(text, at.getLine());
            Matcher glued = before < 0 ? null : Pattern.compile("^\\s*[^\\s:#\\-][^:]*(:)[^\\s:]").matcher(line(text, before));
            if (glued != null && glued.find()) {
                // "A:[0, 0]" read as one text, so the error surfaces on the next line: the missing space is the mistake
                at = new Mark(at.getName(), 0, before, glued.start(1), new int[0], 0);
                message = "expected 'key: value' here, with a space after the ':'";
            } else if (colon > 1024) {
                at = lineStart(at);
                message = "a key of " + line.strip().indexOf(':') + " characters; YAML keys are at most 1024 characters: "
                        + "expected a shorter name";
            } else {
                message = "a ':' where a value was expected: this line is indented more than the key above it, or a value "
                        + "holds ': ' and needs quotes";
            }
        } else if (what.contains("expected <block end>") || what.contains("did not find expected key")
                || what.contains("did not find expected '-'")) {
            message = "the indentation of this line does not match the lines above (a key at the level of a list, or a "
                    + "list item at the level of keys); expected the same indentation as its neighbours";
        } else {
            message = "this is not valid YAML: check the indentation, the space after each ':', and that quotes and "
                    + "brackets are closed";
        }
        return new Problem(at == null ? SourceRef.none(file) : new SourceRef(file, at.getLine() + 1, at.getColumn() + 1),
                "(syntax)", message);
    }

    private static String line(String text, int index) {
        String[] lines = text.split("\\R", -1);
        return index >= 0 && index < lines.length ? lines[index] : "";
    }

    /** The index of the last non-blank line before line {@code index} (0-based), or -1. */
    private static int previousLine(String text, int index) {
        String[] lines = text.split("\\R", -1);
        for (int i = Math.min(index, lines.length) - 1; i >= 0; i--) if (!lines[i].isBlank() && !lines[i].strip().startsWith("#")) return i;
        return -1;
    }

    private static Mark lineStart(Mark m) {
        return new Mark(m.getName(), m.getIndex() - m.getColumn(), m.getLine(), 0, new int[0], 0);
    }

    private static String shorten(String s) {
        if (s == null) return "malformed input";
        return s.length() > 200 ? s.substring(0, 200) + "..." : s;
    }

    private SourceRef ref(JsonLocation loc) {
        return new SourceRef(file, Math.max(loc.getLineNr(), 0), Math.max(loc.getColumnNr(), 0));
    }

    private Tree value(JsonParser p, int depth) throws IOException, InputException {
        SourceRef at = ref(p.currentTokenLocation());
        if (depth > MAX_DEPTH) {
            throw new InputException(new Problem(at, "(document)",
                    "nesting deeper than " + MAX_DEPTH + " levels; a model needs only a few"));
        }
        JsonToken t = p.currentToken();
        if (p instanceof com.fasterxml.jackson.dataformat.yaml.YAMLParser y) {
            // refused rather than half-supported: an alias is not expanded by the reader (and expansion
            // is the classic memory bomb), a tag asks for a type the file format does not have
            if (y.isCurrentAlias()) {
                throw new InputException(new Problem(at, "(document)", "YAML alias '*" + p.getText()
                        + "' is not read; expected the value written out in full"));
            }
            if (y.getCurrentAnchor() != null) {
                throw new InputException(new Problem(at, "(document)", "YAML anchor '&" + y.getCurrentAnchor()
                        + "' is not read; expected plain values (no anchors or aliases)"));
            }
            Object tag = y.getTypeId();
            if (tag != null) {
                throw new InputException(new Problem(at, "(document)", "YAML tag '" + tag
                        + "' is not read; expected plain values without type tags"));
            }
        }
        switch (t) {
            case START_OBJECT: {
                Map<String, Tree.Entry> entries = new LinkedHashMap<>();
                while (p.nextToken() == JsonToken.FIELD_NAME) {
                    String key = p.currentName();
                    SourceRef keyAt = ref(p.currentTokenLocation());
                    p.nextToken();
                    Tree v = value(p, depth + 1);
                    if (entries.containsKey(key)) {
                        problems.add(new Problem(keyAt, key, "duplicate key '" + key
                                + "' (first at line " + entries.get(key).keyAt().line() + "); each key may appear once"));
                    } else {
                        entries.put(key, new Tree.Entry(key, keyAt, v));
                    }
                }
                return new Tree.MapNode(entries, at);
            }
            case START_ARRAY: {
                List<Tree> items = new ArrayList<>();
                while (p.nextToken() != JsonToken.END_ARRAY) {
                    items.add(value(p, depth + 1));
                }
                return new Tree.ListNode(items, at);
            }
            case VALUE_NUMBER_INT:
            case VALUE_NUMBER_FLOAT:
                if (p.getText().length() > MAX_NUMBER_LENGTH) {
                    throw new InputException(new Problem(at, "(document)", "a number of " + p.getText().length()
                            + " characters; at most " + MAX_NUMBER_LENGTH + " are read"));
                }
                return new Tree.Scalar(p.getText(), Tree.Scalar.Kind.NUMBER, at);
            case VALUE_TRUE:
            case VALUE_FALSE:
                return new Tree.Scalar(p.getText(), Tree.Scalar.Kind.BOOLEAN, at);
            case VALUE_NULL:
                return new Tree.Scalar("", Tree.Scalar.Kind.NULL, at);
            case VALUE_STRING:
                if (p.getText().length() > MAX_STRING_LENGTH) {
                    throw new InputException(new Problem(at, "(document)", "a text value of " + p.getText().length()
                            + " characters; at most " + MAX_STRING_LENGTH + " are read"));
                }
                return new Tree.Scalar(p.getText(), Tree.Scalar.Kind.STRING, at);
            default:
                throw new InputException(new Problem(at, "(document)", "unexpected " + t + " in the file"));
        }
    }
}
