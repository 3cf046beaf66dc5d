package plumbline.io;

import com.fasterxml.jackson.core.JsonFactory;
import com.fasterxml.jackson.core.StreamWriteFeature;
import com.fasterxml.jackson.core.JsonGenerator;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.OutputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import plumbline.model.InputException;
import plumbline.model.Problem;
import plumbline.model.SourceRef;

/**
 * Output helpers: the refusal of an output path that is an input file, and the results
 * tree as JSON text. The files of a run are written by {@link OutputBatch}.
 */
public final class OutputFiles {

    private OutputFiles() {
    }

    /** Refuses an output path that is one of the inputs (exit code 2, before any work is done). */
    public static void refuseInputs(Path out, List<Path> inputs, String option) throws InputException {
        for (Path in : inputs) {
            try {
                if (Files.exists(out) && Files.exists(in) && Files.isSameFile(out, in)) {
                    throw new InputException(new Problem(SourceRef.none(out.toString()), option,
                            "is an input file; expected a new file name for the output"));
                }
            } catch (IOException e) {
                // unreadable: the write itself will report it
            }
            if (out.toAbsolutePath().normalize().equals(in.toAbsolutePath().normalize())) {
                throw new InputException(new Problem(SourceRef.none(out.toString()), option,
                        "is an input file; expected a new file name for the output"));
            }
        }
        Path dir = out.toAbsolutePath().getParent();
        if (dir != null && !Files.isDirectory(dir)) {
            throw new InputException(new Problem(SourceRef.none(out.toString()), option,
                    "folder " + dir + " does not exist; expected an existing folder"));
        }
    }

    /** The tree as indented JSON text (maps keep their order). */
    public static byte[] json(Map<String, Object> tree) throws IOException {
        return json(tree, true);
    }

    /** The tree as JSON text, indented for reading or compact (large results). */
    public static byte[] json(Map<String, Object> tree, boolean indent) throws IOException {
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        json(tree, indent, out);
        return out.toByteArray();
    }

    /**
     * Writes the tree as JSON text straight to a stream (a large result is never held whole in
     * memory as text). Written by Jackson's streaming generator, value by value: the tree holds
     * only maps, lists, texts, numbers, booleans, nulls and streamed parts.
     */
    public static void json(Map<String, Object> tree, boolean indent, OutputStream out) throws IOException {
        // the shortest decimal that reads back as the same double (Schubfach), written without Double.toString's
        // detours; the stream is the caller's to close
        JsonFactory f = JsonFactory.builder().enable(StreamWriteFeature.USE_FAST_DOUBLE_WRITER)
                .disable(StreamWriteFeature.AUTO_CLOSE_TARGET).build();
        try (JsonGenerator g = f.createGenerator(out)) {
            if (indent) g.useDefaultPrettyPrinter();
            write(g, tree);
        }
    }

    private static void write(JsonGenerator g, Object v) throws IOException {
        if (v == null) {
            g.writeNull();
        } else if (v instanceof Map<?, ?> m) {
            g.writeStartObject();
            for (var e : m.entrySet()) {
                g.writeFieldName((String) e.getKey());
                write(g, e.getValue());
            }
            g.writeEndObject();
        } else if (v instanceof Iterable<?> list) {
            g.writeStartArray();
            for (Object item : list) write(g, item);
            g.writeEndArray();
        } else if (v instanceof String s) {
            g.writeString(s);
        } else if (v instanceof Double d) {
            g.writeNumber(d);
        } else if (v instanceof Integer || v instanceof Long || v instanceof Short) {
            g.writeNumber(((Number) v).longValue());
        } else if (v instanceof Boolean b) {
            g.writeBoolean(b);
        } else if (v instanceof JsonOut.Streamed s) {
            // a streamed part writes itself into the same generator, so it is laid out as a map would be
            s.write(new JsonOut(g));
        } else {
            throw new IllegalArgumentException("no JSON form for a " + v.getClass().getName() + " in the results");
        }
    }

    /** A JSON text parsed to plain maps and lists (for tests and the schema check). */
    @SuppressWarnings("unchecked")
    public static Map<String, Object> parseJson(String text) throws IOException {
        return new ObjectMapper().readValue(text, Map.class);
    }
}
