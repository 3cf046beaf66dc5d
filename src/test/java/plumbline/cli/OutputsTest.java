package plumbline.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.PosixFilePermission;
import java.util.ArrayList;
import java.util.List;
import java.util.Set;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import plumbline.io.OutputFiles;

/**
 * Outputs that cannot be lost or mixed up: every output path is checked before any work
 * (exit 2, naming the option, nothing written); the outputs of a run are written together
 * or not at all, an earlier file of the same name kept when they are not; files get the
 * permissions of the user's umask; working files of killed runs are cleared away.
 */
class OutputsTest {

    @TempDir
    Path dir;

    static final String MODEL = "samples/portal-frame.yaml", CLAIMS = "samples/portal-frame-claims.yaml";

    private List<String> files() throws Exception {
        try (Stream<Path> s = Files.list(dir)) {
            return s.map(p -> p.getFileName().toString()).sorted().toList();
        }
    }

    /**
     * A large model's report is drawn on the other core while its results are written: the
     * results are the very bytes, and the report the very text page by page, that a run making
     * each alone writes. The model: a generated frame of 10 bays and 48 storeys (1,008
     * members, invented data), above the size from which work is spread over the cores.
     */
    @Test
    void aLargeModelsReportMadeBesideItsResultsIsTheSame() throws Exception {
        Path model = dir.resolve("frame.yaml");
        Files.writeString(model, plumbline.bench.FrameGenerator.frame(10, 48));
        Path aJson = dir.resolve("a.json"), aPdf = dir.resolve("a.pdf"), bJson = dir.resolve("b.json"), bPdf = dir.resolve("b.pdf");
        CliRunner both = CliRunner.run("check", model.toString(), "--json", aJson.toString(), "--pdf", aPdf.toString());
        assertEquals(0, both.code(), both.err());
        assertEquals(0, CliRunner.run("check", model.toString(), "--json", bJson.toString()).code());
        assertEquals(0, CliRunner.run("check", model.toString(), "--pdf", bPdf.toString()).code());
        assertTrue(plumbline.solve.SideBySide.worth(1008, 2), "the model is large enough to spread the work");
        assertTrue(java.util.Arrays.equals(Files.readAllBytes(aJson), Files.readAllBytes(bJson)), "the same results, byte for byte");
        List<String> a = ReportPagesTest.pages(aPdf), b = ReportPagesTest.pages(bPdf);
        assertTrue(a.size() > 3, "pages: " + a.size());
        assertEquals(b, a, "the same report, page by page");
        assertEquals(List.of("a.json", "a.pdf", "b.json", "b.pdf", "frame.yaml"), files(), "no working file left");
    }

    @Test
    void oneFileNamedByTwoOptionsIsRefusedBeforeAnyWork() throws Exception {
        Path out = dir.resolve("out.json");
        CliRunner r = CliRunner.run("check", MODEL, "--json", out.toString(), "--pdf", dir.resolve("./out.json").toString());
        assertEquals(2, r.code(), r.err());
        assertTrue(r.err().contains("--pdf: is the same file as --json"), r.err());
        assertTrue(r.err().contains("nothing was analysed"), r.err());
        assertEquals(List.of(), files());
    }

    @Test
    void badOutputPathsAreRefusedBeforeSolvingNamingTheOption() throws Exception {
        Path good = dir.resolve("good.json");
        Files.createDirectory(dir.resolve("a-folder"));
        Files.writeString(dir.resolve("a-file"), "not a folder");
        String[][] cases = {
                {"--pdf", dir.resolve("a-folder").toString(), "is a folder; expected a file name"},
                {"--pdf", "", "has an empty file name"},
                {"--pdf", dir.resolve("missing/r.pdf").toString(), "does not exist; expected an existing folder"},
                {"--pdf", dir.resolve("a-file/r.pdf").toString(), "does not exist; expected an existing folder"},
                {"--pdf", MODEL, "is an input file"},
        };
        for (String[] c : cases) {
            CliRunner r = CliRunner.run("check", MODEL, "--json", good.toString(), c[0], c[1]);
            assertEquals(2, r.code(), c[1] + ": " + r.err());
            assertTrue(r.err().contains(c[0] + ": ") && r.err().contains(c[2]), c[1] + ": " + r.err());
            assertTrue(r.err().contains("nothing was analysed and no file was written"), r.err());
            assertFalse(Files.exists(good), "a failed run leaves no good.json behind (" + c[1] + ")");
        }
        assertEquals(List.of("a-file", "a-folder"), files(), "no working files left");
    }

    @Test
    void aFolderWhereAFigureMustGoIsRefusedAndNothingIsWritten() throws Exception {
        // found only once the figures are drawn (their names come from the load sets), still before anything is written
        Path figures = Files.createDirectory(dir.resolve("figures"));
        Files.createDirectories(figures.resolve("model.png").resolve("blocker"));
        Path json = dir.resolve("r.json"), pdf = dir.resolve("r.pdf");
        Files.writeString(json, "earlier results");
        CliRunner r = CliRunner.run("check", MODEL, "--claims", CLAIMS, "--json", json.toString(), "--pdf", pdf.toString(),
                "--figures", figures.toString());
        assertEquals(2, r.code(), r.err());
        assertTrue(r.err().contains("--figures: is a folder or another non-file where an output must go"), r.err());
        assertEquals("earlier results", Files.readString(json), "the earlier file of the same name is untouched");
        assertEquals(List.of("figures", "r.json"), files(), "no report, no working files");
        try (Stream<Path> s = Files.list(figures)) {
            assertEquals(List.of("model.png"), s.map(p -> p.getFileName().toString()).toList(), "no figure written");
        }
    }

    @Test
    void outputFilesTakeTheUmaskLikeAnyOtherFile() throws Exception {
        Path reference = Files.createFile(dir.resolve("reference"));
        Set<PosixFilePermission> expected = Files.getPosixFilePermissions(reference);
        Path json = dir.resolve("r.json"), pdf = dir.resolve("r.pdf");
        CliRunner r = CliRunner.run("check", MODEL, "--json", json.toString(), "--pdf", pdf.toString());
        assertEquals(0, r.code(), r.err());
        assertEquals(expected, Files.getPosixFilePermissions(json));
        assertEquals(expected, Files.getPosixFilePermissions(pdf));
    }

    @Test
    void workingFilesOfKilledRunsAreRemovedAndThoseOfLiveRunsKept() throws Exception {
        long dead = 4_000_000;
        while (ProcessHandle.of(dead).isPresent()) dead++;
        long live = ProcessHandle.current().parent().map(ProcessHandle::pid).orElseThrow();
        Path stale = Files.writeString(dir.resolve(".r.json." + dead + ".0123456789ab.part"), "half");
        Path staleOld = Files.writeString(dir.resolve(".r.pdf." + dead + ".0123456789ab.old.part"), "half");
        Path running = Files.writeString(dir.resolve(".r.json." + live + ".ba9876543210.part"), "being written");
        Path unrelated = Files.writeString(dir.resolve(".notes.part"), "someone else's");
        CliRunner r = CliRunner.run("check", MODEL, "--json", dir.resolve("r.json").toString());
        assertEquals(0, r.code(), r.err());
        assertFalse(Files.exists(stale));
        assertFalse(Files.exists(staleOld));
        assertTrue(Files.exists(running), "another live run's working file is left alone");
        assertTrue(Files.exists(unrelated), "files not of this tool's pattern are left alone");
    }

    @Test
    void threeRunsWritingTheSameFilesAtOnceLeaveOneWholeResult() throws Exception {
        Path json = dir.resolve("r.json"), pdf = dir.resolve("r.pdf");
        List<Thread> runs = new ArrayList<>();
        int[] codes = new int[3];
        for (int i = 0; i < 3; i++) {
            int k = i;
            Thread t = new Thread(() -> codes[k] = CliRunner.run("check", MODEL, "--claims", CLAIMS, "--json", json.toString(),
                    "--pdf", pdf.toString()).code());
            runs.add(t);
            t.start();
        }
        for (Thread t : runs) t.join();
        for (int c : codes) assertEquals(1, c);
        assertFalse(OutputFiles.parseJson(Files.readString(json)).isEmpty(), "the results file is whole JSON (a part would not parse)");
        assertTrue(new String(Files.readAllBytes(pdf), StandardCharsets.ISO_8859_1).strip().endsWith("%%EOF"), "a whole PDF");
        assertEquals(List.of("r.json", "r.pdf"), files(), "no working files left");
    }

    @Test
    void aRepeatedClaimIsComparedOnceWithAUniqueIdAndAWarning() throws Exception {
        Path claims = dir.resolve("twice.yaml");
        Files.writeString(claims, """
                claims:
                  reactions:
                    - {node: A, combo: ULS-W, Fy: 14.7}
                    - {node: A, combo: ULS-W, Fy: 14.7}
                """);
        Path json = dir.resolve("r.json");
        CliRunner r = CliRunner.run("check", MODEL, "--claims", claims.toString(), "--json", json.toString());
        assertEquals(0, r.code(), r.err() + r.out());
        String text = Files.readString(json);
        assertEquals(1, text.split("\"R-A-ULS-W-Fy\"", -1).length - 1, "one claim id, once");
        assertTrue(text.contains("the same claim as " + claims + ":3"), text);
    }
}
