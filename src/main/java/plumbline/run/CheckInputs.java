package plumbline.run;

import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.HexFormat;
import java.util.List;
import java.util.Set;
import plumbline.io.ClaimsReader;
import plumbline.io.ModelReader;
import plumbline.model.ClaimSet;
import plumbline.model.InputException;
import plumbline.model.LimitState;
import plumbline.model.Model;
import plumbline.model.Problem;
import plumbline.model.SourceRef;
import plumbline.review.Analysis;
import plumbline.review.LoadSet;
import plumbline.statics.EquilibriumMatrix;
import plumbline.validate.ClaimCheck;
import plumbline.validate.StructureCheck;

/** The model and claims files of one run, read and validated; every problem at once. */
public final class CheckInputs {

    private final Model model;
    private final List<Source> sources;

    private CheckInputs(Model model, List<Source> sources) {
        this.model = model;
        this.sources = List.copyOf(sources);
    }

    /** The validated model with every claims file's claims. */
    public Model model() {
        return model;
    }

    /**
     * Reads and validates a model and its claims files.
     *
     * @throws InputException with every problem found, each naming file, line and field
     */
    public static CheckInputs of(Source modelFile, List<Source> claimFiles) throws InputException {
        Model m = ModelReader.read(modelFile.name(), modelFile.bytes());
        List<Problem> problems = new ArrayList<>(StructureCheck.check(m));
        if (!problems.isEmpty()) throw new InputException(problems);
        if (!m.redundants().isEmpty()) {
            List<String> labels = EquilibriumMatrix.of(m).unknowns().stream()
                    .map(EquilibriumMatrix.Unknown::label).toList();
            for (String r : m.redundants()) {
                if (!labels.contains(r)) {
                    problems.add(new Problem(SourceRef.none(m.file()), "force_method.redundants",
                            "'" + r + "' is not an independent force of this model; expected one of " + String.join(", ", labels)));
                }
            }
            if (!problems.isEmpty()) throw new InputException(problems);
        }
        List<ClaimSet> sets = new ArrayList<>();
        for (Source c : claimFiles) {
            try {
                sets.add(ClaimsReader.read(c.name(), c.bytes(), m));
            } catch (InputException e) {
                problems.addAll(e.problems());
            }
        }
        if (!problems.isEmpty()) throw new InputException(problems);
        m = m.withClaims(sets);
        List<String> names = new ArrayList<>();
        for (LoadSet s : Analysis.loadSets(m)) names.add(s.name());
        Set<LimitState> states = new HashSet<>();
        for (LoadSet s : Analysis.loadSets(m)) if (s.combination()) states.add(s.limitState());
        problems.addAll(ClaimCheck.check(m, names, states));
        if (!problems.isEmpty()) throw new InputException(problems);
        List<Source> all = new ArrayList<>();
        all.add(modelFile);
        all.addAll(claimFiles);
        return new CheckInputs(m, all);
    }

    /** The input files' names, model first, as the results and the report record them. */
    public List<String> names() {
        return sources.stream().map(Source::name).toList();
    }

    /** The SHA-256 of each input file's bytes, in the order of {@link #names()}. */
    public List<String> sha256() {
        List<String> out = new ArrayList<>();
        for (Source s : sources) {
            try {
                out.add(HexFormat.of().formatHex(MessageDigest.getInstance("SHA-256").digest(s.bytes())));
            } catch (NoSuchAlgorithmException e) {
                throw new IllegalStateException("SHA-256 is part of every Java runtime", e);
            }
        }
        return out;
    }
}
