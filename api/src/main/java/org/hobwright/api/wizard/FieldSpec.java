package org.hobwright.api.wizard;

import java.util.List;
import java.util.OptionalDouble;
import org.hobwright.api.Validate;

/**
 * One field of a wizard step, described so any host can render it.
 *
 * @param key          stable key, the job-file path of the value (e.g. {@code gear.teeth})
 * @param label        short label in plain words
 * @param unit         unit shown beside the field ({@code mm}, {@code in}, {@code °}, {@code rpm}, or empty)
 * @param type         how the value is entered
 * @param defaultValue the default as text (empty when there is none and the field is optional)
 * @param choices      allowed values for {@link FieldType#CHOICE}, else empty
 * @param min          smallest allowed number, if any
 * @param max          largest allowed number, if any
 * @param required     true when the step cannot complete without a value
 * @param help         one or two sentences of help
 */
public record FieldSpec(String key, String label, String unit, FieldType type, String defaultValue,
                        List<String> choices, OptionalDouble min, OptionalDouble max, boolean required,
                        String help) {
    public FieldSpec {
        Validate.text("key", key);
        Validate.text("label", label);
        Validate.present("unit", unit);
        Validate.present("type", type);
        Validate.present("defaultValue", defaultValue);
        choices = List.copyOf(Validate.present("choices", choices));
        Validate.present("min", min);
        Validate.present("max", max);
        Validate.text("help", help);
    }
}
