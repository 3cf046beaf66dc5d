package plumbline.cli;

import java.util.List;
import plumbline.run.Method;
import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;

@Command(name = "solve", mixinStandardHelpOptions = true,
        description = "Solve the model and print or write its reactions, member peaks and displacements.")
final class SolveCommand implements Callable<Integer> {

    @Spec
    CommandSpec spec;

    @Mixin
    ModelOptions common;

    @Option(names = "--method", paramLabel = "METHOD", defaultValue = "both",
            description = "stiffness, force or both (default: ${DEFAULT-VALUE}); with both the JSON reports their agreement")
    Method method;

    @Override
    public Integer call() {
        return Run.execute(new RunOptions(common.model, List.of(), common.json, null, null, method, Double.NaN, false),
                spec.commandLine().getOut(), spec.commandLine().getErr());
    }
}
