package plumbline.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.regex.Pattern;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * The catalogue of bad inputs: each file's first line says the message fragment it must
 * produce. Every one must exit with code 2, name file:line:col, and print no stack trace.
 */
class BadInputTest {

    /** A fresh folder per test, removed afterwards. */
    @org.junit.jupiter.api.io.TempDir
    Path tempDir;

    static final Path DIR = Path.of("src/test/resources/bad-inputs");

    static Stream<Path> catalogue() throws IOException {
        return Files.list(DIR).filter(p -> p.toString().endsWith(".yaml")).sorted();
    }

    @Test
    void catalogueHoldsAtLeastFortyCases() throws IOException {
        assertTrue(catalogue().count() >= 40);
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("catalogue")
    void badInputGivesACleanMessage(Path file) throws IOException {
        byte[] bytes = Files.readAllBytes(file);
        int nl = 0;
        while (nl < bytes.length && bytes[nl] != '\n') nl++;
        String first = new String(bytes, 0, nl, java.nio.charset.StandardCharsets.UTF_8);
        assertTrue(first.startsWith("# expect: "), "first line names the expected fragment");
        String fragment = first.substring("# expect: ".length());
        Path json = tempDir.resolve("out.json");
        CliRunner r = CliRunner.run("check", file.toString(), "--json", json.toString());
        assertEquals(2, r.code(), r.err());
        assertTrue(r.err().contains(fragment), "expected '" + fragment + "' in:\n" + r.err());
        assertTrue(Pattern.compile(Pattern.quote(file.toString()) + ":\\d+:\\d+: ").matcher(r.err()).find(), r.err());
        assertFalse(r.err().contains("Exception"), r.err());
        assertFalse(r.err().contains("\tat "), r.err());
        assertFalse(Files.exists(json), "no output file on bad input");
    }

    @Test
    void csvClaimsProblemsNameTheLine() throws IOException {
        Path dir = tempDir;
        Path csv = dir.resolve("claims.csv");
        Files.writeString(csv, "item,combo,name,quantity,value,unit\nreaction,SLS,A,Fy,12,kN\nreaction,SLS,B,Fy,ten,kN\n");
        CliRunner r = CliRunner.run("check", "samples/three-span-beam.yaml", "--claims", csv.toString());
        assertEquals(2, r.code());
        assertTrue(r.err().contains(csv + ":3:1: value: 'ten' is not a finite number"), r.err());
    }

    @Test
    void outputOverAnInputIsRefused() throws IOException {
        Path dir = tempDir;
        Path model = dir.resolve("m.yaml");
        Files.copy(Path.of("samples/portal-frame.yaml"), model);
        byte[] before = Files.readAllBytes(model);
        CliRunner r = CliRunner.run("check", model.toString(), "--json", model.toString());
        assertEquals(2, r.code());
        assertTrue(r.err().contains("is an input file"), r.err());
        assertEquals(List.of(new String(before)), List.of(new String(Files.readAllBytes(model))));
    }
}
