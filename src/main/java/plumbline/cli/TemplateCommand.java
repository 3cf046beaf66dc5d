package plumbline.cli;

import java.nio.file.Path;
import java.util.List;
import plumbline.run.ClaimTemplate;
import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;
import plumbline.model.InputException;
import plumbline.model.Model;

@Command(name = "template", mixinStandardHelpOptions = true,
        description = "Print a claims skeleton for the model: every reaction component and member peak per combination, to fill in.")
final class TemplateCommand implements Callable<Integer> {

    @Spec
    CommandSpec spec;

    @Parameters(index = "0", paramLabel = "MODEL", description = "model file (.yaml, .yml or .json)")
    Path model;

    @Option(names = "--csv", description = "write the skeleton as CSV (the columns a spreadsheet exports) instead of YAML")
    boolean csv;

    @Override
    public Integer call() {
        var out = spec.commandLine().getOut();
        Model m;
        try {
            m = Run.load(model, List.of()).model();
        } catch (InputException e) {
            return Run.inputProblems(e, spec.commandLine().getErr());
        }
        List<ClaimTemplate.Row> rows = ClaimTemplate.rows(m);
        String units = "{force: " + m.units().force().symbol() + ", length: " + m.units().length().symbol() + "}";
        String conventions = "{reactions: on-structure, moment: sagging-positive, axial: tension-positive}";
        if (csv) {
            // only 'key: value' lines may stand before the header (they are read as YAML)
            out.println("# source: ~");
            out.println("# units: " + units);
            out.println("# conventions: " + conventions);
            out.println("item,combo,name,quantity,value,unit,tolerance,at");
            for (ClaimTemplate.Row r : rows) {
                for (String qty : r.quantities()) out.println(String.join(",", r.item(), csvField(r.combo()), csvField(r.name()), qty, "", "", "", r.at()));
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
            for (ClaimTemplate.Row r : rows) {
                if (!r.item().equals(item)) continue;
                StringBuilder sb = new StringBuilder("    - {" + (item.equals("reaction") ? "node: " : "member: ") + q(r.name())
                        + ", combo: " + q(r.combo()) + (r.at().isEmpty() ? "" : ", at: " + r.at()));
                for (String qty : r.quantities()) sb.append(", ").append(qty).append(": ~");
                out.println(sb.append("}"));
            }
        }
        return Main.OK;
    }

    private static String csvField(String s) {
        return s.contains(",") || s.contains("\"") ? "\"" + s.replace("\"", "\"\"") + "\"" : s;
    }

    private static String q(String name) {
        return name.matches("[A-Za-z_][A-Za-z0-9_.\\-]*") ? name : "'" + name.replace("'", "''") + "'";
    }
}
