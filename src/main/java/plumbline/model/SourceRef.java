package plumbline.model;

import java.util.Objects;

/** Where a value was written: file, 1-based line and column (0 when unknown). */
public record SourceRef(String file, int line, int column) {
    public static SourceRef none(String file) {
        return new SourceRef(file, 0, 0);
    }

    @Override
    public String toString() {
        return file + ":" + line + ":" + column;
    }

    // equals and hashCode written out as the record would make them (every component, doubles
    // by Double.compare): the generated ones are linked through method handles the first time
    // they run, some milliseconds of a short run's start each (RecordEqualityTest holds them to
    // every component)
    @Override
    public boolean equals(Object o) {
        return o == this || o instanceof SourceRef x
                && Objects.equals(file, x.file)
                && line == x.line
                && column == x.column;
    }

    @Override
    public int hashCode() {
        int h = Objects.hashCode(file);
        h = 31 * h + line;
        h = 31 * h + column;
        return h;
    }
}
