package org.hobwright.wizard.cli;

import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Optional;
import java.util.Set;
import org.hobwright.api.check.Finding;
import org.hobwright.api.check.Severity;
import org.hobwright.api.job.FieldDef;
import org.hobwright.api.job.FieldDefault;
import org.hobwright.api.job.JobFields;
import org.hobwright.api.job.Units;
import org.hobwright.api.wizard.FieldSpec;
import org.hobwright.api.wizard.FieldType;
import org.hobwright.api.wizard.StepId;
import org.hobwright.api.wizard.StepView;
import org.hobwright.api.wizard.Transition;
import org.hobwright.api.wizard.Wizard;
import org.hobwright.wizard.steps.FieldCheck;
import org.hobwright.wizard.steps.StepFields;

/**
 * Walks a {@link Wizard} field by field on a terminal or piped input. Enter takes the value shown
 * in brackets, {@code ?} prints the field's help, {@code -} clears an optional value, {@code back}
 * returns to the previous field (or step); a bad answer is asked again with the reason.
 */
final class TerminalWizard {

    /** What to do at REVIEW once the job is planned without errors. */
    interface Finish {
        /**
         * Offers to write the outputs and to save a template.
         *
         * @return true when done, false to go back a step
         */
        boolean offer(Wizard wizard, Prompter prompter);
    }

    private static final int STEPS = StepId.values().length;

    private final Wizard wizard;
    private final Prompter prompter;
    /** The fields to ask again after a blocked step; empty asks the whole step. */
    private List<String> focus = List.of();

    TerminalWizard(Wizard wizard, Prompter prompter) {
        this.wizard = wizard;
        this.prompter = prompter;
    }

    /**
     * Runs the walk-through to REVIEW and then hands over to {@code finish}.
     *
     * @return the exit code: 0 done, 1 the job has errors
     * @throws CliFailure (exit 2) when the input ends before the walk-through does
     */
    int run(Finish finish) {
        while (true) {
            StepView view = wizard.view();
            if (view.id() == StepId.REVIEW) {
                if (review(view, finish)) {
                    return wizard.cycle().filter(c -> !c.hasErrors()).isPresent()
                            ? ExitCodes.OK : ExitCodes.JOB_ERRORS;
                }
                continue;
            }
            if (focus.isEmpty()) {
                prompter.say("");
                prompter.say("Step " + (view.id().ordinal() + 1) + " of " + STEPS + ": " + view.title());
            }
            List<FieldSpec> fields = view.fields().stream()
                    .filter(f -> focus.isEmpty() || focus.contains(f.key())).toList();
            boolean subset = !focus.isEmpty();
            focus = List.of();
            if (askFields(fields, subset)) {
                complete(view);
            }
        }
    }

    /**
     * Asks the fields; false when the user went back: to the whole step from a subset, else to the
     * previous step. Fields that do not apply are passed over (see {@link #applies}); the drawing's
     * printed values are asked only after a yes to one question.
     */
    private boolean askFields(List<FieldSpec> asked, boolean subset) {
        List<FieldSpec> fields = asked;
        Boolean drawing = subset ? Boolean.TRUE : null;
        int i = 0;
        int step = 1;
        while (i < fields.size()) {
            FieldSpec f = fields.get(i);
            if (isDrawing(f) && drawing == null) {
                drawing = yes(read("  Compare with values printed on the drawing? [" + (anyDrawingValue(fields)
                        ? "yes" : "no") + "] > "), anyDrawingValue(fields));
            }
            if (!applies(f, wizard) || isDrawing(f) && !drawing) {
                i += step;
                if (i < 0) {
                    return !(subset || goBack());
                }
                continue;
            }
            step = 1;
            String line = read(prompt(f, wizard.value(f.key()), defaultSource(f)));
            if (line.equals("?")) {
                help(f);
            } else if (line.equalsIgnoreCase("back")) {
                if (isDrawing(f) && (i == 0 || !isDrawing(fields.get(i - 1)))) {
                    drawing = null;                      // the yes/no question is asked again
                }
                if (i > 0) {
                    i--;
                    step = -1;
                } else if (subset || goBack()) {
                    return false;
                }
            } else {
                String text = line.isEmpty() ? wizard.value(f.key()) : line.equals("-") ? "" : line;
                List<Finding> said = wizard.answer(f.key(), text);
                for (Finding p : said) {
                    prompter.say((p.isError() ? "  ! " : "  i ") + p.message() + p.fix().map(x -> "; " + x).orElse(""));
                }
                if (!Finding.anyError(said)) {
                    i++;                                 // taken; remarks were shown
                    // an answer may change others (a unit, a default) or, the part kind, the questions
                    fields = subset ? sameFieldsAnew(fields) : wizard.view().fields();
                }
            }
        }
        return true;
    }

    /**
     * True when a question applies ({@link StepFields#applies(String, java.util.function.Function)}): the
     * gear's or the spline's questions by the part kind, the custom rack factors only for the custom tooth system.
     */
    static boolean applies(FieldSpec f, Wizard wizard) {
        return StepFields.applies(f.key(), wizard::value);
    }

    /** True for a value printed on the drawing (its printed values and its mating gear). */
    static boolean isDrawing(FieldSpec f) {
        return f.key().startsWith("gear.drawing.") || f.key().startsWith("gear.mate.");
    }

    private boolean anyDrawingValue(List<FieldSpec> fields) {
        return fields.stream().filter(f -> isDrawing(f) && applies(f, wizard))
                .anyMatch(f -> !wizard.value(f.key()).isEmpty());
    }

    /**
     * Completes the step; on warnings asks whether to accept them. When the step stays, the
     * questions the findings name are asked again (the whole step when they name none of them).
     */
    private void complete(StepView view) {
        Transition t = wizard.next(false);
        if (t.moved()) {
            return;
        }
        t.findings().forEach(f -> prompter.say("  " + f.line()));
        boolean errors = Finding.anyError(t.findings());
        if (!errors && t.findings().stream().anyMatch(f -> f.severity() == Severity.WARNING)
                && yes(read("  Accept these warnings and go on? [yes] > "), true)) {
            wizard.next(true);
            return;
        }
        focus = view.fields().stream().map(FieldSpec::key)
                .filter(k -> t.findings().stream().anyMatch(f -> f.field().equals(k) || f.field().startsWith(k + ".")
                        || k.startsWith(f.field() + ".")))
                .toList();
        prompter.say(focus.isEmpty() ? "  Please correct the step; it is asked again (Enter keeps a value)."
                : "  Please correct " + String.join(", ", focus) + " ('back' for the whole step).");
    }

    private boolean review(StepView view, Finish finish) {
        prompter.say("");
        prompter.say("Step " + STEPS + " of " + STEPS + ": " + view.title());
        view.summary().forEach(prompter::say);
        if (view.findings().isEmpty()) {
            prompter.say("No open findings.");
        } else {
            prompter.say("Open findings:");
            view.findings().forEach(f -> prompter.say("  " + f.line()));
        }
        if (wizard.cycle().filter(c -> !c.hasErrors()).isEmpty()) {
            prompter.say("The job has errors; nothing can be written.");
            String line = read("  Go back and correct it? [yes] > ");
            if (yes(line, true)) {
                wizard.back();
                return false;
            }
            return true;
        }
        if (finish.offer(wizard, prompter)) {
            return true;
        }
        wizard.back();
        return false;
    }

    private boolean goBack() {
        Transition t = wizard.back();
        if (!t.moved()) {
            prompter.say("  This is the first step.");
        }
        return t.moved();
    }

    private void help(FieldSpec f) {
        prompter.say("  " + f.help());
        if (!f.choices().isEmpty()) {
            prompter.say("  Choices: " + String.join(", ", f.choices()));
        }
        f.min().ifPresent(min -> prompter.say("  Smallest: " + FieldCheck.plain(min) + (f.max().isPresent()
                ? ", largest: " + FieldCheck.plain(f.max().getAsDouble()) : "")));
        if (f.type() == FieldType.ANGLE) {
            prompter.say("  Angles: decimal degrees (13.2368) or degrees-minutes-seconds (13°14'12\" or 13 14 12).");
        }
        prompter.say("  Enter keeps the value in brackets" + (f.required() ? "" : ", '-' clears it")
                + ", 'back' returns to the previous question.");
    }

    /**
     * Where the value shown comes from, when it is still the table's default of a standard or of the
     * trade's convention (so Enter through a blank start says what it takes for granted).
     */
    private String defaultSource(FieldSpec f) {
        Units units = "in".equals(wizard.value(StepFields.UNITS)) ? Units.IN : Units.MM;
        return JobFields.find(f.key()).map(FieldDef::dflt)
                .filter(d -> d.origin() == FieldDefault.Origin.STANDARD || d.origin() == FieldDefault.Origin.CONVENTION)
                .filter(d -> d.hasValue() && d.value(units).equals(wizard.value(f.key())))
                .map(FieldDefault::source).orElse("");
    }

    private static String prompt(FieldSpec f, String current, String source) {
        StringBuilder sb = new StringBuilder("  ").append(f.label());
        if (!f.unit().isEmpty()) {
            sb.append(" (").append(f.unit()).append(')');
        }
        if (f.type() == FieldType.CHOICE && !f.choices().isEmpty() && f.choices().size() <= 8) {
            sb.append(" {").append(String.join("|", f.choices())).append('}');
        }
        sb.append(" [").append(current).append(']');
        if (!source.isEmpty()) {
            sb.append(" (").append(source).append(')');
        }
        return sb.append(" > ").toString();
    }

    /** Reads one answer. */
    String read(String prompt) {
        Optional<String> line = prompter.ask(prompt);
        return line.orElseThrow(() -> CliFailure.usage("the input ended before the wizard was finished"));
    }

    /** Reads yes or no, with a default for Enter. */
    static boolean yes(String line, boolean dflt) {
        String l = line.strip().toLowerCase(java.util.Locale.ROOT);
        return l.isEmpty() ? dflt : l.startsWith("y");
    }

    /** The same fields as the step model describes them now (their units, values and choices). */
    private List<FieldSpec> sameFieldsAnew(List<FieldSpec> fields) {
        Set<String> keys = new HashSet<>();
        for (FieldSpec f : fields) {
            keys.add(f.key());
        }
        List<FieldSpec> now = new ArrayList<>();
        for (FieldSpec f : wizard.view().fields()) {
            if (keys.contains(f.key())) {
                now.add(f);
            }
        }
        return now;
    }
}
