package org.hobwright.wizard.steps;

import java.util.ArrayList;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.function.Function;
import org.hobwright.api.check.Finding;
import org.hobwright.api.job.FieldDef;
import org.hobwright.api.job.JobFields;
import org.hobwright.api.wizard.StepId;

/**
 * The fields of each step: every field of the job table ({@link JobFields}), in its order, at the
 * step its key belongs to ({@link #stepOf(String)}). Key, type, unit, range, choices, default and
 * help are the table's; whether the numbers fit together is for the checks.
 */
public final class StepFields {
    /** Key of the machine choice. */
    public static final String MACHINE = JobFields.MACHINE.key();
    /** Key of the cycle template choice. */
    public static final String TEMPLATE = JobFields.CYCLE_TEMPLATE.key();
    /** Key of the job's length unit. */
    public static final String UNITS = JobFields.UNITS.key();

    private static final Map<StepId, List<FieldDef>> BY_STEP = byStep();

    private StepFields() {
    }

    private static Map<StepId, List<FieldDef>> byStep() {
        Map<StepId, List<FieldDef>> m = new EnumMap<>(StepId.class);
        for (StepId s : StepId.values()) {
            m.put(s, new ArrayList<>());
        }
        for (FieldDef f : JobFields.all()) {
            m.get(stepOf(f.key())).add(f);
        }
        m.replaceAll((s, l) -> List.copyOf(l));
        return m;
    }

    /** The fields of a step, in the order they are asked. */
    public static List<FieldDef> of(StepId step) {
        return BY_STEP.get(step);
    }

    /** Every field of every step, in order. */
    public static List<FieldDef> all() {
        return JobFields.all();
    }

    /** The field with this key. */
    public static Optional<FieldDef> find(String key) {
        return JobFields.find(key);
    }

    /**
     * True when a field applies to the answers so far: the gear's questions for a gear, the spline's
     * and the spline hob's for a spline, the custom rack factors only for the custom tooth system, the
     * tooth-thickness allowances only without a thickness series, the mating gear's other values only
     * with its tooth count. A field that does not apply is not asked, not checked and left out of the job.
     */
    public static boolean applies(String key, Answers answers) {
        return applies(key, answers::get);
    }

    /**
     * {@link #applies(String, Answers)} for answers given as a lookup from key to answer text.
     *
     * @param key    the field's key
     * @param answer the answer text of a key, empty when not answered
     * @return true when the field applies
     */
    public static boolean applies(String key, Function<String, String> answer) {
        if (!ofThePart(key, answer)) {
            return false;
        }
        if (key.startsWith("gear.custom.")) {
            return "custom".equals(answer.apply(JobFields.GEAR_TOOTH_SYSTEM.key()));
        }
        if (key.equals(JobFields.GEAR_THICKNESS_ALLOWANCE.key())
                || key.equals(JobFields.GEAR_THICKNESS_ALLOWANCE_LOWER.key())) {
            return answer.apply(JobFields.GEAR_THICKNESS_SERIES.key()).isBlank();
        }
        if (key.startsWith("gear.mate.") && !key.equals(JobFields.MATE_TEETH.key())) {
            return !answer.apply(JobFields.MATE_TEETH.key()).isBlank();
        }
        return true;
    }

    /**
     * True when a field belongs to the part kind answered ({@link JobFields#PART}): a gear job has no
     * spline questions, a spline job none of the gear's. A step shows only these fields.
     *
     * @param key    the field's key
     * @param answer the answer text of a key, empty when not answered
     * @return true when the field belongs to the part kind
     */
    public static boolean ofThePart(String key, Function<String, String> answer) {
        boolean spline = JobFields.PARTS.get(1).equals(answer.apply(JobFields.PART.key()));
        return key.startsWith("gear.") ? !spline : !splineOnly(key) || spline;
    }

    /** True for the keys only a spline job has: the spline's and the spline hob's. */
    public static boolean splineOnly(String key) {
        return key.startsWith("spline.") || key.equals(JobFields.HOB_ROOT.key())
                || key.equals(JobFields.HOB_TIP_RADIUS.key()) || key.equals(JobFields.HOB_ADDENDUM.key());
    }

    /** The step a job-file path (or a finding's field) belongs to; REVIEW for whole-job fields. */
    public static StepId stepOf(String path) {
        if (path.equals("name") || path.equals(UNITS) || path.equals(JobFields.PART.key()) || path.startsWith("gear")
                || path.startsWith("spline")) {
            return StepId.GEAR;
        }
        if (path.startsWith("hob")) {
            return StepId.CUTTER;
        }
        if (path.startsWith(MACHINE)) {
            return StepId.MACHINE;
        }
        if (path.startsWith("cycle")) {
            return StepId.CYCLE;
        }
        return StepId.REVIEW;
    }

    /**
     * The step at which a finding is shown and may block: the later of its field's step and the
     * step whose answers its check depends on, told by the code's prefix ({@code HOB_} needs the
     * hob, {@code MACHINE_} the machine, {@code PLAN_} the cycle). So a helical gear is not refused
     * at GEAR for a machine that has not been chosen yet; the finding waits for MACHINE.
     */
    public static StepId stepOf(Finding finding) {
        StepId field = stepOf(finding.field());
        String code = finding.code();
        StepId needs = code.startsWith("HOB_") ? StepId.CUTTER : code.startsWith("MACHINE_") ? StepId.MACHINE
                : code.startsWith("PLAN_") ? StepId.CYCLE : StepId.GEAR;
        return field.compareTo(needs) >= 0 ? field : needs;
    }

    /** A title for a step. */
    public static String title(StepId step) {
        return switch (step) {
            case GEAR -> "Gear from the drawing";
            case CUTTER -> "Hob";
            case MACHINE -> "Machine";
            case CYCLE -> "Cutting cycle";
            case REVIEW -> "Review";
        };
    }
}
