package plumbline.solve;

import plumbline.model.Quantity;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Set;
import org.junit.jupiter.api.Test;
import plumbline.Models;
import plumbline.model.Model;
import plumbline.solve.force.ForceEngine;

/**
 * The force method's sparse path (self-stress states of the closed rings of the plane
 * drawing), which the tool takes above {@link ForceEngine#DENSE_LIMIT} equations, run on
 * every check case whatever its size, through the same contract as the other engines.
 */
class SparseForceEngineTest extends EngineContract {

    @Override
    Engine engine() {
        ForceEngine method = new ForceEngine();
        return new Engine() {
            public String name() {
                return method.name();
            }

            public MemberFunctions memberFunctions() {
                return method.memberFunctions();
            }

            public EngineResult solve(Model model) {
                return method.solveSparse(model);
            }
        };
    }

    /** Every check case is within the sparse path's reach: the list of those it declines is empty. */
    @Override
    Set<String> declines() {
        return Set.of();
    }

    /**
     * What the sparse path declines, by design (SparseForceMethod): a drawing whose members
     * cross (its rings cannot be read from the plane drawing). Declining is not instability:
     * the dense force method and the stiffness method still solve the model.
     */
    @Test
    void declinesCrossingMembersAndSaysWhy() {
        Model xBraced = Models.yaml(Models.HEAD + """
                nodes: {A: [0, 0], B: [4, 0], C: [4, 3], D: [0, 3]}
                supports: {A: pinned, B: pinned}
                members:
                  AB: {from: A, to: B, section: G, truss: true}
                  BC: {from: B, to: C, section: G, truss: true}
                  CD: {from: C, to: D, section: G, truss: true}
                  DA: {from: D, to: A, section: G, truss: true}
                  AC: {from: A, to: C, section: G, truss: true}
                  BD: {from: B, to: D, section: G, truss: true}
                loads: {H: {type: wind, node_loads: [{node: D, Fx: 10}]}}
                """);
        EngineResult sparse = engine().solve(xBraced);
        assertTrue(sparse.declined(), "declined");
        assertFalse(sparse.stable());
        assertTrue(sparse.instability().contains("crossing"), sparse.instability());
        EngineResult dense = new ForceEngine().solve(xBraced);
        assertTrue(dense.stable() && !dense.declined(), "the dense force method solves it");
        EngineResult stiffness = new plumbline.solve.stiffness.StiffnessEngine().solve(xBraced);
        for (String member : xBraced.members().keySet()) {
            double f = dense.cases().get("H").members().get(member).peaks().value(Quantity.N_MAX);
            double k = stiffness.cases().get("H").members().get(member).peaks().value(Quantity.N_MAX);
            assertEquals(k, f, 1e-9 * 10e3, member + " N by the dense force and the stiffness method");
        }
    }
}
