package plumbline.io;

import java.util.ArrayList;
import java.util.Collection;
import java.util.Collections;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import plumbline.model.Problem;
import plumbline.model.SourceRef;
import plumbline.units.Dimension;
import plumbline.units.UnitParseException;
import plumbline.units.UnitSystem;
import plumbline.units.Units;

/**
 * Reads the keys of one map of the input, recording a {@link Problem} for every key that
 * is missing, unknown, of the wrong type or of the wrong dimension. Values come back in SI.
 */
final class Fields {

    final Tree.MapNode map;
    final String path;
    private final List<Problem> problems;
    private final Set<String> allowed;
    private final Set<String> used = new HashSet<>();

    Fields(Tree.MapNode map, String path, List<Problem> problems, Collection<String> allowed) {
        this.map = map;
        this.path = path;
        this.problems = problems;
        this.allowed = Set.copyOf(allowed);
    }

    /** Opens {@code t} as a map, or records that a map was expected and returns null. */
    static Fields of(Tree t, String path, List<Problem> problems, Collection<String> allowed, String expected) {
        if (t instanceof Tree.MapNode m) {
            Fields f = new Fields(m, path, problems, allowed);
            f.checkKeys();
            return f;
        }
        problems.add(new Problem(t.at(), path, "found " + t.describe() + "; expected " + expected));
        return null;
    }

    String field(String key) {
        return path.isEmpty() ? key : path + "." + key;
    }

    void problem(SourceRef at, String key, String message) {
        problems.add(new Problem(at, field(key), message));
    }

    private void checkKeys() {
        for (Tree.Entry e : map.entries().values()) {
            if (!allowed.contains(e.key())) {
                problems.add(new Problem(e.keyAt(), field(e.key()), unknown("key", e.key(), allowed,
                        "expected one of " + sorted(allowed))));
            }
        }
    }

    static String sorted(Collection<String> names) {
        List<String> l = new ArrayList<>(names);
        Collections.sort(l);
        return String.join(", ", l);
    }

    /**
     * The message for a name that is not among {@code known}: "unknown {what} 'name'", then a
     * "did you mean" for a close known name, else {@code otherwise} (what was expected).
     */
    static String unknown(String what, String name, Collection<String> known, String otherwise) {
        String hint = closest(name, known);
        return "unknown " + what + " '" + name + "'" + (hint != null ? "; did you mean '" + hint + "'?" : "; " + otherwise);
    }

    /** Each entry of a map of named parts; records a problem if {@code t} is not a map (or is missing but required). */
    static List<Tree.Entry> named(Tree t, List<Problem> problems, String path, boolean required, SourceRef where,
                                  String expected) {
        if (t == null) {
            if (required) problems.add(new Problem(where, path, "missing; expected " + expected));
            return List.of();
        }
        if (t instanceof Tree.MapNode m) return new ArrayList<>(m.entries().values());
        problems.add(new Problem(t.at(), path, "found " + t.describe() + "; expected " + expected));
        return List.of();
    }

    /** The closest name within edit distance 2 (or a case-insensitive match), else null. */
    static String closest(String key, Collection<String> candidates) {
        String best = null;
        int bestD = 3;
        for (String c : candidates) {
            int d = c.equalsIgnoreCase(key) ? 0 : Units.editDistance(key.toLowerCase(), c.toLowerCase());
            if (d < bestD || (d == bestD && best != null && c.compareTo(best) < 0)) {
                bestD = d;
                best = c;
            }
        }
        return bestD <= Math.min(2, Math.max(1, key.length() / 2)) ? best : null;
    }

    boolean has(String key) {
        return map.entries().containsKey(key);
    }

    Tree get(String key) {
        Tree.Entry e = map.entries().get(key);
        return e == null ? null : e.value();
    }

    SourceRef at(String key) {
        Tree.Entry e = map.entries().get(key);
        return e == null ? map.at() : e.value().at();
    }

    void missing(String key, String expected) {
        problems.add(new Problem(map.at(), field(key), "missing; expected " + expected));
    }

    /** A scalar read as text (numbers used as names are read as strings). */
    String text(String key, boolean required, String expected) {
        Tree t = get(key);
        if (t == null) {
            if (required) missing(key, expected);
            return null;
        }
        if (t instanceof Tree.Scalar s && s.kind() != Tree.Scalar.Kind.NULL) return s.text();
        problem(t.at(), key, "found " + t.describe() + "; expected " + expected);
        return null;
    }

    boolean bool(String key, boolean dflt) {
        Tree t = get(key);
        if (t == null) return dflt;
        if (t instanceof Tree.Scalar s && s.kind() == Tree.Scalar.Kind.BOOLEAN) return Boolean.parseBoolean(s.text());
        problem(t.at(), key, "found " + t.describe() + "; expected true or false");
        return dflt;
    }

    /** A quantity of dimension {@code d}, in SI; NaN (and a problem if required) when absent or bad. */
    double quantity(String key, Dimension d, UnitSystem units, boolean required) {
        Tree t = get(key);
        if (t == null) {
            if (required) missing(key, "a " + d.describe() + " value");
            return Double.NaN;
        }
        return quantityOf(t, field(key), d, units, problems);
    }

    /** Written numbers beyond this magnitude are slips, not structural quantities (common practice). */
    static final double MAX_MAGNITUDE = 1e15;
    /** Non-zero written numbers below this magnitude are slips (or denormals), not structural quantities. */
    static final double MIN_MAGNITUDE = 1e-20;

    static double quantityOf(Tree t, String field, Dimension d, UnitSystem units, List<Problem> problems) {
        if (!(t instanceof Tree.Scalar s) || s.kind() == Tree.Scalar.Kind.NULL || s.kind() == Tree.Scalar.Kind.BOOLEAN) {
            problems.add(new Problem(t.at(), field, "found " + t.describe() + "; expected a number or a string such as '"
                    + example(d, units) + "' (" + d.describe() + ")"));
            return Double.NaN;
        }
        try {
            if (s.text().length() > TreeReader.MAX_NUMBER_LENGTH + 40) {
                problems.add(new Problem(t.at(), field, "value of " + s.text().length() + " characters; expected a number and a unit"));
                return Double.NaN;
            }
            Units.Written w = Units.parseQuantity(s.text());
            if (w.value() != 0 && Math.abs(w.value()) < MIN_MAGNITUDE) {
                problems.add(new Problem(t.at(), field, "value " + s.text() + " is below 1e-20; expected zero or a structural quantity"));
                return Double.NaN;
            }
            if (Math.abs(w.value()) > MAX_MAGNITUDE) {
                problems.add(new Problem(t.at(), field, "value " + s.text() + " is beyond 1e15; expected a structural quantity"));
                return Double.NaN;
            }
            if (w.unit() == null) return units.toInternal(w.value(), d);
            if (!w.unit().dimension().matchesIgnoringAngle(d) || (d.angle() > 0 && w.unit().dimension().angle() != d.angle())) {
                problems.add(new Problem(t.at(), field, "unit '" + w.unit().symbol() + "' is "
                        + w.unit().dimension().describe() + "; expected " + d.describe() + " (e.g. '" + example(d, units) + "')"));
                return Double.NaN;
            }
            double v = w.unit().toInternal(w.value());
            if (!Double.isFinite(v)) {
                problems.add(new Problem(t.at(), field, "value '" + s.text() + "' is not finite; expected a finite number"));
                return Double.NaN;
            }
            return v;
        } catch (UnitParseException e) {
            problems.add(new Problem(t.at(), field, e.getMessage() + "; expected " + d.describe()));
            return Double.NaN;
        } catch (NumberFormatException e) {
            problems.add(new Problem(t.at(), field, "'" + s.text() + "' is not a number; expected " + d.describe()));
            return Double.NaN;
        }
    }

    static String example(Dimension d, UnitSystem units) {
        if (d.equals(Dimension.ANGLE)) return "30 deg";
        if (d.equals(Dimension.TEMPERATURE)) return "25 degC";
        if (d.equals(Dimension.PER_TEMPERATURE)) return "1.2e-5 /degC";
        return "12 " + units.symbol(d);
    }

    /** The value under {@code key} as a list (a single scalar counts as a list of one). */
    List<Tree> list(String key, boolean required, String expected) {
        Tree t = get(key);
        if (t == null) {
            if (required) missing(key, expected);
            return List.of();
        }
        if (t instanceof Tree.ListNode l) return l.items();
        problem(t.at(), key, "found " + t.describe() + "; expected " + expected);
        return List.of();
    }
}
