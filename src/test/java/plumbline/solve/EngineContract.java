package plumbline.solve;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;
import plumbline.io.ModelReader;
import plumbline.model.InputException;
import plumbline.model.Model;
import plumbline.review.Analysis;
import plumbline.review.ClaimResult;
import plumbline.review.Review;
import plumbline.review.TolerancePolicy;

/**
 * The contract every engine meets: each verification case in checks/ (a model whose claims
 * are published reference values, the source named in its header) comes out with every
 * claim ok at the case's own tolerance, and every solution in equilibrium. Each engine's
 * test extends this class, so no engine can skip a case.
 */
abstract class EngineContract {

    /** Equilibrium residual allowed on every solution, relative to the load. */
    static final double RESIDUAL = 1e-9;

    abstract Engine engine();

    /**
     * The check cases (file names) this engine declines, each for a reason of its own method
     * that says nothing of the structure; it must decline exactly these and solve the rest.
     */
    java.util.Set<String> declines() {
        return java.util.Set.of();
    }

    static Stream<Path> cases() throws IOException {
        return Files.list(Path.of("checks")).filter(p -> p.toString().endsWith(".yaml")).sorted();
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("cases")
    void referenceCase(Path file) throws InputException, IOException {
        String header = Files.readString(file);
        assertTrue(header.contains("# Source: "), "every check case names its source");
        Model m = ModelReader.read(file);
        Review r = Review.of(Analysis.of(m, List.of(engine())), TolerancePolicy.none());
        var result = r.analysis().engines().get(engine().name());
        if (declines().contains(file.getFileName().toString())) {
            assertTrue(result.declined(), file + " is on the list of cases this engine declines, but it solved it");
            assertFalse(result.instability().isBlank(), "a decline says why");
            return;
        }
        assertFalse(result.declined(), file + " declined: " + result.instability());
        assertTrue(r.analysis().stable(), file + " is stable");
        assertFalse(r.claims().isEmpty(), "a case with no reference value checks nothing");
        for (ClaimResult c : r.claims()) {
            assertEquals(ClaimResult.Status.OK, c.status(), file + ": " + c.claim().id() + " claimed "
                    + c.claim().valueInternal() + " computed " + c.computed());
        }
        for (plumbline.review.LoadSetResult s : r.analysis().solutions().get(engine().name()).values()) {
            assertTrue(s.equilibriumResidual() < RESIDUAL, s.name() + " residual " + s.equilibriumResidual());
        }
    }
}
