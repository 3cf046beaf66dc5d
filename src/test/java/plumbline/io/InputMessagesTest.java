package plumbline.io;

import static org.junit.jupiter.api.Assertions.assertDoesNotThrow;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import plumbline.Models;
import plumbline.model.InputException;
import plumbline.model.Model;
import plumbline.model.Problem;
import plumbline.validate.StructureCheck;

/**
 * Input messages that point at the line and column a reader must change, in the tool's own
 * words; files in UTF-16 read as text; bytes that are not UTF-8 refused at their line; a
 * member too short beside the model says the tolerance it broke; a key longer than YAML
 * allows is named as such.
 */
class InputMessagesTest {

    @TempDir
    Path dir;

    static Problem first(String yaml) {
        InputException e = assertThrows(InputException.class, () -> ModelReader.read("m.yaml", yaml, true));
        return e.problems().get(0);
    }

    /** Each case: the mistake's line and column (counted by hand), and words of the message. Lines are joined with '|'. */
    @ParameterizedTest(name = "{3}")
    @CsvSource(delimiter = ';', value = {
            "format: plumbline/1|nodes:|\tA: [0, 0]; 3; 1; a tab character; YAML indents with spaces only",
            "format: plumbline/1|nodes:|  A: [0, 0|  B: [6, 0]; 3; 6; the '[' opened here is not closed: expected ',' or ']' before line 4",
            "format: plumbline/1|job: {title: Beam|units: {force: kN}; 2; 6; the '{' opened here is not closed",
            "format: plumbline/1|job:|  title: \"Beam|units: x; 3; 10; the quote opened here is not closed",
            "format: plumbline/1|nodes:|  A:[0, 0]|    B: [1, 0]; 3; 4; expected 'key: value' here, with a space after the ':'",
            "format: plumbline/1|units: kN|  length: m; 3; 9; a ':' where a value was expected",
            "format: plumbline/1|loads:|  - G|  H: 2; 4; 3; the indentation of this line does not match the lines above",
    })
    void yamlSyntaxErrorsPointAtTheMistakeInOurWords(String text, int line, int column, String words) {
        Problem p = first(text.replace('|', '\n'));
        assertEquals(line, p.at().line(), p.toString());
        assertEquals(column, p.at().column(), p.toString());
        assertTrue(p.message().contains(words), p.toString());
        assertFalse(p.message().contains("while scanning") || p.message().contains("while parsing"), "no parser wording: " + p);
    }

    @Test
    void aKeyLongerThanYamlAllowsIsNamed() {
        Problem p = first(Models.HEAD + "nodes:\n  " + "N".repeat(3000) + ": [0, 0]\n");
        assertEquals(6, p.at().line(), p.toString());
        assertTrue(p.message().contains("a key of 3000 characters; YAML keys are at most 1024 characters"), p.toString());
    }

    @Test
    void utf16FilesReadAsText() throws Exception {
        String text = Models.SIMPLE_BEAM + "loads: {Gκ: {type: dead, member_loads: [{member: M1, w: -10}]}}\n";
        Model expected = ModelReader.read("m.yaml", text, true);
        byte[][] encodings = {
                concat(new byte[]{(byte) 0xFF, (byte) 0xFE}, text.getBytes(StandardCharsets.UTF_16LE)),
                concat(new byte[]{(byte) 0xFE, (byte) 0xFF}, text.getBytes(StandardCharsets.UTF_16BE)),
                text.getBytes(StandardCharsets.UTF_16LE),
                text.getBytes(StandardCharsets.UTF_16BE),
                concat(new byte[]{(byte) 0xEF, (byte) 0xBB, (byte) 0xBF}, text.getBytes(StandardCharsets.UTF_8)),
        };
        for (byte[] bytes : encodings) {
            Path f = Files.write(dir.resolve("m.yaml"), bytes);
            Model m = ModelReader.read(f);
            assertEquals(expected.loadCases().get(0).name(), m.loadCases().get(0).name());
            assertEquals(expected.nodes().keySet(), m.nodes().keySet());
        }
    }

    private static byte[] concat(byte[] a, byte[] b) {
        byte[] out = new byte[a.length + b.length];
        System.arraycopy(a, 0, out, 0, a.length);
        System.arraycopy(b, 0, out, a.length, b.length);
        return out;
    }

    @Test
    void bytesThatAreNotUtf8AreRefusedAtTheirLine() throws Exception {
        byte[] latin1 = (Models.SIMPLE_BEAM + "job: {title: Poutre \u00e9tage 2}\n").getBytes(StandardCharsets.ISO_8859_1);
        Path f = Files.write(dir.resolve("m.yaml"), latin1);
        InputException e = assertThrows(InputException.class, () -> ModelReader.read(f));
        Problem p = e.problems().get(0);
        assertEquals(8, p.at().line(), p.toString()); // HEAD 4 lines, the beam 3, then the title
        assertEquals(21, p.at().column(), p.toString());
        assertTrue(p.message().contains("byte 0xE9 is not UTF-8 text"), p.toString());
        byte[] binary = {0x50, 0x4B, 0x03, 0x04, 0, 0, 0, 0, 0x14, 0};
        Path zip = Files.write(dir.resolve("z.yaml"), binary);
        assertTrue(assertThrows(InputException.class, () -> ModelReader.read(zip)).problems().get(0).message().contains("binary data"));
    }

    @Test
    void aMemberTooShortBesideTheModelStatesTheTolerance() {
        // 1e-5 m beside a 1e4 m member: under 1e-9 of the 10 km extent (1e-5 m), taken as coincident nodes
        Model m = assertDoesNotThrow(() -> ModelReader.read("m.yaml", Models.HEAD + """
                nodes: {A: [0, 0], B: [10000, 0], C: [10000.00001, 0]}
                supports: {A: pinned, B: roller, C: roller}
                members: {M1: {from: A, to: B, section: G}, M2: {from: B, to: C, section: G}}
                """, true));
        String all = StructureCheck.check(m).toString();
        assertTrue(all.contains("members.M2: has a length of 1.00e-05 m, too short beside the model's extent of 1.000e+04 m"), all);
        assertTrue(all.contains("are taken as coincident nodes"), all);
    }
}
