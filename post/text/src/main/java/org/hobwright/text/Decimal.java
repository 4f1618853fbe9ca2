package org.hobwright.text;

import java.math.BigDecimal;
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

    /** Directions of {@link #scaled}. */
    public enum Rounding {
        /** Half away from zero: the rule of {@link #fixed}. */
        HALF_UP,
        /** Toward positive infinity. */
        CEILING,
        /** Toward negative infinity. */
        FLOOR
    }

    /** Digits a directed rounding keeps before it rounds: well above binary noise, far below any word. */
    private static final int SIGNIFICANT = 12;

    /** Most digits of a scaled number (it must fit a {@code long}). */
    private static final int MAX_DIGITS = 17;

    /**
     * A number rounded to a fixed count of decimals in a chosen direction, as an NC word needs it:
     * {@link Rounding#CEILING} or {@link Rounding#FLOOR} where only one direction is safe (a
     * position that must stay outside the root, a speed at its upper limit), {@link Rounding#HALF_UP}
     * (the rule of {@link #fixed}, same digits) elsewhere. Like {@link #fixed} it rounds the shortest
     * decimal that identifies the double, so 0.1 rounded up to one decimal is 0.1, not 0.2, and it
     * works on those digits alone (no big-number arithmetic). A directed rounding first takes the
     * value to 12 significant digits, or to three decimals more than it writes when that is finer
     * (half up), so that the last bits of binary arithmetic (0.5000000000000001 from 12.7 / 25.4)
     * do not move a word by a whole unit.
     *
     * @param value    the number (must be finite, and below 10^17 in units of its last decimal)
     * @param decimals digits after the point, 0 to 9
     * @param rounding the direction
     * @return the rounded number
     * @throws IllegalArgumentException naming the value when it is not finite or too large
     */
    public static Scaled scaled(double value, int decimals, Rounding rounding) {
        if (!Double.isFinite(value)) {
            throw new IllegalArgumentException("value must be a finite number, was " + value);
        }
        // |value| = 0.d₀d₁d₂… × 10^point, with d₀ ≠ 0 (or the single digit 0)
        String text = Double.toString(Math.abs(value));
        int e = text.indexOf('E');
        String mantissa = e < 0 ? text : text.substring(0, e);
        int dot = mantissa.indexOf('.');
        StringBuilder digits = new StringBuilder(mantissa.length()).append(mantissa, 0, dot)
                .append(mantissa, dot + 1, mantissa.length());
        int point = dot + (e < 0 ? 0 : Integer.parseInt(text.substring(e + 1)));
        while (digits.length() > 1 && digits.charAt(0) == '0') {
            digits.deleteCharAt(0);
            point--;
        }
        int significant = Math.max(SIGNIFICANT, point + decimals + 3);
        if (rounding != Rounding.HALF_UP && digits.length() > significant) {
            boolean up = digits.charAt(significant) >= '5';
            digits.setLength(significant);
            for (int i = significant - 1; up && i >= 0; i--) {
                up = digits.charAt(i) == '9';
                digits.setCharAt(i, up ? '0' : (char) (digits.charAt(i) + 1));
            }
            if (up) {
                digits.insert(0, '1');
                point++;
            }
        }
        int keep = point + decimals;
        if (keep > MAX_DIGITS) {
            throw new IllegalArgumentException("value " + value + " is too large to write with " + decimals
                    + " decimals");
        }
        long units = 0;
        for (int i = 0; i < keep; i++) {
            units = units * 10 + (i < digits.length() ? digits.charAt(i) - '0' : 0);
        }
        boolean rest = false;
        for (int i = Math.max(keep, 0); i < digits.length() && !rest; i++) {
            rest = digits.charAt(i) != '0';
        }
        boolean negative = value < 0;
        boolean bump = switch (rounding) {
            case HALF_UP -> keep >= 0 && keep < digits.length() && digits.charAt(keep) >= '5';
            case CEILING -> rest && !negative;
            case FLOOR -> rest && negative;
        };
        units += bump ? 1 : 0;
        return new Scaled(negative ? -units : units, decimals);
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
}
