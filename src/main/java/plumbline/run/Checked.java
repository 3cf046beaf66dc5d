package plumbline.run;

import java.io.IOException;
import java.io.OutputStream;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.concurrent.CompletableFuture;
import plumbline.io.OutputFiles;
import plumbline.report.Console;
import plumbline.report.Figures;
import plumbline.report.PdfReport;
import plumbline.report.ResultsTree;
import plumbline.review.Analysis;
import plumbline.review.Review;
import plumbline.review.TolerancePolicy;
import plumbline.solve.Engine;
import plumbline.solve.SideBySide;
import plumbline.solve.force.ForceEngine;
import plumbline.solve.stiffness.StiffnessEngine;

/**
 * One model analysed and reviewed in memory, with what {@code check} and {@code solve} print
 * and write made from it. Nothing here touches a file: the command line writes these bytes,
 * the workbench serves them.
 */
public final class Checked {

    /** Results of models with more members than this are written as compact JSON. */
    public static final int COMPACT_JSON_ABOVE = 500;

    /** A run that cannot be honoured for this model (a usage problem, exit 2): what to tell the user. */
    public static final class Refused extends Exception {
        private final List<String> lines;

        Refused(List<String> lines) {
            super(String.join("; ", lines));
            this.lines = List.copyOf(lines);
        }

        /** The lines to print, each a whole sentence starting "plumbline: ". */
        public List<String> lines() {
            return lines;
        }
    }

    private final CheckInputs inputs;
    private final Analysis analysis;
    private final Review review;
    private final List<String> notes;
    private final String listing; // the results listed in 80 columns, when asked for at the analysis (else null)

    private Checked(CheckInputs inputs, Analysis analysis, Review review, List<String> notes, String listing) {
        this.inputs = inputs;
        this.analysis = analysis;
        this.review = review;
        this.notes = List.copyOf(notes);
        this.listing = listing;
    }

    static List<Engine> engines(Method method, boolean forceFits) {
        List<Engine> out = new ArrayList<>();
        if (method != Method.force) out.add(new StiffnessEngine());
        if (method == Method.force || (method == Method.both && forceFits)) out.add(new ForceEngine());
        return out;
    }

    /**
     * Solves the model by the asked engines and reviews the claims.
     *
     * @param toleranceRatio relative tolerance for claims that set none, NaN for the defaults by kind
     * @throws Refused when no asked engine can solve this model (the force method on a model too large for it)
     */
    public static Checked of(CheckInputs in, Method method, double toleranceRatio) throws Refused {
        return of(in, method, toleranceRatio, false);
    }

    /**
     * As {@link #of(CheckInputs, Method, double)}; with {@code listResults} the console's listing of
     * the results ({@code solve}) is formed as well, for a large model on the other core while the
     * claims are reviewed (it needs the analysis alone).
     */
    public static Checked of(CheckInputs in, Method method, double toleranceRatio, boolean listResults) throws Refused {
        String tooLarge = ForceEngine.tooLarge(in.model());
        if (method == Method.force && tooLarge != null) {
            throw new Refused(List.of("plumbline: --method force: " + tooLarge
                    + "; use --method stiffness or both (nothing was written)"));
        }
        List<Engine> engines = engines(method, tooLarge == null);
        Analysis a = Analysis.of(in.model(), engines);
        List<String> notes = new ArrayList<>();
        if (method == Method.both && tooLarge != null) {
            notes.add("force method not run: " + tooLarge + "; the results are the stiffness method's alone, unconfirmed by a second method");
        }
        if (!a.engines().isEmpty() && a.solutions().isEmpty() && a.stable()) {
            List<String> lines = new ArrayList<>();
            for (var e : a.engines().values()) lines.add("plumbline: " + e.engine() + " method not run: " + e.instability());
            lines.add("plumbline: --method " + method + ": no requested method solved this model; nothing was written "
                    + "(try --method stiffness)");
            throw new Refused(lines);
        }
        // the diagnosis re-solves variants of the model with the check's own stiffness engine, so a variant
        // that changes only loads reuses the check's factorization
        Engine variants = engines.stream().filter(e -> e instanceof StiffnessEngine).findFirst().orElseGet(StiffnessEngine::new);
        CompletableFuture<String> listing = !listResults ? CompletableFuture.completedFuture(null)
                : SideBySide.worth(in.model().members().size(), a.loadSets().size())
                ? CompletableFuture.supplyAsync(() -> Console.results(a))
                : CompletableFuture.completedFuture(Console.results(a));
        Review r = Review.of(a, new TolerancePolicy(toleranceRatio), variants);
        for (var e : a.engines().values()) {
            if (e.declined()) notes.add(e.engine() + " method not run: " + e.instability() + "; the results are the other method's alone");
        }
        return new Checked(in, a, r, notes, SideBySide.joined(listing));
    }

    /**
     * Reads a tolerance written as "5%" or "0.05" as the fraction 0.05.
     *
     * @throws IllegalArgumentException saying what was expected
     */
    public static double toleranceRatio(String written) {
        String v = written.trim();
        double d;
        try {
            d = v.endsWith("%") ? Double.parseDouble(v.substring(0, v.length() - 1).trim()) / 100 : Double.parseDouble(v);
        } catch (NumberFormatException e) {
            throw new IllegalArgumentException("'" + written + "' is not a tolerance; expected e.g. 5% or 0.05");
        }
        if (!(d >= 0 && d < 1)) throw new IllegalArgumentException("'" + written + "' is out of range; expected 0% to 100%");
        return d;
    }

    public Review review() {
        return review;
    }

    public CheckInputs inputs() {
        return inputs;
    }

    /** Notes every output carries (an engine not run, and why). */
    public List<String> notes() {
        return notes;
    }

    /** The agreement of the two methods (largest relative difference), null with one method. */
    public Double agreement() {
        return review.safeguards().agreement();
    }

    /** 0 every claim ok, 1 a claim flagged or the model unstable (format reference section 6). */
    public int exitCode() {
        return review.verdict().flagged ? 1 : 0;
    }

    private ResultsTree.Inputs recorded() {
        return new ResultsTree.Inputs(inputs.names(), inputs.sha256());
    }

    /** The results JSON (format reference section 5), indented unless the model is large. */
    public void writeJson(OutputStream out) throws IOException {
        writeJson(out, false);
    }

    /**
     * The results JSON; with {@code otherCoreFree} the results of a large model are written by
     * two threads (the same bytes; nothing else is using the machine's other core).
     */
    public void writeJson(OutputStream out, boolean otherCoreFree) throws IOException {
        Map<String, Object> tree = ResultsTree.of(review, recorded(), analysis.primaryEngine(), agreement());
        tree.put("notes", notes);
        // large results are written compact: indentation would double a file of many megabytes
        int members = inputs.model().members().size();
        OutputFiles.json(tree, members <= COMPACT_JSON_ABOVE,
                otherCoreFree && SideBySide.worth(members, analysis.loadSets().size()), out);
    }

    /** The PDF discrepancy report, dated {@code date}. */
    public byte[] pdf(LocalDate date) {
        return PdfReport.render(review, recorded(), agreement(), notes, date);
    }

    /** The report's drawings of the named load sets as PNG files, by file name. */
    public Map<String, byte[]> figures(List<String> loadSets) throws IOException {
        return Figures.render(review, loadSets);
    }

    /** What the console shows: the summary, the full results when {@code listAll}, and the notes. */
    public String console(boolean listAll) {
        String names = String.join(" and ", analysis.solutions().keySet()) + (analysis.solutions().size() == 1 ? " method" : " methods");
        StringBuilder s = new StringBuilder(Console.summary(review, analysis.solutions().isEmpty() ? "none" : names, agreement()));
        if (listAll) s.append(listing != null ? listing : Console.results(analysis));
        for (String n : notes) s.append(Console.wrap("Note: " + n, "  "));
        return s.toString();
    }
}
