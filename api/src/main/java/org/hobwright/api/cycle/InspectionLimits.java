package org.hobwright.api.cycle;

import org.hobwright.api.ApiStatus;
import org.hobwright.api.internal.Checks;

/**
 * Upper and lower limits of the inspection values, from the upper and lower normal tooth-thickness
 * allowances (the drawing's, or a tolerance series'). The upper limits are the values of
 * {@link InspectionData} (made with the upper allowance); the lower ones are made with the lower
 * allowance over the same number of teeth and the same pin or ball. mm.
 *
 * <p>Experimental: the shape may still change in a minor version.
 *
 * @param upperAllowanceMm         upper normal tooth-thickness allowance E_sns
 * @param lowerAllowanceMm         lower normal tooth-thickness allowance E_sni, not above the upper one
 * @param basis                    where the allowances come from: {@code drawing}, or the series,
 *                                 e.g. {@code DIN 3967 cd25}
 * @param spanWidthUpperMm         largest span W_k
 * @param spanWidthLowerMm         smallest span W_k
 * @param overPinsUpperMm          largest measurement over pins or balls
 * @param overPinsLowerMm          smallest measurement over pins or balls
 * @param chordalThicknessUpperMm  largest chordal tooth thickness
 * @param chordalThicknessLowerMm  smallest chordal tooth thickness
 * @param rootDiameterUpperMm      root diameter as the hob cuts it for the upper allowance
 * @param rootDiameterLowerMm      root diameter for the lower allowance (the hob fed deeper)
 */
@ApiStatus(since = "1.1", stability = ApiStatus.Stability.EXPERIMENTAL)
public record InspectionLimits(double upperAllowanceMm, double lowerAllowanceMm, String basis,
                               double spanWidthUpperMm, double spanWidthLowerMm,
                               double overPinsUpperMm, double overPinsLowerMm,
                               double chordalThicknessUpperMm, double chordalThicknessLowerMm,
                               double rootDiameterUpperMm, double rootDiameterLowerMm) {

    /**
     * Checks the components: a value out of range throws {@link IllegalArgumentException} naming the field and the
     * value.
     *
     * @param upperAllowanceMm upper normal tooth-thickness allowance E_sns
     * @param lowerAllowanceMm lower normal tooth-thickness allowance E_sni, not above the upper one
     * @param basis where the allowances come from: {@code drawing}, or the series, e.g. {@code DIN 3967 cd25}
     * @param spanWidthUpperMm largest span W_k
     * @param spanWidthLowerMm smallest span W_k
     * @param overPinsUpperMm largest measurement over pins or balls
     * @param overPinsLowerMm smallest measurement over pins or balls
     * @param chordalThicknessUpperMm largest chordal tooth thickness
     * @param chordalThicknessLowerMm smallest chordal tooth thickness
     * @param rootDiameterUpperMm root diameter as the hob cuts it for the upper allowance
     * @param rootDiameterLowerMm root diameter for the lower allowance (the hob fed deeper)
     */
    public InspectionLimits {
        Checks.finite("upperAllowanceMm", upperAllowanceMm);
        Checks.finite("lowerAllowanceMm", lowerAllowanceMm);
        if (lowerAllowanceMm > upperAllowanceMm) {
            throw new IllegalArgumentException("lowerAllowanceMm must not be above upperAllowanceMm ("
                    + upperAllowanceMm + "), was " + lowerAllowanceMm);
        }
        Checks.text("basis", basis);
        Checks.finite("spanWidthUpperMm", spanWidthUpperMm);
        Checks.finite("spanWidthLowerMm", spanWidthLowerMm);
        Checks.finite("overPinsUpperMm", overPinsUpperMm);
        Checks.finite("overPinsLowerMm", overPinsLowerMm);
        Checks.finite("chordalThicknessUpperMm", chordalThicknessUpperMm);
        Checks.finite("chordalThicknessLowerMm", chordalThicknessLowerMm);
        Checks.finite("rootDiameterUpperMm", rootDiameterUpperMm);
        Checks.finite("rootDiameterLowerMm", rootDiameterLowerMm);
    }
}
