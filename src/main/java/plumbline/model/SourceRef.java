package plumbline.model;

/** Where a value was written: file, 1-based line and column (0 when unknown). */
public record SourceRef(String file, int line, int column) {
    public static SourceRef none(String file) {
        return new SourceRef(file, 0, 0);
    }

    @Override
    public String toString() {
        return file + ":" + line + ":" + column;
    }
}
