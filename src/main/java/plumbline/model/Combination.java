package plumbline.model;

import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/** A linear combination of load cases: case name to factor, and where it came from. */
public record Combination(String name, Map<String, Double> factors, String origin, SourceRef at) {

    /** The sets of published basic combinations that {@code standard_combinations} may name. */
    public static final List<String> STANDARD_SETS = List.of("asce7-strength", "asce7-asd",
            "en1990-6.10", "en1990-6.10ab");

    public Combination {
        factors = Collections.unmodifiableMap(new LinkedHashMap<>(factors));
    }
}
