package org.hobwright.api.host;

import org.hobwright.api.ApiStatus;
import org.hobwright.api.internal.Checks;

/**
 * A closed range of typical values, {@code 0 < min <= max}.
 *
 * @param min lower end
 * @param max upper end
 */
@ApiStatus(since = "1.1")
public record Range(double min, double max) {
    /**
     * Checks the components: a value out of range throws {@link IllegalArgumentException} naming the field and the
     * value.
     *
     * @param min lower end
     * @param max upper end
     */
    public Range {
        Checks.positive("min", min);
        Checks.finite("max", max);
        if (max < min) {
            throw new IllegalArgumentException("max must not be below min (" + min + "), was " + max);
        }
    }

    /** {@code min–max}. */
    @Override
    public String toString() {
        return min + "–" + max;
    }
}
