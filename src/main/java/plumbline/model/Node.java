package plumbline.model;

/** A joint of the plane model; coordinates in metres, global x right, y up. */
public record Node(String name, double xM, double yM, SourceRef at) {
}
