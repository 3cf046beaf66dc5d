package plumbline.validate;

import java.util.ArrayList;
import java.util.Collection;
import java.util.List;
import plumbline.model.Claim;
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

    public static List<Problem> check(Model m, Collection<String> loadSets, boolean hasCombinations) {
        List<Problem> out = new ArrayList<>();
        for (ClaimSet cs : m.claims()) {
            for (Claim c : cs.claims()) {
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
                if (c.combo().equals("envelope")) {
                    if (!hasCombinations) out.add(new Problem(c.at(), field + " combo", "envelope is over the combinations, and the model defines none; expected a combination"));
                } else if (!loadSets.contains(c.combo())) {
                    out.add(new Problem(c.at(), field + " combo", "unknown combination or load case '" + c.combo()
                            + "'; expected one of: " + String.join(", ", loadSets) + " or envelope"));
                }
            }
        }
        return out;
    }
}
