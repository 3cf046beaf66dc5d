package plumbline.cli;

import java.util.Locale;
import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;
import plumbline.units.Unit;
import plumbline.units.Units;

@Command(name = "units", mixinStandardHelpOptions = true, description = "List the unit symbols a model may use.")
final class UnitsCommand implements Callable<Integer> {

    @Spec
    CommandSpec spec;

    @Override
    public Integer call() {
        var out = spec.commandLine().getOut();
        out.println("Unit symbols (combine with * . - and /, powers as ^2 or a trailing digit:");
        out.println("kN*m, kip-ft, kN/m2, mm^4, in4, kN*m/rad, 1.2e-5 /degC)");
        out.println();
        out.printf(Locale.ROOT, "%-6s %-32s %s%n", "symbol", "dimension", "in SI");
        for (Unit u : Units.listed()) {
            out.printf(Locale.ROOT, "%-6s %-32s %.10g%n", u.symbol(), u.dimension().describe(), u.toInternal());
        }
        out.println();
        out.println("A bare number is in the file's units: {force, length} and their products.");
        out.println("A support's angle alone reads a bare number as degrees; rotations are in rad.");
        return Main.OK;
    }
}
