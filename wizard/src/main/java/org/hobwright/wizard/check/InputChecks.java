package org.hobwright.wizard.check;

import java.util.ArrayList;
import java.util.List;
import org.hobwright.api.check.Finding;
import org.hobwright.api.job.GearSpec;
import org.hobwright.api.job.Pitch;
import org.hobwright.wizard.geometry.GearGeometry;

/**
 * Plausibility ranges of the gear's own numbers (the api records already refuse impossible ones such
 * as a module of 0 or a pressure angle of 89°). Error ranges: teeth 5 … 2000, module 0.05 … 100 mm
 * (diametral pitch 0.254 … 508 /in), pressure angle 10° … 45°. Warnings: helix above 45°, face width
 * below one module, profile shift outside −1 … +1.5, thickness allowance beyond 0.25 m_n. All
 * common practice, no source (ISO 1328-1:2013 also starts at 5 teeth and stops at 45° helix).
 */
public final class InputChecks {
    /** Fewest teeth Hobwright accepts. */
    public static final int MIN_TEETH = 5;
    /** Most teeth Hobwright accepts. */
    public static final int MAX_TEETH = 2000;
    /** Smallest module, mm. */
    public static final double MIN_MODULE_MM = 0.05;
    /** Largest module, mm. */
    public static final double MAX_MODULE_MM = 100;
    /** Smallest pressure angle, degrees. */
    public static final double MIN_PRESSURE_ANGLE_DEG = 10;
    /** Largest pressure angle, degrees. */
    public static final double MAX_PRESSURE_ANGLE_DEG = 45;

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
        if (gear.teeth() < MIN_TEETH || gear.teeth() > MAX_TEETH) {
            out.add(EngineeringCode.GEAR_TEETH_RANGE.at("gear.teeth", "number of teeth " + gear.teeth()
                    + " is outside the allowed range " + MIN_TEETH + " to " + MAX_TEETH,
                    "enter the tooth count from the drawing (" + MIN_TEETH + " to " + MAX_TEETH + ")"));
        }
        double m = gear.moduleMm();
        if (m < MIN_MODULE_MM || m > MAX_MODULE_MM) {
            String field = Wording.pitchField("gear", gear.pitch());
            String range = gear.pitch() instanceof Pitch.Diametral
                    ? "diametral pitch " + Wording.plain(25.4 / MAX_MODULE_MM, 4) + " to "
                            + Wording.plain(25.4 / MIN_MODULE_MM, 4) + " /in"
                    : "module " + Wording.plain(MIN_MODULE_MM, 4) + " to " + Wording.plain(MAX_MODULE_MM, 4) + " mm";
            out.add(EngineeringCode.GEAR_MODULE_RANGE.at(field, words.pitch(gear.pitch())
                    + " is outside the allowed range " + range, "enter the pitch from the drawing (" + range + ")"));
        }
        double a = gear.pressureAngleDeg();
        if (a < MIN_PRESSURE_ANGLE_DEG || a > MAX_PRESSURE_ANGLE_DEG) {
            out.add(EngineeringCode.GEAR_PRESSURE_ANGLE_RANGE.at("gear.pressureAngle", "pressure angle "
                    + words.angle(a) + " is outside the allowed range " + words.angle(MIN_PRESSURE_ANGLE_DEG) + " to "
                    + words.angle(MAX_PRESSURE_ANGLE_DEG), "use the drawing's pressure angle, usually 20° or 14.5°"));
        }
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
