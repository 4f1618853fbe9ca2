package org.hobwright.api.cycle;

import org.hobwright.api.ApiStatus;
import org.hobwright.api.internal.Checks;

/**
 * The gear running with its mate, by the gear-pair relations of ISO 21771:2007. mm and degrees.
 *
 * <p>Experimental: the shape may still change in a minor version.
 *
 * @param mateTeeth                  the mate's number of teeth
 * @param mateProfileShift           the mate's profile shift coefficient (the drawing's, or the one the centre
 *                                   distance implies)
 * @param mateProfileShiftGiven      true when the drawing gives the mate's shift
 * @param referenceCentreDistanceMm  a_d = (z₁ + z₂) m_n / (2 cos β), the centre distance of unshifted gears
 * @param centreDistanceMm           the centre distance used: the drawing's, else the one without backlash
 *                                   for the nominal teeth
 * @param centreDistanceGiven        true when the drawing gives the centre distance
 * @param workingPressureAngleDeg    transverse working pressure angle α_wt at that centre distance
 * @param profileShiftSum            x₁ + x₂ that puts nominal teeth at that centre distance without backlash
 * @param backlashMinMm              normal backlash j_bn with both gears at their upper allowances
 * @param backlashMaxMm              normal backlash j_bn with both gears at their lower allowances (the
 *                                   upper ones where no lower is given)
 * @param mateTipDiameterMm          the mate's tip diameter (no tip shortening)
 * @param mateRootDiameterMm         the mate's root diameter as a standard hob cuts it
 * @param tipClearanceMm             clearance between this gear's tip and the mate's root
 * @param mateTipClearanceMm         clearance between the mate's tip and this gear's root
 */
@ApiStatus(since = "1.1", stability = ApiStatus.Stability.EXPERIMENTAL)
public record GearPairData(int mateTeeth, double mateProfileShift, boolean mateProfileShiftGiven,
                           double referenceCentreDistanceMm, double centreDistanceMm, boolean centreDistanceGiven,
                           double workingPressureAngleDeg, double profileShiftSum, double backlashMinMm,
                           double backlashMaxMm, double mateTipDiameterMm, double mateRootDiameterMm,
                           double tipClearanceMm, double mateTipClearanceMm) {

    /**
     * Checks the components: a value out of range throws {@link IllegalArgumentException} naming the field and the
     * value.
     *
     * @param mateTeeth the mate's number of teeth
     * @param mateProfileShift the mate's profile shift coefficient (the drawing's, or the one the centre distance implies)
     * @param mateProfileShiftGiven true when the drawing gives the mate's shift
     * @param referenceCentreDistanceMm a_d = (z₁ + z₂) m_n / (2 cos β), the centre distance of unshifted gears
     * @param centreDistanceMm the centre distance used: the drawing's, else the one without backlash for the nominal teeth
     * @param centreDistanceGiven true when the drawing gives the centre distance
     * @param workingPressureAngleDeg transverse working pressure angle α_wt at that centre distance
     * @param profileShiftSum x₁ + x₂ that puts nominal teeth at that centre distance without backlash
     * @param backlashMinMm normal backlash j_bn with both gears at their upper allowances
     * @param backlashMaxMm normal backlash j_bn with both gears at their lower allowances (the upper ones where no lower is given)
     * @param mateTipDiameterMm the mate's tip diameter (no tip shortening)
     * @param mateRootDiameterMm the mate's root diameter as a standard hob cuts it
     * @param tipClearanceMm clearance between this gear's tip and the mate's root
     * @param mateTipClearanceMm clearance between the mate's tip and this gear's root
     */
    public GearPairData {
        Checks.atLeast("mateTeeth", mateTeeth, 1);
        Checks.finite("mateProfileShift", mateProfileShift);
        Checks.positive("referenceCentreDistanceMm", referenceCentreDistanceMm);
        Checks.positive("centreDistanceMm", centreDistanceMm);
        Checks.finite("workingPressureAngleDeg", workingPressureAngleDeg);
        Checks.finite("profileShiftSum", profileShiftSum);
        Checks.finite("backlashMinMm", backlashMinMm);
        Checks.finite("backlashMaxMm", backlashMaxMm);
        Checks.finite("mateTipDiameterMm", mateTipDiameterMm);
        Checks.finite("mateRootDiameterMm", mateRootDiameterMm);
        Checks.finite("tipClearanceMm", tipClearanceMm);
        Checks.finite("mateTipClearanceMm", mateTipClearanceMm);
    }
}
