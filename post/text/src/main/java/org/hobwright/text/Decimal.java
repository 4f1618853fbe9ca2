package org.hobwright.text;

import java.math.BigDecimal;
import java.math.MathContext;
import java.math.RoundingMode;

/**
 * Fixed-point number text, independent of the default locale: a point as the decimal separator,
 * no grouping, no exponent, no negative zero. Values are rounded half-up on the shortest decimal
 * that identifies the double (what {@link Double#toString(double)} prints), so 27.7705 gives 27.771
 * as a person reading the value expects, and the text is the same on every machine.
 */
public final class Decimal {
    private Decimal() {
    }

    /**
     * Formats a number with a fixed count of decimals.
     *
     * @param value         the number (must be finite)
     * @param decimals      digits after the point, 0 or more
     * @param trailingZeros false strips trailing zeros after the point but keeps the point
     *                      ({@code 24.} instead of {@code 24.000}); ignored when decimals is 0
     * @return the text, e.g. {@code -13.237}
     * @throws IllegalArgumentException naming the value when it is not finite
     */
    public static String fixed(double value, int decimals, boolean trailingZeros) {
        if (!Double.isFinite(value)) {
            throw new IllegalArgumentException("value must be a finite number, was " + value);
        }
        String text = plain(value, decimals);
        if (trailingZeros || decimals == 0) {
            return text;
        }
        int end = text.length();
        while (text.charAt(end - 1) == '0') {
            end--;
        }
        return text.substring(0, end);
    }

    /**
     * {@code BigDecimal.valueOf(value).setScale(decimals, HALF_UP)} as plain text, without negative
     * zero. The digits of {@link Double#toString(double)} are rounded directly (it is the text
     * {@code BigDecimal.valueOf} reads), so no big-number arithmetic runs for the usual magnitudes;
     * text in exponent form goes through {@link BigDecimal}. {@code DecimalTest} compares both ways.
     */
    private static String plain(double value, int decimals) {
        String text = Double.toString(Math.abs(value));
        int point = text.indexOf('.');
        if (text.indexOf('E') >= 0 || point < 0) {
            BigDecimal rounded = BigDecimal.valueOf(value).setScale(decimals, RoundingMode.HALF_UP);
            return (rounded.signum() == 0 ? rounded.abs() : rounded).toPlainString();
        }
        int fraction = text.length() - point - 1;
        char[] digits = new char[point + decimals];
        text.getChars(0, point, digits, 0);
        for (int i = 0; i < decimals; i++) {
            digits[point + i] = i < fraction ? text.charAt(point + 1 + i) : '0';
        }
        boolean carry = fraction > decimals && text.charAt(point + 1 + decimals) >= '5';
        for (int i = digits.length - 1; carry && i >= 0; i--) {
            carry = digits[i] == '9';
            digits[i] = carry ? '0' : (char) (digits[i] + 1);
        }
        boolean zero = !carry;
        for (int i = 0; zero && i < digits.length; i++) {
            zero = digits[i] == '0';
        }
        StringBuilder out = new StringBuilder(digits.length + 3);
        if (value < 0 && !zero) {
            out.append('-');
        }
        if (carry) {
            out.append('1');
        }
        out.append(digits, 0, point);
        if (decimals > 0) {
            out.append('.').append(digits, point, decimals);
        }
        return out.toString();
    }

    /** Formats with trailing zeros kept, e.g. {@code fixed(2.5, 3)} gives {@code 2.500}. */
    public static String fixed(double value, int decimals) {
        return fixed(value, decimals, true);
    }

    // ---- directed rounding for NC words -------------------------------------------------------

    /** Digits a directed rounding keeps before it rounds: well above binary noise, far below any word. */
    private static final MathContext SIGNIFICANT = new MathContext(12, RoundingMode.HALF_EVEN);

    /**
     * A number rounded to a fixed count of decimals in a chosen direction, as an NC word needs it:
     * {@link RoundingMode#CEILING} or {@link RoundingMode#FLOOR} where only one direction is safe
     * (a position that must stay outside the root, a speed at its upper limit),
     * {@link RoundingMode#HALF_UP} (the rule of {@link #fixed}) elsewhere. Like {@link #fixed} it
     * rounds the shortest decimal that identifies the double, so 0.1 rounded up to one decimal is
     * 0.1, not 0.2. A directed mode (up, down, ceiling, floor) first takes the value to 12
     * significant digits, so that the last bits of binary arithmetic (0.5000000000000001 from
     * 12.7 / 25.4) do not move a word by a whole unit; the half-way modes round the digits as they
     * are. The result has exactly {@code decimals} digits after the point and is never negative zero.
     *
     * @param value    the number (must be finite)
     * @param decimals digits after the point, 0 or more
     * @param mode     the direction
     * @return the rounded number
     * @throws IllegalArgumentException naming the value when it is not finite
     */
    public static BigDecimal rounded(double value, int decimals, RoundingMode mode) {
        if (!Double.isFinite(value)) {
            throw new IllegalArgumentException("value must be a finite number, was " + value);
        }
        BigDecimal v = BigDecimal.valueOf(value);
        boolean directed = mode == RoundingMode.UP || mode == RoundingMode.DOWN || mode == RoundingMode.CEILING
                || mode == RoundingMode.FLOOR;
        BigDecimal r = (directed ? v.round(SIGNIFICANT) : v).setScale(decimals, mode);
        return r.signum() == 0 ? r.abs() : r;
    }

    /**
     * The text of a rounded number ({@link #rounded}): plain digits, a point, no exponent.
     *
     * @param value         the number, its scale the count of decimals to write
     * @param trailingZeros false strips trailing zeros after the point but keeps the point, as
     *                      {@link #fixed(double, int, boolean)} does
     */
    public static String text(BigDecimal value, boolean trailingZeros) {
        BigDecimal v = value.signum() == 0 ? value.abs() : value;
        String text = v.toPlainString();
        if (trailingZeros || v.scale() <= 0) {
            return text;
        }
        int end = text.length();
        while (text.charAt(end - 1) == '0') {
            end--;
        }
        return text.substring(0, end);
    }

    /**
     * The shortest text that reads back to exactly the same double, without an exponent
     * ({@code 0.0001}, not {@code 1.0E-4}), for exchange files.
     */
    public static String exact(double value) {
        if (!Double.isFinite(value)) {
            throw new IllegalArgumentException("value must be a finite number, was " + value);
        }
        if (value == 0) {
            return "0";
        }
        BigDecimal shortest = new BigDecimal(Double.toString(value)).stripTrailingZeros();
        return shortest.scale() < 0 ? shortest.setScale(0).toPlainString() : shortest.toPlainString();
    }

    /**
     * A number for a message, readable at every magnitude: six significant digits with trailing
     * zeros dropped, plain from 0.0001 to below 10⁹ ({@code 0.000976198}, {@code 2000},
     * {@code 1234.57}), else four significant digits and a power of ten ({@code 1e300},
     * {@code 1.5e-9}). Not a number and the infinities are named in words.
     */
    public static String readable(double value) {
        if (Double.isNaN(value)) {
            return "not a number";
        }
        if (Double.isInfinite(value)) {
            return value > 0 ? "infinity" : "minus infinity";
        }
        if (value == 0) {
            return "0";
        }
        double a = Math.abs(value);
        int exponent = (int) Math.floor(Math.log10(a));
        if (a >= 1e-4 && a < 1e9) {
            return withoutPoint(fixed(value, Math.max(0, 5 - exponent), false));
        }
        String mantissa = withoutPoint(fixed(value / Math.pow(10, exponent), 3, false));
        if (mantissa.equals("10") || mantissa.equals("-10")) {
            mantissa = mantissa.substring(0, mantissa.length() - 1);
            exponent++;
        }
        return mantissa + "e" + exponent;
    }

    private static String withoutPoint(String text) {
        return text.endsWith(".") ? text.substring(0, text.length() - 1) : text;
    }
}
