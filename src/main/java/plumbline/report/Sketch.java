package plumbline.report;

import java.awt.BasicStroke;
import java.awt.Font;
import java.awt.Graphics2D;
import java.awt.geom.AffineTransform;
import java.awt.geom.Arc2D;
import java.awt.geom.Ellipse2D;
import java.awt.geom.Line2D;
import java.awt.geom.Path2D;
import java.awt.geom.Rectangle2D;
import java.util.Map;
import java.util.TreeSet;
import plumbline.model.LoadCase;
import plumbline.model.LoadDirection;
import plumbline.model.Member;
import plumbline.model.MemberLoad;
import plumbline.model.Model;
import plumbline.model.Node;
import plumbline.model.NodeLoad;
import plumbline.model.Support;
import plumbline.units.Dimension;
import plumbline.units.UnitSystem;

/**
 * The model as checked, drawn in the house style ({@link Ink}): members with an arrow head
 * pointing from start to end (local x; the signs of N, V and M follow it), hinges as open
 * circles, supports as wedges, bars and zigzag springs on a ground line, the loads of one
 * case with their values, node and member names, and chains of dimensions below and to
 * the left; also a mechanism of an unstable model.
 */
public final class Sketch {

    /** Above this many members, drawings leave out names, values and dimensions (they would cover the picture). */
    static final int LABEL_LIMIT = 60;
    /** Above this many members, the sketch leaves out the load arrows. */
    static final int LOAD_LIMIT = 300;
    /** Above this many distinct coordinates, a dimension chain is left out (the node table gives them). */
    static final int DIMENSION_LIMIT = 16;

    private Sketch() {
    }

    /** The symbol size in points for a picture w by h. */
    static double symbol(double w, double h) {
        return Math.max(6, Math.min(12, Math.min(w, h) / 30));
    }

    /** The model with the loads of one case (or none), names, member directions and dimensions. */
    public static void model(Graphics2D g, Model m, LoadCase loads, double w, double h) {
        Ink.prepare(g);
        double sym = symbol(w, h);
        boolean labelled = m.members().size() <= LABEL_LIMIT;
        double dims = labelled ? 44 : 0;
        Ink.Frame f = Ink.Frame.fit(m, w, h, sym * 3 + dims, sym * 3, sym * 3.4, sym * 2.4 + dims);
        Ink.Labels labels = new Ink.Labels(g, w, h);
        Ink.members(g, m, f, Ink.INK, 1.8f);
        for (Member mem : m.members().values()) hinges(g, m, f, mem, sym);
        for (Support s : m.supports().values()) {
            Node n = m.node(s.node());
            support(g, f, n, s, sym);
            labels.reserve(new Rectangle2D.Double(f.x(n.xM()) - sym * 1.1, f.y(n.yM()) + sym * 0.2, sym * 2.2, sym * 1.4));
        }
        if (labelled) {
            for (Member mem : m.members().values()) direction(g, m, f, mem, sym);
            dimensions(g, m, f, sym, labels);
        }
        if (loads != null && m.members().size() <= LOAD_LIMIT) drawLoads(g, m, f, loads, sym, labelled ? labels : null);
        if (!labelled) return; // names would hide the structure; the tables carry them
        g.setColor(Ink.INK);
        for (Node n : m.nodes().values()) {
            double x = f.x(n.xM()), y = f.y(n.yM());
            labels.place(n.name(), Ink.Labels.at(x + 2, y - 2, 1, -1), Ink.Labels.at(x - 2, y - 2, -1, -1),
                    Ink.Labels.at(x + 2, y + 2, 1, 1), Ink.Labels.at(x - 2, y + 2, -1, 1));
        }
        g.setFont(g.getFont().deriveFont(Font.ITALIC));
        for (Member mem : m.members().values()) {
            Node a = m.node(mem.from()), b = m.node(mem.to());
            double mx = (f.x(a.xM()) + f.x(b.xM())) / 2, my = (f.y(a.yM()) + f.y(b.yM())) / 2;
            double dx = f.x(b.xM()) - f.x(a.xM()), dy = f.y(b.yM()) - f.y(a.yM()), len = Math.hypot(dx, dy);
            double nx = dy / len * 5, ny = -dx / len * 5; // the normal on the picture's left of the member
            labels.place(mem.name(), Ink.Labels.at(mx + nx, my + ny, nx >= 0 ? 1 : -1, ny > 0 ? 1 : ny < 0 ? -1 : 0),
                    Ink.Labels.at(mx - nx, my - ny, nx > 0 ? -1 : 1, ny > 0 ? -1 : ny < 0 ? 1 : 0),
                    Ink.Labels.at(mx + nx + dx * 0.2, my + ny + dy * 0.2, nx >= 0 ? 1 : -1, ny > 0 ? 1 : -1));
        }
        g.setFont(g.getFont().deriveFont(Font.PLAIN));
    }

    /** A small arrow head on the member at 60 % of its length, pointing from its start to its end. */
    private static void direction(Graphics2D g, Model m, Ink.Frame f, Member mem, double sym) {
        Node a = m.node(mem.from()), b = m.node(mem.to());
        double x = f.x(a.xM()) + 0.6 * (f.x(b.xM()) - f.x(a.xM())), y = f.y(a.yM()) + 0.6 * (f.y(b.yM()) - f.y(a.yM()));
        double ang = Math.atan2(f.y(b.yM()) - f.y(a.yM()), f.x(b.xM()) - f.x(a.xM()));
        g.setColor(Ink.INK);
        Ink.arrowHead(g, x + Math.cos(ang) * sym * 0.5, y + Math.sin(ang) * sym * 0.5, ang, sym * 0.95);
    }

    /** Chains of dimensions between the distinct node coordinates: x below the model, y to its left. */
    private static void dimensions(Graphics2D g, Model m, Ink.Frame f, double sym, Ink.Labels labels) {
        TreeSet<Double> xs = new TreeSet<>(), ys = new TreeSet<>();
        for (Node n : m.nodes().values()) {
            xs.add(round(n.xM()));
            ys.add(round(n.yM()));
        }
        UnitSystem u = m.units();
        g.setStroke(new BasicStroke(0.5f));
        g.setColor(Ink.INK);
        if (xs.size() >= 2 && xs.size() <= DIMENSION_LIMIT) {
            double line = f.heightPt() - (xs.size() > 2 ? 30 : 14); // at the foot of the picture, below any load
            Double prev = null;
            for (double x : xs) {
                tick(g, f.x(x), line);
                g.draw(new Line2D.Double(f.x(x), line - 3, f.x(x), line + 3));
                if (prev != null) {
                    g.draw(new Line2D.Double(f.x(prev), line, f.x(x), line));
                    String t = Console.fmt(u.fromInternal(x - prev, Dimension.LENGTH));
                    if (Typeface.width(g, t) < f.x(x) - f.x(prev) - 4) {
                        labels.place(t, Ink.Labels.at((f.x(x) + f.x(prev)) / 2, line + 1, 0, 1));
                    }
                }
                prev = x;
            }
            if (xs.size() > 2) {
                double overall = line + 16;
                tick(g, f.x(xs.first()), overall);
                tick(g, f.x(xs.last()), overall);
                g.draw(new Line2D.Double(f.x(xs.first()), overall, f.x(xs.last()), overall));
                labels.place(Console.fmt(u.fromInternal(xs.last() - xs.first(), Dimension.LENGTH)) + " " + u.length().symbol(),
                        Ink.Labels.at((f.x(xs.first()) + f.x(xs.last())) / 2, overall + 1, 0, 1));
            } else {
                labels.place(u.length().symbol(), Ink.Labels.at(f.x(xs.last()) + 4, line, 1, 0));
            }
        }
        if (ys.size() >= 2 && ys.size() <= DIMENSION_LIMIT) {
            double line = 30; // at the left edge, clear of loads on the columns
            Double prev = null;
            for (double y : ys) {
                tick(g, line, f.y(y));
                if (prev != null) {
                    g.draw(new Line2D.Double(line, f.y(prev), line, f.y(y)));
                    String t = Console.fmt(u.fromInternal(y - prev, Dimension.LENGTH));
                    if (f.y(prev) - f.y(y) > 9) labels.place(t, Ink.Labels.at(line - 1, (f.y(y) + f.y(prev)) / 2, -1, 0));
                }
                prev = y;
            }
        }
    }

    private static double round(double v) {
        return Math.round(v * 1e6) / 1e6;
    }

    /** A dimension tick: a short stroke at 45 degrees through the point. */
    private static void tick(Graphics2D g, double x, double y) {
        g.draw(new Line2D.Double(x - 3, y + 3, x + 3, y - 3));
    }

    private static void hinges(Graphics2D g, Model m, Ink.Frame f, Member mem, double sym) {
        Node a = m.node(mem.from()), b = m.node(mem.to());
        double dx = f.x(b.xM()) - f.x(a.xM()), dy = f.y(b.yM()) - f.y(a.yM()), len = Math.hypot(dx, dy);
        double r = sym * 0.28;
        g.setStroke(new BasicStroke(1.1f));
        if (mem.releasedStart()) circle(g, f.x(a.xM()) + dx / len * r * 1.6, f.y(a.yM()) + dy / len * r * 1.6, r);
        if (mem.releasedEnd()) circle(g, f.x(b.xM()) - dx / len * r * 1.6, f.y(b.yM()) - dy / len * r * 1.6, r);
    }

    private static void circle(Graphics2D g, double x, double y, double r) {
        Ellipse2D e = new Ellipse2D.Double(x - r, y - r, 2 * r, 2 * r);
        g.setColor(Ink.PAPER);
        g.fill(e);
        g.setColor(Ink.INK);
        g.draw(e);
    }

    static void support(Graphics2D g, Ink.Frame f, Node n, Support s, double sym) {
        AffineTransform saved = g.getTransform();
        g.translate(f.x(n.xM()), f.y(n.yM()));
        g.rotate(-s.angleRad());
        g.setColor(Ink.INK);
        g.setStroke(new BasicStroke(1.0f));
        if (s.fixUx() && s.fixUy() && s.fixRz()) {
            g.draw(new Line2D.Double(-sym, 0, sym, 0));
            g.setStroke(new BasicStroke(0.6f));
            for (int k = -3; k <= 3; k++) g.draw(new Line2D.Double(k * sym / 3, 0, k * sym / 3 - sym / 3, sym * 0.6));
        } else if (s.fixUy() || s.fixUx()) {
            Path2D wedge = new Path2D.Double();
            wedge.moveTo(0, 0);
            wedge.lineTo(-sym * 0.6, sym);
            wedge.lineTo(sym * 0.6, sym);
            wedge.closePath();
            g.setColor(Ink.PAPER);
            g.fill(wedge);
            g.setColor(Ink.INK);
            g.draw(wedge);
            double base = sym;
            if (!(s.fixUx() && s.fixUy())) {
                for (int k = -1; k <= 1; k += 2) g.draw(new Ellipse2D.Double(k * sym * 0.3 - sym * 0.15, sym * 1.05, sym * 0.3, sym * 0.3));
                base = sym * 1.4;
            }
            g.draw(new Line2D.Double(-sym, base, sym, base));
            g.setStroke(new BasicStroke(0.5f));
            for (int k = -2; k <= 2; k++) g.draw(new Line2D.Double(k * sym / 2.5, base, k * sym / 2.5 - sym / 4, base + sym * 0.35));
            if (s.fixRz()) g.fill(new Rectangle2D.Double(-sym * 0.15, -sym * 0.15, sym * 0.3, sym * 0.3));
        }
        g.setStroke(new BasicStroke(1.0f));
        for (int d = 0; d < 3; d++) {
            if (s.spring(d) <= 0) continue;
            if (d == 2) {
                g.draw(new Arc2D.Double(-sym * 0.7, -sym * 0.7, sym * 1.4, sym * 1.4, 200, 220, Arc2D.OPEN));
                continue;
            }
            Path2D z = new Path2D.Double();
            double len = sym * 1.8, ux = d == 0 ? -1 : 0, uy = d == 0 ? 0 : 1;
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

    private static void drawLoads(Graphics2D g, Model m, Ink.Frame f, LoadCase c, double sym, Ink.Labels labels) {
        UnitSystem u = m.units();
        g.setColor(Ink.INK);
        double len = sym * 2.4;
        for (MemberLoad l : c.memberLoads()) {
            Member mem = m.member(l.member());
            Node a = m.node(mem.from());
            double ex = m.directionOf(mem)[0], ey = m.directionOf(mem)[1];
            g.setStroke(new BasicStroke(0.7f));
            if (l instanceof MemberLoad.Distributed d) {
                double[] dir = direction(d.dir(), ex, ey, Math.signum(d.w1NPerM() + d.w2NPerM()));
                double peak = Math.max(Math.abs(d.w1NPerM()), Math.abs(d.w2NPerM()));
                int n = Math.max(3, (int) Math.round((d.toM() - d.fromM()) * f.scale() / (sym * 1.4)));
                double[] tail = null, mid = null;
                for (int k = 0; k <= n; k++) {
                    double s = d.fromM() + (d.toM() - d.fromM()) * k / n;
                    double w = peak == 0 ? 1 : Math.abs(d.w1NPerM() + (d.w2NPerM() - d.w1NPerM()) * k / n) / peak;
                    double px = f.x(a.xM() + ex * s), py = f.y(a.yM() + ey * s);
                    double tx = px - dir[0] * len * (0.35 + 0.65 * w), ty = py + dir[1] * len * (0.35 + 0.65 * w);
                    if (w > 0.02) Ink.arrow(g, tx, ty, px, py, sym * 0.35);
                    if (tail != null) g.draw(new Line2D.Double(tail[0], tail[1], tx, ty));
                    tail = new double[]{tx, ty};
                    if (k == n / 2) mid = tail;
                }
                if (labels != null && mid != null) {
                    String unit = u.symbol(Dimension.FORCE_PER_LENGTH);
                    // magnitudes: the arrows show the direction (the load table gives the signed values as written)
                    String text = d.w1NPerM() == d.w2NPerM() ? show(u, Math.abs(d.w1NPerM()), Dimension.FORCE_PER_LENGTH) + " " + unit
                            : show(u, Math.abs(d.w1NPerM()), Dimension.FORCE_PER_LENGTH) + " to "
                            + show(u, Math.abs(d.w2NPerM()), Dimension.FORCE_PER_LENGTH) + " " + unit;
                    if (d.perPlan()) text += " on plan";
                    labels.place(text, Ink.Labels.at(mid[0], mid[1] - dir[1] * 2, 0, -dir[1] >= 0 ? 1 : -1),
                            Ink.Labels.at(mid[0], mid[1], 0, dir[1] > 0 ? -1 : 1), Ink.Labels.at(tail[0] + 2, tail[1], 1, 0));
                }
            } else if (l instanceof MemberLoad.Point p) {
                double[] dir = direction(p.dir(), ex, ey, Math.signum(p.forceN()));
                double px = f.x(a.xM() + ex * p.atM()), py = f.y(a.yM() + ey * p.atM());
                g.setStroke(new BasicStroke(1.2f));
                double[] tail = {px - dir[0] * len * 1.3, py + dir[1] * len * 1.3};
                Ink.arrow(g, tail[0], tail[1], px, py, sym * 0.5);
                if (labels != null) valueAtTail(labels, show(u, Math.abs(p.forceN()), Dimension.FORCE) + " " + u.force().symbol(), tail, dir);
            } else if (l instanceof MemberLoad.Couple cp) {
                double px = f.x(a.xM() + ex * cp.atM()), py = f.y(a.yM() + ey * cp.atM());
                couple(g, px, py, sym, cp.momentNm() > 0);
                if (labels != null) labels.place(show(u, Math.abs(cp.momentNm()), Dimension.MOMENT) + " " + u.symbol(Dimension.MOMENT),
                        Ink.Labels.at(px + sym, py - sym, 1, -1), Ink.Labels.at(px - sym, py - sym, -1, -1));
            }
        }
        for (NodeLoad nl : c.nodeLoads()) {
            Node n = m.node(nl.node());
            double px = f.x(n.xM()), py = f.y(n.yM()), mag = Math.hypot(nl.fxN(), nl.fyN());
            g.setStroke(new BasicStroke(1.2f));
            if (mag > 0) {
                double[] dir = {nl.fxN() / mag, nl.fyN() / mag};
                double[] start = place(m, n, dir);
                double sx = px + start[0] * sym, sy = py - start[1] * sym;
                double[] tail, head;
                if (start[2] > 0) { // pushed: the tail at the node, the head out along the force
                    tail = new double[]{sx, sy};
                    head = new double[]{sx + dir[0] * len * 1.3, sy - dir[1] * len * 1.3};
                } else {
                    tail = new double[]{sx - dir[0] * len * 1.3, sy + dir[1] * len * 1.3};
                    head = new double[]{sx, sy};
                }
                Ink.arrow(g, tail[0], tail[1], head[0], head[1], sym * 0.5);
                if (labels != null) {
                    String text = nl.fxN() != 0 && nl.fyN() != 0
                            ? "Fx " + show(u, nl.fxN(), Dimension.FORCE) + ", Fy " + show(u, nl.fyN(), Dimension.FORCE) + " " + u.force().symbol()
                            : show(u, mag, Dimension.FORCE) + " " + u.force().symbol();
                    valueAtTail(labels, text, start[2] > 0 ? head : tail, start[2] > 0 ? new double[]{-dir[0], -dir[1]} : dir);
                }
            }
            g.setStroke(new BasicStroke(0.7f));
            if (nl.mzNm() != 0) {
                couple(g, px, py, sym, nl.mzNm() > 0);
                if (labels != null) labels.place(show(u, Math.abs(nl.mzNm()), Dimension.MOMENT) + " " + u.symbol(Dimension.MOMENT),
                        Ink.Labels.at(px + sym, py - sym, 1, -1), Ink.Labels.at(px - sym, py - sym, -1, -1));
            }
        }
    }

    /** A load value beyond the end of its arrow that points along {@code dir} (model axes, y up). */
    private static void valueAtTail(Ink.Labels labels, String text, double[] end, double[] dir) {
        double dx = -dir[0], dy = dir[1]; // from the arrow into free space, picture axes
        labels.place(text, Ink.Labels.at(end[0] + dx * 2, end[1] + dy * 2, Math.abs(dx) > 0.5 ? Math.signum(dx) : 0,
                        Math.abs(dy) > 0.5 ? Math.signum(dy) : 0),
                Ink.Labels.at(end[0] + 3, end[1], 1, 0), Ink.Labels.at(end[0] - 3, end[1], -1, 0));
    }

    /**
     * Where a joint load's arrow goes so no member hides it: {offset x, offset y (symbol sizes,
     * model axes), 1 when pushed (the arrow starts at the joint)}. The arrow comes into the
     * joint unless a member lies along its shaft; then it pushes out of the joint on the
     * other side, and if a member lies there too, it is set beside the joint.
     */
    static double[] place(Model m, Node n, double[] dir) {
        boolean behind = false, ahead = false;
        for (Member mem : m.members().values()) {
            Node other = mem.from().equals(n.name()) ? m.node(mem.to()) : mem.to().equals(n.name()) ? m.node(mem.from()) : null;
            if (other == null) continue;
            double ux = other.xM() - n.xM(), uy = other.yM() - n.yM(), len = Math.hypot(ux, uy);
            double along = (ux * dir[0] + uy * dir[1]) / len;
            if (along < -Math.cos(Math.toRadians(20))) behind = true;
            if (along > Math.cos(Math.toRadians(20))) ahead = true;
        }
        if (!behind) return new double[]{0, 0, 0};
        if (!ahead) return new double[]{0, 0, 1};
        return new double[]{-dir[1] * 1.2, dir[0] * 1.2, 0};
    }

    static String show(UnitSystem u, double si, Dimension d) {
        return Console.fmt(u.fromInternal(si, d));
    }

    private static void couple(Graphics2D g, double x, double y, double sym, boolean ccw) {
        double r = sym * 0.9;
        g.draw(new Arc2D.Double(x - r, y - r, 2 * r, 2 * r, 30, 240, Arc2D.OPEN));
        double endAng = Math.toRadians(ccw ? 270 : 30);
        double hx = x + r * Math.cos(endAng), hy = y - r * Math.sin(endAng);
        double tang = endAng + (ccw ? Math.PI / 2 : -Math.PI / 2);
        Ink.arrow(g, hx - Math.cos(tang) * 0.1, hy + Math.sin(tang) * 0.1, hx, hy, sym * 0.4);
    }

    /** Direction (x right, y up) in which a load of the given sign acts. */
    private static double[] direction(LoadDirection dir, double ex, double ey, double sign) {
        double s = sign == 0 ? 1 : sign;
        double[] u = dir.unit(ex, ey);
        return new double[]{s * u[0], s * u[1]};
    }

    /** A mechanism: the model in grey, the moving shape dashed with arrows at the nodes (motion scaled to be seen). */
    public static void mechanism(Graphics2D g, Model m, Map<String, double[]> motion, double w, double h) {
        Ink.prepare(g);
        double margin = Math.min(w, h) * 0.16;
        Ink.Frame f = Ink.Frame.fit(m, w, h, margin);
        Ink.members(g, m, f, Ink.GHOST, 1.5f);
        double sym = symbol(w, h);
        for (Support s : m.supports().values()) support(g, f, m.node(s.node()), s, sym);
        double shift = margin * 0.7;
        g.setColor(Ink.INK);
        g.setStroke(new BasicStroke(1.4f, BasicStroke.CAP_ROUND, BasicStroke.JOIN_ROUND, 1f, new float[]{6f, 3f}, 0f));
        for (Member mem : m.members().values()) {
            Node a = m.node(mem.from()), b = m.node(mem.to());
            double[] ua = motion.getOrDefault(a.name(), new double[3]), ub = motion.getOrDefault(b.name(), new double[3]);
            g.draw(new Line2D.Double(f.x(a.xM()) + ua[0] * shift, f.y(a.yM()) - ua[1] * shift,
                    f.x(b.xM()) + ub[0] * shift, f.y(b.yM()) - ub[1] * shift));
        }
        g.setStroke(new BasicStroke(0.9f));
        for (var e : motion.entrySet()) {
            Node n = m.node(e.getKey());
            double[] u = e.getValue();
            if (Math.hypot(u[0], u[1]) > 1e-6) Ink.arrow(g, f.x(n.xM()), f.y(n.yM()), f.x(n.xM()) + u[0] * shift, f.y(n.yM()) - u[1] * shift, 5);
        }
        if (m.members().size() > LABEL_LIMIT) return;
        Ink.Labels labels = new Ink.Labels(g, w, h);
        for (Node n : m.nodes().values()) {
            labels.place(n.name(), Ink.Labels.at(f.x(n.xM()) + 2, f.y(n.yM()) - 2, 1, -1), Ink.Labels.at(f.x(n.xM()) - 2, f.y(n.yM()) - 2, -1, -1));
        }
    }
}
