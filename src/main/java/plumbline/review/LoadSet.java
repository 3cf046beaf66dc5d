package plumbline.review;

import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.Map;
import plumbline.model.LimitState;

/**
 * A named set of factored load cases that results are reported under: a load case on its
 * own (factor 1), a user combination, or one generated from a standard; {@code origin}
 * says which, for the report.
 */
public record LoadSet(String name, Map<String, Double> factors, String origin, boolean combination, LimitState limitState) {

    /** A load set whose limit state is not stated (a load case on its own, or a combination that does not say). */
    public LoadSet(String name, Map<String, Double> factors, String origin, boolean combination) {
        this(name, factors, origin, combination, LimitState.NONE);
    }
    public LoadSet {
        factors = Collections.unmodifiableMap(new LinkedHashMap<>(factors));
    }
}
