package plumbline.serve;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** File access stays inside the folder the workbench was started in (common practice: no traversal, no links out). */
class FolderTest {

    @TempDir
    Path tmp;

    Folder folder() throws Exception {
        Path root = Files.createDirectories(tmp.resolve("calc"));
        Files.writeString(root.resolve("beam.yaml"), "format: plumbline/1\n");
        Files.createDirectories(root.resolve("sub"));
        Files.writeString(root.resolve("sub/claims.csv"), "item,combo,name,quantity,value\n");
        Files.writeString(root.resolve("notes.txt"), "not a model");
        Files.writeString(tmp.resolve("outside.yaml"), "secret: 1\n");
        return new Folder(root);
    }

    @Test
    void namesThatLeadOutsideAreRefused() throws Exception {
        Folder f = folder();
        for (String name : new String[]{"../outside.yaml", "sub/../../outside.yaml", "/etc/passwd.yaml", tmp.resolve("outside.yaml").toString(),
                "./beam.yaml", "sub//claims.csv", ".hidden.yaml", "C:\\x.yaml", "a\0.yaml"}) {
            Refused e = assertThrows(Refused.class, () -> f.read(name), name);
            assertTrue(e.status == 403 || e.status == 400, name + ": " + e.status);
        }
        assertEquals(400, assertThrows(Refused.class, () -> f.read("notes.txt")).status);
        assertEquals(404, assertThrows(Refused.class, () -> f.read("missing.yaml")).status);
    }

    @Test
    void aLinkPointingOutIsRefused() throws Exception {
        Folder f = folder();
        Files.createSymbolicLink(f.root().resolve("link.yaml"), tmp.resolve("outside.yaml"));
        Files.createSymbolicLink(f.root().resolve("out"), tmp);
        assertEquals(403, assertThrows(Refused.class, () -> f.read("link.yaml")).status);
        assertEquals(403, assertThrows(Refused.class, () -> f.read("out/outside.yaml")).status);
        assertEquals(403, assertThrows(Refused.class, () -> f.write("out/new.yaml", new byte[]{1}, true)).status);
        assertFalse(Files.exists(tmp.resolve("new.yaml")));
        assertTrue(f.list().stream().noneMatch(e -> e.name().contains("outside")), "listing follows no link out: " + f.list());
    }

    @Test
    void listsOnlyModelAndClaimsFiles() throws Exception {
        assertEquals("[beam.yaml, sub/claims.csv]", folder().list().stream().map(Folder.Entry::name).toList().toString());
    }

    @Test
    void savesWholeAndReplacesOnlyWhenAsked() throws Exception {
        Folder f = folder();
        byte[] text = "format: plumbline/1\n# edited\n".getBytes(StandardCharsets.UTF_8);
        assertEquals(409, assertThrows(Refused.class, () -> f.write("beam.yaml", text, false)).status);
        assertEquals("format: plumbline/1\n", Files.readString(f.root().resolve("beam.yaml")));
        f.write("beam.yaml", text, true);
        assertArrayEquals(text, f.read("beam.yaml"));
        f.write("sub/new-claims.csv", text, false);
        assertArrayEquals(text, Files.readAllBytes(f.root().resolve("sub/new-claims.csv")));
        assertEquals(404, assertThrows(Refused.class, () -> f.write("nofolder/x.yaml", text, false)).status);
        try (var s = Files.list(f.root())) {
            assertTrue(s.noneMatch(p -> p.getFileName().toString().contains(".part")), "no working file left behind");
        }
    }

    @Test
    void limitsHoldAtTheirEdges() throws Exception {
        Folder f = folder();
        // a forbidden character refused wherever it stands, the first place included
        for (String name : new String[]{"\\x.yaml", ":x.yaml", "\0x.yaml", "x\\y.yaml", "x:y.yaml"}) {
            assertEquals(400, assertThrows(Refused.class, () -> f.resolve(name), name).status, name);
        }
        String longest = "a".repeat(250) + ".yaml";
        assertEquals(f.root().resolve(longest), f.resolve(longest), "255 characters is a file name");
        Refused tooLong = assertThrows(Refused.class, () -> f.resolve("b" + longest));
        assertTrue(tooLong.getMessage().length() < 160 && tooLong.getMessage().contains("..."), "a long name is shortened in the message");
        byte[] exactly = new byte[(int) Folder.MAX_FILE_BYTES];
        Files.write(f.root().resolve("big.yaml"), exactly);
        assertEquals(exactly.length, f.read("big.yaml").length);
        Files.write(f.root().resolve("big.yaml"), new byte[exactly.length + 1]);
        assertEquals(413, assertThrows(Refused.class, () -> f.read("big.yaml")).status);
        for (int i = 0; i < Folder.MAX_LISTED + 5; i++) Files.writeString(f.root().resolve(String.format("m%03d.yaml", i)), "x");
        assertEquals(Folder.MAX_LISTED, f.list().size());
    }
}
