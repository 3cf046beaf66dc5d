package plumbline.io;

import java.io.BufferedOutputStream;
import java.io.IOException;
import java.io.OutputStream;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.DirectoryStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.nio.file.attribute.FileTime;
import java.security.SecureRandom;
import java.time.Duration;
import java.time.Instant;
import java.util.ArrayList;
import java.util.HexFormat;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import plumbline.model.InputException;
import plumbline.model.Problem;
import plumbline.model.SourceRef;

/**
 * The output files of one run, written all together or not at all. Every path is checked
 * before any work is done ({@link #checkPaths}); then each file is written in full to a
 * hidden ".part" file beside its target, and only when every one is written are they
 * renamed into place (each in one rename, so a target is never missing); an earlier file of
 * the same name is kept aside until then and put back if any rename fails. Files are created with the default permissions of the user's umask, as
 * any other program's output. A ".part" file left by a run that was killed (its process
 * no longer alive, or older than a day) is removed by the next run writing to that folder.
 */
public final class OutputBatch {

    /** Hidden working files: ".NAME.PID.RANDOM.part" (new content) and ".NAME.PID.RANDOM.old.part" (the file it replaces). */
    static final Pattern PART = Pattern.compile("^\\..+\\.(\\d+)\\.[0-9a-f]{12}(\\.old)?\\.part$");
    /** A working file older than this is stale whatever its process (a run on another machine sharing the folder). */
    static final Duration STALE_AFTER = Duration.ofDays(1);

    private static final SecureRandom RANDOM = new SecureRandom();

    /** What is written to one file: its bytes, or a writer that streams them (large results). */
    public interface Content {
        void writeTo(OutputStream out) throws IOException;
    }

    private final Map<Path, Content> files = new LinkedHashMap<>();
    private final Mover mover;

    /** Renames a file over another; replaceable so tests can make a rename fail. */
    interface Mover {
        void move(Path from, Path to) throws IOException;
    }

    public OutputBatch() {
        this(OutputBatch::move);
    }

    OutputBatch(Mover mover) {
        this.mover = mover;
    }

    /**
     * Refuses, before any work, output paths a run could not write or would mix up (exit 2,
     * naming the option): an empty name, a folder, a missing or unwritable folder, an input
     * file, or the same file named by two options. {@code figures} may be null.
     */
    public static void checkPaths(Map<String, Path> outputs, Path figures, List<Path> inputs) throws InputException {
        List<Problem> problems = new ArrayList<>();
        Map<Path, String> seen = new LinkedHashMap<>();
        for (var e : outputs.entrySet()) {
            String option = e.getKey();
            Path out = e.getValue();
            if (out == null) continue;
            String shown = out.toString();
            if (shown.isBlank() || out.getFileName() == null || out.getFileName().toString().isBlank()) {
                problems.add(new Problem(SourceRef.none("(command line)"), option, "has an empty file name; expected a file name"));
                continue;
            }
            Path norm = out.toAbsolutePath().normalize();
            String other = seen.putIfAbsent(norm, option);
            if (other != null) {
                problems.add(new Problem(SourceRef.none(shown), option, "is the same file as " + other
                        + "; expected a different file for each output"));
                continue;
            }
            try {
                OutputFiles.refuseInputs(out, inputs, option);
            } catch (InputException ex) {
                problems.addAll(ex.problems());
                continue;
            }
            if (Files.isDirectory(out)) {
                problems.add(new Problem(SourceRef.none(shown), option, "is a folder; expected a file name"));
                continue;
            }
            if (Files.exists(out) && (!Files.isRegularFile(out) || !Files.isWritable(out))) {
                problems.add(new Problem(SourceRef.none(shown), option, "exists and cannot be replaced (not a regular file, or "
                        + "not writable); expected a writable file name"));
                continue;
            }
            String folder = writableFolder(norm.getParent());
            if (folder != null) problems.add(new Problem(SourceRef.none(shown), option, folder));
        }
        if (figures != null) {
            if (!Files.isDirectory(figures)) {
                problems.add(new Problem(SourceRef.none(figures.toString()), "--figures",
                        "is not an existing folder; expected a folder for the PNG files"));
            } else {
                String folder = writableFolder(figures.toAbsolutePath().normalize());
                if (folder != null) problems.add(new Problem(SourceRef.none(figures.toString()), "--figures", folder));
            }
        }
        if (!problems.isEmpty()) throw new InputException(problems);
    }

    /** Null when a file can be created in the folder, else what is wrong with it (tried by creating one). */
    private static String writableFolder(Path dir) {
        if (dir == null || !Files.isDirectory(dir)) return "folder " + dir + " does not exist; expected an existing folder";
        try {
            Path probe = Files.createFile(dir.resolve(partName(".plumbline-probe", false)));
            Files.delete(probe);
            return null;
        } catch (IOException | SecurityException e) {
            return "folder " + dir + " is not writable (" + e.getClass().getSimpleName() + "); expected a folder this user can write in";
        }
    }

    private static String partName(String name, boolean old) {
        byte[] r = new byte[6];
        RANDOM.nextBytes(r);
        return "." + name + "." + ProcessHandle.current().pid() + "." + HexFormat.of().formatHex(r) + (old ? ".old" : "") + ".part";
    }

    /** Adds a file to the batch; the same target twice is refused (exit 2), as it would lose one of them. */
    public void add(Path target, byte[] bytes, String option) throws InputException {
        add(target, out -> out.write(bytes), option);
    }

    /** Adds a file whose content is streamed when the batch is written. */
    public void add(Path target, Content content, String option) throws InputException {
        Path norm = target.toAbsolutePath().normalize();
        if (Files.exists(norm) && !Files.isRegularFile(norm)) {
            throw new InputException(new Problem(SourceRef.none(target.toString()), option,
                    "is a folder or another non-file where an output must go; expected a file name (move it away)"));
        }
        if (files.putIfAbsent(norm, content) != null) {
            throw new InputException(new Problem(SourceRef.none(target.toString()), option,
                    "would be written twice in one run (two outputs share this name); expected a different file name"));
        }
    }

    public int size() {
        return files.size();
    }

    /** Writes every file, then renames them all into place; on any failure nothing of the batch is left. */
    public void commit() throws IOException {
        Set<Path> folders = new LinkedHashSet<>();
        for (Path p : files.keySet()) folders.add(p.getParent());
        for (Path dir : folders) removeStale(dir);
        Map<Path, Path> written = new LinkedHashMap<>(); // target -> its new content
        Map<Path, Path> setAside = new LinkedHashMap<>(); // target -> its earlier content
        List<Path> placed = new ArrayList<>();
        try {
            for (var e : files.entrySet()) {
                Path tmp = Files.createFile(e.getKey().resolveSibling(partName(e.getKey().getFileName().toString(), false)));
                written.put(e.getKey(), tmp);
                try (OutputStream out = new BufferedOutputStream(Files.newOutputStream(tmp), 1 << 16)) {
                    e.getValue().writeTo(out);
                }
            }
            for (var e : written.entrySet()) {
                Path target = e.getKey();
                if (Files.exists(target)) {
                    // kept beside it (a second link, else a copy) so a later failure can put it back; the
                    // target itself is replaced in one rename and never goes missing
                    Path old = target.resolveSibling(partName(target.getFileName().toString(), true));
                    try {
                        Files.createLink(old, target);
                    } catch (IOException | UnsupportedOperationException noLinks) {
                        Files.copy(target, old);
                    }
                    setAside.put(target, old);
                }
                mover.move(e.getValue(), target);
                placed.add(target);
            }
        } catch (IOException | RuntimeException failure) {
            for (Path t : placed) if (!setAside.containsKey(t)) Files.deleteIfExists(t);
            for (var e : setAside.entrySet()) {
                try {
                    move(e.getValue(), e.getKey()); // a second link (or copy) of the earlier file, renamed back
                } catch (IOException restore) {
                    failure.addSuppressed(restore);
                }
            }
            for (Path tmp : written.values()) Files.deleteIfExists(tmp);
            throw failure;
        }
        for (Path old : setAside.values()) Files.deleteIfExists(old);
    }

    private static void move(Path from, Path to) throws IOException {
        try {
            Files.move(from, to, StandardCopyOption.ATOMIC_MOVE, StandardCopyOption.REPLACE_EXISTING);
        } catch (AtomicMoveNotSupportedException e) {
            Files.move(from, to, StandardCopyOption.REPLACE_EXISTING);
        }
    }

    /**
     * Removes the working files of runs that were killed: those whose process is no longer
     * alive, and any older than {@link #STALE_AFTER}. Another live run's files are left alone.
     */
    static int removeStale(Path dir) {
        int removed = 0;
        Instant cutoff = Instant.now().minus(STALE_AFTER);
        try (DirectoryStream<Path> ds = Files.newDirectoryStream(dir, ".*.part")) {
            for (Path p : ds) {
                Matcher m = PART.matcher(p.getFileName().toString());
                if (!m.matches()) continue;
                long pid = Long.parseLong(m.group(1));
                FileTime t = Files.getLastModifiedTime(p);
                boolean dead = pid != ProcessHandle.current().pid() && ProcessHandle.of(pid).map(h -> !h.isAlive()).orElse(true);
                if (dead || t.toInstant().isBefore(cutoff)) {
                    if (Files.deleteIfExists(p)) removed++;
                }
            }
        } catch (IOException | RuntimeException e) {
            // a folder that cannot be listed: its stale files stay; the writes themselves report real trouble
        }
        return removed;
    }
}
