package org.hobwright.wizard.cli;

import java.util.List;
import java.util.Optional;
import org.hobwright.api.check.Finding;
import org.hobwright.api.cycle.HobCycle;
import org.hobwright.api.job.HobJob;

/**
 * One job of a run: where it came from, the job when it could be read, the reader's findings and
 * the planned cycle.
 *
 * @param source   file name or "built-in sample"
 * @param job      the job, when it could be read
 * @param findings the reader's findings
 * @param cycle    the planned cycle, when the job could be read
 */
record JobInput(String source, Optional<HobJob> job, List<Finding> findings, Optional<HobCycle> cycle) {
    JobInput {
        findings = List.copyOf(findings);
    }

    /** This input with its cycle. */
    JobInput planned(HobCycle planned) {
        return new JobInput(source, job, findings, Optional.of(planned));
    }

    /** Every finding: the reader's, then the planner's (without repeats). */
    List<Finding> allFindings() {
        java.util.LinkedHashSet<Finding> all = new java.util.LinkedHashSet<>(findings);
        cycle.ifPresent(c -> all.addAll(c.findings()));
        return List.copyOf(all);
    }

    /** True when the job cannot be posted. */
    boolean hasErrors() {
        return job.isEmpty() || cycle.isEmpty() || Finding.anyError(allFindings());
    }

    /** The job's name, or the source when it could not be read. */
    String name() {
        return job.map(HobJob::name).orElse(source);
    }
}
