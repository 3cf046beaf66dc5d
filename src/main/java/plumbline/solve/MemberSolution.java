package plumbline.solve;

/**
 * One member's solved state: the forces on its ends in local axes {fx_i, fy_i, m_i, fx_j,
 * fy_j, m_j} (N, N*m, acting on the member), the transverse displacements of its end
 * nodes (local y, m), its loads, and the exact functions along it.
 */
public record MemberSolution(double[] endForcesLocal, double vStartM, double vEndM, MemberActions actions,
                             MemberResponse response, Peaks peaks) {

    public static MemberSolution of(double[] endForcesLocal, MemberActions actions, double eiNm2, double vStartM,
                                    double vEndM) {
        MemberResponse r = MemberResponse.of(new double[]{endForcesLocal[0], endForcesLocal[1], endForcesLocal[2]},
                actions, eiNm2, vStartM, vEndM);
        return new MemberSolution(endForcesLocal.clone(), vStartM, vEndM, actions, r, r.peaks());
    }

    /**
     * A member state whose peaks an engine found by its own code; the shared functions are
     * still formed for drawings and pattern envelopes.
     */
    public static MemberSolution withPeaks(double[] endForcesLocal, MemberActions actions, double eiNm2, double vStartM,
                                           double vEndM, Peaks peaks) {
        MemberResponse r = MemberResponse.of(new double[]{endForcesLocal[0], endForcesLocal[1], endForcesLocal[2]},
                actions, eiNm2, vStartM, vEndM);
        return new MemberSolution(endForcesLocal.clone(), vStartM, vEndM, actions, r, peaks);
    }

    /** One of the end forces in local axes, by index as in {@link #endForcesLocal()} (no copy). */
    public double endForceLocal(int i) {
        return endForcesLocal[i];
    }

    @Override
    public double[] endForcesLocal() {
        return endForcesLocal.clone();
    }
}
