package plumbline.serve;

import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import plumbline.io.ModelReader;
import plumbline.io.Outline;
import plumbline.model.InputException;
import plumbline.model.Model;
import plumbline.model.Problem;
import plumbline.report.ClaimLines;
import plumbline.review.DrawnLoadSets;
import plumbline.run.CheckInputs;
import plumbline.run.Checked;
import plumbline.run.ClaimTemplate;
import plumbline.run.Method;
import plumbline.run.Source;
import plumbline.validate.StructureCheck;

/**
 * What the workbench's page asks of the tool, as plain maps in and out (no HTTP here). The
 * check is the command line's own run ({@link Checked}): the JSON and PDF served are the
 * bytes {@code check} writes for the same files.
 */
final class Api {

    /** Checks kept for download; older ones are dropped (each holds a solved model). */
    static final int RUNS_KEPT = 8;

    /** One check: its outputs, made once and kept. */
    static final class CheckRun {
        final Checked checked;
        final String stem;
        final byte[] json;
        private byte[] pdf;
        private final Map<String, Map<String, byte[]>> figures = new LinkedHashMap<>();

        CheckRun(Checked checked, String stem, byte[] json) {
            this.checked = checked;
            this.stem = stem;
            this.json = json;
        }

        synchronized byte[] pdf() {
            if (pdf == null) pdf = checked.pdf(LocalDate.now());
            return pdf;
        }

        /** The report's drawings of one load set, by file name (the model sketch is the page's own drawing). */
        synchronized Map<String, byte[]> figures(String loadSet) throws IOException {
            Map<String, byte[]> f = figures.get(loadSet);
            if (f == null) {
                f = new LinkedHashMap<>(checked.figures(List.of(loadSet)));
                f.remove("model.png");
                figures.put(loadSet, f);
            }
            return f;
        }
    }

    private final Folder folder;
    private final Map<String, CheckRun> runs = new LinkedHashMap<>(16, 0.75f, true) {
        @Override
        protected boolean removeEldestEntry(Map.Entry<String, CheckRun> eldest) {
            return size() > RUNS_KEPT;
        }
    };
    private int nextRun = 1;

    Api(Folder folder) {
        this.folder = folder;
    }

    /** The model and claims files in the folder. */
    Map<String, Object> files() throws IOException {
        List<Object> list = new ArrayList<>();
        for (Folder.Entry e : folder.list()) list.add(ModelView.map("name", e.name(), "bytes", e.bytes()));
        return ModelView.map("folder", folder.root().toString(), "files", list);
    }

    Map<String, Object> open(String name) throws Refused {
        try {
            byte[] bytes = folder.read(name);
            return ModelView.map("name", name, "text", ModelReader.decode(name, bytes));
        } catch (InputException e) {
            throw new Refused(422, e.problems().get(0).toString());
        }
    }

    Map<String, Object> save(String name, String text, boolean replace) throws Refused {
        byte[] bytes = text.getBytes(StandardCharsets.UTF_8);
        folder.write(name, bytes, replace);
        return ModelView.map("saved", name, "bytes", bytes.length);
    }

    /**
     * The model as typed so far: every problem the check would report (each at its line), the
     * outline of the text for the tables, and the drawing's view when the model reads.
     */
    Map<String, Object> model(String name, String text) {
        // the text is parsed once for the tables' outline and the model
        Outline.Reading read = Outline.model(name, text);
        List<Problem> problems = new ArrayList<>(read.problems());
        Object view = null;
        if (read.model() != null) {
            problems.addAll(StructureCheck.check(read.model()));
            if (problems.isEmpty()) view = ModelView.of(read.model());
        }
        Map<String, Object> out = new LinkedHashMap<>();
        out.put("problems", problems(problems));
        out.put("outline", read.outline());
        out.put("view", view);
        return out;
    }

    /** The claims skeleton's rows for the model (the template command's), to fill in. */
    Map<String, Object> template(String name, String text) {
        try {
            Model m = CheckInputs.of(new Source(name, text.getBytes(StandardCharsets.UTF_8)), List.of()).model();
            List<Object> rows = new ArrayList<>();
            for (ClaimTemplate.Row r : ClaimTemplate.rows(m)) {
                for (String q : r.quantities()) {
                    rows.add(ModelView.map("item", r.item(), "combo", r.combo(), "name", r.name(), "quantity", q, "at", r.at()));
                }
            }
            return ModelView.map("rows", rows, "problems", List.of());
        } catch (InputException e) {
            return ModelView.map("rows", List.of(), "problems", problems(e.problems()));
        }
    }

    /**
     * Runs the check on the model and claims as the page holds them, under their file names.
     *
     * @param claims each {name, text}; a name ending in .csv is read as CSV claims
     * @param tolerance "5%" or "" for the defaults by kind
     */
    Map<String, Object> check(String modelName, String modelText, List<?> claims, String tolerance)
            throws Refused {
        double ratio = Double.NaN;
        if (tolerance != null && !tolerance.isBlank()) {
            try {
                ratio = Checked.toleranceRatio(tolerance);
            } catch (IllegalArgumentException e) {
                throw new Refused(400, "tolerance: " + e.getMessage());
            }
        }
        List<Source> claimFiles = new ArrayList<>();
        for (Object c : claims) {
            if (!(c instanceof Map<?, ?> file) || !(file.get("name") instanceof String name) || name.isBlank()
                    || !(file.get("text") instanceof String text)) {
                throw new Refused(400, "each claims file is sent as {name, text}, the name ending in .csv, .yaml, .yml or .json");
            }
            claimFiles.add(new Source(name, text.getBytes(StandardCharsets.UTF_8)));
        }
        CheckInputs in;
        try {
            in = CheckInputs.of(new Source(modelName, modelText.getBytes(StandardCharsets.UTF_8)), claimFiles);
        } catch (InputException e) {
            return ModelView.map("status", "input", "exit", 2, "problems", problems(e.problems()));
        }
        Checked c;
        try {
            c = Checked.of(in, Method.both, ratio);
        } catch (Checked.Refused e) {
            return ModelView.map("status", "refused", "exit", 2, "lines", e.lines());
        }
        ByteArrayOutputStream json = new ByteArrayOutputStream();
        try {
            c.writeJson(json);
        } catch (IOException e) {
            throw new Refused(500, "cannot make the results: " + e.getMessage());
        }
        String stem = stem(modelName);
        String id;
        synchronized (runs) {
            id = "r" + nextRun++;
            runs.put(id, new CheckRun(c, stem, json.toByteArray()));
        }
        List<String> sets = new ArrayList<>(c.review().analysis().loadSets().stream().map(s -> s.name()).toList());
        return ModelView.map("status", "checked", "exit", c.exitCode(), "run", id, "console", c.console(false),
                "loadSets", sets, "drawn", DrawnLoadSets.choose(c.review()).names(), "stem", stem,
                "claims", ClaimLines.of(c.review()));
    }

    CheckRun run(String id) throws Refused {
        synchronized (runs) {
            CheckRun r = runs.get(id);
            if (r == null) throw new Refused(404, "check " + id + " is no longer kept; run the check again");
            return r;
        }
    }

    static String stem(String name) {
        String base = name.substring(name.lastIndexOf('/') + 1);
        int dot = base.lastIndexOf('.');
        String s = dot > 0 ? base.substring(0, dot) : base;
        s = s.replaceAll("[^A-Za-z0-9._-]", "_");
        return s.isEmpty() ? "model" : s;
    }

    static List<Object> problems(List<Problem> ps) {
        List<Object> out = new ArrayList<>();
        for (Problem p : ps) {
            out.add(ModelView.map("file", p.at().file(), "line", p.at().line(), "column", p.at().column(), "field", p.field(),
                    "message", p.message(), "text", p.toString()));
        }
        return out;
    }
}
