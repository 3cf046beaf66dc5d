package plumbline.cli;

import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;

@Command(name = "solve", mixinStandardHelpOptions = true,
        description = "Solve the model and print or write its reactions, member peaks and displacements.")
final class SolveCommand implements Callable<Integer> {

    enum Method { stiffness, force, both }

    @Spec
    CommandSpec spec;

    @Parameters(index = "0", paramLabel = "MODEL", description = "model file (.yaml, .yml or .json)")
    Path model;

    @Option(names = "--method", paramLabel = "METHOD", defaultValue = "both",
            description = "stiffness, force or both (default: ${DEFAULT-VALUE}); with both the JSON reports their agreement")
    Method method;

    @Option(names = "--json", paramLabel = "FILE", description = "write the results as JSON (FORMAT.md section 5)")
    Path json;

    @Override
    public Integer call() {
        return Run.execute(model, List.of(), json, null, null, method.name(), Double.NaN, false, spec.commandLine().getOut(),
                spec.commandLine().getErr());
    }
}
