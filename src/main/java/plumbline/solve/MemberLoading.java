package plumbline.solve;

import java.util.Map;
import plumbline.model.LoadCase;
import plumbline.model.Model;

/**
 * How an engine reads the loads of a load case onto its members, in local axes. Both
 * engines use the shared {@link MemberActions#of(Model, LoadCase)}; the equilibrium check
 * resolves the same loads from the model by code of its own, so a slip here shows as an
 * imbalance. A test hands an engine a planted one through this seam.
 */
@FunctionalInterface
public interface MemberLoading {

    /** The local actions of load case {@code c} on every loaded member, by member name. */
    Map<String, MemberActions> of(Model model, LoadCase c);

    MemberLoading SHARED = MemberActions::of;
}
