package plumbline.solve;

/**
 * How an engine turns one member's end forces, loads and end displacements into its solved
 * state (functions along the member and their peaks). The stiffness method uses the shared
 * {@link MemberResponse}; the force method writes its own closed form, so that the agreement
 * of the two covers the member mechanics. A test hands an engine a planted one through this
 * seam to show that the agreement check then fails.
 */
@FunctionalInterface
public interface MemberFunctions {

    /**
     * @param endForcesLocal {fx_i, fy_i, m_i, fx_j, fy_j, m_j} on the member, local axes (N, N*m)
     * @param actions        the member's loads, local axes
     * @param eiNm2          bending stiffness, NaN for a truss member without I
     * @param vStartM        transverse displacement of the start node, local y (m)
     * @param vEndM          transverse displacement of the end node, local y (m)
     */
    MemberSolution solve(double[] endForcesLocal, MemberActions actions, double eiNm2, double vStartM, double vEndM);

    /** The shared piecewise-polynomial functions and their peaks. */
    MemberFunctions SHARED = MemberSolution::of;
}
