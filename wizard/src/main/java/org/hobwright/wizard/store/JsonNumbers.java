package org.hobwright.wizard.store;

import org.hobwright.text.Decimal;

/**
 * Numbers as files show them: rounded to 12 significant digits, so that a value converted from
 * inches to millimetres and back is written as it was read (0.25, not 0.25000000000000006).
 * Twelve digits keep far more than any machine can hold (1e-12 relative).
 */
final class JsonNumbers {
    private JsonNumbers() {
    }

    /** {@code v} rounded to 12 significant digits. */
    static double tidy(double v) {
        if (!Double.isFinite(v) || v == 0) {
            return v == 0 ? 0.0 : v;
        }
        return Double.parseDouble(Decimal.significant(v, 12));
    }
}
