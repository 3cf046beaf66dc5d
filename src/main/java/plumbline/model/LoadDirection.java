package plumbline.model;

/** Direction of a member load (format reference (src/site/markdown/formats.md) section 2). GRAVITY is -y; a positive value acts downward. */
public enum LoadDirection {
    X("x"), Y("y"), LOCAL_X("local-x"), LOCAL_Y("local-y"), GRAVITY("gravity");

    public final String word;

    LoadDirection(String word) {
        this.word = word;
    }

    public static LoadDirection of(String word) {
        for (LoadDirection d : values()) if (d.word.equals(word)) return d;
        return null;
    }
}
