package org.hobwright.post;

import org.hobwright.api.job.QualityTargets;

/** Questions about a cycle's quality targets that the writers share. */
public final class TargetsGiven {
    private TargetsGiven() {
    }

    /**
     * True when no target is set, i.e. the targets equal {@link QualityTargets#DEFAULTS}. Compared
     * field by field so that the record's generated {@code equals} (method handles spun at its
     * first use) stays off the start-up path.
     */
    public static boolean none(QualityTargets t) {
        return t.feedMarkDepthUm().isEmpty() && t.envelopingDepthUm().isEmpty() && t.maxChipThicknessMm().isEmpty();
    }
}
