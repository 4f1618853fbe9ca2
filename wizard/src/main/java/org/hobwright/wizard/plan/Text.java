package org.hobwright.wizard.plan;

/**
 * Fast, locale-free number text for comments and messages (the planner writes many per job; the
 * general {@link java.util.Formatter} costs more than the planning itself). Always a point as the
 * decimal separator, rounding half away from zero.
 */
final class Text {
    private static final long[] POW10 = {1, 10, 100, 1_000, 10_000, 100_000, 1_000_000, 10_000_000};

    private Text() {
    }

    /**
     * The value with a fixed number of decimals, e.g. {@code fixed(2.3456, 3)} is {@code 2.346}.
     *
     * @param v        a finite value below 10¹¹ in magnitude
     * @param decimals 0 to 7
     */
    static String fixed(double v, int decimals) {
        if (!Double.isFinite(v) || Math.abs(v) >= 1e11) {
            return Double.toString(v);
        }
        long scale = POW10[decimals];
        long units = Math.round(Math.abs(v) * scale);
        StringBuilder sb = new StringBuilder(24);
        if (v < 0 && units != 0) {
            sb.append('-');
        }
        sb.append(units / scale);
        if (decimals > 0) {
            sb.append('.');
            String frac = Long.toString(units % scale);
            for (int i = frac.length(); i < decimals; i++) {
                sb.append('0');
            }
            sb.append(frac);
        }
        return sb.toString();
    }

    /** The value with an explicit sign, e.g. {@code +0.494308}. */
    static String signed(double v, int decimals) {
        String s = fixed(v, decimals);
        return s.startsWith("-") ? s : "+" + s;
    }
}
