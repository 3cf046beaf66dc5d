package plumbline.solve;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * The exact member-function arithmetic, against algebra by hand: polynomial products,
 * Taylor shifts, roots (simple, double, at the ends of the interval), one-sided values at
 * jumps, the extremes and where they occur, and the pattern envelope of parts switched on
 * where they add.
 */
class PolyAndPiecewiseTest {

    /**
     * A value is Horner's rule as the loop writes it, (...(0 t + c_n) t + ...) t + c_0, to the
     * bit, for every degree (those written out and those looped), at any t, a leading -0.0
     * included (0 t + (-0.0) is +0.0 for t >= 0).
     */
    @Test
    void valuesAreHornersRuleToTheBit() {
        java.util.Random random = new java.util.Random(5);
        for (int degree = 0; degree <= 7; degree++) {
            for (int i = 0; i < 2_000; i++) {
                double[] c = new double[degree + 1];
                for (int k = 0; k <= degree; k++) c[k] = random.nextGaussian() * Math.pow(10, random.nextInt(9) - 4);
                if (degree == 0 && i % 3 == 0) c[0] = -0.0;
                double t = i < 2 ? (i == 0 ? Double.POSITIVE_INFINITY : Double.NaN) // the loop's 0 t makes these NaN
                        : random.nextInt(4) == 0 ? -random.nextDouble() * 6 : random.nextDouble() * 6;
                double v = 0;
                for (int k = degree; k >= 0; k--) v = v * t + c[k];
                assertEquals(Double.doubleToRawLongBits(v), Double.doubleToRawLongBits(new Poly(c).at(t)),
                        "degree " + degree + " at " + t);
            }
        }
        assertEquals(17, new Poly(1, 2, 3).at(2), 0); // 1 + 2*2 + 3*4
        // a caller's array is copied: changing it afterwards changes no polynomial
        double[] mine = {1, 2, 3};
        Poly p = new Poly(mine);
        Poly sum = p.plus(p);
        mine[2] = 100;
        assertEquals(17, p.at(2), 0);
        assertEquals(34, sum.at(2), 0);
        assertEquals("[1.0, 2.0]", new Poly(1, 2, 0).toString()); // trailing zeros left out
        assertEquals("[0.0]", new Poly(1, 2).plus(new Poly(-1, -2)).toString()); // a sum that cancels is the zero polynomial
    }

    @Test
    void polynomialAlgebra() {
        Poly p = new Poly(1, 2, 3); // 1 + 2t + 3t^2
        assertEquals("[1.0, 2.0, 3.0]", p.toString());
        assertEquals(2, p.degree());
        assertEquals(1 + 2 * 2 + 3 * 4, p.at(2), 0);
        assertEquals(0, p.coefficient(7), 0);
        // trailing zeros are not a degree
        assertEquals(1, new Poly(1, 2, 0, 0).degree());
        assertEquals(0, p.times(0).degree());
        assertEquals("[2.0, 4.0, 6.0]", p.times(2).toString());
        assertEquals("[1.0, 0.0, -1.0]", new Poly(1, 1).times(new Poly(1, -1)).toString(), "(1 + t)(1 - t)");
        assertEquals("[2.0, 6.0]", p.derivative().toString());
        assertEquals(Poly.ZERO.toString(), new Poly(5).derivative().toString());
        assertEquals("[5.0, 2.0, 3.0]", new Poly(2, 6).integral(5).toString());
        assertEquals(8, new Poly(0, 0, 3).integrate(2), 1e-15, "integral of 3t^2 over [0, 2]");
        // p(s + 1) = 1 + 2(s + 1) + 3(s + 1)^2 = 6 + 8s + 3s^2
        assertEquals("[6.0, 8.0, 3.0]", p.shifted(1).toString());
        assertEquals("[2.0, -4.0, 3.0]", p.shifted(-1).toString());
        assertEquals("[4.0, 3.0, 5.0]", new Poly(1, 2, 3).plus(new Poly(3, 1, 2)).toString());
    }

    @Test
    void rootsInTheOpenInterval() {
        assertArrayEquals(new double[]{0.5}, new Poly(-1, 2).rootsIn(1), 0);
        assertArrayEquals(new double[0], new Poly(-1, 2).rootsIn(0.5), "a root at the end is outside the open interval");
        assertArrayEquals(new double[0], new Poly(0, 2).rootsIn(1), "a root at the start is outside");
        assertArrayEquals(new double[0], new Poly(3).rootsIn(1));
        // (t - 1)^2: a double root, where the derivative's root is
        assertArrayEquals(new double[]{1}, new Poly(1, -2, 1).rootsIn(3), 0);
        // (t - 1)(t - 2)(t - 3) = -6 + 11t - 6t^2 + t^3
        Poly cubic = new Poly(-6, 11, -6, 1);
        assertArrayEquals(new double[]{1, 2, 3}, cubic.rootsIn(4), 1e-14);
        assertArrayEquals(new double[]{1, 2}, cubic.rootsIn(3), 1e-14);
        assertArrayEquals(new double[]{1, 2}, cubic.rootsIn(2.5), 1e-14);
        // t^3 - t: roots -1, 0, 1; only 1 inside (0, 2)
        assertArrayEquals(new double[]{1}, new Poly(0, -1, 0, 1).rootsIn(2), 1e-14);
        // x^2 - 2 = 0 at sqrt 2, bisected to the last bit
        assertArrayEquals(new double[]{Math.sqrt(2)}, new Poly(-2, 0, 1).rootsIn(2), 4e-16);
        // a root the bisection lands on exactly (0.75 = 3/4) and one near the end (1.9)
        assertArrayEquals(new double[]{0.75}, new Poly(-0.75, 1, 0).times(new Poly(-1.9, 1)).rootsIn(1.9), 1e-15);
        assertArrayEquals(new double[]{0.75, 1.9}, new Poly(-0.75, 1).times(new Poly(-1.9, 1)).rootsIn(2), 1e-15);
    }

    /**
     * Every root found is narrowed to machine precision: the computed value is zero there, or
     * changes sign between it and a neighbouring double. Polynomials of degree 1 to 4 made
     * from known roots (a member's functions are of these degrees), the roots well apart,
     * close together (three within 1e-3), triple, and beside a flat stretch; each known root
     * inside the interval is found, to 1e-9 of the span where the roots are well apart
     * (algebra by hand: the product of the linear factors).
     */
    @Test
    void rootsAreNarrowedToNeighbouringDoubles() {
        java.util.Random random = new java.util.Random(11);
        for (int i = 0; i < 20_000; i++) {
            double h = 0.5 + 10 * random.nextDouble(), scale = Math.pow(10, random.nextInt(13) - 6);
            int kind = i % 5, degree = 1 + random.nextInt(4);
            double[] known = new double[degree];
            for (int k = 0; k < degree; k++) known[k] = (random.nextDouble() * 1.2 - 0.1) * h;
            Poly p = new Poly(scale);
            if (kind == 1) { // three roots within 1e-3 of one another
                double r = random.nextDouble() * h, s = 1e-3 * random.nextDouble();
                p = p.times(new Poly(-r, 1)).times(new Poly(-r - s, 1)).times(new Poly(-r + 0.5 * s, 1));
            } else if (kind == 2) { // a triple root
                double r = random.nextDouble() * h;
                p = p.times(new Poly(-r, 1)).times(new Poly(-r, 1)).times(new Poly(-r, 1));
            } else if (kind == 3) { // a root beside a stretch where the value hardly changes: (t - r)(t^2 + 1e-8)
                double r = random.nextDouble() * h;
                p = p.times(new Poly(-r, 1)).times(new Poly(1e-8, 0, 1));
            } else {
                for (double r : known) p = p.times(new Poly(-r, 1));
            }
            for (double r : p.rootsIn(h)) {
                double v = p.at(r), below = p.at(Math.nextDown(r)), above = p.at(Math.nextUp(r));
                boolean narrowed = v == 0 || (below < 0) != (v < 0) || (above < 0) != (v < 0);
                org.junit.jupiter.api.Assertions.assertTrue(narrowed && r > 0 && r < h,
                        "root " + r + " of " + p + " on (0, " + h + "): values " + below + ", " + v + ", " + above);
            }
            if (kind == 0 || kind == 4) {
                double[] found = p.rootsIn(h);
                double[] inside = java.util.Arrays.stream(known).filter(r -> r > 1e-6 * h && r < h * (1 - 1e-6)).sorted().toArray();
                boolean apart = true;
                for (int k = 1; k < inside.length; k++) apart &= inside[k] - inside[k - 1] > 1e-3 * h;
                if (apart) assertArrayEquals(inside, found, 1e-9 * h, "roots of " + p + " on (0, " + h + ")");
            }
        }
    }

    /** 1 + t on [0, 2] (1 to 3), then 10 - t on [2, 4] (10 to 8): a jump of 7 at x = 2. */
    static Piecewise jump() {
        return new Piecewise(new double[]{0, 2, 4}, new Poly[]{new Poly(1, 1), new Poly(10, -1)});
    }

    @Test
    void valuesAreOneSidedAtAJump() {
        Piecewise f = jump();
        assertEquals(1, f.at(0), 0);
        assertEquals(2, f.at(1), 0);
        assertEquals(10, f.at(2), 0, "from the right at the breakpoint");
        assertEquals(3, f.atLeft(2), 0, "from the left at the breakpoint");
        assertEquals(9, f.at(3), 0);
        assertEquals(8, f.at(4), 0);
        assertEquals(8, f.atLeft(4), 0);
        assertEquals(1, f.atLeft(0), 0);
        assertEquals(2.5, f.atLeft(1.5), 0);
        assertEquals(2, f.segments());
        assertEquals(2, f.start(1), 0);
        assertEquals(4, f.end(1), 0);
        assertArrayEquals(new double[]{0, 2, 4}, f.breakpoints(), 0);
    }

    @Test
    void extremesAndWhereTheyOccur() {
        Piecewise f = jump();
        assertEquals(new Piecewise.Extreme(10, 2), f.max());
        assertEquals(new Piecewise.Extreme(1, 0), f.min());
        // 4t - t^2 on [0, 4]: top 4 at 2; the least 0 at both ends, reported at the first
        Piecewise arch = new Piecewise(new double[]{0, 4}, new Poly[]{new Poly(0, 4, -1)});
        assertEquals(new Piecewise.Extreme(4, 2), arch.max());
        assertEquals(new Piecewise.Extreme(0, 0), arch.min());
        // a piece in its own coordinate: t^2 - 2t on [3, 6] is x^2 - 8x + 15 with x = t + 3: least -1 at x = 4
        Piecewise shifted = new Piecewise(new double[]{0, 3, 6}, new Poly[]{new Poly(5), new Poly(0, -2, 1)});
        assertEquals(new Piecewise.Extreme(-1, 4), shifted.min());
        assertEquals(new Piecewise.Extreme(5, 0), shifted.max());
    }

    @Test
    void thePatternEnvelopeSwitchesOnTheArrangementsThatAdd() {
        // base 1; part A = 4x - x^2 (never negative on [0, 4]); part B = x - 2 (negative left of 2, positive right).
        // Largest: base + A + B on [2, 4] = -1 + 5x - x^2, top at x = 2.5: -1 + 12.5 - 6.25 = 5.25, both parts on.
        // Least: base + B on [0, 2] (A off), at x = 0: 1 - 2 = -1, B alone on.
        Piecewise base = new Piecewise(new double[]{0, 4}, new Poly[]{new Poly(1)});
        Piecewise a = new Piecewise(new double[]{0, 4}, new Poly[]{new Poly(0, 4, -1)});
        Piecewise b = new Piecewise(new double[]{0, 1, 4}, new Poly[]{new Poly(-2, 1), new Poly(-1, 1)});
        Envelope.Extreme max = Envelope.max(base, List.of(a, b));
        assertEquals(5.25, max.value(), 1e-14);
        assertEquals(2.5, max.xM(), 1e-14);
        assertEquals(List.of(0, 1), max.partsOn());
        Envelope.Extreme min = Envelope.min(base, List.of(a, b));
        assertEquals(-1, min.value(), 1e-14);
        assertEquals(0, min.xM(), 0);
        assertEquals(List.of(1), min.partsOn());
        // with no parts the envelope is the base function itself
        Envelope.Extreme alone = Envelope.max(jump(), List.of());
        assertEquals(10, alone.value(), 0);
        assertEquals(2, alone.xM(), 0);
        assertEquals(List.of(), alone.partsOn());
        assertEquals(1, Envelope.min(jump(), List.of()).value(), 0);
    }

    @Test
    void valuesAtABreakpointFromEitherSide() {
        // three pieces, constant 1 on [0, 1), 2 on [1, 3), 3 on [3, 4]: a jump as under a point load
        Piecewise p = new Piecewise(new double[]{0, 1, 3, 4}, new Poly[]{new Poly(1), new Poly(2), new Poly(3)});
        assertEquals(1, p.at(0), 0);
        assertEquals(2, p.at(1), 0, "at a breakpoint, the piece to the right");
        assertEquals(1, p.atLeft(1), 0, "from the left, the piece before");
        assertEquals(2, p.atLeft(3), 0);
        assertEquals(3, p.at(3), 0);
        assertEquals(2, p.atLeft(2), 0, "inside a piece both sides agree");
        assertEquals(3, p.atLeft(3.5), 0);
        assertEquals(3, p.atLeft(4), 0, "the end of the member: the last piece");
        assertEquals(1, p.atLeft(0), 0, "the start: the first piece");
    }
}
