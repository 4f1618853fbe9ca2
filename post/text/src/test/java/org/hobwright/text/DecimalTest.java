package org.hobwright.text;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.math.BigDecimal;
import java.math.RoundingMode;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;

/**
 * {@link Decimal} against the JDK's {@link BigDecimal}: the fixed-point text is
 * {@code BigDecimal.valueOf(v).setScale(d, HALF_UP).toPlainString()} without negative zero, with
 * trailing zeros dropped on request.
 */
class DecimalTest {

    private static String reference(double v, int decimals, boolean trailingZeros) {
        BigDecimal r = BigDecimal.valueOf(v).setScale(decimals, RoundingMode.HALF_UP);
        String text = (r.signum() == 0 ? r.abs() : r).toPlainString();
        return trailingZeros || decimals == 0 ? text : text.replaceFirst("0+$", "");
    }

    private static void same(double v) {
        for (int d = 0; d <= 6; d++) {
            assertEquals(reference(v, d, true), Decimal.fixed(v, d, true), v + " to " + d + " decimals");
            assertEquals(reference(v, d, false), Decimal.fixed(v, d, false), v + " to " + d + " decimals, trimmed");
        }
    }

    @Test
    void edgesOfRoundingCarryAndSign() {
        double[] cases = {0, -0.0, 0.5, -0.5, 0.125, 1.005, 2.675, 9.995, -9.995, 99.9995, 999999.9999995,
            0.0004, -0.0004, -0.004999, 0.004999, 27.7705, 1e-7, -1e-7, 9999999.5, 1.0e7, 123456789.987654,
            1e300, -1e-300, Double.MIN_VALUE, Double.MAX_VALUE, 0.1 + 0.2, 5e-5, 0.95, -0.95, 19.5, 0.05};
        for (double v : cases) {
            same(v);
        }
        assertEquals("27.771", Decimal.fixed(27.7705, 3));
        assertEquals("10.00", Decimal.fixed(9.995, 2));
        assertEquals("0.000", Decimal.fixed(-0.0004, 3));
        assertEquals("24.", Decimal.fixed(24.0, 3, false));
    }

    @Test
    void randomValuesOfEveryMagnitude() {
        SplittableRandom random = new SplittableRandom(20261201);
        for (int i = 0; i < 200_000; i++) {
            double scale = Math.pow(10, random.nextInt(-9, 12));
            double v = (random.nextDouble() * 2 - 1) * scale;
            if (random.nextInt(4) == 0) {
                v = Math.round(v * 1000) / 1000.0 + (random.nextBoolean() ? 0.0005 : -0.0005);
            }
            same(v);
        }
    }

    /** java.util.Formatter's {@code %.nf} rounds the same digits half up; it alone writes negative zero. */
    @Test
    void sameTextAsTheJdkFormatterExceptNegativeZero() {
        SplittableRandom random = new SplittableRandom(17);
        for (int i = 0; i < 50_000; i++) {
            double v = (random.nextDouble() * 2 - 1) * Math.pow(10, random.nextInt(-6, 7));
            int d = random.nextInt(0, 6);
            String formatter = String.format(java.util.Locale.ROOT, "%." + d + "f", v);
            String expected = formatter.matches("-0(\\.0*)?") ? formatter.substring(1) : formatter;
            assertEquals(expected, Decimal.fixed(v, d), v + " to " + d + " decimals");
        }
    }

    @Test
    void refusesWhatIsNotANumber() {
        assertThrows(IllegalArgumentException.class, () -> Decimal.fixed(Double.NaN, 2));
        assertThrows(IllegalArgumentException.class, () -> Decimal.fixed(Double.POSITIVE_INFINITY, 2, false));
    }

    /**
     * Directed rounding for NC words: up never gives less than the value and less than one unit
     * more, down the mirror of it, against the JDK's {@link BigDecimal} on the decimal the double
     * prints; half-up gives the same digits as {@link Decimal#fixed}.
     */
    @Test
    void directedRoundingStaysOnItsSideWithinOneUnit() {
        SplittableRandom random = new SplittableRandom(4120);
        for (int i = 0; i < 20_000; i++) {
            double v = (random.nextDouble() * 2 - 1) * Math.pow(10, random.nextInt(-6, 7));
            int d = random.nextInt(0, 6);
            BigDecimal exact = new BigDecimal(Double.toString(v));
            BigDecimal unit = BigDecimal.ONE.movePointLeft(d);
            BigDecimal up = Decimal.rounded(v, d, RoundingMode.CEILING);
            BigDecimal down = Decimal.rounded(v, d, RoundingMode.FLOOR);
            BigDecimal slack = exact.abs().multiply(new BigDecimal("1e-11"));
            assertTrue(up.compareTo(exact.subtract(slack)) >= 0 && up.compareTo(exact.add(unit)) < 0, v + " up " + up);
            assertTrue(down.compareTo(exact.add(slack)) <= 0 && down.compareTo(exact.subtract(unit)) > 0,
                    v + " down " + down);
            assertEquals(d, up.scale());
            assertEquals(Decimal.fixed(v, d), Decimal.text(Decimal.rounded(v, d, RoundingMode.HALF_UP), true));
        }
    }

    @Test
    void directedRoundingIgnoresTheLastBitsOfBinaryArithmetic() {
        // 12.7 mm / 25.4 is 0.5000000000000001 in binary; as an inch word it is 0.5000, not 0.5001
        assertEquals("0.5000", Decimal.rounded(12.7 / 25.4, 4, RoundingMode.UP).toPlainString());
        assertEquals("0.1", Decimal.rounded(0.1, 1, RoundingMode.CEILING).toPlainString());
        assertEquals("0.000", Decimal.rounded(-0.0004, 3, RoundingMode.CEILING).toPlainString());
        assertEquals("-0.001", Decimal.rounded(-0.0004, 3, RoundingMode.FLOOR).toPlainString());
        assertEquals("24.", Decimal.text(new BigDecimal("24.000"), false));
        assertEquals("17.5", Decimal.text(new BigDecimal("17.500"), false));
        assertEquals("0", Decimal.text(new BigDecimal("0"), false));
        assertThrows(IllegalArgumentException.class, () -> Decimal.rounded(Double.NaN, 2, RoundingMode.UP));
    }
}
