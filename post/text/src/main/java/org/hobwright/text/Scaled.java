package org.hobwright.text;

/**
 * A number with a fixed count of decimals, as an NC word writes it: {@code units} × 10^−decimals,
 * exactly (17 digits at most, so it lives in a {@code long}). Made by {@link Decimal#scaled}.
 *
 * @param units    the number in units of its last decimal (−13.237 with 3 decimals is −13237)
 * @param decimals digits after the point, 0 to 9
 */
public record Scaled(long units, int decimals) {

    private static final long[] POW10 = {1, 10, 100, 1_000, 10_000, 100_000, 1_000_000, 10_000_000, 100_000_000,
        1_000_000_000};

    public Scaled {
        if (decimals < 0 || decimals >= POW10.length) {
            throw new IllegalArgumentException("decimals must be 0 to 9, was " + decimals);
        }
    }

    /** The nearest double to the number (what reading its text back gives). */
    public double value() {
        return units / (double) POW10[decimals];
    }

    /** −1, 0 or 1. */
    public int signum() {
        return Long.signum(units);
    }

    /** The number with the other sign. */
    public Scaled negate() {
        return new Scaled(-units, decimals);
    }

    /**
     * The text: plain digits, a point, no exponent, never negative zero.
     *
     * @param trailingZeros false strips trailing zeros after the point but keeps the point
     *                      ({@code 24.} for {@code 24.000}), as {@link Decimal#fixed(double, int, boolean)}
     */
    public String text(boolean trailingZeros) {
        String digits = Long.toString(Math.abs(units));
        StringBuilder sb = new StringBuilder(digits.length() + decimals + 3);
        if (units < 0) {
            sb.append('-');
        }
        for (int i = digits.length(); i <= decimals; i++) {
            sb.append('0');
        }
        sb.append(digits);
        if (decimals > 0) {
            sb.insert(sb.length() - decimals, '.');
            if (!trailingZeros) {
                int end = sb.length();
                while (sb.charAt(end - 1) == '0') {
                    end--;
                }
                sb.setLength(end);
            }
        }
        return sb.toString();
    }

    @Override
    public String toString() {
        return text(true);
    }
}
