package org.hobwright.wizard.run;

import org.hobwright.api.check.FindingCode;
import org.hobwright.api.check.Severity;

/**
 * Finding codes of posting and writing a run's outputs, for the terminal tool and a host session
 * alike; listed in {@code wizard/FINDINGS.md}.
 */
public enum RunCode implements FindingCode {
    OUTPUT_NO_WRITERS("no output writer was found on the class path", "Hobwright SPI"),
    OUTPUT_NAME_TWICE("two jobs of one run would write files of the same name", "common practice, no source"),
    OUTPUT_NO_JOBS("a write was asked for without any planned job", "Hobwright host session"),
    OUTPUT_JOB_HAS_ERRORS("a job of the write has error findings: nothing is written", "Hobwright host session"),
    OUTPUT_WRITE_FAILED("the output folder cannot be written: nothing is written", "Hobwright host session"),
    LIBRARY_NO_CUTTING_DATA("the cutting-data table has no row for that work and hob material",
            "Hobwright cutting-data table (wizard/README.md)");

    private final String meaning;
    private final String source;

    RunCode(String meaning, String source) {
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
