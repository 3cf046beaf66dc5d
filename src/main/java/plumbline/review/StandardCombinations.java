package plumbline.review;

import java.math.BigDecimal;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import plumbline.model.Combination;
import plumbline.model.LimitState;
import plumbline.model.LoadCase;
import plumbline.model.Model;

/**
 * Basic load combinations of published standards, expanded over a model's load cases by
 * their type. Cases of the same type act together (their factors add), except wind and
 * seismic cases, each of which is an alternative (one direction at a time). Thermal,
 * settlement and other cases are not part of these basic combinations and are left out
 * (the report says so). Values are as recalled from the standards (from memory):
 *
 * <ul>
 * <li>{@code asce7-strength}: ASCE/SEI 7-16, section 2.3.1 (strength design, LRFD), with L
 *     at 1.0 in combinations 3 to 5;</li>
 * <li>{@code asce7-asd}: ASCE/SEI 7-16, section 2.4.1 (allowable stress design);</li>
 * <li>{@code en1990-6.10}: EN 1990:2002+A1:2005, expression (6.10), Table A1.2(B), with the
 *     recommended gamma_G,sup = 1.35, gamma_G,inf = 1.0, gamma_Q = 1.5 and the psi_0 of
 *     Table A1.1 for buildings (imposed, categories A-B: 0.7; roof, category H: 0; snow,
 *     sites at most 1000 m: 0.5; wind: 0.6), each variable action leading in turn;</li>
 * <li>{@code en1990-6.10ab}: the same with expressions (6.10a) and (6.10b), xi = 0.85.</li>
 * </ul>
 */
public final class StandardCombinations {

    public static final List<String> SETS = Combination.STANDARD_SETS;

    private StandardCombinations() {
    }

    /** One action: the load cases that act together (each at its full value) and the symbol of their type. */
    private record Action(String symbol, List<String> cases) {
    }

    /** The combinations of one standard set formed over the model's load cases, whatever sets the model names. */
    static List<LoadSet> expand(Model m, String set) {
        return expand(new Model(m.file(), m.job(), m.units(), m.materials(), m.sections(), m.nodes(), m.supports(), m.members(),
                m.loadCases(), List.of(), List.of(set), m.redundants(), List.of()));
    }

    public static List<LoadSet> expand(Model model) {
        List<LoadSet> out = new ArrayList<>();
        for (String set : model.standardCombinations()) {
            switch (set) {
                case "asce7-strength" -> out.addAll(asce(model, true));
                case "asce7-asd" -> out.addAll(asce(model, false));
                case "en1990-6.10" -> out.addAll(en1990(model, false));
                case "en1990-6.10ab" -> out.addAll(en1990(model, true));
                default -> throw new IllegalArgumentException("unknown standard combination set " + set);
            }
        }
        return out;
    }

    private static List<String> byType(Model model, String type) {
        List<String> out = new ArrayList<>();
        for (LoadCase c : model.loadCases()) if (type.equals(c.type())) out.add(c.name());
        return out;
    }

    /** Alternatives of one type: wind and seismic cases one at a time, other types all together. */
    private static List<Action> alternatives(Model model, String type, String symbol) {
        List<Action> out = new ArrayList<>();
        List<String> all = byType(model, type);
        if (type.equals("wind") || type.equals("seismic")) {
            for (String c : all) out.add(new Action(all.size() == 1 ? symbol : symbol + "(" + c + ")", List.of(c)));
        } else if (!all.isEmpty()) {
            out.add(new Action(symbol, all));
        }
        return out;
    }

    private static final Action NONE = new Action("", List.of());

    /** Terms: a factor and the alternatives of the action it multiplies (or NONE for absent). */
    private record Term(double factor, List<Action> choices) {
    }

    private static List<Action> orNone(List<Action> a) {
        return a.isEmpty() ? List.of(NONE) : a;
    }

    /**
     * One combination per choice of alternatives (a wind case, a seismic case), named by the
     * set, the clause's label and the symbols of the alternatives chosen where a term has
     * more than one. Every combination begins with the dead load, so none is empty. One whose
     * factors repeat an earlier one's is listed once, under the earlier name (with no
     * accompanying action, 6.10a is 1.35G, the same as "permanent actions only").
     */
    private static void emit(List<LoadSet> out, String prefix, String label, String origin, Term... terms) {
        int[] idx = new int[terms.length];
        while (true) {
            Map<String, Double> f = new LinkedHashMap<>();
            StringBuilder name = new StringBuilder(prefix).append('/').append(label);
            for (int k = 0; k < terms.length; k++) {
                List<Action> choices = terms[k].choices();
                Action a = choices.get(idx[k]);
                for (String c : a.cases()) f.merge(c, terms[k].factor(), Double::sum);
                if (choices.size() > 1) name.append('-').append(a.symbol());
            }
            if (out.stream().noneMatch(x -> x.factors().equals(f))) out.add(new LoadSet(name.toString(), f, origin, true, LimitState.ULS));
            // the next choice, odometer-wise from the last term
            int k = terms.length - 1;
            while (k >= 0 && ++idx[k] == terms[k].choices().size()) idx[k--] = 0;
            if (k < 0) break;
        }
    }

    private static List<LoadSet> asce(Model model, boolean strength) {
        List<LoadSet> out = new ArrayList<>();
        List<Action> d = alternatives(model, "dead", "D"), l = alternatives(model, "live", "L");
        List<Action> w = alternatives(model, "wind", "W"), e = alternatives(model, "seismic", "E");
        List<Action> roof = new ArrayList<>();
        roof.addAll(alternatives(model, "roof-live", "Lr"));
        roof.addAll(alternatives(model, "snow", "S"));
        roof.addAll(alternatives(model, "rain", "R"));
        List<Action> s = alternatives(model, "snow", "S");
        if (d.isEmpty()) return out;
        String set = strength ? "asce7-strength" : "asce7-asd";
        String clause = strength ? "ASCE/SEI 7-16 section 2.3.1, combination " : "ASCE/SEI 7-16 section 2.4.1, combination ";
        if (strength) {
            emit(out, set, "1", clause + "1: 1.4D", new Term(1.4, d));
            if (!l.isEmpty() || !roof.isEmpty()) emit(out, set, "2", clause + "2: 1.2D + 1.6L + 0.5(Lr or S or R)",
                    new Term(1.2, d), new Term(1.6, orNone(l)), new Term(0.5, orNone(roof)));
            if (!roof.isEmpty()) {
                emit(out, set, "3", clause + "3: 1.2D + 1.6(Lr or S or R) + (L or 0.5W)", new Term(1.2, d), new Term(1.6, roof),
                        new Term(1.0, orNone(l)));
                if (!w.isEmpty()) emit(out, set, "3w", clause + "3: 1.2D + 1.6(Lr or S or R) + 0.5W", new Term(1.2, d),
                        new Term(1.6, roof), new Term(0.5, w));
            }
            if (!w.isEmpty()) {
                emit(out, set, "4", clause + "4: 1.2D + 1.0W + L + 0.5(Lr or S or R)", new Term(1.2, d), new Term(1.0, w),
                        new Term(1.0, orNone(l)), new Term(0.5, orNone(roof)));
                emit(out, set, "6", clause + "6: 0.9D + 1.0W", new Term(0.9, d), new Term(1.0, w));
            }
            if (!e.isEmpty()) {
                emit(out, set, "5", clause + "5: 1.2D + 1.0E + L + 0.2S", new Term(1.2, d), new Term(1.0, e),
                        new Term(1.0, orNone(l)), new Term(0.2, orNone(s)));
                emit(out, set, "7", clause + "7: 0.9D + 1.0E", new Term(0.9, d), new Term(1.0, e));
            }
        } else {
            emit(out, set, "1", clause + "1: D", new Term(1.0, d));
            if (!l.isEmpty()) emit(out, set, "2", clause + "2: D + L", new Term(1.0, d), new Term(1.0, l));
            if (!roof.isEmpty()) emit(out, set, "3", clause + "3: D + (Lr or S or R)", new Term(1.0, d), new Term(1.0, roof));
            if (!l.isEmpty() && !roof.isEmpty()) emit(out, set, "4", clause + "4: D + 0.75L + 0.75(Lr or S or R)",
                    new Term(1.0, d), new Term(0.75, l), new Term(0.75, roof));
            if (!w.isEmpty()) {
                emit(out, set, "5", clause + "5: D + 0.6W", new Term(1.0, d), new Term(0.6, w));
                emit(out, set, "6a", clause + "6a: D + 0.75L + 0.75(0.6W) + 0.75(Lr or S or R)", new Term(1.0, d),
                        new Term(0.75, orNone(l)), new Term(0.45, w), new Term(0.75, orNone(roof)));
                emit(out, set, "7", clause + "7: 0.6D + 0.6W", new Term(0.6, d), new Term(0.6, w));
            }
            if (!e.isEmpty()) {
                emit(out, set, "5e", clause + "5: D + 0.7E", new Term(1.0, d), new Term(0.7, e));
                emit(out, set, "6b", clause + "6b: D + 0.75L + 0.75(0.7E) + 0.75S", new Term(1.0, d),
                        new Term(0.75, orNone(l)), new Term(0.525, e), new Term(0.75, orNone(s)));
                emit(out, set, "8", clause + "8: 0.6D + 0.7E", new Term(0.6, d), new Term(0.7, e));
            }
        }
        return out;
    }

    /** Variable actions with their psi_0 (EN 1990 Table A1.1, buildings). */
    private record Variable(String type, String symbol, double psi0) {
    }

    private static final List<Variable> VARIABLES = List.of(new Variable("live", "Q", 0.7), new Variable("roof-live", "Qr", 0.0),
            new Variable("snow", "S", 0.5), new Variable("wind", "W", 0.6), new Variable("rain", "R", 0.0));

    /** A factor as written in a clause: four decimals at most, no trailing zeros (1.35, 1.1475). */
    private static String factor(double f) {
        return new BigDecimal(String.format(Locale.ROOT, "%.4f", f)).stripTrailingZeros().toPlainString();
    }

    private static List<LoadSet> en1990(Model model, boolean ab) {
        List<LoadSet> out = new ArrayList<>();
        List<Action> g = alternatives(model, "dead", "G");
        if (g.isEmpty()) return out;
        String set = ab ? "en1990-6.10ab" : "en1990-6.10";
        String ed = "EN 1990:2002+A1:2005, Table A1.2(B), ";
        List<Variable> present = new ArrayList<>();
        for (Variable v : VARIABLES) if (!alternatives(model, v.type(), v.symbol()).isEmpty()) present.add(v);
        if (ab) {
            List<Term> terms = new ArrayList<>();
            terms.add(new Term(1.35, g));
            for (Variable v : present) if (v.psi0() > 0) terms.add(new Term(1.5 * v.psi0(), alternatives(model, v.type(), v.symbol())));
            emit(out, set, "a", ed + "expression (6.10a): 1.35G + 1.5 psi_0 Q (all variable actions accompanying)",
                    terms.toArray(new Term[0]));
        }
        for (Variable lead : present) {
            List<Term> terms = new ArrayList<>();
            double gSup = ab ? 0.85 * 1.35 : 1.35;
            terms.add(new Term(gSup, g));
            terms.add(new Term(1.5, alternatives(model, lead.type(), lead.symbol())));
            StringBuilder acc = new StringBuilder();
            for (Variable v : present) {
                if (v == lead || v.psi0() == 0) continue;
                terms.add(new Term(1.5 * v.psi0(), alternatives(model, v.type(), v.symbol())));
                acc.append(String.format(Locale.ROOT, " + %.2f%s", 1.5 * v.psi0(), v.symbol()));
            }
            String expr = ab ? "(6.10b)" : "(6.10)";
            emit(out, set, (ab ? "b-" : "") + lead.symbol(), ed + "expression " + expr + ": " + factor(gSup) + "G"
                    + " + 1.5" + lead.symbol() + " (leading)" + acc, terms.toArray(new Term[0]));
            // the permanent action favourable: gamma_G,inf = 1.0 with the leading action alone
            emit(out, set, (ab ? "b-" : "") + lead.symbol() + "-inf", ed + "expression " + expr + ", permanent action favourable: 1.0G + 1.5"
                    + lead.symbol(), new Term(1.0, g), new Term(1.5, alternatives(model, lead.type(), lead.symbol())));
        }
        if (present.isEmpty()) emit(out, set, "G", ed + "permanent actions only: 1.35G", new Term(1.35, g));
        return out;
    }
}
