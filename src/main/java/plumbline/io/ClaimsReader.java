package plumbline.io;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.regex.Pattern;
import plumbline.model.Claim;
import plumbline.model.ClaimSet;
import plumbline.model.Conventions;
import plumbline.model.InputException;
import plumbline.model.Model;
import plumbline.model.Problem;
import plumbline.model.Quantity;
import plumbline.units.Dimension;
import plumbline.units.UnitParseException;
import plumbline.units.UnitSystem;
import plumbline.units.Units;

/**
 * Reads claims (format reference (src/site/markdown/formats.md) section 4) from a model's {@code claims:} key, a YAML or JSON
 * claims file, or a CSV file with the header {@code item,combo,name,quantity,value,unit}.
 * Values are converted to SI from the claims' own units.
 */
public final class ClaimsReader {

    static final List<String> TOLERANCE_KEYS = List.of("default", "reaction", "member", "deflection", "displacement");

    private ClaimsReader() {
    }

    /** Reads a separate claims file for {@code model}. */
    public static ClaimSet read(Path path, Model model) throws InputException {
        return read(path.toString(), ModelReader.readBytes(path), model);
    }

    /** A claims file given as its name and bytes; the name's ending tells CSV, YAML or JSON. */
    public static ClaimSet read(String name, byte[] bytes, Model model) throws InputException {
        String text = ModelReader.decode(name, bytes);
        List<Problem> problems = new ArrayList<>();
        ClaimSet cs;
        if (name.toLowerCase(Locale.ROOT).endsWith(".csv")) {
            cs = CsvClaims.read(name, text, model, problems);
        } else {
            Tree root = TreeReader.read(name, text, ModelReader.isYaml(name));
            Fields top = Fields.of(root, "", problems, List.of("claims"), "a map with the single key 'claims:'");
            cs = null;
            if (top != null) {
                if (!top.has("claims")) top.missing("claims", "a claims file holds one top-level key, claims:");
                else cs = claimSet(top.get("claims"), name, "claims", problems, model);
            }
        }
        if (!problems.isEmpty() || cs == null) throw new InputException(problems);
        return cs;
    }

    static ClaimSet claimSet(Tree t, String file, String path, List<Problem> problems, Model model) {
        Fields f = Fields.of(t, path, problems, List.of("source", "units", "tolerance", "conventions", "reactions", "members",
                "displacements"), "a map with source, units, tolerance, conventions, reactions, members, displacements");
        if (f == null) return null;
        Heading h = heading(f, model, problems);
        List<Claim> claims = new ArrayList<>();
        section(f, "reactions", Claim.Kind.REACTION, "node", h, model, problems, claims);
        section(f, "members", Claim.Kind.MEMBER, "member", h, model, problems, claims);
        section(f, "displacements", Claim.Kind.DISPLACEMENT, "node", h, model, problems, claims);
        return new ClaimSet(file, h.source, h.tolerances, claims);
    }

    /** What a claims file says of all its claims: where they come from, their units, tolerances and sign conventions. */
    record Heading(String source, UnitSystem units, Map<String, Double> tolerances, Conventions conventions) {
    }

    /** The {@code conventions} map: reactions on-structure/on-support, moment sagging/hogging-positive, axial tension/compression-positive. */
    static Conventions conventions(Fields f, List<Problem> problems) {
        if (!f.has("conventions")) return Conventions.TOOL;
        Fields c = Fields.of(f.get("conventions"), f.field("conventions"), problems, List.of("reactions", "moment", "axial"),
                "a map such as {reactions: on-support, moment: hogging-positive, axial: compression-positive}");
        if (c == null) return Conventions.TOOL;
        return new Conventions(choice(c, "reactions", "on-structure", "on-support"),
                choice(c, "moment", "sagging-positive", "hogging-positive"),
                choice(c, "axial", "tension-positive", "compression-positive"));
    }

    /** False for the tool's word (or no key), true for the other; a problem for anything else. */
    private static boolean choice(Fields c, String key, String tools, String other) {
        String v = c.text(key, false, tools + " or " + other);
        if (v == null || v.equals(tools)) return false;
        if (v.equals(other)) return true;
        c.problem(c.at(key), key, "found '" + v + "'; expected " + tools + " (the default) or " + other);
        return false;
    }

    /** Reads the {@code source}, {@code units} and {@code tolerance} keys of {@code f} (the model's units by default). */
    static Heading heading(Fields f, Model model, List<Problem> problems) {
        String source = !f.has("source") || f.get("source") instanceof Tree.Scalar sc && sc.kind() == Tree.Scalar.Kind.NULL ? null
                : f.text("source", false, "free text");
        UnitSystem units = model.units();
        if (f.has("units")) {
            UnitSystem u = ModelReader.unitSystem(f.get("units"), f.field("units"), problems, true, f.at("units"));
            if (u != null) units = u;
        }
        Map<String, Double> tol = new LinkedHashMap<>();
        if (f.has("tolerance")) {
            Tree tt = f.get("tolerance");
            if (tt instanceof Tree.Scalar) {
                // one tolerance for every claim of the file: its default
                double v = tolerance(tt, f.field("tolerance"), problems);
                if (!Double.isNaN(v)) tol.put("default", v);
            } else {
                Fields tf = Fields.of(tt, f.field("tolerance"), problems, TOLERANCE_KEYS,
                        "a map such as {default: 3%, deflection: 10%}");
                if (tf != null) {
                    for (Tree.Entry e : tf.map.entries().values()) {
                        if (!TOLERANCE_KEYS.contains(e.key())) continue;
                        double v = tolerance(e.value(), tf.field(e.key()), problems);
                        if (!Double.isNaN(v)) tol.put(e.key(), v);
                    }
                }
            }
        }
        return new Heading(source == null ? "" : source, units, tol, conventions(f, problems));
    }

    /**
     * The quantity a key names in this claim: with {@code at}, N, V, M or deflection at that
     * position; without it, a peak, an end value or a reaction or displacement component.
     * Null (and a problem) for a key that does not fit.
     */
    private static Quantity placed(Fields g, Claim.Kind kind, String key) {
        boolean at = g.has("at");
        for (Quantity q : Quantity.of(kind)) {
            if (!q.symbol.equals(key)) continue;
            if (q.place == null || at == (q.place == Quantity.Place.AT)) return q;
        }
        g.problem(g.at(key), key, at ? "'" + key + "' is not a value at a position; with at, claim N, V, M or deflection"
                : "'" + key + "' is a value at a position; expected at: (a distance from the member start, or e.g. '50%')");
        return null;
    }


    private static final Pattern SPAN_RATIO = Pattern.compile(
            "\\s*(?:L|l|span)\\s*/\\s*(\\d+(?:[.,]\\d+)?)\\s*");

    /** The divisor n of a deflection written as a span ratio "L/n" or "span/n" (decimal comma allowed), else null. */
    static String spanRatio(String text) {
        var m = SPAN_RATIO.matcher(text);
        return m.matches() ? m.group(1).replace(',', '.') : null;
    }

    private static String rs(Tree v) {
        return v instanceof Tree.Scalar s ? s.text() : v.describe();
    }

    /** A relative tolerance written as "3%" or as a fraction 0.03. */
    static double tolerance(Tree t, String field, List<Problem> problems) {
        if (t instanceof Tree.Scalar s) {
            String text = s.text().trim();
            try {
                double v = text.endsWith("%") ? Double.parseDouble(text.substring(0, text.length() - 1).trim()) / 100.0
                        : Double.parseDouble(text);
                if (v >= 0 && v < 1 && Double.isFinite(v)) return v;
                problems.add(new Problem(t.at(), field, "tolerance " + text + " is out of range; expected e.g. 3% (0 to 100%)"));
                return Double.NaN;
            } catch (NumberFormatException e) {
                // fall through
            }
        }
        problems.add(new Problem(t.at(), field, "found " + t.describe() + "; expected a relative tolerance such as 3% or 0.03"));
        return Double.NaN;
    }

    private static void section(Fields f, String key, Claim.Kind kind, String nameKey, Heading h, Model model,
                                List<Problem> problems, List<Claim> out) {
        UnitSystem units = h.units();
        List<String> quantities = Quantity.symbols(kind);
        List<Tree> items = f.list(key, false, "a list of claims");
        for (int i = 0; i < items.size(); i++) {
            String p = f.field(key) + "[" + i + "]";
            List<String> allowed = new ArrayList<>(quantities);
            allowed.add(nameKey);
            allowed.add("combo");
            allowed.add("tolerance");
            if (kind == Claim.Kind.MEMBER) allowed.add("at");
            Fields g = Fields.of(items.get(i), p, problems, allowed, "a map such as {" + nameKey + ": A, combo: ULS-1, "
                    + quantities.get(1) + ": 96.2}");
            if (g == null) continue;
            String name = g.text(nameKey, true, "a " + nameKey + " name");
            String combo = g.text("combo", true, "a combination, a load case or envelope");
            double tol = g.has("tolerance") ? tolerance(g.get("tolerance"), g.field("tolerance"), problems) : Double.NaN;
            var claimedMember = kind == Claim.Kind.MEMBER && name != null ? model.member(name) : null;
            double atM = g.has("at") ? LoadsReader.position(g, "at", claimedMember == null ? Double.NaN : model.lengthM(claimedMember), units)
                    : Double.NaN;
            int n = 0, blank = 0;
            for (String q : quantities) {
                if (!g.has(q)) continue;
                Quantity quantity = placed(g, kind, q);
                if (quantity == null) continue;
                if (g.get(q) instanceof Tree.Scalar sc && sc.kind() == Tree.Scalar.Kind.NULL) {
                    blank++; // a ~ left in a template: not claimed
                    continue;
                }
                n++;
                Dimension d = quantity.dimension;
                Tree v = g.get(q);
                String ratio = quantity == Quantity.DEFLECTION && v instanceof Tree.Scalar rs ? spanRatio(rs.text()) : null;
                if (ratio != null) {
                    // "L/410": the member's length over 410 (unknown members are reported by the claim check)
                    double n410 = Double.parseDouble(ratio);
                    var member = name == null ? null : model.member(name);
                    if (!(n410 > 0)) {
                        g.problem(v.at(), q, "span ratio '" + rs(v) + "' has no positive divisor; expected e.g. L/360");
                    } else if (member != null && combo != null) {
                        out.add(Claim.inConvention(h.conventions(), kind, name, combo, quantity, model.lengthM(member) / n410,
                                Double.NaN, "L/" + ratio, tol, g.at(q), atM));
                    }
                    continue;
                }
                double si = Fields.quantityOf(v, g.field(q), d, units, problems);
                double written = Double.NaN;
                String unit = units.symbol(d);
                if (v instanceof Tree.Scalar s) {
                    try {
                        Units.Written w = Units.parseQuantity(s.text());
                        written = w.value();
                        if (w.unit() != null) unit = w.unit().symbol();
                    } catch (UnitParseException e) {
                        // reported by quantityOf
                    }
                }
                if (quantity == Quantity.DEFLECTION && si < 0) {
                    g.problem(v.at(), q, "a deflection is a magnitude; expected a value >= 0");
                }
                if (name != null && combo != null && !Double.isNaN(si)) {
                    out.add(Claim.inConvention(h.conventions(), kind, name, combo, quantity, si, written, unit, tol, g.at(q), atM));
                }
            }
            if (n == 0 && blank == 0) {
                problems.add(new Problem(items.get(i).at(), p, "no claimed value; expected at least one of "
                        + String.join(", ", quantities)));
            }
        }
    }
}
