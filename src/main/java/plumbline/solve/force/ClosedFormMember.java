package plumbline.solve.force;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.TreeSet;
import org.apache.commons.math3.analysis.solvers.LaguerreSolver;
import org.apache.commons.math3.complex.Complex;
import plumbline.solve.MemberActions;
import plumbline.solve.Peaks;
import plumbline.solve.Piecewise;

/**
 * The force method's own internal-force and deflection functions of one member, written in
 * closed form with Macaulay brackets, so that its peaks and its compatibility terms do not
 * come from the code the stiffness method uses ({@code MemberResponse}, and the integration
 * and root finding of {@code Piecewise} and {@code Poly}; only the value record
 * {@code Piecewise.Extreme} that {@code Peaks} is made of is shared): the two methods'
 * agreement then covers the member mechanics too.
 *
 * <p>Signs as format reference (src/site/markdown/formats.md) section 4: N tension positive, M positive when the local -y face is
 * in tension, V = dM/dx, with the forces on the start (fx, fy, m, local, acting on the
 * member) giving N(0+) = -fx, V(0+) = fy, M(0+) = -m. Every function is a sum of terms
 * c &lt;x - a&gt;^k, where &lt;x - a&gt;^k is (x - a)^k for x past a and 0 before it:
 * <ul>
 * <li>a transverse point force Q at a: V += Q &lt;x-a&gt;^0, M += Q &lt;x-a&gt;^1;</li>
 * <li>an axial point force P at a: N -= P &lt;x-a&gt;^0;</li>
 * <li>a counter-clockwise couple C at a: M -= C &lt;x-a&gt;^0;</li>
 * <li>a load intensity c &lt;s-a&gt;^n (a linear load from a to b is q1 &lt;s-a&gt;^0 + t &lt;s-a&gt;^1
 *     - q2 &lt;s-b&gt;^0 - t &lt;s-b&gt;^1, t its slope): V += c &lt;x-a&gt;^(n+1) / (n+1),
 *     M += c &lt;x-a&gt;^(n+2) / ((n+1)(n+2)); axially N -= c &lt;x-a&gt;^(n+1) / (n+1).</li>
 * </ul>
 * The transverse displacement is v = v_start + theta x + W(x) with W'' = M / EI + kappa_T,
 * W(0) = W'(0) = 0 (each M term integrated twice), theta chosen so that v(L) = v_end.
 * Extremes are found at the ends of each smooth piece and at the real roots of the
 * derivative inside it, by Commons Math's Laguerre solver.
 */
final class ClosedFormMember {

    /** One term c &lt;x - a&gt;^k. */
    record Term(double aM, double c, int k) {
        double at(double xM, boolean includeAtA) {
            if (xM < aM || (xM == aM && !includeAtA)) return 0;
            return k == 0 ? c : c * Math.pow(xM - aM, k);
        }
    }

    private final double lengthM;
    private final List<Term> axial = new ArrayList<>(), shear = new ArrayList<>(), moment = new ArrayList<>();

    private ClosedFormMember(double lengthM) {
        this.lengthM = lengthM;
    }

    /**
     * @param fStart  {fx, fy, m} on the member at its start, local axes (N, N, N*m)
     * @param actions the loads along the member
     */
    static ClosedFormMember of(double[] fStart, MemberActions actions) {
        ClosedFormMember f = new ClosedFormMember(actions.lengthM());
        f.axial.add(new Term(0, -fStart[0], 0));
        f.shear.add(new Term(0, fStart[1], 0));
        f.moment.add(new Term(0, -fStart[2], 0));
        f.moment.add(new Term(0, fStart[1], 1));
        for (MemberActions.Point p : actions.points()) {
            f.axial.add(new Term(p.aM(), -p.px(), 0));
            f.shear.add(new Term(p.aM(), p.qy(), 0));
            f.moment.add(new Term(p.aM(), p.qy(), 1));
        }
        for (MemberActions.Couple c : actions.couples()) f.moment.add(new Term(c.aM(), -c.mz(), 0));
        for (MemberActions.Linear l : actions.distributed()) {
            double span = l.bM() - l.aM();
            if (!(span > 0)) continue;
            double tq = (l.q2() - l.q1()) / span, tp = (l.p2() - l.p1()) / span;
            // intensity terms (position, coefficient, power) of the transverse and the axial load
            double[][] q = {{l.aM(), l.q1(), 0}, {l.aM(), tq, 1}, {l.bM(), -l.q2(), 0}, {l.bM(), -tq, 1}};
            double[][] p = {{l.aM(), l.p1(), 0}, {l.aM(), tp, 1}, {l.bM(), -l.p2(), 0}, {l.bM(), -tp, 1}};
            for (double[] t : q) {
                int n = (int) t[2];
                if (t[1] == 0) continue;
                f.shear.add(new Term(t[0], t[1] / (n + 1), n + 1));
                f.moment.add(new Term(t[0], t[1] / ((n + 1) * (n + 2)), n + 2));
            }
            for (double[] t : p) {
                int n = (int) t[2];
                if (t[1] != 0) f.axial.add(new Term(t[0], -t[1] / (n + 1), n + 1));
            }
        }
        return f;
    }

    /** The integral of N(x) over the member (N*m). */
    double axialIntegral() {
        return integral(axial, 1, 0);
    }

    /** The integral of M(x) (alpha + beta x) over the member: the virtual work of a linear unit diagram. */
    double momentIntegral(double alpha, double beta) {
        return integral(moment, alpha, beta);
    }

    /** Sum over terms of c times the integral from a to L of (x - a)^k (alpha + beta x) dx, t = x - a, T = L - a. */
    private double integral(List<Term> terms, double alpha, double beta) {
        double s = 0;
        for (Term t : terms) {
            double span = lengthM - t.aM();
            if (!(span > 0)) continue;
            int k = t.k();
            s += t.c() * ((alpha + beta * t.aM()) * Math.pow(span, k + 1) / (k + 1) + beta * Math.pow(span, k + 2) / (k + 2));
        }
        return s;
    }

    /**
     * The exact peaks of N, V, M and of the transverse displacement.
     *
     * @param eiNm2 bending stiffness (NaN or 0 for a truss member: v is then linear between the ends)
     */
    Peaks peaks(double eiNm2, double thermalCurvaturePerM, double vStartM, double vEndM) {
        List<Term> w = new ArrayList<>();
        if (Double.isFinite(eiNm2) && eiNm2 > 0) {
            for (Term t : moment) {
                int k = t.k();
                w.add(new Term(t.aM(), t.c() / (eiNm2 * (k + 1) * (k + 2)), k + 2));
            }
            if (thermalCurvaturePerM != 0) w.add(new Term(0, thermalCurvaturePerM / 2, 2));
        }
        double wEnd = sum(w, lengthM, false);
        double theta = (vEndM - vStartM - wEnd) / lengthM;
        w.add(new Term(0, vStartM, 0));
        w.add(new Term(0, theta, 1));
        Piecewise.Extreme[] n = extremes(axial), v = extremes(shear), m = extremes(moment), d = extremes(w);
        Piecewise.Extreme defl = Math.abs(d[1].value()) > Math.abs(d[0].value())
                ? new Piecewise.Extreme(Math.abs(d[1].value()), d[1].xM()) : new Piecewise.Extreme(Math.abs(d[0].value()), d[0].xM());
        return new Peaks(n[0], n[1], v[0], v[1], m[0], m[1], defl);
    }

    private static double sum(List<Term> terms, double xM, boolean includeAtX) {
        double s = 0;
        for (Term t : terms) s += t.at(xM, includeAtX);
        return s;
    }

    /** {max, min} of a sum of terms over [0, L]: one-sided values at every jump, and stationary points between. */
    private Piecewise.Extreme[] extremes(List<Term> terms) {
        TreeSet<Double> cuts = new TreeSet<>();
        cuts.add(0.0);
        cuts.add(lengthM);
        for (Term t : terms) if (t.aM() > 0 && t.aM() < lengthM) cuts.add(t.aM());
        double[] x = cuts.stream().mapToDouble(Double::doubleValue).toArray();
        double maxV = Double.NEGATIVE_INFINITY, maxX = 0, minV = Double.POSITIVE_INFINITY, minX = 0;
        for (int s = 0; s + 1 < x.length; s++) {
            List<Double> candidates = new ArrayList<>();
            candidates.add(x[s]);
            candidates.addAll(stationaryPoints(terms, x[s], x[s + 1]));
            candidates.add(x[s + 1]);
            for (int i = 0; i < candidates.size(); i++) {
                double at = candidates.get(i);
                // just after the start of the piece, just before its end
                double val = sum(terms, at, i < candidates.size() - 1);
                if (val > maxV) {
                    maxV = val;
                    maxX = at;
                }
                if (val < minV) {
                    minV = val;
                    minX = at;
                }
            }
        }
        return new Piecewise.Extreme[]{new Piecewise.Extreme(maxV, maxX), new Piecewise.Extreme(minV, minX)};
    }

    /** Roots of the derivative inside (x0, x1), from the terms active there expanded about x0. */
    private static List<Double> stationaryPoints(List<Term> terms, double x0, double x1) {
        int degree = 0;
        for (Term t : terms) if (t.aM() <= x0) degree = Math.max(degree, t.k() - 1);
        double[] c = new double[Math.max(degree, 0) + 1]; // derivative in powers of (x - x0)
        for (Term t : terms) {
            if (t.aM() > x0 || t.k() == 0) continue;
            // d/dx c (x - a)^k = c k (u + h)^(k-1), u = x - x0, h = x0 - a: binomial expansion
            int p = t.k() - 1;
            double h = x0 - t.aM();
            double binom = 1;
            for (int j = 0; j <= p; j++) {
                c[j] += t.c() * t.k() * binom * Math.pow(h, p - j);
                binom = binom * (p - j) / (j + 1);
            }
        }
        int top = c.length - 1;
        while (top > 0 && c[top] == 0) top--;
        List<Double> out = new ArrayList<>();
        if (top == 0) return out;
        double span = x1 - x0;
        if (top == 1) {
            add(out, -c[0] / c[1], span, x0);
            return out;
        }
        for (double u : realRoots(Arrays.copyOf(c, top + 1), span)) add(out, u, span, x0);
        return out;
    }

    /**
     * The real parts of the roots of the polynomial with these coefficients (constant first,
     * degree 2 or more), by Laguerre's method; should it not converge, the roots found by
     * bracketing on [0, span] ({@link #bracketedRoots}). Roots outside the span are harmless:
     * the caller keeps those inside.
     */
    static double[] realRoots(double[] coefficients, double span) {
        try {
            Complex[] roots = new LaguerreSolver().solveAllComplex(coefficients, span / 2);
            double[] out = new double[roots.length];
            for (int i = 0; i < roots.length; i++) out[i] = roots[i].getReal();
            return out;
        } catch (RuntimeException notConverged) {
            return bracketedRoots(coefficients, span);
        }
    }

    /** Cells of the bracketing grid: roots closer together than span / 256 may merge (a safe, slower route). */
    static final int BRACKETS = 256;

    /** Roots of the polynomial in [0, span]: sign changes on a fine grid, each bisected to rounding. */
    static double[] bracketedRoots(double[] coefficients, double span) {
        List<Double> out = new ArrayList<>();
        for (int i = 0; i < BRACKETS; i++) {
            double a = span * i / BRACKETS, b = span * (i + 1) / BRACKETS;
            double fa = horner(coefficients, a), fb = horner(coefficients, b);
            if (fa == 0) {
                out.add(a);
                continue;
            }
            if (fa * fb > 0 || fb == 0) continue;
            for (int it = 0; it < 100; it++) {
                double mid = 0.5 * (a + b), fm = horner(coefficients, mid);
                if (fa * fm <= 0) b = mid;
                else {
                    a = mid;
                    fa = fm;
                }
            }
            out.add(0.5 * (a + b));
        }
        if (horner(coefficients, span) == 0) out.add(span);
        return out.stream().mapToDouble(Double::doubleValue).toArray();
    }

    private static void add(List<Double> out, double u, double span, double x0) {
        if (u > 0 && u < span) out.add(x0 + u);
    }

    private static double horner(double[] c, double u) {
        double s = 0;
        for (int i = c.length - 1; i >= 0; i--) s = s * u + c[i];
        return s;
    }
}
