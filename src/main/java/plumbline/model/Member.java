package plumbline.model;

/**
 * A straight member from node {@code from} to node {@code to}. Local x runs from start to
 * end; local y is local x turned 90 degrees counter-clockwise. A truss member carries
 * axial force only; a hinge releases the bending moment at that end.
 */
public record Member(String name, String from, String to, String section, boolean hingeStart,
                     boolean hingeEnd, boolean truss, SourceRef at) {

    /** Bending moment is released at the start (hinge or truss). */
    public boolean releasedStart() {
        return truss || hingeStart;
    }

    public boolean releasedEnd() {
        return truss || hingeEnd;
    }
}
