package org.hobwright.wizard.cli;

import org.hobwright.api.check.FindingCode;
import org.hobwright.api.check.Severity;

/** Finding codes of the terminal tool's own checks; listed in {@code wizard/FINDINGS.md}. */
public enum CliCode implements FindingCode {
    SIMULATION_INPUT("the simulate verb cannot simulate the job (unknown tooth system, no tip flat, ...)",
            "generating simulation"),
    SAMPLE_MISSING("the built-in sample job is not bundled in this build or cannot be read", "Hobwright build");

    private final String meaning;
    private final String source;

    CliCode(String meaning, String source) {
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
}
