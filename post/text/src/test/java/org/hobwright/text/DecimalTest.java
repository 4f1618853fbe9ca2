package org.hobwright.text;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.math.BigDecimal;
import java.math.MathContext;
import java.math.RoundingMode;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;

/**
 * {@link Decimal} against the JDK's {@link BigDecimal} as the independent reference: the rule is
 * {@code BigDecimal.valueOf(v).setScale(d, HALF_UP).toPlainString()} (the decimal text of the
 * value, rounded half away from zero) without negative zero; the directed roundings first take
 * the value to 12 significant digits (half to even), then use {@code CEILING} or {@code FLOOR}.
 */
class DecimalTest {

    private static String reference(double v, int decimals, boolean trailingZeros) {
        BigDecimal r = BigDecimal.valueOf(v).setScale(decimals, RoundingMode.HALF_UP);
        String text = (r.signum() == 0 ? r.abs() : r).toPlainString();
        int end = text.length();
        while (!trailingZeros && decimals > 0 && text.charAt(end - 1) == '0') {
            end--;
        }
        return text.substring(0, end);
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
        for (int i = 0; i < 20_000; i++) {
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
        for (int i = 0; i < 20_000; i++) {
            double v = (random.nextDouble() * 2 - 1) * Math.pow(10, random.nextInt(-6, 7));
            int d = random.nextInt(0, 6);
            String formatter = String.format(java.util.Locale.ROOT, "%." + d + "f", v);
            String expected = formatter.matches("-0(\\.0*)?") ? formatter.substring(1) : formatter;
            assertEquals(expected, Decimal.fixed(v, d), v + " to " + d + " decimals");
        }
    }

    /** Values of every magnitude, a quarter of them exact decimal ties at a random place. */
    private static double[] values(long seed, int n) {
        SplittableRandom random = new SplittableRandom(seed);
        double[] v = new double[n];
        for (int i = 0; i < n; i++) {
            double x = (random.nextDouble() * 2 - 1) * Math.pow(10, random.nextInt(-9, 12));
            if (random.nextInt(4) == 0) {
                int d = random.nextInt(0, 7);
                x = new BigDecimal(random.nextLong(-10_000_000, 10_000_000)).add(new BigDecimal("0.5"))
                        .movePointLeft(d).doubleValue();
            }
            v[i] = x;
        }
        return v;
    }

    private static String text(BigDecimal r) {
        return (r.signum() == 0 ? r.abs() : r).toPlainString();
    }

    /** Without trailing zeros or a lone point, never in exponent form. */
    private static String trimmed(BigDecimal r) {
        BigDecimal t = r.stripTrailingZeros();
        return text(t.scale() < 0 ? t.setScale(0) : t);
    }

    @Test
    void directedRoundingAgainstBigDecimal() {
        for (double v : values(4156, 20_000)) {
            for (int d = 0; d <= 6; d++) {
                // 12 significant digits, or three decimals more than written when that is finer
                BigDecimal exact = BigDecimal.valueOf(v);
                int digitsBeforePoint = exact.precision() - exact.scale();
                BigDecimal b = exact.round(new MathContext(Math.max(12, digitsBeforePoint + d + 3),
                        RoundingMode.HALF_EVEN));
                assertEquals(text(b.setScale(d, RoundingMode.CEILING)),
                        Decimal.fixed(v, d, true, Decimal.Rounding.CEILING), v + " up to " + d + " decimals");
                assertEquals(text(b.setScale(d, RoundingMode.FLOOR)),
                        Decimal.fixed(v, d, true, Decimal.Rounding.FLOOR), v + " down to " + d + " decimals");
                assertEquals(text(b.setScale(d, RoundingMode.UP)),
                        Decimal.fixed(v, d, true, Decimal.Rounding.UP), v + " away from zero to " + d + " decimals");
                assertEquals(text(b.setScale(d, RoundingMode.DOWN)),
                        Decimal.fixed(v, d, true, Decimal.Rounding.DOWN), v + " toward zero to " + d + " decimals");
            }
        }
        assertEquals("0.5", Decimal.fixed(12.7 / 25.4, 1, true, Decimal.Rounding.CEILING), "binary noise ignored");
        assertEquals("0.501", Decimal.fixed(0.5001, 3, true, Decimal.Rounding.CEILING));
        assertEquals("-0.501", Decimal.fixed(-0.5001, 3, true, Decimal.Rounding.FLOOR));
        assertEquals("0.000", Decimal.fixed(-0.0001, 3, true, Decimal.Rounding.CEILING), "no negative zero");
        assertEquals("0.001", Decimal.fixed(1e-9, 3, true, Decimal.Rounding.CEILING));
        // 12 significant digits would make this 2906244593.74, above the value: the noise cut follows the decimals
        assertEquals("2906244593.73", Decimal.fixed(2906244593.738667, 2, true, Decimal.Rounding.FLOOR));
    }

    @Test
    void plainSignificantExactAndSignedAgainstBigDecimal() {
        for (double v : values(1328, 20_000)) {
            for (int d = 0; d <= 6; d++) {
                assertEquals(trimmed(BigDecimal.valueOf(v).setScale(d, RoundingMode.HALF_UP)), Decimal.plain(v, d),
                        v + " plain to " + d);
            }
            for (int n = 1; n <= 12; n += 1 + n / 4) {
                assertEquals(trimmed(BigDecimal.valueOf(v).round(new MathContext(n, RoundingMode.HALF_UP))),
                        Decimal.significant(v, n), v + " to " + n + " significant digits");
            }
            assertEquals(trimmed(new BigDecimal(Double.toString(v))), Decimal.exact(v), v + " exact");
            assertEquals(Double.doubleToLongBits(v == 0 ? 0.0 : v), Double.doubleToLongBits(
                    Double.parseDouble(Decimal.exact(v))), v + " reads back");
        }
        assertEquals("+0.494", Decimal.signed(0.4943, 3));
        assertEquals("-0.494", Decimal.signed(-0.4943, 3));
        assertEquals("+0.000", Decimal.signed(-0.0001, 3));
        assertEquals("0.000287041", Decimal.significant(0.000287041234, 6));
        assertEquals("120000", Decimal.significant(123456, 2));
        assertEquals("10", Decimal.significant(9.99, 2));
        assertEquals("0", Decimal.significant(-0.0, 3));
        assertEquals("24", Decimal.plain(24.0004, 3));
        assertEquals("1.01", Decimal.plain(1.005, 2), "the decimal a person reads, not the binary value below it");
        assertEquals("NaN", Decimal.plain(Double.NaN, 2));
        assertEquals("0", Decimal.exact(-0.0));
        assertEquals("0", Decimal.exact(0));
        assertEquals("0.0001", Decimal.exact(1e-4));
        assertEquals("1200", Decimal.exact(1.2e3));
    }

    @Test
    void refusesWhatIsNotANumber() {
        assertThrows(IllegalArgumentException.class, () -> Decimal.fixed(Double.NaN, 2));
        assertThrows(IllegalArgumentException.class, () -> Decimal.fixed(Double.POSITIVE_INFINITY, 2, false));
    }

    /**
     * Rounding for NC words against the JDK's {@link BigDecimal} on the decimal the double prints:
     * half-up gives the digits of {@link Decimal#fixed}; up (ceiling) never gives less than the
     * value and less than one unit more, down (floor) the mirror of it.
     */
    @Test
    void scaledRoundingStaysOnItsSideWithinOneUnit() {
        SplittableRandom random = new SplittableRandom(4120);
        for (int i = 0; i < 20_000; i++) {
            double v = (random.nextDouble() * 2 - 1) * Math.pow(10, random.nextInt(-9, 9));
            int d = random.nextInt(0, 7);
            BigDecimal exact = new BigDecimal(Double.toString(v));
            BigDecimal unit = BigDecimal.ONE.movePointLeft(d);
            BigDecimal up = BigDecimal.valueOf(Decimal.scaled(v, d, Decimal.Rounding.CEILING).units(), d);
            BigDecimal down = BigDecimal.valueOf(Decimal.scaled(v, d, Decimal.Rounding.FLOOR).units(), d);
            BigDecimal slack = exact.abs().multiply(new BigDecimal("1e-11"));
            assertTrue(up.compareTo(exact.subtract(slack)) >= 0 && up.compareTo(exact.add(unit)) < 0, v + " up " + up);
            assertTrue(down.compareTo(exact.add(slack)) <= 0 && down.compareTo(exact.subtract(unit)) > 0,
                    v + " down " + down);
            Scaled near = Decimal.scaled(v, d, Decimal.Rounding.HALF_UP);
            assertEquals(Decimal.fixed(v, d), near.text(true), v + " to " + d);
            assertEquals(Decimal.fixed(v, d, false), near.text(false), v + " to " + d + ", trimmed");
            assertEquals(Double.parseDouble(near.text(true)), near.value(), v + " to " + d);
        }
    }

    @Test
    void scaledRoundingIgnoresTheLastBitsOfBinaryArithmetic() {
        // 12.7 mm / 25.4 is 0.5000000000000001 in binary; as an inch word it is 0.5000, not 0.5001
        assertEquals("0.5000", Decimal.scaled(12.7 / 25.4, 4, Decimal.Rounding.CEILING).text(true));
        assertEquals("0.1", Decimal.scaled(0.1, 1, Decimal.Rounding.CEILING).text(true));
        assertEquals("0.000", Decimal.scaled(-0.0004, 3, Decimal.Rounding.CEILING).text(true));
        assertEquals("-0.001", Decimal.scaled(-0.0004, 3, Decimal.Rounding.FLOOR).text(true));
        assertEquals("1.000", Decimal.scaled(0.99999999999999, 3, Decimal.Rounding.FLOOR).text(true));
        assertEquals("0.001", Decimal.scaled(1e-300, 3, Decimal.Rounding.CEILING).text(true));
        assertEquals("0", Decimal.scaled(1e-300, 0, Decimal.Rounding.HALF_UP).text(true));
        assertEquals("24.", new Scaled(24000, 3).text(false));
        assertEquals("-17.5", new Scaled(-17500, 3).text(false));
        assertEquals("0.05", new Scaled(5, 2).text(true));
        assertThrows(IllegalArgumentException.class, () -> Decimal.scaled(Double.NaN, 2, Decimal.Rounding.CEILING));
        assertThrows(IllegalArgumentException.class, () -> Decimal.scaled(1e300, 3, Decimal.Rounding.HALF_UP));
    }

    @Test
    void readableAtEveryMagnitudeIncludingSubnormals() {
        // the smallest subnormal, the largest double and values between: four significant digits and
        // a power of ten outside 0.0001 to 1e9, checked against BigDecimal's rounding to 4 digits
        double[] cases = {Double.MIN_VALUE, -Double.MIN_VALUE, 2.5e-320, Double.MIN_NORMAL, 1e-301, 1.2345e-250,
            1e-5, 1e9, 1e300, Double.MAX_VALUE, -Double.MAX_VALUE};
        for (double v : cases) {
            String text = Decimal.readable(v);
            int e = text.indexOf('e');
            assertTrue(e > 0, v + " as " + text);
            BigDecimal reference = new BigDecimal(v).round(new MathContext(4, RoundingMode.HALF_UP));
            assertEquals(0, new BigDecimal(text).compareTo(reference), v + " as " + text + ", reference " + reference);
        }
        assertEquals("4.941e-324", Decimal.readable(Double.MIN_VALUE));
        assertEquals("1.798e308", Decimal.readable(Double.MAX_VALUE));
    }

    /**
     * Numbers in messages are readable at every magnitude: against java.math.BigDecimal rounding to
     * six significant digits (plain from 0.0001 to below 10⁹, whole numbers with all their digits) or
     * four with a power of ten (outside),
     * for values spread over the whole double range; never longer than 13 characters.
     */
    @Test
    void readableNumbersAtEveryMagnitude() {
        assertEquals("1e300", Decimal.readable(1e300));
        assertEquals("1e-9", Decimal.readable(1e-9));
        assertEquals("0.000976198", Decimal.readable(0.000976198));
        assertEquals("1234.57", Decimal.readable(1234.5678));
        assertEquals("2000", Decimal.readable(2000));
        assertEquals("-1.235e11", Decimal.readable(-123456789012.0));
        SplittableRandom random = new SplittableRandom(14);
        for (int i = 0; i < 20_000; i++) {
            double v = (random.nextBoolean() ? 1 : -1) * random.nextDouble(1, 10) * Math.pow(10, random.nextInt(-300, 300));
            String text = Decimal.readable(v);
            BigDecimal exact = new BigDecimal(v);
            double a = Math.abs(v);
            // six significant digits, whole numbers from 10⁵ on (all their digits), four outside the plain range
            BigDecimal expected = a >= 1e5 && a < 1e9 ? exact.setScale(0, RoundingMode.HALF_UP)
                    : exact.round(new MathContext(a >= 1e-4 && a < 1e9 ? 6 : 4, RoundingMode.HALF_UP));
            assertEquals(expected.doubleValue(), Double.parseDouble(text), Math.ulp(expected.doubleValue()) * 4,
                    v + " -> " + text);
            assertTrue(text.length() <= 13, v + " -> " + text);
        }
    }
}
