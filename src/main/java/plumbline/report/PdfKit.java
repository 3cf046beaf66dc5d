package plumbline.report;

import java.awt.Color;
import java.awt.Graphics2D;
import java.util.function.Consumer;
import com.lowagie.text.Document;
import com.lowagie.text.DocumentException;
import com.lowagie.text.Element;
import com.lowagie.text.Image;
import com.lowagie.text.Paragraph;
import com.lowagie.text.Phrase;
import com.lowagie.text.Rectangle;
import com.lowagie.text.pdf.ColumnText;
import com.lowagie.text.pdf.PdfContentByte;
import com.lowagie.text.pdf.PdfPCell;
import com.lowagie.text.pdf.PdfPTable;
import com.lowagie.text.pdf.PdfPageEventHelper;
import com.lowagie.text.pdf.PdfTemplate;
import com.lowagie.text.pdf.PdfWriter;

/**
 * The report's page furniture on OpenPDF: the text styles (in the embedded {@link Typeface}),
 * numbered section headings that never end a page, captions kept with what follows,
 * tables and pictures, and the footer of every page (the caution, the job title and
 * "page x of y").
 */
final class PdfKit {

    static final Color INK = new Color(0x1A, 0x1A, 0x1A);
    static final Color RULE = new Color(0x9E, 0x9E, 0x9E);
    static final Color SHADE_MISMATCH = new Color(0xD6, 0xD6, 0xD6);
    static final Color SHADE_MARGINAL = new Color(0xEC, 0xEC, 0xEC);
    static final Color HEAD = new Color(0x3A, 0x3A, 0x3A);

    /** The caution every page's footer carries, short enough for one line. */
    static final String FOOTER_CAUTION = "Independent check of a simplified linear-elastic model: it does not replace the engineer "
            + "of record, licensed review or local codes.";

    /** Room (points) a section heading needs below it on its page, else it starts the next page. */
    static final float HEADING_ROOM = 140;
    /** Room a caption of a table or picture needs below it. */
    static final float CAPTION_ROOM = 90;

    enum Style {
        TITLE(15, true), H1(11.5f, true), BODY(9, false), BOLD(9, true), SMALL(7f, false), SMALL_BOLD(7f, true),
        HEAD_CELL(7f, true), VERDICT(13, true);

        final float size;
        final boolean bold;

        Style(float size, boolean bold) {
            this.size = size;
            this.bold = bold;
        }
    }

    final Document doc;
    final PdfWriter writer;
    private int section;

    PdfKit(Document doc, PdfWriter writer) {
        this.doc = doc;
        this.writer = writer;
    }

    static Phrase phrase(String text, Style s) {
        return Typeface.phrase(text, s.size, s.bold, s == Style.HEAD_CELL ? Color.WHITE : s == Style.H1 ? HEAD : INK);
    }

    /** Starts a new page unless {@code points} of the page are left below the current line. */
    void keepRoom(float points) {
        if (writer.getVerticalPosition(true) - doc.bottom() < points) doc.newPage();
    }

    /** The next numbered section heading ("4  Claims compared"), never alone at the foot of a page. */
    void heading(String title) throws DocumentException {
        heading(title, HEADING_ROOM);
    }

    /** A section heading that needs {@code room} points below it for its first block (a picture, say). */
    void heading(String title, float room) throws DocumentException {
        keepRoom(room);
        Paragraph p = new Paragraph(phrase(++section + "  " + title, Style.H1));
        p.setSpacingBefore(12);
        p.setSpacingAfter(4);
        doc.add(p);
    }

    /** A bold caption of what follows (a table, a picture), kept on the page of what follows. */
    void caption(String text) throws DocumentException {
        keepRoom(CAPTION_ROOM);
        para(text, Style.BOLD);
    }

    void para(String text, Style s) throws DocumentException {
        Paragraph p = new Paragraph(phrase(text, s));
        p.setSpacingAfter(3);
        doc.add(p);
    }

    static PdfPCell cell(String text, Style s, Color shade) {
        PdfPCell c = new PdfPCell(phrase(text, s));
        c.setBorderColor(RULE);
        c.setBorderWidth(0.4f);
        c.setPadding(2.2f);
        if (shade != null) c.setBackgroundColor(shade);
        return c;
    }

    /** A table with its header row repeated on every page it runs over. */
    static PdfPTable table(float[] widths, String... heads) {
        PdfPTable t = new PdfPTable(widths);
        t.setWidthPercentage(100);
        t.setHeaderRows(1);
        t.setSpacingBefore(3);
        t.setSpacingAfter(6);
        for (String h : heads) t.addCell(cell(h, Style.HEAD_CELL, HEAD));
        return t;
    }

    /** A picture drawn as vector shapes, w by h points, framed. */
    Image picture(float w, float h, Consumer<Graphics2D> draw) throws DocumentException {
        PdfTemplate tpl = writer.getDirectContent().createTemplate(w, h);
        Graphics2D g = tpl.createGraphicsShapes(w, h);
        try {
            g.setColor(Color.WHITE);
            g.fillRect(0, 0, (int) w, (int) h);
            draw.accept(g);
        } finally {
            g.dispose();
        }
        Image img = Image.getInstance(tpl);
        img.setAlignment(Element.ALIGN_CENTER);
        img.setBorder(Rectangle.BOX);
        img.setBorderWidth(0.4f);
        img.setBorderColor(RULE);
        return img;
    }

    /** A picture with its caption above and its legend below, all on one page. */
    void figure(String caption, Image picture, String legend) throws DocumentException {
        PdfPTable box = new PdfPTable(1);
        box.setWidthPercentage(100);
        box.setKeepTogether(true);
        box.setSpacingAfter(4);
        if (caption != null) box.addCell(bare(new PdfPCell(phrase(caption, Style.SMALL_BOLD))));
        box.addCell(bare(new PdfPCell(picture, true)));
        if (legend != null) box.addCell(bare(new PdfPCell(phrase(legend, Style.SMALL))));
        doc.add(box);
    }

    private static PdfPCell bare(PdfPCell c) {
        c.setBorder(Rectangle.NO_BORDER);
        c.setPaddingLeft(0);
        c.setPaddingRight(0);
        return c;
    }

    /**
     * The footer of every page: a rule, the caution, then the report's name and job title
     * (shortened with "..." to leave room) and "page x of y"; y is filled in at the close.
     */
    static final class Footer extends PdfPageEventHelper {
        private static final float SIZE = 7f;
        private final String title;
        private PdfTemplate total;

        Footer(String title) {
            this.title = title;
        }

        @Override
        public void onOpenDocument(PdfWriter writer, Document document) {
            total = writer.getDirectContent().createTemplate(30, 12);
        }

        @Override
        public void onEndPage(PdfWriter writer, Document document) {
            PdfContentByte cb = writer.getDirectContent();
            float y = document.bottom() - 34;
            cb.setColorStroke(RULE);
            cb.setLineWidth(0.4f);
            cb.moveTo(document.left(), y + 22);
            cb.lineTo(document.right(), y + 22);
            cb.stroke();
            ColumnText.showTextAligned(cb, Element.ALIGN_LEFT, Typeface.phrase(FOOTER_CAUTION, SIZE, false, INK), document.left(), y + 12, 0);
            String page = "page " + writer.getPageNumber() + " of";
            float pageWidth = Typeface.widthPoint(page, SIZE) + 20;
            String shown = fit(title, document.right() - document.left() - pageWidth - 12);
            ColumnText.showTextAligned(cb, Element.ALIGN_LEFT, Typeface.phrase(shown, SIZE, false, INK), document.left(), y, 0);
            ColumnText.showTextAligned(cb, Element.ALIGN_LEFT, Typeface.phrase(page, SIZE, false, INK),
                    document.right() - pageWidth, y, 0);
            cb.addTemplate(total, document.right() - 20, y);
        }

        /** The text, cut at the end with "..." until it is at most {@code width} points wide. */
        static String fit(String text, float width) {
            if (Typeface.widthPoint(text, SIZE) <= width) return text;
            String s = text;
            while (!s.isEmpty() && Typeface.widthPoint(s + "...", SIZE) > width) s = s.substring(0, s.length() - 1);
            return s + "...";
        }

        @Override
        public void onCloseDocument(PdfWriter writer, Document document) {
            total.beginText();
            total.setFontAndSize(Typeface.pdf(false), SIZE);
            total.setColorFill(INK);
            total.setTextMatrix(0, 0);
            total.showText(" " + (writer.getPageNumber() - 1)); // the writer has moved past the last page
            total.endText();
        }
    }
}
