package plumbline.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.junit.jupiter.api.Test;

/** The version is written once, in pom.xml; the console, JSON and report take it from the build. */
class ToolVersionTest {

    @Test
    void theVersionIsThePoms() throws Exception {
        String pom = Files.readString(Path.of("pom.xml"));
        // the project's own <version>, the first after its <artifactId>plumbline</artifactId>
        Matcher m = Pattern.compile("<artifactId>plumbline</artifactId>\\s*<version>([^<]+)</version>").matcher(pom);
        assertTrue(m.find(), "pom.xml names the project's version");
        assertEquals(m.group(1), ResultsTree.TOOL_VERSION);
    }
}
