package plumbline.units;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * The unit symbols Plumbline reads and the parser for unit and quantity strings.
 *
 * <p>Factors to SI are exact by definition (1 in = 0.0254 m, 1 lbf = 0.45359237 kg x
 * 9.80665 m/s2) or derived from those, as listed in NIST Special Publication 811 (2008),
 * Appendix B.
 *
 * <p>Grammar: a product of symbols joined by {@code *}, {@code .} or {@code -}, each with an
 * optional power ({@code m^2}, {@code mm4}); one {@code /} puts everything after it in the
 * denominator ({@code kN*m/rad}, {@code kN/m2}); a leading {@code /} means one over the
 * rest ({@code /degC}).
 */
public final class Units {

    /** Exactly 0.45359237 kg x 9.80665 m/s2 (NIST SP 811, B.8: 4.448222 N). */
    public static final double LBF_IN_N = 0.45359237 * 9.80665;
    public static final double INCH_IN_M = 0.0254;
    public static final double FOOT_IN_M = 0.3048;

    private static final Map<String, Unit> SYMBOLS = new LinkedHashMap<>();

    static {
        Dimension f = Dimension.FORCE, l = Dimension.LENGTH, s = Dimension.STRESS;
        put("N", f, 1.0);
        put("kN", f, 1e3);
        put("MN", f, 1e6);
        put("lbf", f, LBF_IN_N);
        put("lb", f, LBF_IN_N);
        put("lbs", f, LBF_IN_N);
        put("kip", f, 1e3 * LBF_IN_N);
        put("kips", f, 1e3 * LBF_IN_N);
        put("daN", f, 10.0);
        put("kgf", f, 9.80665); // kilogram-force: standard gravity, exact (NIST SP 811, B.8)
        put("tf", f, 9806.65); // tonne-force (metric ton-force), 1000 kgf
        put("mm", l, 1e-3);
        put("cm", l, 1e-2);
        put("m", l, 1.0);
        put("in", l, INCH_IN_M);
        put("ft", l, FOOT_IN_M);
        put("Pa", s, 1.0);
        put("kPa", s, 1e3);
        put("MPa", s, 1e6);
        put("GPa", s, 1e9);
        put("psi", s, LBF_IN_N / (INCH_IN_M * INCH_IN_M));
        put("ksi", s, 1e3 * LBF_IN_N / (INCH_IN_M * INCH_IN_M));
        put("psf", s, LBF_IN_N / (FOOT_IN_M * FOOT_IN_M));
        put("ksf", s, 1e3 * LBF_IN_N / (FOOT_IN_M * FOOT_IN_M));
        put("pcf", Dimension.WEIGHT_DENSITY, LBF_IN_N / Math.pow(FOOT_IN_M, 3));
        put("plf", Dimension.FORCE_PER_LENGTH, LBF_IN_N / FOOT_IN_M);
        put("klf", Dimension.FORCE_PER_LENGTH, 1e3 * LBF_IN_N / FOOT_IN_M);
        put("rad", Dimension.ANGLE, 1.0);
        put("deg", Dimension.ANGLE, Math.PI / 180.0);
        put("degC", Dimension.TEMPERATURE, 1.0);
        put("K", Dimension.TEMPERATURE, 1.0);
        put("degF", Dimension.TEMPERATURE, 5.0 / 9.0);
    }

    /**
     * Whole words the trade writes for a product of symbols, read as that product: a moment
     * written without its operator (kNm, Nmm, kNcm), and kip shortened to k next to a length
     * (k-ft, ft-k, k-in; "k" alone is no unit, and never kelvin).
     */
    private static final Map<String, String> TRADE_WORDS = Map.of(
            "kNm", "kN*m", "Nm", "N*m", "Nmm", "N*mm", "kNmm", "kN*mm", "kNcm", "kN*cm", "MNm", "MN*m");

    private static void put(String symbol, Dimension d, double factor) {
        SYMBOLS.put(symbol, new Unit(symbol, d, factor));
    }

    private Units() {
    }

    public static Iterable<Unit> listed() {
        return SYMBOLS.values();
    }

    private static final Pattern TERM = Pattern.compile("([A-Za-z]+)(?:\\^(-?\\d+)|(\\d+))?");

    /** Parses a unit string such as {@code kN*m/rad}; the message names the part not understood. */
    public static Unit parse(String text) throws UnitParseException {
        String t = text.trim();
        if (t.isEmpty()) throw new UnitParseException("empty unit");
        String[] parts = t.split("/", -1);
        if (parts.length > 2) {
            throw new UnitParseException("unit '" + text + "' has more than one '/'; write e.g. kN/m2 or kN*m/rad");
        }
        Unit num = parts[0].trim().isEmpty() && parts.length == 2
                ? new Unit("", Dimension.NONE, 1.0) : product(parts[0], text);
        if (parts.length == 1) return new Unit(t, num.dimension(), num.toInternal());
        Unit den = product(parts[1], text);
        Unit u = num.times(den.power(-1));
        return new Unit(t, u.dimension(), u.toInternal());
    }

    private static Unit product(String part, String whole) throws UnitParseException {
        String p = part.trim();
        if (p.isEmpty()) throw new UnitParseException("unit '" + whole + "' has an empty part around '/'");
        Unit acc = new Unit("", Dimension.NONE, 1.0);
        String[] terms = p.split("[*.\\-\\u00b7](?![0-9])|\\s+");
        for (String term : terms) {
            if (term.isEmpty()) throw new UnitParseException("unit '" + whole + "' has an empty factor");
            if (TRADE_WORDS.containsKey(term)) {
                acc = acc.times(product(TRADE_WORDS.get(term), whole));
                continue;
            }
            Matcher m = TERM.matcher(term);
            if (!m.matches()) throw new UnitParseException("unit '" + whole + "': cannot read '" + term + "'");
            // "k" is kip only beside another symbol (k-ft, ft-k): alone it is nothing, and never kelvin
            Unit base = m.group(1).equals("k") && terms.length > 1 ? SYMBOLS.get("kip") : SYMBOLS.get(m.group(1));
            if (base == null && !m.group(1).equals("k")) base = SYMBOLS.get(caseFold(m.group(1)));
            if (base == null) {
                throw new UnitParseException("unknown unit symbol '" + m.group(1) + "' in '" + whole
                        + "'; nearest known: " + String.join(", ", nearest(m.group(1))));
            }
            int power = 1;
            if (m.group(2) != null) power = Integer.parseInt(m.group(2));
            else if (m.group(3) != null) power = Integer.parseInt(m.group(3));
            if (power == 0 || Math.abs(power) > 6) {
                throw new UnitParseException("unit '" + whole + "': power " + power + " of " + m.group(1) + " is not usable");
            }
            acc = acc.times(base.power(power));
        }
        return acc;
    }

    /** The three known symbols (and trade words) nearest to {@code s} by edit distance, case ignored. */
    static List<String> nearest(String s) {
        List<String> all = new ArrayList<>(SYMBOLS.keySet());
        all.addAll(TRADE_WORDS.keySet());
        String low = s.toLowerCase(Locale.ROOT);
        all.sort(Comparator.comparingInt((String k) -> editDistance(low, k.toLowerCase(Locale.ROOT))).thenComparing(k -> k));
        return all.subList(0, 3);
    }

    /** The edit (Levenshtein) distance between two strings: insertions, deletions and substitutions. */
    public static int editDistance(String a, String b) {
        int[] prev = new int[b.length() + 1], cur = new int[b.length() + 1];
        for (int j = 0; j <= b.length(); j++) prev[j] = j;
        for (int i = 1; i <= a.length(); i++) {
            cur[0] = i;
            for (int j = 1; j <= b.length(); j++) {
                cur[j] = Math.min(Math.min(cur[j - 1] + 1, prev[j] + 1), prev[j - 1] + (a.charAt(i - 1) == b.charAt(j - 1) ? 0 : 1));
            }
            int[] t = prev;
            prev = cur;
            cur = t;
        }
        return prev[b.length()];
    }

    /** Accepts e.g. "KN" or "Kip" only where the fold is unambiguous (never mm against Mm). */
    private static String caseFold(String s) {
        String lower = s.toLowerCase(Locale.ROOT);
        for (String k : SYMBOLS.keySet()) {
            if (k.toLowerCase(Locale.ROOT).equals(lower) && !k.equals("MN") && !k.equals("mm")
                    && !k.equals("MPa") && !k.equals("Pa")) {
                return k;
            }
        }
        return s;
    }

    private static final Pattern QUANTITY = Pattern.compile(
            "\\s*([+-]?(?:\\d+\\.?\\d*|\\.\\d+)(?:[eE][+-]?\\d+)?)\\s*(.*?)\\s*");

    /** A number and the unit written after it (the unit may be absent: then {@code unit} is null). */
    public record Written(double value, Unit unit) {
    }

    /** Parses {@code "<number> <unit>"}; a bare number has a null unit. */
    public static Written parseQuantity(String text) throws UnitParseException {
        Matcher m = QUANTITY.matcher(text);
        if (!m.matches()) {
            throw new UnitParseException("'" + text + "' is not a number followed by a unit (e.g. '12.5 kN/m')");
        }
        double v = Double.parseDouble(m.group(1));
        if (!Double.isFinite(v)) throw new UnitParseException("'" + text + "' is not a finite number");
        String u = m.group(2);
        return new Written(v, u.isEmpty() ? null : parse(u));
    }
}
