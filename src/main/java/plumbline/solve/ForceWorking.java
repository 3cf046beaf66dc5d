package plumbline.solve;

import java.util.ArrayList;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;

/**
 * The force method's working, as a checker compares it line by line with a hand
 * calculation: the redundants, the flexibility coefficients delta_ij (SI: m/N, rad/N*m,
 * ...) and, per load case, the compatibility terms Delta_i0 and the redundant values z
 * that solve delta z + Delta_0 = 0. The matrix and the per-case terms are kept for up to
 * {@link #LISTED_UP_TO} redundants; above that they are empty and only the count is stated.
 */
public record ForceWorking(List<String> redundants, double[][] flexibility, Map<String, double[]> deltaZero,
                           Map<String, double[]> values) {

    /** The largest number of redundants whose flexibility matrix and per-case terms are listed. */
    public static final int LISTED_UP_TO = 12;

    public ForceWorking {
        redundants = List.copyOf(redundants);
        deltaZero = Collections.unmodifiableMap(new LinkedHashMap<>(deltaZero));
        values = Collections.unmodifiableMap(new LinkedHashMap<>(values));
    }

    /** Whether the matrix and the per-case terms are listed (a structure with 1 to {@link #LISTED_UP_TO} redundants). */
    public boolean listed() {
        return !redundants.isEmpty() && redundants.size() <= LISTED_UP_TO;
    }

    /**
     * The working as lines of text, in the order a hand calculation gives it: the
     * flexibility matrix (or its size when too large to list), then per load case the
     * compatibility terms and the redundants; SI units, six significant figures.
     */
    public List<String> lines() {
        List<String> out = new ArrayList<>();
        int r = redundants.size();
        if (r == 0) return out;
        if (!listed()) {
            out.add("flexibility coefficients: a " + r + " x " + r + " matrix (listed for up to " + LISTED_UP_TO + " redundants)");
            return out;
        }
        out.add("flexibility coefficients delta_ij (SI): " + matrixText(flexibility));
        deltaZero.forEach((c, d0) -> out.add("case " + c + ": Delta_i0 = " + vectorText(d0) + "; redundants = " + vectorText(values.get(c))));
        return out;
    }

    static String vectorText(double[] v) {
        StringBuilder sb = new StringBuilder("[");
        for (int i = 0; i < v.length; i++) sb.append(i == 0 ? "" : ", ").append(String.format(Locale.ROOT, "%.6g", v[i]));
        return sb.append("]").toString();
    }

    static String matrixText(double[][] a) {
        StringBuilder sb = new StringBuilder("[");
        for (int i = 0; i < a.length; i++) sb.append(i == 0 ? "" : "; ").append(vectorText(a[i]));
        return sb.append("]").toString();
    }
}
