package plumbline.io;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;

/**
 * The results of a large model written by two threads (OutputFiles.json with twoThreads):
 * the very bytes one thread writes, whatever the sizes of the streamed parts and whichever
 * thread takes each; a part that fails makes the writing fail, as in one thread. The check
 * value is the one-thread text of the same tree (and, for a small tree, JSON read back).
 */
class JsonTwoThreadsTest {

    /** A tree of many streamed parts of very different sizes (invented values), in maps and lists. */
    static Map<String, Object> tree(int parts) {
        Map<String, Object> root = new LinkedHashMap<>();
        root.put("format", "test");
        List<Object> sets = new ArrayList<>();
        for (int p = 0; p < parts; p++) {
            int n = p % 3 == 1 ? 20_000 : p % 3 == 2 ? 300 : 1; // large, middling and tiny parts in turn
            int part = p;
            Map<String, Object> set = new LinkedHashMap<>();
            set.put("name", "set " + p);
            set.put("values", (JsonOut.Streamed) out -> {
                out.startObject();
                for (int i = 0; i < n; i++) out.name("m" + i).number(part + i / 7.0);
                out.endObject();
            });
            set.put("after", p);
            sets.add(set);
        }
        root.put("sets", sets);
        root.put("names", (JsonOut.Streamed) out -> out.texts(List.of("\u00e9t\u00e9", "plain")));
        return root;
    }

    static byte[] written(Map<String, Object> tree, boolean twoThreads) throws IOException {
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        OutputFiles.json(tree, false, twoThreads, out);
        return out.toByteArray();
    }

    @Test
    void twoThreadsWriteTheVeryBytesOfOne() throws IOException {
        for (int parts : new int[]{0, 1, 2, 3, 7, 40}) { // with the list of names: 1 to 41 streamed parts
            Map<String, Object> t = tree(parts);
            byte[] one = written(t, false);
            for (int run = 0; run < 5; run++) assertArrayEquals(one, written(t, true), parts + " parts, run " + run);
        }
        Map<String, Object> back = OutputFiles.parseJson(new String(written(tree(4), true), java.nio.charset.StandardCharsets.UTF_8));
        assertEquals(4, ((List<?>) back.get("sets")).size());
        assertEquals(List.of("\u00e9t\u00e9", "plain"), back.get("names"));
        Map<?, ?> large = (Map<?, ?>) ((Map<?, ?>) ((List<?>) back.get("sets")).get(1)).get("values");
        assertEquals(20_000, large.size());
        assertEquals(1 + 19_999 / 7.0, (Double) large.get("m19999"), 0.0);
    }

    /** A part held in blocks gives back every byte in order: against the JDK's ByteArrayOutputStream. */
    @Test
    void aPartHeldInBlocksGivesBackEveryByteInOrder() throws IOException {
        java.util.Random random = new java.util.Random(17);
        for (int run = 0; run < 20; run++) {
            OutputFiles.Chunks chunks = new OutputFiles.Chunks();
            ByteArrayOutputStream reference = new ByteArrayOutputStream();
            int writes = 1 + random.nextInt(40);
            for (int w = 0; w < writes; w++) {
                // single bytes, short runs, runs that end exactly on a block, runs of several blocks
                int len = switch (random.nextInt(4)) {
                    case 0 -> 1;
                    case 1 -> random.nextInt(300);
                    case 2 -> OutputFiles.Chunks.BLOCK;
                    default -> random.nextInt(3 * OutputFiles.Chunks.BLOCK);
                };
                byte[] b = new byte[len + 5];
                random.nextBytes(b);
                if (len == 1) {
                    chunks.write(b[0]);
                    reference.write(b[0]);
                } else {
                    chunks.write(b, 5, len);
                    reference.write(b, 5, len);
                }
            }
            ByteArrayOutputStream back = new ByteArrayOutputStream();
            chunks.writeTo(back);
            assertArrayEquals(reference.toByteArray(), back.toByteArray(), "run " + run);
        }
    }

    @Test
    void aPartThatFailsMakesTheWritingFailWhicheverThreadTookIt() {
        for (int failing = 0; failing < 6; failing++) {
            Map<String, Object> t = tree(6);
            int f = failing;
            @SuppressWarnings("unchecked")
            Map<String, Object> set = (Map<String, Object>) ((List<Object>) t.get("sets")).get(f);
            set.put("values", (JsonOut.Streamed) out -> {
                throw new IllegalStateException("part " + f + " failed");
            });
            IllegalStateException e = assertThrows(IllegalStateException.class, () -> written(t, true));
            assertTrue(e.getMessage().contains("part " + f), e.getMessage());
        }
    }
}
