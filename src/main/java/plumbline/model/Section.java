package plumbline.model;

import java.util.Objects;

/** Member cross-section: area m2, second moment m4, depth m (NaN if not given). */
public record Section(String name, double areaM2, double inertiaM4, double depthM, String material, SourceRef at) {
    public boolean hasDepth() {
        return Double.isFinite(depthM) && depthM > 0;
    }

    // equals and hashCode written out as the record would make them (every component, doubles
    // by Double.compare): the generated ones are linked through method handles the first time
    // they run, some milliseconds of a short run's start each (RecordEqualityTest holds them to
    // every component)
    @Override
    public boolean equals(Object o) {
        return o == this || o instanceof Section x
                && Objects.equals(name, x.name)
                && Double.compare(areaM2, x.areaM2) == 0
                && Double.compare(inertiaM4, x.inertiaM4) == 0
                && Double.compare(depthM, x.depthM) == 0
                && Objects.equals(material, x.material)
                && Objects.equals(at, x.at);
    }

    @Override
    public int hashCode() {
        int h = Objects.hashCode(name);
        h = 31 * h + Double.hashCode(areaM2);
        h = 31 * h + Double.hashCode(inertiaM4);
        h = 31 * h + Double.hashCode(depthM);
        h = 31 * h + Objects.hashCode(material);
        h = 31 * h + Objects.hashCode(at);
        return h;
    }
}
