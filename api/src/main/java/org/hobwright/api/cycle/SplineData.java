package org.hobwright.api.cycle;

import java.util.Optional;
import org.hobwright.api.ApiStatus;
import org.hobwright.api.internal.Checks;

/**
 * The limits of an external spline by its standard, its measurement over pins and, when the hob fits,
 * the form check by the generating simulation. Lengths in mm; tooth thicknesses are circular, at the
 * pitch diameter.
 *
 * @param standard              the standard's number and year, e.g. {@code ISO 4156-1:2005}
 * @param pitchDiameterMm       D
 * @param baseDiameterMm        D_b
 * @param majorDiameterMaxMm    D_ee max
 * @param majorDiameterMinMm    D_ee min
 * @param minorDiameterMaxMm    D_ie max
 * @param minorDiameterMinMm    D_ie min
 * @param formDiameterMm        D_Fe max
 * @param formClearanceMm       c_F, radial
 * @param basicToothThicknessMm S (es = 0)
 * @param effectiveThicknessMaxMm S_v max
 * @param effectiveThicknessMinMm S_v min
 * @param toothThicknessMaxMm   S_max, actual
 * @param toothThicknessMinMm   S_min, actual
 * @param allowanceMm           es
 * @param totalToleranceMm      T + λ
 * @param effectiveVariationMm  λ
 * @param pinDiameterMm         D_Re
 * @param pinOrigin             how the pin was chosen
 * @param overPinsMaxMm         upper limit of the measurement over pins
 * @param overPinsMinMm         lower limit of the measurement over pins
 * @param form                  the form check, when the hob fits the spline
 */
@ApiStatus(since = "1.1")
public record SplineData(String standard, double pitchDiameterMm, double baseDiameterMm, double majorDiameterMaxMm,
                         double majorDiameterMinMm, double minorDiameterMaxMm, double minorDiameterMinMm,
                         double formDiameterMm, double formClearanceMm, double basicToothThicknessMm,
                         double effectiveThicknessMaxMm, double effectiveThicknessMinMm, double toothThicknessMaxMm,
                         double toothThicknessMinMm, double allowanceMm, double totalToleranceMm,
                         double effectiveVariationMm, double pinDiameterMm, String pinOrigin, double overPinsMaxMm,
                         double overPinsMinMm, Optional<Form> form) {
    /**
     * Checks the components: a diameter, thickness or pin value that is not positive, or any value that is not
     * finite, throws {@link IllegalArgumentException}.
     *
     * @param standard the standard's number and year
     * @param pitchDiameterMm D
     * @param baseDiameterMm D_b
     * @param majorDiameterMaxMm D_ee max
     * @param majorDiameterMinMm D_ee min
     * @param minorDiameterMaxMm D_ie max
     * @param minorDiameterMinMm D_ie min
     * @param formDiameterMm D_Fe max
     * @param formClearanceMm c_F, radial
     * @param basicToothThicknessMm S (es = 0)
     * @param effectiveThicknessMaxMm S_v max
     * @param effectiveThicknessMinMm S_v min
     * @param toothThicknessMaxMm S_max, actual
     * @param toothThicknessMinMm S_min, actual
     * @param allowanceMm es
     * @param totalToleranceMm T + λ
     * @param effectiveVariationMm λ
     * @param pinDiameterMm D_Re
     * @param pinOrigin how the pin was chosen
     * @param overPinsMaxMm upper limit of the measurement over pins
     * @param overPinsMinMm lower limit of the measurement over pins
     * @param form the form check, when the hob fits the spline
     */
    public SplineData {
        Checks.text("standard", standard);
        for (double v : new double[] {pitchDiameterMm, baseDiameterMm, majorDiameterMaxMm, majorDiameterMinMm,
            minorDiameterMaxMm, minorDiameterMinMm, formDiameterMm, toothThicknessMaxMm, toothThicknessMinMm,
            pinDiameterMm, overPinsMaxMm, overPinsMinMm}) {
            Checks.positive("spline value", v);
        }
        for (double v : new double[] {formClearanceMm, basicToothThicknessMm, effectiveThicknessMaxMm,
            effectiveThicknessMinMm, allowanceMm, totalToleranceMm, effectiveVariationMm}) {
            Checks.finite("spline value", v);
        }
        Checks.text("pinOrigin", pinOrigin);
        Checks.present("form", form);
    }

    /**
     * The form check by the generating simulation.
     *
     * @param formReached             true when the true involute reaches down to D_Fe (checked at S_max)
     * @param involuteStartDiameterMm where the involute begins at S_max
     * @param rootDiameterMm          root diameter the hob cuts at the middle of the tooth-thickness tolerance
     * @param rootDiameterMinMm       root diameter cut at S_min
     * @param rootDiameterMaxMm       root diameter cut at S_max
     */
    @ApiStatus(since = "1.1")
    public record Form(boolean formReached, double involuteStartDiameterMm, double rootDiameterMm,
                       double rootDiameterMinMm, double rootDiameterMaxMm) {
        /**
         * Checks the diameters: one that is not positive throws {@link IllegalArgumentException}.
         *
         * @param formReached true when the true involute reaches down to D_Fe
         * @param involuteStartDiameterMm where the involute begins at S_max
         * @param rootDiameterMm root diameter cut at the middle of the tolerance
         * @param rootDiameterMinMm root diameter cut at S_min
         * @param rootDiameterMaxMm root diameter cut at S_max
         */
        public Form {
            Checks.positive("involuteStartDiameterMm", involuteStartDiameterMm);
            Checks.positive("rootDiameterMm", rootDiameterMm);
            Checks.positive("rootDiameterMinMm", rootDiameterMinMm);
            Checks.positive("rootDiameterMaxMm", rootDiameterMaxMm);
        }
    }
}
