package plumbline.report;

import java.util.Locale;
import plumbline.model.Model;
import plumbline.model.Quantity;
import plumbline.review.ClaimResult;
import plumbline.units.Dimension;
import plumbline.units.UnitSystem;

/**
 * How the report shows a computed or claimed value: in the model's units, except that a
 * displacement (a length result) is shown in mm on a metric model and in inches on a
 * foot-based one, as checkers read deflections; rotations stay in rad. Coordinates and
 * lengths of the model itself stay in the model's length unit.
 */
final class Shown {

    private Shown() {
    }

    /** True for a model in feet or inches (the length units a file may name are mm, cm, m, in and ft). */
    private static boolean imperial(UnitSystem u) {
        return u.length().symbol().equals("ft") || u.length().symbol().equals("in");
    }

    /** The factor from metres to the unit displacements are shown in: the inch is 0.0254 m exactly (NIST SP 811). */
    private static double displacementPerMetre(UnitSystem u) {
        return imperial(u) ? 1 / 0.0254 : 1000;
    }

    static String unit(UnitSystem u, Dimension d) {
        if (!d.equals(Dimension.LENGTH)) return u.symbol(d);
        return imperial(u) ? "in" : "mm";
    }

    /** The bare number shown for an SI value of dimension d. */
    static double value(UnitSystem u, double si, Dimension d) {
        if (d.equals(Dimension.LENGTH)) return si * displacementPerMetre(u);
        return u.fromInternal(si, d);
    }

    static String withUnit(UnitSystem u, double si, Dimension d) {
        return Console.fmt(value(u, si, d)) + " " + unit(u, d);
    }

    /** A deflection as a span ratio "L/487" of a span of {@code spanM}; "" when there is no deflection. */
    static String spanRatio(double deflectionM, double spanM) {
        double d = Math.abs(deflectionM);
        if (d == 0 || !Double.isFinite(d) || spanM <= 0) return "";
        double n = spanM / d;
        return n >= 1e5 ? "L/>99999" : String.format(Locale.ROOT, "L/%d", Math.round(n));
    }

    /**
     * A computed value too small to mean anything next to the claim's absolute floor (a
     * millionth of it: rounding, such as 1.4e-15 kN where loads are kN) is shown as 0.
     */
    static double denoised(double si, double floorSi) {
        return Math.abs(si) <= 1e-6 * floorSi ? 0 : si;
    }

    /**
     * The claimed, stiffness-method and force-method values of a claim, with its unit, to
     * the same number of decimals (four significant figures of the largest), so equal
     * values print alike; a member's deflection also as a span ratio.
     */
    static String[] pair(Model m, ClaimResult c) {
        UnitSystem u = m.units();
        Dimension d = c.claim().dimension();
        double[] v = {c.claim().valueInternal(), denoised(c.computed(), c.absoluteFloor()), denoised(c.computedForce(), c.absoluteFloor())};
        double largest = 0;
        for (double x : v) if (Double.isFinite(x)) largest = Math.max(largest, Math.abs(value(u, x, d)));
        int decimals = largest == 0 ? 0 : Math.min(9, Console.decimals(largest));
        String[] out = new String[3];
        boolean deflection = c.claim().quantity() == Quantity.DEFLECTION || c.claim().quantity() == Quantity.DEFLECTION_AT;
        double span = deflection && m.member(c.claim().name()) != null ? m.lengthM(m.member(c.claim().name())) : 0;
        for (int i = 0; i < 3; i++) {
            if (!Double.isFinite(v[i])) {
                out[i] = "n/a";
                continue;
            }
            out[i] = Console.fixed(value(u, v[i], d), decimals) + " " + unit(u, d);
            String ratio = span > 0 ? spanRatio(v[i], span) : "";
            if (!ratio.isEmpty()) out[i] += " (" + ratio + ")";
        }
        return out;
    }

    /** True when the claim was judged against its absolute floor rather than its relative tolerance. */
    static boolean byFloor(ClaimResult c) {
        return c.absoluteFloor() > c.tolerance().relative() * Math.abs(c.computed());
    }

    /**
     * The difference of a claim from the computed value: relative ("2.4%", "<0.01%", ">999%"),
     * or in units ("0.012 kN") where the computed value is within the absolute floor and a
     * relative difference would mean nothing (a claimed zero against rounding, say).
     */
    static String difference(UnitSystem u, ClaimResult c) {
        if (byFloor(c)) {
            double diff = Math.abs(c.claim().valueInternal() - denoised(c.computed(), c.absoluteFloor()));
            return withUnit(u, denoised(diff, c.absoluteFloor()), c.claim().dimension()); // rounding shows as 0
        }
        double rel = c.relativeDifference(), tol = c.tolerance().relative();
        if (rel < 1e-4 && tol < 1e-4) {
            // a tolerance finer than the column's 0.01%: say where the difference lies against it
            return rel <= tol ? "<" + tolerancePercent(tol) : String.format(Locale.ROOT, "%.2g%%", rel * 100);
        }
        return percent(rel);
    }

    /** A relative difference as a percentage that fits a narrow column. */
    static String percent(double rel) {
        if (!Double.isFinite(rel)) return "n/a";
        if (rel == 0) return "0%";
        if (rel < 1e-4) return "<0.01%";
        if (rel >= 10) return ">999%";
        return String.format(Locale.ROOT, rel < 0.01 ? "%.2f%%" : "%.1f%%", rel * 100);
    }

    /**
     * A tolerance as written, to four significant figures without trailing zeros ("3%",
     * "0.0001%"): unlike a difference it is never rounded into "<0.01%".
     */
    static String tolerancePercent(double rel) {
        String v = Console.fmt(rel * 100);
        if (v.contains(".") && !v.contains("e")) v = v.replaceAll("0+$", "").replaceAll("\\.$", "");
        return v + "%";
    }

    /** The tolerance a claim was judged by: its relative tolerance, or the absolute floor where that governs. */
    static String tolerance(UnitSystem u, ClaimResult c) {
        if (byFloor(c)) return "\u00b1" + withUnit(u, c.absoluteFloor(), c.claim().dimension()) + " (floor)";
        return tolerancePercent(c.tolerance().relative());
    }

    /** A residual sum of equilibrium: 0 where it is rounding (under 1e-9 of the applied load), else its value. */
    static String sum(UnitSystem u, double si, double relative, Dimension d) {
        return (Math.abs(relative) < 1e-9 ? "0" : Console.fmt(u.fromInternal(si, d))) + " " + u.symbol(d);
    }
}
