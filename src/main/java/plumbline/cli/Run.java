package plumbline.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import plumbline.io.OutputBatch;
import plumbline.io.OutputFiles;
import plumbline.model.InputException;
import plumbline.model.Problem;
import plumbline.report.Console;
import plumbline.report.Figures;
import plumbline.report.PdfReport;
import plumbline.report.ResultsTree;
import plumbline.report.Typeface;
import plumbline.review.Analysis;
import plumbline.review.DrawnLoadSets;
import plumbline.review.Review;
import plumbline.review.TolerancePolicy;
import plumbline.solve.Engine;
import plumbline.solve.force.ForceEngine;
import plumbline.solve.stiffness.StiffnessEngine;

/** The shared run of {@code check} and {@code solve}: read, analyse, review, write, exit code. */
final class Run {

    private Run() {
    }

    static List<Engine> engines(Method method, boolean forceFits) {
        List<Engine> out = new ArrayList<>();
        if (method != Method.force) out.add(new StiffnessEngine());
        if (method == Method.force || (method == Method.both && forceFits)) out.add(new ForceEngine());
        return out;
    }

    /** Results of models with more members than this are written as compact JSON. */
    static final int COMPACT_JSON_ABOVE = 500;

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

    static int execute(RunOptions o, PrintWriter out, PrintWriter err) {
        Path json = o.json(), pdf = o.pdf(), figures = o.figures();
        Method method = o.method();
        Inputs in;
        try {
            in = Inputs.load(o.model(), o.claims());
            // every output path is checked before any work, so a bad one costs no solve and writes nothing
            Map<String, Path> outputs = new LinkedHashMap<>();
            outputs.put("--json", json);
            outputs.put("--pdf", pdf);
            OutputBatch.checkPaths(outputs, figures, in.files);
        } catch (InputException e) {
            return inputProblems(e, err);
        }
        if (pdf != null || figures != null) {
            // the report's fonts are read on the other core while the model is solved
            Thread fonts = new Thread(Typeface::warmUp, "font warm-up");
            fonts.setDaemon(true);
            fonts.start();
        }
        String tooLarge = ForceEngine.tooLarge(in.model);
        if (method == Method.force && tooLarge != null) {
            // the request cannot be honoured for this model: a usage problem, not an internal error
            err.println("plumbline: --method force: " + tooLarge + "; use --method stiffness or both (nothing was written)");
            return Main.INPUT;
        }
        Analysis a = Analysis.of(in.model, engines(method, tooLarge == null));
        List<String> notes = new ArrayList<>();
        if (method == Method.both && tooLarge != null) {
            notes.add("force method not run: " + tooLarge + "; the results are the stiffness method's alone, unconfirmed by a second method");
        }
        if (!a.engines().isEmpty() && a.solutions().isEmpty() && a.stable()) {
            for (var e : a.engines().values()) err.println("plumbline: " + e.engine() + " method not run: " + e.instability());
            err.println("plumbline: --method " + method + ": no requested method solved this model; nothing was written "
                    + "(try --method stiffness)");
            return Main.INPUT;
        }
        Review r = Review.of(a, new TolerancePolicy(o.tolerance()), new StiffnessEngine());
        String shown = a.primaryEngine();
        Double agreement = r.safeguards().agreement();
        for (var e : a.engines().values()) {
            if (e.declined()) notes.add(e.engine() + " method not run: " + e.instability() + "; the results are the other method's alone");
        }
        // every output is made in full before any is written, then all are written together or none
        OutputBatch batch = new OutputBatch();
        Map<String, byte[]> pictures = null;
        try {
            if (json != null) {
                Map<String, Object> tree = ResultsTree.of(r, new ResultsTree.Inputs(in.names(), in.sha256()), shown, agreement);
                tree.put("notes", notes);
                // large results are written compact: indentation would double a file of many megabytes
                boolean indent = in.model.members().size() <= COMPACT_JSON_ABOVE;
                batch.add(json, stream -> OutputFiles.json(tree, indent, stream), "--json");
            }
            if (pdf != null) {
                batch.add(pdf, PdfReport.render(r, new ResultsTree.Inputs(in.names(), in.sha256()), agreement, notes,
                        LocalDate.now()), "--pdf");
            }
            if (figures != null) {
                pictures = Figures.render(r, DrawnLoadSets.choose(r).names());
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
        String names = String.join(" and ", a.solutions().keySet()) + (a.solutions().size() == 1 ? " method" : " methods");
        out.print(Console.summary(r, a.solutions().isEmpty() ? "none" : names, agreement));
        if (!o.checking()) out.print(Console.results(r));
        for (String n : notes) out.print(Console.wrap("Note: " + n, "  "));
        if (json != null) out.println("Results written to " + json);
        if (pdf != null) out.println("Report written to " + pdf);
        if (pictures != null) out.println(pictures.size() + " figures written to " + figures);
        return r.verdict().flagged ? Main.FLAGGED : Main.OK;
    }
}
