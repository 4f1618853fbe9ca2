package org.hobwright.api.cycle;

import org.hobwright.api.ApiStatus;
import org.hobwright.api.internal.Checks;

/**
 * A point of a plotted curve, mm (or the unit a curve's javadoc names).
 *
 * @param x first coordinate
 * @param y second coordinate
 */
@ApiStatus(since = "1.0")
public record Point(double x, double y) {
    /**
     * Checks the components: a value out of range throws {@link IllegalArgumentException} naming the field and the
     * value.
     *
     * @param x first coordinate
     * @param y second coordinate
     */
    public Point {
        Checks.finite("x", x);
        Checks.finite("y", y);
    }
}
