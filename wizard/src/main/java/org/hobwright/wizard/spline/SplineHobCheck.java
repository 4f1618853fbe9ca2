package org.hobwright.wizard.spline;

import java.util.List;
import org.hobwright.api.check.Finding;
import org.hobwright.wizard.check.Wording;

/** Whether a spline hob fits the spline: pitch, pressure angle, root form and tip radius. */
public final class SplineHobCheck {
    private SplineHobCheck() {
    }

    /**
     * Checks the hob against the spline.
     *
     * @param limits   the spline
     * @param hob      the hob
     * @param words    numbers in the job's units for the messages
     * @param findings receives the findings
     * @return true when nothing stops the hob from generating the spline (no error)
     */
    public static boolean check(SplineLimits limits, SplineHob hob, Wording words, List<Finding> findings) {
        SplineDrawing s = limits.spec();
        int before = findings.size();
        boolean inch = s.standard() == SplineStandard.ANSI_B92_1;
        if (Math.abs(hob.moduleMm() - s.moduleMm()) > 1e-9 * s.moduleMm()) {
            findings.add(SplineCode.SPLINE_HOB_PITCH.at(inch ? "hob.diametralPitch" : "hob.module", inch
                    ? "the hob's diametral pitch " + words.number(25.4 / hob.moduleMm()) + " differs from the spline's "
                    + words.number(s.diametralPitch())
                    : "the hob's module " + words.number(hob.moduleMm()) + " mm differs from the spline's "
                    + words.number(s.moduleMm()) + " mm",
                    "use a hob of the spline's pitch"));
        }
        if (Math.abs(hob.pressureAngleDeg() - s.pressureAngleDeg()) > 1e-9) {
            findings.add(SplineCode.SPLINE_HOB_PRESSURE_ANGLE.at("hob.pressureAngle", "the hob's pressure angle "
                    + hob.pressureAngleDeg() + "° differs from the spline's " + s.pressureAngleDeg() + "°",
                    "use a " + s.pressureAngleDeg() + "° spline hob"));
        }
        if (hob.root() != s.root()) {
            findings.add(SplineCode.SPLINE_HOB_ROOT_FORM.at("hob.root", "a " + hob.root().id() + "-root hob cuts a "
                    + hob.root().id() + " root; the spline has a " + s.root().id() + " root",
                    "use a " + s.root().id() + "-root hob"));
        }
        if (hob.tipRadiusMm() < limits.minimumRootRadiusMm() - 1e-9) {
            findings.add(SplineCode.SPLINE_HOB_TIP_RADIUS_SMALL.at("hob.tipRadius", "the hob's tip radius "
                    + words.length(hob.tipRadiusMm()) + " is below the " + s.standard().title() + " root radius of at least "
                    + words.length(limits.minimumRootRadiusMm()), "use a hob with a larger tip radius"));
        }
        if (!FormCheck.setup(limits, hob, limits.toothThicknessMaxMm(), 0.01).hobHasTipFlat()) {
            findings.add(SplineCode.SPLINE_HOB_TIP_RADIUS_LARGE.at("hob.tipRadius", "a tip radius of "
                    + words.length(hob.tipRadiusMm()) + " leaves no tip flat on a hob tooth of addendum "
                    + words.length(hob.addendumMm()),
                    "check the hob's tip radius and addendum"));
        }
        return !Finding.anyError(findings.subList(before, findings.size()));
    }
}
