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

    public QualityTargets {
        Objects.requireNonNull(feedMarkDepthUm, "feedMarkDepthUm");
        Objects.requireNonNull(envelopingDepthUm, "envelopingDepthUm");
        Objects.requireNonNull(maxChipThicknessMm, "maxChipThicknessMm");
        Checks.positive("targets.feedMarkDepth", feedMarkDepthUm);
        Checks.positive("targets.envelopingDepth", envelopingDepthUm);
        Checks.positive("targets.maxChipThickness", maxChipThicknessMm);
    }

    /**
     * This quality targets with another {@code feedMarkDepthUm}.
     *
     * @param feedMarkDepthUm largest feed-mark depth on the flank, micrometres
     * @return the copy, checked like any new one
     */
    @ApiStatus(since = "1.1")
    public QualityTargets withFeedMarkDepthUm(OptionalDouble feedMarkDepthUm) {
        return new QualityTargets(feedMarkDepthUm, envelopingDepthUm, maxChipThicknessMm);
    }

    /**
     * This quality targets with a {@code feedMarkDepthUm} given.
     *
     * @param feedMarkDepthUm the value
     * @return the copy, checked like any new one
     */
    @ApiStatus(since = "1.1")
    public QualityTargets withFeedMarkDepthUm(double feedMarkDepthUm) {
        return withFeedMarkDepthUm(OptionalDouble.of(feedMarkDepthUm));
    }

    /**
     * This quality targets with another {@code envelopingDepthUm}.
     *
     * @param envelopingDepthUm largest enveloping-cut (generating flat) depth, micrometres
     * @return the copy, checked like any new one
     */
    @ApiStatus(since = "1.1")
    public QualityTargets withEnvelopingDepthUm(OptionalDouble envelopingDepthUm) {
        return new QualityTargets(feedMarkDepthUm, envelopingDepthUm, maxChipThicknessMm);
    }

    /**
     * This quality targets with a {@code envelopingDepthUm} given.
     *
     * @param envelopingDepthUm the value
     * @return the copy, checked like any new one
     */
    @ApiStatus(since = "1.1")
    public QualityTargets withEnvelopingDepthUm(double envelopingDepthUm) {
        return withEnvelopingDepthUm(OptionalDouble.of(envelopingDepthUm));
    }

    /**
     * This quality targets with another {@code maxChipThicknessMm}.
     *
     * @param maxChipThicknessMm largest undeformed chip thickness, mm
     * @return the copy, checked like any new one
     */
    @ApiStatus(since = "1.1")
    public QualityTargets withMaxChipThicknessMm(OptionalDouble maxChipThicknessMm) {
        return new QualityTargets(feedMarkDepthUm, envelopingDepthUm, maxChipThicknessMm);
    }

    /**
     * This quality targets with a {@code maxChipThicknessMm} given.
     *
     * @param maxChipThicknessMm the value
     * @return the copy, checked like any new one
     */
    @ApiStatus(since = "1.1")
    public QualityTargets withMaxChipThicknessMm(double maxChipThicknessMm) {
        return withMaxChipThicknessMm(OptionalDouble.of(maxChipThicknessMm));
    }
}
