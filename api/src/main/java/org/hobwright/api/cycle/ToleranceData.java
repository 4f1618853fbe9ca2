package org.hobwright.api.cycle;

import org.hobwright.api.ApiStatus;
import org.hobwright.api.internal.Checks;

/**
 * Flank tolerances of ISO 1328-1:2013 for one flank tolerance class, micrometres, rounded by the
 * standard's rule (clause 5.2.3).
 *
 * @param flankToleranceClass class A, 1 to 11
 * @param singlePitchUm       f_pT
 * @param totalPitchUm        F_pT
 * @param profileSlopeUm      f_HαT
 * @param profileFormUm       f_fαT
 * @param profileTotalUm      F_αT
 * @param helixSlopeUm        f_HβT
 * @param helixFormUm         f_fβT
 * @param helixTotalUm        F_βT
 */
@ApiStatus(since = "1.0")
public record ToleranceData(
        int flankToleranceClass,
        double singlePitchUm,
        double totalPitchUm,
        double profileSlopeUm,
        double profileFormUm,
        double profileTotalUm,
        double helixSlopeUm,
        double helixFormUm,
        double helixTotalUm) {

    /**
     * Checks the components: a value out of range throws {@link IllegalArgumentException} naming the field and the
     * value.
     *
     * @param flankToleranceClass class A, 1 to 11
     * @param singlePitchUm f_pT
     * @param totalPitchUm F_pT
     * @param profileSlopeUm f_HαT
     * @param profileFormUm f_fαT
     * @param profileTotalUm F_αT
     * @param helixSlopeUm f_HβT
     * @param helixFormUm f_fβT
     * @param helixTotalUm F_βT
     */
    public ToleranceData {
        Checks.range("flankToleranceClass", flankToleranceClass, 1, 11);
        Checks.positive("singlePitchUm", singlePitchUm);
        Checks.positive("totalPitchUm", totalPitchUm);
        Checks.positive("profileSlopeUm", profileSlopeUm);
        Checks.positive("profileFormUm", profileFormUm);
        Checks.positive("profileTotalUm", profileTotalUm);
        Checks.positive("helixSlopeUm", helixSlopeUm);
        Checks.positive("helixFormUm", helixFormUm);
        Checks.positive("helixTotalUm", helixTotalUm);
    }
}
