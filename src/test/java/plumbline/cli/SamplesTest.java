package plumbline.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import plumbline.io.OutputFiles;

/** Every bundled sample runs through check; the planted slip is the only mismatch. */
class SamplesTest {

    /** A fresh folder per test, removed afterwards. */
    @org.junit.jupiter.api.io.TempDir
    Path tempDir;

    @ParameterizedTest(name = "{0}")
    @CsvSource({
            "footbridge-truss.yaml, footbridge-truss-claims.yaml, M-D1-ULS-N_max",
            "three-span-beam.yaml, three-span-beam-claims.csv, R-A-SLS-Fy",
            "portal-frame.yaml, portal-frame-claims.yaml, R-E-ULS-W-Fx",
            "office-floor-beam.yaml, office-floor-beam-claims.yaml, M-S2-asce7-strength/2-M_max",
            "gable-frame-us.yaml, gable-frame-us-claims.csv, R-A-S-Fy R-A-S-Fx",
            "warehouse-joist.yaml, warehouse-joist-claims.csv, R-B-ULS-2-Fy_max M-S1-ULS-2-M_max",
    })
    @SuppressWarnings("unchecked")
    void sampleRuns(String model, String claims, String slip) throws Exception {
        Path json = tempDir.resolve("r.json");
        CliRunner r = CliRunner.run("check", "samples/" + model, "--claims", "samples/" + claims, "--json", json.toString());
        assertEquals(1, r.code(), r.err() + r.out());
        for (String line : r.out().split("\n")) assertTrue(line.length() <= 80, "80 columns: " + line);
        Map<String, Object> tree = OutputFiles.parseJson(Files.readString(json));
        assertEquals("mismatch", tree.get("verdict"));
        List<Map<String, Object>> cl = (List<Map<String, Object>>) tree.get("claims");
        for (Map<String, Object> c : cl) {
            assertEquals(java.util.List.of(slip.split(" ")).contains(c.get("id")) ? "mismatch" : "ok", c.get("status"), c.toString());
        }
    }

    @org.junit.jupiter.api.Test
    void templateFilledInPartIsACheckableClaimsFile() throws Exception {
        CliRunner t = CliRunner.run("template", "samples/portal-frame.yaml");
        assertEquals(0, t.code(), t.err());
        // fill one value in: the vertical reaction at A under G (16.0 kN by symmetry of the roof load, statics by hand)
        String filled = t.out().replaceFirst("\\{node: A, combo: G, Fx: ~, Fy: ~", "{node: A, combo: G, Fx: ~, Fy: 16.0");
        Path f = tempDir.resolve("claims.yaml");
        Files.writeString(f, filled);
        CliRunner r = CliRunner.run("check", "samples/portal-frame.yaml", "--claims", f.toString());
        assertEquals(0, r.code(), r.err() + r.out());
        assertTrue(r.out().contains("Claims: 1 ok, 0 marginal, 0 mismatch"), r.out());
    }

    @org.junit.jupiter.api.Test
    void theCsvTemplateAndEveryKindOfClaimRead() throws Exception {
        // every row of the YAML skeleton names a quantity the reader takes: left as ~ nothing is claimed
        CliRunner y = CliRunner.run("template", "samples/three-span-beam.yaml");
        Path yf = tempDir.resolve("all.yaml");
        Files.writeString(yf, y.out());
        CliRunner ry = CliRunner.run("check", "samples/three-span-beam.yaml", "--claims", yf.toString());
        assertEquals(0, ry.code(), ry.err() + ry.out());
        assertTrue(ry.out().contains("Verdict: NO-CLAIMS"), ry.out());
        for (String kind : List.of("Fy_max: ~", "M_start: ~", "at: 50%, M: ~", "combo: envelope")) {
            assertTrue(y.out().contains(kind), kind);
        }
        // the CSV skeleton: a row whose value is blank is not claimed
        CliRunner c = CliRunner.run("template", "samples/three-span-beam.yaml", "--csv");
        assertEquals(0, c.code(), c.err());
        Path cf = tempDir.resolve("all.csv");
        Files.writeString(cf, c.out());
        CliRunner rc = CliRunner.run("check", "samples/three-span-beam.yaml", "--claims", cf.toString());
        assertEquals(0, rc.code(), rc.err() + rc.out());
        assertTrue(rc.out().contains("Verdict: NO-CLAIMS"), rc.out());
        assertTrue(c.out().contains("item,combo,name,quantity,value,unit,tolerance,at"), c.out());
        assertTrue(c.out().contains("member,D,S1,M,,,,50%"), c.out());
    }

    @org.junit.jupiter.api.Test
    void aCheckWithNoClaimsSaysSoAndIsNeverOk() throws Exception {
        Path dir = tempDir;
        CliRunner r = CliRunner.run("check", "samples/portal-frame.yaml", "--json", dir.resolve("r.json").toString(),
                "--pdf", dir.resolve("r.pdf").toString());
        assertEquals(0, r.code(), "format reference (src/site/markdown/formats.md) section 6: no claims exits 0\n" + r.err() + r.out());
        assertTrue(r.out().contains("Verdict: NO-CLAIMS"), r.out());
        assertTrue(!r.out().contains("Verdict: OK"), r.out());
        Map<String, Object> tree = OutputFiles.parseJson(Files.readString(dir.resolve("r.json")));
        assertEquals("no-claims", tree.get("verdict"));
        String pdf = ReportTest.text(dir.resolve("r.pdf"));
        assertTrue(pdf.contains("Verdict: NO-CLAIMS"), pdf);
    }
}
