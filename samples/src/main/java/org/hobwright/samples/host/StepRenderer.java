package org.hobwright.samples.host;

import java.io.PrintWriter;
import java.util.ArrayList;
import java.util.List;
import java.util.Set;
import java.util.TreeSet;
import org.hobwright.api.check.Finding;
import org.hobwright.api.wizard.FieldSpec;
import org.hobwright.api.wizard.StepId;
import org.hobwright.api.wizard.StepView;
import org.hobwright.api.wizard.Transition;
import org.hobwright.api.wizard.Wizard;

/**
 * Renders the wizard's step model as plain text and answers it from an {@link AnswerSheet}:
 * this host's own, deliberately simple way of showing GEAR → CUTTER → MACHINE → CYCLE → REVIEW.
 * A real host would draw a dialog per step from the same {@link StepView}.
 */
public final class StepRenderer {

    /** More moves than this means the wizard is going round in circles. */
    private static final int MAX_MOVES = 20;

    private final PrintWriter out;

    /** @param out where the steps are shown */
    public StepRenderer(PrintWriter out) {
        this.out = out;
    }

    /**
     * Walks the wizard from its current step to REVIEW.
     *
     * @param wizard the session
     * @param sheet  the answers
     * @return how far it got, with the findings that stopped it
     */
    public WizardOutcome walk(Wizard wizard, AnswerSheet sheet) {
        Set<String> used = new TreeSet<>();
        for (int move = 0; move < MAX_MOVES; move++) {
            StepView view = wizard.view();
            out.println();
            out.println("== " + view.id() + ": " + view.title());
            if (view.id() == StepId.REVIEW) {
                view.summary().forEach(line -> out.println("   " + line));
                showFindings(view.findings());
                reportUnused(sheet, used);
                return new WizardOutcome(wizard.job(), wizard.cycle(), view.findings(), false);
            }
            List<Finding> refused = answerFields(wizard, view, sheet, used);
            if (!refused.isEmpty()) {
                return new WizardOutcome(wizard.job(), wizard.cycle(), refused, true);
            }
            Transition t = wizard.next(sheet.acceptWarnings());
            showFindings(t.findings());
            if (!t.moved()) {
                out.println("   (the wizard stays on " + t.current() + ")");
                return new WizardOutcome(wizard.job(), wizard.cycle(), t.findings(), true);
            }
        }
        throw new IllegalStateException("the wizard did not reach REVIEW after " + MAX_MOVES + " moves");
    }

    private List<Finding> answerFields(Wizard wizard, StepView view, AnswerSheet sheet, Set<String> used) {
        List<Finding> refused = new ArrayList<>();
        for (FieldSpec field : view.fields()) {
            var given = sheet.answer(field.key());
            List<Finding> findings = given.map(text -> wizard.answer(field.key(), text)).orElse(List.of());
            given.ifPresent(text -> used.add(field.key()));
            String value = wizard.value(field.key());
            out.println("   " + field.label() + " = "
                    + (value.isEmpty() ? "(none)" : value + (field.unit().isEmpty() ? "" : " " + field.unit()))
                    + (given.isPresent() ? "" : "   (default)")
                    + (field.choices().isEmpty() ? "" : "   one of " + String.join(", ", field.choices())));
            showFindings(findings);
            findings.stream().filter(Finding::isError).forEach(refused::add);
        }
        return refused;
    }

    private void showFindings(List<Finding> findings) {
        findings.forEach(f -> out.println("   ! " + f.line()));
    }

    private void reportUnused(AnswerSheet sheet, Set<String> used) {
        sheet.answers().keySet().stream().filter(k -> !used.contains(k))
                .forEach(k -> out.println("   ! answer \"" + k + "\" matched no field of any step (misspelt key?)"));
    }
}
