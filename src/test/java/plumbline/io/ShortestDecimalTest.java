package plumbline.io;

import static org.junit.jupiter.api.Assertions.assertEquals;

import com.fasterxml.jackson.core.io.NumberOutput;
import java.math.BigDecimal;
import java.math.BigInteger;
import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import org.junit.jupiter.api.Test;

/**
 * The results' number texts against the JSON library's own fast double writer (the check
 * value: Jackson's NumberOutput, which the results' generators use for every number they
 * write themselves), and the layout rules of Double.toString's specification (Java SE 19 and
 * later) worked by hand.
 */
class ShortestDecimalTest {

    static String text(double v) {
        char[] buf = new char[ShortestDecimal.ROOM + 7];
        int end = ShortestDecimal.write(v, buf, 7);
        return new String(buf, 7, end - 7);
    }

    @Test
    void layoutAsDoubleToStringSpecifiesIt() {
        // plain from 10^-3 up to 10^7, at least one digit after the point; otherwise d.ddd E exponent
        assertEquals("0.0", text(0.0));
        assertEquals("-0.0", text(-0.0));
        assertEquals("1.0", text(1.0));
        assertEquals("150.0", text(150.0));
        assertEquals("0.025", text(0.025));
        assertEquals("0.001", text(0.001));
        assertEquals("1.0E-4", text(0.0001));
        assertEquals("9999999.0", text(9999999.0));
        assertEquals("1.0E7", text(1e7));
        assertEquals("-2.5E-5", text(-2.5e-5));
        assertEquals("0.30000000000000004", text(0.1 + 0.2)); // 17 digits: no shorter decimal reads back as it
        assertEquals("1.0E23", text(1e23)); // shortest, where older JDKs printed 1.0000000000000001E23 for some
        assertEquals("4.9E-324", text(Double.MIN_VALUE));
        assertEquals("1.7976931348623157E308", text(Double.MAX_VALUE));
    }

    static List<Double> hardCases() {
        List<Double> out = new ArrayList<>(List.of(Double.MIN_VALUE, 2 * Double.MIN_VALUE, 3 * Double.MIN_VALUE,
                Double.MIN_NORMAL, Math.nextDown(Double.MIN_NORMAL), Double.MAX_VALUE, 9007199254740992.0, 9007199254740993.0,
                8.41e21, 2e23, 5e-324, 9.999999999999999e-4, 9999999.999999998, 123456789012345678.0));
        for (int e = -325; e <= 309; e++) {
            double p = Double.parseDouble("1e" + e);
            out.add(p);
            out.add(Math.nextUp(p));
            out.add(Math.nextDown(p));
        }
        for (int e = -1074; e <= 1023; e++) {
            // powers of two, where the interval below a double is half as wide as above it
            double p = Math.scalb(1.0, e);
            out.add(p);
            out.add(Math.nextUp(p));
            out.add(Math.nextDown(p));
        }
        return out;
    }

    @Test
    void everyTextIsTheLibrarysAndReadsBack() {
        List<Double> xs = hardCases();
        Random r = new Random(23);
        for (int i = 0; i < 400_000; i++) {
            xs.add(switch (i % 5) {
                case 0 -> Double.longBitsToDouble(r.nextLong()); // any double at all
                case 1 -> (r.nextDouble() - 0.5) * Math.pow(10, r.nextInt(30) - 12); // results' magnitudes
                case 2 -> r.nextInt(1_000_000) / Math.pow(10, r.nextInt(8)); // short decimals as written in models
                case 3 -> Double.longBitsToDouble(r.nextLong() >>> 12); // subnormals
                default -> (double) (r.nextLong() >> r.nextInt(64)); // whole numbers
            });
        }
        for (double x : xs) {
            if (!Double.isFinite(x)) continue;
            for (double v : new double[]{x, -x}) {
                String t = text(v);
                assertEquals(NumberOutput.toString(v, true), t, "bits " + Long.toHexString(Double.doubleToRawLongBits(v)));
                assertEquals(Double.doubleToRawLongBits(v), Double.doubleToRawLongBits(Double.parseDouble(t)), t);
            }
        }
    }

    /** The integer logarithms against exact powers over the exponents a double can have (and more). */
    @Test
    void integerLogarithmsAreExact() {
        for (int q = -1500; q <= 1500; q++) {
            // floor(q log10 2): the largest k with 10^k <= 2^q
            BigDecimal twoQ = new BigDecimal(BigInteger.TWO.pow(Math.abs(q)));
            if (q < 0) twoQ = BigDecimal.ONE.divide(twoQ);
            assertEquals(floorLog10(twoQ), ShortestDecimal.flog10pow2(q), "q " + q);
            assertEquals(floorLog10(twoQ.multiply(new BigDecimal("0.75"))), ShortestDecimal.flog10threeQuartersPow2(q), "q " + q);
        }
        for (int e = -400; e <= 400; e++) {
            // floor(e log2 10): the largest j with 2^j <= 10^e (below 1: minus the bits of 10^-e - 1)
            BigDecimal tenE = BigDecimal.ONE.scaleByPowerOfTen(e);
            int j = tenE.toBigInteger().signum() > 0 ? tenE.toBigInteger().bitLength() - 1
                    : -BigDecimal.ONE.divide(tenE).toBigInteger().subtract(BigInteger.ONE).bitLength();
            assertEquals(j, ShortestDecimal.flog2pow10(e), "e " + e);
        }
    }

    /** floor(log10 x) for x > 0, from its decimal digits. */
    static int floorLog10(BigDecimal x) {
        return x.precision() - x.scale() - 1;
    }
}
