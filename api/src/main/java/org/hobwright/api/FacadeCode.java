package org.hobwright.api;

import org.hobwright.api.check.FindingCode;
import org.hobwright.api.check.Severity;

/** Finding codes of the façade {@link Hobwright} itself; listed in {@code api/FINDINGS.md}. */
@ApiStatus(since = "1.1")
public enum FacadeCode implements FindingCode {
    /** {@code SOURCE_DATE_EPOCH} is set but is not whole seconds since 1970: nothing is written. */
    OUTPUT_BAD_DATE("SOURCE_DATE_EPOCH is set but is not whole seconds since 1970; nothing is written",
            "reproducible-builds.org SOURCE_DATE_EPOCH specification");

    private final String meaning;
    private final String source;

    FacadeCode(String meaning, String source) {
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
