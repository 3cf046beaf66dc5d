package plumbline.solve;

/**
 * A warning an engine raises about its own solution, for the checker: the rule it comes from
 * (why it matters) and what was found (where, and how much).
 */
public record EngineWarning(String rule, String found) {
}
