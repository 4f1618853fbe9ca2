package org.hobwright.wizard.steps;

import org.hobwright.api.check.FindingCode;
import org.hobwright.api.check.Severity;

/**
 * Finding codes of the step model: answers checked one at a time, and the step model's own
 * remarks; listed in {@code wizard/FINDINGS.md}. Whole-job problems come with the readers' and the
 * checks' codes.
 */
public enum WizardCode implements FindingCode {
    WIZARD_VALUE_MISSING(Severity.ERROR, "a required answer was left empty", Sources.FORMAT),
    WIZARD_NOT_A_NUMBER(Severity.ERROR, "an answer that is not a number", Sources.FORMAT),
    WIZARD_NOT_A_WHOLE_NUMBER(Severity.ERROR, "an answer that is not a whole number", Sources.FORMAT),
    WIZARD_NOT_AN_ANGLE(Severity.ERROR, "an answer that is neither decimal degrees nor degrees-minutes-seconds",
            Sources.FORMAT),
    WIZARD_NOT_A_CHOICE(Severity.ERROR, "an answer that is not one of the field's choices", Sources.FORMAT),
    WIZARD_NOT_YES_OR_NO(Severity.ERROR, "an answer that is neither yes nor no", Sources.FORMAT),
    WIZARD_OUT_OF_RANGE(Severity.ERROR, "a number outside what the field can be at all", Sources.FORMAT),
    WIZARD_UNKNOWN_FIELD(Severity.ERROR, "an answer for a field the current step does not have", Sources.FORMAT),
    WIZARD_NO_PLANNER(Severity.ERROR, "no cycle planner was found to plan the job at REVIEW", "Hobwright SPI"),
    WIZARD_UNITS_CONVERTED(Severity.INFO, "a change of unit converted the length, feed and speed answers",
            Sources.FORMAT);

    private final Severity severity;
    private final String meaning;
    private final String source;

    WizardCode(Severity severity, String meaning, String source) {
        this.severity = severity;
        this.meaning = meaning;
        this.source = source;
    }

    @Override
    public String code() {
        return name();
    }

    @Override
    public Severity severity() {
        return severity;
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
        static final String FORMAT = "Hobwright job file format, version 1";
    }
}
