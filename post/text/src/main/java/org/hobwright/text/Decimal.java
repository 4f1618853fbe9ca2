package org.hobwright.text;

import java.math.BigDecimal;
import java.math.RoundingMode;

/**
 * The one number formatter of every text Hobwright writes: NC words, the cycle CSV, the setup
 * sheet and its drawings, the terminal, finding messages and comments. Independent of the default
 * locale: a point as the decimal separator, no grouping, no exponent, never a negative zero.
 *
 * <p><b>The rounding rule.</b> A value is rounded on its shortest decimal text, the digits
 * {@link Double#toString(double)} prints (the decimal a person reads, and the one a job file
 * gave), half away from zero: {@code 1.005} to two decimals is {@code 1.01}, {@code 27.7705} to
 * three is {@code 27.771}, {@code -2.5} to none is {@code -3}. Rounding the binary value instead
 * ({@link java.util.Formatter}, {@code Math.round(v * 100) / 100}) gives {@code 1.00} for
 * {@code 1.005}, because the double nearest 1.005 lies just below it; a number the user typed would
 * then print differently from the way they would round it by hand, and two formatters that
 * multiply differently would disagree on the same value. The rule is exactly
 * {@code BigDecimal.valueOf(v).setScale(d, RoundingMode.HALF_UP)}, computed on the digits without
 * big-number arithmetic ({@code DecimalTest} compares both over many values). Rounding a scaled
 * value to a whole number ({@code Math.round(deg * 36000)} for tenths of a second) is the same rule:
 * a double whose shortest text is {@code k.5} is exactly k.5.
 *
 * <p><b>Directed rounding</b> ({@link Rounding#CEILING}, {@link Rounding#FLOOR}, {@link Rounding#UP},
 * {@link Rounding#DOWN}) is for NC words whose safe side is one direction (a position that must
 * stay outside a diameter, a speed at its upper limit). It first takes the value to
 * {@value #NOISE_DIGITS} significant digits (half to even; three decimals more than it writes when
 * that is finer), so that the last bits of binary
 * arithmetic ({@code 0.5000000000000001} from {@code 12.7 / 25.4}) do not move a word by a whole
 * unit, then rounds in its direction. {@link #rounded} gives the same digits as an exact decimal,
 * for checks that compare the posted words with limits.
 */
public final class Decimal {

    /** Which way a value goes to its last written digit. */
    public enum Rounding {
        /** To the nearest; exactly half-way goes away from zero. The rule of every text unless a word needs a side. */
        HALF_UP,
        /** Toward positive infinity: the text is never below the value. */
        CEILING,
        /** Toward negative infinity: the text is never above the value. */
        FLOOR,
        /** Away from zero: the magnitude is never below the value's. */
        UP,
        /** Toward zero: the magnitude is never above the value's. */
        DOWN;

        /** The direction of a {@link RoundingMode}; HALF_UP, CEILING, FLOOR, UP and DOWN only. */
        static Rounding of(RoundingMode mode) {
            return switch (mode) {
                case HALF_UP -> HALF_UP;
                case CEILING -> CEILING;
                case FLOOR -> FLOOR;
                case UP -> UP;
                case DOWN -> DOWN;
                default -> throw new IllegalArgumentException("rounding " + mode + " is not one Hobwright writes");
            };
        }
    }

    /** Significant digits a directed rounding keeps before it rounds: well above binary noise, far below any word. */
    static final int NOISE_DIGITS = 12;

    private Decimal() {
    }

    /** Fixed decimals, trailing zeros kept, half up: {@code fixed(2.5, 3)} is {@code 2.500}. */
    public static String fixed(double value, int decimals) {
        return fixed(value, decimals, true, Rounding.HALF_UP);
    }

    /**
     * Fixed decimals, half up.
     *
     * @param trailingZeros false strips trailing zeros after the point but keeps the point
     *                      ({@code 24.} instead of {@code 24.000}); ignored when decimals is 0
     */
    public static String fixed(double value, int decimals, boolean trailingZeros) {
        return fixed(value, decimals, trailingZeros, Rounding.HALF_UP);
    }

    /**
     * A number with a fixed count of decimals.
     *
     * @param value         the number (must be finite)
     * @param decimals      digits after the point, 0 or more
     * @param trailingZeros false strips trailing zeros after the point but keeps the point
     *                      ({@code 24.} instead of {@code 24.000}); ignored when decimals is 0
     * @param rounding      the direction; {@link Rounding#HALF_UP} unless a word has a safe side
     * @return the text, e.g. {@code -13.237}
     * @throws IllegalArgumentException naming the value when it is not finite, or a negative count
     */
    public static String fixed(double value, int decimals, boolean trailingZeros, Rounding rounding) {
        if (!Double.isFinite(value)) {
            throw new IllegalArgumentException("value must be a finite number, was " + value);
        }
        if (decimals < 0) {
            throw new IllegalArgumentException("decimals must be 0 or more, was " + decimals);
        }
        String text = Digits.of(value).round(decimals, rounding).text(decimals);
        return trailingZeros || decimals == 0 ? text : withoutTrailingZeros(text);
    }

    /**
     * At most {@code decimals} decimals, half up, without trailing zeros or a lone point:
     * {@code plain(24.0004, 3)} is {@code 24}, {@code plain(0.25, 4)} is {@code 0.25}. For numbers
     * in sentences and drawings; a value that is not finite gives its Java name ({@code NaN}).
     */
    public static String plain(double value, int decimals) {
        if (!Double.isFinite(value)) {
            return Double.toString(value);
        }
        return trim(fixed(value, decimals));
    }

    /** Fixed decimals, half up, with an explicit sign: {@code signed(0.4943, 3)} is {@code +0.494}. */
    public static String signed(double value, int decimals) {
        String s = fixed(value, decimals);
        return s.charAt(0) == '-' ? s : "+" + s;
    }

    /**
     * A number to {@code digits} significant digits, half up, without trailing zeros or an
     * exponent: {@code significant(0.000287041234, 6)} is {@code 0.000287041}, {@code significant(123456, 2)}
     * is {@code 120000}. A value that is not finite gives its Java name.
     */
    public static String significant(double value, int digits) {
        if (digits < 1) {
            throw new IllegalArgumentException("digits must be 1 or more, was " + digits);
        }
        if (!Double.isFinite(value)) {
            return Double.toString(value);
        }
        Digits d = Digits.of(value);
        if (d.isZero()) {
            return "0";
        }
        int decimals = digits - d.point;
        Digits r = d.round(decimals, Rounding.HALF_UP);
        return decimals > 0 ? trim(r.text(decimals)) : r.text(decimals);
    }

    /**
     * The shortest text that reads back to exactly the same double, without an exponent
     * ({@code 0.0001}, not {@code 1.0E-4}), for exchange files and for values quoted in messages.
     *
     * @throws IllegalArgumentException naming the value when it is not finite
     */
    public static String exact(double value) {
        if (!Double.isFinite(value)) {
            throw new IllegalArgumentException("value must be a finite number, was " + value);
        }
        Digits d = Digits.of(value);
        return d.isZero() ? "0" : d.text(Math.max(0, d.length - d.point));
    }

    /**
     * A number rounded to a fixed count of decimals as a {@link Scaled} (a {@code long} and its
     * decimals): the digits {@link #fixed(double, int, boolean, Rounding)} writes, for NC words that
     * are checked against limits before they are written; no big-number arithmetic.
     *
     * @param value    the number (must be finite, and below 10^17 in units of its last decimal)
     * @param decimals digits after the point, 0 to 9
     * @param rounding HALF_UP (the rule of every text) or a direction
     * @throws IllegalArgumentException naming the value when it is not finite or too large
     */
    public static Scaled scaled(double value, int decimals, Rounding rounding) {
        String text = fixed(value, decimals, true, rounding);
        int dot = text.indexOf('.');
        String digits = dot < 0 ? text : text.substring(0, dot) + text.substring(dot + 1);
        if (digits.length() > 18) {
            throw new IllegalArgumentException("value " + value + " is too large to write with " + decimals
                    + " decimals");
        }
        return new Scaled(Long.parseLong(digits), decimals);
    }

    /**
     * A number rounded to a fixed count of decimals, as an exact decimal: the digits
     * {@link #fixed(double, int, boolean, Rounding)} writes, for checks that compare a posted word
     * with a limit. Never negative zero.
     *
     * @param value    the number (must be finite)
     * @param decimals digits after the point, 0 or more; the result's scale
     * @param mode     HALF_UP (the rule of every text) or a direction: CEILING, FLOOR, UP, DOWN
     * @throws IllegalArgumentException naming the value when it is not finite, or for another mode
     */
    public static BigDecimal rounded(double value, int decimals, RoundingMode mode) {
        return new BigDecimal(fixed(value, decimals, true, Rounding.of(mode)));
    }

    /**
     * The text of a rounded number ({@link #rounded}): plain digits, a point, no exponent, never
     * negative zero.
     *
     * @param value         the number, its scale the count of decimals to write
     * @param trailingZeros false strips trailing zeros after the point but keeps the point, as
     *                      {@link #fixed(double, int, boolean)} does
     */
    public static String text(BigDecimal value, boolean trailingZeros) {
        BigDecimal v = value.signum() == 0 ? value.abs() : value;
        String text = v.toPlainString();
        return trailingZeros || v.scale() <= 0 ? text : withoutTrailingZeros(text);
    }

    /** A fixed-point text without the zeros after its last significant decimal; the point stays ({@code 24.}). */
    private static String withoutTrailingZeros(String text) {
        int end = text.length();
        while (text.charAt(end - 1) == '0') {
            end--;
        }
        return text.substring(0, end);
    }

    /** Without trailing zeros or a lone point: {@code 24.500} to {@code 24.5}, {@code 24.000} to {@code 24}. */
    private static String trim(String text) {
        if (text.indexOf('.') < 0) {
            return text;
        }
        String t = withoutTrailingZeros(text);
        return t.endsWith(".") ? t.substring(0, t.length() - 1) : t;
    }

    /**
     * A decimal number as digits: value = ±0.d₁d₂…dₙ × 10^point, d₁ not 0 (or the single digit 0),
     * no trailing zeros.
     */
    private static final class Digits {
        final boolean negative;
        final char[] digit;
        final int length;
        final int point;

        private Digits(boolean negative, char[] digit, int length, int point) {
            int start = 0;
            while (start < length - 1 && digit[start] == '0') {
                start++;
            }
            int end = length;
            while (end > start + 1 && digit[end - 1] == '0') {
                end--;
            }
            this.negative = negative;
            this.digit = java.util.Arrays.copyOfRange(digit, start, end);
            this.length = end - start;
            this.point = this.length == 1 && this.digit[0] == '0' ? 0 : point - start;
        }

        /** The digits of {@link Double#toString(double)}: {@code 123.456}, {@code 1.0E-4}, {@code 1.2345E10}. */
        static Digits of(double value) {
            String s = Double.toString(Math.abs(value));
            int e = s.indexOf('E');
            int end = e < 0 ? s.length() : e;
            int exponent = e < 0 ? 0 : Integer.parseInt(s, e + 1, s.length(), 10);
            int dot = s.indexOf('.');
            char[] d = new char[end - 1];
            s.getChars(0, dot, d, 0);
            s.getChars(dot + 1, end, d, dot);
            return new Digits(value < 0, d, d.length, dot + exponent);
        }

        boolean isZero() {
            return length == 1 && digit[0] == '0';
        }

        /** These digits rounded to {@code decimals} places after the point (negative: before it). */
        Digits round(int decimals, Rounding rounding) {
            Digits d = rounding == Rounding.HALF_UP ? this : toNoise(Math.max(NOISE_DIGITS, point + decimals + 3));
            int keep = d.point + decimals;
            if (keep >= d.length || d.isZero()) {
                return d;
            }
            boolean up = switch (rounding) {
                case HALF_UP -> keep >= 0 && d.digit[keep] >= '5';
                case CEILING -> !d.negative;
                case FLOOR -> d.negative;
                case UP -> true;
                case DOWN -> false;
            };
            return d.cut(Math.max(keep, 0), keep, up);
        }

        /**
         * {@code n} significant digits, half to even: {@value #NOISE_DIGITS}, or three decimals more
         * than the rounding writes when that is finer (a large value written with many decimals).
         */
        private Digits toNoise(int n) {
            if (length <= n) {
                return this;
            }
            char next = digit[n];
            boolean beyond = length > n + 1;
            boolean up = next > '5' || next == '5' && (beyond || (digit[n - 1] - '0') % 2 == 1);
            return cut(n, n, up);
        }

        /**
         * The first {@code kept} digits, one unit of the digit at position {@code unit - 1} added when
         * {@code up} (position -1 and below: a unit left of the first digit).
         */
        private Digits cut(int kept, int unit, boolean up) {
            if (!up) {
                return kept == 0 ? new Digits(negative, new char[] {'0'}, 1, 0) : new Digits(negative, digit, kept,
                        point);
            }
            if (unit <= 0) {
                return new Digits(negative, new char[] {'1'}, 1, point - unit + 1);
            }
            char[] d = new char[unit + 1];
            d[0] = '0';
            System.arraycopy(digit, 0, d, 1, unit);
            int i = unit;
            while (d[i] == '9') {
                d[i--] = '0';
            }
            d[i]++;
            return new Digits(negative, d, d.length, point + 1);
        }

        /** Plain text with exactly {@code decimals} digits after the point (none, and no point, when 0 or less). */
        String text(int decimals) {
            StringBuilder out = new StringBuilder(Math.max(point, 1) + Math.max(decimals, 0) + 3);
            if (negative && !isZero()) {
                out.append('-');
            }
            if (point <= 0) {
                out.append('0');
            } else {
                for (int i = 0; i < point; i++) {
                    out.append(i < length ? digit[i] : '0');
                }
            }
            if (decimals > 0) {
                out.append('.');
                for (int i = point; i < point + decimals; i++) {
                    out.append(i >= 0 && i < length ? digit[i] : '0');
                }
            }
            return out.toString();
        }
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
