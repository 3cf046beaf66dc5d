package plumbline.solve;

import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * The force method's working, as a checker compares it line by line with a hand
 * calculation: the redundants, the flexibility coefficients delta_ij (SI: m/N, rad/N*m,
 * ...) and, per load case, the compatibility terms Delta_i0 and the redundant values z
 * that solve delta z + Delta_0 = 0. Empty lists when the model is too large to list.
 */
public record ForceWorking(List<String> redundants, double[][] flexibility, Map<String, double[]> deltaZero,
                           Map<String, double[]> values) {

    public ForceWorking {
        redundants = List.copyOf(redundants);
        deltaZero = Collections.unmodifiableMap(new LinkedHashMap<>(deltaZero));
        values = Collections.unmodifiableMap(new LinkedHashMap<>(values));
    }
}
