package plumbline.solve;

import java.util.Arrays;
import java.util.List;

/**
 * Exact internal forces and transverse displacement along one member, from the forces
 * that act on its start and the loads along it.
 *
 * <p>Signs (format reference (src/site/markdown/formats.md) section 4): N is tension positive; M is positive when it puts the
 * local -y face in tension; V = dM/dx. With q the transverse and p the axial load
 * intensity (local +y and +x), dV/dx = q, dN/dx = -p; a point force Q (local +y) raises V
 * by Q, an axial point force P lowers N by P, a counter-clockwise couple C lowers M by C.
 * The forces on the start (fx, fy, m, local axes, acting on the member) enter as the first
 * such point actions: N(0+) = -fx, V(0+) = fy, M(0+) = -m.
 *
 * <p>The transverse displacement v(x) (local +y, metres, measured from the undeformed
 * axis) follows from v'' = M/EI + kappa_T, integrated twice with v(0) and v(L) the
 * transverse displacements of the end nodes; the end rotations are not needed, so a
 * hinged end is exact.
 */
public record MemberResponse(Piecewise axial, Piecewise shear, Piecewise moment, Piecewise deflection) {

    /**
     * @param fStart     {fx, fy, m} on the member at its start, local axes (N, N, N*m)
     * @param actions    loads along the member
     * @param eiNm2      bending stiffness, NaN for a truss member without I (then v is linear)
     * @param vStartM    transverse displacement of the start node, local y
     * @param vEndM      transverse displacement of the end node, local y
     */
    public static MemberResponse of(double[] fStart, MemberActions actions, double eiNm2, double vStartM, double vEndM) {
        double len = actions.lengthM();
        double[] x = breakpoints(actions, len);
        int n = x.length - 1;
        Poly[] np = new Poly[n], vp = new Poly[n], mp = new Poly[n], wp = new Poly[n];
        double nAt = -fStart[0], vAt = fStart[1], mAt = -fStart[2];
        double slopeW = 0, wAt = 0; // W'' = M/EI + kappa with W(0) = W'(0) = 0
        boolean bending = Double.isFinite(eiNm2) && eiNm2 > 0;
        List<MemberActions.Point> points = actions.points();
        List<MemberActions.Couple> couples = actions.couples();
        List<MemberActions.Linear> distributed = actions.distributed();
        for (int k = 0; k < n; k++) {
            double x0 = x[k], x1 = x[k + 1];
            // point actions at x0 (indexed loops: an iterator per list, segment, member and load set is garbage
            // the quick compiler cannot avoid)
            for (int i = 0; i < points.size(); i++) {
                MemberActions.Point p = points.get(i);
                if (p.aM() == x0) {
                    nAt -= p.px();
                    vAt += p.qy();
                }
            }
            for (int i = 0; i < couples.size(); i++) if (couples.get(i).aM() == x0) mAt -= couples.get(i).mz();
            Poly q = Poly.ZERO, p = Poly.ZERO;
            for (int i = 0; i < distributed.size(); i++) {
                MemberActions.Linear l = distributed.get(i);
                if (l.aM() <= x0 && l.bM() >= x1 && l.bM() > l.aM()) {
                    double slopeQ = (l.q2() - l.q1()) / (l.bM() - l.aM());
                    double slopeP = (l.p2() - l.p1()) / (l.bM() - l.aM());
                    q = q.plus(new Poly(l.q1() + slopeQ * (x0 - l.aM()), slopeQ));
                    p = p.plus(new Poly(l.p1() + slopeP * (x0 - l.aM()), slopeP));
                }
            }
            Poly nPoly = p.times(-1).integral(nAt);
            Poly vPoly = q.integral(vAt);
            Poly mPoly = vPoly.integral(mAt);
            Poly curvature = bending ? mPoly.times(1.0 / eiNm2).plus(new Poly(actions.thermalCurvaturePerM())) : Poly.ZERO;
            Poly slope = curvature.integral(slopeW);
            Poly w = slope.integral(wAt);
            np[k] = nPoly;
            vp[k] = vPoly;
            mp[k] = mPoly;
            wp[k] = w;
            double h = x1 - x0;
            nAt = nPoly.at(h);
            vAt = vPoly.at(h);
            mAt = mPoly.at(h);
            slopeW = slope.at(h);
            wAt = w.at(h);
        }
        // v = vStart + theta x + W(x), with theta chosen so that v(L) = vEnd
        double theta = (vEndM - vStartM - wAt) / len;
        for (int k = 0; k < n; k++) wp[k] = wp[k].plus(new Poly(vStartM + theta * x[k], theta));
        return new MemberResponse(new Piecewise(x, np), new Piecewise(x, vp), new Piecewise(x, mp), new Piecewise(x, wp));
    }

    /** 0, L and every place a load starts, ends or acts, in order, each once. */
    private static double[] breakpoints(MemberActions actions, double len) {
        double[] all = new double[2 + 2 * actions.distributed().size() + actions.points().size() + actions.couples().size()];
        int n = 0;
        all[n++] = 0.0;
        all[n++] = len;
        for (MemberActions.Linear l : actions.distributed()) {
            all[n++] = l.aM();
            all[n++] = l.bM();
        }
        for (MemberActions.Point p : actions.points()) all[n++] = p.aM();
        for (MemberActions.Couple c : actions.couples()) all[n++] = c.aM();
        Arrays.sort(all);
        int k = 0;
        for (int i = 0; i < all.length; i++) if (k == 0 || Double.compare(all[i], all[k - 1]) != 0) all[k++] = all[i];
        return Arrays.copyOf(all, k);
    }

    /** Peaks of format reference (src/site/markdown/formats.md) section 4, exact, in SI, with their positions along the member. */
    public Peaks peaks() {
        Piecewise.Extreme[] n = axial.range(), v = shear.range(), m = moment.range(), d = deflection.range();
        Piecewise.Extreme nMax = n[0], nMin = n[1], vMax = v[0], vMin = v[1], mMax = m[0], mMin = m[1], dMax = d[0], dMin = d[1];
        Piecewise.Extreme defl = Math.abs(dMin.value()) > Math.abs(dMax.value())
                ? new Piecewise.Extreme(Math.abs(dMin.value()), dMin.xM()) : new Piecewise.Extreme(Math.abs(dMax.value()), dMax.xM());
        return new Peaks(nMax, nMin, vMax, vMin, mMax, mMin, defl);
    }
}
