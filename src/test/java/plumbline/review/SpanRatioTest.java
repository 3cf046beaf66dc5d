package plumbline.review;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import plumbline.Models;
import plumbline.io.ClaimsReader;
import plumbline.model.InputException;
import plumbline.model.Model;
import plumbline.report.Console;
import plumbline.solve.stiffness.StiffnessEngine;

/**
 * A deflection claimed as a span ratio. Simple beam, L = 6 m, w = 10 kN/m, EI = 20,000 kN*m2:
 * 5wL^4/384EI = 8.4375 mm = L/711.1 (AISC Manual Table 3-23 case 1, from memory).
 */
class SpanRatioTest {

    @TempDir
    Path dir;

    static final String BEAM = Models.SIMPLE_BEAM + """
            loads: {D: {type: dead, member_loads: [{member: M1, w: -10}]}}
            """;

    @Test
    void aSpanRatioInYamlIsTheLengthOverIt() {
        Model m = Models.yaml(BEAM + "claims:\n  members:\n    - {member: M1, combo: D, deflection: L/711}\n"
                + "    - {member: M1, combo: D, deflection: span/360}\n");
        Review r = Review.of(Analysis.of(m, List.of(new StiffnessEngine())), new TolerancePolicy(Double.NaN));
        ClaimResult ok = r.claims().get(0), loose = r.claims().get(1);
        assertEquals(6.0 / 711, ok.claim().valueInternal(), 1e-15);
        assertEquals(5 * 10e3 * Math.pow(6, 4) / (384 * 2e7), ok.computed(), 1e-9);
        assertEquals(ClaimResult.Status.OK, ok.status());
        assertEquals("as written: L/711", Console.asWritten(ok.claim(), m.units()));
        // L/360 = 16.7 mm claims twice the deflection: a mismatch
        assertEquals(ClaimResult.Status.MISMATCH, loose.status());
    }

    @Test
    void aSpanRatioInCsvWithADecimalComma() throws Exception {
        Model m = Models.yaml(BEAM);
        Path f = dir.resolve("c.csv");
        Files.writeString(f, "item;combo;name;quantity;value\nmember;D;M1;deflection;L/711,1\n");
        assertEquals(6.0 / 711.1, ClaimsReader.read(f, m).claims().get(0).valueInternal(), 1e-15);
        Files.writeString(f, "item,combo,name,quantity,value\nmember,D,M1,deflection,L/0\n");
        InputException e = assertThrows(InputException.class, () -> ClaimsReader.read(f, m));
        assertTrue(e.problems().get(0).message().contains("no positive divisor"), e.problems().toString());
    }
}
