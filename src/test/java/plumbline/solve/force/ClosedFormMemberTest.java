package plumbline.solve.force;

import plumbline.model.Quantity;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Random;
import org.junit.jupiter.api.Test;
import plumbline.solve.MemberActions;
import plumbline.solve.MemberResponse;
import plumbline.solve.Peaks;
import plumbline.solve.Piecewise;

/**
 * The force method's own closed-form member functions: handbook cases by hand, and, on
 * seeded random members, the same peaks and integrals as the shared piecewise functions
 * (two codes written apart, so agreement is evidence for both).
 */
class ClosedFormMemberTest {

    static final Quantity[] PEAKS = {Quantity.N_MAX, Quantity.N_MIN, Quantity.V_MAX, Quantity.V_MIN, Quantity.M_MAX, Quantity.M_MIN,
            Quantity.DEFLECTION};

    @Test
    void simpleBeamUnderUniformLoadByHand() {
        // AISC Manual Table 3-23 case 1 (from memory): M = wL^2/8 at midspan, deflection 5wL^4/(384EI)
        double len = 8, w = 5e3, ei = 4e7;
        MemberActions a = new MemberActions(len, List.of(new MemberActions.Linear(0, len, 0, 0, -w, -w)), List.of(), List.of(), 0, 0);
        ClosedFormMember f = ClosedFormMember.of(new double[]{0, w * len / 2, 0}, a);
        Peaks p = f.peaks(ei, 0, 0, 0);
        assertEquals(w * len * len / 8, p.mMax().value(), 1e-9 * w * len * len);
        assertEquals(len / 2, p.mMax().xM(), 1e-9);
        assertEquals(5 * w * Math.pow(len, 4) / (384 * ei), p.deflection().value(), 1e-12);
        assertEquals(len / 2, p.deflection().xM(), 1e-6);
        assertEquals(w * len / 2, p.vMax().value(), 1e-9 * w * len);
        assertEquals(-w * len / 2, p.vMin().value(), 1e-9 * w * len);
        assertEquals(0, p.vMax().xM(), 0);
        // virtual work of the uniform load's moment wx(L-x)/2 against a unit end-moment diagram x/L: wL^3/24 (by hand)
        assertEquals(w * Math.pow(len, 3) / 24, f.momentIntegral(0, 1 / len), 1e-9 * w * Math.pow(len, 3));
        // and against the start diagram -1 + x/L: -wL^3/24
        assertEquals(-w * Math.pow(len, 3) / 24, f.momentIntegral(-1, 1 / len), 1e-9 * w * Math.pow(len, 3));
    }

    @Test
    void axialPointLoadAndLinearAxialLoadByHand() {
        // a member pulled at its start by 10 kN, with 4 kN pushing along +x at 3 m and a triangular axial load
        // 0 -> 2 kN/m over 2..6 m (4 kN in all): N = 10 up to 3 m, then 6; the load lowers N by 4 over 2..6 m
        double len = 6;
        MemberActions a = new MemberActions(len, List.of(new MemberActions.Linear(2, 6, 0, 2e3, 0, 0)),
                List.of(new MemberActions.Point(3, 4e3, 0)), List.of(), 0, 0);
        ClosedFormMember f = ClosedFormMember.of(new double[]{-10e3, 0, 0}, a);
        Peaks p = f.peaks(Double.NaN, 0, 0, 0);
        assertEquals(10e3, p.nMax().value(), 1e-6);
        assertEquals(2e3, p.nMin().value(), 1e-6, "10 - 4 (point) - 4 (triangle) kN at the end");
        assertEquals(len, p.nMin().xM(), 1e-9);
        // integral of N: 10*6 - 4*3 - integral over 2..6 of (x-2)^2/4 kN = 60 - 12 - 16/3 kN*m
        assertEquals((60 - 12 - 16.0 / 3) * 1e3, f.axialIntegral(), 1e-6);
    }

    @Test
    void trussMemberDeflectsLinearlyBetweenItsEnds() {
        MemberActions a = MemberActions.none(5);
        Peaks p = ClosedFormMember.of(new double[]{1e3, 0, 0}, a).peaks(Double.NaN, 1e-3, 0.002, -0.006);
        assertEquals(0.006, p.deflection().value(), 1e-15);
        assertEquals(5, p.deflection().xM(), 0);
        Peaks q = ClosedFormMember.of(new double[]{1e3, 0, 0}, a).peaks(0, 0, 0.004, -0.001);
        assertEquals(0.004, q.deflection().value(), 1e-15, "EI = 0 is a truss member too");
        assertEquals(0, q.deflection().xM(), 0);
    }

    @Test
    void couplesJumpTheMomentAndThermalCurvatureBendsAFreeMember() {
        // simple beam, couple C at midspan: M just left C/2, just right -C/2 (statics by hand)
        double len = 4, c = 8e3;
        MemberActions a = new MemberActions(len, List.of(), List.of(), List.of(new MemberActions.Couple(2, c)), 0, 0);
        Peaks p = ClosedFormMember.of(new double[]{0, c / len, 0}, a).peaks(1e7, 0, 0, 0);
        assertEquals(c / 2, p.mMax().value(), 1e-9 * c);
        assertEquals(-c / 2, p.mMin().value(), 1e-9 * c);
        assertEquals(2, p.mMax().xM(), 0);
        // unloaded member with a free thermal curvature k between fixed-position ends: v = k x (x - L) / 2, peak kL^2/8
        double k = 1e-3;
        Peaks t = ClosedFormMember.of(new double[3], MemberActions.none(len)).peaks(1e7, k, 0, 0);
        assertEquals(k * len * len / 8, t.deflection().value(), 1e-15);
        assertEquals(len / 2, t.deflection().xM(), 1e-9);
    }

    @Test
    void rootsByBracketingAndByLaguerre() {
        // (u - 1)(u - 2)(u - 3) = -6 + 11u - 6u^2 + u^3
        double[] cubic = {-6, 11, -6, 1};
        assertArrayEquals(new double[]{1, 2, 3}, ClosedFormMember.bracketedRoots(cubic, 4), 1e-12);
        double[] laguerre = ClosedFormMember.realRoots(cubic, 4);
        Arrays.sort(laguerre);
        assertArrayEquals(new double[]{1, 2, 3}, laguerre, 1e-12);
        // a root on a grid point (0.5 = 4 x 32 / 256) is taken as it is, and one at the end of the span too
        assertArrayEquals(new double[]{0.5}, ClosedFormMember.bracketedRoots(new double[]{-0.5, 1}, 4), 0);
        assertArrayEquals(new double[]{4}, ClosedFormMember.bracketedRoots(new double[]{-4, 1}, 4), 0);
        // none inside: u^2 + 1
        assertArrayEquals(new double[0], ClosedFormMember.bracketedRoots(new double[]{1, 0, 1}, 4));
        // sqrt 2 between grid points, bisected to rounding
        assertArrayEquals(new double[]{Math.sqrt(2)}, ClosedFormMember.bracketedRoots(new double[]{-2, 0, 1}, 3), 1e-15);
    }

    @Test
    void aLevelPeakIsReportedWhereItStarts() {
        // equal and opposite end moments: M constant = 5 kN*m along 4 m; its largest and least value are where
        // it starts (x = 0), as the shared functions report
        MemberActions a = MemberActions.none(4);
        Peaks p = ClosedFormMember.of(new double[]{0, 0, -5e3}, a).peaks(1e7, 0, 0, 0);
        assertEquals(5e3, p.mMax().value(), 1e-9);
        assertEquals(0, p.mMax().xM(), 0);
        assertEquals(5e3, p.mMin().value(), 1e-9);
        assertEquals(0, p.mMin().xM(), 0);
        Peaks shared = MemberResponse.of(new double[]{0, 0, -5e3, 0, 0, 5e3}, a, 1e7, 0, 0).peaks();
        assertEquals(shared.mMax().xM(), p.mMax().xM(), 0);
        assertEquals(shared.mMin().xM(), p.mMin().xM(), 0);
    }

    /** A member with random loads of every kind, at random places (ends included). */
    static MemberActions random(Random rnd, double len) {
        List<MemberActions.Linear> d = new ArrayList<>();
        List<MemberActions.Point> p = new ArrayList<>();
        List<MemberActions.Couple> c = new ArrayList<>();
        for (int k = rnd.nextInt(3); k > 0; k--) {
            double x1 = rnd.nextBoolean() ? 0 : rnd.nextDouble() * len, x2 = rnd.nextBoolean() ? len : x1 + rnd.nextDouble() * (len - x1);
            d.add(new MemberActions.Linear(x1, x2, rnd.nextGaussian() * 3e3, rnd.nextGaussian() * 3e3, rnd.nextGaussian() * 5e3,
                    rnd.nextGaussian() * 5e3));
        }
        for (int k = rnd.nextInt(3); k > 0; k--) {
            double at = rnd.nextInt(5) == 0 ? (rnd.nextBoolean() ? 0 : len) : rnd.nextDouble() * len;
            p.add(new MemberActions.Point(at, rnd.nextGaussian() * 1e4, rnd.nextGaussian() * 1e4));
        }
        for (int k = rnd.nextInt(2); k > 0; k--) c.add(new MemberActions.Couple(rnd.nextDouble() * len, rnd.nextGaussian() * 1e4));
        return new MemberActions(len, d, p, c, 0, rnd.nextBoolean() ? 0 : rnd.nextGaussian() * 1e-3);
    }

    @Test
    void samePeaksAndIntegralsAsTheSharedFunctionsOnRandomMembers() {
        Random rnd = new Random(20261202L);
        for (int trial = 0; trial < 400; trial++) {
            double len = 1 + rnd.nextDouble() * 9;
            MemberActions a = random(rnd, len);
            double[] start = {rnd.nextGaussian() * 1e4, rnd.nextGaussian() * 1e4, rnd.nextGaussian() * 1e4};
            double ei = rnd.nextInt(6) == 0 ? Double.NaN : 1e6 + rnd.nextDouble() * 1e8;
            double vs = rnd.nextGaussian() * 1e-3, ve = rnd.nextGaussian() * 1e-3;
            MemberResponse shared = MemberResponse.of(start, a, ei, vs, ve);
            ClosedFormMember own = ClosedFormMember.of(start, a);
            Peaks p = shared.peaks(), q = own.peaks(ei, a.thermalCurvaturePerM(), vs, ve);
            double force = 1e4 * (1 + a.points().size() + a.distributed().size()) * 10 * len;
            for (Quantity k : PEAKS) {
                double scale = k == Quantity.DEFLECTION ? Math.max(p.value(k), 1e-6) : force;
                assertEquals(p.value(k), q.value(k), 1e-9 * scale, "trial " + trial + " " + k + " of " + a);
            }
            // virtual-work integrals against the unit diagrams, by the shared exact integration
            assertEquals(integral(shared.axial(), 1, 0), own.axialIntegral(), 1e-9 * force * len, "trial " + trial + " N");
            for (double[] unit : new double[][]{{-1, 1 / len}, {0, 1 / len}}) {
                assertEquals(integral(shared.moment(), unit[0], unit[1]), own.momentIntegral(unit[0], unit[1]),
                        1e-9 * force * len, "trial " + trial + " M");
            }
        }
    }

    /** The integral of f(x) (alpha + beta x) over the member, piece by piece (the shared polynomial code). */
    static double integral(Piecewise f, double alpha, double beta) {
        double s = 0;
        for (int k = 0; k < f.segments(); k++) {
            double x0 = f.start(k);
            s += f.piece(k).times(new plumbline.solve.Poly(alpha + beta * x0, beta)).integrate(f.end(k) - x0);
        }
        return s;
    }

    @Test
    void bracketingFindsTheRootsLaguerreWouldFind() {
        double[] cubic = {-6, 11, -6, 1}; // (t-1)(t-2)(t-3)
        double[] r = ClosedFormMember.bracketedRoots(cubic, 4);
        assertEquals(3, r.length, Arrays.toString(r));
        for (int i = 0; i < 3; i++) assertEquals(i + 1, r[i], 1e-12);
        double[] viaLaguerre = ClosedFormMember.realRoots(cubic, 4);
        Arrays.sort(viaLaguerre);
        assertArrayEquals(new double[]{1, 2, 3}, viaLaguerre, 1e-12);
        // a root on a grid point and one at the end of the span
        double[] quad = {0, -2, 1}; // t (t - 2)
        double[] q = ClosedFormMember.bracketedRoots(quad, 2);
        assertArrayEquals(new double[]{0, 2}, q, 1e-12);
        // no sign change, no root (t^2 + 1)
        assertEquals(0, ClosedFormMember.bracketedRoots(new double[]{1, 0, 1}, 3).length);
        // roots of opposite sign change in the same grid are each found: (t - 0.5)(t - 2.5)
        double[] two = ClosedFormMember.bracketedRoots(new double[]{1.25, -3, 1}, 3);
        assertArrayEquals(new double[]{0.5, 2.5}, two, 1e-12);
        assertTrue(ClosedFormMember.BRACKETS >= 64);
    }
}
