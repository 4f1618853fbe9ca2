package org.hobwright.post;

import org.hobwright.api.check.FindingCode;
import org.hobwright.api.check.Severity;

/**
 * Finding codes of the writers; listed in {@code post/FINDINGS.md}. Every one is an error: the
 * writer refuses and writes nothing.
 */
public enum PostCode implements FindingCode {
    POST_CYCLE_HAS_ERRORS("the cycle has error findings; no writer writes it", Sources.POST),
    POST_CYCLE_INCOMPLETE("the cycle has no steps, setup values, gear data or summary", Sources.POST),
    POST_CYCLE_OTHER_JOB("the cycle was planned for another job than the one it is to be written with",
            Sources.POST),
    CSV_UNREADABLE("a cycle CSV that does not follow the cycle CSV contract", Sources.CSV),
    NC_DIALECT_MISSING("no dialect text for the machine's dialect", Sources.DIALECT),
    NC_DIALECT_UNREADABLE("a dialect file that is empty, not well-formed JSON or has a key twice", Sources.DIALECT),
    NC_DIALECT_FORMAT("\"format\" of a dialect missing or not hobwright-dialect", Sources.DIALECT),
    NC_DIALECT_VERSION("\"version\" of a dialect missing or not one this program reads", Sources.DIALECT),
    NC_DIALECT_MISSING_KEY("a required dialect key is missing", Sources.DIALECT),
    NC_DIALECT_UNKNOWN_KEY("a key the dialect format does not define", Sources.DIALECT),
    NC_DIALECT_BAD_VALUE("a dialect value of the wrong kind or not allowed (line ending, axis letter, blank word"
            + " or line)",
            Sources.DIALECT),
    NC_DIALECT_BAD_NUMBER("a dialect number outside its whole-number range", Sources.DIALECT),
    NC_DIALECT_UNKNOWN_TEMPLATE("a template name the dialect format does not define", Sources.DIALECT),
    NC_DIALECT_MISSING_TEMPLATE("a template the dialect or the cycle needs is missing", Sources.DIALECT),
    NC_DIALECT_UNKNOWN_PLACEHOLDER("a placeholder outside the fixed set", Sources.DIALECT),
    NC_DIALECT_BAD_TEMPLATE("a template that cannot be read, or a placeholder where it has no value", Sources.DIALECT),
    NC_PROGRAM_NUMBER("a program number the dialect's control cannot take", Sources.DIALECT),
    NC_TOOL_STATION("a tool station the dialect's control does not have", Sources.DIALECT),
    NC_PROGRAM_TOO_LONG("a cycle with more steps than a program may have (20,000 operations)",
            Sources.POST),
    NC_LINE_TOO_LONG("a block longer than the dialect's maxLineLength", Sources.DIALECT),
    NC_SAFETY_CUT_WITHOUT_SYNC("a feed move before the synchronisation is on", Sources.SAFETY),
    NC_SAFETY_SETTLE("less dwell than the machine's settle time between the synchronisation and the first feed",
            Sources.SAFETY),
    NC_SAFETY_STOP_WHILE_SYNCED("the spindles stop while still synchronised", Sources.SAFETY),
    NC_SAFETY_SYNC_LEFT_ON("the program ends with the spindles still synchronised", Sources.SAFETY),
    NC_SAFETY_BELOW_ROOT("a feed or rapid inside the final infeed (root) diameter", Sources.SAFETY),
    NC_SAFETY_RAPID_IN_BLANK("a rapid that brings the hob into the blank", Sources.SAFETY),
    NC_SAFETY_HOB_SPEED("hob speed word not above zero, outside the machine's hob spindle range or above the hob"
            + " maker's limit (also through the ratio)", Sources.SAFETY),
    NC_SAFETY_WORK_SPEED("work speed word not above zero or outside the machine's work spindle range (also through"
            + " the ratio)", Sources.SAFETY),
    NC_SAFETY_SYNC_RATIO("hob turns per work turn above the machine's largest ratio", Sources.SAFETY),
    NC_SAFETY_FEED_RATE("feed word not above zero, or feed per revolution × work speed above the machine's largest"
            + " feed", Sources.SAFETY),
    NC_SAFETY_PRECISION("a planned value that keeps an invariant, but no number the dialect's decimals can write"
            + " does (names the word, the value and the decimals)", Sources.SAFETY);

    private final String meaning;
    private final String source;

    PostCode(String meaning, String source) {
        this.meaning = meaning;
        this.source = source;
    }

    @Override
    public String code() {
        return name();
    }

    @Override
    public Severity severity() {
        return Severity.ERROR;
    }

    @Override
    public String meaning() {
        return meaning;
    }

    @Override
    public String source() {
        return source;
    }

    /** The source texts the codes share. */
    private static final class Sources {
        static final String POST = "Hobwright post";
        static final String CSV = "Hobwright cycle CSV, post/README.md";
        static final String DIALECT = "Hobwright dialect format, post/README.md";
        static final String SAFETY = "Hobwright NC safety invariants (post/README.md, safety)";
    }
}
