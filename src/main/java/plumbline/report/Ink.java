package plumbline.report;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Graphics2D;
import java.awt.RenderingHints;
import java.awt.Shape;
import java.awt.geom.Line2D;
import java.awt.geom.Path2D;
import java.awt.geom.Rectangle2D;
import java.util.ArrayList;
import java.util.List;
import plumbline.model.Member;
import plumbline.model.Model;
import plumbline.model.Node;

/**
 * Plumbline's house style for pictures, made to read the same on a grey-scale print: one
 * ink on white; the model drawn solid, the structure under a diagram in a light grey;
 * force diagrams outlined and hatched at 45 degrees (no colour fills); every value and
 * name set on a white ground so no line runs through it, and never on top of another.
 */
final class Ink {

    static final Color INK = new Color(0x1A, 0x1A, 0x1A);
    /** The structure under a diagram and the undeformed shape: light enough to read the diagram over it. */
    static final Color GHOST = new Color(0xB4, 0xB4, 0xB4);
    static final Color PAPER = Color.WHITE;
    static final float LABEL_PT = 7f;

    private Ink() {
    }

    /** Maps model coordinates (m, y up) into a box of the picture (points, y down), margins per side. */
    record Frame(double scale, double offX, double offY, double heightPt) {
        static Frame fit(Model m, double w, double h, double left, double right, double top, double bottom) {
            double minX = Double.POSITIVE_INFINITY, maxX = Double.NEGATIVE_INFINITY;
            double minY = Double.POSITIVE_INFINITY, maxY = Double.NEGATIVE_INFINITY;
            for (Node n : m.nodes().values()) {
                minX = Math.min(minX, n.xM());
                maxX = Math.max(maxX, n.xM());
                minY = Math.min(minY, n.yM());
                maxY = Math.max(maxY, n.yM());
            }
            double boxW = w - left - right, boxH = h - top - bottom;
            double sx = boxW / Math.max(maxX - minX, 1e-9), sy = boxH / Math.max(maxY - minY, 1e-9);
            double s = Math.min(sx, sy);
            double offX = left + (boxW - s * (maxX - minX)) / 2 - s * minX;
            double offY = bottom + (boxH - s * (maxY - minY)) / 2 - s * minY;
            return new Frame(s, offX, offY, h);
        }

        static Frame fit(Model m, double w, double h, double margin) {
            return fit(m, w, h, margin, margin, margin, margin);
        }

        double x(double xm) {
            return offX + scale * xm;
        }

        double y(double ym) {
            return heightPt - (offY + scale * ym);
        }
    }

    static void prepare(Graphics2D g) {
        g.setRenderingHint(RenderingHints.KEY_ANTIALIASING, RenderingHints.VALUE_ANTIALIAS_ON);
        g.setRenderingHint(RenderingHints.KEY_TEXT_ANTIALIASING, RenderingHints.VALUE_TEXT_ANTIALIAS_ON);
        g.setRenderingHint(RenderingHints.KEY_FRACTIONALMETRICS, RenderingHints.VALUE_FRACTIONALMETRICS_ON);
        g.setRenderingHint(RenderingHints.KEY_STROKE_CONTROL, RenderingHints.VALUE_STROKE_PURE); // curves drawn where they are, not snapped to pixels
        g.setFont(Typeface.awt(LABEL_PT));
        g.setColor(INK);
    }

    /** Every member as a straight line from its start node to its end node, in the given colour and width. */
    static void members(Graphics2D g, Model m, Frame f, Color color, float width) {
        g.setColor(color);
        g.setStroke(new BasicStroke(width));
        for (Member mem : m.members().values()) {
            Node a = m.node(mem.from()), b = m.node(mem.to());
            g.draw(new Line2D.Double(f.x(a.xM()), f.y(a.yM()), f.x(b.xM()), f.y(b.yM())));
        }
    }

    /** Fills a shape with thin lines at 45 degrees, {@code gapPt} apart, then outlines it. */
    static void hatch(Graphics2D g, Shape s, double gapPt) {
        Shape saved = g.getClip();
        Rectangle2D b = s.getBounds2D();
        g.clip(s);
        g.setColor(INK);
        g.setStroke(new BasicStroke(0.35f));
        double span = b.getWidth() + b.getHeight();
        for (double t = -b.getHeight(); t <= b.getWidth() + gapPt; t += gapPt) {
            double x0 = b.getMinX() + t;
            g.draw(new Line2D.Double(x0, b.getMaxY(), x0 + span, b.getMaxY() - span));
        }
        g.setClip(saved);
        g.setStroke(new BasicStroke(0.9f));
        g.draw(s);
    }

    static void arrow(Graphics2D g, double x1, double y1, double x2, double y2, double head) {
        g.draw(new Line2D.Double(x1, y1, x2, y2));
        arrowHead(g, x2, y2, Math.atan2(y2 - y1, x2 - x1), head);
    }

    /** A filled arrow head with its tip at (x, y), pointing along {@code angle} (picture axes). */
    static void arrowHead(Graphics2D g, double x, double y, double angle, double head) {
        Path2D p = new Path2D.Double();
        p.moveTo(x, y);
        p.lineTo(x - head * Math.cos(angle - 0.4), y - head * Math.sin(angle - 0.4));
        p.lineTo(x - head * Math.cos(angle + 0.4), y - head * Math.sin(angle + 0.4));
        p.closePath();
        g.fill(p);
    }

    /**
     * The labels of one picture: each is set on a white ground at the first of its candidate
     * places that covers no label already set, or left out when every place is taken.
     */
    static final class Labels {
        private final Graphics2D g;
        private final Rectangle2D picture;
        private final List<Rectangle2D> taken = new ArrayList<>();
        private final List<Object[]> values = new ArrayList<>(); // {text, x, y} of the values set with at()

        /**
         * True when the same text was already set for a point within {@code distance} points
         * (the end moment of two members meeting at a joint, labelled once).
         */
        boolean near(String text, double x, double y, double distance) {
            for (Object[] v : values) {
                if (v[0].equals(text) && Math.hypot((double) v[1] - x, (double) v[2] - y) <= distance) return true;
            }
            return false;
        }

        /** Remembers that text was set for the point (x, y). */
        void remember(String text, double x, double y) {
            values.add(new Object[]{text, x, y});
        }

        Labels(Graphics2D g, double w, double h) {
            this.g = g;
            this.picture = new Rectangle2D.Double(0, 0, w, h);
        }

        /** Marks a region (a symbol, a title) that labels must not cover. */
        void reserve(Rectangle2D r) {
            taken.add(r);
        }

        /**
         * Sets text at the first free place; each place is {x, y, dx, dy}: the anchor point and
         * where the text sits from it (-1 left/above, 0 centred, +1 right/below).
         */
        boolean place(String text, double[]... places) {
            double w = Typeface.width(g, text), asc = g.getFont().getSize2D() * 0.78, desc = g.getFont().getSize2D() * 0.22;
            for (double[] p : places) {
                double x = p[2] < 0 ? p[0] - w - 2 : p[2] > 0 ? p[0] + 2 : p[0] - w / 2;
                double base = p[3] < 0 ? p[1] - desc - 2 : p[3] > 0 ? p[1] + asc + 2 : p[1] + (asc - desc) / 2;
                Rectangle2D box = new Rectangle2D.Double(x - 1, base - asc - 1, w + 2, asc + desc + 2);
                if (taken.stream().anyMatch(r -> r.intersects(box))) continue;
                if (!picture.contains(box)) continue;
                taken.add(box);
                Color c = g.getColor();
                g.setColor(PAPER);
                g.fill(box);
                g.setColor(c);
                Typeface.draw(g, text, x, base);
                return true;
            }
            return false;
        }

        static double[] at(double x, double y, double dx, double dy) {
            return new double[]{x, y, dx, dy};
        }
    }
}
