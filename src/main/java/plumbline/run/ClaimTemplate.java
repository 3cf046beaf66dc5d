package plumbline.run;

import java.util.ArrayList;
import java.util.List;
import plumbline.model.LimitState;
import plumbline.model.Member;
import plumbline.model.Model;
import plumbline.model.Support;
import plumbline.review.Analysis;
import plumbline.review.LoadSet;
import plumbline.statics.ClaimedEquilibrium;

/** The rows of a claims skeleton for a model: what a checker may claim, to be filled in. */
public final class ClaimTemplate {

    private ClaimTemplate() {
    }

    /** One row of the skeleton: what is claimed, where, under which load set, and at which position ("" for none). */
    public record Row(String item, String name, String combo, List<String> quantities, String at) {
        public Row {
            quantities = List.copyOf(quantities);
        }
    }

    /**
     * Every kind of claim the format takes, for every load set and envelope: reaction
     * components (with their bounds under pattern loading or an envelope), member peaks, end
     * values, and values at midspan.
     */
    public static List<Row> rows(Model m) {
        List<String> sets = new ArrayList<>();
        List<LoadSet> loadSets = Analysis.loadSets(m);
        for (LoadSet s : loadSets) sets.add(s.name());
        if (loadSets.stream().anyMatch(LoadSet::combination)) sets.add(LimitState.ENVELOPE);
        for (LimitState st : List.of(LimitState.ULS, LimitState.SLS)) {
            if (loadSets.stream().anyMatch(s -> s.combination() && s.limitState() == st)) sets.add(LimitState.ENVELOPE + ":" + st);
        }
        List<Row> rows = new ArrayList<>();
        for (String set : sets) {
            boolean bounds = LimitState.isEnvelope(set) || loadSets.stream().anyMatch(s -> s.name().equals(set)
                    && s.factors().keySet().stream().anyMatch(c -> m.loadCase(c).pattern()));
            for (Support sup : m.supports().values()) {
                String[] comp = {"Fx", "Fy", "Mz"};
                boolean[] exerts = ClaimedEquilibrium.globalComponents(sup);
                List<String> qs = new ArrayList<>();
                for (int d = 0; d < 3; d++) {
                    if (!exerts[d]) continue;
                    if (bounds) {
                        qs.add(comp[d] + "_max");
                        qs.add(comp[d] + "_min");
                    } else {
                        qs.add(comp[d]);
                    }
                }
                rows.add(new Row("reaction", sup.node(), set, qs, ""));
            }
            for (Member mem : m.members().values()) {
                if (mem.truss()) {
                    rows.add(new Row("member", mem.name(), set, List.of("N_max", "N_min"), ""));
                    continue;
                }
                rows.add(new Row("member", mem.name(), set, List.of("N_abs", "V_abs", "M_max", "M_min", "deflection"), ""));
                rows.add(new Row("member", mem.name(), set, List.of("M_start", "M_end", "V_start", "V_end"), ""));
                rows.add(new Row("member", mem.name(), set, List.of("M", "deflection"), "50%"));
            }
        }
        return rows;
    }

}
