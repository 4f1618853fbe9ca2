package org.hobwright.wizard.cli;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
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
        // keyed by the components (the same equality as the record's) so that no record
        // equals/hashCode is bootstrapped on the start-up path
        Map<List<Object>, Finding> all = new LinkedHashMap<>();
        findings.forEach(f -> all.putIfAbsent(key(f), f));
        cycle.ifPresent(c -> c.findings().forEach(f -> all.putIfAbsent(key(f), f)));
        return List.copyOf(all.values());
    }

    private static List<Object> key(Finding f) {
        return List.of(f.severity(), f.code(), f.field(), f.message(), f.fix(), f.source());
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
