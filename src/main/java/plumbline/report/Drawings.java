package plumbline.report;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Font;
import java.awt.FontMetrics;
import java.awt.Graphics2D;
import java.awt.RenderingHints;
import java.awt.geom.AffineTransform;
import java.awt.geom.Arc2D;
import java.awt.geom.Ellipse2D;
import java.awt.geom.Line2D;
import java.awt.geom.Path2D;
import java.awt.geom.Rectangle2D;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import plumbline.model.LoadCase;
import plumbline.model.LoadDirection;
import plumbline.model.Member;
import plumbline.model.MemberLoad;
import plumbline.model.Model;
import plumbline.model.Node;
import plumbline.model.NodeLoad;
import plumbline.model.Quantity;
import plumbline.model.Support;
import plumbline.solve.MemberSolution;
import plumbline.solve.Piecewise;
import plumbline.solve.Solution;
import plumbline.units.Dimension;

/**
 * The pictures of a report, drawn once on Java2D so the same code renders into the PDF
 * (as vector shapes) and into PNG files. Plumbline's own look: slate members, open
 * circles for hinges, supports as filled wedges on a ground line, loads in amber, and each
 * diagram in its own muted colour with its peaks labelled. Moment is drawn on the tension
 * face.
 *
 * Over 400 lines because the model sketch, the force diagrams and the deflected shapes
 * share one set of scales, symbols and label placement; they are to be split with the
 * report's house style (issue 15).
 */
public final class Drawings {

    static final Color MEMBER = new Color(0x26, 0x32, 0x38);
    static final Color SUPPORT = new Color(0x45, 0x5A, 0x64);
    static final Color LOAD = new Color(0xB3, 0x6B, 0x00);
    static final Color LABEL = new Color(0x37, 0x47, 0x4F);
    static final Color AXIAL = new Color(0x7A, 0x5C, 0x9E);
    static final Color SHEAR = new Color(0x3E, 0x86, 0x5A);
    static final Color MOMENT = new Color(0x2F, 0x5F, 0x8F);
    static final Color DEFLECTED = new Color(0xB0, 0x3A, 0x2E);
    static final Color MECHANISM = new Color(0xB0, 0x3A, 0x2E);

    /** Above this many members, drawings leave out names and peak labels (they would cover the picture). */
    static final int LABEL_LIMIT = 60;
    /** Above this many members, the model sketch leaves out the load arrows. */
    static final int LOAD_LIMIT = 300;

    private Drawings() {
    }

    /** Maps model coordinates (m, y up) into a box of the picture (points, y down). */
    record Frame(double scale, double offX, double offY, double heightPt) {
        static Frame fit(Model m, double w, double h, double margin) {
            double minX = Double.POSITIVE_INFINITY, maxX = Double.NEGATIVE_INFINITY;
            double minY = Double.POSITIVE_INFINITY, maxY = Double.NEGATIVE_INFINITY;
            for (Node n : m.nodes().values()) {
                minX = Math.min(minX, n.xM());
                maxX = Math.max(maxX, n.xM());
                minY = Math.min(minY, n.yM());
                maxY = Math.max(maxY, n.yM());
            }
            double sx = (w - 2 * margin) / Math.max(maxX - minX, 1e-9), sy = (h - 2 * margin) / Math.max(maxY - minY, 1e-9);
            double s = Math.min(sx, sy);
            double offX = margin + (w - 2 * margin - s * (maxX - minX)) / 2 - s * minX;
            double offY = margin + (h - 2 * margin - s * (maxY - minY)) / 2 - s * minY;
            return new Frame(s, offX, offY, h);
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
        g.setFont(new Font(Font.SANS_SERIF, Font.PLAIN, 8));
    }

    /** The model: members, hinges, supports, the loads of one case (or none), names. */
    public static void model(Graphics2D g, Model m, LoadCase loads, double w, double h) {
        prepare(g);
        double margin = Math.min(w, h) * 0.16;
        Frame f = Frame.fit(m, w, h, margin);
        double sym = Math.max(6, Math.min(14, Math.min(w, h) / 30));
        drawMembers(g, m, f, new BasicStroke(2.0f), MEMBER);
        for (Member mem : m.members().values()) hinges(g, m, f, mem, sym);
        for (Support s : m.supports().values()) support(g, f, m.node(s.node()), s, sym);
        if (loads != null && m.members().size() <= LOAD_LIMIT) drawLoads(g, m, f, loads, sym);
        if (m.members().size() > LABEL_LIMIT) return; // names would hide the structure; the tables carry them
        g.setColor(LABEL);
        for (Node n : m.nodes().values()) g.drawString(n.name(), (float) (f.x(n.xM()) + 3), (float) (f.y(n.yM()) - 3));
        g.setFont(g.getFont().deriveFont(Font.ITALIC));
        for (Member mem : m.members().values()) {
            Node a = m.node(mem.from()), b = m.node(mem.to());
            double mx = (f.x(a.xM()) + f.x(b.xM())) / 2, my = (f.y(a.yM()) + f.y(b.yM())) / 2;
            double dx = f.x(b.xM()) - f.x(a.xM()), dy = f.y(b.yM()) - f.y(a.yM()), len = Math.hypot(dx, dy);
            g.drawString(mem.name(), (float) (mx + 4 * dy / len + 2), (float) (my - 4 * dx / len - 2));
        }
        g.setFont(g.getFont().deriveFont(Font.PLAIN));
    }

    private static void drawMembers(Graphics2D g, Model m, Frame f, BasicStroke stroke, Color c) {
        g.setStroke(stroke);
        g.setColor(c);
        for (Member mem : m.members().values()) {
            Node a = m.node(mem.from()), b = m.node(mem.to());
            g.draw(new Line2D.Double(f.x(a.xM()), f.y(a.yM()), f.x(b.xM()), f.y(b.yM())));
        }
    }

    private static void hinges(Graphics2D g, Model m, Frame f, Member mem, double sym) {
        Node a = m.node(mem.from()), b = m.node(mem.to());
        double dx = f.x(b.xM()) - f.x(a.xM()), dy = f.y(b.yM()) - f.y(a.yM()), len = Math.hypot(dx, dy);
        double r = sym * 0.28;
        g.setStroke(new BasicStroke(1.2f));
        if (mem.releasedStart()) circle(g, f.x(a.xM()) + dx / len * r * 1.6, f.y(a.yM()) + dy / len * r * 1.6, r);
        if (mem.releasedEnd()) circle(g, f.x(b.xM()) - dx / len * r * 1.6, f.y(b.yM()) - dy / len * r * 1.6, r);
    }

    private static void circle(Graphics2D g, double x, double y, double r) {
        Ellipse2D e = new Ellipse2D.Double(x - r, y - r, 2 * r, 2 * r);
        g.setColor(Color.WHITE);
        g.fill(e);
        g.setColor(MEMBER);
        g.draw(e);
    }

    private static void support(Graphics2D g, Frame f, Node n, Support s, double sym) {
        AffineTransform saved = g.getTransform();
        g.translate(f.x(n.xM()), f.y(n.yM()));
        g.rotate(-s.angleRad());
        g.setColor(SUPPORT);
        g.setStroke(new BasicStroke(1.2f));
        if (s.fixUx() && s.fixUy() && s.fixRz()) {
            g.fill(new Rectangle2D.Double(-sym, 0, 2 * sym, sym * 0.35));
            for (int k = -3; k <= 3; k++) g.draw(new Line2D.Double(k * sym / 3, sym * 0.35, k * sym / 3 - sym / 3, sym * 0.8));
        } else if (s.fixUy() || s.fixUx()) {
            Path2D wedge = new Path2D.Double();
            wedge.moveTo(0, 0);
            wedge.lineTo(-sym * 0.6, sym);
            wedge.lineTo(sym * 0.6, sym);
            wedge.closePath();
            g.fill(wedge);
            double base = sym;
            if (!(s.fixUx() && s.fixUy())) {
                for (int k = -1; k <= 1; k += 2) g.draw(new Ellipse2D.Double(k * sym * 0.3 - sym * 0.15, sym * 1.05, sym * 0.3, sym * 0.3));
                base = sym * 1.4;
            }
            g.draw(new Line2D.Double(-sym, base, sym, base));
            if (s.fixRz()) g.fill(new Rectangle2D.Double(-sym * 0.15, -sym * 0.15, sym * 0.3, sym * 0.3));
        }
        for (int d = 0; d < 3; d++) {
            if (s.spring(d) <= 0) continue;
            Path2D z = new Path2D.Double();
            double len = sym * 1.8;
            if (d == 2) {
                g.draw(new Arc2D.Double(-sym * 0.7, -sym * 0.7, sym * 1.4, sym * 1.4, 200, 220, Arc2D.OPEN));
                continue;
            }
            double ux = d == 0 ? -1 : 0, uy = d == 0 ? 0 : 1;
            z.moveTo(0, 0);
            for (int k = 1; k <= 6; k++) {
                double t = len * k / 7, side = (k % 2 == 0 ? 1 : -1) * sym * 0.3;
                z.lineTo(ux * t - uy * side, uy * t + ux * side);
            }
            z.lineTo(ux * len, uy * len);
            g.draw(z);
            g.draw(new Line2D.Double(ux * len - uy * sym * 0.6, uy * len + ux * sym * 0.6, ux * len + uy * sym * 0.6, uy * len - ux * sym * 0.6));
        }
        g.setTransform(saved);
    }

    private static void arrow(Graphics2D g, double x1, double y1, double x2, double y2, double head) {
        g.draw(new Line2D.Double(x1, y1, x2, y2));
        double ang = Math.atan2(y2 - y1, x2 - x1);
        Path2D p = new Path2D.Double();
        p.moveTo(x2, y2);
        p.lineTo(x2 - head * Math.cos(ang - 0.4), y2 - head * Math.sin(ang - 0.4));
        p.lineTo(x2 - head * Math.cos(ang + 0.4), y2 - head * Math.sin(ang + 0.4));
        p.closePath();
        g.fill(p);
    }

    private static void drawLoads(Graphics2D g, Model m, Frame f, LoadCase c, double sym) {
        g.setColor(LOAD);
        g.setStroke(new BasicStroke(0.9f));
        double len = sym * 2.4;
        for (MemberLoad l : c.memberLoads()) {
            Member mem = m.member(l.member());
            Node a = m.node(mem.from()), b = m.node(mem.to());
            double lm = m.lengthM(mem), ex = m.directionOf(mem)[0], ey = m.directionOf(mem)[1];
            if (l instanceof MemberLoad.Distributed d) {
                double[] dir = direction(d.dir(), ex, ey, Math.signum(d.w1NPerM() + d.w2NPerM()));
                int n = Math.max(3, (int) Math.round((d.toM() - d.fromM()) * f.scale() / (sym * 1.4)));
                double[] tail = null;
                for (int k = 0; k <= n; k++) {
                    double s = d.fromM() + (d.toM() - d.fromM()) * k / n;
                    double px = f.x(a.xM() + ex * s), py = f.y(a.yM() + ey * s);
                    double tx = px - dir[0] * len, ty = py + dir[1] * len;
                    arrow(g, tx, ty, px, py, sym * 0.35);
                    if (tail != null) g.draw(new Line2D.Double(tail[0], tail[1], tx, ty));
                    tail = new double[]{tx, ty};
                }
            } else if (l instanceof MemberLoad.Point p) {
                double[] dir = direction(p.dir(), ex, ey, Math.signum(p.forceN()));
                double px = f.x(a.xM() + ex * p.atM()), py = f.y(a.yM() + ey * p.atM());
                g.setStroke(new BasicStroke(1.6f));
                arrow(g, px - dir[0] * len * 1.3, py + dir[1] * len * 1.3, px, py, sym * 0.5);
                g.setStroke(new BasicStroke(0.9f));
            } else if (l instanceof MemberLoad.Couple cp) {
                double px = f.x(a.xM() + ex * cp.atM()), py = f.y(a.yM() + ey * cp.atM());
                couple(g, px, py, sym, cp.momentNm() > 0);
            }
        }
        for (NodeLoad nl : c.nodeLoads()) {
            Node n = m.node(nl.node());
            double px = f.x(n.xM()), py = f.y(n.yM()), mag = Math.hypot(nl.fxN(), nl.fyN());
            g.setStroke(new BasicStroke(1.6f));
            if (mag > 0) arrow(g, px - nl.fxN() / mag * len * 1.3, py + nl.fyN() / mag * len * 1.3, px, py, sym * 0.5);
            g.setStroke(new BasicStroke(0.9f));
            if (nl.mzNm() != 0) couple(g, px, py, sym, nl.mzNm() > 0);
        }
    }

    private static void couple(Graphics2D g, double x, double y, double sym, boolean ccw) {
        double r = sym * 0.9;
        g.draw(new Arc2D.Double(x - r, y - r, 2 * r, 2 * r, 30, 240, Arc2D.OPEN));
        double endAng = Math.toRadians(ccw ? 270 : 30);
        double hx = x + r * Math.cos(endAng), hy = y - r * Math.sin(endAng);
        double tang = endAng + (ccw ? Math.PI / 2 : -Math.PI / 2);
        arrow(g, hx - Math.cos(tang) * 0.1, hy + Math.sin(tang) * 0.1, hx, hy, sym * 0.4);
    }

    /** Direction (x right, y up) in which a load of the given sign acts. */
    private static double[] direction(LoadDirection dir, double ex, double ey, double sign) {
        double s = sign == 0 ? 1 : sign;
        double[] u = dir.unit(ex, ey);
        return new double[]{s * u[0], s * u[1]};
    }

    /** Which function a diagram shows. */
    public enum Kind {
        AXIAL("Axial force N (T tension, solid; C compression, dashed)", Drawings.AXIAL, Dimension.FORCE),
        SHEAR("Shear force V", Drawings.SHEAR, Dimension.FORCE),
        MOMENT("Bending moment M (drawn on the tension face)", Drawings.MOMENT, Dimension.MOMENT),
        DEFLECTION("Deflected shape (exaggerated)", DEFLECTED, Dimension.LENGTH);

        public final String title;
        final Color color;
        public final Dimension dimension;

        Kind(String t, Color c, Dimension d) {
            title = t;
            color = c;
            dimension = d;
        }
    }

    private static Piecewise function(MemberSolution ms, Kind k) {
        return switch (k) {
            case AXIAL -> ms.response().axial();
            case SHEAR -> ms.response().shear();
            case MOMENT -> ms.response().moment();
            case DEFLECTION -> ms.response().deflection();
        };
    }

    /**
     * One diagram of a solved state along every member, offset perpendicular to the member:
     * moment on the tension face (positive towards local -y, so sagging hangs below a
     * beam), axial and shear force positive towards local +y; each member's largest and
     * smallest value labelled.
     */
    public static void diagram(Graphics2D g, Model m, Solution s, Kind kind, double w, double h) {
        prepare(g);
        double margin = Math.min(w, h) * 0.24;
        Frame f = Frame.fit(m, w, h, margin);
        double peak = 0;
        for (MemberSolution ms : s.members().values()) {
            Piecewise p = function(ms, kind);
            peak = Math.max(peak, Math.max(Math.abs(p.max().value()), Math.abs(p.min().value())));
        }
        drawMembers(g, m, f, new BasicStroke(1.0f), new Color(0x90, 0xA4, 0xAE));
        List<Rectangle2D> labels = new ArrayList<>();
        double room = margin * 0.7;
        // moment is drawn on the tension face (positive towards local -y); axial and shear force
        // with positive values on the local +y side, as usually drawn
        double k = (peak == 0 ? 0 : room / peak) * (kind == Kind.MOMENT ? 1 : -1);
        g.setColor(kind.color);
        for (Member mem : m.members().values()) {
            MemberSolution ms = s.members().get(mem.name());
            Node a = m.node(mem.from()), b = m.node(mem.to());
            double lm = m.lengthM(mem), ex = m.directionOf(mem)[0], ey = m.directionOf(mem)[1];
            Piecewise p = function(ms, kind);
            Path2D path = new Path2D.Double();
            double x0 = f.x(a.xM()), y0 = f.y(a.yM());
            if (kind == Kind.DEFLECTION) {
                // displacement of the axis: transverse v plus the axial motion of the chord (linear between nodes)
                double[] ua = s.displacements().get(a.name()), ub = s.displacements().get(b.name());
                double scaleD = peak == 0 ? 0 : room / maxDisplacement(s);
                for (int i = 0; i <= 60; i++) {
                    double x = lm * i / 60, t = x / lm;
                    double v = p.at(x);
                    double ux = ua[0] + (ub[0] - ua[0]) * t, uy = ua[1] + (ub[1] - ua[1]) * t;
                    double along = ux * ex + uy * ey;
                    double px = a.xM() + ex * x, py = a.yM() + ey * x;
                    double dx = ex * along - ey * v, dy = ey * along + ex * v;
                    double sx = f.x(px) + dx * scaleD, sy = f.y(py) - dy * scaleD;
                    if (i == 0) path.moveTo(sx, sy);
                    else path.lineTo(sx, sy);
                }
                g.setStroke(new BasicStroke(1.5f, BasicStroke.CAP_ROUND, BasicStroke.JOIN_ROUND, 1f, new float[]{5f, 3f}, 0f));
                g.draw(path);
                continue;
            }
            if (kind == Kind.AXIAL && Math.abs(p.max().value() - p.min().value()) <= 1e-9 * Math.max(peak, 1e-300)) {
                // a constant axial force: the member drawn in tension (solid) or compression (dashed), value at mid-length
                double v = p.max().value();
                boolean compression = v < -1e-9 * peak;
                g.setColor(kind.color);
                g.setStroke(compression ? new BasicStroke(2.2f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_MITER, 1f, new float[]{5f, 2.5f}, 0f)
                        : new BasicStroke(2.2f));
                if (Math.abs(v) > 1e-9 * peak) g.draw(new Line2D.Double(x0, y0, f.x(b.xM()), f.y(b.yM())));
                if (m.members().size() > LABEL_LIMIT) continue;
                String text = Math.abs(v) <= 1e-9 * peak ? "0" : Console.fmt(Math.abs(m.units().fromInternal(v, kind.dimension)))
                        + (compression ? " C" : " T");
                double mx = (x0 + f.x(b.xM())) / 2, my = (y0 + f.y(b.yM())) / 2;
                FontMetrics fm = g.getFontMetrics();
                float tw = fm.stringWidth(text);
                g.setColor(Color.WHITE);
                g.fill(new Rectangle2D.Double(mx - tw / 2 - 1, my - fm.getAscent() / 2.0 - 1, tw + 2, fm.getAscent() + 2));
                g.setColor(kind.color);
                g.drawString(text, (float) (mx - tw / 2), (float) (my + fm.getAscent() / 2.0 - 1));
                continue;
            }
            path.moveTo(x0, y0);
            List<Double> xs = new ArrayList<>();
            for (int seg = 0; seg < p.segments(); seg++) {
                for (int i = 0; i <= 16; i++) xs.add(p.start(seg) + (p.end(seg) - p.start(seg)) * i / 16);
            }
            for (int i = 0; i < xs.size(); i++) {
                double x = xs.get(i);
                int seg = Math.min(i / 17, p.segments() - 1);
                double v = p.piece(seg).at(x - p.start(seg));
                // positive towards local -y: (ey, -ex) in model axes
                double px = a.xM() + ex * x, py = a.yM() + ey * x;
                path.lineTo(f.x(px) + ey * v * k, f.y(py) + ex * v * k);
            }
            path.lineTo(f.x(b.xM()), f.y(b.yM()));
            path.closePath();
            g.setColor(new Color(kind.color.getRed(), kind.color.getGreen(), kind.color.getBlue(), 70));
            g.fill(path);
            g.setColor(kind.color);
            g.setStroke(new BasicStroke(1.0f));
            g.draw(path);
            if (m.members().size() <= LABEL_LIMIT) labelPeaks(g, m, f, mem, p, k, kind, labels);
        }
        if (kind == Kind.DEFLECTION) {
            g.setColor(kind.color);
            g.drawString(String.format(Locale.ROOT, "largest displacement %s %s", Console.fmt(m.units().fromInternal(maxDisplacement(s),
                    Dimension.LENGTH)), m.units().length().symbol()), 6f, (float) (h - 6));
        }
    }

    /**
     * True when a diagram would show nothing: the function is zero on every member (shear
     * and moment in a truss under joint loads), to rounding of the largest force in play.
     */
    public static boolean blank(Model m, Solution s, Kind kind) {
        if (kind == Kind.DEFLECTION) return false;
        double force = 0, peak = 0;
        for (double[] r : s.reactions().values()) force = Math.max(force, Math.hypot(r[0], r[1]));
        for (MemberSolution ms : s.members().values()) {
            force = Math.max(force, Math.max(ms.peaks().value(Quantity.N_ABS), ms.peaks().value(Quantity.V_ABS)));
            Piecewise p = function(ms, kind);
            peak = Math.max(peak, Math.max(Math.abs(p.max().value()), Math.abs(p.min().value())));
        }
        double scale = kind == Kind.MOMENT ? force * m.extentM() : force;
        return peak <= 1e-9 * scale;
    }

    private static double maxDisplacement(Solution s) {
        double d = 0;
        for (double[] u : s.displacements().values()) d = Math.max(d, Math.hypot(u[0], u[1]));
        for (MemberSolution ms : s.members().values()) d = Math.max(d, ms.peaks().deflection().value());
        return d == 0 ? 1 : d;
    }

    /** Labels a member's largest and smallest values, skipping any that would overlap a label already drawn. */
    private static void labelPeaks(Graphics2D g, Model m, Frame f, Member mem, Piecewise p, double k, Kind kind,
                                   List<Rectangle2D> drawn) {
        Node a = m.node(mem.from()), b = m.node(mem.to());
        double lm = m.lengthM(mem), ex = m.directionOf(mem)[0], ey = m.directionOf(mem)[1];
        Piecewise.Extreme[] ext = {p.max(), p.min()};
        double shown = Double.NaN;
        for (Piecewise.Extreme e : ext) {
            double v = e.value();
            if (Math.abs(v) < 1e-9 * Math.max(Math.abs(ext[0].value()), Math.abs(ext[1].value())) || v == shown) continue;
            if (ext[0].value() == ext[1].value() && !Double.isNaN(shown)) continue;
            shown = v;
            double px = a.xM() + ex * e.xM(), py = a.yM() + ey * e.xM();
            double sx = f.x(px) + ey * v * k, sy = f.y(py) + ex * v * k;
            String text = Console.fmt(m.units().fromInternal(v, kind.dimension));
            boolean below = (v * k) >= 0 == (ex >= 0);
            FontMetrics fm = g.getFontMetrics();
            float tx = (float) (sx + 2), ty = (float) (sy + (below ? 9 : -2));
            Rectangle2D box = new Rectangle2D.Double(tx, ty - fm.getAscent(), fm.stringWidth(text), fm.getAscent());
            if (drawn.stream().anyMatch(r -> r.intersects(box))) continue;
            drawn.add(box);
            g.drawString(text, tx, ty);
        }
    }

    /** A mechanism: the model in grey, the moving shape in red (motion scaled for visibility). */
    public static void mechanism(Graphics2D g, Model m, Map<String, double[]> motion, double w, double h) {
        prepare(g);
        double margin = Math.min(w, h) * 0.16;
        Frame f = Frame.fit(m, w, h, margin);
        drawMembers(g, m, f, new BasicStroke(1.5f), new Color(0x90, 0xA4, 0xAE));
        double sym = Math.max(6, Math.min(14, Math.min(w, h) / 30));
        for (Support s : m.supports().values()) support(g, f, m.node(s.node()), s, sym);
        double shift = margin * 0.7;
        g.setColor(MECHANISM);
        g.setStroke(new BasicStroke(1.6f, BasicStroke.CAP_ROUND, BasicStroke.JOIN_ROUND, 1f, new float[]{6f, 3f}, 0f));
        for (Member mem : m.members().values()) {
            Node a = m.node(mem.from()), b = m.node(mem.to());
            double[] ua = motion.getOrDefault(a.name(), new double[3]), ub = motion.getOrDefault(b.name(), new double[3]);
            g.draw(new Line2D.Double(f.x(a.xM()) + ua[0] * shift, f.y(a.yM()) - ua[1] * shift,
                    f.x(b.xM()) + ub[0] * shift, f.y(b.yM()) - ub[1] * shift));
        }
        g.setStroke(new BasicStroke(1.0f));
        for (var e : motion.entrySet()) {
            Node n = m.node(e.getKey());
            double[] u = e.getValue();
            if (Math.hypot(u[0], u[1]) > 1e-6) arrow(g, f.x(n.xM()), f.y(n.yM()), f.x(n.xM()) + u[0] * shift, f.y(n.yM()) - u[1] * shift, 5);
        }
        if (m.members().size() > LABEL_LIMIT) return;
        g.setColor(LABEL);
        for (Node n : m.nodes().values()) g.drawString(n.name(), (float) (f.x(n.xM()) + 3), (float) (f.y(n.yM()) - 3));
    }
}
