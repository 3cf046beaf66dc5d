package plumbline.model;

import java.util.Map;

/** A linear combination of load cases: case name to factor, and where it came from. */
public record Combination(String name, Map<String, Double> factors, String origin, SourceRef at) {
    public Combination {
        factors = java.util.Collections.unmodifiableMap(new java.util.LinkedHashMap<>(factors));
    }
}
