package plumbline.cli;

import java.lang.management.ManagementFactory;
import java.lang.management.MemoryPoolMXBean;
import java.lang.management.MemoryType;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;
import plumbline.bench.FrameGenerator;
import plumbline.io.ModelReader;
import plumbline.io.OutputFiles;
import plumbline.model.Model;
import plumbline.report.PdfReport;
import plumbline.report.ResultsTree;
import plumbline.review.Analysis;
import plumbline.review.Review;
import plumbline.review.TolerancePolicy;
import plumbline.solve.EngineResult;
import plumbline.solve.force.ForceEngine;
import plumbline.solve.stiffness.StiffnessEngine;
import plumbline.statics.Determinacy;

@Command(name = "bench", mixinStandardHelpOptions = true,
        description = "Time each stage on generated models (invented data, for measurement only) and print size against time and peak heap (of the check, and of the PDF report after it).")
final class BenchCommand implements Callable<Integer> {

    @Spec
    CommandSpec spec;

    @Option(names = "--kind", defaultValue = "frame", description = "frame (multi-bay multi-storey), truss or beam (default: ${DEFAULT-VALUE})")
    String kind;

    @Option(names = "--members", split = ",", defaultValue = "1000,2000,5000,10000",
            description = "approximate member counts (default: ${DEFAULT-VALUE})")
    List<Integer> sizes;

    @Option(names = "--repeat", defaultValue = "2", description = "runs per size; the fastest is shown (default: ${DEFAULT-VALUE})")
    int repeat;

    static String model(String kind, int members) {
        return switch (kind) {
            case "truss" -> FrameGenerator.truss(Math.max(2, members / 5));
            case "beam" -> FrameGenerator.beam(Math.max(1, members));
            default -> {
                int storeys = Math.max(1, (int) Math.round(Math.sqrt(members / 2.0)));
                int bays = Math.max(1, (int) Math.round((members / (double) storeys - 1) / 2));
                yield FrameGenerator.frame(bays, storeys);
            }
        };
    }

    private String forceNote;

    @Override
    public Integer call() throws Exception {
        var out = spec.commandLine().getOut();
        if (!List.of("frame", "truss", "beam").contains(kind)) {
            spec.commandLine().getErr().println("plumbline: --kind must be frame, truss or beam");
            return Main.INPUT;
        }
        out.printf(Locale.ROOT, "%s models; times in seconds (best of %d); peak heap in MiB%n", kind, repeat);
        out.printf(Locale.ROOT, "%8s %7s %7s %7s %7s %10s %7s %7s %7s%n", "members", "read", "statics", "stiff", "force", "check+json",
                "pdf", "heap", "pdfheap");
        List<double[]> rows = new ArrayList<>(); // {members, read, statics, stiff, force, check+json, pdf}
        for (int n : sizes) {
            String text = model(kind, n);
            double[] best = {1e9, 1e9, 1e9, 1e9, 1e9, 1e9};
            long heap = 0, pdfHeap = 0;
            int members = 0;
            for (int r = 0; r < repeat; r++) {
                System.gc();
                resetPeaks();
                long t0 = System.nanoTime();
                Model m = ModelReader.read("bench.yaml", text, true);
                long t1 = System.nanoTime();
                Determinacy.of(m);
                long t2 = System.nanoTime();
                EngineResult s = new StiffnessEngine().solve(m);
                long t3 = System.nanoTime();
                double force = Double.NaN;
                if (ForceEngine.tooLarge(m) == null) {
                    long f0 = System.nanoTime();
                    EngineResult f = new ForceEngine().solve(m);
                    if (f.stable()) force = (System.nanoTime() - f0) / 1e9;
                    else forceNote = f.instability();
                }
                long t4 = System.nanoTime();
                boolean both = ForceEngine.tooLarge(m) == null;
                Analysis a = Analysis.of(m, both ? List.of(new StiffnessEngine(), new ForceEngine()) : List.of(new StiffnessEngine()));
                Review rv = Review.of(a, TolerancePolicy.none());
                byte[] json = OutputFiles.json(ResultsTree.of(rv, new ResultsTree.Inputs(List.of("bench.yaml"), List.of("unreadable")),
                        a.primaryEngine(), null));
                long t5 = System.nanoTime();
                heap = Math.max(heap, peakHeap());
                resetPeaks();
                byte[] pdf = PdfReport.render(rv, new ResultsTree.Inputs(List.of("bench.yaml"), List.of("unreadable")),
                        null, List.of(), LocalDate.now());
                long t6 = System.nanoTime();
                if (pdf.length == 0) throw new IllegalStateException("no report");
                if (!s.stable() || json.length == 0) throw new IllegalStateException("benchmark model did not solve");
                members = m.members().size();
                double[] t = {(t1 - t0) / 1e9, (t2 - t1) / 1e9, (t3 - t2) / 1e9, force, (t5 - t4) / 1e9 + (t1 - t0) / 1e9, (t6 - t5) / 1e9};
                for (int k = 0; k < 6; k++) best[k] = Math.min(best[k], Double.isNaN(t[k]) ? 1e9 : t[k]);
                pdfHeap = Math.max(pdfHeap, peakHeap());
            }
            rows.add(new double[]{members, best[0], best[1], best[2], best[3], best[4], best[5]});
            out.printf(Locale.ROOT, "%8d %7.3f %7.3f %7.3f %7s %10.3f %7.3f %7d %7d%n", members, best[0], best[1], best[2],
                    best[3] >= 1e9 ? "not run" : String.format(Locale.ROOT, "%.3f", best[3]), best[4], best[5], heap >> 20,
                    pdfHeap >> 20);
        }
        if (rows.size() >= 2) out.println(growth(rows.get(0), rows.get(rows.size() - 1)));
        out.println("force: dense up to " + ForceEngine.DENSE_LIMIT + " node equations, then closed-ring self-stress states (sparse)");
        if (forceNote != null) out.println("force not run on some sizes: " + forceNote);
        return Main.OK;
    }

    /** Growth target of every stage from the smallest to the largest size (issue 17): time no worse than n^1.2. */
    static final double GROWTH_TARGET = 1.2;

    /**
     * The growth exponent of each stage between two sizes, log(t2/t1) / log(n2/n1): 1 is
     * linear. A stage that took under 20 ms at the smaller size is left out (timer noise).
     */
    static String growth(double[] small, double[] large) {
        String[] stages = {"read", "statics", "stiff", "force", "check+json", "pdf"};
        StringBuilder sb = new StringBuilder("growth exponent " + (int) small[0] + " -> " + (int) large[0] + " members (target <= "
                + GROWTH_TARGET + "):");
        for (int k = 0; k < stages.length; k++) {
            double a = small[k + 1], b = large[k + 1];
            if (a >= 1e9 || b >= 1e9 || a < 0.02 || large[0] <= small[0]) {
                sb.append(' ').append(stages[k]).append(" -");
                continue;
            }
            double e = Math.log(b / a) / Math.log(large[0] / small[0]);
            sb.append(String.format(Locale.ROOT, " %s %.2f%s", stages[k], e, e > GROWTH_TARGET ? " (over)" : ""));
        }
        return sb.toString();
    }

    private static void resetPeaks() {
        for (MemoryPoolMXBean p : ManagementFactory.getMemoryPoolMXBeans()) if (p.getType() == MemoryType.HEAP) p.resetPeakUsage();
    }

    private static long peakHeap() {
        long sum = 0;
        for (MemoryPoolMXBean p : ManagementFactory.getMemoryPoolMXBeans()) if (p.getType() == MemoryType.HEAP) sum += p.getPeakUsage().getUsed();
        return sum;
    }
}
