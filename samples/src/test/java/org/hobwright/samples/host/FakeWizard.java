package org.hobwright.samples.host;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalDouble;
import org.hobwright.api.check.Finding;
import org.hobwright.api.cycle.HobCycle;
import org.hobwright.api.job.HobJob;
import org.hobwright.api.wizard.FieldSpec;
import org.hobwright.api.wizard.FieldType;
import org.hobwright.api.wizard.StepId;
import org.hobwright.api.wizard.StepView;
import org.hobwright.api.wizard.Transition;
import org.hobwright.api.wizard.Wizard;

/**
 * A hand-written wizard for the renderer's tests: one integer field per step before REVIEW; the
 * answer "bad" is refused, a GEAR teeth count below 10 blocks the move with a warning.
 */
final class FakeWizard implements Wizard {
    private final Map<String, String> values = new HashMap<>();
    private final List<String> answered = new ArrayList<>();
    private int step;

    static String keyOf(StepId id) {
        return id.name().toLowerCase(java.util.Locale.ROOT) + ".value";
    }

    @Override
    public StepView view() {
        StepId id = StepId.values()[step];
        List<FieldSpec> fields = id == StepId.REVIEW ? List.of()
                : List.of(new FieldSpec(keyOf(id), id + " value", "mm", FieldType.INTEGER, "20", List.of(),
                        OptionalDouble.of(1), OptionalDouble.empty(), true, "a number"));
        return new StepView(id, "Step " + id, fields, List.of(),
                id == StepId.REVIEW ? List.of("summary line") : List.of());
    }

    @Override
    public List<Finding> answer(String key, String text) {
        if (text.equals("bad")) {
            return List.of(Finding.error("FAKE_BAD", key, "not a number", "type digits", "test"));
        }
        values.put(key, text);
        answered.add(key);
        return List.of();
    }

    @Override
    public String value(String key) {
        return values.getOrDefault(key, "20");
    }

    @Override
    public Transition next(boolean acceptWarnings) {
        if (step == 0 && Integer.parseInt(value(keyOf(StepId.GEAR))) < 10 && !acceptWarnings) {
            return new Transition(false, StepId.GEAR,
                    List.of(Finding.warning("FAKE_FEW", keyOf(StepId.GEAR), "few teeth", null, "test")));
        }
        step++;
        return new Transition(true, StepId.values()[step], List.of());
    }

    @Override
    public Transition back() {
        step = Math.max(0, step - 1);
        return new Transition(true, StepId.values()[step], List.of());
    }

    @Override
    public Optional<HobJob> job() {
        return Optional.empty();
    }

    @Override
    public Optional<HobCycle> cycle() {
        return Optional.empty();
    }

    List<String> answered() {
        return answered;
    }
}
