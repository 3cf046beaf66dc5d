package plumbline.cli;

import java.io.PrintWriter;
import java.io.StringWriter;

/** Runs the command line in-process and captures what it prints. */
public record CliRunner(int code, String out, String err) {
    public static CliRunner run(String... args) {
        StringWriter o = new StringWriter(), e = new StringWriter();
        int code = Main.run(args, new PrintWriter(o), new PrintWriter(e));
        return new CliRunner(code, o.toString(), e.toString());
    }
}
