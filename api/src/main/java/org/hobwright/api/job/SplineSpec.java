package org.hobwright.api.job;

import java.util.Objects;
import java.util.OptionalDouble;
import org.hobwright.api.ApiStatus;
import org.hobwright.api.internal.Checks;

/**
 * What makes a job's part an external involute spline, beside the spur-gear frame its {@link GearSpec}
 * carries (teeth, pitch, pressure angle, face width, part name, blank and pin). Lengths in mm.
 *
 * @param standard             {@code iso4156}, {@code ansi-b92.1} or {@code din5480}
 * @param root                 {@code flat} or {@code fillet}
 * @param toleranceClass       tolerance class (ISO 4156, ANSI B92.1: 4 to 7; DIN 5480: the quality)
 * @param fitClass             fit class or deviation series as the standard names it, e.g. {@code h}
 * @param referenceDiameterMm  DIN 5480 reference diameter d_B
 * @param allowanceMm          es (DIN 5480 A_s) from the drawing, signed, negative thins the tooth
 * @param totalToleranceMm     T + λ (DIN 5480 T_G) from the drawing
 * @param effectiveVariationMm λ (DIN 5480 T_eff) from the drawing
 */
@ApiStatus(since = "1.1")
public record SplineSpec(String standard, String root, int toleranceClass, String fitClass,
                         OptionalDouble referenceDiameterMm, OptionalDouble allowanceMm,
                         OptionalDouble totalToleranceMm, OptionalDouble effectiveVariationMm) {
    /**
     * Checks the components: a value out of range throws {@link IllegalArgumentException} naming the field.
     *
     * @param standard {@code iso4156}, {@code ansi-b92.1} or {@code din5480}
     * @param root {@code flat} or {@code fillet}
     * @param toleranceClass tolerance class, 1 to 16
     * @param fitClass fit class as the standard names it
     * @param referenceDiameterMm DIN 5480 reference diameter d_B
     * @param allowanceMm es from the drawing, −10 to 10 mm
     * @param totalToleranceMm T + λ from the drawing
     * @param effectiveVariationMm λ from the drawing, 0 to 10 mm
     */
    public SplineSpec {
        Checks.text("spline.standard", standard);
        Checks.text("spline.root", root);
        Checks.range("spline.toleranceClass", toleranceClass, 1, 16);
        Checks.text("spline.fitClass", fitClass);
        Objects.requireNonNull(referenceDiameterMm, "referenceDiameterMm");
        Checks.positive("spline.referenceDiameter", referenceDiameterMm);
        Objects.requireNonNull(allowanceMm, "allowanceMm");
        Checks.range("spline.allowance", allowanceMm, -10, 10);
        Objects.requireNonNull(totalToleranceMm, "totalToleranceMm");
        Checks.positive("spline.totalTolerance", totalToleranceMm);
        Objects.requireNonNull(effectiveVariationMm, "effectiveVariationMm");
        Checks.range("spline.effectiveVariation", effectiveVariationMm, 0, 10);
    }
}
