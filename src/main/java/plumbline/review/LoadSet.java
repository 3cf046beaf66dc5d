package plumbline.review;

import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.Map;

/**
 * A named set of factored load cases that results are reported under: a load case on its
 * own (factor 1), a user combination, or one generated from a standard; {@code origin}
 * says which, for the report.
 */
public record LoadSet(String name, Map<String, Double> factors, String origin, boolean combination) {
    public LoadSet {
        factors = Collections.unmodifiableMap(new LinkedHashMap<>(factors));
    }
}
