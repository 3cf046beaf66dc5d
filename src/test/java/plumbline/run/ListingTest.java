package plumbline.run;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import plumbline.bench.FrameGenerator;
import plumbline.solve.SideBySide;

/**
 * solve's listing of the results, formed with the analysis (for a large model on the other
 * core while the claims are reviewed), is the very text formed from the finished check: for a
 * generated frame (invented data) large enough to be spread over the cores, and for a sample.
 */
class ListingTest {

    static CheckInputs inputs(String name, String text) throws Exception {
        return CheckInputs.of(new Source(name, text.getBytes(StandardCharsets.UTF_8)), List.of());
    }

    @Test
    void theListingFormedBesideTheReviewIsTheListingFormedAfter() throws Exception {
        String frame = FrameGenerator.frame(10, 20);
        String sample = Files.readString(Path.of("samples/portal-frame.yaml"));
        for (CheckInputs in : List.of(inputs("frame.yaml", frame), inputs("portal-frame.yaml", sample))) {
            Checked beside = Checked.of(in, Method.stiffness, Double.NaN, true);
            Checked after = Checked.of(in, Method.stiffness, Double.NaN, false);
            String listed = beside.console(true);
            assertEquals(after.console(true), listed);
            assertTrue(listed.contains("Load set"), listed);
            // without the listing asked for, the console is the summary alone
            assertEquals(after.console(false), beside.console(false));
            assertTrue(after.console(false).length() < listed.length());
        }
        assertTrue(SideBySide.worth(FrameGenerator.frame(10, 20).split("from:").length - 1, 13), "the frame is spread over the cores");
    }
}
