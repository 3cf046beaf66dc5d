package plumbline.units;

/**
 * A physical dimension as integer exponents of force, length, temperature difference and
 * plane angle. Force (not mass) is a base dimension because every structural quantity in
 * a model is written in force and length.
 */
public record Dimension(int force, int length, int temperature, int angle) {

    public static final Dimension NONE = new Dimension(0, 0, 0, 0);
    public static final Dimension FORCE = new Dimension(1, 0, 0, 0);
    public static final Dimension LENGTH = new Dimension(0, 1, 0, 0);
    public static final Dimension MOMENT = new Dimension(1, 1, 0, 0);
    public static final Dimension FORCE_PER_LENGTH = new Dimension(1, -1, 0, 0);
    public static final Dimension STRESS = new Dimension(1, -2, 0, 0);
    public static final Dimension WEIGHT_DENSITY = new Dimension(1, -3, 0, 0);
    public static final Dimension AREA = new Dimension(0, 2, 0, 0);
    public static final Dimension SECOND_MOMENT = new Dimension(0, 4, 0, 0);
    public static final Dimension ANGLE = new Dimension(0, 0, 0, 1);
    public static final Dimension TEMPERATURE = new Dimension(0, 0, 1, 0);
    public static final Dimension PER_TEMPERATURE = new Dimension(0, 0, -1, 0);
    /** Translational spring stiffness, force per length. */
    public static final Dimension TRANSLATIONAL_STIFFNESS = FORCE_PER_LENGTH;
    /** Rotational spring stiffness, moment per radian. */
    public static final Dimension ROTATIONAL_STIFFNESS = new Dimension(1, 1, 0, -1);

    // equals and hashCode written out as the record would make them: the generated ones are
    // linked through method handles the first time they run, some milliseconds of a short
    // run's start each (RecordEqualityTest holds them to every component)
    @Override
    public boolean equals(Object o) {
        return o == this || o instanceof Dimension d && force == d.force && length == d.length && temperature == d.temperature
                && angle == d.angle;
    }

    @Override
    public int hashCode() {
        return ((force * 31 + length) * 31 + temperature) * 31 + angle;
    }

    public Dimension times(Dimension o) {
        return new Dimension(force + o.force, length + o.length, temperature + o.temperature, angle + o.angle);
    }

    public Dimension power(int p) {
        return new Dimension(force * p, length * p, temperature * p, angle * p);
    }

    /** Equal in force, length and temperature; a missing "/rad" is tolerated (radians are dimensionless). */
    public boolean matchesIgnoringAngle(Dimension o) {
        return force == o.force && length == o.length && temperature == o.temperature;
    }

    /** Words an engineer reads, for error messages. */
    public String describe() {
        String name = null;
        if (equals(NONE)) name = "a plain number";
        else if (equals(FORCE)) name = "force";
        else if (equals(LENGTH)) name = "length";
        else if (equals(MOMENT)) name = "moment (force*length)";
        else if (equals(FORCE_PER_LENGTH)) name = "force/length";
        else if (equals(STRESS)) name = "stress (force/length2)";
        else if (equals(WEIGHT_DENSITY)) name = "weight density (force/length3)";
        else if (equals(AREA)) name = "area (length2)";
        else if (equals(SECOND_MOMENT)) name = "second moment of area (length4)";
        else if (equals(ANGLE)) name = "angle";
        else if (equals(TEMPERATURE)) name = "temperature difference";
        else if (equals(PER_TEMPERATURE)) name = "1/temperature";
        else if (equals(ROTATIONAL_STIFFNESS)) name = "rotational stiffness (force*length/rad)";
        return name != null ? name : formula();
    }

    public String formula() {
        StringBuilder sb = new StringBuilder();
        append(sb, "force", force);
        append(sb, "length", length);
        append(sb, "temperature", temperature);
        append(sb, "angle", angle);
        return sb.length() == 0 ? "1" : sb.toString();
    }

    private static void append(StringBuilder sb, String base, int exp) {
        if (exp == 0) return;
        if (sb.length() > 0) sb.append('*');
        sb.append(base);
        if (exp != 1) sb.append('^').append(exp);
    }
}
