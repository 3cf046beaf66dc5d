package plumbline.cli;

import java.nio.file.Path;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/** The options every command that solves a model shares: the model file and the JSON results. */
final class ModelOptions {

    @Parameters(index = "0", paramLabel = "MODEL", description = "model file (.yaml, .yml or .json)")
    Path model;

    @Option(names = "--json", paramLabel = "FILE", description = "write the results as JSON (see the format reference, "
            + "src/site/markdown/formats.md)")
    Path json;
}
