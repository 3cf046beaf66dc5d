package plumbline.cli;

import java.io.PrintWriter;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.function.Supplier;
import picocli.CommandLine.Command;
import picocli.CommandLine;
import plumbline.report.ResultsTree;

/**
 * Entry point. Exit codes (format reference, src/site/markdown/formats.md section 6): 0 every claim ok, 1 a claim marginal or
 * mismatched or the model unstable, 2 invalid input, 3 internal error.
 */
@Command(name = "plumbline", mixinStandardHelpOptions = true, versionProvider = Main.Version.class,
        description = "Independent check of plane frame, beam and truss models and of the results claimed for them.",
        // the subcommands are added in commandLine(), only the one asked for when it is named
        subcommands = {})
public final class Main implements Runnable {

    public static final int OK = 0, FLAGGED = 1, INPUT = 2, INTERNAL = 3;

    /** The version, from the one place it is written (the results' tool block). */
    static final class Version implements CommandLine.IVersionProvider {
        public String[] getVersion() {
            return new String[]{"plumbline " + ResultsTree.TOOL_VERSION};
        }
    }

    @CommandLine.Spec
    CommandLine.Model.CommandSpec spec;

    @Override
    public void run() {
        spec.commandLine().usage(spec.commandLine().getOut());
    }

    /** Every command, in the order the usage lists them. */
    private static Map<String, Supplier<Object>> commands() {
        Map<String, Supplier<Object>> all = new LinkedHashMap<>();
        all.put("check", CheckCommand::new);
        all.put("solve", SolveCommand::new);
        all.put("template", TemplateCommand::new);
        all.put("serve", ServeCommand::new);
        all.put("units", UnitsCommand::new);
        all.put("schema", SchemaCommand::new);
        all.put("bench", BenchCommand::new);
        all.put("help", CommandLine.HelpCommand::new);
        return all;
    }

    /**
     * The command line for these arguments. When they name a command, only that command is
     * built (picocli reads every command's annotations when it is added, a tenth of a short
     * run's time); for help, usage and a mistyped command, all are, so that help and the
     * suggestions list every one.
     */
    static CommandLine commandLine(String[] args) {
        CommandLine cl = new CommandLine(new Main());
        Map<String, Supplier<Object>> all = commands();
        String first = args.length > 0 ? args[0] : "";
        if (all.containsKey(first) && !first.equals("help")) cl.addSubcommand(first, all.get(first).get());
        else all.forEach((name, make) -> cl.addSubcommand(name, make.get()));
        return cl;
    }

    /** Runs the command line with the given writers; returns the exit code (never exits). */
    public static int run(String[] args, PrintWriter out, PrintWriter err) {
        CommandLine cl = commandLine(args);
        cl.setOut(out);
        cl.setErr(err);
        cl.setExecutionExceptionHandler((ex, line, parsed) -> {
            line.getErr().println("plumbline: internal error: " + ex);
            line.getErr().println("  please report this with the input files; no output file was written");
            return INTERNAL;
        });
        cl.setParameterExceptionHandler((ex, args1) -> {
            ex.getCommandLine().getErr().println("plumbline: " + ex.getMessage());
            ex.getCommandLine().getErr().println("  see: plumbline " + (ex.getCommandLine().getCommandName().equals("plumbline")
                    ? "" : ex.getCommandLine().getCommandName() + " ") + "--help");
            return INPUT;
        });
        int code = cl.execute(args);
        out.flush();
        err.flush();
        return code;
    }

    public static void main(String[] args) {
        System.setProperty("java.awt.headless", "true");
        // in the terminal's encoding, characters it cannot show written as [U+XXXX] (never '?')
        PrintWriter out = ConsoleText.writer(System.out, ConsoleText.terminal());
        PrintWriter err = ConsoleText.writer(System.err, ConsoleText.terminal());
        System.exit(run(args, out, err));
    }
}
