package plumbline.model;

import java.util.Objects;

/**
 * Restraint of one node. The restraint axes of ux and uy are the global axes turned
 * counter-clockwise by {@code angleRad} (an inclined roller restrains uy of those axes).
 * Spring stiffnesses act along the same axes: N/m for ux, uy and N*m/rad for rz (0 = none).
 */
public record Support(String node, boolean fixUx, boolean fixUy, boolean fixRz, double angleRad,
                      double springUxNPerM, double springUyNPerM, double springRzNmPerRad, SourceRef at) {

    public boolean fixed(int dof) {
        return dof == 0 ? fixUx : dof == 1 ? fixUy : fixRz;
    }

    public double spring(int dof) {
        return dof == 0 ? springUxNPerM : dof == 1 ? springUyNPerM : springRzNmPerRad;
    }

    /** Restrained or sprung in direction dof (0 ux, 1 uy, 2 rz): a reaction component exists. */
    public boolean reacts(int dof) {
        return fixed(dof) || spring(dof) > 0;
    }

    // equals and hashCode written out as the record would make them (every component, doubles
    // by Double.compare): the generated ones are linked through method handles the first time
    // they run, some milliseconds of a short run's start each (RecordEqualityTest holds them to
    // every component)
    @Override
    public boolean equals(Object o) {
        return o == this || o instanceof Support x
                && Objects.equals(node, x.node)
                && fixUx == x.fixUx
                && fixUy == x.fixUy
                && fixRz == x.fixRz
                && Double.compare(angleRad, x.angleRad) == 0
                && Double.compare(springUxNPerM, x.springUxNPerM) == 0
                && Double.compare(springUyNPerM, x.springUyNPerM) == 0
                && Double.compare(springRzNmPerRad, x.springRzNmPerRad) == 0
                && Objects.equals(at, x.at);
    }

    @Override
    public int hashCode() {
        int h = Objects.hashCode(node);
        h = 31 * h + Boolean.hashCode(fixUx);
        h = 31 * h + Boolean.hashCode(fixUy);
        h = 31 * h + Boolean.hashCode(fixRz);
        h = 31 * h + Double.hashCode(angleRad);
        h = 31 * h + Double.hashCode(springUxNPerM);
        h = 31 * h + Double.hashCode(springUyNPerM);
        h = 31 * h + Double.hashCode(springRzNmPerRad);
        h = 31 * h + Objects.hashCode(at);
        return h;
    }
}
