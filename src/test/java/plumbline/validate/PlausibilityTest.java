package plumbline.validate;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import plumbline.Models;

/** Each planted input slip raises the warning of its rule of thumb (all common practice). */
class PlausibilityTest {

    static String model(String e, String density, String section, String w) {
        return """
                format: plumbline/1
                units: {force: kN, length: m}
                materials: {s: {E: %s, density: %s}}
                sections: {G: %s}
                nodes: {A: [0, 0], B: [6, 0], C: [6, 3]}
                supports: {A: pinned, B: roller}
                members: {M1: {from: A, to: B, section: G}, M2: {from: B, to: C, section: G}}
                loads: {D: {type: dead, member_loads: [{member: M1, w: %s}]}}
                """.formatted(e, density, section, w);
    }

    static final String OK_SECTION = "{A: 5700 mm2, I: 8.5e7 mm4, depth: 300 mm, material: s}";

    @ParameterizedTest(name = "{0}")
    @CsvSource(delimiter = '|', textBlock = """
            E in MPa read as GPa         | 210 MPa | 78.5 kN/m3 | {A: 5700 mm2, I: 8.5e7 mm4, depth: 300 mm, material: s} | -10    | material s
            mass density as weight       | 210 GPa | 7850 kN/m3 | {A: 5700 mm2, I: 8.5e7 mm4, depth: 300 mm, material: s} | -10    | kg/m3
            I in cm4 read as mm4         | 210 GPa | 78.5 kN/m3 | {A: 5700 mm2, I: 8.5e3 mm4, depth: 300 mm, material: s} | -10    | sqrt(I/A)
            depth in m read as mm        | 210 GPa | 78.5 kN/m3 | {A: 5700 mm2, I: 8.5e7 mm4, depth: 0.3 mm, material: s}  | -10    | span/depth
            line load in N/m             | 210 GPa | 78.5 kN/m3 | {A: 5700 mm2, I: 8.5e7 mm4, depth: 300 mm, material: s} | -10000 | N/m written as kN/m
            """)
    void slipIsWarned(String name, String e, String density, String section, String w, String words) {
        List<Plausibility.Warning> ws = Plausibility.check(Models.yaml(model(e, density, section, w)));
        assertTrue(ws.stream().anyMatch(x -> x.toString().contains(words)), name + ": " + ws);
    }

    @ParameterizedTest(name = "a usual model has no warning")
    @CsvSource({"-10"})
    void usualModelIsQuiet(String w) {
        List<Plausibility.Warning> ws = Plausibility.check(Models.yaml(model("210 GPa", "78.5 kN/m3", OK_SECTION, w)));
        assertTrue(ws.isEmpty(), ws.toString());
    }
}
