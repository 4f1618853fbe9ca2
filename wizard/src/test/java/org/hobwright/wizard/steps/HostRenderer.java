package org.hobwright.wizard.steps;

import java.util.List;
import java.util.Optional;
import org.hobwright.api.check.Finding;
import org.hobwright.api.wizard.FieldSpec;
import org.hobwright.api.wizard.StepView;

/** What a host's dialog does with the step model; mocked in the tests. */
interface HostRenderer {
    /** Shows a step. */
    void render(StepView view);

    /** The user's answer to a field, or empty to keep the shown value. */
    Optional<String> answer(FieldSpec field);

    /** Whether the user accepts these warnings. */
    boolean acceptWarnings(List<Finding> warnings);

    /** Whether the user pressed Back on this step instead of completing it. */
    boolean back(StepView view);
}
