package plumbline.report;

import java.awt.Color;
import java.awt.Graphics2D;
import java.awt.image.BufferedImage;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.function.Consumer;
import javax.imageio.ImageIO;
import plumbline.model.LoadCase;
import plumbline.model.Model;
import plumbline.review.Analysis;
import plumbline.review.Review;
import plumbline.solve.Solution;

/** The report's pictures as PNG images (the same {@link Drawings} code as the PDF), by file name. */
public final class Figures {

    /** Pixels per point of the drawing: 2 gives 144 dpi images of the report's 499 pt wide pictures. */
    static final int PIXELS_PER_POINT = 2;

    private Figures() {
    }

    public static Map<String, byte[]> render(Review review, List<String> sets) throws IOException {
        Map<String, byte[]> out = new LinkedHashMap<>();
        Analysis a = review.analysis();
        Model m = a.model();
        LoadCase first = m.loadCases().isEmpty() ? null : m.loadCases().get(0);
        out.put("model.png", png(499, 230, g -> Drawings.model(g, m, first, 499, 230)));
        int k = 1;
        for (var mech : a.determinacy().shapes()) {
            out.put("mechanism-" + k++ + ".png", png(499, 160, g -> Drawings.mechanism(g, m, mech.motion(), 499, 160)));
        }
        if (a.stable()) {
            for (String name : sets) {
                Solution s = a.solutions().get(a.primaryEngine()).get(name).representative();
                for (Drawings.Kind kind : Drawings.Kind.values()) {
                    if (Drawings.blank(m, s, kind)) continue;
                    out.put(safe(name) + "-" + kind.name().toLowerCase(Locale.ROOT) + ".png",
                            png(499, 150, g -> Drawings.diagram(g, m, s, kind, 499, 150)));
                }
            }
        }
        return out;
    }

    /** A load set name as part of a file name. */
    static String safe(String name) {
        return name.replaceAll("[^A-Za-z0-9._-]", "_");
    }

    static byte[] png(int w, int h, Consumer<Graphics2D> draw) throws IOException {
        BufferedImage img = new BufferedImage(w * PIXELS_PER_POINT, h * PIXELS_PER_POINT, BufferedImage.TYPE_INT_RGB);
        Graphics2D g = img.createGraphics();
        try {
            g.setColor(Color.WHITE);
            g.fillRect(0, 0, img.getWidth(), img.getHeight());
            g.scale(PIXELS_PER_POINT, PIXELS_PER_POINT);
            draw.accept(g);
        } finally {
            g.dispose();
        }
        ByteArrayOutputStream bytes = new ByteArrayOutputStream();
        ImageIO.write(img, "png", bytes);
        return bytes.toByteArray();
    }
}
