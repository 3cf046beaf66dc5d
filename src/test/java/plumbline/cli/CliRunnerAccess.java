package plumbline.cli;

/** Lets tests of other packages run the command line in-process. */
public final class CliRunnerAccess {
    private CliRunnerAccess() {
    }

    public static String out(String... args) {
        return CliRunner.run(args).out();
    }

    public static String err(String... args) {
        return CliRunner.run(args).err();
    }
}
