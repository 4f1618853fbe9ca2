package org.hobwright.wizard.spline;

import java.util.OptionalDouble;

/**
 * An external spline as its drawing states it, in millimetres and degrees.
 *
 * <p>Inch splines (ANSI B92.1) carry their module m = 25.4 / P mm; {@link #diametralPitch()} gives P back.
 * The optional tolerance values, when given, replace what the tolerance and fit class would give; a
 * DIN 5480 spline needs them (see FORMULAS.md, splines).
 *
 * @param standard             the standard it is drawn to
 * @param teeth                number of teeth z
 * @param moduleMm             module m, mm
 * @param pressureAngleDeg     pressure angle α_D at the pitch diameter, degrees
 * @param root                 root form
 * @param toleranceClass       tolerance class (ISO 4156 and ANSI B92.1: 4 to 7; DIN 5480: the quality)
 * @param fitClass             fit class or deviation series as the standard names it (h, f, e, d)
 * @param referenceDiameterMm  DIN 5480 reference diameter d_B, mm (NaN for the other standards)
 * @param lengthMm             spline length g (the face width), mm
 * @param allowanceMm          es: the fundamental deviation of the effective tooth thickness, mm, signed
 *                             (negative thins the tooth), when the drawing states it
 * @param totalToleranceMm     T + λ, mm, when the drawing states it
 * @param effectiveVariationMm λ, mm, when the drawing states it
 */
public record SplineDrawing(SplineStandard standard, int teeth, double moduleMm, double pressureAngleDeg, SplineRoot root,
                         int toleranceClass, String fitClass, double referenceDiameterMm, double lengthMm,
                         OptionalDouble allowanceMm, OptionalDouble totalToleranceMm,
                         OptionalDouble effectiveVariationMm) {

    /** A spline whose tolerances follow from its classes. */
    public static SplineDrawing of(SplineStandard standard, int teeth, double moduleMm, double pressureAngleDeg,
                                SplineRoot root, int toleranceClass, String fitClass, double lengthMm) {
        return new SplineDrawing(standard, teeth, moduleMm, pressureAngleDeg, root, toleranceClass, fitClass, Double.NaN,
                lengthMm, OptionalDouble.empty(), OptionalDouble.empty(), OptionalDouble.empty());
    }

    /** The same spline with another fit class. */
    public SplineDrawing withFit(String fit) {
        return new SplineDrawing(standard, teeth, moduleMm, pressureAngleDeg, root, toleranceClass, fit, referenceDiameterMm,
                lengthMm, allowanceMm, totalToleranceMm, effectiveVariationMm);
    }

    /** The same spline with another length. */
    public SplineDrawing withLength(double length) {
        return new SplineDrawing(standard, teeth, moduleMm, pressureAngleDeg, root, toleranceClass, fitClass,
                referenceDiameterMm, length, allowanceMm, totalToleranceMm, effectiveVariationMm);
    }

    /** Diametral pitch P = 25.4 / m, 1/in. */
    public double diametralPitch() {
        return 25.4 / moduleMm;
    }

    /** α_D, rad. */
    public double pressureAngleRad() {
        return Math.toRadians(pressureAngleDeg);
    }

    /** Pitch diameter D = m z, mm. */
    public double pitchDiameterMm() {
        return moduleMm * teeth;
    }
}
