package plumbline.model;

/**
 * Prescribed displacement of a support along its restraint axes: ux, uy in metres, rz in
 * radians; NaN where not given (no prescribed movement in that direction).
 */
public record Settlement(String node, double uxM, double uyM, double rzRad, SourceRef at) {
    public double value(int dof) {
        return dof == 0 ? uxM : dof == 1 ? uyM : rzRad;
    }
}
