package org.hobwright.api.cycle;

import org.hobwright.api.Validate;

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

    public ToleranceData {
        Validate.range("flankToleranceClass", flankToleranceClass, 1, 11);
        Validate.positive("singlePitchUm", singlePitchUm);
        Validate.positive("totalPitchUm", totalPitchUm);
        Validate.positive("profileSlopeUm", profileSlopeUm);
        Validate.positive("profileFormUm", profileFormUm);
        Validate.positive("profileTotalUm", profileTotalUm);
        Validate.positive("helixSlopeUm", helixSlopeUm);
        Validate.positive("helixFormUm", helixFormUm);
        Validate.positive("helixTotalUm", helixTotalUm);
    }
}
