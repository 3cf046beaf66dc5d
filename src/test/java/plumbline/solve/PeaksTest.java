package plumbline.solve;

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
        Map<String, double[]> expected = Map.of("N_max", new double[]{3, 0.1}, "N_min", new double[]{-5, 0.2},
                "N_abs", new double[]{5, 0.2}, "V_max", new double[]{7, 0.3}, "V_min", new double[]{-2, 0.4},
                "V_abs", new double[]{7, 0.3}, "M_max", new double[]{-1, 0.5}, "M_min", new double[]{-9, 0.6},
                "M_abs", new double[]{9, 0.6}, "deflection", new double[]{0.01, 0.7});
        expected.forEach((k, v) -> {
            assertEquals(v[0], p.value(k), 0.0, k);
            assertEquals(v[1], p.position(k), 0.0, k + " position");
        });
        // equal magnitudes: the max's place
        Peaks tie = new Peaks(e(4, 1), e(-4, 2), e(6, 3), e(-6, 4), e(8, 5), e(-8, 6), e(0, 7));
        assertEquals(1, tie.position("N_abs"), 0.0);
        assertEquals(3, tie.position("V_abs"), 0.0);
        assertEquals(5, tie.position("M_abs"), 0.0);
        assertThrows(IllegalArgumentException.class, () -> p.value("Q_max"));
        assertThrows(IllegalArgumentException.class, () -> p.position("Q_max"));
    }

    @Test
    void solutionsAreEqualOnlyToThemselves() {
        Solution a = new Solution("X", Map.of(), Map.of(), Map.of(), 0), b = new Solution("X", Map.of(), Map.of(), Map.of(), 0);
        assertEquals(a, a);
        assertNotEquals(a, b);
        assertEquals(System.identityHashCode(a), a.hashCode());
    }
}
