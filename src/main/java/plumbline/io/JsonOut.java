package plumbline.io;

import com.fasterxml.jackson.core.JsonGenerator;
import java.io.IOException;
import java.util.List;

/**
 * Writes JSON straight to the output, value by value: for the parts of the results that
 * are too large to build as a tree first (every member's peaks of every load set). A
 * number that is not finite is written as null, as in the tree.
 */
public final class JsonOut {

    /** A JSON value that writes itself when the results are written. */
    @FunctionalInterface
    public interface Streamed {
        void write(JsonOut out) throws IOException;
    }

    private final JsonGenerator g;

    JsonOut(JsonGenerator g) {
        this.g = g;
    }

    public JsonOut startObject() throws IOException {
        g.writeStartObject();
        return this;
    }

    public JsonOut endObject() throws IOException {
        g.writeEndObject();
        return this;
    }

    public JsonOut startArray() throws IOException {
        g.writeStartArray();
        return this;
    }

    public JsonOut endArray() throws IOException {
        g.writeEndArray();
        return this;
    }

    public JsonOut name(String name) throws IOException {
        g.writeFieldName(name);
        return this;
    }

    /** A number; null when it is not finite. */
    public JsonOut number(double v) throws IOException {
        if (Double.isFinite(v)) g.writeNumber(v);
        else g.writeNull();
        return this;
    }

    /** A text; null when it is null. */
    public JsonOut text(String s) throws IOException {
        if (s == null) g.writeNull();
        else g.writeString(s);
        return this;
    }

    public JsonOut texts(List<String> list) throws IOException {
        g.writeStartArray();
        for (String s : list) text(s);
        g.writeEndArray();
        return this;
    }
}
