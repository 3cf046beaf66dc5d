package plumbline.arch;

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
            Map.entry("solve", Set.of("model", "units")),
            Map.entry("solve.stiffness", Set.of("solve", "model", "units", "linalg")),
            Map.entry("solve.force", Set.of("solve", "statics", "model", "units", "linalg")),
            Map.entry("review", Set.of("solve", "statics", "validate", "model", "units")),
            Map.entry("report", Set.of("review", "solve", "statics", "validate", "io", "model", "units")),
            Map.entry("bench", Set.of()),
            Map.entry("cli", Set.of("report", "review", "solve", "solve.stiffness", "solve.force", "statics", "validate", "io",
                    "model", "units", "linalg", "bench")));

    static final Map<String, String> LIBRARIES = Map.of("com.fasterxml.jackson", "io", "com.lowagie", "report", "picocli", "cli");

    static final Pattern OURS = Pattern.compile("plumbline\\.([a-z]+)(\\.(stiffness|force))?\\.[A-Z]");

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
