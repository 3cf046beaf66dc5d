package plumbline.model;

/**
 * Free-text job fields for the report's title block; empty strings when not given.
 * {@code scope} and {@code category} are the check's scope and category as the user states them.
 */
public record Job(String title, String project, String calcRef, String originator, String checker,
                  String scope, String category) {
    public static final Job EMPTY = new Job("", "", "", "", "", "", "");
}
