package plumbline.model;

import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/** A linear combination of load cases: case name to factor, where it came from, and the limit state it checks. */
public record Combination(String name, Map<String, Double> factors, String origin, SourceRef at, LimitState limitState) {

    /** A combination whose limit state the model does not state. */
    public Combination(String name, Map<String, Double> factors, String origin, SourceRef at) {
        this(name, factors, origin, at, LimitState.NONE);
    }

    /** The sets of published basic combinations that {@code standard_combinations} may name. */
    public static final List<String> STANDARD_SETS = List.of("asce7-strength", "asce7-asd",
            "en1990-6.10", "en1990-6.10ab");

    public Combination {
        factors = Collections.unmodifiableMap(new LinkedHashMap<>(factors));
    }
}
