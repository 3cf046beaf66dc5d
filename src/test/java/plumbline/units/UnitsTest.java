package plumbline.units;

import static org.junit.jupiter.api.Assertions.assertTrue;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * Conversion factors against NIST Special Publication 811 (2008 edition), Appendix B.8/B.9,
 * and the exact definitions 1 in = 0.0254 m, 1 ft = 0.3048 m, 1 lbf = 0.45359237 kg x
 * 9.80665 m/s2.
 */
class UnitsTest {

    @ParameterizedTest(name = "{0} = {1} SI (NIST SP 811 App. B)")
    @CsvSource({
            "lbf, 4.448222, 1e-6",          // B.8: pound-force to newton 4.448 222 E+00
            "kip, 4448.222, 1e-6",          // B.8: kip (1000 lbf) to newton 4.448 222 E+03
            "ft, 0.3048, 1e-15",            // exact
            "in, 0.0254, 1e-15",            // exact
            "psi, 6894.757, 1e-6",          // B.8: pound-force per square inch to pascal 6.894 757 E+03
            "ksi, 6894757, 1e-6",           // B.8: kip per square inch to pascal 6.894 757 E+06
            "psf, 47.88026, 1e-6",          // B.8: pound-force per square foot to pascal 4.788 026 E+01
            "kip-ft, 1355.818, 1e-6",       // B.8: pound-force foot to newton meter 1.355 818 E+00, times 1000
            "kip*in, 112.98483, 1e-6",      // B.8: pound-force inch to newton meter 1.129 848 E-01, times 1000
            "in4, 4.162314e-7, 1e-6",       // B.8: inch to the fourth power to meter^4 4.162 314 E-07
            "mm4, 1e-12, 1e-12",
            "kN/m, 1000, 1e-15",
            "kN*m/rad, 1000, 1e-15",
            "deg, 0.017453292519943295, 1e-15",
            "degF, 0.5555555555555556, 1e-15", // a temperature interval: 1 degF = 5/9 K
            "kN/m3, 1000, 1e-15",
            "pcf, 157.0875, 1e-6",          // B.8: pound-force per cubic foot to N/m3 1.570 875 E+02
            "kN.m, 1000, 1e-15",
            "mm^2, 1e-6, 1e-15",
    })
    void factorsMatchPublishedValues(String symbol, double si, double relTol) throws Exception {
        Unit u = Units.parse(symbol);
        assertEquals(si, u.toInternal(), Math.abs(si) * relTol, symbol);
    }

    /**
     * The factor of a dimension is the JDK's Math.pow of each unit to its exponent, to the bit
     * (the common exponents 0 and 1 skip the call: pow's specification gives 1.0 and x itself).
     */
    @ParameterizedTest(name = "factors in {0} and {1} as Math.pow gives them")
    @CsvSource({"kN, m", "kip, ft", "lbf, in", "N, mm", "MN, cm"})
    void factorsAreMathPowToTheBit(String force, String length) throws Exception {
        UnitSystem u = new UnitSystem(Units.parse(force), Units.parse(length));
        double f = u.force().toInternal(), l = u.length().toInternal();
        for (int fe = -2; fe <= 2; fe++) {
            for (int le = -4; le <= 4; le++) {
                Dimension d = new Dimension(fe, le, 0, 0);
                double expected = Math.pow(f, fe) * Math.pow(l, le);
                assertEquals(Double.doubleToRawLongBits(expected), Double.doubleToRawLongBits(u.factor(d)), d.toString());
                double internal = 1234.567891234;
                assertEquals(Double.doubleToRawLongBits(internal / expected),
                        Double.doubleToRawLongBits(u.fromInternal(internal, d)), d.toString());
            }
        }
    }

    @Test
    void quantitiesCarryTheirDimension() throws Exception {
        Units.Written w = Units.parseQuantity("1.42e8 mm4");
        assertEquals(1.42e8, w.value());
        assertEquals(Dimension.SECOND_MOMENT, w.unit().dimension());
        assertEquals(1.42e-4, w.unit().toInternal(w.value()), 1e-18);
        assertEquals(Dimension.MOMENT, Units.parseQuantity("12 kip-ft").unit().dimension());
        assertEquals(Dimension.ROTATIONAL_STIFFNESS, Units.parseQuantity("2.0e4 kN*m/rad").unit().dimension());
        assertEquals(Dimension.PER_TEMPERATURE, Units.parseQuantity("1.2e-5 /degC").unit().dimension());
        assertEquals(Dimension.ANGLE, Units.parseQuantity("30 deg").unit().dimension());
        assertEquals(-3.2, Units.parseQuantity("-3.2").value());
    }

    @Test
    void badUnitsAreRefusedWithTheSymbol() {
        UnitParseException e = assertThrows(UnitParseException.class, () -> Units.parse("kNq"));
        assertEquals(true, e.getMessage().contains("kNq"));

        assertThrows(UnitParseException.class, () -> Units.parse("kN/m/s"));
        assertThrows(UnitParseException.class, () -> Units.parseQuantity("twelve kN"));
    }

    @Test
    void unitSystemCarriesToDerivedDimensions() throws Exception {
        UnitSystem us = new UnitSystem(Units.parse("kip"), Units.parse("ft"));
        // 1 kip/ft = 14593.90 N/m (NIST SP 811 B.8: pound-force per foot 1.459 390 E+01 N/m, times 1000)
        assertEquals(14593.90, us.toInternal(1, Dimension.FORCE_PER_LENGTH), 0.01);
        assertEquals(1.0, us.fromInternal(us.toInternal(1, Dimension.STRESS), Dimension.STRESS), 1e-15);
        assertEquals("kip*ft", us.symbol(Dimension.MOMENT));
        assertEquals("kip/ft2", us.symbol(Dimension.STRESS));
    }

    @Test
    void unitsAsTheTradeWritesThem() throws Exception {
        // NIST SP 811 (2008) Appendix B.8/B.9: ft*lbf = 1.355818 J, in*lbf = 0.1129848 J, lbf/ft = 14.59390 N/m,
        // lbf/ft2 = 47.88026 Pa, kgf = 9.80665 N (exact)
        assertEquals(1e3, Units.parse("kNm").toInternal(), 1e-9);
        assertEquals(1e3, Units.parse("kN.m").toInternal(), 1e-9);
        assertEquals(1e-3, Units.parse("Nmm").toInternal(), 1e-15);
        assertEquals(1e-3, Units.parse("N.mm").toInternal(), 1e-15);
        assertEquals(10, Units.parse("kNcm").toInternal(), 1e-12);
        assertEquals(Dimension.MOMENT, Units.parse("kNcm").dimension());
        assertEquals(10, Units.parse("daN").toInternal(), 1e-12);
        assertEquals(9.80665, Units.parse("kgf").toInternal(), 1e-12);
        assertEquals(9806.65, Units.parse("tf").toInternal(), 1e-9);
        assertEquals(1355.818, Units.parse("k-ft").toInternal(), 1e-3);
        assertEquals(1355.818, Units.parse("ft-k").toInternal(), 1e-3);
        assertEquals(1355.818, Units.parse("ft-kip").toInternal(), 1e-3);
        assertEquals(112.9848, Units.parse("k-in").toInternal(), 1e-4);
        assertEquals(112.9848, Units.parse("in-kip").toInternal(), 1e-4);
        assertEquals(Dimension.MOMENT, Units.parse("k-ft").dimension());
        assertEquals(14593.90, Units.parse("klf").toInternal(), 1e-2);
        assertEquals(14.59390, Units.parse("plf").toInternal(), 1e-5);
        assertEquals(47880.26, Units.parse("ksf").toInternal(), 1e-2);
        assertEquals(4.448222, Units.parse("lb").toInternal(), 1e-6);
        assertEquals(4.448222, Units.parse("lbs").toInternal(), 1e-6);
    }

    @Test
    void kAloneIsNoUnitAndNeverKelvin() {
        UnitParseException e = assertThrows(UnitParseException.class, () -> Units.parse("k"));
        assertTrue(e.getMessage().contains("nearest known"), e.getMessage());
        UnitParseException near = assertThrows(UnitParseException.class, () -> Units.parse("kNmx"));
        assertTrue(near.getMessage().contains("nearest known: kNm"), near.getMessage());
    }
}
