package org.hobwright.wizard.spline;

import java.util.List;
import org.hobwright.api.check.Finding;
import org.hobwright.wizard.check.Wording;
import org.hobwright.api.cycle.Point;
import org.hobwright.wizard.simulate.GeneratingSetup;
import org.hobwright.wizard.simulate.GeneratingSimulation;
import org.hobwright.wizard.simulate.ToothSpaceSimulation;

/**
 * The form check of a hobbed spline by the generating simulation: the hob's rack, with its addendum and
 * tip radius, generates the tooth space ({@link GeneratingSimulation}); the check reads where the true
 * involute begins and how deep the root is cut.
 *
 * <p>The hob is placed to cut a tooth thickness S by the shift x = (S − π m/2)/(2 m tan α_D). The form
 * diameter is checked at S_max (the shallowest setting: the involute begins highest), the minor diameter
 * at S_min (the deepest setting) against D_ie min and at S_max against D_ie max.
 *
 * @param formReached             true when the involute reaches down to D_Fe max at S_max
 * @param involuteStartDiameterMm where the involute begins at S_max, mm
 * @param rootDiameterMm          root diameter cut at the middle of the tooth-thickness tolerance, mm
 * @param rootDiameterMinMm       root diameter cut at S_min, mm
 * @param rootDiameterMaxMm       root diameter cut at S_max, mm
 * @param atMiddle                the simulation at the middle of the tolerance (for drawing)
 */
public record FormCheck(boolean formReached, double involuteStartDiameterMm, double rootDiameterMm,
                        double rootDiameterMinMm, double rootDiameterMaxMm, ToothSpaceSimulation atMiddle) {

    /** The generating setup that cuts tooth thickness S with the hob, cuts phased on the space centre. */
    static GeneratingSetup setup(SplineLimits limits, SplineHob hob, double thicknessMm, double resolutionMm) {
        SplineDrawing s = limits.spec();
        return new GeneratingSetup(s.teeth(), s.moduleMm(), s.pressureAngleRad(), 0, limits.shiftFor(thicknessMm),
                hob.addendumMm(), hob.tipRadiusMm(), limits.majorDiameterMaxMm(), hob.starts(), hob.gashes(), 0,
                resolutionMm);
    }

    /**
     * Runs the check. The hob must have passed {@link SplineHobCheck} (same pitch and angle, a tip flat).
     *
     * @param limits       the spline
     * @param hob          the hob
     * @param resolutionMm spacing of the simulated profile points, mm
     * @param words        numbers in the job's units for the messages
     * @param findings     receives the findings
     */
    public static FormCheck run(SplineLimits limits, SplineHob hob, double resolutionMm, Wording words,
                                List<Finding> findings) {
        ToothSpaceSimulation high = GeneratingSimulation.run(setup(limits, hob, limits.toothThicknessMaxMm(), resolutionMm));
        ToothSpaceSimulation low = GeneratingSimulation.run(setup(limits, hob, limits.toothThicknessMinMm(), resolutionMm));
        ToothSpaceSimulation middle = GeneratingSimulation.run(setup(limits, hob,
                (limits.toothThicknessMaxMm() + limits.toothThicknessMinMm()) / 2, resolutionMm));
        double start = high.activeInvoluteStartDiameterMm();
        boolean reached = start <= limits.formDiameterMm() + 1e-6;
        FormCheck check = new FormCheck(reached, start, rootDiameter(middle), rootDiameter(low), rootDiameter(high),
                middle);
        String field = "hob.addendum";
        if (!reached) {
            findings.add(SplineCode.SPLINE_FORM_NOT_REACHED.at("hob.tipRadius", "the involute begins at "
                    + words.length(start) + ", above the form diameter D_Fe " + words.length(limits.formDiameterMm())
                    + ": the fillet of the"
                    + " hob tip reaches too high", "use a hob with a smaller tip radius or a longer straight flank"));
        }
        if (check.rootDiameterMinMm < limits.minorDiameterMinMm() - 1e-6) {
            findings.add(SplineCode.SPLINE_ROOT_BELOW_MINOR.at(field, "at the smallest tooth thickness the hob cuts"
                    + " the root to " + words.length(check.rootDiameterMinMm) + ", below D_ie min "
                    + words.length(limits.minorDiameterMinMm()), "use a hob with a shorter addendum (the standard's is "
                    + words.length(limits.standardHobAddendumMm()) + ")"));
        }
        if (check.rootDiameterMaxMm > limits.minorDiameterMaxMm() + 1e-6) {
            findings.add(SplineCode.SPLINE_ROOT_ABOVE_MINOR.at(field, "at the largest tooth thickness the hob"
                    + " leaves the root at " + words.length(check.rootDiameterMaxMm) + ", above D_ie max "
                    + words.length(limits.minorDiameterMaxMm()), "use a hob with a longer addendum (the standard's is "
                    + words.length(limits.standardHobAddendumMm()) + ")"));
        }
        return check;
    }

    /** The smallest diameter of the simulated outline, mm. */
    private static double rootDiameter(ToothSpaceSimulation sim) {
        double r = Double.POSITIVE_INFINITY;
        for (Point p : sim.simulatedProfile()) {
            r = Math.min(r, Math.hypot(p.x(), p.y()));
        }
        return 2 * r;
    }
}
