package org.hobwright.api.wizard;

import java.util.List;
import org.hobwright.api.ApiStatus;
import org.hobwright.api.internal.Checks;
import org.hobwright.api.check.Finding;

/**
 * Outcome of asking the wizard to move.
 *
 * @param moved    true when the wizard is now on another step
 * @param current  the step the wizard is on now
 * @param findings findings that blocked the move, or warnings shown on the way
 */
@ApiStatus(since = "1.0")
public record Transition(boolean moved, StepId current, List<Finding> findings) {
    /**
     * Checks the components: a value out of range throws {@link IllegalArgumentException} naming the field and the
     * value.
     *
     * @param moved true when the wizard is now on another step
     * @param current the step the wizard is on now
     * @param findings findings that blocked the move, or warnings shown on the way
     */
    public Transition {
        Checks.present("current", current);
        findings = List.copyOf(Checks.present("findings", findings));
    }
}
