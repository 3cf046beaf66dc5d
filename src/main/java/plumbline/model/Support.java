package plumbline.model;

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
}
