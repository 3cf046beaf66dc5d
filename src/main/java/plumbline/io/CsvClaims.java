package plumbline.io;

import com.fasterxml.jackson.databind.MappingIterator;
import com.fasterxml.jackson.dataformat.csv.CsvMapper;
import com.fasterxml.jackson.dataformat.csv.CsvParser;
import com.fasterxml.jackson.dataformat.csv.CsvSchema;
import java.io.IOException;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import plumbline.model.Claim;
import plumbline.model.ClaimSet;
import plumbline.model.Conventions;
import plumbline.model.InputException;
import plumbline.model.Model;
import plumbline.model.Problem;
import plumbline.model.Quantity;
import plumbline.model.SourceRef;
import plumbline.units.Dimension;
import plumbline.units.Unit;
import plumbline.units.UnitParseException;
import plumbline.units.UnitSystem;
import plumbline.units.Units;

/**
 * Reads a CSV claims file as spreadsheets export it (format reference section 4.1): lines
 * before the header that start with {@code #} carry {@code source:}, {@code units:} and
 * {@code tolerance:} and {@code conventions:} as in YAML; the header names the columns in any order, matched
 * case-insensitively with spaces trimmed ({@code item, combo, name, quantity, value}, and
 * optionally {@code unit} and {@code tolerance}); a header separated by {@code ;} means
 * {@code ;} between fields and a decimal comma in numbers; rows that are empty or hold only
 * separators are skipped, and so is a row whose value is empty (not claimed, as a template
 * row left blank).
 */
final class CsvClaims {

    static final List<String> REQUIRED = List.of("item", "combo", "name", "quantity", "value");
    static final List<String> OPTIONAL = List.of("unit", "tolerance", "at");

    private CsvClaims() {
    }

    static ClaimSet read(String file, String text, Model model, List<Problem> problems) {
        String[] lines = text.split("\r?\n", -1);
        // the preamble: '#' lines (and blank ones) before the header, read as YAML with their own line numbers
        StringBuilder yaml = new StringBuilder(), rows = new StringBuilder();
        int headerLine = -1;
        for (int i = 0; i < lines.length; i++) {
            String t = lines[i].trim();
            boolean preamble = headerLine < 0 && (t.isEmpty() || t.startsWith("#"));
            yaml.append(preamble && t.startsWith("#") ? t.substring(1).trim() : "").append('\n');
            rows.append(preamble ? "" : lines[i]).append('\n');
            if (!preamble && headerLine < 0) headerLine = i + 1;
        }
        ClaimsReader.Heading heading = new ClaimsReader.Heading("", model.units(), Map.of(), Conventions.TOOL);
        if (!yaml.toString().isBlank()) {
            Tree t = null;
            try {
                t = TreeReader.read(file, yaml.toString(), true);
            } catch (InputException e) {
                problems.addAll(e.problems());
            }
            Fields f = t == null ? null : Fields.of(t, "", problems, List.of("source", "units", "tolerance", "conventions"),
                    "'# key: value' lines (source, units, tolerance, conventions) before the header");
            if (f != null) heading = ClaimsReader.heading(f, model, problems);
        }
        if (headerLine < 0) {
            problems.add(new Problem(new SourceRef(file, 1, 1), "(header)",
                    "no header; expected a line such as item,combo,name,quantity,value,unit"));
            return null;
        }
        char sep = lines[headerLine - 1].contains(";") ? ';' : ',';
        boolean decimalComma = sep == ';';
        List<Claim> claims = new ArrayList<>();
        UnitSystem units = heading.units();
        CsvMapper mapper = new CsvMapper();
        mapper.enable(CsvParser.Feature.WRAP_AS_ARRAY);
        CsvSchema schema = CsvSchema.emptySchema().withColumnSeparator(sep);
        try (MappingIterator<String[]> it = mapper.readerFor(String[].class).with(schema).readValues(rows.toString())) {
            Map<String, Integer> columns = null;
            while (it.hasNext()) {
                String[] row;
                try {
                    row = it.next();
                } catch (RuntimeException e) {
                    problems.add(new Problem(new SourceRef(file, it.getCurrentLocation().getLineNr(), 1), "(row)",
                            "cannot read the row: " + e.getMessage()));
                    break;
                }
                int line = Math.max(1, it.getCurrentLocation().getLineNr() - 1);
                if (blank(row)) continue;
                SourceRef at = new SourceRef(file, line, 1);
                if (columns == null) {
                    columns = header(row, at, problems);
                    if (columns == null) return null;
                    continue;
                }
                Claim c = claim(row, columns, at, heading, model, decimalComma, problems);
                if (c != null) claims.add(c);
            }
        } catch (IOException | RuntimeException e) {
            problems.add(new Problem(new SourceRef(file, 0, 0), "(file)", "cannot read as CSV: " + e.getMessage()));
            return null;
        }
        return new ClaimSet(file, heading.source(), heading.tolerances(), claims);
    }

    private static boolean blank(String[] row) {
        for (String f : row) if (!f.isBlank()) return false;
        return true;
    }

    /** Column name to index; a problem for a missing, unknown or repeated column. */
    private static Map<String, Integer> header(String[] row, SourceRef at, List<Problem> problems) {
        Map<String, Integer> out = new LinkedHashMap<>();
        List<String> known = new ArrayList<>(REQUIRED);
        known.addAll(OPTIONAL);
        int before = problems.size();
        for (int i = 0; i < row.length; i++) {
            String h = row[i].trim().toLowerCase(Locale.ROOT);
            if (h.isEmpty() && i == row.length - 1) continue; // a trailing separator
            if (!known.contains(h)) {
                problems.add(new Problem(at, "(header)", Fields.unknown("column", row[i].trim(), known,
                        "expected the columns " + String.join(",", REQUIRED) + " and optionally " + String.join(",", OPTIONAL))));
            } else if (out.put(h, i) != null) {
                problems.add(new Problem(at, "(header)", "column '" + h + "' given twice"));
            }
        }
        for (String r : REQUIRED) {
            if (!out.containsKey(r)) {
                problems.add(new Problem(at, "(header)", "no column '" + r + "'; expected the columns "
                        + String.join(",", REQUIRED) + " (any order, any case) and optionally " + String.join(",", OPTIONAL)));
            }
        }
        return problems.size() == before ? out : null;
    }

    private static String field(String[] row, Map<String, Integer> columns, String name) {
        Integer i = columns.get(name);
        return i == null || i >= row.length ? "" : row[i].trim();
    }

    private static Claim claim(String[] row, Map<String, Integer> columns, SourceRef at, ClaimsReader.Heading heading,
                               Model model, boolean decimalComma, List<Problem> problems) {
        UnitSystem units = heading.units();
        String item = field(row, columns, "item").toLowerCase(Locale.ROOT), combo = field(row, columns, "combo"),
                name = field(row, columns, "name"), q = field(row, columns, "quantity"), unitText = field(row, columns, "unit"),
                valueText = field(row, columns, "value"), tolText = field(row, columns, "tolerance");
        Claim.Kind kind = switch (item) {
            case "reaction" -> Claim.Kind.REACTION;
            case "member" -> Claim.Kind.MEMBER;
            case "displacement" -> Claim.Kind.DISPLACEMENT;
            default -> null;
        };
        if (kind == null) {
            problems.add(new Problem(at, "item", "found '" + item + "'; expected reaction, member or displacement"));
            return null;
        }
        List<String> qs = Quantity.symbols(kind);
        String atText = field(row, columns, "at");
        Quantity quantity = null;
        for (Quantity x : Quantity.of(kind)) {
            // with a position, N, V, M or deflection there; without, a peak, an end value or a component
            if (x.symbol.equals(q) && (x.place == null || atText.isEmpty() != (x.place == Quantity.Place.AT))) quantity = x;
        }
        if (quantity == null && qs.contains(q)) {
            problems.add(new Problem(at, "at", atText.isEmpty() ? "'" + q + "' is a value at a position; expected a position in the at column"
                    : "'" + q + "' is not a value at a position; with at, claim N, V, M or deflection"));
            return null;
        }
        if (quantity == null) {
            problems.add(new Problem(at, "quantity", Fields.unknown(item + " quantity", q, qs,
                    "expected one of " + String.join(", ", qs))));
            return null;
        }
        if (combo.isEmpty() || name.isEmpty()) {
            problems.add(new Problem(at, combo.isEmpty() ? "combo" : "name", "empty; expected a name"));
            return null;
        }
        if (valueText.isEmpty()) return null; // an empty value is not claimed (a template row left blank)
        String ratio = quantity == Quantity.DEFLECTION ? ClaimsReader.spanRatio(valueText) : null;
        if (ratio != null) {
            double n = Double.parseDouble(ratio);
            var member = model.member(name);
            if (!(n > 0)) {
                problems.add(new Problem(at, "value", "span ratio '" + valueText + "' has no positive divisor; expected e.g. L/360"));
                return null;
            }
            if (member == null) return null; // reported by the claim check
            return Claim.inConvention(heading.conventions(), kind, name, combo, quantity, model.lengthM(member) / n, Double.NaN,
                    "L/" + ratio, tolerance(tolText, decimalComma, at, problems), at, Double.NaN);
        }
        double atM = Double.NaN;
        if (!atText.isEmpty()) {
            var member = model.member(name);
            double len = member == null ? Double.NaN : model.lengthM(member);
            atM = atText.endsWith("%") ? number(atText.substring(0, atText.length() - 1), decimalComma) / 100 * len
                    : units.toInternal(number(atText, decimalComma), Dimension.LENGTH);
            if (!Double.isFinite(atM) && member != null || Double.isFinite(len) && (atM < -1e-9 * len || atM > len * (1 + 1e-9))) {
                problems.add(new Problem(at, "at", "'" + atText + "' is no position on member " + name
                        + "; expected a distance from its start up to its length, or e.g. 50%"));
                return null;
            }
        }
        double value = number(valueText, decimalComma);
        if (!Double.isFinite(value)) {
            problems.add(new Problem(at, "value", "'" + valueText + "' is not a finite number"
                    + (decimalComma ? " (a ';' file may use a decimal comma: 12,5)" : "")));
            return null;
        }
        int before = problems.size();
        double tolerance = tolerance(tolText, decimalComma, at, problems);
        if (problems.size() > before) return null;
        Dimension d = quantity.dimension;
        if (quantity == Quantity.DEFLECTION && value < 0) {
            problems.add(new Problem(at, "value", "a deflection is a magnitude; expected a value >= 0"));
            return null;
        }
        if (unitText.isEmpty()) {
            return Claim.inConvention(heading.conventions(), kind, name, combo, quantity, units.toInternal(value, d), value,
                    units.symbol(d), tolerance, at, atM);
        }
        try {
            Unit u = Units.parse(unitText);
            if (!u.dimension().matchesIgnoringAngle(d)) {
                problems.add(new Problem(at, "unit", "unit '" + unitText + "' is " + u.dimension().describe()
                        + "; expected " + d.describe()));
                return null;
            }
            return Claim.inConvention(heading.conventions(), kind, name, combo, quantity, u.toInternal(value), value, unitText,
                    tolerance, at, atM);
        } catch (UnitParseException e) {
            problems.add(new Problem(at, "unit", e.getMessage()));
            return null;
        }
    }

    /** The claim's own relative tolerance ("3%", "2,5%" in a ';' file, or 0.03); NaN when the cell is empty. */
    private static double tolerance(String text, boolean decimalComma, SourceRef at, List<Problem> problems) {
        if (text.isEmpty()) return Double.NaN;
        String t = text.endsWith("%") ? text.substring(0, text.length() - 1).trim() : text;
        double v = number(t, decimalComma);
        if (text.endsWith("%")) v /= 100;
        if (!(v >= 0 && v < 1)) {
            problems.add(new Problem(at, "tolerance", "'" + text + "' is not a relative tolerance; expected e.g. 3% or 0.03"));
            return Double.NaN;
        }
        return v;
    }

    /** A number as written, with a decimal comma where the file uses ';' between fields; NaN if it is none. */
    private static double number(String text, boolean decimalComma) {
        String t = text.trim().replace(" ", "");
        if (decimalComma) t = t.replace(',', '.');
        try {
            double v = Double.parseDouble(t);
            return Double.isFinite(v) ? v : Double.NaN;
        } catch (NumberFormatException e) {
            return Double.NaN;
        }
    }
}
