package plumbline.validate;

import java.util.ArrayList;
import java.util.Collection;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import plumbline.model.Claim;
import plumbline.model.LimitState;
import plumbline.model.ClaimSet;
import plumbline.model.Model;
import plumbline.model.Problem;

/**
 * Every claim must name something in the model: a node with a support (reactions), a
 * member, a node, and a combination, a load case or {@code envelope}.
 */
public final class ClaimCheck {

    private ClaimCheck() {
    }

    /**
     * Two claims of the same quantity at the same place under the same load set whose values
     * differ by more than this fraction of the larger contradict each other (rounding aside).
     */
    public static final double CONTRADICTION = 1e-9;

    /**
     * @param combinationStates the limit states of the model's combinations (NONE for one that does not say);
     *                          empty when it has none
     */
    public static List<Problem> check(Model m, Collection<String> loadSets, Set<LimitState> combinationStates) {
        List<Problem> out = new ArrayList<>();
        Map<String, Claim> first = new HashMap<>();
        for (ClaimSet cs : m.claims()) {
            for (Claim c : cs.claims()) {
                Claim before = first.putIfAbsent(c.id(), c);
                if (before != null && Math.abs(before.valueInternal() - c.valueInternal())
                        > CONTRADICTION * Math.max(Math.abs(before.valueInternal()), Math.abs(c.valueInternal()))) {
                    out.add(new Problem(c.at(), c.item().word + " " + c.name() + " " + c.quantity() + " " + c.combo(),
                            String.format(Locale.ROOT, "claimed %.6g %s here and %.6g %s at %s:%d; expected one value per "
                                    + "quantity (remove one of the two lines)", m.units().fromInternal(c.valueInternal(), c.dimension()),
                                    m.units().symbol(c.dimension()), m.units().fromInternal(before.valueInternal(), c.dimension()),
                                    m.units().symbol(c.dimension()), before.at().file(), before.at().line())));
                }
                String field = c.item().word + " " + c.name() + " " + c.quantity();
                switch (c.item()) {
                    case REACTION -> {
                        if (m.node(c.name()) == null) out.add(new Problem(c.at(), field, "unknown node '" + c.name() + "'; expected a supported node"));
                        else if (!m.supports().containsKey(c.name())) out.add(new Problem(c.at(), field, "node " + c.name()
                                + " has no support, so no reaction; expected one of: " + String.join(", ", m.supports().keySet())));
                    }
                    case DISPLACEMENT -> {
                        if (m.node(c.name()) == null) out.add(new Problem(c.at(), field, "unknown node '" + c.name() + "'; expected a node of the model"));
                    }
                    default -> {
                        if (m.member(c.name()) == null) out.add(new Problem(c.at(), field, "unknown member '" + c.name() + "'; expected a member of the model"));
                    }
                }
                LimitState state = LimitState.ofEnvelope(c.combo());
                if (state == LimitState.NONE) {
                    if (combinationStates.isEmpty()) out.add(new Problem(c.at(), field + " combo", "envelope is over the combinations, and the model defines none; expected a combination"));
                } else if (state != null) {
                    if (!combinationStates.contains(state)) {
                        out.add(new Problem(c.at(), field + " combo", c.combo() + " is over the " + state + " combinations, and "
                                + "the model has none; expected a combination with limit_state: " + state + ", or envelope"));
                    }
                } else if (!loadSets.contains(c.combo())) {
                    out.add(new Problem(c.at(), field + " combo", "unknown combination or load case '" + c.combo()
                            + "'; expected one of: " + String.join(", ", loadSets) + ", envelope, envelope:ULS or envelope:SLS"));
                }
            }
        }
        return out;
    }
}
