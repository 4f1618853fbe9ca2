package org.hobwright.api.job;

import java.util.OptionalDouble;
import java.util.OptionalInt;
import org.hobwright.api.ApiStatus;

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
@ApiStatus(since = "1.0")
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

    /**
     * Checks the components: a value out of range throws {@link IllegalArgumentException} naming the field and the
     * value.
     *
     * @param pitchDiameterMm the value
     * @param outsideDiameterMm the value
     * @param rootDiameterMm the value
     * @param wholeDepthMm the value
     * @param spanTeeth the value
     * @param spanWidthMm the value
     * @param pinDiameterMm the value
     * @param overPinsMm the value
     */
    public DrawingValues {
        java.util.Objects.requireNonNull(pitchDiameterMm, "pitchDiameterMm");
        java.util.Objects.requireNonNull(outsideDiameterMm, "outsideDiameterMm");
        java.util.Objects.requireNonNull(rootDiameterMm, "rootDiameterMm");
        java.util.Objects.requireNonNull(wholeDepthMm, "wholeDepthMm");
        java.util.Objects.requireNonNull(spanTeeth, "spanTeeth");
        java.util.Objects.requireNonNull(spanWidthMm, "spanWidthMm");
        java.util.Objects.requireNonNull(pinDiameterMm, "pinDiameterMm");
        java.util.Objects.requireNonNull(overPinsMm, "overPinsMm");
        org.hobwright.api.internal.Checks.field(JobFields.DRAWING_PITCH_DIAMETER, pitchDiameterMm);
        org.hobwright.api.internal.Checks.field(JobFields.DRAWING_OUTSIDE_DIAMETER, outsideDiameterMm);
        org.hobwright.api.internal.Checks.field(JobFields.DRAWING_ROOT_DIAMETER, rootDiameterMm);
        org.hobwright.api.internal.Checks.field(JobFields.DRAWING_WHOLE_DEPTH, wholeDepthMm);
        org.hobwright.api.internal.Checks.field(JobFields.DRAWING_SPAN_TEETH, spanTeeth);
        org.hobwright.api.internal.Checks.field(JobFields.DRAWING_SPAN, spanWidthMm);
        org.hobwright.api.internal.Checks.field(JobFields.DRAWING_PIN_DIAMETER, pinDiameterMm);
        org.hobwright.api.internal.Checks.field(JobFields.DRAWING_OVER_PINS, overPinsMm);
    }

    /**
     * This drawing values with another {@code pitchDiameterMm}.
     *
     * @param pitchDiameterMm reference (pitch) diameter as printed
     * @return the copy, checked like any new one
     */
    @ApiStatus(since = "1.1")
    public DrawingValues withPitchDiameterMm(OptionalDouble pitchDiameterMm) {
        return new DrawingValues(pitchDiameterMm, outsideDiameterMm, rootDiameterMm, wholeDepthMm, spanTeeth,
                spanWidthMm, pinDiameterMm, overPinsMm);
    }

    /**
     * This drawing values with a {@code pitchDiameterMm} given.
     *
     * @param pitchDiameterMm the value
     * @return the copy, checked like any new one
     */
    @ApiStatus(since = "1.1")
    public DrawingValues withPitchDiameterMm(double pitchDiameterMm) {
        return withPitchDiameterMm(OptionalDouble.of(pitchDiameterMm));
    }

    /**
     * This drawing values with another {@code outsideDiameterMm}.
     *
     * @param outsideDiameterMm tip (outside) diameter as printed
     * @return the copy, checked like any new one
     */
    @ApiStatus(since = "1.1")
    public DrawingValues withOutsideDiameterMm(OptionalDouble outsideDiameterMm) {
        return new DrawingValues(pitchDiameterMm, outsideDiameterMm, rootDiameterMm, wholeDepthMm, spanTeeth,
                spanWidthMm, pinDiameterMm, overPinsMm);
    }

    /**
     * This drawing values with a {@code outsideDiameterMm} given.
     *
     * @param outsideDiameterMm the value
     * @return the copy, checked like any new one
     */
    @ApiStatus(since = "1.1")
    public DrawingValues withOutsideDiameterMm(double outsideDiameterMm) {
        return withOutsideDiameterMm(OptionalDouble.of(outsideDiameterMm));
    }

    /**
     * This drawing values with another {@code rootDiameterMm}.
     *
     * @param rootDiameterMm root diameter as printed
     * @return the copy, checked like any new one
     */
    @ApiStatus(since = "1.1")
    public DrawingValues withRootDiameterMm(OptionalDouble rootDiameterMm) {
        return new DrawingValues(pitchDiameterMm, outsideDiameterMm, rootDiameterMm, wholeDepthMm, spanTeeth,
                spanWidthMm, pinDiameterMm, overPinsMm);
    }

    /**
     * This drawing values with a {@code rootDiameterMm} given.
     *
     * @param rootDiameterMm the value
     * @return the copy, checked like any new one
     */
    @ApiStatus(since = "1.1")
    public DrawingValues withRootDiameterMm(double rootDiameterMm) {
        return withRootDiameterMm(OptionalDouble.of(rootDiameterMm));
    }

    /**
     * This drawing values with another {@code wholeDepthMm}.
     *
     * @param wholeDepthMm whole depth (tooth depth) as printed
     * @return the copy, checked like any new one
     */
    @ApiStatus(since = "1.1")
    public DrawingValues withWholeDepthMm(OptionalDouble wholeDepthMm) {
        return new DrawingValues(pitchDiameterMm, outsideDiameterMm, rootDiameterMm, wholeDepthMm, spanTeeth,
                spanWidthMm, pinDiameterMm, overPinsMm);
    }

    /**
     * This drawing values with a {@code wholeDepthMm} given.
     *
     * @param wholeDepthMm the value
     * @return the copy, checked like any new one
     */
    @ApiStatus(since = "1.1")
    public DrawingValues withWholeDepthMm(double wholeDepthMm) {
        return withWholeDepthMm(OptionalDouble.of(wholeDepthMm));
    }

    /**
     * This drawing values with another {@code spanTeeth}.
     *
     * @param spanTeeth number of teeth spanned for the printed span value
     * @return the copy, checked like any new one
     */
    @ApiStatus(since = "1.1")
    public DrawingValues withSpanTeeth(OptionalInt spanTeeth) {
        return new DrawingValues(pitchDiameterMm, outsideDiameterMm, rootDiameterMm, wholeDepthMm, spanTeeth,
                spanWidthMm, pinDiameterMm, overPinsMm);
    }

    /**
     * This drawing values with a {@code spanTeeth} given.
     *
     * @param spanTeeth the value
     * @return the copy, checked like any new one
     */
    @ApiStatus(since = "1.1")
    public DrawingValues withSpanTeeth(int spanTeeth) {
        return withSpanTeeth(OptionalInt.of(spanTeeth));
    }

    /**
     * This drawing values with another {@code spanWidthMm}.
     *
     * @param spanWidthMm span measurement (base tangent length) as printed
     * @return the copy, checked like any new one
     */
    @ApiStatus(since = "1.1")
    public DrawingValues withSpanWidthMm(OptionalDouble spanWidthMm) {
        return new DrawingValues(pitchDiameterMm, outsideDiameterMm, rootDiameterMm, wholeDepthMm, spanTeeth,
                spanWidthMm, pinDiameterMm, overPinsMm);
    }

    /**
     * This drawing values with a {@code spanWidthMm} given.
     *
     * @param spanWidthMm the value
     * @return the copy, checked like any new one
     */
    @ApiStatus(since = "1.1")
    public DrawingValues withSpanWidthMm(double spanWidthMm) {
        return withSpanWidthMm(OptionalDouble.of(spanWidthMm));
    }

    /**
     * This drawing values with another {@code pinDiameterMm}.
     *
     * @param pinDiameterMm pin or ball diameter of the printed over-pins value
     * @return the copy, checked like any new one
     */
    @ApiStatus(since = "1.1")
    public DrawingValues withPinDiameterMm(OptionalDouble pinDiameterMm) {
        return new DrawingValues(pitchDiameterMm, outsideDiameterMm, rootDiameterMm, wholeDepthMm, spanTeeth,
                spanWidthMm, pinDiameterMm, overPinsMm);
    }

    /**
     * This drawing values with a {@code pinDiameterMm} given.
     *
     * @param pinDiameterMm the value
     * @return the copy, checked like any new one
     */
    @ApiStatus(since = "1.1")
    public DrawingValues withPinDiameterMm(double pinDiameterMm) {
        return withPinDiameterMm(OptionalDouble.of(pinDiameterMm));
    }

    /**
     * This drawing values with another {@code overPinsMm}.
     *
     * @param overPinsMm measurement over two pins or balls as printed
     * @return the copy, checked like any new one
     */
    @ApiStatus(since = "1.1")
    public DrawingValues withOverPinsMm(OptionalDouble overPinsMm) {
        return new DrawingValues(pitchDiameterMm, outsideDiameterMm, rootDiameterMm, wholeDepthMm, spanTeeth,
                spanWidthMm, pinDiameterMm, overPinsMm);
    }

    /**
     * This drawing values with a {@code overPinsMm} given.
     *
     * @param overPinsMm the value
     * @return the copy, checked like any new one
     */
    @ApiStatus(since = "1.1")
    public DrawingValues withOverPinsMm(double overPinsMm) {
        return withOverPinsMm(OptionalDouble.of(overPinsMm));
    }
}
