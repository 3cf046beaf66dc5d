package plumbline.serve;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.LinkOption;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.stream.Stream;
import plumbline.io.OutputBatch;
import plumbline.model.InputException;

/**
 * The folder the workbench was started in: the only place it reads or writes files. A name
 * is a path relative to it with '/' between folders; anything that would lead outside it (an
 * absolute path, '..', a link pointing out) is refused, and only model and claims files
 * (.yaml, .yml, .json, .csv) are read or written.
 */
final class Folder {

    static final List<String> EXTENSIONS = List.of(".yaml", ".yml", ".json", ".csv");
    /** Largest file opened in the editor. */
    static final long MAX_FILE_BYTES = Gate.MAX_BODY_BYTES;
    /** Folders below the starting one that are listed. */
    static final int DEPTH = 3;
    /** Files listed at most (a folder of thousands is not a calc package). */
    static final int MAX_LISTED = 500;

    /** One file that may be opened: its name relative to the folder, and size. */
    record Entry(String name, long bytes) {
    }

    private final Path root;

    Folder(Path root) throws IOException {
        this.root = root.toRealPath();
    }

    Path root() {
        return root;
    }

    /** The file a name means, inside the folder; refused when the name leads elsewhere or is not a model or claims file. */
    Path resolve(String name) throws Refused {
        if (name == null || name.isBlank()) throw new Refused(400, "no file name given");
        if (name.length() > 255 || name.indexOf('\0') >= 0 || name.indexOf('\\') >= 0 || name.indexOf(':') >= 0) {
            throw new Refused(400, "'" + shorten(name) + "' is not a file name; expected a name like portal-frame.yaml");
        }
        if (name.startsWith("/")) throw new Refused(403, "'" + shorten(name) + "' is outside the workbench's folder");
        for (String part : name.split("/")) {
            if (part.equals("..") || part.equals(".") || part.isEmpty()) {
                throw new Refused(403, "'" + shorten(name) + "' is outside the workbench's folder (no '..', '.' or empty parts)");
            }
            if (part.startsWith(".")) throw new Refused(403, "'" + shorten(name) + "': hidden files and folders are not opened");
        }
        String lower = name.toLowerCase(Locale.ROOT);
        if (EXTENSIONS.stream().noneMatch(lower::endsWith)) {
            throw new Refused(400, "'" + shorten(name) + "' is not a model or claims file; expected a name ending in "
                    + String.join(", ", EXTENSIONS));
        }
        Path p = root.resolve(name).normalize();
        if (!p.startsWith(root)) throw new Refused(403, "'" + shorten(name) + "' is outside the workbench's folder");
        try {
            // a link, or a folder on the way that is a link, may point out of the folder
            Path parent = p.getParent();
            if (Files.exists(parent) && !parent.toRealPath().startsWith(root)) {
                throw new Refused(403, "'" + shorten(name) + "' lies in a folder that leads outside the workbench's folder");
            }
            if (Files.exists(p, LinkOption.NOFOLLOW_LINKS) && !p.toRealPath().startsWith(root)) {
                throw new Refused(403, "'" + shorten(name) + "' is a link to a file outside the workbench's folder");
            }
        } catch (IOException e) {
            throw new Refused(500, "cannot look up '" + shorten(name) + "': " + e.getMessage());
        }
        return p;
    }

    /** The model and claims files in the folder and its folders (to {@link #DEPTH} down), by name. */
    List<Entry> list() throws IOException {
        List<Entry> out = new ArrayList<>();
        try (Stream<Path> files = Files.walk(root, DEPTH)) {
            for (Path p : (Iterable<Path>) files::iterator) {
                String rel = root.relativize(p).toString().replace('\\', '/');
                if (rel.isEmpty() || !Files.isRegularFile(p)) continue;
                try {
                    resolve(rel);
                } catch (Refused e) {
                    continue;
                }
                out.add(new Entry(rel, Files.size(p)));
                if (out.size() >= MAX_LISTED) break;
            }
        }
        out.sort((a, b) -> a.name().compareTo(b.name()));
        return out;
    }

    /** The bytes of a file in the folder. */
    byte[] read(String name) throws Refused {
        Path p = resolve(name);
        try {
            if (!Files.isRegularFile(p)) throw new Refused(404, "no file '" + shorten(name) + "' in the workbench's folder");
            if (Files.size(p) > MAX_FILE_BYTES) {
                throw new Refused(413, "'" + shorten(name) + "' is " + Files.size(p) + " bytes; the workbench opens files of at most "
                        + MAX_FILE_BYTES + " bytes (use the check command)");
            }
            return Files.readAllBytes(p);
        } catch (IOException e) {
            throw new Refused(500, "cannot read '" + shorten(name) + "': " + e.getMessage());
        }
    }

    /**
     * Writes a file in the folder whole or not at all (a working file renamed into place), so
     * a failed save never leaves half a model. An existing file is replaced only when asked.
     */
    void write(String name, byte[] bytes, boolean replace) throws Refused {
        Path p = resolve(name);
        if (!Files.isDirectory(p.getParent())) throw new Refused(404, "no folder for '" + shorten(name) + "' in the workbench's folder");
        if (Files.exists(p) && !replace) throw new Refused(409, "'" + shorten(name) + "' exists; confirm to replace it");
        try {
            OutputBatch batch = new OutputBatch();
            batch.add(p, bytes, "save");
            batch.commit();
        } catch (InputException | IOException e) {
            throw new Refused(500, "cannot save '" + shorten(name) + "': " + e.getMessage() + "; the file was left as it was");
        }
    }

    private static String shorten(String s) {
        return s.length() > 80 ? s.substring(0, 77) + "..." : s;
    }
}
