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
    public Point {
        Checks.finite("x", x);
        Checks.finite("y", y);
    }
}
