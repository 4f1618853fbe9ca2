package org.hobwright.wizard.store;

/**
 * A closed range of typical values, min ≤ max.
 *
 * @param min lower end
 * @param max upper end
 */
public record ValueRange(double min, double max) {
    public ValueRange {
        if (!(min > 0) || !(max >= min) || !Double.isFinite(max)) {
            throw new IllegalArgumentException("range must be two finite numbers 0 < min <= max, was [" + min + ", "
                    + max + "]");
        }
    }

    /** The middle of the range, the planner's starting value. */
    public double mid() {
        return (min + max) / 2;
    }

    /** True when the value lies in the range (both ends included, with a relative tolerance of 1e-9). */
    public boolean contains(double v) {
        return v >= min * (1 - 1e-9) && v <= max * (1 + 1e-9);
    }

    /** The range multiplied by a factor (unit conversion). */
    public ValueRange times(double factor) {
        return new ValueRange(min * factor, max * factor);
    }
}
