package org.hobwright.wizard.spline;

/**
 * A spline hob: a gear hob's pitch and profile plus its root form, its tip radius and its addendum.
 *
 * @param moduleMm         module m (25.4 / P for an inch hob), mm
 * @param pressureAngleDeg profile angle, degrees
 * @param root             root form the hob's tip gives (flat or fillet)
 * @param addendumMm       h_a0: tip line below the datum line (where the hob tooth is π m / 2 thick), mm
 * @param tipRadiusMm      ρ_a0, tip corner radius (normal section), mm
 * @param starts           number of starts z₀
 * @param gashes           number of gashes i
 */
public record SplineHob(double moduleMm, double pressureAngleDeg, SplineRoot root, double addendumMm,
                        double tipRadiusMm, int starts, int gashes) {
}
