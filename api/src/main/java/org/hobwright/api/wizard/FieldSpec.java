package org.hobwright.api.wizard;

import java.util.List;
import java.util.OptionalDouble;
import org.hobwright.api.ApiStatus;
import org.hobwright.api.internal.Checks;

/**
 * One field of a wizard step, described so any host can render it.
 *
 * @param key          stable key, the job-file path of the value (e.g. {@code gear.teeth})
 * @param label        short label in plain words
 * @param unit         unit shown beside the field ({@code mm}, {@code in}, {@code °}, {@code rpm}, or empty)
 * @param type         how the value is entered
 * @param defaultValue the default as text (empty when there is none and the field is optional)
 * @param choices      allowed values for {@link FieldType#CHOICE}, else empty
 * @param min          smallest allowed number, if any; allowed itself unless {@code minExclusive}
 * @param max          largest allowed number, if any (allowed itself)
 * @param required     true when the step cannot complete without a value
 * @param help         one or two sentences of help
 * @param minExclusive true when the number must be greater than {@code min} (e.g. a length that must
 *                     be greater than 0), false when {@code min} itself is allowed
 */
@ApiStatus(since = "1.0")
public record FieldSpec(String key, String label, String unit, FieldType type, String defaultValue,
                        List<String> choices, OptionalDouble min, OptionalDouble max, boolean required,
                        String help, @ApiStatus(since = "1.1") boolean minExclusive) {
    /**
     * Checks the components: a value out of range throws {@link IllegalArgumentException} naming the field and the
     * value.
     *
     * @param key stable key, the job-file path of the value (e.g. {@code gear.teeth})
     * @param label short label in plain words
     * @param unit unit shown beside the field ({@code mm}, {@code in}, {@code °}, {@code rpm}, or empty)
     * @param type how the value is entered
     * @param defaultValue the default as text (empty when there is none and the field is optional)
     * @param choices allowed values for {@link FieldType#CHOICE}, else empty
     * @param min smallest allowed number, if any; allowed itself unless {@code minExclusive}
     * @param max largest allowed number, if any (allowed itself)
     * @param required true when the step cannot complete without a value
     * @param help one or two sentences of help
     * @param minExclusive true when the number must be greater than {@code min} (e.g. a length that must be greater
     *     than 0), false when {@code min} itself is allowed
     */
    public FieldSpec {
        Checks.text("key", key);
        Checks.text("label", label);
        Checks.present("unit", unit);
        Checks.present("type", type);
        Checks.present("defaultValue", defaultValue);
        choices = List.copyOf(Checks.present("choices", choices));
        Checks.present("min", min);
        Checks.present("max", max);
        Checks.text("help", help);
        if (minExclusive && min.isEmpty()) {
            throw new IllegalArgumentException("minExclusive needs a min, field " + key);
        }
    }

    /**
     * A field whose {@code min}, when given, is allowed itself (as the first api had it).
     *
     * @param key stable key, the job-file path of the value (e.g. {@code gear.teeth})
     * @param label short label in plain words
     * @param unit unit shown beside the field ({@code mm}, {@code in}, {@code °}, {@code rpm}, or empty)
     * @param type how the value is entered
     * @param defaultValue the default as text (empty when there is none and the field is optional)
     * @param choices allowed values for {@link FieldType#CHOICE}, else empty
     * @param min smallest allowed number, if any; allowed itself unless {@code minExclusive}
     * @param max largest allowed number, if any (allowed itself)
     * @param required true when the step cannot complete without a value
     * @param help one or two sentences of help
     */
    public FieldSpec(String key, String label, String unit, FieldType type, String defaultValue,
                     List<String> choices, OptionalDouble min, OptionalDouble max, boolean required, String help) {
        this(key, label, unit, type, defaultValue, choices, min, max, required, help, false);
    }

    /**
     * True when a number is within this field's limits ({@code min}, exclusive when
     * {@code minExclusive}, and {@code max}).
     *
     * @param value the number
     * @return true when the limits allow it
     */
    @ApiStatus(since = "1.1")
    public boolean allows(double value) {
        boolean low = min.isPresent() && (minExclusive ? value <= min.getAsDouble() : value < min.getAsDouble());
        boolean high = max.isPresent() && value > max.getAsDouble();
        return Double.isFinite(value) && !low && !high;
    }
}
