package org.hobwright.api.job;

import java.util.Objects;
import java.util.OptionalDouble;
import org.hobwright.api.ApiStatus;
import org.hobwright.api.internal.Checks;

/**
 * Limits the planner checks the predicted finish against. Empty values take defaults from the
 * gear's flank tolerance class or the cutting-data table.
 *
 * @param feedMarkDepthUm    largest feed-mark depth on the flank, micrometres
 * @param envelopingDepthUm  largest enveloping-cut (generating flat) depth, micrometres
 * @param maxChipThicknessMm largest undeformed chip thickness, mm
 */
@ApiStatus(since = "1.0")
public record QualityTargets(
        OptionalDouble feedMarkDepthUm,
        OptionalDouble envelopingDepthUm,
        OptionalDouble maxChipThicknessMm) {

    /** No explicit targets. */
    public static final QualityTargets DEFAULTS =
            new QualityTargets(OptionalDouble.empty(), OptionalDouble.empty(), OptionalDouble.empty());

    /**
     * Checks the components: a value out of range throws {@link IllegalArgumentException} naming the field and the
     * value.
     *
     * @param feedMarkDepthUm the value
     * @param envelopingDepthUm the value
     * @param maxChipThicknessMm the value
     */
    public QualityTargets {
        Objects.requireNonNull(feedMarkDepthUm, "feedMarkDepthUm");
        Objects.requireNonNull(envelopingDepthUm, "envelopingDepthUm");
        Objects.requireNonNull(maxChipThicknessMm, "maxChipThicknessMm");
        Checks.field(JobFields.TARGET_FEED_MARK_DEPTH, feedMarkDepthUm);
        Checks.field(JobFields.TARGET_ENVELOPING_DEPTH, envelopingDepthUm);
        Checks.field(JobFields.TARGET_MAX_CHIP_THICKNESS, maxChipThicknessMm);
    }
}
