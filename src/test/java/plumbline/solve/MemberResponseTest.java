package plumbline.solve;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * The shared exact member functions, checked on their own because both engines use them.
 * Reference: AISC Steel Construction Manual, 15th ed., Table 3-23, case 2 (simple beam,
 * load increasing uniformly to one end; from memory): R1 = W/3, R2 = 2W/3 with W = wL/2,
 * Mmax = 2WL/(9 sqrt 3) at x = L/sqrt 3, deflection max 0.01304 W L^3 / EI at x = 0.5193 L.
 */
class MemberResponseTest {

    @Test
    void triangularLoadOnASimpleBeam() {
        double len = 6, w = 12e3, ei = 2e7, total = w * len / 2;
        MemberActions a = new MemberActions(len, List.of(new MemberActions.Linear(0, len, 0, 0, 0, -w)), List.of(),
                List.of(), 0, 0);
        // forces on the start of the member: the left reaction W/3 upward
        MemberResponse r = MemberResponse.of(new double[]{0, total / 3, 0}, a, ei, 0, 0);
        Peaks p = r.peaks();
        assertEquals(2 * total * len / (9 * Math.sqrt(3)), p.mMax().value(), 1e-9 * total * len);
        assertEquals(len / Math.sqrt(3), p.mMax().xM(), 1e-9);
        assertEquals(-2 * total / 3, r.shear().atLeft(len), 1e-9 * total);
        assertEquals(0, r.moment().atLeft(len), 1e-9 * total * len);
        // the table gives four figures, so agreement to half a unit in the last one (4e-4)
        assertEquals(0.01304 * total * Math.pow(len, 3) / ei, p.deflection().value(), 4e-4 * p.deflection().value());
        assertEquals(0.5193 * len, p.deflection().xM(), 1e-3 * len);
    }

    /**
     * A member solution forms its functions when first asked and keeps them; formed then they
     * are the very functions formed at once, and the peaks it holds are theirs. Simple beam
     * under a uniform load w (statics by hand): M at midspan wL^2/8, V at the ends +-wL/2.
     */
    @Test
    void aMemberSolutionFormsItsFunctionsOnFirstUseWithTheSameNumbers() {
        double len = 6, w = 10e3, ei = 2e7;
        MemberActions a = new MemberActions(len, List.of(new MemberActions.Linear(0, len, 0, 0, -w, -w)), List.of(), List.of(), 0, 0);
        double[] ends = {0, w * len / 2, 0, 0, w * len / 2, 0};
        MemberSolution ms = MemberSolution.of(ends, a, ei, 0.001, -0.002);
        assertEquals(w * len * len / 8, ms.peaks().value(plumbline.model.Quantity.M_MAX), 1e-9 * w * len * len, "wL^2/8");
        MemberResponse first = ms.response();
        org.junit.jupiter.api.Assertions.assertSame(first, ms.response(), "formed once, then kept");
        assertEquals(w * len * len / 8, first.moment().at(len / 2), 1e-9 * w * len * len);
        assertEquals(-w * len / 2, first.shear().atLeft(len), 1e-9 * w * len);
        MemberResponse atOnce = MemberResponse.of(new double[]{0, w * len / 2, 0}, a, ei, 0.001, -0.002);
        for (double x = 0; x <= len; x += 0.25) {
            assertEquals(atOnce.moment().at(x), first.moment().at(x), 0.0, "M at " + x);
            assertEquals(atOnce.deflection().at(x), first.deflection().at(x), 0.0, "v at " + x);
        }
        assertEquals(atOnce.peaks(), ms.peaks(), "the peaks held are those of the functions");
        // an engine's own peaks are kept as given, its functions formed from the same end forces and loads
        MemberSolution own = MemberSolution.withPeaks(ends, a, ei, 0.001, -0.002, atOnce.peaks());
        assertEquals(atOnce.shear().at(1.0), own.response().shear().at(1.0), 0.0);
        ends[1] = 0; // the solution keeps its own copy of the end forces
        assertEquals(w * len / 2, ms.endForceLocal(1), 0.0);
    }

    @Test
    void pointLoadJumpsShearAndCoupleJumpsMoment() {
        // simple beam, couple C at midspan (AISC Table 3-23 from memory, case of a concentrated moment):
        // reactions C/L, moment just left of the couple C/2, just right -C/2
        double len = 4, c = 8e3;
        MemberActions a = new MemberActions(len, List.of(), List.of(), List.of(new MemberActions.Couple(2, c)), 0, 0);
        MemberResponse r = MemberResponse.of(new double[]{0, c / len, 0}, a, 1e7, 0, 0);
        assertEquals(c / 2, r.moment().atLeft(2), 1e-9 * c);
        assertEquals(-c / 2, r.moment().at(2), 1e-9 * c);
        assertEquals(0, r.moment().atLeft(len), 1e-9 * c);
    }

    @Test
    void polynomialRootsAndShift() {
        Poly p = new Poly(-6, 11, -6, 1); // (t-1)(t-2)(t-3)
        double[] roots = p.rootsIn(10);
        assertEquals(3, roots.length);
        assertEquals(1, roots[0], 1e-12);
        assertEquals(2, roots[1], 1e-12);
        assertEquals(3, roots[2], 1e-12);
        assertEquals(p.at(2.5), p.shifted(1.5).at(1.0), 1e-12);
    }
}
