package org.hobwright.api.wizard;

import java.util.List;
import org.hobwright.api.ApiStatus;
import org.hobwright.api.internal.Checks;
import org.hobwright.api.check.Finding;

/**
 * What a host shows for the current step.
 *
 * @param id       the step
 * @param title    heading in plain words
 * @param fields   the fields, in order (empty for REVIEW)
 * @param findings open findings of this step
 * @param summary  lines to show (REVIEW: setup, inspection, cycle time, quality), else empty
 */
@ApiStatus(since = "1.0")
public record StepView(StepId id, String title, List<FieldSpec> fields, List<Finding> findings,
                       List<String> summary) {
    /**
     * Checks the components: a value out of range throws {@link IllegalArgumentException} naming the field and the
     * value.
     *
     * @param id the step
     * @param title heading in plain words
     * @param fields the fields, in order (empty for REVIEW)
     * @param findings open findings of this step
     * @param summary lines to show (REVIEW: setup, inspection, cycle time, quality), else empty
     */
    public StepView {
        Checks.present("id", id);
        Checks.text("title", title);
        fields = List.copyOf(Checks.present("fields", fields));
        findings = List.copyOf(Checks.present("findings", findings));
        summary = List.copyOf(Checks.present("summary", summary));
    }
}
