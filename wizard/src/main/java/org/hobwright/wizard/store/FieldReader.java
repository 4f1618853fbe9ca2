package org.hobwright.wizard.store;

import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.OptionalInt;
import org.hobwright.api.check.Finding;
import org.hobwright.api.job.FieldDef;
import org.hobwright.api.job.FieldDefault;
import org.hobwright.api.job.Units;
import org.hobwright.api.wizard.FieldType;
import org.hobwright.text.Decimal;
import org.hobwright.wizard.setup.Angles;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.node.ObjectNode;

/**
 * Reads the values of one object of a document by the field table ({@code JobFields},
 * {@code MachineFields}, {@code TemplateFields}): the JSON type, the range, the choices and the
 * default of each value come from its {@link FieldDef}. Units are converted once, here; every bad
 * value is a finding (never an exception). A value of the wrong JSON type, out of its range or not
 * one of its choices is an error of a readable file (exit code 1), like a missing required key.
 * Missing optional objects read as empty, so their keys take their defaults.
 */
final class FieldReader {
    private final JsonDocument doc;
    private final JsonNode node;
    private final String path;
    private final List<Finding> out;
    private final Units units;

    FieldReader(JsonDocument doc, JsonNode node, String path, List<Finding> out, Units units) {
        this.doc = doc;
        this.node = node == null ? doc.root().objectNode() : node;
        this.path = path;
        this.out = out;
        this.units = units;
    }

    /** The fields of the root object. */
    static FieldReader root(JsonDocument doc, List<Finding> out, Units units) {
        return new FieldReader(doc, doc.root(), "", out, units);
    }

    /** The fields of a child object (empty when absent or not an object: the structure check reports that). */
    FieldReader child(String key) {
        JsonNode c = node.get(key);
        return new FieldReader(doc, c != null && c.isObject() ? c : null, path(key), out, units);
    }

    /** The same object read with another length unit. */
    FieldReader withUnits(Units other) {
        return new FieldReader(doc, node, path, out, other);
    }

    Units units() {
        return units;
    }

    boolean has(String key) {
        return node.has(key);
    }

    boolean has(FieldDef f) {
        return node.has(f.leaf());
    }

    JsonNode raw(String key) {
        return node.get(key);
    }

    ObjectNode objectOrEmpty() {
        return node.isObject() ? (ObjectNode) node : doc.root().objectNode();
    }

    String path(String key) {
        return path.isEmpty() ? key : path + "." + key;
    }

    /** Adds an error finding about {@code key}. */
    void error(InputCode code, String key, String what, String fix) {
        out.add(code.at(path(key), doc.at(path(key)) + ": " + path(key) + " " + what, fix));
    }

    /** Adds a finding about the object itself (e.g. a conflict between two keys). */
    void problem(InputCode code, String key, String message, String fix) {
        out.add(code.at(path(key), doc.at(path(key)) + ": " + message, fix));
    }

    /** Reports a missing required key. */
    void missing(String key, String fix) {
        String where = path.isEmpty() ? doc.source() : doc.at(path);
        out.add(InputCode.INPUT_MISSING.at(path(key), where + ": " + path(key) + " is required", fix));
    }

    /** Reports a missing required field, with the table's label and proposal as the fix. */
    void missing(FieldDef f) {
        String example = f.dflt().hasValue() ? ", e.g. " + f.dflt().value(units) : "";
        missing(f.leaf(), "add \"" + f.leaf() + "\" (" + f.label().toLowerCase(java.util.Locale.ROOT) + ")" + example);
    }

    /** Checks that a text is a library name (it names a file); an error finding when not. */
    boolean checkName(String key, String name) {
        Optional<Finding> bad = Names.check(path(key), name);
        bad.ifPresent(b -> out.add(InputCode.INPUT_VALUE.at(path(key), doc.at(path(key)) + ": " + b.message(),
                b.fix().orElse(null))));
        return bad.isEmpty();
    }

    /**
     * Reads the {@code units} key of this object: {@code mm} or {@code in}. When it is missing
     * or wrong, adds an {@link InputCode#INPUT_UNITS} finding and returns empty.
     */
    Optional<Units> units(String key) {
        JsonNode v = node.get(key);
        if (v != null && v.isString() && (v.stringValue().equals("mm") || v.stringValue().equals("in"))) {
            return Optional.of(Units.fromSymbol(v.stringValue()));
        }
        String where = v == null ? (path.isEmpty() ? doc.source() : doc.at(path)) : doc.at(path(key));
        out.add(InputCode.INPUT_UNITS.at(path(key), where + ": " + path(key)
                + (v == null ? " is missing" : " is " + Shape.describe(v)) + "; it must be \"mm\" or \"in\"",
                "add \"units\": \"mm\" or \"units\": \"in\""));
        return Optional.empty();
    }

    // ---- texts and words ----

    /**
     * A text or choice field: empty when absent (with a finding when required), not a text, blank,
     * not one of the choices or not a library name.
     */
    Optional<String> text(FieldDef f) {
        JsonNode v = node.get(f.leaf());
        if (v == null) {
            if (f.required()) {
                missing(f);
            }
            return Optional.empty();
        }
        if (!v.isString()) {
            wrongType(f, v);
            return Optional.empty();
        }
        String t = v.stringValue().strip();
        if (t.isEmpty()) {
            error(InputCode.INPUT_VALUE, f.leaf(), "must not be empty", "add " + f.label().toLowerCase(
                    java.util.Locale.ROOT) + " or leave the key out");
            return Optional.empty();
        }
        if (!f.choices().isEmpty() && !f.choices().contains(t)) {
            error(InputCode.INPUT_CHOICE, f.leaf(), "\"" + t + "\" is not one of " + String.join(", ", f.choices()),
                    "use one of " + String.join(", ", f.choices()));
            return Optional.empty();
        }
        if (f.libraryName() && !checkName(f.leaf(), t)) {
            return Optional.empty();
        }
        return Optional.of(t);
    }

    /** A choice field with a default: the word given, else the default (empty when the word is bad). */
    Optional<String> word(FieldDef f) {
        return has(f) ? text(f) : Optional.of(f.dflt().value(units)).filter(s -> !s.isEmpty());
    }

    /** A yes/no field: the value given, else the table's default. */
    boolean bool(FieldDef f) {
        JsonNode v = node.get(f.leaf());
        if (v == null) {
            return f.dflt().value(units).equals("yes");
        }
        if (!v.isBoolean()) {
            wrongType(f, v);
            return false;
        }
        return v.booleanValue();
    }

    // ---- numbers ----

    /**
     * A number, angle or whole-number field in canonical units: the value given (converted and
     * checked against the field's range), else the table's default; empty when absent without a
     * default (with a finding when required) or when the value is bad (with a finding).
     */
    OptionalDouble number(FieldDef f) {
        JsonNode v = node.get(f.leaf());
        if (v == null) {
            if (f.required()) {
                missing(f);
                return OptionalDouble.empty();
            }
            return defaultOf(f);
        }
        double raw;
        if (f.type() == FieldType.ANGLE && v.isString()) {
            Optional<Double> deg = Angles.parse(v.stringValue());
            if (deg.isEmpty()) {
                error(InputCode.INPUT_ANGLE, f.leaf(), "\"" + v.stringValue() + "\" is not an angle",
                        "write degrees as 13.2368 or degrees-minutes-seconds as 13°14'12\" or \"13 14 12\"");
                return OptionalDouble.empty();
            }
            raw = deg.get();
        } else if (!v.isNumber() || f.type() == FieldType.INTEGER && v.doubleValue() != Math.rint(v.doubleValue())) {
            wrongType(f, v);
            return OptionalDouble.empty();
        } else {
            raw = v.doubleValue();
        }
        double canonical = f.unit().toCanonical(raw, units);
        if (!Double.isFinite(raw)) {
            error(InputCode.INPUT_VALUE, f.leaf(), "must be a finite number, was " + Decimal.readable(raw),
                    "enter " + RangeWords.of(f, units));
            return OptionalDouble.empty();
        }
        if (!f.range().contains(canonical)) {
            String unit = f.unit().symbol(units);
            error(InputCode.INPUT_VALUE, f.leaf(), "must be " + RangeWords.of(f, units) + ", was "
                    + Decimal.readable(raw) + RangeWords.suffix(unit), "enter " + RangeWords.of(f, units));
            return OptionalDouble.empty();
        }
        return OptionalDouble.of(canonical);
    }

    /** A number field that is required or has a default: NaN (an error finding is recorded) when bad. */
    double value(FieldDef f) {
        return number(f).orElse(Double.NaN);
    }

    /** A whole-number field: the value given or the default; empty when absent without one or bad. */
    OptionalInt integer(FieldDef f) {
        OptionalDouble d = number(f);
        return d.isPresent() ? OptionalInt.of((int) d.getAsDouble()) : OptionalInt.empty();
    }

    private OptionalDouble defaultOf(FieldDef f) {
        FieldDefault d = f.dflt();
        if (!d.hasValue()) {
            return OptionalDouble.empty();
        }
        return OptionalDouble.of(f.unit().toCanonical(Double.parseDouble(d.value(units)), units));
    }

    private void wrongType(FieldDef f, JsonNode v) {
        out.add(InputCode.INPUT_WRONG_TYPE.at(path(f.leaf()), doc.at(path(f.leaf())) + ": " + path(f.leaf())
                + " must be " + Shape.words(f.type()) + ", was " + Shape.describe(v), null));
    }

    /** A number for messages, readable at every magnitude. */
    static String format(double v) {
        return Decimal.readable(v);
    }
}
