package org.hobwright.api.job;

import java.util.OptionalDouble;
import java.util.OptionalInt;

/**
 * Values printed on the gear drawing, entered so the drawing check can compare them with the
 * computed ones. Every value is optional; lengths in millimetres.
 *
 * @param pitchDiameterMm   reference (pitch) diameter as printed
 * @param outsideDiameterMm tip (outside) diameter as printed
 * @param rootDiameterMm    root diameter as printed
 * @param wholeDepthMm      whole depth (tooth depth) as printed
 * @param spanTeeth         number of teeth spanned for the printed span value
 * @param spanWidthMm       span measurement (base tangent length) as printed
 * @param pinDiameterMm     pin or ball diameter of the printed over-pins value
 * @param overPinsMm        measurement over two pins or balls as printed
 */
public record DrawingValues(
        OptionalDouble pitchDiameterMm,
        OptionalDouble outsideDiameterMm,
        OptionalDouble rootDiameterMm,
        OptionalDouble wholeDepthMm,
        OptionalInt spanTeeth,
        OptionalDouble spanWidthMm,
        OptionalDouble pinDiameterMm,
        OptionalDouble overPinsMm) {

    /** No drawing values entered. */
    public static final DrawingValues NONE = new DrawingValues(OptionalDouble.empty(), OptionalDouble.empty(),
            OptionalDouble.empty(), OptionalDouble.empty(), OptionalInt.empty(), OptionalDouble.empty(),
            OptionalDouble.empty(), OptionalDouble.empty());

    public DrawingValues {
        java.util.Objects.requireNonNull(pitchDiameterMm, "pitchDiameterMm");
        java.util.Objects.requireNonNull(outsideDiameterMm, "outsideDiameterMm");
        java.util.Objects.requireNonNull(rootDiameterMm, "rootDiameterMm");
        java.util.Objects.requireNonNull(wholeDepthMm, "wholeDepthMm");
        java.util.Objects.requireNonNull(spanTeeth, "spanTeeth");
        java.util.Objects.requireNonNull(spanWidthMm, "spanWidthMm");
        java.util.Objects.requireNonNull(pinDiameterMm, "pinDiameterMm");
        java.util.Objects.requireNonNull(overPinsMm, "overPinsMm");
        org.hobwright.api.Validate.field(JobFields.DRAWING_PITCH_DIAMETER, pitchDiameterMm);
        org.hobwright.api.Validate.field(JobFields.DRAWING_OUTSIDE_DIAMETER, outsideDiameterMm);
        org.hobwright.api.Validate.field(JobFields.DRAWING_ROOT_DIAMETER, rootDiameterMm);
        org.hobwright.api.Validate.field(JobFields.DRAWING_WHOLE_DEPTH, wholeDepthMm);
        org.hobwright.api.Validate.field(JobFields.DRAWING_SPAN_TEETH, spanTeeth);
        org.hobwright.api.Validate.field(JobFields.DRAWING_SPAN, spanWidthMm);
        org.hobwright.api.Validate.field(JobFields.DRAWING_PIN_DIAMETER, pinDiameterMm);
        org.hobwright.api.Validate.field(JobFields.DRAWING_OVER_PINS, overPinsMm);
    }
}
