package plumbline.io;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.dataformat.yaml.YAMLMapper;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import plumbline.cli.CliRunnerAccess;

/** A model and claims written as JSON read exactly as their YAML, and JSON problems carry line and column. */
class JsonInputTest {

    /** A fresh folder per test, removed afterwards. */
    @org.junit.jupiter.api.io.TempDir
    Path tempDir;

    @Test
    void jsonModelAndClaimsGiveTheSameCheck() throws Exception {
        Path dir = tempDir;
        Object model = new YAMLMapper().readValue(Path.of("samples/portal-frame.yaml").toFile(), Object.class);
        Object claims = new YAMLMapper().readValue(Path.of("samples/portal-frame-claims.yaml").toFile(), Object.class);
        Path m = dir.resolve("portal.json"), c = dir.resolve("claims.json");
        new ObjectMapper().writerWithDefaultPrettyPrinter().writeValue(m.toFile(), model);
        new ObjectMapper().writerWithDefaultPrettyPrinter().writeValue(c.toFile(), claims);
        String yaml = CliRunnerAccess.out("check", "samples/portal-frame.yaml", "--claims", "samples/portal-frame-claims.yaml");
        String json = CliRunnerAccess.out("check", m.toString(), "--claims", c.toString());
        // the same claims lines and verdict, only the file names differ
        assertEquals(yaml.substring(yaml.indexOf("Claims (")), json.substring(json.indexOf("Claims (")));
    }

    @Test
    void jsonProblemsNameLineAndColumn() throws Exception {
        Path dir = tempDir;
        Path m = dir.resolve("bad.json");
        Files.writeString(m, "{\n  \"format\": \"plumbline/1\",\n  \"units\": {\"force\": \"kN\", \"length\": \"m\"},\n"
                + "  \"nodes\": {\"A\": [0, 0], \"B\": [6, 0]},\n  \"members\": {\"M1\": {\"from\": \"A\", \"to\": \"B\", \"sectoin\": \"G\"}}\n}\n");
        String err = CliRunnerAccess.err("check", m.toString());
        assertTrue(err.contains(m + ":5:"), err);
        assertTrue(err.contains("did you mean 'section'"), err);
    }
}
