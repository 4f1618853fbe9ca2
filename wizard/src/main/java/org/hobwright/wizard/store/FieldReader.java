package org.hobwright.wizard.store;

import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.OptionalInt;
import org.hobwright.api.check.Finding;
import org.hobwright.api.job.Units;
import org.hobwright.text.Decimal;
import org.hobwright.wizard.setup.Angles;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.node.ObjectNode;

/**
 * Reads the values of one object of a structurally checked document, converting units once and
 * turning every bad value into a finding (never an exception). Missing optional objects read as
 * empty, so their keys take their defaults.
 */
final class FieldReader {
    /** Metres per foot: 1 ft = 0.3048 m exactly (international yard and pound agreement, 1959). */
    static final double M_PER_FT = 0.3048;

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

    /** The fields of a child object (empty when absent). */
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
        if (v != null && (v.stringValue().equals("mm") || v.stringValue().equals("in"))) {
            return Optional.of(Units.fromSymbol(v.stringValue()));
        }
        String where = v == null ? (path.isEmpty() ? doc.source() : doc.at(path)) : doc.at(path(key));
        out.add(InputCode.INPUT_UNITS.at(path(key), where + ": " + path(key)
                + (v == null ? " is missing" : " is \"" + v.stringValue() + "\"") + "; it must be \"mm\" or \"in\"",
                "add \"units\": \"mm\" or \"units\": \"in\""));
        return Optional.empty();
    }

    // ---- texts ----

    Optional<String> text(String key) {
        JsonNode v = node.get(key);
        if (v == null) {
            return Optional.empty();
        }
        if (v.stringValue().isBlank()) {
            error(InputCode.INPUT_VALUE, key, "must not be empty", null);
            return Optional.empty();
        }
        return Optional.of(v.stringValue().strip());
    }

    Optional<String> requiredText(String key, String fix) {
        if (!has(key)) {
            missing(key, fix);
            return Optional.empty();
        }
        return text(key);
    }

    /** A word from a list of choices; reports the choices when it is none of them. */
    Optional<String> choice(String key, List<String> choices) {
        Optional<String> t = text(key);
        if (t.isPresent() && !choices.contains(t.get())) {
            error(InputCode.INPUT_CHOICE, key, "\"" + t.get() + "\" is not one of " + String.join(", ", choices),
                    "use one of " + String.join(", ", choices));
            return Optional.empty();
        }
        return t;
    }

    boolean bool(String key, boolean dflt) {
        JsonNode v = node.get(key);
        return v == null ? dflt : v.booleanValue();
    }

    // ---- numbers ----

    /** What a value is converted with. */
    enum Kind {
        /** A plain number (rpm, ratio, factor, seconds, micrometres). */
        PLAIN,
        /** A length in the file's units, read as mm. */
        LENGTH,
        /** A speed in the file's length units per minute, read as mm/min. */
        LENGTH_PER_MIN,
        /** A cutting speed: m/min in mm files, ft/min in inch files, read as m/min. */
        CUTTING_SPEED
    }

    double toCanonical(Kind kind, double v) {
        return switch (kind) {
            case PLAIN -> v;
            case LENGTH, LENGTH_PER_MIN -> units.toMm(v);
            case CUTTING_SPEED -> units == Units.IN ? v * M_PER_FT : v;
        };
    }

    /** An optional number, converted and checked against {@code limit}; empty when absent or bad. */
    OptionalDouble number(String key, Kind kind, Limit limit) {
        JsonNode v = node.get(key);
        if (v == null) {
            return OptionalDouble.empty();
        }
        double raw = v.doubleValue();
        return checked(key, raw, toCanonical(kind, raw), kind, limit);
    }

    /** A required number; NaN (never used further: an error finding is recorded) when absent or bad. */
    double required(String key, Kind kind, Limit limit, String fix) {
        if (!has(key)) {
            missing(key, fix);
            return Double.NaN;
        }
        return number(key, kind, limit).orElse(Double.NaN);
    }

    /** A number with a default (canonical units) when absent. */
    double number(String key, Kind kind, Limit limit, double dflt) {
        return has(key) ? number(key, kind, limit).orElse(Double.NaN) : dflt;
    }

    /** An optional angle: a number of degrees or a degrees-minutes-seconds text. */
    OptionalDouble angle(String key, Limit limit) {
        JsonNode v = node.get(key);
        if (v == null) {
            return OptionalDouble.empty();
        }
        if (v.isString()) {
            Optional<Double> deg = Angles.parse(v.stringValue());
            if (deg.isEmpty()) {
                error(InputCode.INPUT_ANGLE, key, "\"" + v.stringValue() + "\" is not an angle",
                        "write degrees as 13.2368 or degrees-minutes-seconds as 13°14'12\" or \"13 14 12\"");
                return OptionalDouble.empty();
            }
            return checked(key, deg.get(), deg.get(), Kind.PLAIN, limit);
        }
        return checked(key, v.doubleValue(), v.doubleValue(), Kind.PLAIN, limit);
    }

    double requiredAngle(String key, Limit limit, String fix) {
        if (!has(key)) {
            missing(key, fix);
            return Double.NaN;
        }
        return angle(key, limit).orElse(Double.NaN);
    }

    double angle(String key, Limit limit, double dflt) {
        return has(key) ? angle(key, limit).orElse(Double.NaN) : dflt;
    }

    OptionalInt integer(String key, int min, int max) {
        JsonNode v = node.get(key);
        if (v == null) {
            return OptionalInt.empty();
        }
        double d = v.doubleValue();
        if (d < min || d > max) {
            error(InputCode.INPUT_VALUE, key, "must be " + (max == Integer.MAX_VALUE ? "at least " + min
                    : "between " + min + " and " + max) + ", was " + format(d), null);
            return OptionalInt.empty();
        }
        return OptionalInt.of((int) d);
    }

    int requiredInt(String key, int min, int max, String fix) {
        if (!has(key)) {
            missing(key, fix);
            return min;
        }
        return integer(key, min, max).orElse(min);
    }

    int integer(String key, int min, int max, int dflt) {
        return has(key) ? integer(key, min, max).orElse(dflt) : dflt;
    }

    private OptionalDouble checked(String key, double raw, double canonical, Kind kind, Limit limit) {
        Optional<String> why = limit.violation(canonical, kind == Kind.PLAIN ? "" : unitWord(kind));
        if (why.isPresent()) {
            boolean sameUnit = kind == Kind.PLAIN || units == Units.MM && kind != Kind.CUTTING_SPEED;
            error(InputCode.INPUT_VALUE, key, why.get() + ", was " + format(raw)
                    + (sameUnit ? "" : " " + fileUnitWord(kind)), null);
            return OptionalDouble.empty();
        }
        return OptionalDouble.of(canonical);
    }

    private static String unitWord(Kind kind) {
        return switch (kind) {
            case LENGTH -> " mm";
            case LENGTH_PER_MIN -> " mm/min";
            case CUTTING_SPEED -> " m/min";
            case PLAIN -> "";
        };
    }

    private String fileUnitWord(Kind kind) {
        return switch (kind) {
            case LENGTH -> units.symbol();
            case LENGTH_PER_MIN -> units.symbol() + "/min";
            case CUTTING_SPEED -> units == Units.IN ? "ft/min" : "m/min";
            case PLAIN -> "";
        };
    }

    /** A value quoted in a message: its shortest exact text ({@link Decimal#exact}), e.g. {@code 0.0001}, {@code 24}. */
    static String format(double v) {
        return Double.isFinite(v) ? Decimal.exact(v) : Double.toString(v);
    }
}
