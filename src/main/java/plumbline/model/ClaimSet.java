package plumbline.model;

import java.util.List;
import java.util.Map;

/**
 * The claims of one file: its free-text source, the relative tolerances it sets by
 * quantity kind ({@code default}, {@code reaction}, {@code member}, {@code deflection},
 * {@code displacement}) and its claims.
 */
public record ClaimSet(String file, String source, Map<String, Double> tolerances, List<Claim> claims) {
    public ClaimSet {
        tolerances = Map.copyOf(tolerances);
        claims = List.copyOf(claims);
    }
}
