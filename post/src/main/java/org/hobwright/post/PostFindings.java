package org.hobwright.post;

import java.util.List;
import java.util.Optional;
import org.hobwright.api.check.Finding;
import org.hobwright.api.cycle.HobCycle;
import org.hobwright.api.spi.WriteContext;
import org.hobwright.api.spi.WriteResult;

/** Findings the writers share. */
public final class PostFindings {

    /** The build version of the writers (the Maven project version; a test keeps them equal). */
    public static final String BUILD_VERSION = "0.2.0";

    private PostFindings() {
    }

    /**
     * The refusal for a cycle that must not be posted: one with error findings or without the
     * parts a writer needs.
     *
     * @param cycle   the cycle
     * @param context the job it is to be written with
     * @param writer  the writer's id, for the message
     * @return a refusal, or empty when the cycle may be written
     */
    public static Optional<WriteResult> refusal(HobCycle cycle, WriteContext context, String writer) {
        Optional<WriteResult> other = otherJob(cycle, context, writer);
        if (other.isPresent()) {
            return other;
        }
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

    /**
     * The refusal for a cycle that says it was planned for another job than the one it is to be
     * written with (the header, file names and setup sheet would describe the wrong part).
     *
     * @param cycle   the cycle
     * @param context the job it is to be written with
     * @param writer  the writer's id, for the message
     * @return a refusal, or empty when the cycle was planned for that job or does not say
     */
    public static Optional<WriteResult> otherJob(HobCycle cycle, WriteContext context, String writer) {
        // the same instance needs no comparison (a record's equals is bootstrapped at its first call)
        if (cycle.plannedFor().isEmpty() || cycle.plannedFor().get() == context.job()
                || cycle.plannedFor().get().equals(context.job())) {
            return Optional.empty();
        }
        return Optional.of(WriteResult.refused(List.of(PostCode.POST_CYCLE_OTHER_JOB.at("job",
                "The cycle was planned for job \"" + cycle.plannedFor().get().name() + "\", not for job \""
                        + context.job().name() + "\" as given (or for other values of it); the " + writer
                        + " writer writes nothing", "plan the job that is to be written, then write that cycle"))));
    }
}
