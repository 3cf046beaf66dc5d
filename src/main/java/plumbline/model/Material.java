package plumbline.model;

import java.util.Objects;

/** Linear elastic material: E in Pa, weight density in N/m3, thermal expansion in 1/K. */
public record Material(String name, double ePa, double weightDensityNPerM3, double alphaPerK, SourceRef at) {

    // equals and hashCode written out as the record would make them (every component, doubles
    // by Double.compare): the generated ones are linked through method handles the first time
    // they run, some milliseconds of a short run's start each (RecordEqualityTest holds them to
    // every component)
    @Override
    public boolean equals(Object o) {
        return o == this || o instanceof Material x
                && Objects.equals(name, x.name)
                && Double.compare(ePa, x.ePa) == 0
                && Double.compare(weightDensityNPerM3, x.weightDensityNPerM3) == 0
                && Double.compare(alphaPerK, x.alphaPerK) == 0
                && Objects.equals(at, x.at);
    }

    @Override
    public int hashCode() {
        int h = Objects.hashCode(name);
        h = 31 * h + Double.hashCode(ePa);
        h = 31 * h + Double.hashCode(weightDensityNPerM3);
        h = 31 * h + Double.hashCode(alphaPerK);
        h = 31 * h + Objects.hashCode(at);
        return h;
    }
}
