package plumbline.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.concurrent.CompletableFuture;
import plumbline.io.OutputBatch;
import plumbline.model.InputException;
import plumbline.model.Problem;
import plumbline.report.Typeface;
import plumbline.review.DrawnLoadSets;
import plumbline.run.CheckInputs;
import plumbline.run.Checked;
import plumbline.run.Source;
import plumbline.solve.SideBySide;

/** The shared run of {@code check} and {@code solve}: read, analyse, review, write, exit code. */
final class Run {

    private Run() {
    }

    /** At most this many problems are printed; the rest are counted (a broken list can hold thousands). */
    static final int MAX_PROBLEMS_SHOWN = 50;

    static int inputProblems(InputException e, PrintWriter err) {
        List<Problem> ps = e.problems();
        for (int i = 0; i < Math.min(ps.size(), MAX_PROBLEMS_SHOWN); i++) err.println(ps.get(i));
        if (ps.size() > MAX_PROBLEMS_SHOWN) err.println("... and " + (ps.size() - MAX_PROBLEMS_SHOWN) + " more problems");
        err.println("plumbline: " + ps.size() + " input problem" + (ps.size() == 1 ? "" : "s")
                + "; nothing was analysed and no file was written");
        return Main.INPUT;
    }

    /** The model file and the claims files read from disk, validated. */
    static CheckInputs load(Path model, List<Path> claims) throws InputException {
        List<Source> claimFiles = new ArrayList<>();
        List<Problem> problems = new ArrayList<>();
        Source modelFile = Source.of(model);
        for (Path p : claims) {
            try {
                claimFiles.add(Source.of(p));
            } catch (InputException e) {
                problems.addAll(e.problems());
            }
        }
        if (!problems.isEmpty()) throw new InputException(problems);
        return CheckInputs.of(modelFile, claimFiles);
    }

    static int execute(RunOptions o, PrintWriter out, PrintWriter err) {
        Path json = o.json(), pdf = o.pdf(), figures = o.figures();
        CheckInputs in;
        try {
            in = load(o.model(), o.claims());
            // every output path is checked before any work, so a bad one costs no solve and writes nothing
            Map<String, Path> outputs = new LinkedHashMap<>();
            outputs.put("--json", json);
            outputs.put("--pdf", pdf);
            List<Path> inputFiles = new ArrayList<>();
            inputFiles.add(o.model());
            inputFiles.addAll(o.claims());
            OutputBatch.checkPaths(outputs, figures, inputFiles);
        } catch (InputException e) {
            return inputProblems(e, err);
        }
        if (pdf != null || figures != null) {
            // the report's fonts are read on the other core while the model is solved
            Thread fonts = new Thread(Typeface::warmUp, "font warm-up");
            fonts.setDaemon(true);
            fonts.start();
        }
        Checked c;
        try {
            c = Checked.of(in, o.method(), o.tolerance(), !o.checking());
        } catch (Checked.Refused e) {
            for (String line : e.lines()) err.println(line);
            return Main.INPUT;
        }
        // every output is made in full before any is written, then all are written together or none
        OutputBatch batch = new OutputBatch();
        Map<String, byte[]> pictures = null;
        try {
            boolean reportBeside = pdf != null && json != null && SideBySide.worth(in.model().members().size(), 2);
            // the results are written by two threads unless the report is drawn on the other core meanwhile
            if (json != null) batch.add(json, stream -> c.writeJson(stream, !reportBeside), "--json");
            if (reportBeside) {
                // a large model's report is drawn on the other core while its results are written (the
                // batch writes the JSON first, then waits for the report; nothing is placed until both are whole)
                CompletableFuture<byte[]> report = CompletableFuture.supplyAsync(() -> c.pdf(LocalDate.now()));
                batch.add(pdf, stream -> stream.write(SideBySide.joined(report)), "--pdf");
            } else if (pdf != null) {
                batch.add(pdf, c.pdf(LocalDate.now()), "--pdf");
            }
            if (figures != null) {
                pictures = c.figures(DrawnLoadSets.choose(c.review()).names());
                for (var p : pictures.entrySet()) batch.add(figures.resolve(p.getKey()), p.getValue(), "--figures");
            }
        } catch (InputException e) {
            return inputProblems(e, err);
        } catch (IOException e) {
            err.println("plumbline: cannot make the outputs: " + e.getMessage() + "; nothing was written");
            return Main.INTERNAL;
        }
        try {
            batch.commit();
        } catch (IOException e) {
            err.println("plumbline: cannot write the outputs (" + e.getClass().getSimpleName() + ": " + e.getMessage()
                    + "); nothing was written, and files of the same names were left as they were");
            return Main.INTERNAL;
        }
        out.print(c.console(!o.checking()));
        if (json != null) out.println("Results written to " + json);
        if (pdf != null) out.println("Report written to " + pdf);
        if (pictures != null) out.println(pictures.size() + " figures written to " + figures);
        return c.exitCode() == 1 ? Main.FLAGGED : Main.OK;
    }
}
