package plumbline.report;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;
import plumbline.units.Dimension;
import plumbline.units.Unit;
import plumbline.units.UnitSystem;

/**
 * How the report prints numbers (common practice for calculation sheets: four significant
 * figures, no exponent for engineering magnitudes, no signed zero), and how a difference and
 * a span ratio read. The expected strings are worked by hand.
 */
class NumbersTest {

    @Test
    void fourSignificantFiguresCountedAfterRounding() {
        assertEquals("10.00", Console.fmt(10.0));
        assertEquals("10.00", Console.fmt(9.99996)); // rounds up across a power of ten: still four figures
        assertEquals("9.999", Console.fmt(9.9991));
        assertEquals("-100.0", Console.fmt(-99.996));
        assertEquals("1000", Console.fmt(999.96));
        assertEquals("0.0002300", Console.fmt(2.3e-4)); // a rotation in rad, without an exponent
        assertEquals("1.500e-07", Console.fmt(1.5e-7)); // below a millionth: an exponent is honest
    }

    @Test
    void aValueThatRoundsToZeroPrintsUnsigned() {
        assertEquals("0.00", Console.fixed(-0.001, 2));
        assertEquals("0", Console.fixed(-0.4, 0));
        assertEquals("-0.01", Console.fixed(-0.006, 2));
        assertEquals("0", Console.fmt(-0.0));
    }

    /**
     * The fixed decimals are the JDK formatter's "%.nf" (with its "-0.00" printed unsigned), for
     * values of every magnitude the report prints, decimal ties (x.xx5) and binary fractions.
     */
    @Test
    void fixedDecimalsAreTheFormattersDigits() {
        java.util.Random random = new java.util.Random(11);
        for (int i = 0; i < 60_000; i++) {
            double v = switch (i % 3) {
                case 0 -> (random.nextDouble() - 0.5) * Math.pow(10, random.nextInt(15) - 6);
                case 1 -> Double.parseDouble((random.nextInt(2_000_000) - 1_000_000) + "5e-" + random.nextInt(9));
                default -> (random.nextInt(200_000) - 100_000) / 8.0;
            };
            int decimals = random.nextInt(10);
            String formatted = String.format(java.util.Locale.ROOT, "%." + decimals + "f", v);
            if (formatted.matches("-[0.]*")) formatted = formatted.substring(1);
            assertEquals(formatted, Console.fixed(v, decimals), v + " to " + decimals + " decimals");
        }
    }

    @Test
    void differencesFitANarrowColumn() {
        assertEquals("0%", Shown.percent(0));
        assertEquals("<0.01%", Shown.percent(6.1e-15));
        assertEquals("0.05%", Shown.percent(0.0005));
        assertEquals("2.4%", Shown.percent(0.024));
        assertEquals("999.0%", Shown.percent(9.99));
        assertEquals(">999%", Shown.percent(999.242));
        assertEquals("n/a", Shown.percent(Double.POSITIVE_INFINITY));
    }

    @Test
    void tolerancesPrintAsWrittenNeverRoundedAway() {
        assertEquals("3%", Shown.tolerancePercent(0.03));
        assertEquals("0.5%", Shown.tolerancePercent(0.005));
        assertEquals("0.0001%", Shown.tolerancePercent(1e-6)); // the check cases' 0.0001 %, not "<0.01%"
        assertEquals("12.5%", Shown.tolerancePercent(0.125));
    }

    @Test
    void spanRatios() {
        // 5 m / 9.881 mm = 506.0 (by hand)
        assertEquals("L/506", Shown.spanRatio(0.009881, 5.0));
        assertEquals("L/506", Shown.spanRatio(-0.009881, 5.0));
        assertEquals("", Shown.spanRatio(0, 5.0));
        assertEquals("L/>99999", Shown.spanRatio(1e-6, 5.0));
    }

    @Test
    void displacementsInMillimetresOrInches() {
        var si = UnitSystem.SI_KN_M;
        assertEquals("12.50 mm", Shown.withUnit(si, 0.0125, Dimension.LENGTH));
        var us = new UnitSystem(new Unit("kip", Dimension.FORCE, 4448.2216152605),
                new Unit("ft", Dimension.LENGTH, 0.3048));
        // 0.0254 m is one inch exactly (NIST SP 811)
        assertEquals("1.000 in", Shown.withUnit(us, 0.0254, Dimension.LENGTH));
        assertEquals("kip*ft", Shown.unit(us, Dimension.MOMENT));
    }
}
