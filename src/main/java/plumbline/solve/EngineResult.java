package plumbline.solve;

import java.util.List;
import java.util.Map;

/**
 * What an engine returns for a model: the solution of every load case, unfactored, or,
 * when the engine finds the structure cannot carry load, why (singularity is a state, not
 * an exception). {@code notes} carry engine-specific remarks for the report.
 */
public record EngineResult(String engine, boolean stable, String instability, Map<String, Solution> cases,
                           List<String> notes) {

    public EngineResult {
        cases = java.util.Collections.unmodifiableMap(new java.util.LinkedHashMap<>(cases));
        notes = List.copyOf(notes);
    }

    public static EngineResult unstable(String engine, String why) {
        return new EngineResult(engine, false, why, Map.of(), List.of());
    }
}
