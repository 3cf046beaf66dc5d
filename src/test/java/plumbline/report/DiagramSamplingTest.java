package plumbline.report;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;
import plumbline.solve.Poly;

/**
 * How densely the report draws a member's functions: a straight piece (constant or linear, a
 * member with no load along it) exactly by its two ends, a curved one through 24 samples; a
 * deflected shape through its 61 samples about a point apart along the drawn curve, never
 * fewer than 6 pieces, all of them on a curve 60 points long or more. Only the drawing is
 * thinned: the values printed come from the exact functions and all samples.
 */
class DiagramSamplingTest {

    @Test
    void straightPiecesAreDrawnByTheirEndsCurvedOnesThroughSamples() {
        assertEquals(1, Diagrams.steps(new Poly(3.0)), "constant shear");
        assertEquals(1, Diagrams.steps(new Poly(-2.0, 5.0)), "linear moment");
        assertEquals(1, Diagrams.steps(new Poly(1.0, 2.0, 0.0)), "a zero top coefficient is still straight");
        assertEquals(24, Diagrams.steps(new Poly(0.0, 1.0, -0.5)), "parabolic moment under a uniform load");
        assertEquals(24, Diagrams.steps(new Poly(0.0, 0.0, 0.0, 1e-12)), "a cubic however small");
    }

    @Test
    void aDeflectedShapeIsDrawnAboutAPointApart() {
        assertEquals(1, Diagrams.every(60, 60.0), "a curve of 60 points: every sample");
        assertEquals(1, Diagrams.every(60, 300.0), "longer still: every sample");
        assertEquals(2, Diagrams.every(60, 30.0), "30 points: every second sample, 30 pieces a point long");
        assertEquals(6, Diagrams.every(60, 10.0), "10 points: 10 pieces");
        assertEquals(10, Diagrams.every(60, 3.0), "3 points: at least 6 pieces, not 3");
        assertEquals(10, Diagrams.every(60, 0.0), "no length at all: still 6 pieces");
    }
}
