package plumbline.report;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import plumbline.model.Model;
import plumbline.review.ClaimResult;
import plumbline.review.Review;
import plumbline.units.UnitSystem;

/**
 * Every claim as the report's claims table shows it, as text: the values to the same
 * decimals with their units, the difference (relative, or in units where the absolute floor
 * governs: a claimed zero against rounding is not "100%"), the tolerance it was judged by
 * and the diagnosis. For the workbench, so that the page prints what the report prints.
 */
public final class ClaimLines {

    private ClaimLines() {
    }

    public static List<Map<String, Object>> of(Review review) {
        Model m = review.analysis().model();
        UnitSystem u = m.units();
        List<Map<String, Object>> out = new ArrayList<>();
        for (ClaimResult c : review.claims()) {
            String[] pair = Shown.pair(m, c);
            Map<String, Object> row = new LinkedHashMap<>();
            row.put("id", c.claim().id());
            row.put("status", c.status().word);
            row.put("item", c.claim().item().word);
            row.put("name", c.claim().name());
            row.put("quantity", Console.quantityLabel(c.claim(), u));
            row.put("combo", c.claim().combo());
            String written = Console.asWritten(c.claim(), u);
            row.put("claimed", pair[0] + (written.isEmpty() ? "" : " (" + written + ")"));
            row.put("stiffness", pair[1]);
            row.put("force", Double.isFinite(c.computedForce()) ? pair[2] : "not run");
            row.put("difference", Shown.difference(u, c));
            row.put("tolerance", Shown.tolerance(u, c));
            row.put("diagnosis", c.diagnosis() == null ? "" : c.diagnosis());
            row.put("source", c.claimsFile() + ":" + c.claim().at().line());
            out.add(row);
        }
        return out;
    }
}
