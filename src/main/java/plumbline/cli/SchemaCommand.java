package plumbline.cli;

import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;

@Command(name = "schema", mixinStandardHelpOptions = true, description = "Print the JSON Schema of the results file (--json).")
final class SchemaCommand implements Callable<Integer> {

    static final String RESOURCE = "/plumbline/results.schema.json";

    @Spec
    CommandSpec spec;

    static String text() throws IOException {
        try (InputStream in = SchemaCommand.class.getResourceAsStream(RESOURCE)) {
            if (in == null) throw new IOException("schema resource missing");
            return new String(in.readAllBytes(), StandardCharsets.UTF_8);
        }
    }

    @Override
    public Integer call() throws IOException {
        spec.commandLine().getOut().print(text());
        return Main.OK;
    }
}
