package plumbline.model;

import java.util.List;

/** The input could not be read or is invalid; carries every problem found (exit code 2). */
public final class InputException extends Exception {
    private final List<Problem> problems;

    public InputException(List<Problem> problems) {
        super(problems.isEmpty() ? "invalid input" : problems.get(0).toString());
        this.problems = List.copyOf(problems);
    }

    public InputException(Problem p) {
        this(List.of(p));
    }

    public List<Problem> problems() {
        return problems;
    }
}
