package plumbline.cli;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.concurrent.Callable;
import java.util.concurrent.CountDownLatch;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;
import plumbline.serve.Workbench;

@Command(name = "serve", mixinStandardHelpOptions = true,
        description = "Open the workbench: a page in your browser to type the model, see it drawn, paste the claims and check. "
                + "Listens on 127.0.0.1 only; stop it with Ctrl-C.")
final class ServeCommand implements Callable<Integer> {

    @Spec
    CommandSpec spec;

    @Option(names = "--port", paramLabel = "PORT", defaultValue = "0",
            description = "the port to listen on (default: a free one, printed)")
    int port;

    @Option(names = "--folder", paramLabel = "DIR", defaultValue = ".",
            description = "the folder whose model and claims files the page may open and save (default: the current one)")
    Path folder;

    @Override
    public Integer call() throws IOException, InterruptedException {
        var out = spec.commandLine().getOut();
        var err = spec.commandLine().getErr();
        if (port < 0 || port > 65535) {
            err.println("plumbline: --port: " + port + " is not a port; expected 0 (a free one) to 65535");
            return Main.INPUT;
        }
        if (!Files.isDirectory(folder)) {
            err.println("plumbline: --folder: " + folder + " is not a folder");
            return Main.INPUT;
        }
        Workbench w;
        try {
            w = Workbench.start(folder, port);
        } catch (IOException e) {
            err.println("plumbline: --port " + port + ": cannot listen (" + e.getMessage() + "); try another port or 0");
            return Main.INPUT;
        }
        CountDownLatch stopped = new CountDownLatch(1);
        Runtime.getRuntime().addShutdownHook(new Thread(() -> {
            w.close();
            out.println("Workbench stopped; the port is free.");
            out.flush();
            stopped.countDown();
        }, "workbench stop"));
        out.println("Workbench for the files in " + folder.toRealPath());
        out.println("Open this address in a browser (it holds the access key; keep it private):");
        out.println("  " + w.address());
        out.println("Listening on 127.0.0.1 only. Press Ctrl-C to stop.");
        out.flush();
        stopped.await();
        return Main.OK;
    }
}
