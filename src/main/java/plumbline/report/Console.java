package plumbline.report;

import java.math.BigDecimal;
import java.math.RoundingMode;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import plumbline.model.Claim;
import plumbline.model.Model;
import plumbline.model.Quantity;
import plumbline.review.Agreement;
import plumbline.review.Analysis;
import plumbline.review.ClaimResult;
import plumbline.review.LoadSetResult;
import plumbline.review.Review;
import plumbline.review.Verdict;
import plumbline.solve.Equilibrium;
import plumbline.statics.ClaimedEquilibrium;
import plumbline.statics.Determinacy;
import plumbline.units.Dimension;
import plumbline.units.UnitSystem;

/** The console summary of a check, lines of at most 80 characters. */
public final class Console {

    public static final int WIDTH = 80;

    private Console() {
    }

    public static String determinacy(Determinacy.Result d) {
        StringBuilder sb = new StringBuilder();
        sb.append("Statics: ").append(d.classification().word);
        if (d.classification() == Determinacy.Classification.INDETERMINATE) sb.append(", degree ").append(d.degree());
        if (d.mechanisms() > 0) sb.append(", ").append(d.mechanisms()).append(d.mechanisms() == 1 ? " mechanism" : " mechanisms");
        if (d.classification() == Determinacy.Classification.UNSTABLE && d.degree() > 0) {
            sb.append(" (and ").append(d.degree()).append(" redundant").append(d.degree() == 1 ? "" : "s").append(")");
        }
        sb.append('\n');
        sb.append(wrap("  equations " + d.equations() + ", unknowns " + d.unknowns() + ", rank " + d.rank()
                + "; counting formula gives " + d.countingDegree(), "    "));
        if (!d.remark().isEmpty()) sb.append(wrap("  " + d.remark(), "    "));
        int k = 1;
        for (Determinacy.Mechanism m : d.shapes()) {
            sb.append(wrap("  mechanism " + (k++) + ": " + m.description(), "    "));
            if (k > 10) {
                sb.append("  (" + (d.shapes().size() - 10) + " more mechanisms not listed)\n");
                break;
            }
        }
        return sb.toString();
    }

    public static String summary(Review r, String engines, Double agreement) {
        Model m = r.analysis().model();
        UnitSystem u = m.units();
        StringBuilder sb = new StringBuilder();
        sb.append("Plumbline ").append(ResultsTree.TOOL_VERSION).append(" independent check\n");
        if (r.verdict() == Verdict.ENGINES_DISAGREE || r.verdict() == Verdict.UNBALANCED) {
            // a failed safeguard is said before anything else: no number below can be vouched for
            sb.append(wrap("VERDICT " + r.verdict().word.toUpperCase(Locale.ROOT) + ": " + r.verdict().meaning(), "  "));
        }
        if (!m.job().title().isEmpty()) sb.append(wrap("Job: " + m.job().title(), "  "));
        sb.append(wrap("Model: " + m.file() + " (" + m.nodes().size() + " nodes, " + m.members().size() + " members, "
                + m.loadCases().size() + " load cases, " + m.combinations().size() + (m.combinations().size() == 1 ? " combination)" : " combinations)"), "  "));
        sb.append(determinacy(r.analysis().determinacy()));
        r.analysis().engines().forEach((k, v) -> {
            if (v.declined()) sb.append(wrap(k + " method not run: " + v.instability(), "  "));
            else if (!v.stable()) sb.append(wrap(k + " method: " + v.instability(), "  "));
        });
        if (r.analysis().stable()) {
            var g = r.safeguards();
            sb.append(wrap(String.format(Locale.ROOT, "Solved by: %s; equilibrium residual at most %.1e of the load (limit %.0e)%s",
                    engines, g.worstResidual(), Equilibrium.TOLERANCE,
                    g.balanced() ? "" : ": OUT OF BALANCE in " + g.worstResidualAt()), "  "));
            if (g.agreement() != null) {
                sb.append(wrap(String.format(Locale.ROOT, "Engines %s to %.1e (largest relative difference; limit %.0e)",
                        g.enginesAgree() ? "agree" : "DISAGREE", g.agreement(), Agreement.TOLERANCE), "  "));
            }
        }
        if (!r.equilibrium().isEmpty()) sb.append("Equilibrium of claimed reactions:\n");
        for (ClaimedEquilibrium e : r.equilibrium()) {
            String line = "  " + e.combo() + ": ";
            if (!e.checkedFx() && !e.checkedFy() && !e.checkedMoment()) line += e.note();
            else {
                line += (e.balanced() ? "balanced" : "OUT OF BALANCE");
                // each sum with its own unit: forces in the force unit, the moment in force times length
                String f = " " + u.force().symbol(), mo = " " + u.symbol(Dimension.MOMENT);
                if (e.checkedFx()) line += "; sum Fx " + fmt(u.fromInternal(e.sumFxN(), Dimension.FORCE)) + f;
                if (e.checkedFy()) line += "; sum Fy " + fmt(u.fromInternal(e.sumFyN(), Dimension.FORCE)) + f;
                if (e.checkedMoment()) line += "; sum M about " + e.referenceNode() + " "
                        + fmt(u.fromInternal(e.sumMomentNm(), Dimension.MOMENT)) + mo;
                if (!e.note().isEmpty()) line += "; " + e.note();
            }
            sb.append(wrap(line, "    "));
        }
        int given = m.claims().stream().mapToInt(cs -> cs.claims().size()).sum();
        if (!r.analysis().stable() && given > 0) {
            sb.append(wrap("Claims: none of the " + given + " claims can be compared while the model is unstable", "  "));
        }
        if (!r.claims().isEmpty()) {
            sb.append("Claims (claimed / computed, model units):\n");
            for (ClaimResult c : r.claims()) {
                Claim cl = c.claim();
                String flag = c.status() == ClaimResult.Status.OK ? "  ok  " : c.status() == ClaimResult.Status.MARGINAL ? "? MARG" : "X MISM";
                String unit = u.symbol(cl.dimension());
                String line = String.format(Locale.ROOT, "%s %s %s %s %s: %s / %s %s (%s, tol %s)", flag, cl.item().word,
                        cl.name(), quantityLabel(cl, u), cl.combo(), fmt(u.fromInternal(cl.valueInternal(), cl.dimension())),
                        fmt(u.fromInternal(c.computed(), cl.dimension())), unit,
                        c.status() == ClaimResult.Status.OK && c.relativeDifference() > c.tolerance().relative()
                                ? "under the absolute floor" : pct(c.relativeDifference()),
                        Shown.tolerancePercent(c.tolerance().relative()));
                String written = asWritten(cl, u);
                sb.append(wrap(line + (written.isEmpty() ? "" : " [" + written + "]"), "         "));
                if (c.explanation() > 0) {
                    sb.append(wrap("         likely: E" + c.explanation() + " below" + (c.ownDiagnosis() == null ? ""
                            : "; this claim alone: " + c.ownDiagnosis()), "         "));
                } else if (c.ownDiagnosis() != null) {
                    sb.append(wrap("         likely: " + c.ownDiagnosis(), "         "));
                } else if (c.status() != ClaimResult.Status.OK) {
                    sb.append(wrap("         not explained: no change tried reproduces this value", "         "));
                }
            }
            long ok = r.claims().stream().filter(c -> c.status() == ClaimResult.Status.OK).count();
            long mg = r.claims().stream().filter(c -> c.status() == ClaimResult.Status.MARGINAL).count();
            long mm = r.claims().stream().filter(c -> c.status() == ClaimResult.Status.MISMATCH).count();
            sb.append(String.format(Locale.ROOT, "Claims: %d ok, %d marginal, %d mismatch%n", ok, mg, mm));
            if (mg + mm > 0) sb.append(explanations(r));
        }
        if (!r.warnings().isEmpty()) {
            sb.append("Plausibility warnings:\n");
            int k = 0;
            for (var w : r.warnings()) {
                if (k++ == 8) {
                    sb.append("  (" + (r.warnings().size() - 8) + " more in the JSON and the report)\n");
                    break;
                }
                sb.append(wrap("  " + w.subject() + ": " + w.message(), "    "));
            }
        }
        sb.append("Verdict: ").append(r.verdict().word.toUpperCase(Locale.ROOT)).append('\n');
        sb.append(wrap("  " + r.verdict().meaning(), "  "));
        sb.append(wrap("Caution: an independent check of a simplified linear-elastic model; it does not replace the "
                + "engineer of record, licensed review or local codes.", "  "));
        return sb.toString();
    }

    /** Load sets listed in full by {@code solve}; beyond this the JSON has them. */
    static final int SETS_LISTED = 8;
    /** Members listed one by one by {@code solve}; beyond this only the largest values. */
    static final int MEMBERS_LISTED = 12;

    /** The results of {@code solve} in 80 columns: reactions and member peaks per load set. */
    public static String results(Analysis a) {
        if (!a.stable() || a.primaryEngine() == null) return "";
        Model m = a.model();
        UnitSystem u = m.units();
        String f = u.force().symbol(), mo = u.symbol(Dimension.MOMENT), len = u.length().symbol();
        StringBuilder sb = new StringBuilder();
        var sols = a.solutions().get(a.primaryEngine());
        int k = 0;
        for (var set : a.loadSets()) {
            if (k++ == SETS_LISTED) {
                sb.append("  (" + (a.loadSets().size() - SETS_LISTED) + " more load sets in the JSON, --json FILE)\n");
                break;
            }
            var res = sols.get(set.name());
            sb.append(wrap("Load set " + set.name() + (res.patterned() ? " (pattern envelope)" : "") + ": " + set.origin(), "    "));
            for (String node : m.supports().keySet()) {
                String line = String.format(Locale.ROOT, "  reaction %-6s Fx %10s  Fy %10s  Mz %10s  (%s, %s)", node,
                        fmt(u.fromInternal(res.reaction(node, 0, true), Dimension.FORCE)),
                        fmt(u.fromInternal(res.reaction(node, 1, true), Dimension.FORCE)),
                        fmt(u.fromInternal(res.reaction(node, 2, true), Dimension.MOMENT)), f, mo);
                sb.append(wrap(line, "    "));
            }
            if (m.members().size() <= MEMBERS_LISTED) {
                for (String mem : m.members().keySet()) {
                    String line = String.format(Locale.ROOT, "  member %-6s N %s..%s  V %s..%s  M %s..%s  defl %s", mem,
                            peak(u, res, mem, Quantity.N_MIN), peak(u, res, mem, Quantity.N_MAX), peak(u, res, mem, Quantity.V_MIN),
                            peak(u, res, mem, Quantity.V_MAX), peak(u, res, mem, Quantity.M_MIN), peak(u, res, mem, Quantity.M_MAX),
                            peak(u, res, mem, Quantity.DEFLECTION));
                    sb.append(wrap(line, "    "));
                }
            } else {
                String worstM = null, worstD = null;
                double bm = -1, bd = -1;
                for (String mem : m.members().keySet()) {
                    double vm = res.peak(mem, Quantity.M_ABS).value(), vd = res.peak(mem, Quantity.DEFLECTION).value();
                    if (vm > bm) {
                        bm = vm;
                        worstM = mem;
                    }
                    if (vd > bd) {
                        bd = vd;
                        worstD = mem;
                    }
                }
                sb.append(wrap(String.format(Locale.ROOT, "  largest |M| %s %s in %s; largest deflection %s %s in %s",
                        fmt(u.fromInternal(bm, Dimension.MOMENT)), mo, worstM,
                        fmt(u.fromInternal(bd, Dimension.LENGTH)), len, worstD), "    "));
            }
        }
        sb.append("  (N, V in " + f + "; M in " + mo + "; deflection in " + len + ")\n");
        return sb.toString();
    }

    private static String peak(UnitSystem u, LoadSetResult r, String member, Quantity q) {
        return fmt(u.fromInternal(r.peak(member, q).value(), q.dimension));
    }

    static String pct(double rel) {
        if (!Double.isFinite(rel)) return "n/a";
        return String.format(Locale.ROOT, rel < 0.001 ? "%.2g%%" : "%.1f%%", rel * 100);
    }

    /** Four significant digits, no exponent for ordinary engineering magnitudes. */
    public static String fmt(double v) {
        if (!Double.isFinite(v)) return "n/a";
        double a = Math.abs(v);
        if (a == 0) return "0";
        if (a >= 1e-6 && a < 1e9) return fixed(v, decimals(a));
        return String.format(Locale.ROOT, "%.3e", v);
    }

    /**
     * The decimals that give a magnitude four significant figures, counted after rounding:
     * 9.99996 rounds up to 10.000, so it gets one decimal fewer ("10.00", as 10.0 prints).
     */
    static int decimals(double magnitude) {
        int digits = Math.max(0, 3 - (int) Math.floor(Math.log10(magnitude)));
        boolean roundsUp = digits > 0 && Math.abs(Double.parseDouble(fixed(magnitude, digits))) >= Math.pow(10, 4 - digits);
        return roundsUp ? digits - 1 : digits;
    }

    /**
     * A value with a fixed number of decimals: the digits {@code String.format("%.nf")} prints
     * (the shortest decimal that reads back as the value, Double.toString's, rounded half up to
     * the decimals), formed here without a formatter, a few times quicker (a large model's
     * console and report print thousands). A decimal number has no negative zero, so a value
     * that rounds to zero prints unsigned, never "-0.00".
     */
    static String fixed(double v, int decimals) {
        return new BigDecimal(Double.toString(v)).setScale(decimals, RoundingMode.HALF_UP).toPlainString();
    }


    /** The claimed quantity, with its position along the member for a value at a position ("M at 2.50 m"). */
    public static String quantityLabel(Claim c, UnitSystem u) {
        if (Double.isNaN(c.atM())) return c.quantity().symbol;
        return c.quantity().symbol + " at " + fmt(u.fromInternal(c.atM(), Dimension.LENGTH)) + " " + u.length().symbol();
    }

    /**
     * The claim as its source wrote it, where that differs from how it is compared: another
     * unit ("as written: 6.744 kip") or another sign convention ("as written: M_max 30 kN*m,
     * moments hogging-positive"); "" when it was written as compared.
     */
    public static String asWritten(Claim c, UnitSystem u) {
        boolean otherUnit = !c.writtenUnit().equals(u.symbol(c.dimension()));
        if (c.convention().isEmpty() && !otherUnit) return "";
        if (c.writtenUnit().startsWith("L/")) return "as written: " + c.writtenUnit(); // a span ratio
        if (!Double.isFinite(c.writtenValue())) return c.convention().isEmpty() ? "" : "as written: " + c.convention();
        String v = fmt(c.writtenValue()) + " " + c.writtenUnit();
        return c.convention().isEmpty() ? "as written: " + v : "as written: " + c.writtenQuantity() + " " + v + ", " + c.convention();
    }

    /**
     * The explanations of the claim set, best first, each with the claims that support it;
     * or, when none was found, a plain statement that no single change explains the set.
     */
    static String explanations(Review r) {
        StringBuilder sb = new StringBuilder();
        if (r.explanations().isEmpty()) {
            boolean eachHasOne = r.claims().stream().allMatch(c -> c.status() == ClaimResult.Status.OK || c.ownDiagnosis() != null);
            sb.append(wrap("Explanations of the set: no one change tried brings two or more flagged claims, or every claim, "
                    + "within tolerance" + (eachHasOne ? "; see each flagged claim's likely cause above" : ""), "  "));
            return sb.toString();
        }
        sb.append(wrap("Explanations (each one change, scored on all " + r.claims().size() + " claims):", "  "));
        for (int i = 0; i < r.explanations().size(); i++) {
            var e = r.explanations().get(i);
            sb.append(wrap("  E" + (i + 1) + " " + e.sentence() + " (" + e.support() + ")", "     "));
        }
        return sb.toString();
    }

    /** Wraps a line at word boundaries to {@link #WIDTH}, continuation lines indented. */
    public static String wrap(String text, String indent) {
        List<String> lines = new ArrayList<>();
        String rest = text;
        boolean first = true;
        while (true) {
            String prefix = first ? "" : indent;
            int room = WIDTH - prefix.length();
            if (rest.length() <= room) {
                lines.add(prefix + rest);
                break;
            }
            int cut = rest.lastIndexOf(' ', room);
            if (cut <= 0) cut = room;
            lines.add(prefix + rest.substring(0, cut));
            rest = rest.substring(cut).trim();
            first = false;
        }
        return String.join("\n", lines) + "\n";
    }
}
