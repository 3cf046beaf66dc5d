package plumbline.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.Test;

/**
 * The java options the README's command reads (src/main/launcher/plumbline.options, copied to
 * target/ by the build): a misspelt option would make java refuse to start, so the file is
 * handed to this very JVM's launcher and must be accepted. Only whether java starts is
 * checked here; what the options are worth is measured whole-process (README, Performance).
 */
class LauncherOptionsTest {

    static final Path OPTIONS = Path.of("src/main/launcher/plumbline.options");

    @Test
    void everyOptionIsOneThisJavaAccepts() throws IOException, InterruptedException {
        List<String> options = Files.readAllLines(OPTIONS).stream().map(String::trim)
                .filter(l -> !l.isEmpty() && !l.startsWith("#")).toList();
        assertTrue(options.size() >= 4, "the file holds the options: " + options);
        for (String o : options) assertTrue(o.startsWith("-XX:"), o + " is a JVM option, not an argument of the tool");
        Path java = Path.of(System.getProperty("java.home"), "bin", "java");
        Process p = new ProcessBuilder(java.toString(), "@" + OPTIONS, "-version").redirectErrorStream(true).start();
        String said = new String(p.getInputStream().readAllBytes(), StandardCharsets.UTF_8);
        assertTrue(p.waitFor(60, TimeUnit.SECONDS));
        assertEquals(0, p.exitValue(), said);
        assertFalse(said.contains("Unrecognized"), said);
    }

    @Test
    void theReadmeCommandReadsTheFileTheBuildCopies() throws IOException {
        String readme = Files.readString(Path.of("README.md"));
        assertTrue(readme.contains("java @target/plumbline.options -jar target/plumbline.jar check samples/"), "README's command");
        String pom = Files.readString(Path.of("pom.xml"));
        assertTrue(pom.contains("<copy file=\"${project.basedir}/" + OPTIONS + "\""), "the build copies the file to target/");
    }
}
