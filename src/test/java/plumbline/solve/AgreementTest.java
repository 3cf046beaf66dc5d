package plumbline.solve;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.stream.Stream;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;
import plumbline.io.ModelReader;
import plumbline.model.Model;
import plumbline.review.Agreement;
import plumbline.review.Analysis;
import plumbline.solve.force.ForceEngine;
import plumbline.solve.stiffness.StiffnessEngine;

/** The agreement that --method both reports stays below 1e-8 on every sample and reference model. */
class AgreementTest {

    static Stream<Path> models() throws IOException {
        return Stream.concat(Files.list(Path.of("checks")), Files.list(Path.of("samples")))
                .filter(p -> p.toString().endsWith(".yaml") && !p.getFileName().toString().contains("claims")).sorted();
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("models")
    void enginesAgree(Path file) throws Exception {
        Model m = ModelReader.read(file);
        Model em = Analysis.of(m, java.util.List.of()).engineModel();
        EngineResult s = new StiffnessEngine().solve(em), f = new ForceEngine().solve(em);
        double d = Agreement.maxRelativeDifference(m, s.cases(), f.cases());
        assertTrue(d < 1e-8, file + ": engines differ by " + d);
    }
}
