package plumbline.cli;

import java.io.FilterWriter;
import java.io.IOException;
import java.io.OutputStream;
import java.io.OutputStreamWriter;
import java.io.PrintWriter;
import java.io.Writer;
import java.nio.charset.Charset;
import java.nio.charset.CharsetEncoder;
import java.nio.charset.StandardCharsets;
import java.util.Locale;

/**
 * The console's writers, in the terminal's own encoding (the locale's), with every
 * character that encoding cannot show written as "[U+XXXX]" instead of "?", so two
 * different names never print alike under a non-UTF-8 locale (the report uses the same
 * notation for a character no font holds).
 */
final class ConsoleText {

    private ConsoleText() {
    }

    /** The encoding the terminal expects: the JVM's stdout encoding if set, else the locale's native one. */
    static Charset terminal() {
        String name = System.getProperty("stdout.encoding", System.getProperty("sun.stdout.encoding", System.getProperty("native.encoding")));
        try {
            return name == null ? Charset.defaultCharset() : Charset.forName(name);
        } catch (RuntimeException e) {
            return StandardCharsets.UTF_8;
        }
    }

    static PrintWriter writer(OutputStream stream, Charset cs) {
        return new PrintWriter(new Escaping(new OutputStreamWriter(stream, cs), cs.newEncoder()), true);
    }

    /** Passes text through, with characters the encoding cannot carry replaced by their code points. */
    static final class Escaping extends FilterWriter {
        private final CharsetEncoder encoder;
        private char highSurrogate;

        Escaping(Writer out, CharsetEncoder encoder) {
            super(out);
            this.encoder = encoder;
        }

        @Override
        public void write(int c) throws IOException {
            char ch = (char) c;
            if (Character.isHighSurrogate(ch)) {
                highSurrogate = ch;
                return;
            }
            if (highSurrogate != 0 && Character.isLowSurrogate(ch)) {
                String pair = new String(new char[]{highSurrogate, ch});
                highSurrogate = 0;
                if (encoder.canEncode(pair)) out.write(pair);
                else out.write(String.format(Locale.ROOT, "[U+%04X]", pair.codePointAt(0)));
                return;
            }
            highSurrogate = 0;
            if (ch < 0x80 || encoder.canEncode(ch)) out.write(ch);
            else out.write(String.format(Locale.ROOT, "[U+%04X]", (int) ch));
        }

        @Override
        public void write(char[] buf, int off, int len) throws IOException {
            for (int i = off; i < off + len; i++) write(buf[i]);
        }

        @Override
        public void write(String s, int off, int len) throws IOException {
            for (int i = off; i < off + len; i++) write(s.charAt(i));
        }
    }
}
