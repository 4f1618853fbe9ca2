package org.hobwright.api.wizard;

import java.util.List;
import org.hobwright.api.Validate;
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
public record StepView(StepId id, String title, List<FieldSpec> fields, List<Finding> findings,
                       List<String> summary) {
    public StepView {
        Validate.present("id", id);
        Validate.text("title", title);
        fields = List.copyOf(Validate.present("fields", fields));
        findings = List.copyOf(Validate.present("findings", findings));
        summary = List.copyOf(Validate.present("summary", summary));
    }
}
