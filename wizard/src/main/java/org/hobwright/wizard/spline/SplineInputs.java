package org.hobwright.wizard.spline;

import java.util.List;
import org.hobwright.api.check.Finding;

/** The checks of a spline's drawing data against what its standard defines, before any limit is computed. */
final class SplineInputs {
    private SplineInputs() {
    }

    static void check(SplineDrawing s, List<Finding> findings) {
        SplineStandard std = s.standard();
        double a = s.pressureAngleDeg();
        boolean din = std == SplineStandard.DIN_5480;
        boolean angleOk = din ? a == 30 : a == 30 || a == 37.5 || a == 45;
        if (!angleOk) {
            findings.add(SplineCode.SPLINE_PRESSURE_ANGLE.at("spline.pressureAngle", std.title()
                    + " defines no " + a + "° spline", din ? "DIN 5480 splines are 30°" : "use 30, 37.5 or 45"));
        }
        if (s.root() == SplineRoot.FLAT && a != 30) {
            findings.add(SplineCode.SPLINE_ROOT_FORM.at("spline.root", "a flat root at " + a + "° is not in "
                    + std.title(), "use \"root\": \"fillet\""));
        }
        if (s.teeth() < 6 || s.teeth() > 100) {
            findings.add(SplineCode.SPLINE_TEETH_RANGE.at("spline.teeth", s.teeth() + " teeth is outside 6 … 100",
                    "check the number of teeth"));
        }
        boolean valuesGiven = s.allowanceMm().isPresent() && s.totalToleranceMm().isPresent()
                && s.effectiveVariationMm().isPresent();
        if (din) {
            if (!valuesGiven) {
                findings.add(SplineCode.SPLINE_TOLERANCE_VALUES.at("spline.allowance", "a DIN 5480 spline needs the"
                        + " drawing's deviation A_s and tolerances T_G and T_eff", "give spline.allowance (A_s = s_v max"
                        + " − s), spline.totalTolerance (T_G = s_v max − s_min) and spline.effectiveVariation"
                        + " (T_eff = s_v max − s_max) from the drawing's data table"));
            }
            return;
        }
        if (s.toleranceClass() < 4 || s.toleranceClass() > 7) {
            findings.add(SplineCode.SPLINE_TOLERANCE_CLASS.at("spline.toleranceClass", std.title()
                    + " has tolerance classes 4 to 7, not " + s.toleranceClass(), "use the class on the drawing, 4 to 7"));
        }
        if (s.allowanceMm().isEmpty()) {
            List<String> classes = std == SplineStandard.ISO_4156 ? IsoFits.FIT_CLASSES : List.of("h");
            String fits = String.join(", ", classes);
            if (!classes.contains(s.fitClass())) {
                findings.add(SplineCode.SPLINE_FIT_CLASS.at("spline.fitClass", "fit class \"" + s.fitClass()
                        + "\" is not one of " + fits, "use one of " + fits + ", or give the allowance es in"
                        + " spline.allowance"));
            }
        }
    }
}
