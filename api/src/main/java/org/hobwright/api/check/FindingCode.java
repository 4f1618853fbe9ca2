package org.hobwright.api.check;

import java.util.Optional;
import java.util.Set;
import org.hobwright.api.ApiStatus;

/**
 * A stable finding code with what it means, how much it matters and what it rests on. Each
 * module keeps its codes in an enum implementing this interface, and every code is listed in the
 * module's {@code FINDINGS.md}, generated from the enum. A code is never reused for another
 * meaning.
 */
@ApiStatus(since = "1.1")
public interface FindingCode {

    /** {@return the code as it appears in findings, e.g. {@code GEAR_UNDERCUT}} */
    String code();

    /** {@return the severity findings of this code have unless the case calls for another of {@link #severities()}} */
    Severity severity();

    /** {@return every severity findings of this code may take; by default only {@link #severity()}} */
    default Set<Severity> severities() {
        return Set.of(severity());
    }

    /** {@return what the code means, one line} */
    String meaning();

    /** {@return the standard, handbook or rule it rests on ("common practice, no source" for a rule of thumb)} */
    String source();

    /**
     * A finding with this code, its usual severity and its source.
     *
     * @param field   path of the input field concerned, e.g. {@code gear.profileShift}
     * @param message what is wrong, with the numbers
     * @param fix     what would fix it, or null
     * @return the finding
     */
    default Finding at(String field, String message, String fix) {
        return new Finding(severity(), code(), field, message, Optional.ofNullable(fix), source());
    }

    /**
     * A finding with this code for a case that sets its own severity and names the rule it rests on.
     *
     * @param severity one of {@link #severities()}
     * @param field    path of the input field concerned
     * @param message  what is wrong, with the numbers
     * @param fix      what would fix it, or null
     * @param source   the rule this case rests on
     * @return the finding
     * @throws IllegalArgumentException when the code never takes that severity
     */
    default Finding at(Severity severity, String field, String message, String fix, String source) {
        if (!severities().contains(severity)) {
            throw new IllegalArgumentException("finding code " + code() + " is never of severity " + severity.word());
        }
        return new Finding(severity, code(), field, message, Optional.ofNullable(fix), source);
    }
}
