package plumbline.cli;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
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

/** Reads and validates the model and claims files of one run; all problems at once. */
final class Inputs {

    final Model model;
    final List<Path> files;

    private Inputs(Model model, List<Path> files) {
        this.model = model;
        this.files = files;
    }

    static Inputs load(Path modelFile, List<Path> claimFiles) throws InputException {
        Model m = ModelReader.read(modelFile);
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
        for (Path p : claimFiles) {
            try {
                sets.add(ClaimsReader.read(p, m));
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
        List<Path> files = new ArrayList<>();
        files.add(modelFile);
        files.addAll(claimFiles);
        return new Inputs(m, files);
    }

    List<String> names() {
        return files.stream().map(Path::toString).toList();
    }

    List<String> sha256() {
        List<String> out = new ArrayList<>();
        for (Path p : files) {
            try {
                MessageDigest d = MessageDigest.getInstance("SHA-256");
                out.add(HexFormat.of().formatHex(d.digest(Files.readAllBytes(p))));
            } catch (IOException | NoSuchAlgorithmException e) {
                out.add("unreadable");
            }
        }
        return out;
    }
}
