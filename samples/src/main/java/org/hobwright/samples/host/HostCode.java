package org.hobwright.samples.host;

import org.hobwright.api.check.FindingCode;
import org.hobwright.api.check.Severity;

/** Finding codes of the example host; listed in {@code samples/FINDINGS.md}. */
public enum HostCode implements FindingCode {
    HOST_WIZARD_VERSION(Severity.WARNING, "a wizard provider speaks another SPI version; it was skipped"),
    HOST_WIZARD_BROKEN(Severity.WARNING, "a wizard provider could not be loaded; it was skipped"),
    HOST_WRITER_FAILED(Severity.ERROR, "a writer failed with an exception; nothing of the job is written");

    private final Severity severity;
    private final String meaning;

    HostCode(Severity severity, String meaning) {
        this.severity = severity;
        this.meaning = meaning;
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
        return "example host";
    }
}
