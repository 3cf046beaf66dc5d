package plumbline.model;

/**
 * A load on one member, as written: positions in metres from the member start, force
 * intensities in N/m (per unit member length, or per unit horizontal projection when
 * {@code perPlan}), forces in N, moments in N*m counter-clockwise positive.
 */
public sealed interface MemberLoad {
    String member();

    SourceRef at();

    /** The same load, at the same positions from the start, on another member (of the same length). */
    default MemberLoad on(String other) {
        if (this instanceof Distributed d) {
            return new Distributed(other, d.dir(), d.perPlan(), d.fromM(), d.toM(), d.w1NPerM(), d.w2NPerM(), d.at());
        }
        if (this instanceof Point p) return new Point(other, p.dir(), p.atM(), p.forceN(), p.at());
        Couple c = (Couple) this;
        return new Couple(other, c.atM(), c.momentNm(), c.at());
    }

    /** Linearly varying load from {@code fromM} (intensity w1) to {@code toM} (intensity w2). */
    record Distributed(String member, LoadDirection dir, boolean perPlan, double fromM, double toM,
                       double w1NPerM, double w2NPerM, SourceRef at) implements MemberLoad {
    }

    /** Concentrated force at {@code atM}. */
    record Point(String member, LoadDirection dir, double atM, double forceN, SourceRef at) implements MemberLoad {
    }

    /** Concentrated couple at {@code atM}, counter-clockwise positive. */
    record Couple(String member, double atM, double momentNm, SourceRef at) implements MemberLoad {
    }
}
