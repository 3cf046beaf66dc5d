package plumbline.solve;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.TreeSet;

/**
 * The exact envelope of a function along a member over every on/off arrangement of a set
 * of parts: f(x) = base(x) + sum over the parts switched on of part_k(x). Its largest value
 * is the maximum over x of base(x) + sum of max(0, part_k(x)): the parts are split at their
 * own roots, so that on each piece of the merged grid every part has one sign and the sum
 * is one polynomial, whose extremes come from the roots of its derivative. No arrangement
 * is enumerated and nothing is sampled.
 */
public final class Envelope {

    private Envelope() {
    }

    /** The extreme value, where it occurs, and which parts are switched on there. */
    public record Extreme(double value, double xM, List<Integer> partsOn) {
    }

    public static Extreme max(Piecewise base, List<Piecewise> parts) {
        return extreme(base, parts, 1.0);
    }

    public static Extreme min(Piecewise base, List<Piecewise> parts) {
        Extreme e = extreme(base, parts, -1.0);
        return new Extreme(-e.value, e.xM, e.partsOn);
    }

    private static Extreme extreme(Piecewise base, List<Piecewise> parts, double sign) {
        TreeSet<Double> grid = new TreeSet<>();
        for (double x : base.breakpoints()) grid.add(x);
        for (Piecewise p : parts) for (double x : p.breakpoints()) grid.add(x);
        // split at the roots of each part, so each keeps one sign on every piece
        for (Piecewise p : parts) {
            for (int k = 0; k < p.segments(); k++) {
                for (double t : p.piece(k).rootsIn(p.end(k) - p.start(k))) grid.add(p.start(k) + t);
            }
        }
        double[] x = grid.stream().mapToDouble(Double::doubleValue).toArray();
        double best = Double.NEGATIVE_INFINITY, where = 0;
        List<Integer> on = List.of();
        for (int s = 0; s + 1 < x.length; s++) {
            double a = x[s], b = x[s + 1], h = b - a;
            if (!(h > 0)) continue;
            double mid = 0.5 * (a + b);
            Poly sum = pieceAt(base, a, mid).times(sign);
            List<Integer> onHere = new ArrayList<>();
            for (int k = 0; k < parts.size(); k++) {
                Poly q = pieceAt(parts.get(k), a, mid).times(sign);
                if (q.at(0.5 * h) > 0) {
                    sum = sum.plus(q);
                    onHere.add(k);
                }
            }
            double[] roots = sum.derivative().rootsIn(h);
            double[] ts = Arrays.copyOf(roots, roots.length + 2);
            ts[roots.length] = 0;
            ts[roots.length + 1] = h;
            for (double t : ts) {
                double v = sum.at(t);
                if (v > best) {
                    best = v;
                    where = a + t;
                    on = onHere;
                }
            }
        }
        return new Extreme(best, where, List.copyOf(on));
    }

    /** The polynomial of f on the piece holding {@code mid}, written in t = x - a. */
    private static Poly pieceAt(Piecewise f, double a, double mid) {
        int k = 0;
        while (k + 1 < f.segments() && f.end(k) <= mid) k++;
        return f.piece(k).shifted(a - f.start(k));
    }
}
