package plumbline.io;

import com.fasterxml.jackson.core.JsonGenerator;
import com.fasterxml.jackson.core.StreamWriteFeature;
import com.fasterxml.jackson.core.io.NumberOutput;
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

    /** Slots of the table of recent numbers' texts (a power of two). */
    static final int RECENT = 64;

    private final JsonGenerator g;
    private final boolean shortestText;
    // The texts of numbers written lately, by the number's bits (one per slot, the latest wins): the
    // results repeat many numbers (positions at a member's ends and middle, a column's constant axial
    // force, a support's zero), and forming a number's text is most of the cost of writing it. A number
    // found here is written as the very text the generator would form for it.
    private final long[] recentBits = new long[RECENT];
    private final String[] recentTexts = new String[RECENT];

    JsonOut(JsonGenerator g) {
        this.g = g;
        this.shortestText = g.isEnabled(StreamWriteFeature.USE_FAST_DOUBLE_WRITER);
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
        if (!Double.isFinite(v)) {
            g.writeNull();
            return this;
        }
        long bits = Double.doubleToRawLongBits(v);
        int slot = (int) ((bits * 0x9E3779B97F4A7C15L) >>> (64 - Integer.numberOfTrailingZeros(RECENT)));
        String text = recentTexts[slot];
        if (text == null || recentBits[slot] != bits) {
            // the text the generator forms for a double (its own writeNumber(double) writes exactly this)
            text = NumberOutput.toString(v, shortestText);
            recentTexts[slot] = text;
            recentBits[slot] = bits;
        }
        g.writeNumber(text);
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
