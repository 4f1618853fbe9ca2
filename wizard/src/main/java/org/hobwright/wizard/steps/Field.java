package org.hobwright.wizard.steps;

import java.util.List;
import java.util.OptionalDouble;
import org.hobwright.api.wizard.FieldType;

/**
 * One field of the step model before the session fills in its default, unit and live choices.
 *
 * @param key      job-file path of the value, e.g. {@code gear.teeth}
 * @param label    short label in plain words
 * @param unit     what the number measures
 * @param type     how the value is entered
 * @param choices  fixed choices of a {@link FieldType#CHOICE} field (empty when the session supplies them)
 * @param min      smallest allowed number, if any
 * @param max      largest allowed number, if any
 * @param positive true when the number must be greater than 0 (shown as a minimum of 0)
 * @param required true when the step cannot complete without a value
 * @param help     one or two sentences of help
 */
public record Field(String key, String label, UnitKind unit, FieldType type, List<String> choices,
                    OptionalDouble min, OptionalDouble max, boolean positive, boolean required, String help) {
    public Field {
        choices = List.copyOf(choices);
    }

    /** A required field without limits or choices. */
    static Field of(String key, String label, UnitKind unit, FieldType type, String help) {
        return new Field(key, label, unit, type, List.of(), OptionalDouble.empty(), OptionalDouble.empty(), false,
                true, help);
    }

    /** This field limited to [min, max]. */
    Field range(double lo, double hi) {
        return new Field(key, label, unit, type, choices, OptionalDouble.of(lo), OptionalDouble.of(hi), positive,
                required, help);
    }

    /** This field limited to numbers of at least {@code lo}. */
    Field atLeast(double lo) {
        return new Field(key, label, unit, type, choices, OptionalDouble.of(lo), OptionalDouble.empty(), positive,
                required, help);
    }

    /** This field limited to numbers greater than 0. */
    Field aboveZero() {
        return new Field(key, label, unit, type, choices, OptionalDouble.of(0), max, true, required, help);
    }

    /** This field, optional. */
    Field optional() {
        return new Field(key, label, unit, type, choices, min, max, positive, false, help);
    }

    /** This field with fixed choices. */
    Field choices(List<String> values) {
        return new Field(key, label, unit, type, values, min, max, positive, required, help);
    }
}
