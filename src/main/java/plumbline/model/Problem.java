package plumbline.model;

/**
 * One input problem, printed as {@code file:line:col: field: what is wrong; what is expected}.
 */
public record Problem(SourceRef at, String field, String message) {
    @Override
    public String toString() {
        return at + ": " + field + ": " + message;
    }
}
