package plumbline.cli;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;
import plumbline.model.InputException;
import plumbline.model.LimitState;
import plumbline.model.Member;
import plumbline.model.Model;
import plumbline.model.Support;
import plumbline.review.Analysis;
import plumbline.review.LoadSet;
import plumbline.statics.ClaimedEquilibrium;

@Command(name = "template", mixinStandardHelpOptions = true,
        description = "Print a claims skeleton for the model: every reaction component and member peak per combination, to fill in.")
final class TemplateCommand implements Callable<Integer> {

    @Spec
    CommandSpec spec;

    @Parameters(index = "0", paramLabel = "MODEL", description = "model file (.yaml, .yml or .json)")
    Path model;

    @Option(names = "--csv", description = "write the skeleton as CSV (the columns a spreadsheet exports) instead of YAML")
    boolean csv;

    /** One row of the skeleton: what is claimed, where, under which load set, and at which position ("" for none). */
    private record Row(String item, String name, String combo, List<String> quantities, String at) {
    }

    @Override
    public Integer call() {
        var out = spec.commandLine().getOut();
        Model m;
        try {
            m = Run.load(model, List.of()).model();
        } catch (InputException e) {
            return Run.inputProblems(e, spec.commandLine().getErr());
        }
        List<Row> rows = rows(m);
        String units = "{force: " + m.units().force().symbol() + ", length: " + m.units().length().symbol() + "}";
        String conventions = "{reactions: on-structure, moment: sagging-positive, axial: tension-positive}";
        if (csv) {
            // only 'key: value' lines may stand before the header (they are read as YAML)
            out.println("# source: ~");
            out.println("# units: " + units);
            out.println("# conventions: " + conventions);
            out.println("item,combo,name,quantity,value,unit,tolerance,at");
            for (Row r : rows) {
                for (String qty : r.quantities) out.println(String.join(",", r.item, csvField(r.combo), csvField(r.name), qty, "", "", "", r.at));
            }
            return Main.OK;
        }
        out.println("# Claims skeleton for " + model.getFileName() + ": replace each ~ with the claimed value;");
        out.println("# a ~ left in place is not claimed. A deflection may be written as a span ratio (L/360).");
        out.println("# Then run:  plumbline check " + model.getFileName() + " --claims THIS_FILE");
        out.println("claims:");
        out.println("  source: ~   # e.g. the originator's calc package and revision");
        out.println("  units: " + units);
        out.println("  conventions: " + conventions + "   # as the source writes them");
        out.println("  # tolerance: {reaction: 3%, member: 5%, deflection: 10%}");
        for (String item : List.of("reaction", "member")) {
            out.println(item.equals("reaction") ? "  reactions:" : "  members:");
            for (Row r : rows) {
                if (!r.item.equals(item)) continue;
                StringBuilder sb = new StringBuilder("    - {" + (item.equals("reaction") ? "node: " : "member: ") + q(r.name)
                        + ", combo: " + q(r.combo) + (r.at.isEmpty() ? "" : ", at: " + r.at));
                for (String qty : r.quantities) sb.append(", ").append(qty).append(": ~");
                out.println(sb.append("}"));
            }
        }
        return Main.OK;
    }

    /**
     * Every kind of claim the format takes, for every load set and envelope: reaction
     * components (with their bounds under pattern loading or an envelope), member peaks, end
     * values, and values at midspan.
     */
    private static List<Row> rows(Model m) {
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

    private static String csvField(String s) {
        return s.contains(",") || s.contains("\"") ? "\"" + s.replace("\"", "\"\"") + "\"" : s;
    }

    private static String q(String name) {
        return name.matches("[A-Za-z_][A-Za-z0-9_.\\-]*") ? name : "'" + name.replace("'", "''") + "'";
    }
}
