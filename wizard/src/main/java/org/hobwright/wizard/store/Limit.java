package org.hobwright.wizard.store;

import java.util.Optional;

/**
 * The allowed range of a number, in canonical units.
 *
 * @param min     lowest allowed value
 * @param openMin true when {@code min} itself is not allowed ("greater than")
 * @param max     highest allowed value
 */
record Limit(double min, boolean openMin, double max) {
    /** Any finite number. */
    static final Limit ANY = new Limit(Double.NEGATIVE_INFINITY, false, Double.POSITIVE_INFINITY);
    /** Greater than 0. */
    static final Limit POSITIVE = new Limit(0, true, Double.POSITIVE_INFINITY);
    /** 0 or more. */
    static final Limit NON_NEGATIVE = new Limit(0, false, Double.POSITIVE_INFINITY);

    /** From {@code min} to {@code max}, both allowed. */
    static Limit range(double min, double max) {
        return new Limit(min, false, max);
    }

    /** Why {@code v} is not allowed, or empty when it is; {@code unit} is appended to the limits. */
    Optional<String> violation(double v, String unit) {
        if (!Double.isFinite(v)) {
            return Optional.of("must be a finite number");
        }
        boolean belowMin = openMin ? v <= min : v < min;
        if (!belowMin && v <= max) {
            return Optional.empty();
        }
        if (max == Double.POSITIVE_INFINITY) {
            return Optional.of(openMin ? "must be greater than " + FieldReader.format(min) + unit
                    : "must be " + FieldReader.format(min) + unit + " or more");
        }
        return Optional.of("must be between " + FieldReader.format(min) + " and " + FieldReader.format(max) + unit);
    }
}
