package plumbline.report;

import java.awt.BasicStroke;
import java.awt.Font;
import java.awt.Graphics2D;
import java.awt.geom.Ellipse2D;
import java.awt.geom.Line2D;
import java.awt.geom.Path2D;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import plumbline.model.Member;
import plumbline.model.Model;
import plumbline.model.Node;
import plumbline.model.Quantity;
import plumbline.review.LoadSetResult;
import plumbline.solve.MemberSolution;
import plumbline.solve.Piecewise;
import plumbline.solve.Poly;
import plumbline.solve.Solution;
import plumbline.units.Dimension;

/**
 * Force diagrams and deflected shapes of one load set in the house style ({@link Ink}):
 * the structure in light grey, each member's function drawn perpendicular to it, outlined
 * and hatched, member names and each member's largest and smallest values labelled. Moment
 * is drawn on the tension face (positive, sagging, towards the member's local -y); axial
 * and shear force are drawn positive on the local +y side. A pattern-loaded set is drawn as
 * its envelope: the upper and the lower curve over every arrangement, as the tables give.
 */
public final class Diagrams {

    private Diagrams() {
    }

    /** Which function a diagram shows, with the caption the report and the figure files print. */
    public enum Kind {
        AXIAL("Axial force N (+ tension, - compression; constant N drawn along the member, solid in tension, dashed in "
                + "compression; varying N drawn as a hatched shape, + on the local +y side)", Quantity.Function.N, Dimension.FORCE),
        SHEAR("Shear force V (+ drawn on the local +y side)", Quantity.Function.V, Dimension.FORCE),
        MOMENT("Bending moment M (drawn on the tension face; + sagging)", Quantity.Function.M, Dimension.MOMENT),
        DEFLECTION("Deflected shape (exaggerated as stated; undeformed in grey)", Quantity.Function.DEFLECTION, Dimension.LENGTH);

        public final String title;
        final Quantity.Function function;
        public final Dimension dimension;

        Kind(String t, Quantity.Function f, Dimension d) {
            title = t;
            function = f;
            dimension = d;
        }
    }

    /**
     * The height in points of a diagram 499 pt wide: enough for the model's proportions (a
     * frame gets more than a beam) plus room for the ordinates, between 150 and 230.
     */
    public static float height(Model m) {
        double minX = Double.POSITIVE_INFINITY, maxX = Double.NEGATIVE_INFINITY, minY = Double.POSITIVE_INFINITY, maxY = Double.NEGATIVE_INFINITY;
        for (Node n : m.nodes().values()) {
            minX = Math.min(minX, n.xM());
            maxX = Math.max(maxX, n.xM());
            minY = Math.min(minY, n.yM());
            maxY = Math.max(maxY, n.yM());
        }
        double aspect = (maxY - minY) / Math.max(maxX - minX, 1e-9);
        return (float) Math.max(150, Math.min(230, 120 + 200 * aspect));
    }

    /** Samples per member piece for drawing (labels use the exact peaks). */
    private static final int SAMPLES = 24;

    /** The deflected shape of a member is drawn as at least this many straight pieces, however short it is. */
    private static final int DRAWN_SEGMENTS_AT_LEAST = 6;

    /** Straight pieces drawn between the samples of a piece: one for a straight piece, else {@link #SAMPLES}. */
    static int steps(Poly piece) {
        return piece.degree() <= 1 ? 1 : SAMPLES;
    }

    /**
     * Every how many of a deflected shape's {@code n} sample intervals a point is drawn, for a
     * curve {@code lengthPt} points long: about one point apart, at least
     * {@link #DRAWN_SEGMENTS_AT_LEAST} pieces, every sample on a curve of n points or more.
     */
    static int every(int n, double lengthPt) {
        return Math.max(1, Math.min(n / DRAWN_SEGMENTS_AT_LEAST, (int) Math.floor(n / Math.max(lengthPt, 1e-9))));
    }

    private static Piecewise function(MemberSolution ms, Kind k) {
        return switch (k) {
            case AXIAL -> ms.response().axial();
            case SHEAR -> ms.response().shear();
            case MOMENT -> ms.response().moment();
            case DEFLECTION -> ms.response().deflection();
        };
    }

    /** One member's function as points (x from the start in m, value in SI), both sides of each jump. */
    private static List<double[]> samples(Model m, Member mem, LoadSetResult r, Kind kind, boolean upper) {
        List<double[]> out = new ArrayList<>();
        if (!r.patterned()) {
            Piecewise p = function(r.representative().members().get(mem.name()), kind);
            for (int seg = 0; seg < p.segments(); seg++) {
                // a straight piece (no load along it) is drawn exactly by its two ends
                int steps = steps(p.piece(seg));
                for (int i = 0; i <= steps; i++) {
                    double x = p.start(seg) + (p.end(seg) - p.start(seg)) * i / steps;
                    out.add(new double[]{x, p.piece(seg).at(x - p.start(seg))});
                }
            }
            return out;
        }
        double lm = m.lengthM(mem);
        int n = SAMPLES * 4;
        for (int i = 0; i <= n; i++) {
            double x = lm * i / n;
            out.add(new double[]{x, r.valueAt(mem.name(), kind.function, x, i == n, upper)});
        }
        return out;
    }

    /**
     * Each member's curves, sampled once for drawing, the scale and the labels: one curve, or
     * for an envelope the upper and the lower.
     */
    private static Map<String, List<List<double[]>>> curves(Model m, LoadSetResult r, Kind kind) {
        Map<String, List<List<double[]>>> out = new HashMap<>();
        for (Member mem : m.members().values()) {
            List<List<double[]>> c = new ArrayList<>();
            c.add(samples(m, mem, r, kind, true));
            if (r.patterned()) c.add(samples(m, mem, r, kind, false));
            out.put(mem.name(), c);
        }
        return out;
    }

    /** The largest magnitude of the kind over the set: exact peaks of one state, the samples of an envelope. */
    private static double peak(Model m, LoadSetResult r, Kind kind, Map<String, List<List<double[]>>> curves) {
        double peak = 0;
        for (Member mem : m.members().values()) {
            if (!r.patterned()) {
                Piecewise p = function(r.representative().members().get(mem.name()), kind);
                Piecewise.Extreme[] e = p.range(); // {max, min}, found together
                peak = Math.max(peak, Math.max(Math.abs(e[0].value()), Math.abs(e[1].value())));
            } else {
                for (List<double[]> c : curves.get(mem.name())) for (double[] s : c) peak = Math.max(peak, Math.abs(s[1]));
            }
        }
        return peak;
    }

    /**
     * One diagram of a load set, in a picture w by h points. Returns the note of a deflected
     * shape (its drawing scale and its largest value, where), "" for a force diagram; the note
     * is also set at the foot of the picture when {@code noteInside}.
     */
    public static String diagram(Graphics2D g, Model m, LoadSetResult r, Kind kind, double w, double h, boolean noteInside) {
        String note = "";
        Ink.prepare(g);
        double margin = Math.min(36, Math.min(w, h) * 0.24); // room for the ordinates and their labels
        Ink.Frame f = Ink.Frame.fit(m, w, h, margin);
        boolean labelled = m.members().size() <= Sketch.LABEL_LIMIT;
        Ink.Labels labels = new Ink.Labels(g, w, h);
        Ink.members(g, m, f, Ink.GHOST, 1.0f);
        if (kind == Kind.DEFLECTION && !r.patterned()) {
            note = deflected(g, m, r.representative(), f, margin * 0.7, labels);
        } else {
            Map<String, List<List<double[]>>> curves = curves(m, r, kind);
            double peak = peak(m, r, kind, curves);
            // moment on the tension face (positive towards local -y); axial and shear force positive towards local +y
            // (a deflection envelope is drawn where the member goes: positive v towards local +y)
            double k = (peak == 0 ? 0 : margin * 0.7 / peak) * (kind == Kind.MOMENT ? 1 : -1);
            double largest = 0, largestX = 0;
            String largestOn = "";
            for (Member mem : m.members().values()) {
                for (List<double[]> pts : curves.get(mem.name())) {
                    for (double[] p : pts) {
                        if (Math.abs(p[1]) > largest * (1 + 1e-9)) {
                            largest = Math.abs(p[1]);
                            largestX = p[0];
                            largestOn = mem.name();
                        }
                    }
                    if (kind == Kind.AXIAL && !r.patterned() && constant(pts, peak)) {
                        constantAxial(g, m, f, mem, pts.get(0)[1], peak, labels, labelled);
                        continue;
                    }
                    shape(g, m, f, mem, pts, k, labelled);
                }
                if (labelled) peakLabels(g, m, f, mem, r, kind, k, labels, curves.get(mem.name()));
            }
            if (kind == Kind.DEFLECTION && largest > 0) {
                // the envelope of the transverse deflection: its drawing scale and its largest value, where
                double exaggeration = Math.abs(k) / f.scale();
                note = String.format(Locale.ROOT, "envelope drawn x %s; largest %s at member %s at %s %s", scale(exaggeration),
                        Shown.withUnit(m.units(), largest, Dimension.LENGTH), largestOn,
                        Console.fmt(m.units().fromInternal(largestX, Dimension.LENGTH)), m.units().length().symbol());
            }
        }
        if (labelled) memberNames(g, m, f, labels);
        if (noteInside && !note.isEmpty()) labels.place(note, Ink.Labels.at(6, h - 6, 1, -1));
        return note;
    }

    /** A drawing scale to two significant figures ("350", "2.5"). */
    static String scale(double exaggeration) {
        double v = round2(exaggeration);
        return v >= 10 ? Console.fixed(v, 0) : Console.fmt(v);
    }

    private static boolean constant(List<double[]> pts, double peak) {
        double lo = Double.POSITIVE_INFINITY, hi = Double.NEGATIVE_INFINITY;
        for (double[] p : pts) {
            lo = Math.min(lo, p[1]);
            hi = Math.max(hi, p[1]);
        }
        return hi - lo <= 1e-9 * Math.max(peak, 1e-300);
    }

    /** A constant axial force: the member drawn solid in tension or dashed in compression, its value at mid-length. */
    private static void constantAxial(Graphics2D g, Model m, Ink.Frame f, Member mem, double v, double peak, Ink.Labels labels,
                                      boolean labelled) {
        Node a = m.node(mem.from()), b = m.node(mem.to());
        boolean zero = Math.abs(v) <= 1e-9 * peak, compression = v < 0 && !zero;
        g.setColor(Ink.INK);
        g.setStroke(compression ? new BasicStroke(2.0f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_MITER, 1f, new float[]{5f, 2.5f}, 0f)
                : new BasicStroke(2.0f));
        if (!zero) g.draw(new Line2D.Double(f.x(a.xM()), f.y(a.yM()), f.x(b.xM()), f.y(b.yM())));
        if (!labelled) return;
        String text = zero ? "0" : Console.fmt(m.units().fromInternal(Math.abs(v), Dimension.FORCE)) + (compression ? " C" : " T");
        double mx = (f.x(a.xM()) + f.x(b.xM())) / 2, my = (f.y(a.yM()) + f.y(b.yM())) / 2;
        labels.place(text, Ink.Labels.at(mx, my, 0, 0), Ink.Labels.at(mx, my - 3, 0, -1), Ink.Labels.at(mx, my + 3, 0, 1));
    }

    /**
     * The function drawn as a closed shape between the member and its ordinates, hatched; on a
     * model too large for labels, outlined only (hatching thousands of shapes a few points
     * wide would print as grey and make the file slow to write and to open).
     */
    private static void shape(Graphics2D g, Model m, Ink.Frame f, Member mem, List<double[]> pts, double k, boolean hatched) {
        Node a = m.node(mem.from()), b = m.node(mem.to());
        double ex = m.directionOf(mem)[0], ey = m.directionOf(mem)[1];
        Path2D path = new Path2D.Double();
        path.moveTo(f.x(a.xM()), f.y(a.yM()));
        for (double[] p : pts) {
            // positive towards local -y: (ey, -ex) in model axes, (ey, ex) in picture axes
            double px = a.xM() + ex * p[0], py = a.yM() + ey * p[0];
            path.lineTo(f.x(px) + ey * p[1] * k, f.y(py) + ex * p[1] * k);
        }
        path.lineTo(f.x(b.xM()), f.y(b.yM()));
        path.closePath();
        if (hatched) {
            Ink.hatch(g, path, 3.0);
        } else {
            g.setColor(Ink.INK);
            g.setStroke(new BasicStroke(0.5f));
            g.draw(path);
        }
    }

    /** A member's largest and smallest values (exact peaks; for an envelope, of the upper and lower curves). */
    private static void peakLabels(Graphics2D g, Model m, Ink.Frame f, Member mem, LoadSetResult r, Kind kind, double k,
                                   Ink.Labels labels, List<List<double[]>> curves) {
        double[][] ext; // {x, value}
        if (!r.patterned()) {
            Piecewise p = function(r.representative().members().get(mem.name()), kind);
            Piecewise.Extreme[] e = p.range(); // {max, min}, found together
            ext = new double[][]{{e[0].xM(), e[0].value()}, {e[1].xM(), e[1].value()}};
        } else if (kind == Kind.DEFLECTION) {
            double[] hi = {0, Double.NEGATIVE_INFINITY}, lo = {0, Double.POSITIVE_INFINITY};
            for (double[] s : curves.get(0)) if (s[1] > hi[1]) hi = s;
            for (double[] s : curves.get(1)) if (s[1] < lo[1]) lo = s;
            ext = new double[][]{hi, lo};
        } else {
            Quantity max = quantity(kind, Quantity.Extreme.MAX), min = quantity(kind, Quantity.Extreme.MIN);
            LoadSetResult.Peak hi = r.peak(mem.name(), max), lo = r.peak(mem.name(), min);
            ext = new double[][]{{hi.xM(), hi.value()}, {lo.xM(), lo.value()}};
        }
        if (kind == Kind.AXIAL && !r.patterned() && Math.abs(ext[0][1] - ext[1][1]) <= 1e-9 * Math.abs(ext[0][1])) return;
        Node a = m.node(mem.from());
        double ex = m.directionOf(mem)[0], ey = m.directionOf(mem)[1];
        double scale = Math.max(Math.abs(ext[0][1]), Math.abs(ext[1][1]));
        g.setColor(Ink.INK);
        for (int i = 0; i < 2; i++) {
            double v = ext[i][1];
            if (Math.abs(v) <= 1e-9 * scale || i == 1 && v == ext[0][1]) continue;
            double px = a.xM() + ex * ext[i][0], py = a.yM() + ey * ext[i][0];
            double sx = f.x(px) + ey * v * k, sy = f.y(py) + ex * v * k;
            double ox = ey * Math.signum(v * k), oy = ex * Math.signum(v * k); // outwards from the member
            String text = Console.fmt(Shown.value(m.units(), v, kind.dimension));
            if (labels.near(text, sx, sy, 14)) continue; // the same value at a joint, already labelled for the other member
            labels.remember(text, sx, sy);
            labels.place(text, Ink.Labels.at(sx + ox * 2, sy + oy * 2, Math.abs(ox) > 0.3 ? Math.signum(ox) : 0, Math.abs(oy) > 0.3 ? Math.signum(oy) : 0),
                    Ink.Labels.at(sx + 2, sy, 1, oy >= 0 ? 1 : -1), Ink.Labels.at(sx - 2, sy, -1, oy >= 0 ? 1 : -1),
                    Ink.Labels.at(sx, sy - 6, 0, -1), Ink.Labels.at(sx, sy + 6, 0, 1));
        }
    }

    private static Quantity quantity(Kind kind, Quantity.Extreme e) {
        for (Quantity q : Quantity.values()) if (q.function == kind.function && q.extreme == e && q.isPeak()) return q;
        throw new IllegalArgumentException(kind + " " + e);
    }

    private static void memberNames(Graphics2D g, Model m, Ink.Frame f, Ink.Labels labels) {
        g.setFont(g.getFont().deriveFont(Font.ITALIC));
        g.setColor(Ink.INK);
        for (Member mem : m.members().values()) {
            Node a = m.node(mem.from()), b = m.node(mem.to());
            double mx = f.x(a.xM()) + 0.25 * (f.x(b.xM()) - f.x(a.xM())), my = f.y(a.yM()) + 0.25 * (f.y(b.yM()) - f.y(a.yM()));
            labels.place(mem.name(), Ink.Labels.at(mx, my, 0, 0), Ink.Labels.at(mx, my - 2, 0, -1), Ink.Labels.at(mx, my + 2, 0, 1));
        }
        g.setFont(g.getFont().deriveFont(Font.PLAIN));
    }

    /**
     * The deflected shape: transverse deflection plus the axial motion of the chord (linear
     * between the nodes), exaggerated by a stated factor; the largest displacement marked.
     */
    private static String deflected(Graphics2D g, Model m, Solution s, Ink.Frame f, double room, Ink.Labels labels) {
        double largest = 0, atX = 0, atY = 0;
        String where = "";
        List<double[][]> lines = new ArrayList<>();
        for (Member mem : m.members().values()) {
            MemberSolution ms = s.members().get(mem.name());
            Node a = m.node(mem.from()), b = m.node(mem.to());
            double lm = m.lengthM(mem), ex = m.directionOf(mem)[0], ey = m.directionOf(mem)[1];
            Piecewise p = ms.response().deflection();
            double[] ua = s.displacements().get(a.name()), ub = s.displacements().get(b.name());
            double[][] line = new double[61][];
            for (int i = 0; i <= 60; i++) {
                double x = lm * i / 60, t = x / lm, v = p.at(x);
                double along = (ua[0] + (ub[0] - ua[0]) * t) * ex + (ua[1] + (ub[1] - ua[1]) * t) * ey;
                double dx = ex * along - ey * v, dy = ey * along + ex * v;
                line[i] = new double[]{a.xM() + ex * x, a.yM() + ey * x, dx, dy};
                // the length of a displacement of a drawing's scale: no overflow to guard against, so
                // not Math.hypot, which is ten times slower (600,000 points on a 10,000-member frame)
                double d = Math.sqrt(dx * dx + dy * dy);
                if (d > largest * (1 + 1e-9)) {
                    largest = d;
                    atX = line[i][0];
                    atY = line[i][1];
                    where = i == 0 ? "node " + a.name() : i == 60 ? "node " + b.name()
                            : "member " + mem.name() + " at " + Console.fmt(m.units().fromInternal(x, Dimension.LENGTH)) + " " + m.units().length().symbol();
                }
            }
            lines.add(line);
        }
        double exaggeration = largest == 0 ? 0 : room / largest / f.scale();
        double k = exaggeration * f.scale();
        g.setColor(Ink.INK);
        g.setStroke(new BasicStroke(1.3f, BasicStroke.CAP_ROUND, BasicStroke.JOIN_ROUND));
        for (double[][] line : lines) {
            double[][] drawn = new double[line.length][];
            double lengthPt = 0;
            for (int i = 0; i < line.length; i++) {
                drawn[i] = new double[]{f.x(line[i][0]) + line[i][2] * k, f.y(line[i][1]) - line[i][3] * k};
                if (i > 0) {
                    double dx = drawn[i][0] - drawn[i - 1][0], dy = drawn[i][1] - drawn[i - 1][1];
                    lengthPt += Math.sqrt(dx * dx + dy * dy);
                }
            }
            // drawn through every sample a point or less apart along the curve (all 61 on a member
            // of 60 points or more; a few on the short members of a large model, where more would
            // not show and would only slow the file); the largest is found on all of them above
            int n = line.length - 1, every = every(n, lengthPt);
            Path2D path = new Path2D.Double();
            path.moveTo(drawn[0][0], drawn[0][1]);
            for (int i = every; i < n; i += every) path.lineTo(drawn[i][0], drawn[i][1]);
            path.lineTo(drawn[n][0], drawn[n][1]);
            g.draw(path);
        }
        if (largest == 0) return "no displacement";
        double[] d = null;
        for (double[][] line : lines) for (double[] p : line) if (p[0] == atX && p[1] == atY) d = p;
        double mx = f.x(atX) + d[2] * k, my = f.y(atY) - d[3] * k;
        g.fill(new Ellipse2D.Double(mx - 2.2, my - 2.2, 4.4, 4.4));
        String value = Shown.withUnit(m.units(), largest, Dimension.LENGTH);
        labels.place("largest " + value, Ink.Labels.at(mx + 4, my + 4, 1, 1), Ink.Labels.at(mx - 4, my + 4, -1, 1),
                Ink.Labels.at(mx + 4, my - 4, 1, -1), Ink.Labels.at(mx - 4, my - 4, -1, -1));
        return String.format(Locale.ROOT, "displacements drawn x %s; largest %s at %s", scale(exaggeration), value, where);
    }

    /** Two significant figures, for a stated drawing scale. */
    static double round2(double v) {
        if (v <= 0) return v;
        double p = Math.pow(10, Math.floor(Math.log10(v)) - 1);
        return Math.round(v / p) * p;
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
            Piecewise.Extreme[] e = p.range(); // {max, min}, found together
            peak = Math.max(peak, Math.max(Math.abs(e[0].value()), Math.abs(e[1].value())));
        }
        double scale = kind == Kind.MOMENT ? force * m.extentM() : force;
        return peak <= 1e-9 * scale;
    }
}
