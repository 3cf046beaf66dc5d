package plumbline.cli;

import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;
import plumbline.model.InputException;
import plumbline.model.Member;
import plumbline.model.Model;
import plumbline.model.Problem;
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

    @Override
    public Integer call() {
        var out = spec.commandLine().getOut();
        Model m;
        try {
            m = Inputs.load(model, List.of()).model;
        } catch (InputException e) {
            return Run.inputProblems(e, spec.commandLine().getErr());
        }
        out.println("# Claims skeleton for " + model.getFileName() + ": replace each ~ with the claimed value;");
        out.println("# a ~ left in place is not claimed. Then run:");
        out.println("#   plumbline check " + model.getFileName() + " --claims THIS_FILE");
        out.println("claims:");
        out.println("  source: ~   # e.g. the originator's calc package and revision");
        out.println("  units: {force: " + m.units().force().symbol() + ", length: " + m.units().length().symbol() + "}");
        out.println("  reactions:");
        List<LoadSet> sets = Analysis.loadSets(m);
        for (LoadSet s : sets) {
            for (Support sup : m.supports().values()) {
                StringBuilder sb = new StringBuilder("    - {node: " + q(sup.node()) + ", combo: " + q(s.name()));
                String[] comp = {"Fx", "Fy", "Mz"};
                boolean[] exerts = ClaimedEquilibrium.globalComponents(sup);
                for (int d = 0; d < 3; d++) if (exerts[d]) sb.append(", ").append(comp[d]).append(": ~");
                out.println(sb.append("}"));
            }
        }
        out.println("  members:");
        for (LoadSet s : sets) {
            for (Member mem : m.members().values()) {
                out.println("    - {member: " + q(mem.name()) + ", combo: " + q(s.name()) + (mem.truss() ? ", N_max: ~, N_min: ~}"
                        : ", N_abs: ~, V_abs: ~, M_max: ~, M_min: ~, deflection: ~}"));
            }
        }
        return Main.OK;
    }

    private static String q(String name) {
        return name.matches("[A-Za-z_][A-Za-z0-9_.\\-]*") ? name : "'" + name.replace("'", "''") + "'";
    }
}
