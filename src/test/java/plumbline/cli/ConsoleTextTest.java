package plumbline.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.io.ByteArrayOutputStream;
import java.io.PrintWriter;
import java.nio.charset.StandardCharsets;
import org.junit.jupiter.api.Test;

/** Under a non-UTF-8 locale the console writes what it cannot show as code points, so names stay distinct. */
class ConsoleTextTest {

    @Test
    void charactersTheEncodingCannotShowAreWrittenAsCodePoints() {
        ByteArrayOutputStream bytes = new ByteArrayOutputStream();
        PrintWriter w = ConsoleText.writer(bytes, StandardCharsets.US_ASCII);
        w.print("node \u03a31 and node \u03a32, beam \u6881 \ud83d\ude00");
        w.flush();
        assertEquals("node [U+03A3]1 and node [U+03A3]2, beam [U+6881] [U+1F600]", bytes.toString(StandardCharsets.US_ASCII));
    }

    @Test
    void whatTheEncodingCanShowIsWrittenAsIs() {
        ByteArrayOutputStream bytes = new ByteArrayOutputStream();
        PrintWriter w = ConsoleText.writer(bytes, StandardCharsets.UTF_8);
        w.print("\u03a3 \u6881 \ud83d\ude00 \u2264");
        w.flush();
        assertEquals("\u03a3 \u6881 \ud83d\ude00 \u2264", bytes.toString(StandardCharsets.UTF_8));
        ByteArrayOutputStream latin = new ByteArrayOutputStream();
        PrintWriter l = ConsoleText.writer(latin, StandardCharsets.ISO_8859_1);
        l.print("\u00e9tage \u2013");
        l.flush();
        assertEquals("\u00e9tage [U+2013]", latin.toString(StandardCharsets.ISO_8859_1));
    }
}
