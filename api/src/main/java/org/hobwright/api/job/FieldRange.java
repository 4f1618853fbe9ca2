package org.hobwright.api.job;

import org.hobwright.api.ApiStatus;

/**
 * The allowed values of a numeric field, in canonical units (mm, m/min, degrees, ...). One range
 * per field: the file readers, the wizard, the JSON schemas and the api records all use it.
 *
 * @param min     lowest allowed value ({@link Double#NEGATIVE_INFINITY} for none)
 * @param minOpen true when {@code min} itself is not allowed ("greater than")
 * @param max     highest allowed value, itself allowed ({@link Double#POSITIVE_INFINITY} for none)
 */
@ApiStatus(since = "1.1")
public record FieldRange(double min, boolean minOpen, double max) {
    /** Any finite number (also the range of fields that are not numbers). */
    public static final FieldRange ANY = new FieldRange(Double.NEGATIVE_INFINITY, false, Double.POSITIVE_INFINITY);
    /** Greater than 0. */
    public static final FieldRange POSITIVE = new FieldRange(0, true, Double.POSITIVE_INFINITY);
    /** 0 or more. */
    public static final FieldRange NON_NEGATIVE = new FieldRange(0, false, Double.POSITIVE_INFINITY);

    /**
     * Checks the components: a value out of range throws {@link IllegalArgumentException} naming the field and the
     * value.
     *
     * @param min lowest allowed value ({@link Double#NEGATIVE_INFINITY} for none)
     * @param minOpen true when {@code min} itself is not allowed ("greater than")
     * @param max highest allowed value, itself allowed ({@link Double#POSITIVE_INFINITY} for none)
     */
    public FieldRange {
        if (Double.isNaN(min) || Double.isNaN(max) || min > max) {
            throw new IllegalArgumentException("a range needs min <= max, was " + min + " to " + max);
        }
    }

    /**
     * From {@code min} to {@code max}, both allowed.
     *
     * @param min lowest allowed value ({@link Double#NEGATIVE_INFINITY} for none)
     * @param max highest allowed value, itself allowed ({@link Double#POSITIVE_INFINITY} for none)
     * @return from {@code min} to {@code max}, both allowed
     */
    public static FieldRange of(double min, double max) {
        return new FieldRange(min, false, max);
    }

    /** {@return true when the range has a lower limit} */
    public boolean hasMin() {
        return min != Double.NEGATIVE_INFINITY;
    }

    /** {@return true when the range has an upper limit} */
    public boolean hasMax() {
        return max != Double.POSITIVE_INFINITY;
    }

    /**
     * True when {@code v} is a finite number inside the range.
     *
     * @param v v
     * @return true when {@code v} is a finite number inside the range
     */
    public boolean contains(double v) {
        return Double.isFinite(v) && (minOpen ? v > min : v >= min) && v <= max;
    }
}
