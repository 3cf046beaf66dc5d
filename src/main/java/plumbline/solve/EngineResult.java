package plumbline.solve;

import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * What an engine returns for a model: the solution of every load case, unfactored, or,
 * when the engine finds the structure cannot carry load, why (singularity is a state, not
 * an exception). {@code notes} carry engine-specific remarks for the report, {@code warnings}
 * what the checker must be told about the solution's accuracy; {@code declined}
 * marks an engine that did not take the model on, which is not instability; {@code working}
 * is the force method's record for the report (null for the stiffness method).
 */
public record EngineResult(String engine, boolean stable, String instability, Map<String, Solution> cases,
                           List<String> notes, List<EngineWarning> warnings, boolean declined, ForceWorking working) {

    /** A solved model with notes and no warnings. */
    public EngineResult(String engine, boolean stable, String instability, Map<String, Solution> cases, List<String> notes) {
        this(engine, stable, instability, cases, notes, List.of(), false, null);
    }

    public EngineResult {
        cases = Collections.unmodifiableMap(new LinkedHashMap<>(cases));
        notes = List.copyOf(notes);
        warnings = List.copyOf(warnings);
    }

    public static EngineResult unstable(String engine, String why) {
        return new EngineResult(engine, false, why, Map.of(), List.of(), List.of(), false, null);
    }

    /**
     * The engine did not solve this model for a reason of its own (size, a formulation that
     * does not apply), which says nothing about the structure's stability.
     */
    public static EngineResult declined(String engine, String why) {
        return new EngineResult(engine, false, why, Map.of(), List.of(), List.of(), true, null);
    }
}
