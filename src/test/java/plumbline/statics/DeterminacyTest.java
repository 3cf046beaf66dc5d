package plumbline.statics;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import plumbline.Models;

/**
 * Classification by rank against the textbook classification of standard structures
 * (R.C. Hibbeler, Structural Analysis, ch. 2 and 3: r - 3 for beams and frames,
 * b + r - 2j for trusses, with the geometric-instability cases of parallel reactions and
 * collinear bars; from memory).
 */
class DeterminacyTest {

    static final String HEAD = plumbline.Models.HEAD + """
            """;

    @ParameterizedTest(name = "{0}")
    @CsvSource(delimiter = '|', textBlock = """
            simple beam                     | A: [0,0]; B: [6,0]                          | A: pinned; B: roller                | M1: {from: A, to: B, section: G}                                                       | determinate   | 0 | 0
            propped cantilever              | A: [0,0]; B: [6,0]                          | A: fixed; B: roller                 | M1: {from: A, to: B, section: G}                                                       | indeterminate | 1 | 0
            fixed-fixed beam                | A: [0,0]; B: [6,0]                          | A: fixed; B: fixed                  | M1: {from: A, to: B, section: G}                                                       | indeterminate | 3 | 0
            three-span beam                 | A: [0,0]; B: [5,0]; C: [10,0]; D: [15,0]    | A: pinned; B: roller; C: roller; D: roller | M1: {from: A, to: B, section: G}; M2: {from: B, to: C, section: G}; M3: {from: C, to: D, section: G} | indeterminate | 2 | 0
            portal, fixed bases             | A: [0,0]; B: [0,4]; C: [6,4]; D: [6,0]      | A: fixed; D: fixed                  | C1: {from: A, to: B, section: G}; R: {from: B, to: C, section: G}; C2: {from: D, to: C, section: G} | indeterminate | 3 | 0
            portal, pinned bases            | A: [0,0]; B: [0,4]; C: [6,4]; D: [6,0]      | A: pinned; D: pinned                | C1: {from: A, to: B, section: G}; R: {from: B, to: C, section: G}; C2: {from: D, to: C, section: G} | indeterminate | 1 | 0
            three-hinged portal             | A: [0,0]; B: [0,4]; C: [3,5]; D: [6,4]; E: [6,0] | A: pinned; E: pinned           | C1: {from: A, to: B, section: G}; R1: {from: B, to: C, section: G, hinge: end}; R2: {from: C, to: D, section: G}; C2: {from: E, to: D, section: G} | determinate | 0 | 0
            cantilever with hinge and prop  | A: [0,0]; B: [4,0]; C: [8,0]                | A: fixed; C: roller                 | M1: {from: A, to: B, section: G, hinge: end}; M2: {from: B, to: C, section: G}          | determinate   | 0 | 0
            beam on two rollers             | A: [0,0]; B: [6,0]                          | A: roller; B: roller                | M1: {from: A, to: B, section: G}                                                       | unstable      | 0 | 1
            beam on three rollers           | A: [0,0]; B: [3,0]; C: [6,0]                | A: roller; B: roller; C: roller     | M1: {from: A, to: B, section: G}; M2: {from: B, to: C, section: G}                      | unstable      | 1 | 1
            square truss, no diagonal       | A: [0,0]; B: [4,0]; C: [4,4]; D: [0,4]      | A: pinned; B: roller                | T1: {from: A, to: B, section: G, truss: true}; T2: {from: B, to: C, section: G, truss: true}; T3: {from: C, to: D, section: G, truss: true}; T4: {from: D, to: A, section: G, truss: true} | unstable | 0 | 1
            square truss, one diagonal      | A: [0,0]; B: [4,0]; C: [4,4]; D: [0,4]      | A: pinned; B: roller                | T1: {from: A, to: B, section: G, truss: true}; T2: {from: B, to: C, section: G, truss: true}; T3: {from: C, to: D, section: G, truss: true}; T4: {from: D, to: A, section: G, truss: true}; T5: {from: A, to: C, section: G, truss: true} | determinate | 0 | 0
            square truss, both diagonals    | A: [0,0]; B: [4,0]; C: [4,4]; D: [0,4]      | A: pinned; B: roller                | T1: {from: A, to: B, section: G, truss: true}; T2: {from: B, to: C, section: G, truss: true}; T3: {from: C, to: D, section: G, truss: true}; T4: {from: D, to: A, section: G, truss: true}; T5: {from: A, to: C, section: G, truss: true}; T6: {from: B, to: D, section: G, truss: true} | indeterminate | 1 | 0
            bar between two pins            | A: [0,0]; B: [4,0]                          | A: pinned; B: pinned                | T1: {from: A, to: B, section: G, truss: true}                                           | indeterminate | 1 | 0
            collinear two-bar linkage       | A: [0,0]; B: [4,0]; C: [8,0]                | A: pinned; C: pinned                | T1: {from: A, to: B, section: G, truss: true}; T2: {from: B, to: C, section: G, truss: true} | unstable | 1 | 1
            concurrent reactions            | A: [0,0]; B: [6,0]                          | A: pinned; B: {fix: [ux]}           | M1: {from: A, to: B, section: G}                                                       | unstable      | 1 | 1
            inclined roller                 | A: [0,0]; B: [6,0]                          | A: pinned; B: {fix: [uy], angle: 30 deg} | M1: {from: A, to: B, section: G}                                                  | determinate   | 0 | 0
            spring-supported cantilever tip | A: [0,0]; B: [6,0]                          | A: fixed; B: {springs: {uy: 500}}   | M1: {from: A, to: B, section: G}                                                       | indeterminate | 1 | 0
            """)
    void classification(String name, String nodes, String supports, String members, String expected, int degree,
                        int mechanisms) {
        String yaml = HEAD + "nodes: {" + nodes.replace(";", ",") + "}\nsupports: {" + supports.replace(";", ",")
                + "}\nmembers: {" + members.replace(";", ",") + "}\n";
        plumbline.model.Model model = Models.yaml(yaml);
        Determinacy.Result r = Determinacy.of(model);
        // the sparse path used for large models must classify exactly as the dense one
        Determinacy.Result sparse = Determinacy.sparse(model, EquilibriumMatrix.of(model));
        assertEquals(r.classification(), sparse.classification(), name + " sparse path");
        assertEquals(r.degree(), sparse.degree(), name + " sparse degree");
        assertEquals(r.mechanisms(), sparse.mechanisms(), name + " sparse mechanisms");
        assertEquals(expected, r.classification().word, name);
        assertEquals(degree, r.degree(), name + " degree");
        assertEquals(mechanisms, r.mechanisms(), name + " mechanisms");
        assertEquals(mechanisms, r.shapes().size());
        if (expected.equals("unstable") && r.countingDegree() >= 0) {
            assertTrue(r.countingDisagrees(), "counting formula should disagree for " + name);
        }
    }

    @ParameterizedTest(name = "{0}")
    @CsvSource(delimiter = '|', textBlock = """
            beam on two rollers       | A: roller; B: roller     | T1: {from: A, to: B, section: G}               | the whole structure can translate horizontally
            collinear linkage         | A: pinned; C: pinned     | T1: {from: A, to: B, section: G, truss: true}; T2: {from: B, to: C, section: G, truss: true} | node B can translate vertically
            """)
    void mechanismsAreDescribedInWords(String name, String supports, String members, String words) {
        String yaml = HEAD + "nodes: {A: [0,0], B: [4,0], C: [8,0]}\nsupports: {" + supports.replace(";", ",")
                + "}\nmembers: {" + members.replace(";", ",") + "}\n";
        if (!members.contains("T2")) yaml = yaml.replace(", C: [8,0]", "");
        plumbline.model.Model model = Models.yaml(yaml);
        Determinacy.Result r = Determinacy.of(model);
        assertTrue(r.shapes().get(0).description().contains(words), r.shapes().get(0).description());
        Determinacy.Result sparse = Determinacy.sparse(model, EquilibriumMatrix.of(model));
        assertTrue(sparse.shapes().get(0).description().contains(words), "sparse: " + sparse.shapes().get(0).description());
    }

    @org.junit.jupiter.api.Test
    void largeFixedBaseFrameByTheSparsePath() {
        // classic count for a rigid frame: 3m + r - 3j = 3 x bays x storeys with fixed bases (Hibbeler ch. 2, from memory)
        int bays = 20, storeys = 30;
        plumbline.model.Model m = Models.yaml(plumbline.bench.FrameGenerator.frame(bays, storeys));
        Determinacy.Result r = Determinacy.of(m);
        assertTrue(r.equations() > Determinacy.DENSE_LIMIT);
        assertEquals("indeterminate", r.classification().word);
        assertEquals(3 * bays * storeys, r.degree());
        assertEquals(0, r.mechanisms());
    }
}
