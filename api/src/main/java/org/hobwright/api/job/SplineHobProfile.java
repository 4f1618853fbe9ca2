package org.hobwright.api.job;

import java.util.OptionalDouble;
import org.hobwright.api.ApiStatus;
import org.hobwright.api.internal.Checks;

/**
 * What a spline hob adds to a gear hob: the root form its tip cuts, its tip radius and its addendum.
 * Lengths in mm.
 *
 * @param root        {@code flat} or {@code fillet}
 * @param tipRadiusMm tip corner radius ρ_a0 (normal section)
 * @param addendumMm  h_a0, tip line below the datum line where the hob tooth is π m / 2 thick; empty: the
 *                    standard's
 */
@ApiStatus(since = "1.1")
public record SplineHobProfile(String root, double tipRadiusMm, OptionalDouble addendumMm) {
    /**
     * Checks the components: a negative tip radius or an addendum that is not positive throws
     * {@link IllegalArgumentException} naming the field.
     *
     * @param root {@code flat} or {@code fillet}
     * @param tipRadiusMm tip corner radius ρ_a0
     * @param addendumMm h_a0, or empty for the standard's
     */
    public SplineHobProfile {
        Checks.text("hob.root", root);
        Checks.nonNegative("hob.tipRadius", tipRadiusMm);
        Checks.positive("hob.addendum", java.util.Objects.requireNonNull(addendumMm, "addendumMm"));
    }
}
