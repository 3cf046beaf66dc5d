package plumbline.solve;

import plumbline.model.Quantity;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.Map;
import org.junit.jupiter.api.Test;

/** Peak values and their places: each abs peak takes the larger magnitude of max and min, and its place. */
class PeaksTest {

    static Piecewise.Extreme e(double v, double x) {
        return new Piecewise.Extreme(v, x);
    }

    @Test
    void absPeaksTakeTheLargerMagnitudeAndItsPlace() {
        Peaks p = new Peaks(e(3, 0.1), e(-5, 0.2), e(7, 0.3), e(-2, 0.4), e(-1, 0.5), e(-9, 0.6), e(0.01, 0.7));
        Map<Quantity, double[]> expected = Map.of(Quantity.N_MAX, new double[]{3, 0.1}, Quantity.N_MIN, new double[]{-5, 0.2},
                Quantity.N_ABS, new double[]{5, 0.2}, Quantity.V_MAX, new double[]{7, 0.3}, Quantity.V_MIN, new double[]{-2, 0.4},
                Quantity.V_ABS, new double[]{7, 0.3}, Quantity.M_MAX, new double[]{-1, 0.5}, Quantity.M_MIN, new double[]{-9, 0.6},
                Quantity.M_ABS, new double[]{9, 0.6}, Quantity.DEFLECTION, new double[]{0.01, 0.7});
        expected.forEach((k, v) -> {
            assertEquals(v[0], p.value(k), 0.0, k.symbol);
            assertEquals(v[1], p.position(k), 0.0, k + " position");
        });
        // equal magnitudes: the max's place
        Peaks tie = new Peaks(e(4, 1), e(-4, 2), e(6, 3), e(-6, 4), e(8, 5), e(-8, 6), e(0, 7));
        assertEquals(1, tie.position(Quantity.N_ABS), 0.0);
        assertEquals(3, tie.position(Quantity.V_ABS), 0.0);
        assertEquals(5, tie.position(Quantity.M_ABS), 0.0);
        // a reaction or a displacement is not a member peak
        assertThrows(IllegalArgumentException.class, () -> p.value(Quantity.FY));
        assertThrows(IllegalArgumentException.class, () -> p.position(Quantity.UX));
    }

    /** Held as fourteen numbers, the peaks give back the very extremes they were made from and compare as a record would. */
    @Test
    void peaksGiveBackTheirExtremesAndCompareByValue() {
        Piecewise.Extreme[] x = {e(3, 0.1), e(-5, 0.2), e(7, 0.3), e(-2, 0.4), e(-1, 0.5), e(-9, 0.6), e(0.01, 0.7)};
        Peaks p = new Peaks(x[0], x[1], x[2], x[3], x[4], x[5], x[6]);
        assertEquals(java.util.List.of(x), java.util.List.of(p.nMax(), p.nMin(), p.vMax(), p.vMin(), p.mMax(), p.mMin(), p.deflection()));
        Peaks same = new Peaks(x[0], x[1], x[2], x[3], x[4], x[5], x[6]);
        assertEquals(p, same);
        assertEquals(p.hashCode(), same.hashCode());
        for (int k = 0; k < 7; k++) {
            Piecewise.Extreme[] y = x.clone();
            y[k] = e(x[k].value(), x[k].xM() + 1e-9); // one place moved
            assertNotEquals(p, new Peaks(y[0], y[1], y[2], y[3], y[4], y[5], y[6]), "place " + k);
            y[k] = e(x[k].value() * 2, x[k].xM()); // one value changed
            assertNotEquals(p, new Peaks(y[0], y[1], y[2], y[3], y[4], y[5], y[6]), "value " + k);
        }
        // as a record of doubles: -0.0 is not 0.0, and NaN is NaN
        Peaks zero = new Peaks(e(0.0, 0), e(0, 0), e(0, 0), e(0, 0), e(0, 0), e(0, 0), e(0, 0));
        assertNotEquals(zero, new Peaks(e(-0.0, 0), e(0, 0), e(0, 0), e(0, 0), e(0, 0), e(0, 0), e(0, 0)));
        Peaks nan = new Peaks(e(Double.NaN, 0), e(0, 0), e(0, 0), e(0, 0), e(0, 0), e(0, 0), e(0, 0));
        assertEquals(nan, new Peaks(e(Double.NaN, 0), e(0, 0), e(0, 0), e(0, 0), e(0, 0), e(0, 0), e(0, 0)));
    }

    @Test
    void solutionsAreEqualOnlyToThemselves() {
        Solution a = new Solution("X", Map.of(), Map.of(), Map.of(), 0), b = new Solution("X", Map.of(), Map.of(), Map.of(), 0);
        assertEquals(a, a);
        assertNotEquals(a, b);
        assertEquals(System.identityHashCode(a), a.hashCode());
    }
}
