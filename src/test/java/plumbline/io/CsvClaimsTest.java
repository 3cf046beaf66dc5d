package plumbline.io;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import plumbline.Models;
import plumbline.model.Claim;
import plumbline.model.ClaimSet;
import plumbline.model.InputException;
import plumbline.model.Model;
import plumbline.model.Quantity;

/**
 * CSV claims as spreadsheets export them (format reference section 4.1). Conversions:
 * 1 kip = 4.448222 kN, 1 kip*ft = 1.355818 kN*m (NIST SP 811 Appendix B).
 */
class CsvClaimsTest {

    @TempDir
    Path dir;

    static final Model MODEL = Models.yaml(Models.SIMPLE_BEAM + """
            loads: {D: {type: dead, member_loads: [{member: M1, w: -10}]}}
            """);

    ClaimSet read(String text) throws Exception {
        Path f = dir.resolve("claims.csv");
        Files.writeString(f, text);
        return ClaimsReader.read(f, MODEL);
    }

    @Test
    void headersInCapitalsWithSpacesInAnyOrder() throws Exception {
        ClaimSet cs = read(" Item , Combo,NAME, Quantity , Unit, Value\nreaction,D,A,Fy,kN,30\n");
        Claim c = cs.claims().get(0);
        assertEquals(Quantity.FY, c.quantity());
        assertEquals(30e3, c.valueInternal(), 1e-9);
    }

    @Test
    void semicolonsWithDecimalCommasAndRowsOfEmptySeparators() throws Exception {
        ClaimSet cs = read("item;combo;name;quantity;value;unit;tolerance\n"
                + "reaction;D;A;Fy;29,5;kN;2,5%\n"
                + ";;;;;;\n"
                + "\n"
                + "member;D;M1;M_max;45;kNm;\n");
        assertEquals(2, cs.claims().size());
        assertEquals(29.5e3, cs.claims().get(0).valueInternal(), 1e-9);
        assertEquals(0.025, cs.claims().get(0).toleranceOverride(), 1e-15);
        assertEquals(45e3, cs.claims().get(1).valueInternal(), 1e-9);
        assertTrue(Double.isNaN(cs.claims().get(1).toleranceOverride()));
    }

    @Test
    void linesBeforeTheHeaderCarrySourceUnitsAndTolerance() throws Exception {
        ClaimSet cs = read("""
                # source: Beam schedule, sheet 3
                # units: {force: kip, length: ft}
                # tolerance: {reaction: 4%}
                item,combo,name,quantity,value
                reaction,D,A,Fy,6.744
                member,D,M1,M_max,33.19
                """);
        assertEquals("Beam schedule, sheet 3", cs.source());
        assertEquals(0.04, cs.tolerances().get("reaction"), 1e-15);
        assertEquals(6.744 * 4448.2216152605, cs.claims().get(0).valueInternal(), 1e-6);
        assertEquals("kip", cs.claims().get(0).writtenUnit());
        assertEquals(33.19 * 1355.8179483314, cs.claims().get(1).valueInternal(), 1e-6);
    }

    @Test
    void oneToleranceForTheWholeFile() throws Exception {
        ClaimSet cs = read("# tolerance: 2%\nitem,combo,name,quantity,value,unit\nreaction,D,A,Fy,30,kN\n");
        assertEquals(0.02, cs.tolerances().get("default"), 1e-15);
    }

    @Test
    void kipFeetAsTheTradeWritesThem() throws Exception {
        ClaimSet cs = read("item,combo,name,quantity,value,unit\nmember,D,M1,M_max,33.19,k-ft\nreaction,D,A,Fy,6.744,kips\n");
        assertEquals(33.19 * 1355.8179483314, cs.claims().get(0).valueInternal(), 1e-6);
        assertEquals(6.744 * 4448.2216152605, cs.claims().get(1).valueInternal(), 1e-6);
    }

    @Test
    void problemsNameTheLineAndTheColumn() {
        InputException e = assertThrows(InputException.class, () -> read("# source: x\n\nitem,combo,name,quantty,value\nreaction,D,A,Fy,30\n"));
        String all = e.problems().toString();
        assertTrue(all.contains("did you mean 'quantity'"), all);
        InputException row = assertThrows(InputException.class, () -> read("# source: x\nitem,combo,name,quantity,value\n"
                + "reaction,D,A,Fy,30\nreaction,D,B,Fy,thirty\n"));
        assertEquals(4, row.problems().get(0).at().line(), row.problems().toString());
        assertEquals("value", row.problems().get(0).field());
        InputException semi = assertThrows(InputException.class, () -> read("item;combo;name;quantity;value\nreaction;D;A;Fy;3x\n"));
        assertTrue(semi.problems().get(0).message().contains("decimal comma"), semi.problems().toString());
        InputException none = assertThrows(InputException.class, () -> read("# only a preamble\n"));
        assertTrue(none.problems().toString().contains("no header"), none.problems().toString());
    }

    @Test
    void theMinimalFileStillReads() throws Exception {
        assertEquals(List.of(30e3), read("item,combo,name,quantity,value,unit\nreaction,D,A,Fy,30,kN\n").claims().stream()
                .map(Claim::valueInternal).toList());
    }

    @Test
    void conventionsBeforeTheHeader() throws Exception {
        ClaimSet cs = read("# conventions: {reactions: on-support}\nitem,combo,name,quantity,value\nreaction,D,A,Fy,-30\n");
        assertEquals(30e3, cs.claims().get(0).valueInternal(), 1e-9);
        assertEquals("reactions on the supports", cs.claims().get(0).convention());
        InputException e = assertThrows(InputException.class, () -> read("# conventions: {moment: hogging}\nitem,combo,name,quantity,value\n"));
        assertTrue(e.problems().get(0).message().contains("expected sagging-positive (the default) or hogging-positive"),
                e.problems().toString());
        assertEquals(1, e.problems().get(0).at().line());
    }

    @Test
    void aValueAtAPositionInTheAtColumn() throws Exception {
        // simple beam, w = 10 kN/m on 6 m: M(2) = w x (L - x) / 2 = 40 kN*m (statics by hand)
        ClaimSet cs = read("item;combo;name;quantity;value;unit;at\nmember;D;M1;M;40;kNm;2\nmember;D;M1;M;45;kNm;50%\n");
        assertEquals(Quantity.M_AT, cs.claims().get(0).quantity());
        assertEquals(2.0, cs.claims().get(0).atM(), 0);
        assertEquals(3.0, cs.claims().get(1).atM(), 1e-15);
        InputException e = assertThrows(InputException.class, () -> read("item,combo,name,quantity,value,at\nmember,D,M1,M,40,9\n"));
        assertTrue(e.problems().get(0).message().contains("is no position on member M1"), e.problems().toString());
    }
}
