package plumbline.io;

import com.fasterxml.jackson.core.JsonGenerator;
import com.fasterxml.jackson.core.StreamWriteFeature;
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
    // The texts of numbers written lately, by the number's bits (one per slot, the latest wins): the
    // results repeat many numbers (positions at a member's ends and middle, a column's constant axial
    // force, a support's zero). Slot i's text is held in recentText from i * ShortestDecimal.ROOM.
    private final long[] recentBits = new long[RECENT];
    private final int[] recentLength = new int[RECENT];
    private final char[] recentText = new char[RECENT * ShortestDecimal.ROOM];

    /**
     * A writer into {@code g}, whose own numbers must be written the same way: the generator's
     * fast double writer (the shortest text that reads back, as OutputFiles' generators have it).
     */
    JsonOut(JsonGenerator g) {
        if (!g.isEnabled(StreamWriteFeature.USE_FAST_DOUBLE_WRITER)) {
            throw new IllegalArgumentException("the results' generator writes doubles with the fast (shortest) writer");
        }
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

    /** A number, as the shortest text that reads back as it ({@link ShortestDecimal}); null when it is not finite. */
    public JsonOut number(double v) throws IOException {
        if (!Double.isFinite(v)) {
            g.writeNull();
            return this;
        }
        long bits = Double.doubleToRawLongBits(v);
        int slot = (int) ((bits * 0x9E3779B97F4A7C15L) >>> (64 - Integer.numberOfTrailingZeros(RECENT)));
        int at = slot * ShortestDecimal.ROOM;
        if (recentLength[slot] == 0 || recentBits[slot] != bits) {
            recentLength[slot] = ShortestDecimal.write(v, recentText, at) - at;
            recentBits[slot] = bits;
        }
        g.writeNumber(recentText, at, recentLength[slot]);
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
