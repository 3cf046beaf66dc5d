package plumbline.report;

import java.awt.Font;
import java.awt.FontFormatException;
import java.awt.Graphics2D;
import java.awt.font.TextAttribute;
import java.awt.font.TextLayout;
import java.awt.geom.AffineTransform;
import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.text.AttributedString;
import java.util.Locale;
import com.lowagie.text.Phrase;
import com.lowagie.text.pdf.BaseFont;
import com.lowagie.text.pdf.FontSelector;

/**
 * The report's typefaces, embedded in every PDF and used for every picture, so that a name
 * prints exactly as written whatever the reader's machine has: DejaVu Sans (Latin, Greek,
 * Cyrillic, dashes, inequality signs) for all text, and Noto Sans SC, read only when a text
 * holds a character DejaVu lacks (Chinese, Japanese, Korean). A character in neither font
 * is printed as its code point, "[U+XXXX]", so two different names never print alike.
 */
public final class Typeface {

    static final String REGULAR = "/net/sf/jasperreports/fonts/dejavu/DejaVuSans.ttf";
    static final String BOLD = "/net/sf/jasperreports/fonts/dejavu/DejaVuSans-Bold.ttf";
    static final String CJK = "/plumbline/report/fonts/NotoSansSC_400Regular.ttf";

    private Typeface() {
    }

    /** Loaded on first use and shared by every report of the run (a BaseFont keeps no per-document state). */
    private static final class Pdf {
        static final BaseFont REGULAR_FONT = load(REGULAR);
        static final BaseFont BOLD_FONT = load(BOLD);
    }

    private static final class PdfCjk {
        static final BaseFont FONT = load(CJK);
    }

    private static final class Awt {
        static final Font REGULAR_FONT = awt(REGULAR);
    }

    private static final class AwtCjk {
        static final Font FONT = awt(CJK);
    }

    private static byte[] bytes(String resource) {
        try (InputStream in = Typeface.class.getResourceAsStream(resource)) {
            if (in == null) throw new IllegalStateException("the report font " + resource + " is missing from the build");
            return in.readAllBytes();
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    private static BaseFont load(String resource) {
        try {
            String name = resource.substring(resource.lastIndexOf('/') + 1);
            return BaseFont.createFont(name, BaseFont.IDENTITY_H, BaseFont.EMBEDDED, true, bytes(resource), null);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    private static Font awt(String resource) {
        try (InputStream in = Typeface.class.getResourceAsStream(resource)) {
            if (in == null) throw new IllegalStateException("the report font " + resource + " is missing from the build");
            return Font.createFont(Font.TRUETYPE_FONT, in);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        } catch (FontFormatException e) {
            throw new IllegalStateException("the report font " + resource + " cannot be read: " + e.getMessage(), e);
        }
    }

    /**
     * Reads the fonts, the calendar and Java2D's text machinery (a few tenths of a second) so that a
     * run can do it on another core while it solves; the report then finds them ready.
     */
    public static void warmUp() {
        pdf(false);
        pdf(true);
        new com.lowagie.text.pdf.PdfDate(); // the calendar and locale data every PDF's creation date needs
        java.awt.image.BufferedImage img = new java.awt.image.BufferedImage(8, 8, java.awt.image.BufferedImage.TYPE_INT_RGB);
        Graphics2D g = img.createGraphics();
        try {
            g.setFont(awt(7f));
            width(g, "0");
        } finally {
            g.dispose();
        }
    }

    static BaseFont pdf(boolean bold) {
        return bold ? Pdf.BOLD_FONT : Pdf.REGULAR_FONT;
    }

    /** True when the character needs the CJK font (DejaVu has no glyph for it, Noto Sans SC has). */
    private static boolean needsCjk(int cp) {
        return !Pdf.REGULAR_FONT.charExists(cp) && PdfCjk.FONT.charExists(cp);
    }

    /**
     * The text as the report can print it: control characters (line breaks) and every
     * character one of the two fonts holds are kept; any other character becomes "[U+XXXX]".
     */
    static String printable(String text) {
        StringBuilder sb = new StringBuilder(text.length());
        text.codePoints().forEach(cp -> {
            boolean shown = cp < 0x20 || cp <= 0xFFFF && (Pdf.REGULAR_FONT.charExists(cp) || PdfCjk.FONT.charExists(cp));
            if (shown) sb.appendCodePoint(cp);
            else sb.append(String.format(Locale.ROOT, "[U+%04X]", cp));
        });
        return sb.toString();
    }

    private static boolean plain(String text) {
        for (int i = 0; i < text.length(); i++) {
            char c = text.charAt(i);
            if (c >= 0x7F && !Pdf.REGULAR_FONT.charExists(c)) return false;
        }
        return true;
    }

    /** A PDF phrase of the text in the report's face at {@code size} points; CJK runs in the CJK face. */
    static Phrase phrase(String text, float size, boolean bold, java.awt.Color color) {
        com.lowagie.text.Font main = new com.lowagie.text.Font(pdf(bold), size, com.lowagie.text.Font.NORMAL, color);
        if (plain(text)) return new Phrase(text, main);
        FontSelector selector = new FontSelector();
        selector.addFont(main);
        selector.addFont(new com.lowagie.text.Font(PdfCjk.FONT, size, com.lowagie.text.Font.NORMAL, color));
        Phrase p = selector.process(printable(text));
        p.setFont(main); // the phrase's own font (spacing, an empty line) in the report's face too
        return p;
    }

    /** The width in points of text set in the report's regular face (a CJK character counted one em wide). */
    static float widthPoint(String text, float size) {
        float w = 0;
        for (int i = 0; i < text.length(); i++) {
            char c = text.charAt(i);
            w += Pdf.REGULAR_FONT.charExists(c) ? Pdf.REGULAR_FONT.getWidthPoint(c, size) : size;
        }
        return w;
    }

    /** The AWT face of the pictures at {@code size} points. */
    static Font awt(float size) {
        return Awt.REGULAR_FONT.deriveFont(size);
    }

    private static TextLayout layout(Graphics2D g, String text) {
        String shown = plain(text) ? text : printable(text);
        AttributedString as = new AttributedString(shown.isEmpty() ? " " : shown);
        Font f = g.getFont();
        as.addAttribute(TextAttribute.FONT, f);
        for (int i = 0; i < shown.length(); i++) {
            if (needsCjk(shown.charAt(i))) as.addAttribute(TextAttribute.FONT, AwtCjk.FONT.deriveFont(f.getSize2D()), i, i + 1);
        }
        return new TextLayout(as.getIterator(), g.getFontRenderContext());
    }

    /**
     * Draws text with its baseline at (x, y) as filled outlines, so the PDF and the PNG show
     * the same glyphs (CJK characters from the CJK face).
     */
    static void draw(Graphics2D g, String text, double x, double y) {
        if (text.isEmpty()) return;
        g.fill(layout(g, text).getOutline(AffineTransform.getTranslateInstance(x, y)));
    }

    /** The advance width of text in the current font, in the picture's units. */
    static double width(Graphics2D g, String text) {
        return text.isEmpty() ? 0 : layout(g, text).getAdvance();
    }
}
