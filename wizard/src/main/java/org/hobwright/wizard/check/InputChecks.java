package org.hobwright.wizard.check;

import java.util.ArrayList;
import java.util.List;
import org.hobwright.api.check.Finding;
import org.hobwright.api.job.GearSpec;
import org.hobwright.wizard.geometry.GearGeometry;

/**
 * Warnings about the gear's own numbers, inside the ranges the field table allows
 * ({@code org.hobwright.api.job.JobFields}; the reader and the api records refuse values outside
 * them): helix above 45°, face width below one module, profile shift outside −1 … +1.5, thickness
 * allowance beyond 0.25 m_n, and the error of an allowance that leaves no tooth. All common practice,
 * no source (ISO 1328-1:2013 also stops at 45° helix).
 */
public final class InputChecks {
    private InputChecks() {
    }

    /**
     * Checks the gear's numbers.
     *
     * @param gear  the gear
     * @param words number wording in the job's units
     * @return the findings; any error means the geometry must not be computed
     */
    public static List<Finding> gear(GearSpec gear, Wording words) {
        List<Finding> out = new ArrayList<>();
        double m = gear.moduleMm();
        if (gear.helixAngleDeg() > 45) {
            out.add(EngineeringCode.GEAR_HELIX_ANGLE_RANGE.at("gear.helixAngle", "helix angle "
                    + words.angle(gear.helixAngleDeg()) + " is above 45°, beyond the usual range for hobbing",
                    "check the drawing; helix angles of hobbed gears are usually 0° to 45°"));
        }
        if (gear.faceWidthMm() < m) {
            out.add(EngineeringCode.GEAR_FACE_WIDTH_SMALL.at("gear.faceWidth", "face width "
                    + words.length(gear.faceWidthMm()) + " is less than one module (" + words.length(m) + ")",
                    "check the face width and the job's units"));
        }
        double x = gear.profileShift();
        if (x < -1 || x > 1.5) {
            out.add(EngineeringCode.GEAR_PROFILE_SHIFT_RANGE.at("gear.profileShift", "profile shift "
                    + words.number(x) + " is outside the usual range −1 to +1.5",
                    "check the drawing; the shift is a coefficient of the module, not a length"));
        }
        thickness(gear, words, out);
        return out;
    }

    private static void thickness(GearSpec gear, Wording words, List<Finding> out) {
        double m = gear.moduleMm();
        double e = gear.thicknessAllowanceMm();
        double nominal = GearGeometry.normalThickness(m, Math.toRadians(gear.pressureAngleDeg()), gear.profileShift(), 0);
        if (nominal + e <= 0) {
            out.add(EngineeringCode.GEAR_TOOTH_TOO_THIN.at("gear.thicknessAllowance", "thickness allowance "
                    + words.length(e) + " leaves no tooth: the tooth thickness would be " + words.length(nominal + e),
                    "allowances are a small negative fraction of the module, e.g. " + words.length(-0.02 * m)));
        } else if (Math.abs(e) > 0.25 * m) {
            out.add(EngineeringCode.GEAR_THICKNESS_ALLOWANCE_RANGE.at("gear.thicknessAllowance",
                    "thickness allowance " + words.length(e) + " is more than 0.25 module ("
                            + words.length(0.25 * m) + ")",
                    "check the allowance: it is a length, usually a few hundredths of the module"));
        }
    }
}
