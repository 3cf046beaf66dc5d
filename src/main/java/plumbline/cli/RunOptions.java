package plumbline.cli;

import java.nio.file.Path;
import java.util.List;
import plumbline.run.Method;

/**
 * Everything a {@code check} or {@code solve} run is asked to do, as one record: the model
 * and claims files, the outputs (null when not asked for), the engines, the tolerance for
 * claims without their own (NaN: the defaults by kind) and whether claims are checked.
 */
record RunOptions(Path model, List<Path> claims, Path json, Path pdf, Path figures, Method method, double tolerance,
                  boolean checking) {
    RunOptions {
        claims = List.copyOf(claims);
    }
}
