package org.hobwright.post;

import java.util.List;
import java.util.Optional;
import org.hobwright.api.check.Finding;
import org.hobwright.api.cycle.HobCycle;
import org.hobwright.api.spi.WriteResult;

/** Findings the writers share. */
public final class PostFindings {

    private PostFindings() {
    }

    /**
     * The refusal for a cycle that must not be posted: one with error findings or without the
     * parts a writer needs.
     *
     * @param cycle  the cycle
     * @param writer the writer's id, for the message
     * @return a refusal, or empty when the cycle may be written
     */
    public static Optional<WriteResult> refusal(HobCycle cycle, String writer) {
        if (cycle.hasErrors()) {
            return Optional.of(WriteResult.refused(List.of(PostCode.POST_CYCLE_HAS_ERRORS.at("job",
                    "The cycle has " + cycle.findings().stream().filter(Finding::isError).count()
                            + " error finding(s); the " + writer + " writer writes nothing for it",
                    "fix the errors listed for the job, then plan again"))));
        }
        if (cycle.steps().isEmpty() || cycle.setup().isEmpty() || cycle.summary().isEmpty()
                || cycle.gear().isEmpty()) {
            return Optional.of(WriteResult.refused(List.of(PostCode.POST_CYCLE_INCOMPLETE.at("job",
                    "The cycle has no steps, setup values, gear data or summary; the " + writer
                            + " writer needs all of them",
                    "plan the job again; report a planner that returns such a cycle without an error"))));
        }
        return Optional.empty();
    }
}
