package plumbline.io;

import com.fasterxml.jackson.core.JsonFactory;
import com.fasterxml.jackson.core.StreamWriteFeature;
import com.fasterxml.jackson.core.JsonGenerator;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import com.fasterxml.jackson.databind.SerializerProvider;
import com.fasterxml.jackson.databind.module.SimpleModule;
import com.fasterxml.jackson.databind.ser.std.StdSerializer;
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
        return mapper(indent).writeValueAsBytes(tree);
    }

    /** Writes the tree as JSON text straight to a stream (a large result is never held whole in memory as text). */
    public static void json(Map<String, Object> tree, boolean indent, OutputStream out) throws IOException {
        mapper(indent).writeValue(out, tree);
    }

    private static ObjectMapper mapper(boolean indent) {
        // the shortest decimal that reads back as the same double (Schubfach), written without Double.toString's detours;
        // the stream is the caller's to close
        ObjectMapper m = new ObjectMapper(JsonFactory.builder().enable(StreamWriteFeature.USE_FAST_DOUBLE_WRITER)
                .disable(StreamWriteFeature.AUTO_CLOSE_TARGET).build());
        if (indent) m.enable(SerializationFeature.INDENT_OUTPUT);
        // a streamed part of the tree writes itself into the same generator (same layout as a map would get)
        SimpleModule streamed = new SimpleModule();
        streamed.addSerializer(JsonOut.Streamed.class, new StdSerializer<>(JsonOut.Streamed.class) {
            @Override
            public void serialize(JsonOut.Streamed value, JsonGenerator g, SerializerProvider p) throws IOException {
                value.write(new JsonOut(g));
            }
        });
        m.registerModule(streamed);
        return m;
    }

    /** A JSON text parsed to plain maps and lists (for tests and the schema check). */
    @SuppressWarnings("unchecked")
    public static Map<String, Object> parseJson(String text) throws IOException {
        return new ObjectMapper().readValue(text, Map.class);
    }
}
