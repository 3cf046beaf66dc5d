package plumbline.review;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.function.Function;
import java.util.function.Supplier;
import plumbline.model.Claim;
import plumbline.model.LimitState;
import plumbline.model.LoadCase;
import plumbline.model.MemberLoad;
import plumbline.model.Model;
import plumbline.model.Quantity;
import plumbline.model.Support;
import plumbline.solve.Engine;
import plumbline.solve.EngineResult;
import plumbline.solve.MemberFunctions;
import plumbline.solve.Solution;
import plumbline.solve.Superposition;
import plumbline.units.Dimension;
import plumbline.units.Units;

/**
 * Tries the slips that most often explain a wrong number in a calculation package and keeps
 * those that reproduce the claimed value within the claim's own tolerance, closest first:
 * a unit slip, a sign reversal, swapped components, the value of another support or member,
 * another combination or a single load case, unfactored loads, and variants of the model
 * solved again (self-weight omitted, pattern loading omitted, a load per sloped length
 * instead of per plan, a support pinned instead of fixed or the reverse).
 */
final class Diagnosis {

    /** Variant models are solved again only up to this size (each is a full solve). */
    static final int VARIANT_MEMBER_LIMIT = 2000;

    /**
     * A candidate value and the sentence that would explain the claim by it; the sentence is
     * written only for the few candidates kept (a claim may have hundreds: one per member).
     */
    private record Hypothesis(double candidate, Supplier<String> sentence) {
    }

    /** A unit a number may really have been in: its label and its value in SI. */
    record Slip(String label, double toSi) {
    }

    /** Whether the slip's unit is the unit the claim was written in (then it is no slip). */
    static boolean sameUnit(Slip s, String writtenUnit) {
        return s.label.startsWith(writtenUnit + " ") || s.label.equals(writtenUnit);
    }

    private static final double LBF = Units.LBF_IN_N, FT = Units.FOOT_IN_M, IN = Units.INCH_IN_M, G = 9.80665;

    static List<Slip> slips(Dimension d) {
        if (d.equals(Dimension.FORCE)) {
            return List.of(new Slip("N", 1), new Slip("kN", 1e3), new Slip("MN", 1e6), new Slip("lbf", LBF),
                    new Slip("kip", 1e3 * LBF), new Slip("tonne (mass taken as force, 9.81 kN)", 1e3 * G),
                    new Slip("kg (mass taken as force)", G));
        }
        if (d.equals(Dimension.MOMENT)) {
            return List.of(new Slip("N*m", 1), new Slip("kN*m", 1e3), new Slip("kip*ft", 1e3 * LBF * FT),
                    new Slip("kip*in", 1e3 * LBF * IN), new Slip("lbf*ft", LBF * FT), new Slip("lbf*in", LBF * IN),
                    new Slip("kN*mm", 1.0), new Slip("N*mm", 1e-3), new Slip("kN*cm", 10.0),
                    new Slip("tonne*m (mass taken as force)", 1e3 * G));
        }
        if (d.equals(Dimension.LENGTH)) {
            return List.of(new Slip("mm", 1e-3), new Slip("cm", 1e-2), new Slip("m", 1), new Slip("in", IN), new Slip("ft", FT));
        }
        if (d.equals(Dimension.ANGLE)) return List.of(new Slip("rad", 1), new Slip("deg", Math.PI / 180));
        return List.of();
    }

    private Diagnosis() {
    }

    static String explain(Analysis a, String engine, Claim c, double computed, double tolerance, Engine variantEngine,
                          Map<String, Analysis> variantCache) {
        return explain(a, engine, c, computed, tolerance, variantEngine, variantCache, new HashMap<>());
    }

    /**
     * As above, with {@code readings} shared between the claims of one review: the computed
     * value of a quantity at every member (or support, or node) of a load set, read once and
     * looked up by every claim that asks whether it was read from the wrong line.
     */
    static String explain(Analysis a, String engine, Claim c, double computed, double tolerance, Engine variantEngine,
                          Map<String, Analysis> variantCache, Map<String, Map<String, Double>> readings) {
        List<Hypothesis> hs = new ArrayList<>();
        Model m = a.model();
        String what = describe(c);
        String unitShown = m.units().symbol(c.dimension());
        double shownComputed = m.units().fromInternal(computed, c.dimension());
        // a unit slip: the claimed number is the computed value expressed in another unit
        if (Double.isFinite(c.writtenValue())) {
            for (Slip s : slips(c.dimension())) {
                double inSlip = computed / s.toSi;
                if (sameUnit(s, c.writtenUnit())) continue;
                hs.add(new Hypothesis(inSlip * factorOfWritten(c), () -> String.format(Locale.ROOT,
                        "claimed %s = %s %s equals the computed %s %s expressed in %s (%s): likely unit slip", what,
                        fmt(c.writtenValue()), c.writtenUnit(), fmt(shownComputed), unitShown, s.label, fmt(inSlip))));
            }
        }
        // an input slip scales a linear result as a whole: loads in psf read as kPa (or the
        // reverse) scale every force; E in ksi read as MPa, or MPa as GPa, scales deflections
        double psf = LBF / (FT * FT);
        hs.add(new Hypothesis(computed * 1e3 / psf, () -> String.format(Locale.ROOT, "claimed %s is the computed %s %s times %.4g: "
                + "loads written in kPa where psf were meant (or values mixed between the two)", what, fmt(shownComputed), unitShown, 1e3 / psf)));
        hs.add(new Hypothesis(computed * psf / 1e3, () -> String.format(Locale.ROOT, "claimed %s is the computed %s %s times %.4g: "
                + "loads written in psf where kPa were meant", what, fmt(shownComputed), unitShown, psf / 1e3)));
        if (c.dimension().equals(Dimension.LENGTH) || c.dimension().equals(Dimension.ANGLE)) {
            double ksi = 1e3 * LBF / (IN * IN);
            for (double[] r : new double[][]{{ksi / 1e6, 0}, {1e6 / ksi, 1}, {1e3, 2}, {1e-3, 3}}) {
                String why = switch ((int) r[1]) {
                    case 0 -> "E in the originator's run appears to be in MPa where ksi were meant (deflections scale by 6.895)";
                    case 1 -> "E in the originator's run appears to be in ksi where MPa were meant";
                    case 2 -> "E in the originator's run appears a thousand times too small (written in MPa where GPa were meant)";
                    default -> "E in the originator's run appears a thousand times too large (written in GPa where MPa were meant)";
                };
                hs.add(new Hypothesis(computed * r[0], () -> String.format(Locale.ROOT, "claimed %s is the computed %s %s times %.4g: %s",
                        what, fmt(shownComputed), unitShown, r[0], why)));
            }
        }
        hs.add(new Hypothesis(-computed, () -> String.format(Locale.ROOT,
                "claimed %s has the opposite sign of the computed %s %s: a sign slip or another sign convention "
                        + "(reactions here are forces on the structure; M is positive sagging)", what, fmt(shownComputed), unitShown)));
        LoadSetResult here = a.solutions().get(engine).get(c.combo());
        // swapped components or quantities
        if (here != null) {
            for (Quantity q : Quantity.of(c.item())) {
                // another quantity of the same dimension (abs peaks only restate max and min)
                if (q == c.quantity() || !q.dimension.equals(c.dimension())) continue;
                if (q.extreme == Quantity.Extreme.ABS && q != Quantity.DEFLECTION) continue;
                if (q.isBound() != c.quantity().isBound()) continue; // a bound against a value is no swap
                if (q.place != c.quantity().place) continue; // an end value against a peak is no swap either
                Claim alt = with(c, c.name(), q, c.combo());
                double v = Review.of(here, alt).value();
                hs.add(new Hypothesis(v, () -> String.format(Locale.ROOT, "claimed %s matches the computed %s of the same %s (%s %s): "
                        + "components or quantities swapped", what, q, c.item() == Claim.Kind.MEMBER ? "member" : "node",
                        fmt(m.units().fromInternal(v, c.dimension())), unitShown)));
            }
            // another support or member
            List<String> names = c.item() == Claim.Kind.REACTION ? new ArrayList<>(m.supports().keySet())
                    : c.item() == Claim.Kind.DISPLACEMENT ? new ArrayList<>(m.nodes().keySet()) : new ArrayList<>(m.members().keySet());
            Map<String, Double> atEach = readings.computeIfAbsent(engine + "|" + c.combo() + "|" + c.item() + "|" + c.quantity()
                    + "|" + c.atM(), k -> {
                Map<String, Double> values = new HashMap<>();
                for (String n : names) values.put(n, Review.of(here, with(c, n, c.quantity(), c.combo())).value());
                return values;
            });
            for (String n : names) {
                if (n.equals(c.name())) continue;
                double v = atEach.get(n);
                hs.add(new Hypothesis(v, () -> String.format(Locale.ROOT, "claimed %s is the computed value at %s %s (%s %s): "
                        + "read from the wrong line", what, c.item() == Claim.Kind.MEMBER ? "member" : "node", n,
                        fmt(m.units().fromInternal(v, c.dimension())), unitShown)));
            }
        }
        // another combination or a load case on its own
        for (LoadSet s : a.loadSets()) {
            if (s.name().equals(c.combo())) continue;
            double v = Review.of(a.solutions().get(engine).get(s.name()), with(c, c.name(), c.quantity(), s.name())).value();
            hs.add(new Hypothesis(v, () -> String.format(Locale.ROOT, "claimed %s equals the computed value under %s %s (%s %s): "
                    + "another combination was used", what, s.combination() ? "combination" : "load case", s.name(),
                    fmt(m.units().fromInternal(v, c.dimension())), unitShown)));
        }
        Map<String, Double> factors = a.factors(c.combo());
        if (factors != null && factors.values().stream().anyMatch(f -> f != 1.0)) {
            // unfactored: the combination's cases at factor 1 (service level, as in allowable stress design)
            double v = 0;
            for (String cs : factors.keySet()) {
                v += Review.of(a.solutions().get(engine).get(cs), with(c, c.name(), c.quantity(), cs)).value();
            }
            if (c.item() != Claim.Kind.MEMBER) {
                double total = v;
                hs.add(new Hypothesis(total, () -> String.format(Locale.ROOT, "claimed %s equals the value with the loads of %s "
                        + "unfactored (%s %s): load factors left out, or service-level (ASD) loads against a strength "
                        + "combination", what, c.combo(), fmt(m.units().fromInternal(total, c.dimension())), unitShown)));
            }
        }
        // allowable-stress (service) level against a strength combination: the ASCE 7 ASD
        // combinations, formed here from the solved load cases even when the model does not list them
        LoadSet own = a.loadSets().stream().filter(x -> x.name().equals(c.combo())).findFirst().orElse(null);
        if (own != null && own.origin().startsWith("ASCE/SEI 7-16 section 2.3.1") && !a.model().standardCombinations().contains("asce7-asd")) {
            EngineResult er = a.engines().get(engine);
            for (LoadSet s : StandardCombinations.expand(m, "asce7-asd")) {
                if (s.factors().keySet().stream().anyMatch(k -> m.loadCase(k).pattern())) continue;
                Map<Solution, Double> parts = new LinkedHashMap<>();
                for (var f : s.factors().entrySet()) parts.put(er.cases().get(f.getKey()), f.getValue());
                Solution sol = Superposition.combine(a.engineModel(), s.name(), parts,
                        MemberFunctions.SHARED);
                double v = Review.of(new LoadSetResult.Plain(sol), c).value();
                hs.add(new Hypothesis(v, () -> String.format(Locale.ROOT, "claimed %s equals the allowable-stress combination %s "
                        + "(%s %s): ASD (service-level) loads against a strength combination", what, s.name(),
                        fmt(m.units().fromInternal(v, c.dimension())), unitShown)));
            }
        }
        if (here != null && here.patterned() && c.item() != Claim.Kind.MEMBER && !c.quantity().isBound()) {
            // a plain value under pattern loading is compared with the bound on its sign's side: the other bound
            boolean upper = c.valueInternal() >= 0;
            int k = c.quantity().component;
            double other = c.item() == Claim.Kind.REACTION ? here.reaction(c.name(), k, !upper) : here.displacement(c.name(), k, !upper);
            String side = upper ? "lower" : "upper";
            String advice = c.item() == Claim.Kind.REACTION ? "claim it as " + c.quantity().symbol + (upper ? "_min" : "_max")
                    : "a displacement claim is compared with the bound on its sign's side";
            hs.add(new Hypothesis(other, () -> String.format(Locale.ROOT, "claimed %s equals the %s bound under pattern loading (%s %s): %s",
                    what, side, fmt(m.units().fromInternal(other, c.dimension())), unitShown, advice)));
        }
        if (here != null && here.patterned()) {
            double v = Review.of(new LoadSetResult.Plain(here.representative()), c).value();
            hs.add(new Hypothesis(v, () -> String.format(Locale.ROOT, "claimed %s equals the value with every span loaded (%s %s): "
                    + "pattern loading omitted", what, fmt(m.units().fromInternal(v, c.dimension())), unitShown)));
        }
        if (variantEngine != null && m.members().size() <= VARIANT_MEMBER_LIMIT) variants(a, c, variantEngine, variantCache, hs, what, unitShown);
        // keep those within tolerance of the claim, closest first
        double claimed = c.valueInternal();
        List<Hypothesis> good = new ArrayList<>();
        for (Hypothesis h : hs) {
            if (!Double.isFinite(h.candidate)) continue;
            double scale = Math.max(Math.abs(h.candidate), Math.abs(claimed));
            if (scale == 0) continue;
            if (Math.abs(claimed - h.candidate) <= tolerance * Math.abs(h.candidate) && Math.abs(h.candidate - computed) > tolerance * Math.abs(computed)) {
                good.add(h);
            }
        }
        good.sort(Comparator.comparingDouble(h -> Math.abs(claimed - h.candidate) / Math.max(Math.abs(h.candidate), 1e-300)));
        if (good.isEmpty()) return null;
        List<String> out = new ArrayList<>();
        for (Hypothesis h : good) {
            String sentence = h.sentence.get();
            if (!out.contains(sentence)) out.add(sentence);
        }
        return String.join("; or ", out.subList(0, Math.min(3, out.size())));
    }

    /** SI per unit of the written number, so a slip candidate in the written number becomes SI. */
    static double factorOfWritten(Claim c) {
        return c.writtenValue() == 0 ? 1 : c.valueInternal() / c.writtenValue();
    }

    /** The words of the re-solved variant that takes distributed loads per sloped length instead of per plan. */
    static final String PER_SLOPE = "the load taken per sloped length instead of per plan (the 1/cos factor)";

    private static void variants(Analysis a, Claim c, Engine engine, Map<String, Analysis> cache,
                                 List<Hypothesis> hs, String what, String unitShown) {
        Model m = a.model();
        Map<String, Function<Model, Model>> tries = new LinkedHashMap<>();
        if (m.loadCases().stream().anyMatch(LoadCase::selfWeight)) tries.put("self-weight omitted", Diagnosis::withoutSelfWeight);
        if (hasPerPlan(m)) tries.put(PER_SLOPE, Diagnosis::perSlope);
        for (Support s : m.supports().values()) {
            if (isFixed(s) || isPinned(s)) tries.put(fixityWords(s), x -> withFixity(x, List.of(s)));
        }
        for (var t : tries.entrySet()) {
            Analysis va = cache.computeIfAbsent(t.getKey(), k -> Analysis.variantOf(a, t.getValue().apply(m), List.of(engine)));
            if (!va.stable() || !va.solutions().containsKey(engine.name())) continue;
            LoadSetResult r = va.solutions().get(engine.name()).get(c.combo());
            if (r == null) continue;
            if (LimitState.isEnvelope(c.combo())) continue;
            double v = Review.of(r, c).value();
            hs.add(new Hypothesis(v, () -> String.format(Locale.ROOT, "claimed %s equals the value with %s (%s %s)", what, t.getKey(),
                    fmt(m.units().fromInternal(v, c.dimension())), unitShown)));
        }
    }

    static boolean isFixed(Support s) {
        return s.fixUx() && s.fixUy() && s.fixRz();
    }

    static boolean isPinned(Support s) {
        return s.fixUx() && s.fixUy() && !s.fixRz();
    }

    /** "support B taken as pinned instead of fixed" (or the reverse). */
    static String fixityWords(Support s) {
        return "support " + s.node() + " taken as " + (isFixed(s) ? "pinned instead of fixed" : "fixed instead of pinned");
    }

    /** The model with each of {@code supports} turned from fixed to pinned or from pinned to fixed. */
    static Model withFixity(Model x, List<Support> supports) {
        Map<String, Support> sup = new LinkedHashMap<>(x.supports());
        for (Support s : supports) {
            sup.put(s.node(), new Support(s.node(), true, true, isPinned(s), s.angleRad(), s.springUxNPerM(), s.springUyNPerM(),
                    s.springRzNmPerRad(), s.at()));
        }
        return new Model(x.file(), x.job(), x.units(), x.materials(), x.sections(), x.nodes(), sup, x.members(),
                x.loadCases(), x.combinations(), x.standardCombinations(), x.redundants(), List.of());
    }

    static Model withoutSelfWeight(Model x) {
        return withCases(x, lc -> new LoadCase(lc.name(), lc.type(), false, lc.pattern(),
                lc.memberLoads(), lc.nodeLoads(), lc.temperatures(), lc.settlements(), lc.at()));
    }

    static boolean hasPerPlan(Model m) {
        return m.loadCases().stream().flatMap(lc -> lc.memberLoads().stream())
                .anyMatch(l -> l instanceof MemberLoad.Distributed d && d.perPlan());
    }

    /** The model with every per-plan distributed load taken per sloped length (the 1/cos factor left out). */
    static Model perSlope(Model x) {
        return withCases(x, lc -> new LoadCase(lc.name(), lc.type(), lc.selfWeight(), lc.pattern(), lc.memberLoads().stream()
                .map(l -> l instanceof MemberLoad.Distributed d && d.perPlan()
                        ? new MemberLoad.Distributed(d.member(), d.dir(), false, d.fromM(), d.toM(), d.w1NPerM(), d.w2NPerM(), d.at()) : l)
                .toList(), lc.nodeLoads(), lc.temperatures(), lc.settlements(), lc.at()));
    }

    static Model withCases(Model x, Function<LoadCase, LoadCase> f) {
        return new Model(x.file(), x.job(), x.units(), x.materials(), x.sections(), x.nodes(), x.supports(), x.members(),
                x.loadCases().stream().map(f).toList(), x.combinations(), x.standardCombinations(), x.redundants(), List.of());
    }

    private static Claim with(Claim c, String name, Quantity quantity, String combo) {
        return c.retarget(name, combo, quantity);
    }

    static String describe(Claim c) {
        String where = c.item() == Claim.Kind.MEMBER ? "of " + c.name() : "at " + c.name();
        return c.quantity() + " " + where + " (" + c.combo() + ")";
    }

    static String fmt(double v) {
        double a = Math.abs(v);
        if (a == 0) return "0";
        if (a >= 1e-3 && a < 1e7) return String.format(Locale.ROOT, "%." + Math.max(0, 3 - (int) Math.floor(Math.log10(a))) + "f", v);
        return String.format(Locale.ROOT, "%.3e", v);
    }
}
