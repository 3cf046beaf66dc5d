package plumbline.cli;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import plumbline.run.Method;
import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;

@Command(name = "check", mixinStandardHelpOptions = true,
        description = "Re-solve the model and compare every claimed reaction, member peak and displacement.")
final class CheckCommand implements Callable<Integer> {

    @Spec
    CommandSpec spec;

    @Mixin
    ModelOptions common;

    @Option(names = "--claims", paramLabel = "FILE", arity = "1..*",
            description = "claims file(s): YAML, JSON or CSV (item,combo,name,quantity,value,unit); the model's own claims: are read too")
    List<Path> claims = new ArrayList<>();

    @Option(names = "--pdf", paramLabel = "FILE", description = "write the PDF discrepancy report")
    Path pdf;

    @Option(names = "--figures", paramLabel = "DIR",
            description = "also write the report's drawings as PNG files into this existing folder")
    Path figures;

    @Option(names = "--tolerance", paramLabel = "PCT", converter = PercentConverter.class,
            description = "relative tolerance for every claim whose claim and claims file set none, e.g. 5%% (default: by kind, reactions 3%%, "
                    + "member forces 5%%, deflections 10%%)")
    Double tolerance;

    @Override
    public Integer call() {
        var out = spec.commandLine().getOut();
        var err = spec.commandLine().getErr();
        return Run.execute(new RunOptions(common.model, claims, common.json, pdf, figures, Method.both,
                tolerance == null ? Double.NaN : tolerance, true), out, err);
    }
}
