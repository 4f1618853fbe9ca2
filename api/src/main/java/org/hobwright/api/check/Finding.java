package org.hobwright.api.check;

import java.util.ArrayList;
import java.util.Collection;
import java.util.Comparator;
import java.util.List;
import java.util.Optional;
import org.hobwright.api.ApiStatus;
import org.hobwright.api.internal.Checks;

/**
 * One problem or remark about a job, found by a check.
 *
 * @param severity how much it matters
 * @param code     stable code, never reused for another meaning (e.g. {@code GEAR_UNDERCUT})
 * @param field    path of the input field concerned, e.g. {@code gear.profileShift}; {@code job} when none fits
 * @param message  what is wrong, in plain words, with the numbers
 * @param fix      what would fix it, when there is a suggestion
 * @param source   the standard, handbook or rule the check rests on
 *                 ("common practice, no source" for a rule of thumb)
 */
@ApiStatus(since = "1.0")
public record Finding(Severity severity, String code, String field, String message, Optional<String> fix,
                      String source) {

    /**
     * Checks the components: a value out of range throws {@link IllegalArgumentException} naming the field and the
     * value.
     *
     * @param severity how much it matters
     * @param code stable code, never reused for another meaning (e.g. {@code GEAR_UNDERCUT})
     * @param field path of the input field concerned, e.g. {@code gear.profileShift}; {@code job} when none fits
     * @param message what is wrong, in plain words, with the numbers
     * @param fix what would fix it, when there is a suggestion
     * @param source the standard, handbook or rule the check rests on ("common practice, no source" for a rule of
     *     thumb)
     */
    public Finding {
        Checks.present("severity", severity);
        Checks.text("code", code);
        Checks.text("field", field);
        Checks.text("message", message);
        Checks.present("fix", fix);
        Checks.text("source", source);
    }

    /**
     * An error finding.
     *
     * @param code stable code, never reused for another meaning (e.g. {@code GEAR_UNDERCUT})
     * @param field path of the input field concerned, e.g. {@code gear.profileShift}; {@code job} when none fits
     * @param message what is wrong, in plain words, with the numbers
     * @param fix what would fix it, when there is a suggestion
     * @param source the standard, handbook or rule the check rests on ("common practice, no source" for a rule of
     *     thumb)
     * @return an error finding
     */
    public static Finding error(String code, String field, String message, String fix, String source) {
        return new Finding(Severity.ERROR, code, field, message, Optional.ofNullable(fix), source);
    }

    /**
     * A warning finding.
     *
     * @param code stable code, never reused for another meaning (e.g. {@code GEAR_UNDERCUT})
     * @param field path of the input field concerned, e.g. {@code gear.profileShift}; {@code job} when none fits
     * @param message what is wrong, in plain words, with the numbers
     * @param fix what would fix it, when there is a suggestion
     * @param source the standard, handbook or rule the check rests on ("common practice, no source" for a rule of
     *     thumb)
     * @return A warning finding
     */
    public static Finding warning(String code, String field, String message, String fix, String source) {
        return new Finding(Severity.WARNING, code, field, message, Optional.ofNullable(fix), source);
    }

    /**
     * An info finding.
     *
     * @param code stable code, never reused for another meaning (e.g. {@code GEAR_UNDERCUT})
     * @param field path of the input field concerned, e.g. {@code gear.profileShift}; {@code job} when none fits
     * @param message what is wrong, in plain words, with the numbers
     * @param source the standard, handbook or rule the check rests on ("common practice, no source" for a rule of
     *     thumb)
     * @return an info finding
     */
    public static Finding info(String code, String field, String message, String source) {
        return new Finding(Severity.INFO, code, field, message, Optional.empty(), source);
    }

    /** {@return true when this finding is an error} */
    public boolean isError() {
        return severity == Severity.ERROR;
    }

    /**
     * True when any of the findings is an error.
     *
     * @param findings the findings
     * @return true when any of the findings is an error
     */
    public static boolean anyError(Collection<Finding> findings) {
        return findings.stream().anyMatch(Finding::isError);
    }

    /** {@return one line for a terminal: {@code error GEAR_UNDERCUT gear.teeth: message (fix: ...)}} */
    public String line() {
        return severity.word() + " " + code + " " + field + ": " + message
                + fix.map(f -> " (fix: " + f + ")").orElse("");
    }

    /** The same as {@link #line()}: one line, so that a list of findings prints readably. */
    @Override
    @ApiStatus(since = "1.1")
    public String toString() {
        return line();
    }

    /**
     * Findings as text, one {@link #line()} each, joined by line breaks.
     *
     * @param findings the findings
     * @return the lines; empty text for no findings
     */
    @ApiStatus(since = "1.1")
    public static String lines(Collection<Finding> findings) {
        StringBuilder sb = new StringBuilder();
        for (Finding f : findings) {
            if (sb.length() > 0) {
                sb.append(System.lineSeparator());
            }
            sb.append(f.line());
        }
        return sb.toString();
    }

    /**
     * An unmodifiable copy of the findings, errors first, then warnings, then remarks (stable).
     *
     * @param findings the findings
     * @return the sorted copy
     */
    @ApiStatus(since = "1.1")
    public static List<Finding> errorsFirst(Collection<Finding> findings) {
        List<Finding> out = new ArrayList<>(findings);
        out.sort(Comparator.comparing(Finding::severity));
        return List.copyOf(out);
    }
}
