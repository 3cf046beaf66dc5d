package plumbline.model;

/** Linear elastic material: E in Pa, weight density in N/m3, thermal expansion in 1/K. */
public record Material(String name, double ePa, double weightDensityNPerM3, double alphaPerK, SourceRef at) {
}
