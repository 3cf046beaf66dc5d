package plumbline.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

/** The growth exponent bench prints: log(t2/t1) / log(n2/n1), worked by hand. */
class BenchGrowthTest {

    @Test
    void exponentsBetweenTwoSizes() {
        // 1,000 -> 10,000 members: a stage 0.1 -> 1.0 s grows as n^1 (log 10 / log 10); 0.1 -> 3.162 s as n^1.5
        double[] small = {1000, 0.1, 0.1, 0.01, 1e9, 0.5, 0.2};
        double[] large = {10000, 1.0, 3.1623, 0.1, 1e9, 5.0, 0.2};
        assertEquals("growth exponent 1000 -> 10000 members (target <= 1.2): read 1.00 statics 1.50 (over) stiff - force - "
                + "check+json 1.00 pdf 0.00", BenchCommand.growth(small, large));
    }
}
