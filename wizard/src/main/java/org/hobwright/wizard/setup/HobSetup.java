package org.hobwright.wizard.setup;

import org.hobwright.api.job.GearSpec;
import org.hobwright.api.job.HobSpec;
import org.hobwright.wizard.geometry.ToothSystem;

/**
 * Lead angle and swivel angle of the hob.
 *
 * <pre>
 * d_m0 = d_a0 − 2 h_aP0           hob reference diameter when not given (h_aP0 = gear dedendum h_fP)
 * sin γ = z₀ m_n / d_m0           hob lead angle of the thread helix (derived, FORMULAS.md §4.1)
 * η = β − γ                       swivel angle, β and γ signed, right hand positive
 * </pre>
 * The swivel rule: same hand |η| = |β| − γ, opposite hand |η| = |β| + γ, spur |η| = γ (standard
 * textbook rule, from memory; the signed form is derived from the thread direction: the hob thread at
 * the contact point must lie along the gear's tooth trace).
 *
 * @param referenceDiameterMm hob reference diameter d_m0, mm
 * @param leadAngleDeg        hob lead angle γ (magnitude), degrees
 * @param swivelAngleDeg      η, signed, degrees
 */
public record HobSetup(double referenceDiameterMm, double leadAngleDeg, double swivelAngleDeg) {

    /**
     * Computes the setup for a gear and hob. A lead angle marked on the hob wins over the computed one.
     *
     * @param gear   the gear
     * @param hob    the hob
     * @param system the gear's tooth system (gives the hob addendum)
     */
    public static HobSetup of(GearSpec gear, HobSpec hob, ToothSystem system) {
        double dm0 = referenceDiameterMm(hob, system);
        double gamma = hob.leadAngleDeg().orElseGet(() -> leadAngleDeg(hob.starts(), hob.moduleMm(), dm0));
        return new HobSetup(dm0, gamma, swivelAngleDeg(gear.signedHelixAngleDeg(), hob.hand().sign() * gamma));
    }

    /**
     * The hob reference diameter: as given, else d_m0 = d_a0 − 2 h_aP0 with the standard hob addendum
     * h_aP0 = h_fP of the tooth system (for agma-fine including the 0.002 in), mm.
     */
    public static double referenceDiameterMm(HobSpec hob, ToothSystem system) {
        return hob.referenceDiameterMm().orElse(hob.outsideDiameterMm() - 2 * system.dedendumMm(hob.moduleMm()));
    }

    /** Lead angle γ = asin(z₀ m_n / d_m0), degrees (90° when z₀ m_n ≥ d_m0: the checks report it). */
    public static double leadAngleDeg(int starts, double moduleMm, double referenceDiameterMm) {
        return Math.toDegrees(Math.asin(Math.min(1.0, starts * moduleMm / referenceDiameterMm)));
    }

    /**
     * Signed swivel angle η = β − γ, degrees, with β the gear's and γ the hob's signed angle (right
     * hand positive). Same hand: |η| = |β| − γ; opposite hands: |η| = |β| + γ; spur: η = −γ.
     */
    public static double swivelAngleDeg(double signedHelixDeg, double signedLeadDeg) {
        return signedHelixDeg - signedLeadDeg;
    }

    /** The lead angle as degrees-minutes-seconds, e.g. {@code 1° 45′ 47.6″}. */
    public String leadAngleDms() {
        return Angles.dms(leadAngleDeg);
    }

    /** The swivel angle as degrees-minutes-seconds, e.g. {@code 13° 14′ 12.4″}. */
    public String swivelAngleDms() {
        return Angles.dms(swivelAngleDeg);
    }
}
