package org.hobwright.wizard.setup;

import org.hobwright.api.job.GearSpec;
import org.hobwright.api.job.HobSpec;
import org.hobwright.wizard.geometry.ToothSystem;

/**
 * Lead angle and swivel angle of the hob.
 *
 * <pre>
 * d_m0 = d_a0 − 2 h_aP0           hob reference diameter when not given (h_aP0 = gear dedendum h_fP)
 * sin γ = z₀ m_n / d_m0           hob lead angle (hob computation page, DOMAIN S10)
 * η = β − γ                       swivel angle, β and γ signed, right hand positive
 * </pre>
 * The swivel rule: same hand |η| = |β| − γ, opposite hand |η| = |β| + γ, spur |η| = γ (standard
 * textbook rule, from memory; the signed form is derived from the thread direction).
 *
 * @param referenceDiameterMm hob reference diameter d_m0, mm
 * @param leadAngleDeg        hob lead angle γ (magnitude), degrees
 * @param swivelAngleDeg      η, signed, degrees
 */
public record HobSetup(double referenceDiameterMm, double leadAngleDeg, double swivelAngleDeg) {

    /**
     * Computes the setup for a gear and hob.
     *
     * @param gear   the gear
     * @param hob    the hob
     * @param system the gear's tooth system (gives the hob addendum)
     */
    public static HobSetup of(GearSpec gear, HobSpec hob, ToothSystem system) {
        double dm0 = hob.referenceDiameterMm().orElse(
                hob.outsideDiameterMm() - 2 * system.dedendumMm(hob.moduleMm()));
        double gamma = hob.leadAngleDeg().orElseGet(() -> leadAngleDeg(hob.starts(), hob.moduleMm(), dm0));
        double signedGamma = hob.hand().sign() * gamma;
        return new HobSetup(dm0, gamma, gear.signedHelixAngleDeg() - signedGamma);
    }

    /** Lead angle γ = asin(z₀ m_n / d_m0), degrees. */
    public static double leadAngleDeg(int starts, double moduleMm, double referenceDiameterMm) {
        return Math.toDegrees(Math.asin(Math.min(1.0, starts * moduleMm / referenceDiameterMm)));
    }
}
