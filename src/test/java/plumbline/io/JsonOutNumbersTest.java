package plumbline.io;

import static org.junit.jupiter.api.Assertions.assertEquals;

import com.fasterxml.jackson.core.JsonFactory;
import com.fasterxml.jackson.core.JsonGenerator;
import com.fasterxml.jackson.core.StreamWriteFeature;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import org.junit.jupiter.api.Test;

/**
 * JsonOut keeps the texts of recent numbers and writes a repeated number from its kept text:
 * the bytes must be exactly those of the JSON library writing every number itself (the check
 * value), for repeats, for numbers that share a slot of the table, for -0.0 beside 0.0, for
 * the smallest and largest doubles, and for values read back as the same double.
 */
class JsonOutNumbersTest {

    static final JsonFactory FACTORY = JsonFactory.builder().enable(StreamWriteFeature.USE_FAST_DOUBLE_WRITER).build();

    static List<Double> numbers() {
        List<Double> out = new ArrayList<>(List.of(0.0, -0.0, 0.0, 6.0, 3.0, 6.0, 1e-300, Double.MIN_VALUE, -Double.MAX_VALUE,
                Double.MAX_VALUE, 0.1, 0.1 + 0.2, 1.0 / 3, 100.0, 1e7, 1.0e-3, 123456.789));
        Random r = new Random(7);
        for (int i = 0; i < 20_000; i++) {
            // mostly fresh values, often a recent one again (as member ends and constant forces repeat)
            out.add(r.nextInt(3) == 0 ? out.get(out.size() - 1 - r.nextInt(Math.min(out.size(), 200)))
                    : (r.nextDouble() - 0.5) * Math.pow(10, r.nextInt(30) - 15));
        }
        return out;
    }

    @Test
    void everyNumberIsWrittenAsTheLibraryWritesIt() throws IOException {
        List<Double> xs = numbers();
        ByteArrayOutputStream mine = new ByteArrayOutputStream(), library = new ByteArrayOutputStream();
        try (JsonGenerator g = FACTORY.createGenerator(mine)) {
            JsonOut out = new JsonOut(g);
            out.startArray();
            for (double x : xs) out.number(x);
            out.endArray();
        }
        try (JsonGenerator g = FACTORY.createGenerator(library)) {
            g.writeStartArray();
            for (double x : xs) g.writeNumber(x);
            g.writeEndArray();
        }
        String a = mine.toString(StandardCharsets.UTF_8), b = library.toString(StandardCharsets.UTF_8);
        assertEquals(b, a);
        // and every number reads back as the very double written
        List<?> back = (List<?>) OutputFiles.parseJson("{\"x\":" + a + "}").get("x");
        for (int i = 0; i < xs.size(); i++) {
            assertEquals(Double.doubleToLongBits(xs.get(i)), Double.doubleToLongBits(((Number) back.get(i)).doubleValue()), "number " + i);
        }
    }
}
