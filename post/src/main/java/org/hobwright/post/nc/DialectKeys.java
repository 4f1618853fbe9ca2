package org.hobwright.post.nc;

import java.util.List;
import java.util.Optional;

/**
 * Every key of a dialect file, defined once: the reader ({@link DialectLoader}) reads by this
 * table, the key table of {@code post/README.md} is this table (a test compares them), and
 * {@code samples/scenario/schema/dialect.schema.json} states the same keys, types, ranges and
 * choices (a test compares it too). The members of {@code templates} are the {@link TemplateKey}s,
 * each with its placeholders.
 */
public final class DialectKeys {

    /** What kind of value a key holds. */
    public enum Kind {
        /** A non-blank text (or, with choices, one of them). */
        TEXT,
        /** A text that may be empty. */
        ANY_TEXT,
        /** One to three ASCII letters: an address. */
        LETTERS,
        /** A whole number within the key's range. */
        INTEGER,
        /** {@code true} or {@code false}. */
        BOOLEAN,
        /** An object of further keys. */
        OBJECT,
        /** A list of texts, or one text for a list of one. */
        LINES,
        /** The templates: an object of {@link TemplateKey} names, each a text or a list of texts. */
        TEMPLATES
    }

    /**
     * One key.
     *
     * @param path     dotted path in the file, e.g. {@code axes.radial.sign}
     * @param kind     the kind of value
     * @param required true when the key must be present wherever its parent object is
     * @param min      smallest whole number (INTEGER only)
     * @param max      largest whole number (INTEGER only)
     * @param choices  the allowed values of a TEXT or INTEGER key, empty when any value in range is allowed
     * @param meaning  what it means, for the documentation and the schema
     */
    public record Key(String path, Kind kind, boolean required, long min, long max, List<String> choices,
                      String meaning) {
        public Key {
            choices = List.copyOf(choices);
        }

        /** The last part of the path. */
        public String name() {
            return path.substring(path.lastIndexOf('.') + 1);
        }

        /** The path of the parent object, "" for a key at the top. */
        public String parent() {
            int dot = path.lastIndexOf('.');
            return dot < 0 ? "" : path.substring(0, dot);
        }
    }

    /** The {@code format} every dialect file states. */
    public static final String FORMAT = "hobwright-dialect";

    /** The dialect version this reader reads. */
    public static final int VERSION = 2;

    /** Largest count of decimals a dialect may ask for (the helical addition two more). */
    static final int MAX_DECIMALS = 6;

    /** Largest program number or tool station a dialect may allow. */
    static final long MAX_NUMBER = 99_999_999;

    /** Every key, parents before their children. */
    public static final List<Key> ALL = List.of(
            text("$schema", false, "the file's JSON Schema, for editors; not read"),
            new Key("format", Kind.TEXT, true, 0, 0, List.of(FORMAT), "always " + FORMAT),
            new Key("version", Kind.INTEGER, true, VERSION, VERSION, List.of(), "the format's version, " + VERSION),
            text("name", true, "the dialect's name, as machine profiles name it"),
            new Key("description", Kind.ANY_TEXT, false, 0, 0, List.of(), "free text"),
            new Key("lineEnding", Kind.TEXT, true, 0, 0, List.of("lf", "crlf"), "line ending of the program"),
            integer("maxLineLength", true, 20, 1000, "longest block the control accepts, characters, line number"
                    + " included; comments are wrapped to it, any other longer block is an error"),
            object("lineNumbers", false, "block numbers; absent: none (prologue and epilogue lines never)"),
            letters("lineNumbers.word", "the address of the block number, e.g. N"),
            integer("lineNumbers.start", true, 0, MAX_NUMBER, "the first block number"),
            integer("lineNumbers.step", true, 1, 10_000, "the increment"),
            object("programNumber", true, "the numbers the control takes for a program"),
            integer("programNumber.default", true, 0, MAX_NUMBER, "the number used when the job and its template"
                    + " give none"),
            integer("programNumber.min", true, 0, MAX_NUMBER, "the smallest number the control takes"),
            integer("programNumber.max", true, 0, MAX_NUMBER, "the largest number the control takes"),
            object("toolStation", true, "the tool stations the hob can sit in"),
            integer("toolStation.default", true, 0, MAX_NUMBER, "the station used when the job and its template"
                    + " give none"),
            integer("toolStation.min", true, 0, MAX_NUMBER, "the lowest station"),
            integer("toolStation.max", true, 0, MAX_NUMBER, "the highest station"),
            object("decimals", true, "digits after the point of each kind of number"),
            decimals("decimals.mm", "lengths in a metric program"),
            decimals("decimals.in", "lengths in an inch program"),
            decimals("decimals.mmPerRev", "feeds in a metric program"),
            decimals("decimals.inPerRev", "feeds in an inch program"),
            decimals("decimals.deg", "angles"),
            integer("decimals.differential", true, 0, MAX_DECIMALS + 2, "the helical addition"),
            decimals("decimals.s", "dwell times"),
            decimals("decimals.rpm", "spindle speeds"),
            bool("trailingZeros", true, "true writes 24.000, false writes 24."),
            object("comments", true, "how comment text is cleaned"),
            bool("comments.upperCase", true, "comments in capitals"),
            new Key("comments.forbidden", Kind.ANY_TEXT, false, 0, 0, List.of(),
                    "characters replaced by a space in comment text (the comment delimiters, the program-end"
                            + " character)"),
            object("axes", true, "the axis letters and how they count"),
            object("axes.radial", true, "the radial axis: the work diameter the hob tip reaches"),
            letters("axes.radial.letter", "its address"),
            sign("axes.radial.sign", true),
            bool("axes.radial.diameter", false, "true: programmed as a diameter; false or absent: as a radius"),
            object("axes.axial", true, "the axis along the work: the hob centre from the gear's front face"),
            letters("axes.axial.letter", "its address"),
            sign("axes.axial.sign", true),
            object("axes.swivel", false, "the swivel axis, when the control positions it"),
            letters("axes.swivel.letter", "its address"),
            sign("axes.swivel.sign", false),
            object("axes.shift", false, "the hob-shift axis, when the machine has one"),
            letters("axes.shift.letter", "its address"),
            sign("axes.shift.sign", false),
            object("rotation", true, "the direction words of both spindles"),
            object("rotation.work", true, "the work spindle, senses seen from the gear's front face"),
            text("rotation.work.clockwise", true, "word for clockwise"),
            text("rotation.work.counterClockwise", true, "word for counter-clockwise"),
            object("rotation.hob", true, "the hob spindle, senses seen from its drive end"),
            text("rotation.hob.clockwise", true, "word for clockwise"),
            text("rotation.hob.counterClockwise", true, "word for counter-clockwise"),
            new Key("prologue", Kind.LINES, false, 0, 0, List.of(), "unnumbered lines before the program"),
            new Key("epilogue", Kind.LINES, false, 0, 0, List.of(), "unnumbered lines after the program"),
            new Key("templates", Kind.TEMPLATES, true, 0, 0, List.of(), "the line templates (post/README.md,"
                    + " \"Templates and their placeholders\")"));

    private DialectKeys() {
    }

    /** The key at a dotted path, if the format defines one. */
    public static Optional<Key> at(String path) {
        for (Key k : ALL) {
            if (k.path().equals(path)) {
                return Optional.of(k);
            }
        }
        return Optional.empty();
    }

    /** The keys directly inside an object ("" for the top). */
    public static List<Key> children(String parent) {
        return ALL.stream().filter(k -> k.parent().equals(parent)).toList();
    }

    private static Key text(String path, boolean required, String meaning) {
        return new Key(path, Kind.TEXT, required, 0, 0, List.of(), meaning);
    }

    private static Key letters(String path, String meaning) {
        return new Key(path, Kind.LETTERS, true, 0, 0, List.of(), meaning + ", 1 to 3 letters");
    }

    private static Key integer(String path, boolean required, long min, long max, String meaning) {
        return new Key(path, Kind.INTEGER, required, min, max, List.of(), meaning);
    }

    private static Key decimals(String path, String meaning) {
        return integer(path, true, 0, MAX_DECIMALS, meaning);
    }

    private static Key sign(String path, boolean required) {
        return new Key(path, Kind.INTEGER, required, -1, 1, List.of("1", "-1"),
                "1 when the axis counts like Hobwright's value, -1 when it counts the other way"
                        + (required ? "" : " (1 when absent)"));
    }

    private static Key bool(String path, boolean required, String meaning) {
        return new Key(path, Kind.BOOLEAN, required, 0, 0, List.of(), meaning);
    }

    private static Key object(String path, boolean required, String meaning) {
        return new Key(path, Kind.OBJECT, required, 0, 0, List.of(), meaning);
    }
}
