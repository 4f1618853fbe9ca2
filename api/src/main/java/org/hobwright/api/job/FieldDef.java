package org.hobwright.api.job;

import org.hobwright.api.ApiStatus;

import java.util.List;
import java.util.Objects;
import java.util.Optional;
import org.hobwright.api.wizard.FieldType;

/**
 * One field of a Hobwright file (job, machine profile or cycle template), defined once: the
 * readers, the writer, the wizard's questions and the JSON schemas follow from it. The tables are
 * {@link JobFields}, {@link MachineFields} and {@link TemplateFields}.
 *
 * @param key         path of the value in its file, e.g. {@code gear.teeth} or {@code travel.radialMax}
 * @param type        how the value is written and entered
 * @param unit        what a number measures (its unit follows the file's units)
 * @param range       the allowed numbers, canonical units ({@link FieldRange#ANY} for other types)
 * @param choices     the allowed words of a {@link FieldType#CHOICE} field (empty when the library
 *                    supplies them, e.g. the machine names)
 * @param required    true when a file must state the value (a default is then only the wizard's proposal)
 * @param dflt        the default and where it comes from
 * @param libraryName true when the text names a library entry or a file (letters, digits, '.', '_', '-')
 * @param label       short label in plain words
 * @param help        one or two sentences of help
 */
@ApiStatus(since = "1.1")
public record FieldDef(String key, FieldType type, UnitKind unit, FieldRange range, List<String> choices,
                       boolean required, FieldDefault dflt, boolean libraryName, String label, String help) {
    /**
     * Checks the components: a value out of range throws {@link IllegalArgumentException} naming the field and the
     * value.
     *
     * @param key path of the value in its file, e.g. {@code gear.teeth} or {@code travel.radialMax}
     * @param type how the value is written and entered
     * @param unit what a number measures (its unit follows the file's units)
     * @param range the allowed numbers, canonical units ({@link FieldRange#ANY} for other types)
     * @param choices the allowed words of a {@link FieldType#CHOICE} field (empty when the library supplies them,
     *     e.g. the machine names)
     * @param required true when a file must state the value (a default is then only the wizard's proposal)
     * @param dflt the default and where it comes from
     * @param libraryName true when the text names a library entry or a file (letters, digits, '.', '_', '-')
     * @param label short label in plain words
     * @param help one or two sentences of help
     */
    public FieldDef {
        Objects.requireNonNull(key, "key");
        Objects.requireNonNull(type, "type");
        Objects.requireNonNull(unit, "unit");
        Objects.requireNonNull(range, "range");
        choices = List.copyOf(choices);
        Objects.requireNonNull(dflt, "dflt");
        Objects.requireNonNull(label, "label");
        Objects.requireNonNull(help, "help");
    }

    /** A field of the given type, optional, without limits, choices or default, not yet labelled. */
    static FieldDef of(String key, FieldType type, UnitKind unit) {
        return new FieldDef(key, type, unit, FieldRange.ANY, List.of(), false,
                FieldDefault.unused("not used"), false, key, key);
    }

    /** The field of {@code fields} with this key. */
    static Optional<FieldDef> find(List<FieldDef> fields, String key) {
        for (FieldDef f : fields) {
            if (f.key().equals(key)) {
                return Optional.of(f);
            }
        }
        return Optional.empty();
    }

    /** {@return the last part of the key, as written in its object, e.g. {@code teeth}} */
    public String leaf() {
        return key.substring(key.lastIndexOf('.') + 1);
    }

    /** {@return true for the numeric types (number, whole number, angle)} */
    public boolean numeric() {
        return type == FieldType.NUMBER || type == FieldType.INTEGER || type == FieldType.ANGLE;
    }

    /** This field limited to {@code range}. */
    FieldDef range(FieldRange r) {
        return new FieldDef(key, type, unit, r, choices, required, dflt, libraryName, label, help);
    }

    /** This field limited to [lo, hi]. */
    FieldDef range(double lo, double hi) {
        return range(FieldRange.of(lo, hi));
    }

    /** This field with fixed choices. */
    FieldDef choices(List<String> words) {
        return new FieldDef(key, type, unit, range, words, required, dflt, libraryName, label, help);
    }

    /** This field, required, with no default. */
    FieldDef mustGive() {
        return new FieldDef(key, type, unit, range, choices, true, FieldDefault.NONE, libraryName, label, help);
    }

    /** This field, required, with a proposal for the wizard. */
    FieldDef required(FieldDefault proposal) {
        return new FieldDef(key, type, unit, range, choices, true, proposal, libraryName, label, help);
    }

    /** This field, optional, with a default. */
    FieldDef optional(FieldDefault d) {
        return new FieldDef(key, type, unit, range, choices, false, d, libraryName, label, help);
    }

    /** This field naming a library entry. */
    FieldDef namesLibraryEntry() {
        return new FieldDef(key, type, unit, range, choices, required, dflt, true, label, help);
    }

    /** This field with its label and help. */
    FieldDef text(String shortLabel, String helpText) {
        return new FieldDef(key, type, unit, range, choices, required, dflt, libraryName, shortLabel, helpText);
    }
}
