package org.hobwright.wizard.plan;

import java.util.List;
import org.hobwright.api.check.Finding;
import org.hobwright.text.Decimal;

/**
 * The predicted finish and chip load of a plan (formulas in {@link FinishFormulas}), and the
 * findings where they exceed the targets.
 *
 * @param feedMarkFlankUm flank feed mark of the finishing pass, µm
 * @param feedMarkRootUm  root feed mark of the finishing pass, µm
 * @param envelopingUm    enveloping-cut depth, µm
 * @param maxChipMm       largest Hoffmeister chip thickness over the passes, mm
 */
public record Prediction(double feedMarkFlankUm, double feedMarkRootUm, double envelopingUm, double maxChipMm) {

    /** Predicts a plan. */
    public static Prediction of(CutModel model, PlanSettings s) {
        double f = s.finishFeedMmPerRev();
        return new Prediction(model.feedMarkFlankUm(f), model.feedMarkRootUm(f), model.envelopingUm(),
                model.maxChipMm(s));
    }

    /** Adds a finding for every target this prediction exceeds. */
    public void check(QualityLimits t, CutModel model, List<Finding> findings) {
        if (feedMarkFlankUm > t.feedMarkUm() * (1 + 1e-9)) {
            findings.add(PlanCode.PLAN_FEED_MARK_OVER_TARGET.at("cycle.finishFeed", "predicted flank feed marks "
                    + Decimal.fixed(feedMarkFlankUm, 2) + " µm exceed the " + Decimal.fixed(t.feedMarkUm(), 2)
                    + " µm target (" + t.feedMarkSource() + ")", "finish at "
                    + Decimal.fixed(model.feedForFeedMark(t.feedMarkUm()), 3, true, Decimal.Rounding.FLOOR)
                    + " mm per work revolution or less"));
        }
        if (envelopingUm > t.envelopingUm() * (1 + 1e-9)) {
            findings.add(PlanCode.PLAN_ENVELOPING_OVER_TARGET.at("hob.gashes", "predicted enveloping flats "
                    + Decimal.fixed(envelopingUm, 2) + " µm exceed the " + Decimal.fixed(t.envelopingUm(), 2)
                    + " µm target (" + t.envelopingSource() + ")",
                    "use a hob with more gashes or fewer starts"));
        }
        if (t.hasChipLimit() && maxChipMm > t.chipMm() * (1 + 1e-9)) {
            findings.add(PlanCode.PLAN_CHIP_OVER_LIMIT.at("cycle.roughFeed", "predicted chip thickness "
                    + Decimal.fixed(maxChipMm, 4) + " mm exceeds the " + Decimal.fixed(t.chipMm(), 4) + " mm limit ("
                    + t.chipSource() + ")", "lower the feed or take more passes (cycle.roughDepth)"));
        } else if (!t.hasChipLimit()) {
            findings.add(PlanCode.PLAN_CHIP_LIMIT_UNKNOWN.at("cycle.targets.maxChipThickness",
                    "no chip-thickness limit is known for this material and hob, so chip load is not checked", null));
        }
    }
}
