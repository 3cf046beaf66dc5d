package plumbline.arch;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;

/**
 * Data flows one way (DEVELOPERS.md): every source file may name only the stages to its
 * left. The engines share no solving code: neither names the other. Jackson is read only in
 * io, OpenPDF only in report, picocli only in cli.
 */
class ArchitectureTest {

    static final Map<String, Set<String>> ALLOWED = Map.ofEntries(
            Map.entry("units", Set.of()),
            Map.entry("model", Set.of("units")),
            Map.entry("io", Set.of("model", "units")),
            Map.entry("validate", Set.of("model", "units")),
            Map.entry("linalg", Set.of()),
            Map.entry("statics", Set.of("model", "units", "linalg")),
            Map.entry("solve", Set.of("statics", "model", "units")), // the equilibrium check takes load resultants from statics
            Map.entry("solve.stiffness", Set.of("solve", "model", "units", "linalg")),
            Map.entry("solve.force", Set.of("solve", "statics", "model", "units", "linalg")),
            Map.entry("review", Set.of("solve", "statics", "validate", "model", "units")),
            Map.entry("report", Set.of("review", "solve", "statics", "validate", "io", "model", "units")),
            Map.entry("bench", Set.of()),
            Map.entry("run", Set.of("report", "review", "solve", "solve.stiffness", "solve.force", "statics", "validate", "io",
                    "model", "units")),
            Map.entry("serve", Set.of("run", "report", "review", "solve", "statics", "validate", "io", "model", "units")),
            Map.entry("cli", Set.of("serve", "run", "report", "review", "solve", "solve.stiffness", "solve.force", "statics",
                    "validate", "io", "model", "units", "linalg", "bench")));

    static final Map<String, String> LIBRARIES = Map.of("com.fasterxml.jackson", "io", "com.lowagie", "report", "picocli", "cli");

    static final Pattern OURS = Pattern.compile("plumbline\\.([a-z]+)(\\.(stiffness|force))?\\.[A-Z]");

    /**
     * The shared classes of plumbline.solve each engine may name, exactly: the result types,
     * the member loads and the seams, the equilibrium check, and for the stiffness method the
     * choice of running its load cases side by side (scheduling, no mechanics). Neither engine names the
     * shared member functions' code (MemberResponse, Poly, Piecewise beyond its value record
     * Extreme) by itself: the stiffness method takes them through MemberFunctions.SHARED, the
     * force method writes its own (ClosedFormMember).
     */
    static final Map<String, Set<String>> SHARED_BY_ENGINE = Map.of(
            "stiffness", Set.of("Engine", "EngineResult", "EngineWarning", "Equilibrium", "MemberActions", "MemberFunctions", "MemberLoading",
                    "MemberSolution", "SideBySide", "Solution"),
            "force", Set.of("Engine", "EngineResult", "Equilibrium", "ForceWorking", "MemberActions", "MemberFunctions",
                    "MemberLoading", "MemberSolution", "Peaks", "Piecewise", "Solution"));

    static final Pattern SHARED = Pattern.compile("plumbline\\.solve\\.([A-Z]\\w*)");

    @Test
    void eachEngineUsesExactlyItsListOfSharedClasses() throws Exception {
        for (var e : SHARED_BY_ENGINE.entrySet()) {
            Set<String> used = new java.util.TreeSet<>();
            List<String> piecewise = new ArrayList<>();
            try (Stream<Path> files = Files.list(Path.of("src/main/java/plumbline/solve/" + e.getKey()))) {
                for (Path f : files.filter(p -> p.toString().endsWith(".java")).toList()) {
                    String text = Files.readString(f);
                    Matcher m = SHARED.matcher(text);
                    while (m.find()) used.add(m.group(1));
                    Matcher p = Pattern.compile("\\bPiecewise\\.(\\w+)").matcher(text);
                    while (p.find()) if (!p.group(1).equals("Extreme")) piecewise.add(f + ": Piecewise." + p.group(1));
                }
            }
            assertEquals(new java.util.TreeSet<>(e.getValue()), used, e.getKey() + " method's shared classes");
            assertTrue(piecewise.isEmpty(), String.join("\n", piecewise));
        }
    }

    @Test
    void noBackwardArrows() throws Exception {
        List<String> wrong = new ArrayList<>();
        try (Stream<Path> files = Files.walk(Path.of("src/main/java/plumbline"))) {
            for (Path f : files.filter(p -> p.toString().endsWith(".java")).toList()) {
                Path rel = Path.of("src/main/java/plumbline").relativize(f.getParent());
                String pkg = rel.toString().replace('/', '.');
                String text = Files.readString(f);
                Matcher m = OURS.matcher(text);
                while (m.find()) {
                    String used = m.group(1) + (m.group(2) == null ? "" : m.group(2));
                    if (!used.equals(pkg) && !ALLOWED.get(pkg).contains(used)) wrong.add(f + " uses " + used);
                }
                for (var lib : LIBRARIES.entrySet()) {
                    if (text.contains("import " + lib.getKey()) && !pkg.equals(lib.getValue())) wrong.add(f + " imports " + lib.getKey());
                }
            }
        }
        assertTrue(wrong.isEmpty(), String.join("\n", wrong));
    }
}
