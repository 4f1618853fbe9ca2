package org.hobwright.api.cycle;

/**
 * A point of a plotted curve, mm (or the unit a curve's javadoc names).
 *
 * @param x first coordinate
 * @param y second coordinate
 */
public record Point(double x, double y) {
    public Point {
        org.hobwright.api.Validate.finite("x", x);
        org.hobwright.api.Validate.finite("y", y);
    }
}
