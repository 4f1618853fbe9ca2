package org.hobwright.wizard.steps;

import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;
import org.hobwright.api.check.Finding;
import org.hobwright.api.check.Severity;
import org.hobwright.api.cycle.HobCycle;
import org.hobwright.api.job.FieldDef;
import org.hobwright.api.job.FieldRange;
import org.hobwright.api.job.HobJob;
import org.hobwright.api.job.JobFields;
import org.hobwright.api.job.Units;
import org.hobwright.api.wizard.FieldSpec;
import org.hobwright.api.wizard.FieldType;
import org.hobwright.api.wizard.StepId;
import org.hobwright.api.wizard.StepView;
import org.hobwright.api.wizard.Transition;
import org.hobwright.api.wizard.Wizard;

/**
 * One wizard session over the steps GEAR → CUTTER → MACHINE → CYCLE → REVIEW.
 *
 * <p>Each answer is checked at once ({@link FieldCheck}). Completing a step checks its fields
 * again, then builds the job tree from every answer, reads it and runs the job checks, and keeps
 * the findings whose field belongs to this step: errors block, warnings block unless accepted.
 * Going back keeps every answer; each step is checked afresh whenever it is completed. A field's
 * {@link FieldSpec#defaultValue()} is its current answer, which starts as the table's default (a
 * blank start) or the given job's value. Nothing here prints.
 */
public final class StepSession implements Wizard {
    private static final StepId[] ORDER = StepId.values();
    /**
     * The hob's pitch and pressure angle follow the gear's (or the spline's) while they are equal to
     * it or still the table's default, so a part answered with a new module gets a matching hob
     * proposed (a hob must match the part's normal module and pressure angle; a spline hob also its
     * root form).
     */
    private static final java.util.Map<String, String> HOB_FOLLOWS = java.util.Map.of(
            "gear.module", "hob.module", "gear.diametralPitch", "hob.diametralPitch",
            "gear.pressureAngle", "hob.pressureAngle", "gear.hand", "hob.hand",
            "spline.module", "hob.module", "spline.diametralPitch", "hob.diametralPitch",
            "spline.pressureAngle", "hob.pressureAngle", "spline.root", "hob.root");

    private final StepServices services;
    private final Answers answers;
    private final UnitSwitch unitSwitch = new UnitSwitch();
    private final Proposals proposals = new Proposals();
    private int index;
    private List<Finding> shown = List.of();
    private Optional<HobJob> job = Optional.empty();
    private Optional<HobCycle> cycle = Optional.empty();
    private List<Finding> review = List.of();

    /**
     * Starts a session on GEAR.
     *
     * @param services the reader, checks, planner and library names
     * @param defaults the answers to start from
     */
    public StepSession(StepServices services, Answers defaults) {
        this.services = services;
        this.answers = defaults;
    }

    /** The step the session is on. */
    public StepId current() {
        return ORDER[index];
    }

    /** The answers so far (for saving them as a template). */
    public Answers answers() {
        return answers;
    }

    @Override
    public StepView view() {
        StepId id = current();
        if (id == StepId.REVIEW) {
            List<String> summary = cycle.map(c -> ReviewLines.of(c, units())).orElse(List.of());
            return new StepView(id, StepFields.title(id), List.of(), review, summary);
        }
        List<FieldSpec> specs = StepFields.of(id).stream().filter(f -> StepFields.ofThePart(f.key(), answers::get))
                .map(this::spec).toList();
        return new StepView(id, StepFields.title(id), specs, shown, List.of());
    }

    @Override
    public List<Finding> answer(String key, String text) {
        Optional<FieldDef> field = StepFields.of(current()).stream().filter(f -> f.key().equals(key)).findFirst();
        if (field.isEmpty()) {
            return List.of(WizardCode.WIZARD_UNKNOWN_FIELD.at(key, "step " + current() + " has no field \""
                    + key + "\"", "answer one of the fields of the current step"));
        }
        String value = text == null ? "" : text.strip();
        Optional<Finding> problem = FieldCheck.check(field.get(), value, choices(field.get()), units());
        if (problem.isPresent()) {
            return List.of(problem.get());
        }
        if (field.get().type() == FieldType.BOOLEAN && !value.isEmpty()) {
            value = FieldCheck.yesNo(value).orElseThrow() ? "yes" : "no";
        }
        String hobKey = HOB_FOLLOWS.get(key);
        if (hobKey != null && follows(hobKey, key)) {
            answers.put(hobKey, hobValue(key, value));
        }
        Units before = units();
        answers.put(key, value);
        if (key.equals(JobFields.PART.key())) {
            hobFollowsThePart(value);
        }
        unitSwitch.typed(field.get(), value, before);
        proposals.followPitch(answers);
        if (key.equals(StepFields.MACHINE) && !services.templates(value).contains(answers.get(StepFields.TEMPLATE))) {
            answers.put(StepFields.TEMPLATE, "");
        }
        if (key.equals(StepFields.TEMPLATE) && !value.isEmpty()) {
            services.templateCycle(answers.get(StepFields.MACHINE), value, units())
                    .ifPresent(cycle -> Proposals.applyTemplate(answers, cycle, units()));
        }
        if (key.equals(StepFields.UNITS)) {
            return unitSwitch.switchUnits(answers, before, units()).map(List::of).orElse(List.of());
        }
        return List.of();
    }

    /**
     * A part kind answered: the hob takes the part's answers where it still follows (a spline's 30°
     * pressure angle and its root form for a hob proposed for a 20° gear).
     */
    private void hobFollowsThePart(String part) {
        HOB_FOLLOWS.forEach((partKey, hobKey) -> {
            if (partKey.startsWith(part + ".") && !answers.get(partKey).isEmpty() && follows(hobKey, partKey)) {
                answers.put(hobKey, hobValue(partKey, answers.get(partKey)));
            }
        });
    }

    /** True while the hob's answer is the part's, or empty, or the table's default: it may be proposed anew. */
    private boolean follows(String hobKey, String partKey) {
        String hob = answers.get(hobKey);
        return hob.isEmpty() || hob.equals(hobValue(partKey, answers.get(partKey)))
                || StepFields.find(hobKey).map(f -> hob.equals(f.dflt().value(units()))).orElse(false);
    }

    /** The hob's value for a part's answer: a spline's diametral pitch "16/32" is the hob's 16. */
    private static String hobValue(String partKey, String value) {
        int slash = value.indexOf('/');
        return partKey.equals("spline.diametralPitch") && slash > 0 ? value.substring(0, slash).strip() : value;
    }

    @Override
    public String value(String key) {
        return answers.get(key);
    }

    @Override
    public Transition next(boolean acceptWarnings) {
        StepId step = current();
        if (step == StepId.REVIEW) {
            return new Transition(false, step, review);
        }
        List<Finding> findings = check(step);
        shown = findings;
        boolean blocked = Finding.anyError(findings)
                || (!acceptWarnings && findings.stream().anyMatch(f -> f.severity() == Severity.WARNING));
        if (blocked) {
            return new Transition(false, step, findings);
        }
        index++;
        shown = List.of();
        if (current() == StepId.REVIEW) {
            enterReview();
        }
        return new Transition(true, current(), findings);
    }

    @Override
    public Transition back() {
        if (index == 0) {
            return new Transition(false, current(), shown);
        }
        index--;
        job = Optional.empty();
        cycle = Optional.empty();
        review = List.of();
        shown = check(current());
        return new Transition(true, current(), shown);
    }

    @Override
    public Optional<HobJob> job() {
        return job;
    }

    @Override
    public Optional<HobCycle> cycle() {
        return cycle;
    }

    /** Every finding of a step: its fields again, then the reader's and the checks' on the whole job. */
    private List<Finding> check(StepId step) {
        List<Finding> out = new ArrayList<>();
        for (FieldDef f : StepFields.of(step)) {
            if (StepFields.applies(f.key(), answers)) {
                FieldCheck.check(f, answers.get(f.key()), choices(f), units()).ifPresent(out::add);
            }
        }
        StepServices.JobRead read = services.read(answers.toTree());
        List<Finding> all = new ArrayList<>(read.findings());
        read.job().ifPresent(j -> all.addAll(services.check(j)));
        all.stream().filter(f -> StepFields.stepOf(f) == step).forEach(out::add);
        return List.copyOf(new LinkedHashSet<>(out));
    }

    private void enterReview() {
        StepServices.JobRead read = services.read(answers.toTree());
        job = read.job();
        LinkedHashSet<Finding> all = new LinkedHashSet<>(read.findings());
        if (job.isPresent()) {
            HobCycle planned = services.plan(job.get());
            cycle = Optional.of(planned);
            all.addAll(planned.findings());
        }
        List<Finding> sorted = new ArrayList<>(all);
        sorted.sort((a, b) -> a.severity().compareTo(b.severity()));
        review = List.copyOf(sorted);
    }

    private FieldSpec spec(FieldDef f) {
        Units u = units();
        FieldRange r = f.range();
        OptionalDouble min = r.hasMin() ? OptionalDouble.of(f.unit().fromCanonical(r.min(), u)) : OptionalDouble.empty();
        OptionalDouble max = r.hasMax() ? OptionalDouble.of(f.unit().fromCanonical(r.max(), u)) : OptionalDouble.empty();
        return new FieldSpec(f.key(), f.label(), f.unit().symbol(u), f.type(), answers.get(f.key()),
                choices(f), min, max, f.required(), f.help() + " Default: " + f.dflt().describe() + ".",
                r.hasMin() && r.minOpen());
    }

    /** The choices of a field now: fixed ones, or the library's machines and templates. */
    private List<String> choices(FieldDef f) {
        if (f.key().equals(StepFields.MACHINE)) {
            List<String> names = new ArrayList<>(services.machines());
            answers.inlineMachineName().filter(n -> !names.contains(n)).ifPresent(names::add);
            return names;
        }
        if (f.key().equals(StepFields.TEMPLATE)) {
            return services.templates(answers.get(StepFields.MACHINE));
        }
        return f.choices();
    }

    private Units units() {
        return "in".equals(answers.get(StepFields.UNITS)) ? Units.IN : Units.MM;
    }
}
