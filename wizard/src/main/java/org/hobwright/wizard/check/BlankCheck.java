package org.hobwright.wizard.check;

import java.util.List;
import org.hobwright.api.check.Finding;
import org.hobwright.wizard.geometry.InvoluteGear;

/**
 * The blank diameter against the tip diameter. Smaller than d_a: the teeth are topped (a warning; it
 * is how a tip is shortened); at or below the reference diameter: an error. Larger than d_a: stock to
 * turn off first (a warning); more stock than the hob tooth can reach (the hob tooth is h_aP0 + h_fP0
 * = 2 h_fP deep for a standard hob): an error. The tolerance is max(0.01 mm, 1e-4 d_a). Common
 * practice, no source.
 */
public final class BlankCheck {
    private BlankCheck() {
    }

    /**
     * Checks the blank.
     *
     * @param g       the gear
     * @param blankMm the blank diameter, mm
     */
    public static void check(InvoluteGear g, double blankMm, Wording words, List<Finding> out) {
        double da = g.tipDiameterMm();
        double tol = DrawingCheck.tolerance(da);
        String field = "gear.blankDiameter";
        String fixTip = "turn the blank to the tip diameter " + words.length(da);
        if (blankMm <= g.referenceDiameterMm()) {
            out.add(EngineeringCode.GEAR_BLANK_TOO_SMALL.at(field, "blank diameter " + words.length(blankMm)
                    + " is not above the reference diameter " + words.length(g.referenceDiameterMm())
                    + ": the teeth would have no addendum", fixTip));
        } else if (blankMm < da - tol) {
            out.add(EngineeringCode.GEAR_BLANK_BELOW_TIP.at(field, "blank diameter " + words.length(blankMm) + " is "
                    + words.length(da - blankMm) + " smaller than the tip diameter " + words.length(da)
                    + ": the teeth come out topped", "if the tip is not meant to be shortened, " + fixTip));
        } else if (blankMm > da + tol) {
            double reach = g.rootDiameterMm() + 4 * g.system().dedendumMm(g.normalModuleMm());
            if (blankMm > reach) {
                out.add(EngineeringCode.GEAR_BLANK_TOO_LARGE.at(field, "blank diameter " + words.length(blankMm)
                        + " is beyond the reach of the hob teeth (" + words.length(reach)
                        + "): the hob body would rub the blank", fixTip + " before hobbing"));
            } else {
                out.add(EngineeringCode.GEAR_BLANK_ABOVE_TIP.at(field, "blank diameter " + words.length(blankMm)
                        + " is " + words.length(blankMm - da) + " larger than the tip diameter " + words.length(da)
                        + ": the teeth would come out too tall", fixTip + " before hobbing"));
            }
        }
    }
}
