package plumbline.solve;

/**
 * One member's solved state: the forces on its ends in local axes {fx_i, fy_i, m_i, fx_j,
 * fy_j, m_j} (N, N*m, acting on the member), the transverse displacements of its end
 * nodes (local y, m), its loads, its peaks, and the exact functions along it.
 *
 * <p>The functions ({@link #response()}) follow from the rest and are formed when first asked
 * for (a drawing, a pattern envelope, a value at a place along the member), then kept: a
 * large model holds a solution of every member in every load set of both engines, and
 * keeping every one's functions would double the memory the run needs for the few that are
 * drawn. Formed again they are the same numbers, from the same code.
 */
public final class MemberSolution {

    private final double[] endForcesLocal;
    private final double vStartM, vEndM;
    private final MemberActions actions;
    private final double eiNm2;
    private final Peaks peaks;
    private volatile MemberResponse response;

    /** A member state with its functions given (they are kept as given). */
    public MemberSolution(double[] endForcesLocal, double vStartM, double vEndM, MemberActions actions,
                          MemberResponse response, Peaks peaks) {
        this(endForcesLocal, vStartM, vEndM, actions, Double.NaN, response, peaks);
    }

    private MemberSolution(double[] endForcesLocal, double vStartM, double vEndM, MemberActions actions, double eiNm2,
                           MemberResponse response, Peaks peaks) {
        this.endForcesLocal = endForcesLocal;
        this.vStartM = vStartM;
        this.vEndM = vEndM;
        this.actions = actions;
        this.eiNm2 = eiNm2;
        this.response = response;
        this.peaks = peaks;
    }

    /** A member state whose peaks are those of the shared functions (formed here, then let go). */
    public static MemberSolution of(double[] endForcesLocal, MemberActions actions, double eiNm2, double vStartM,
                                    double vEndM) {
        MemberResponse r = response(endForcesLocal, actions, eiNm2, vStartM, vEndM);
        return new MemberSolution(endForcesLocal.clone(), vStartM, vEndM, actions, eiNm2, null, r.peaks());
    }

    /**
     * A member state whose peaks an engine found by its own code; the shared functions are
     * formed when a drawing or a pattern envelope asks for them.
     */
    public static MemberSolution withPeaks(double[] endForcesLocal, MemberActions actions, double eiNm2, double vStartM,
                                           double vEndM, Peaks peaks) {
        return new MemberSolution(endForcesLocal.clone(), vStartM, vEndM, actions, eiNm2, null, peaks);
    }

    private static MemberResponse response(double[] endForcesLocal, MemberActions actions, double eiNm2, double vStartM,
                                           double vEndM) {
        return MemberResponse.of(new double[]{endForcesLocal[0], endForcesLocal[1], endForcesLocal[2]},
                actions, eiNm2, vStartM, vEndM);
    }

    /** One of the end forces in local axes, by index as in {@link #endForcesLocal()} (no copy). */
    public double endForceLocal(int i) {
        return endForcesLocal[i];
    }

    public double[] endForcesLocal() {
        return endForcesLocal.clone();
    }

    public double vStartM() {
        return vStartM;
    }

    public double vEndM() {
        return vEndM;
    }

    public MemberActions actions() {
        return actions;
    }

    public Peaks peaks() {
        return peaks;
    }

    /** The exact functions along the member, formed on first use and kept (the same numbers however often formed). */
    public MemberResponse response() {
        MemberResponse r = response;
        if (r == null) {
            r = response(endForcesLocal, actions, eiNm2, vStartM, vEndM);
            response = r;
        }
        return r;
    }
}
