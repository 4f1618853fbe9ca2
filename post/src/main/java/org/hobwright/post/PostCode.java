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
    CSV_UNREADABLE("a cycle CSV that does not follow the cycle CSV contract", Sources.CSV),
    NC_DIALECT_MISSING("no dialect text for the machine's dialect", Sources.DIALECT),
    NC_DIALECT_UNREADABLE("a dialect file that is empty or not well-formed JSON", Sources.DIALECT),
    NC_DIALECT_FORMAT("\"format\" of a dialect missing or not hobwright-dialect", Sources.DIALECT),
    NC_DIALECT_VERSION("\"version\" of a dialect missing or not one this program reads", Sources.DIALECT),
    NC_DIALECT_MISSING_KEY("a required dialect key is missing", Sources.DIALECT),
    NC_DIALECT_BAD_VALUE("a dialect value that is not allowed (line ending, axis sign or letter, blank word or line)",
            Sources.DIALECT),
    NC_DIALECT_BAD_NUMBER("a dialect number outside its whole-number range", Sources.DIALECT),
    NC_DIALECT_UNKNOWN_TEMPLATE("a template name the dialect format does not define", Sources.DIALECT),
    NC_DIALECT_MISSING_TEMPLATE("a template the dialect or the cycle needs is missing", Sources.DIALECT),
    NC_DIALECT_UNKNOWN_PLACEHOLDER("a placeholder outside the fixed set", Sources.DIALECT),
    NC_DIALECT_BAD_TEMPLATE("a template that cannot be read, or a placeholder where it has no value", Sources.DIALECT),
    NC_LINE_TOO_LONG("a block longer than the dialect's maxLineLength", Sources.DIALECT),
    NC_SAFETY_CUT_WITHOUT_SYNC("a cutting move before the synchronisation is on", Sources.SAFETY),
    NC_SAFETY_STOP_WHILE_SYNCED("the spindles stop while still synchronised", Sources.SAFETY),
    NC_SAFETY_SYNC_LEFT_ON("the program ends with the spindles still synchronised", Sources.SAFETY),
    NC_SAFETY_BELOW_ROOT("a cutting move below the final infeed (root) diameter", Sources.SAFETY),
    NC_SAFETY_HOB_SPEED("hob speed outside the machine's hob spindle range or above the hob maker's limit",
            Sources.SAFETY),
    NC_SAFETY_WORK_SPEED("work speed outside the machine's work spindle range", Sources.SAFETY),
    NC_SAFETY_SYNC_RATIO("hob turns per work turn above the machine's largest ratio", Sources.SAFETY),
    NC_SAFETY_FEED_RATE("feed per revolution × work speed above the machine's largest feed", Sources.SAFETY);

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
