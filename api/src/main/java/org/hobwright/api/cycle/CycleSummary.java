package org.hobwright.api.cycle;

import java.util.List;
import java.util.Optional;
import org.hobwright.api.ApiStatus;
import org.hobwright.api.internal.Checks;
import org.hobwright.api.job.QualityTargets;

/**
 * Time and predicted quality of the planned cycle.
 *
 * @param cycleTimeS            total cycle time, s (the sum of the steps' seconds)
 * @param passes                the axial passes in order
 * @param finishFeedMmPerRev    axial feed of the finishing (last) pass, mm per work revolution
 * @param approachLengthMm      approach length of the last pass, mm
 * @param overrunLengthMm       overrun length of the last pass, mm
 * @param feedMarkFlankUm       predicted feed-mark depth on the flank, µm
 * @param feedMarkRootUm        predicted feed-mark depth in the root, µm
 * @param envelopingDepthUm     predicted enveloping-cut (generating flat) depth, µm
 * @param maxChipThicknessMm    predicted maximum chip thickness of the heaviest pass, mm
 * @param fastest               the optimiser's proposal, when asked for
 * @param targets               the quality limits the prediction was checked against, as resolved by
 *                              the planner (the job's own, or defaults from the tolerance class or the
 *                              cutting-data table); empty where no limit applies
 */
@ApiStatus(since = "1.0")
public record CycleSummary(
        double cycleTimeS,
        List<PassSummary> passes,
        double finishFeedMmPerRev,
        double approachLengthMm,
        double overrunLengthMm,
        double feedMarkFlankUm,
        double feedMarkRootUm,
        double envelopingDepthUm,
        double maxChipThicknessMm,
        Optional<FastestProposal> fastest,
        QualityTargets targets) {

    /**
     * Checks the components: a value out of range throws {@link IllegalArgumentException} naming the field and the
     * value.
     *
     * @param cycleTimeS total cycle time, s (the sum of the steps' seconds)
     * @param passes the axial passes in order
     * @param finishFeedMmPerRev axial feed of the finishing (last) pass, mm per work revolution
     * @param approachLengthMm approach length of the last pass, mm
     * @param overrunLengthMm overrun length of the last pass, mm
     * @param feedMarkFlankUm predicted feed-mark depth on the flank, µm
     * @param feedMarkRootUm predicted feed-mark depth in the root, µm
     * @param envelopingDepthUm predicted enveloping-cut (generating flat) depth, µm
     * @param maxChipThicknessMm predicted maximum chip thickness of the heaviest pass, mm
     * @param fastest the optimiser's proposal, when asked for
     * @param targets the quality limits the prediction was checked against, as resolved by the planner (the job's
     *     own, or defaults from the tolerance class or the cutting-data table); empty where no limit applies
     */
    public CycleSummary {
        Checks.nonNegative("cycleTimeS", cycleTimeS);
        passes = List.copyOf(Checks.present("passes", passes));
        Checks.positive("finishFeedMmPerRev", finishFeedMmPerRev);
        Checks.nonNegative("approachLengthMm", approachLengthMm);
        Checks.nonNegative("overrunLengthMm", overrunLengthMm);
        Checks.nonNegative("feedMarkFlankUm", feedMarkFlankUm);
        Checks.nonNegative("feedMarkRootUm", feedMarkRootUm);
        Checks.nonNegative("envelopingDepthUm", envelopingDepthUm);
        Checks.nonNegative("maxChipThicknessMm", maxChipThicknessMm);
        Checks.present("fastest", fastest);
        Checks.present("targets", targets);
    }

    /**
     * A summary without resolved targets (a planner that does not resolve them).
     *
     * @param cycleTimeS total cycle time, s (the sum of the steps' seconds)
     * @param passes the axial passes in order
     * @param finishFeedMmPerRev axial feed of the finishing (last) pass, mm per work revolution
     * @param approachLengthMm approach length of the last pass, mm
     * @param overrunLengthMm overrun length of the last pass, mm
     * @param feedMarkFlankUm predicted feed-mark depth on the flank, µm
     * @param feedMarkRootUm predicted feed-mark depth in the root, µm
     * @param envelopingDepthUm predicted enveloping-cut (generating flat) depth, µm
     * @param maxChipThicknessMm predicted maximum chip thickness of the heaviest pass, mm
     * @param fastest the optimiser's proposal, when asked for
     */
    public CycleSummary(double cycleTimeS, List<PassSummary> passes, double finishFeedMmPerRev,
                        double approachLengthMm, double overrunLengthMm, double feedMarkFlankUm,
                        double feedMarkRootUm, double envelopingDepthUm, double maxChipThicknessMm,
                        Optional<FastestProposal> fastest) {
        this(cycleTimeS, passes, finishFeedMmPerRev, approachLengthMm, overrunLengthMm, feedMarkFlankUm,
                feedMarkRootUm, envelopingDepthUm, maxChipThicknessMm, fastest, QualityTargets.DEFAULTS);
    }
}
