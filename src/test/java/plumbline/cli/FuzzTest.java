package plumbline.cli;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.TimeUnit;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;

/**
 * A seeded, structure-aware mutation fuzzer over the whole pipeline: every bundled sample
 * and check case, mutated line by line and token by token (numbers swapped for extremes,
 * keys renamed, lines dropped, doubled, swapped or re-indented, bytes flipped, the file
 * cut short). Every mutant must give a result or a clean input error within seconds:
 * exit code 0, 1 or 2, never 3, never a stack trace. A short run here; a long one with
 * {@code -Dplumbline.fuzz.iterations=20000} (DEVELOPERS.md). A failing input is saved
 * under target/fuzz-failures for a regression case.
 */
class FuzzTest {

    /** A fresh folder per test, removed afterwards. */
    @org.junit.jupiter.api.io.TempDir
    Path tempDir;

    static final int ITERATIONS = Integer.getInteger("plumbline.fuzz.iterations", 300);
    static final long SEED = Long.getLong("plumbline.fuzz.seed", 1_2026_1201L);
    static final String[] NUMBERS = {"0", "-0", "1e308", "-1e308", "1e-308", "NaN", ".nan", "-.inf", "1e999", "abc", "", "[]",
            "{}", "999999999999999999999999", "0x1F", "'12 kN'", "'12 furlong'", "'50%'", "'150%'", "-1", "true", "null", "~"};
    static final String[] KEYS = {"format", "units", "nodes", "members", "supports", "loads", "from", "to", "section", "material",
            "w", "P", "M", "at", "type", "pattern", "self_weight", "fix", "angle", "springs", "claims", "combo", "node", "member",
            "Fy", "M_max", "hinge", "truss", "dir", "per", "combinations", "standard_combinations", "x"};
    static final Pattern NUMBER = Pattern.compile("-?\\d+(\\.\\d+)?(e-?\\d+)?");

    static List<Path> seeds() throws Exception {
        List<Path> out = new ArrayList<>();
        try (Stream<Path> s = Files.list(Path.of("samples"))) {
            s.filter(p -> p.toString().endsWith(".yaml") && !p.toString().contains("claims")).sorted().forEach(out::add);
        }
        try (Stream<Path> s = Files.list(Path.of("checks"))) {
            s.filter(p -> p.toString().endsWith(".yaml")).sorted().forEach(out::add);
        }
        return out;
    }

    static String mutate(String text, Random rnd) {
        List<String> lines = new ArrayList<>(List.of(text.split("\n", -1)));
        int ops = 1 + rnd.nextInt(3);
        for (int o = 0; o < ops && !lines.isEmpty(); o++) {
            int i = rnd.nextInt(lines.size());
            String line = lines.get(i);
            switch (rnd.nextInt(9)) {
                case 0 -> {
                    Matcher m = NUMBER.matcher(line);
                    List<int[]> spans = new ArrayList<>();
                    while (m.find()) spans.add(new int[]{m.start(), m.end()});
                    if (!spans.isEmpty()) {
                        int[] sp = spans.get(rnd.nextInt(spans.size()));
                        lines.set(i, line.substring(0, sp[0]) + NUMBERS[rnd.nextInt(NUMBERS.length)] + line.substring(sp[1]));
                    }
                }
                case 1 -> lines.remove(i);
                case 2 -> lines.add(i, line);
                case 3 -> {
                    int j = rnd.nextInt(lines.size());
                    lines.set(i, lines.get(j));
                    lines.set(j, line);
                }
                case 4 -> lines.set(i, (rnd.nextBoolean() ? "  " : "") + line.substring(Math.min(line.length(), rnd.nextInt(3))));
                case 5 -> lines.set(i, line.replaceFirst("[A-Za-z_]+:", KEYS[rnd.nextInt(KEYS.length)] + ":"));
                case 6 -> {
                    if (!line.isEmpty()) {
                        char[] c = line.toCharArray();
                        String junk = "{}[],:&*!|>-'\"#%@`\t ";
                        c[rnd.nextInt(c.length)] = junk.charAt(rnd.nextInt(junk.length()));
                        lines.set(i, new String(c));
                    }
                }
                case 7 -> lines.set(i, line.replaceAll("\\b(A|B|C|M1|M2|L1|D|L)\\b", "Q" + rnd.nextInt(3)));
                default -> {
                    String joined = String.join("\n", lines);
                    return joined.substring(0, rnd.nextInt(Math.max(1, joined.length())));
                }
            }
        }
        return String.join("\n", lines);
    }

    @Test
    void mutantsGiveAResultOrACleanInputError() throws Exception {
        List<Path> seeds = seeds();
        Random rnd = new Random(SEED);
        Path dir = tempDir;
        ExecutorService pool = Executors.newSingleThreadExecutor();
        int inputErrors = 0;
        try {
            for (int k = 0; k < ITERATIONS; k++) {
                Path seed = seeds.get(rnd.nextInt(seeds.size()));
                String mutant = mutate(Files.readString(seed), rnd);
                Path file = dir.resolve("mutant-" + k + (rnd.nextInt(10) == 0 ? ".json" : ".yaml"));
                Files.writeString(file, mutant, StandardCharsets.UTF_8);
                Path json = dir.resolve("out-" + k + ".json");
                CliRunner r = runClean(pool, k, seed.toString(), mutant, "check", file.toString(), "--json", json.toString());
                if (r.code() == 2) {
                    inputErrors++;
                    assertTrue(!Files.exists(json), "no output on an input error");
                }
            }
        } finally {
            pool.shutdownNow();
        }
        assertTrue(inputErrors > 0, "the mutations reach the input checks");
    }

    /** Iterations of the claims fuzz; CI runs this short one, a long one takes -Dplumbline.fuzz.claims=5000. */
    static final int CLAIM_ITERATIONS = Integer.getInteger("plumbline.fuzz.claims", 150);

    /**
     * The claim forms of format reference section 4.1 (bounds, end values, values at a position,
     * span ratios, conventions, limit-state envelopes, trade units, CSV as spreadsheets export it)
     * mutated the same way and checked against their models: a result or a clean input error,
     * within seconds, never exit 3 or a stack trace, never an output file on an input error.
     */
    @Test
    void claimMutantsGiveAResultOrACleanInputError() throws Exception {
        String[][] seeds = {
                {"samples/warehouse-joist.yaml", "samples/warehouse-joist-claims.csv"},
                {"samples/three-span-beam.yaml", "samples/three-span-beam-claims.csv"},
                {"samples/gable-frame-us.yaml", "samples/gable-frame-us-claims.csv"},
                {"samples/warehouse-joist.yaml", "src/test/resources/fuzz/joist-claims-4.1.yaml"},
                {"samples/portal-frame.yaml", "samples/portal-frame-claims.yaml"},
        };
        Random rnd = new Random(SEED + 41);
        ExecutorService pool = Executors.newSingleThreadExecutor();
        int inputErrors = 0, results = 0;
        try {
            for (int k = 0; k < CLAIM_ITERATIONS; k++) {
                String[] seed = seeds[rnd.nextInt(seeds.length)];
                String text = Files.readString(Path.of(seed[1]));
                String mutant = seed[1].endsWith(".csv") ? mutateCsv(text, rnd) : mutate(text, rnd);
                Path claims = tempDir.resolve("claims-" + k + (seed[1].endsWith(".csv") ? ".csv" : ".yaml"));
                Files.writeString(claims, mutant, StandardCharsets.UTF_8);
                Path json = tempDir.resolve("claims-out-" + k + ".json");
                CliRunner r = runClean(pool, k, seed[1], mutant, "check", seed[0], "--claims", claims.toString(),
                        "--json", json.toString());
                if (r.code() == 2) {
                    inputErrors++;
                    assertTrue(!Files.exists(json), "no output on an input error");
                    assertTrue(Pattern.compile(":\\d+:\\d+: ").matcher(r.err()).find() || r.err().contains(":0:0: "), r.err());
                } else {
                    results++;
                }
            }
        } finally {
            pool.shutdownNow();
        }
        assertTrue(inputErrors > 0 && results > 0, "the mutations reach both the checks and the comparison (" + inputErrors
                + " input errors, " + results + " results)");
    }

    /** A CSV mutation: a cell replaced (by an extreme number, a unit, a span ratio, an empty cell), a separator changed, a row cut. */
    static String mutateCsv(String text, Random rnd) {
        List<String> lines = new ArrayList<>(List.of(text.split("\n", -1)));
        String[] cells = {"", "0", "-0", "1e308", "NaN", "L/0", "L/360", "span/abc", "12 kN", "12 furlong", "90,0", "9.0.0",
                "envelope:XLS", "envelope:SLS", "Fy_max", "M_start", "N", "deflection", "reaction", "member", "displacement",
                "Z9", "\"", ";;", "kNm", "k-ft", "40%", "150%"};
        int ops = 1 + rnd.nextInt(3);
        for (int o = 0; o < ops && !lines.isEmpty(); o++) {
            int i = rnd.nextInt(lines.size());
            String line = lines.get(i);
            char sep = line.contains(";") ? ';' : ',';
            List<String> parts = new ArrayList<>(List.of(line.split(java.util.regex.Pattern.quote(String.valueOf(sep)), -1)));
            switch (rnd.nextInt(5)) {
                case 0 -> {
                    parts.set(rnd.nextInt(parts.size()), cells[rnd.nextInt(cells.length)]);
                    lines.set(i, String.join(String.valueOf(sep), parts));
                }
                case 1 -> lines.set(i, line.replace(sep, sep == ';' ? ',' : ';'));
                case 2 -> lines.remove(i);
                case 3 -> lines.add(i, line);
                default -> lines.set(i, line.substring(0, rnd.nextInt(line.length() + 1)));
            }
        }
        return String.join("\n", lines);
    }

    /**
     * Runs one mutant within 20 s and requires a clean end: exit 0, 1 or 2, no stack trace, no
     * NaN or Infinity printed. A mutant that fails is saved for a regression case.
     */
    static CliRunner runClean(ExecutorService pool, int k, String seed, String mutant, String... args) throws Exception {
        Future<CliRunner> run = pool.submit(() -> CliRunner.run(args));
        CliRunner r;
        try {
            r = run.get(20, TimeUnit.SECONDS);
        } catch (java.util.concurrent.TimeoutException e) {
            run.cancel(true);
            save(k, mutant);
            throw new AssertionError("mutant " + k + " of " + seed + " did not finish in 20 s");
        }
        boolean clean = (r.code() == 0 || r.code() == 1 || r.code() == 2) && !r.err().contains("Exception")
                && !r.err().contains("\tat ") && !r.out().contains("NaN") && !r.out().contains("Infinity");
        if (!clean) save(k, mutant);
        assertTrue(clean, "mutant " + k + " of " + seed + " gave exit " + r.code() + ":\n" + r.err() + r.out());
        return r;
    }

    private static void save(int k, String mutant) throws java.io.IOException {
        Path d = Path.of("target", "fuzz-failures");
        Files.createDirectories(d);
        Files.writeString(d.resolve("mutant-" + k + ".yaml"), mutant);
    }
}
