package org.hobwright.post;

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
        BigDecimal rounded = BigDecimal.valueOf(value).setScale(decimals, RoundingMode.HALF_UP);
        if (rounded.signum() == 0) {
            rounded = rounded.abs();
        }
        String text = rounded.toPlainString();
        if (trailingZeros || decimals == 0) {
            return text;
        }
        int end = text.length();
        while (text.charAt(end - 1) == '0') {
            end--;
        }
        return text.substring(0, end);
    }

    /** Formats with trailing zeros kept, e.g. {@code fixed(2.5, 3)} gives {@code 2.500}. */
    public static String fixed(double value, int decimals) {
        return fixed(value, decimals, true);
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
