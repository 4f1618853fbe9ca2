package org.hobwright.samples.host;

import java.util.List;
import java.util.Optional;
import org.hobwright.api.check.Finding;
import org.hobwright.api.cycle.HobCycle;
import org.hobwright.api.job.HobJob;

/**
 * Where a walk through the wizard ended.
 *
 * @param job      the job built from the answers, when GEAR to CYCLE completed
 * @param cycle    the planned cycle, when REVIEW was reached
 * @param findings the findings shown at the end (at REVIEW: every open finding)
 * @param stopped  true when the walk stopped before REVIEW
 */
public record WizardOutcome(Optional<HobJob> job, Optional<HobCycle> cycle, List<Finding> findings,
                            boolean stopped) {
    public WizardOutcome {
        findings = List.copyOf(findings);
    }

    /** True when there is a cycle without errors that may be posted. */
    public boolean postable() {
        return !stopped && job.isPresent() && cycle.isPresent() && !cycle.get().hasErrors();
    }
}
