package org.hobwright.wizard.check;

import java.util.List;
import org.hobwright.api.check.Finding;
import org.hobwright.api.job.GearSpec;
import org.hobwright.api.job.HobSpec;
import org.hobwright.wizard.geometry.ToothSystem;
import org.hobwright.wizard.setup.HobSetup;

/**
 * Does the hob fit the gear? Normal pitch and pressure angle must be equal (the generating
 * condition); the reference diameter must give a lead angle; a marked lead angle should agree with
 * asin(z₀ m_n / d_m0) within max(0.05°, 5 % of γ) (common practice, no source).
 */
public final class HobChecks {
    private HobChecks() {
    }

    /**
     * Checks the hob against the gear; returns false when the hob cannot cut this gear at all (an
     * error was added), so no setup may be computed.
     */
    public static boolean matches(GearSpec gear, HobSpec hob, Wording words, List<Finding> out) {
        boolean ok = true;
        if (Math.abs(hob.moduleMm() - gear.moduleMm()) > 1e-6 * gear.moduleMm()) {
            out.add(EngineeringCode.HOB_MODULE_MISMATCH.at(Wording.pitchField("hob", hob.pitch()), "hob "
                    + words.pitch(hob.pitch()) + " does not match the gear's " + words.pitch(gear.pitch()),
                    "use a hob of the gear's " + words.pitch(gear.pitch())));
            ok = false;
        }
        if (Math.abs(hob.pressureAngleDeg() - gear.pressureAngleDeg()) > 0.01) {
            out.add(EngineeringCode.HOB_PRESSURE_ANGLE_MISMATCH.at("hob.pressureAngle", "hob pressure angle "
                    + words.angle(hob.pressureAngleDeg()) + " does not match the gear's "
                    + words.angle(gear.pressureAngleDeg()), "use a hob of " + words.angle(gear.pressureAngleDeg())));
            ok = false;
        }
        return ok;
    }

    /** The hob's reference diameter and marked lead angle; returns false when no lead angle can be had. */
    public static boolean leadAngle(HobSpec hob, ToothSystem system, Wording words, List<Finding> out) {
        double dm0 = HobSetup.referenceDiameterMm(hob, system);
        double lowest = hob.starts() * hob.moduleMm();
        boolean given = hob.referenceDiameterMm().isPresent();
        if (dm0 <= lowest || dm0 >= hob.outsideDiameterMm()) {
            String field = given ? "hob.referenceDiameter" : "hob.outsideDiameter";
            out.add(EngineeringCode.HOB_REFERENCE_DIAMETER_INVALID.at(field, "hob reference diameter "
                    + words.length(dm0) + (given ? "" : " (outside diameter less twice the hob addendum)")
                    + " must lie between z₀ m_n = " + words.length(lowest) + " and the outside diameter "
                    + words.length(hob.outsideDiameterMm()), "check the hob's outside and reference diameters"));
            return false;
        }
        if (given && hob.leadAngleDeg().isPresent()) {
            double computed = HobSetup.leadAngleDeg(hob.starts(), hob.moduleMm(), dm0);
            double marked = hob.leadAngleDeg().getAsDouble();
            if (Math.abs(marked - computed) > Math.max(0.05, 0.05 * computed)) {
                out.add(EngineeringCode.HOB_LEAD_ANGLE_MISMATCH.at("hob.leadAngle", "lead angle as marked "
                        + words.angle(marked) + " disagrees with asin(z₀ m_n / d_m0) = " + words.angle(computed)
                        + " for reference diameter " + words.length(dm0),
                        "check the hob's marking and its reference diameter; the marked angle is used"));
            }
        }
        return true;
    }

    /** Remarks on the hob's hand and starts. */
    public static void remarks(GearSpec gear, HobSpec hob, Wording words, List<Finding> out) {
        if (!gear.isSpur() && gear.hand() != hob.hand()) {
            out.add(EngineeringCode.HOB_OPPOSITE_HAND.at("hob.hand", "a " + hob.hand().word() + "-hand hob on a "
                    + gear.hand().word() + "-hand gear swivels by |β| + γ instead of |β| − γ",
                    "a " + gear.hand().word() + "-hand hob needs less swivel and usually cuts better"));
        }
        int common = gcd(gear.teeth(), hob.starts());
        if (common > 1) {
            out.add(EngineeringCode.HOB_STARTS_COMMON_FACTOR.at("hob.starts", gear.teeth() + " teeth and "
                    + hob.starts() + " starts share the factor " + common
                    + ": each start cuts the same gaps, so thread spacing errors repeat on the gear",
                    "where accuracy matters, choose a start count without a common factor with the teeth"));
        }
    }

    private static int gcd(int a, int b) {
        return b == 0 ? a : gcd(b, a % b);
    }
}
