package plumbline.io;

import com.fasterxml.jackson.core.JsonFactory;
import com.fasterxml.jackson.core.StreamWriteFeature;
import com.fasterxml.jackson.core.JsonGenerator;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.OutputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.concurrent.CompletableFuture;
import java.util.concurrent.ExecutionException;
import plumbline.model.InputException;
import plumbline.model.Problem;
import plumbline.model.SourceRef;

/**
 * Output helpers: the refusal of an output path that is an input file, and the results
 * tree as JSON text. The files of a run are written by {@link OutputBatch}.
 */
public final class OutputFiles {

    private OutputFiles() {
    }

    /** Refuses an output path that is one of the inputs (exit code 2, before any work is done). */
    public static void refuseInputs(Path out, List<Path> inputs, String option) throws InputException {
        for (Path in : inputs) {
            try {
                if (Files.exists(out) && Files.exists(in) && Files.isSameFile(out, in)) {
                    throw new InputException(new Problem(SourceRef.none(out.toString()), option,
                            "is an input file; expected a new file name for the output"));
                }
            } catch (IOException e) {
                // unreadable: the write itself will report it
            }
            if (out.toAbsolutePath().normalize().equals(in.toAbsolutePath().normalize())) {
                throw new InputException(new Problem(SourceRef.none(out.toString()), option,
                        "is an input file; expected a new file name for the output"));
            }
        }
        Path dir = out.toAbsolutePath().getParent();
        if (dir != null && !Files.isDirectory(dir)) {
            throw new InputException(new Problem(SourceRef.none(out.toString()), option,
                    "folder " + dir + " does not exist; expected an existing folder"));
        }
    }

    /** The tree as indented JSON text (maps keep their order). */
    public static byte[] json(Map<String, Object> tree) throws IOException {
        return json(tree, true);
    }

    /** The tree as JSON text, indented for reading or compact (large results). */
    public static byte[] json(Map<String, Object> tree, boolean indent) throws IOException {
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        json(tree, indent, out);
        return out.toByteArray();
    }

    /**
     * Writes the tree as JSON text straight to a stream (a large result is never held whole in
     * memory as text). Written by Jackson's streaming generator, value by value: the tree holds
     * only maps, lists, texts, numbers, booleans, nulls and streamed parts.
     */
    public static void json(Map<String, Object> tree, boolean indent, OutputStream out) throws IOException {
        json(tree, indent, false, out);
    }

    /**
     * As {@link #json(Map, boolean, OutputStream)}; with {@code twoThreads} (compact text only) the
     * streamed parts are written by two threads: a helper thread writes parts a little ahead of
     * the writer into memory, the writer writes the others itself and copies the helper's in
     * their place. The text is the same bytes either way (a compact value's text does not depend
     * on where it stands); only the time differs.
     */
    public static void json(Map<String, Object> tree, boolean indent, boolean twoThreads, OutputStream out) throws IOException {
        // the shortest decimal that reads back as the same double (Schubfach), written without Double.toString's
        // detours; the stream is the caller's to close
        JsonFactory f = JsonFactory.builder().enable(StreamWriteFeature.USE_FAST_DOUBLE_WRITER)
                .disable(StreamWriteFeature.AUTO_CLOSE_TARGET).build();
        SharedParts parts = null;
        if (twoThreads && !indent) {
            List<JsonOut.Streamed> found = new ArrayList<>();
            collect(tree, found);
            if (found.size() > 1) parts = new SharedParts(f, found, out);
        }
        try (JsonGenerator g = f.createGenerator(out)) {
            if (indent) g.useDefaultPrettyPrinter();
            write(g, tree, parts);
        } finally {
            if (parts != null) parts.stop();
        }
    }

    /** The streamed parts of a tree in the order they are written. */
    private static void collect(Object v, List<JsonOut.Streamed> found) {
        if (v instanceof Map<?, ?> m) {
            for (Object x : m.values()) collect(x, found);
        } else if (v instanceof Iterable<?> list) {
            for (Object x : list) collect(x, found);
        } else if (v instanceof JsonOut.Streamed s) {
            found.add(s);
        }
    }

    /**
     * The streamed parts of one compact tree shared by the writer and a helper thread. The helper
     * first takes the last part (in the results, the envelope over every combination: the slowest
     * to form, as it reads every combination's peaks of every member; taken last, one thread would
     * form it alone at the end while the other waited). The other parts are taken in order, each
     * by one thread, and none more than {@link #AHEAD} parts beyond the writer's place (so at most
     * that many texts, and the last part's, are held in memory). The helper writes each part it
     * takes into memory. The writer, reaching a part, writes it straight out if no one has taken
     * it; if the helper is still writing it, the writer takes the next free part into memory
     * meanwhile, then copies the helper's text in its place.
     */
    private static final class SharedParts {
        static final int AHEAD = 4;
        private final JsonFactory f;
        private final List<JsonOut.Streamed> parts;
        private final OutputStream out; // the stream the writer's generator writes to
        private final List<CompletableFuture<Chunks>> texts = new ArrayList<>();
        private int taken, written; // parts taken in order by either thread; parts the writer is past (guarded by this)
        private int inOrder; // the parts taken in order: all but the last once the helper has taken it first (guarded by this)
        private boolean stopped;
        private int reached; // the writer's next part (the writer's own)

        SharedParts(JsonFactory f, List<JsonOut.Streamed> parts, OutputStream out) {
            this.f = f;
            this.parts = parts;
            this.out = out;
            for (int i = 0; i < parts.size(); i++) texts.add(new CompletableFuture<>());
            inOrder = parts.size();
            Thread helper = new Thread(this::help, "results writer");
            helper.setDaemon(true);
            helper.start();
        }

        private void help() {
            int last;
            synchronized (this) {
                // the last part, unless the writer has already reached it and taken it itself
                last = parts.size() - 1;
                if (stopped || taken > last) return;
                inOrder = last;
            }
            writeToMemory(last);
            while (true) {
                int j;
                synchronized (this) {
                    while (!stopped && taken < inOrder && taken > written + AHEAD) {
                        try {
                            wait();
                        } catch (InterruptedException e) {
                            return;
                        }
                    }
                    if (stopped || taken >= inOrder) return;
                    j = taken++;
                }
                writeToMemory(j);
            }
        }

        /** Part {@code j}'s text, written into memory (or the failure that stopped it). */
        private void writeToMemory(int j) {
            try {
                Chunks text = new Chunks();
                try (JsonGenerator g = f.createGenerator(text)) {
                    parts.get(j).write(new JsonOut(g));
                }
                texts.get(j).complete(text);
            } catch (Throwable t) {
                texts.get(j).completeExceptionally(t);
            }
        }

        /** The writer's next part, written straight out or copied from its text in memory. */
        void writeNext(JsonGenerator g) throws IOException {
            int i = reached++;
            while (true) {
                int other = -1;
                synchronized (this) {
                    if (taken == i && i < inOrder) {
                        taken++;
                        break;
                    }
                    if (!texts.get(i).isDone() && taken < inOrder && taken <= written + AHEAD) other = taken++;
                }
                if (other < 0) {
                    copy(i, g);
                    return;
                }
                writeToMemory(other);
            }
            parts.get(i).write(new JsonOut(g));
            passed(i);
        }

        private void copy(int i, JsonGenerator g) throws IOException {
            Chunks text;
            try {
                text = texts.get(i).get();
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
                throw new IOException("interrupted while writing the results", e);
            } catch (ExecutionException e) {
                if (e.getCause() instanceof IOException io) throw io;
                if (e.getCause() instanceof RuntimeException r) throw r;
                if (e.getCause() instanceof Error err) throw err;
                throw new IOException(e.getCause());
            }
            texts.set(i, null); // the copied text is let go
            // the value's place marked (a separator written where one is due), what the generator holds
            // passed on to the stream, and the text written straight after it
            g.writeRawValue("");
            g.flush();
            text.writeTo(out);
            passed(i);
        }

        private synchronized void passed(int i) {
            written = i + 1;
            notifyAll();
        }

        synchronized void stop() {
            stopped = true;
            notifyAll();
        }
    }

    /**
     * Bytes held in memory as a list of blocks: a part of megabytes is kept without the copies
     * a growing array makes (each block is filled once and written once).
     */
    static final class Chunks extends OutputStream {
        static final int BLOCK = 1 << 16;
        private final List<byte[]> full = new ArrayList<>();
        private byte[] last = new byte[BLOCK];
        private int used;

        @Override
        public void write(int b) {
            if (used == BLOCK) next();
            last[used++] = (byte) b;
        }

        @Override
        public void write(byte[] b, int off, int len) {
            while (len > 0) {
                if (used == BLOCK) next();
                int n = Math.min(len, BLOCK - used);
                System.arraycopy(b, off, last, used, n);
                used += n;
                off += n;
                len -= n;
            }
        }

        private void next() {
            full.add(last);
            last = new byte[BLOCK];
            used = 0;
        }

        /** Every byte written, in order. */
        void writeTo(OutputStream out) throws IOException {
            for (byte[] b : full) out.write(b);
            out.write(last, 0, used);
        }
    }

    private static void write(JsonGenerator g, Object v, SharedParts parts) throws IOException {
        if (v == null) {
            g.writeNull();
        } else if (v instanceof Map<?, ?> m) {
            g.writeStartObject();
            for (var e : m.entrySet()) {
                g.writeFieldName((String) e.getKey());
                write(g, e.getValue(), parts);
            }
            g.writeEndObject();
        } else if (v instanceof Iterable<?> list) {
            g.writeStartArray();
            for (Object item : list) write(g, item, parts);
            g.writeEndArray();
        } else if (v instanceof String s) {
            g.writeString(s);
        } else if (v instanceof Double d) {
            g.writeNumber(d);
        } else if (v instanceof Integer || v instanceof Long || v instanceof Short) {
            g.writeNumber(((Number) v).longValue());
        } else if (v instanceof Boolean b) {
            g.writeBoolean(b);
        } else if (v instanceof JsonOut.Streamed s) {
            // a streamed part writes itself into the same generator, so it is laid out as a map would be
            if (parts != null) parts.writeNext(g);
            else s.write(new JsonOut(g));
        } else {
            throw new IllegalArgumentException("no JSON form for a " + v.getClass().getName() + " in the results");
        }
    }

    /** A JSON text parsed to plain maps and lists (for tests and the schema check). */
    @SuppressWarnings("unchecked")
    public static Map<String, Object> parseJson(String text) throws IOException {
        return new ObjectMapper().readValue(text, Map.class);
    }
}
