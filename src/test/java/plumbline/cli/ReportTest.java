package plumbline.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.lowagie.text.pdf.PdfReader;
import com.lowagie.text.pdf.parser.PdfTextExtractor;
import com.networknt.schema.JsonSchema;
import com.networknt.schema.JsonSchemaFactory;
import com.networknt.schema.SpecVersion;
import com.networknt.schema.ValidationMessage;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Set;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * The outputs of check read back as a checker would: the JSON validates against the shipped
 * schema, and the PDF's text holds every section, page x of y on every page, the input
 * hashes, the cautions and, for every claim, the same claimed and computed numbers and
 * status as the JSON, with flagged rows marked.
 */
class ReportTest {

    /** A fresh folder per test, removed afterwards. */
    @org.junit.jupiter.api.io.TempDir
    Path tempDir;

    static final ObjectMapper JSON = new ObjectMapper();

    /** Every page's text, white space folded, after checking that each page carries "page x of y". */
    static String text(Path pdf) throws java.io.IOException {
        PdfReader reader = new PdfReader(Files.readAllBytes(pdf));
        int pages = reader.getNumberOfPages();
        PdfTextExtractor ex = new PdfTextExtractor(reader);
        StringBuilder all = new StringBuilder();
        for (int p = 1; p <= pages; p++) {
            String text = ex.getTextFromPage(p);
            assertTrue(text.contains("page " + p + " of " + pages), "footer on page " + p);
            all.append(text).append('\n');
        }
        return all.toString().replaceAll("\\s+", " ");
    }

    @ParameterizedTest(name = "{0}")
    @CsvSource({
            "footbridge-truss.yaml, footbridge-truss-claims.yaml",
            "three-span-beam.yaml, three-span-beam-claims.csv",
            "portal-frame.yaml, portal-frame-claims.yaml",
            "office-floor-beam.yaml, office-floor-beam-claims.yaml",
            "gable-frame-us.yaml, gable-frame-us-claims.csv",
            "../checks/20-two-span-pattern-live.yaml, ",
    })
    void pdfAndJsonAgree(String model, String claims) throws Exception {
        Path dir = tempDir;
        Path json = dir.resolve("r.json"), pdf = dir.resolve("r.pdf");
        CliRunner r = claims == null
                ? CliRunner.run("check", "samples/" + model, "--json", json.toString(), "--pdf", pdf.toString())
                : CliRunner.run("check", "samples/" + model, "--claims", "samples/" + claims, "--json", json.toString(), "--pdf", pdf.toString());
        assertTrue(r.code() == 0 || r.code() == 1, r.err());
        JsonNode tree = JSON.readTree(json.toFile());
        JsonSchema schema = JsonSchemaFactory.getInstance(SpecVersion.VersionFlag.V202012).getSchema(SchemaCommand.text());
        Set<ValidationMessage> errors = schema.validate(tree);
        assertTrue(errors.isEmpty(), errors.toString());

        String text = text(pdf);
        for (String section : new String[]{"1 Summary", "2 The model as checked", "3 Determinacy, stability and equilibrium",
                "4 Claims compared", "5 Queries for the originator", "7 Force-method working", "8 Plausibility warnings",
                "9 Assumptions and cautions", "10 Sign-off"}) {
            assertTrue(text.contains(section), "section " + section);
        }
        assertTrue(text.contains("does not replace the engineer of record"), "caution");
        assertTrue(text.contains("Verdict: " + tree.get("verdict").asText().toUpperCase()), "verdict");
        for (JsonNode h : tree.get("input").get("sha256")) assertTrue(text.contains(h.asText()), "hash " + h);
        assertTrue(text.contains(tree.get("determinacy").get("classification").asText()));
        String unitForce = tree.get("units").get("force").asText();
        boolean imperial = tree.get("units").get("length").asText().matches("ft|in");
        for (JsonNode c : tree.get("claims")) {
            // the report shows a claim's values to four significant figures of the larger, both alike; a
            // displacement in mm (or in); a computed value under a millionth of the claim's floor is rounding, shown as 0
            boolean length = c.get("quantity").asText().matches("deflection|ux|uy");
            double toShown = !length ? 1 : imperial ? 12 / (tree.get("units").get("length").asText().equals("ft") ? 1 : 12) : 1000;
            double claimedValue = c.get("claimed").asDouble() * toShown;
            double computedValue = Math.abs(c.get("computed").asDouble()) <= 1e-6 * c.get("absolute_floor").asDouble()
                    ? 0 : c.get("computed").asDouble() * toShown;
            double larger = Math.max(Math.abs(claimedValue), Math.abs(computedValue));
            int decimals = larger == 0 ? 0 : Math.min(9, Math.max(0, 3 - (int) Math.floor(Math.log10(larger))));
            String claimed = shown(claimedValue, decimals), computed = shown(computedValue, decimals);
            assertTrue(text.contains(claimed), "claimed " + claimed + " of " + c.get("id"));
            assertTrue(text.contains(computed), "computed " + computed + " of " + c.get("id"));
            assertTrue(text.contains(c.get("status").asText().toUpperCase()), "status of " + c.get("id"));
        }
        boolean anyMismatch = false;
        for (JsonNode c : tree.get("claims")) anyMismatch |= c.get("status").asText().equals("mismatch");
        assertEquals(anyMismatch, java.util.regex.Pattern.compile("!! (reaction|member|displacement) ").matcher(text).find(),
                "flag marks follow the statuses");
        assertFalse(unitForce.isEmpty());
    }

    /** A value to a fixed number of decimals, a rounded zero unsigned. */
    static String shown(double v, int decimals) {
        String s = String.format(java.util.Locale.ROOT, "%." + decimals + "f", v);
        return s.matches("-[0.]+") ? s.substring(1) : s;
    }

    @org.junit.jupiter.api.Test
    void figuresAreTheSameDrawingsAsPng() throws Exception {
        Path dir = tempDir;
        CliRunner r = CliRunner.run("check", "samples/portal-frame.yaml", "--claims", "samples/portal-frame-claims.yaml",
                "--figures", dir.toString());
        assertEquals(1, r.code(), r.err());
        java.util.List<Path> pngs = Files.list(dir).filter(p -> p.toString().endsWith(".png")).toList();
        assertTrue(pngs.stream().anyMatch(p -> p.getFileName().toString().equals("model.png")));
        assertTrue(pngs.stream().anyMatch(p -> p.getFileName().toString().equals("ULS-W-moment.png")), pngs.toString());
        for (Path p : pngs) {
            java.awt.image.BufferedImage img = javax.imageio.ImageIO.read(p.toFile());
            int dark = 0;
            for (int x = 0; x < img.getWidth(); x += 3) for (int y = 0; y < img.getHeight(); y += 3) if ((img.getRGB(x, y) & 0xffffff) != 0xffffff) dark++;
            assertTrue(dark > 20, p + " has a drawing on it");
        }
    }
}
