package plumbline.solve;

import java.util.Collection;
import java.util.concurrent.CompletableFuture;
import java.util.concurrent.CompletionException;
import java.util.stream.Stream;

/**
 * Whether independent pieces of work (engines, load cases, load sets) run side by side on the
 * machine's cores or one after another in the calling thread. Each piece is a pure function
 * of the model and the results are gathered back in order, so every number is the same either
 * way; only the time differs. Handing a few milliseconds of work to other threads costs more
 * than it saves while the machine is still starting up, so small work stays in one thread.
 */
public final class SideBySide {

    /** Members times pieces from which the pieces run side by side (a sample model is far below it). */
    public static final long FROM_MEMBER_PIECES = 2_000;

    private SideBySide() {
    }

    /** The pieces as a stream: parallel when the model's members times their number reaches the threshold. */
    public static <T> Stream<T> stream(Collection<T> pieces, int members) {
        return stream(pieces, worth(members, pieces.size()));
    }

    public static <T> Stream<T> stream(Collection<T> pieces, boolean sideBySide) {
        return sideBySide ? pieces.parallelStream() : pieces.stream();
    }

    /** Whether pieces of work on a model of {@code members} members are worth running side by side. */
    public static boolean worth(int members, int pieces) {
        return (long) members * Math.max(1, pieces) >= FROM_MEMBER_PIECES;
    }

    /** The result of a piece made on another core, waited for; its own failure is rethrown as it was raised. */
    public static <T> T joined(CompletableFuture<T> piece) {
        try {
            return piece.join();
        } catch (CompletionException e) {
            if (e.getCause() instanceof RuntimeException r) throw r;
            if (e.getCause() instanceof Error err) throw err;
            throw e;
        }
    }
}
