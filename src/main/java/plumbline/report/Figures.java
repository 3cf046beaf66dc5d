package plumbline.report;

import java.awt.Color;
import java.awt.Graphics2D;
import java.awt.image.BufferedImage;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import java.util.function.Consumer;
import javax.imageio.ImageIO;
import plumbline.model.LoadCase;
import plumbline.model.Model;
import plumbline.review.Analysis;
import plumbline.review.Review;
import plumbline.review.LoadSetResult;
import plumbline.solve.Solution;

/**
 * The report's pictures as PNG images (the same {@link Sketch} and {@link Diagrams} code as
 * the PDF), by file name. Each image carries a title line (the job, the load set, what is
 * drawn and its units) above the drawing and the caution below it, so a picture taken out
 * of the report still says what it is and what it is not.
 */
public final class Figures {

    /** Pixels per point of the drawing: 2 gives 144 dpi images of the report's 499 pt wide pictures. */
    static final int PIXELS_PER_POINT = 2;
    /** Points above the drawing for the title and below it for the caution. */
    static final int TITLE_PT = 16, CAUTION_PT = 14;

    private Figures() {
    }

    public static Map<String, byte[]> render(Review review, List<String> sets) throws IOException {
        Map<String, byte[]> out = new LinkedHashMap<>();
        Analysis a = review.analysis();
        Model m = a.model();
        String job = PdfReport.jobTitle(m);
        LoadCase first = m.loadCases().isEmpty() ? null : m.loadCases().get(0);
        String units = "units " + m.units().force().symbol() + ", " + m.units().length().symbol();
        out.put("model.png", png(499, 230, job + " - the model" + (first == null ? "" : ", loads of load case " + first.name())
                + " (" + units + ")", g -> Sketch.model(g, m, first, 499, 230)));
        int k = 1;
        for (var mech : a.determinacy().shapes()) {
            out.put("mechanism-" + k + ".png", png(499, 160, job + " - mechanism " + k + ": " + mech.description(),
                    g -> Sketch.mechanism(g, m, mech.motion(), 499, 160)));
            k++;
        }
        if (a.stable()) {
            Set<String> stems = new HashSet<>();
            for (String name : sets) {
                // two names that differ only in characters a file name cannot carry get distinct files
                String stem = safe(name);
                for (int n = 2; !stems.add(stem); n++) stem = safe(name) + "-" + n;
                LoadSetResult r = a.solutions().get(a.primaryEngine()).get(name);
                Solution s = r.representative();
                for (Diagrams.Kind kind : Diagrams.Kind.values()) {
                    if (Diagrams.blank(m, s, kind)) continue;
                    String unit = Shown.unit(m.units(), kind.dimension);
                    String title = job + " - load set " + name + (r.patterned() ? " (envelope)" : "") + " - "
                            + kind.title.replaceAll(" \\(.*", "") + " (" + unit + ")";
                    out.put(stem + "-" + kind.name().toLowerCase(Locale.ROOT) + ".png",
                            png(499, (int) Diagrams.height(m), title, g -> Diagrams.diagram(g, m, r, kind, 499, Diagrams.height(m), true)));
                }
            }
        }
        return out;
    }

    /** A load set name as part of a file name. */
    static String safe(String name) {
        return name.replaceAll("[^A-Za-z0-9._-]", "_");
    }

    /** A drawing w by h points under a title line and over the caution line, as a PNG. */
    static byte[] png(int w, int h, String title, Consumer<Graphics2D> draw) throws IOException {
        int total = h + TITLE_PT + CAUTION_PT;
        BufferedImage img = new BufferedImage(w * PIXELS_PER_POINT, total * PIXELS_PER_POINT, BufferedImage.TYPE_INT_RGB);
        Graphics2D g = img.createGraphics();
        try {
            g.setColor(Color.WHITE);
            g.fillRect(0, 0, img.getWidth(), img.getHeight());
            g.scale(PIXELS_PER_POINT, PIXELS_PER_POINT);
            Ink.prepare(g);
            g.setFont(Typeface.awt(8f).deriveFont(java.awt.Font.BOLD));
            Typeface.draw(g, PdfKit.Footer.fit(title, w - 8), 4, 11);
            g.setFont(Typeface.awt(6.5f));
            Typeface.draw(g, PdfKit.FOOTER_CAUTION, 4, total - 4);
            g.translate(0, TITLE_PT);
            g.clipRect(0, 0, w, h);
            draw.accept(g);
        } finally {
            g.dispose();
        }
        ByteArrayOutputStream bytes = new ByteArrayOutputStream();
        ImageIO.write(img, "png", bytes);
        return bytes.toByteArray();
    }
}
