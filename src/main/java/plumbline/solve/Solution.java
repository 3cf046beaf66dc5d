package plumbline.solve;

import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.Map;

/**
 * The solved state of one load case or combination, all in SI and global axes: node
 * displacements {ux, uy, rz} (m, m, rad; rz is 0 at a node without rotational stiffness),
 * support reactions {Fx, Fy, Mz} (force and moment the support exerts on the structure),
 * member solutions, and the equilibrium residual relative to the loads.
 */
public record Solution(String name, Map<String, double[]> displacements, Map<String, double[]> reactions,
                       Map<String, MemberSolution> members, double equilibriumResidual) {

    public Solution {
        displacements = Collections.unmodifiableMap(new LinkedHashMap<>(displacements));
        reactions = Collections.unmodifiableMap(new LinkedHashMap<>(reactions));
        members = Collections.unmodifiableMap(new LinkedHashMap<>(members));
    }

    /**
     * Solutions are compared by identity: one is a computed state, used as a key when load
     * sets are superposed, and hashing its maps would cost as much as forming them.
     */
    @Override
    public boolean equals(Object o) {
        return this == o;
    }

    @Override
    public int hashCode() {
        return System.identityHashCode(this);
    }
}
