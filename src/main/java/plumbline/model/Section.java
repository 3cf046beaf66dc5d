package plumbline.model;

/** Member cross-section: area m2, second moment m4, depth m (NaN if not given). */
public record Section(String name, double areaM2, double inertiaM4, double depthM, String material, SourceRef at) {
    public boolean hasDepth() {
        return Double.isFinite(depthM) && depthM > 0;
    }
}
