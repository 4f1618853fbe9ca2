package org.hobwright.wizard.plan;

import org.hobwright.api.job.GearSpec;
import org.hobwright.api.job.HobSpec;

/**
 * The gear and hob numbers the finish and chip formulas of {@link FinishFormulas} need, bound
 * together for one job.
 *
 * @param moduleMm             m_n, mm
 * @param teeth                z₂
 * @param starts               z₀
 * @param gashes               hob gashes
 * @param pressureAngleDeg     α_n, degrees
 * @param helixAngleDeg        β (magnitude), degrees
 * @param profileShift         x
 * @param hobOutsideDiameterMm d_a0, mm
 */
public record CutModel(double moduleMm, int teeth, int starts, int gashes, double pressureAngleDeg,
                       double helixAngleDeg, double profileShift, double hobOutsideDiameterMm) {

    /** The model of a gear cut by a hob. */
    public static CutModel of(GearSpec gear, HobSpec hob) {
        return new CutModel(gear.moduleMm(), gear.teeth(), hob.starts(), hob.gashes(), gear.pressureAngleDeg(),
                gear.helixAngleDeg(), gear.profileShift(), hob.outsideDiameterMm());
    }

    /** Hoffmeister chip thickness of a pass cutting {@code depthMm} at {@code feedMm}, mm. */
    public double chipMm(double feedMm, double depthMm) {
        return FinishFormulas.hoffmeisterMm(moduleMm, teeth, helixAngleDeg, profileShift, hobOutsideDiameterMm / 2,
                (double) gashes / starts, feedMm, depthMm);
    }

    /** Largest feed of a pass cutting {@code depthMm} within a chip-thickness limit, mm. */
    public double feedForChip(double limitMm, double depthMm) {
        return FinishFormulas.feedForChipThickness(limitMm, moduleMm, teeth, helixAngleDeg, profileShift,
                hobOutsideDiameterMm / 2, (double) gashes / starts, depthMm);
    }

    /** Flank feed-mark depth at a feed, µm. */
    public double feedMarkFlankUm(double feedMm) {
        return FinishFormulas.feedMarkFlankUm(feedMm, hobOutsideDiameterMm, pressureAngleDeg, helixAngleDeg);
    }

    /** Root feed-mark depth at a feed, µm. */
    public double feedMarkRootUm(double feedMm) {
        return FinishFormulas.feedMarkRootUm(feedMm, hobOutsideDiameterMm, helixAngleDeg);
    }

    /** Largest feed within a flank feed-mark limit, mm. */
    public double feedForFeedMark(double limitUm) {
        return FinishFormulas.feedForFlankMark(limitUm, hobOutsideDiameterMm, pressureAngleDeg, helixAngleDeg);
    }

    /** Enveloping-cut depth of the hob on this gear, µm. */
    public double envelopingUm() {
        return FinishFormulas.envelopingDepthUm(moduleMm, teeth, starts, gashes, pressureAngleDeg, helixAngleDeg);
    }

    /** Largest chip thickness over the passes of a plan, mm. */
    public double maxChipMm(PlanSettings s) {
        double max = 0;
        for (int i = 0; i < s.passes().count(); i++) {
            max = Math.max(max, chipMm(s.feed(i), s.passes().increment(i)));
        }
        return max;
    }
}
