package plumbline.io;

import java.math.BigInteger;

/**
 * The shortest decimal text that reads back as a given double, laid out as
 * {@link Double#toString} specifies it (from Java 19 on; the JSON library's fast writer
 * prints the same): plain from 10^-3 to 10^7 ("0.025", "6628.562876483423", "150.0"),
 * otherwise one digit before the point and an exponent ("1.0E7", "2.6123855711E-4").
 * Written into a caller's char array, so a writer of millions of numbers makes no objects.
 *
 * <p>The digits are found by the Schubfach algorithm (R. Giulietti, "The Schubfach way to
 * render doubles", 2020): among the decimals inside the interval of reals that round to
 * the double, the one with fewest digits, and of those the closest (ties to an even last
 * digit). Powers of ten are held as 126-bit approximations of 10^-k, each formed here from
 * exact integers when first needed.
 */
final class ShortestDecimal {

    /** Characters the longest text needs ("-2.2250738585072014E-308" is 24). */
    static final int MAX_CHARS = 24;
    /** Room a caller leaves from the write position: a sign and the digits moved into place. */
    static final int ROOM = MAX_CHARS + 1;

    private static final int Q_MIN = -1074;     // exponent of a subnormal's unit: value = c 2^q
    private static final long C_MIN = 1L << 52; // the hidden bit: a normal significand is at least this
    private static final long C_TINY = 3;       // subnormal significands below this need one more digit
    private static final int K_MIN = -324, K_MAX = 292;
    private static final long MASK_63 = Long.MAX_VALUE;

    private ShortestDecimal() {
    }

    /**
     * g = hi 2^63 + lo = floor(10^-k 2^(125 - floor(log2 10^-k))) + 1, the 126-bit approximation
     * from above of 10^-k for one k. Formed from exact integers when first needed (a results file
     * needs a few dozen of the 617) and kept; the fields are final, so a thread that finds one in
     * the table finds it whole.
     */
    private record Power(long hi, long lo) {
        static Power of(int k) {
            int r = flog2pow10(-k) - 125;
            BigInteger num = BigInteger.ONE, den = BigInteger.ONE;
            if (k <= 0) num = BigInteger.TEN.pow(-k);
            else den = BigInteger.TEN.pow(k);
            if (r >= 0) den = den.shiftLeft(r);
            else num = num.shiftLeft(-r);
            BigInteger g = num.divide(den).add(BigInteger.ONE);
            return new Power(g.shiftRight(63).longValueExact(), g.longValue() & MASK_63);
        }
    }

    /** The powers formed so far, by k - K_MIN (threads that race form the same one). */
    private static final Power[] POWERS = new Power[K_MAX - K_MIN + 1];

    private static Power power(int k) {
        Power p = POWERS[k - K_MIN];
        if (p == null) POWERS[k - K_MIN] = p = Power.of(k);
        return p;
    }

    /** floor(q log10 2), by an integer approximation of log10 2 (exact for |q| <= 1,500, ShortestDecimalTest). */
    static int flog10pow2(int q) {
        return (int) (q * 661_971_961_083L >> 41);
    }

    /** floor(log10(3/4 2^q)) (exact for |q| <= 1,500, ShortestDecimalTest). */
    static int flog10threeQuartersPow2(int q) {
        return (int) (q * 661_971_961_083L + -274_743_187_321L >> 41);
    }

    /** floor(e log2 10) (exact for |e| <= 400, ShortestDecimalTest; the powers need |e| <= 324). */
    static int flog2pow10(int e) {
        return (int) (e * 913_124_641_741L >> 38);
    }

    /**
     * Writes the text of {@code v} into {@code buf} from {@code at} (room for {@link #ROOM}
     * characters needed) and returns the position after it. {@code v} must be finite.
     */
    static int write(double v, char[] buf, int at) {
        long bits = Double.doubleToRawLongBits(v);
        long t = bits & (C_MIN - 1);
        int bq = (int) (bits >>> 52) & 0x7FF;
        if (bq == 0x7FF) throw new IllegalArgumentException("not a finite number: " + v);
        if (bits < 0) buf[at++] = '-';
        if (bq != 0) {
            int mq = -Q_MIN + 1 - bq; // the value is c 2^-mq
            long c = C_MIN | t;
            if (0 < mq && mq < 53) {
                long f = c >> mq;
                if (f << mq == c) return layOut(f, 0, buf, at); // a whole number below 2^53: its digits as they are
            }
            return toDecimal(-mq, c, 0, buf, at);
        }
        if (t != 0) return t < C_TINY ? toDecimal(Q_MIN, 10 * t, -1, buf, at) : toDecimal(Q_MIN, t, 0, buf, at);
        buf[at++] = '0';
        buf[at++] = '.';
        buf[at++] = '0';
        return at;
    }

    /** The shortest decimal in the rounding interval of c 2^q (times 10^dk), laid out. */
    private static int toDecimal(int q, long c, int dk, char[] buf, int at) {
        // the reals that round to c 2^q: the ends belong to it when c is even (ties go to even), not when odd
        int out = (int) c & 1;
        long cb = c << 2;
        long cbr = cb + 2;
        long cbl;
        int k;
        if (c != C_MIN | q == Q_MIN) {
            cbl = cb - 2;
            k = flog10pow2(q);
        } else {
            // at a power of two the interval below is half as wide
            cbl = cb - 1;
            k = flog10threeQuartersPow2(q);
        }
        int h = q + flog2pow10(-k) + 2;
        Power g = power(k);
        long g1 = g.hi(), g0 = g.lo();
        // the value and its interval's ends, times 10^-k, in units of 1/4 (rounded to odd)
        long vb = rop(g1, g0, cb << h);
        long vbl = rop(g1, g0, cbl << h);
        long vbr = rop(g1, g0, cbr << h);
        long s = vb >> 2;
        if (s >= 100) {
            // one digit fewer: a multiple of ten inside the interval
            long sp10 = s / 10 * 10;
            long tp10 = sp10 + 10;
            boolean upin = vbl + out <= sp10 << 2;
            boolean wpin = (tp10 << 2) + out <= vbr;
            if (upin != wpin) return layOut(upin ? sp10 : tp10, k, buf, at);
        }
        long tt = s + 1;
        boolean uin = vbl + out <= s << 2;
        boolean win = (tt << 2) + out <= vbr;
        if (uin != win) return layOut(uin ? s : tt, k + dk, buf, at);
        // both inside: the closer, and at a tie the even one
        long cmp = vb - (s + tt << 1);
        return layOut(cmp < 0 || cmp == 0 && (s & 1) == 0 ? s : tt, k + dk, buf, at);
    }

    /** (g 2^-64 cp) rounded to odd, g = g1 2^63 + g0: the product's high part with a sticky last bit. */
    private static long rop(long g1, long g0, long cp) {
        long x1 = Math.multiplyHigh(g0, cp);
        long y0 = g1 * cp;
        long y1 = Math.multiplyHigh(g1, cp);
        long z = (y0 >>> 1) + x1;
        long vbp = y1 + (z >>> 63);
        return vbp | (z & MASK_63) + MASK_63 >>> 63;
    }

    /** "00" to "99": two digits per division. */
    private static final char[] PAIRS = new char[200];

    static {
        for (int i = 0; i < 100; i++) {
            PAIRS[2 * i] = (char) ('0' + i / 10);
            PAIRS[2 * i + 1] = (char) ('0' + i % 10);
        }
    }

    /**
     * f 10^e (0 < f < 10^18) laid out: its digits without trailing zeros are 0.d1d2...dn 10^x; plain
     * when 0 < x <= 7 (1 to 10^7) or -3 < x <= 0 (10^-3 to 1), else d1.d2...dn E(x-1) ("d1.0" for n = 1).
     */
    private static int layOut(long f, int e, char[] buf, int at) {
        // the digits, two per division, written at the end of the room and then moved into place
        int end = at + MAX_CHARS;
        int first = end;
        long high = f / 100_000_000;
        if (high > 0) {
            first = pairs((int) (f - high * 100_000_000), buf, first, 8);
            f = high;
        }
        first = pairs(f, buf, first, 0);
        int last = end;
        while (buf[last - 1] == '0') {
            last--;
            e++;
        }
        int n = last - first;
        int x = e + n;
        if (0 < x && x <= 7) {
            if (n <= x) {
                for (int i = 0; i < n; i++) buf[at++] = buf[first + i];
                for (int i = n; i < x; i++) buf[at++] = '0';
                buf[at++] = '.';
                buf[at++] = '0';
            } else {
                for (int i = 0; i < x; i++) buf[at++] = buf[first + i];
                buf[at++] = '.';
                for (int i = x; i < n; i++) buf[at++] = buf[first + i];
            }
            return at;
        }
        if (-3 < x && x <= 0) {
            buf[at++] = '0';
            buf[at++] = '.';
            for (int i = x; i < 0; i++) buf[at++] = '0';
            for (int i = 0; i < n; i++) buf[at++] = buf[first + i];
            return at;
        }
        buf[at++] = buf[first];
        buf[at++] = '.';
        if (n == 1) buf[at++] = '0';
        for (int i = 1; i < n; i++) buf[at++] = buf[first + i];
        buf[at++] = 'E';
        int exp = x - 1;
        if (exp < 0) {
            buf[at++] = '-';
            exp = -exp;
        }
        if (exp >= 100) buf[at++] = (char) ('0' + exp / 100);
        if (exp >= 10) buf[at++] = (char) ('0' + exp / 10 % 10);
        buf[at++] = (char) ('0' + exp % 10);
        return at;
    }

    /**
     * The decimal digits of v written leftwards ending before {@code end}, at least {@code width}
     * of them (leading zeros), two per division; returns the position of the first.
     */
    private static int pairs(long v, char[] buf, int end, int width) {
        int j = end;
        while (v >= 100) {
            long q = v / 100;
            int r = (int) (v - q * 100);
            buf[--j] = PAIRS[2 * r + 1];
            buf[--j] = PAIRS[2 * r];
            v = q;
        }
        if (v >= 10) {
            buf[--j] = PAIRS[2 * (int) v + 1];
            buf[--j] = PAIRS[2 * (int) v];
        } else {
            buf[--j] = (char) ('0' + v);
        }
        while (end - j < width) buf[--j] = '0';
        return j;
    }
}
