package org.hobwright.api.host;

import java.util.List;
import org.hobwright.api.ApiStatus;
import org.hobwright.api.check.Finding;
import org.hobwright.api.cycle.HobCycle;
import org.hobwright.api.internal.Checks;
import org.hobwright.api.job.HobJob;

/**
 * A job and the cycle planned for it, kept together so that a cycle is never written with the
 * wrong job.
 *
 * @param job   the job
 * @param cycle the cycle planned for it
 */
@ApiStatus(since = "1.1")
public record PlannedJob(HobJob job, HobCycle cycle) {

    /**
     * Checks the components: a value out of range throws {@link IllegalArgumentException} naming the field and the
     * value.
     *
     * @param job the job
     * @param cycle the cycle planned for it
     */
    public PlannedJob {
        Checks.present("job", job);
        Checks.present("cycle", cycle);
        // the same instance needs no comparison (a record's equals is bootstrapped at its first call)
        if (cycle.plannedFor().isPresent() && cycle.plannedFor().get() != job && !cycle.plannedFor().get().equals(job)) {
            throw new IllegalArgumentException("the cycle was planned for job \"" + cycle.plannedFor().get().name()
                    + "\", not for job \"" + job.name() + "\" as given");
        }
    }

    /** {@return true when the cycle has an error finding: nothing may be written} */
    public boolean hasErrors() {
        return cycle.hasErrors();
    }

    /** {@return the cycle's findings, errors first} */
    public List<Finding> findings() {
        return cycle.findings();
    }

    /** The job's name, then the cycle's short summary ({@link HobCycle#toString()}). */
    @Override
    public String toString() {
        return "job " + job.name() + ": " + cycle;
    }
}
