package plumbline.model;

/** Direction of a member load (format reference (src/site/markdown/formats.md) section 2). GRAVITY is -y; a positive value acts downward. */
public enum LoadDirection {
    X("x"), Y("y"), LOCAL_X("local-x"), LOCAL_Y("local-y"), GRAVITY("gravity");

    public final String word;

    LoadDirection(String word) {
        this.word = word;
    }

    /**
     * The global unit vector (x right, y up) in which a positive load of this direction acts,
     * on a member whose unit vector from start to end is (ex, ey): local y is local x turned
     * 90 degrees counter-clockwise; gravity is -y. (The engines' member loads resolve
     * directions by their own code, so that the equilibrium check does not share it.)
     */
    public double[] unit(double ex, double ey) {
        return switch (this) {
            case X -> new double[]{1, 0};
            case Y -> new double[]{0, 1};
            case GRAVITY -> new double[]{0, -1};
            case LOCAL_X -> new double[]{ex, ey};
            case LOCAL_Y -> new double[]{-ey, ex};
        };
    }

    public static LoadDirection of(String word) {
        for (LoadDirection d : values()) if (d.word.equals(word)) return d;
        return null;
    }
}
