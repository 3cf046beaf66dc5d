package plumbline.io;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** All or nothing: a rename that fails part-way through a batch leaves every target as it was before the run. */
class OutputBatchTest {

    @TempDir
    Path dir;

    private List<String> names() throws IOException {
        try (Stream<Path> s = Files.list(dir)) {
            return s.map(p -> p.getFileName().toString()).sorted().toList();
        }
    }

    @Test
    void aFailedRenameRollsBackTheFilesAlreadyPlaced() throws Exception {
        Path a = dir.resolve("a.json"), b = dir.resolve("b.pdf"), c = dir.resolve("c.png");
        Files.writeString(a, "earlier a");
        int[] moves = {0};
        OutputBatch batch = new OutputBatch((from, to) -> {
            if (++moves[0] == 3) throw new IOException("disk full (simulated)");
            Files.move(from, to, java.nio.file.StandardCopyOption.REPLACE_EXISTING);
        });
        batch.add(a, "new a".getBytes(StandardCharsets.UTF_8), "--json");
        batch.add(b, "new b".getBytes(StandardCharsets.UTF_8), "--pdf");
        batch.add(c, "new c".getBytes(StandardCharsets.UTF_8), "--figures");
        IOException e = assertThrows(IOException.class, batch::commit);
        assertEquals("disk full (simulated)", e.getMessage());
        assertEquals("earlier a", Files.readString(a), "the earlier a.json is back");
        assertFalse(Files.exists(b), "b.pdf, placed before the failure, is taken away");
        assertEquals(List.of("a.json"), names(), "no working files left");
    }

    @Test
    void aCommittedBatchReplacesEarlierFilesAndLeavesNoWorkingFiles() throws Exception {
        Path a = dir.resolve("a.json");
        Files.writeString(a, "earlier a");
        OutputBatch batch = new OutputBatch();
        batch.add(a, "new a".getBytes(StandardCharsets.UTF_8), "--json");
        batch.add(dir.resolve("b.pdf"), new byte[]{1, 2, 3}, "--pdf");
        batch.commit();
        assertEquals("new a", Files.readString(a));
        assertArrayEquals(new byte[]{1, 2, 3}, Files.readAllBytes(dir.resolve("b.pdf")));
        assertEquals(List.of("a.json", "b.pdf"), names());
    }

    @Test
    void theSameTargetTwiceIsRefused() throws Exception {
        OutputBatch batch = new OutputBatch();
        batch.add(dir.resolve("x.png"), new byte[1], "--figures");
        assertThrows(plumbline.model.InputException.class, () -> batch.add(dir.resolve("./x.png"), new byte[1], "--pdf"));
    }
}
