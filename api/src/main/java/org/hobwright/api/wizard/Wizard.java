package org.hobwright.api.wizard;

import java.util.List;
import java.util.Optional;
import org.hobwright.api.ApiStatus;
import org.hobwright.api.check.Finding;
import org.hobwright.api.cycle.HobCycle;
import org.hobwright.api.job.HobJob;

/**
 * One wizard session: GEAR → CUTTER → MACHINE → CYCLE → REVIEW. A host renders {@link #view()},
 * passes the user's answers to {@link #answer}, and moves with {@link #next} and {@link #back}.
 * Nothing here prints; every problem comes back as a finding.
 */
@ApiStatus(since = "1.0")
public interface Wizard {

    /** {@return the current step as a host should render it} */
    StepView view();

    /**
     * Records an answer and checks it at once.
     *
     * @param key  a field key of the current step
     * @param text the answer as typed
     * @return the findings for this answer (empty when it is fine); an error means it was not taken
     */
    List<Finding> answer(String key, String text);

    /**
     * The current answer of a field as text (its default when unanswered).
     *
     * @param key a field key of the current step
     * @return the current answer of a field as text (its default when unanswered)
     */
    String value(String key);

    /**
     * Completes the current step and moves on. Errors block; warnings block unless accepted.
     *
     * @param acceptWarnings true to move on despite warnings
     * @return completes the current step and moves on
     */
    Transition next(boolean acceptWarnings);

    /** {@return goes back one step, keeping every answer; later answers are checked again when reached} */
    Transition back();

    /** {@return the job built from the answers so far, once GEAR to CYCLE are complete} */
    Optional<HobJob> job();

    /** {@return the planned cycle, once on REVIEW} */
    Optional<HobCycle> cycle();
}
