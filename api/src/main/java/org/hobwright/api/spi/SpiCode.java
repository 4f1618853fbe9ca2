package org.hobwright.api.spi;

import org.hobwright.api.ApiStatus;
import org.hobwright.api.check.FindingCode;
import org.hobwright.api.check.Severity;

/** Finding codes of the provider look-up ({@link Providers}); listed in {@code api/FINDINGS.md}. */
@ApiStatus(since = "1.1")
public enum SpiCode implements FindingCode {
    /** A provider failed to load, to state its version or to open a session; it was skipped. */
    SPI_PROVIDER_BROKEN("a provider could not be loaded, failed when asked for its version or could not open a"
            + " session; it was skipped"),
    /** A provider was built for another SPI version; it was skipped. */
    SPI_VERSION_MISMATCH("a provider was built for another SPI version; it was skipped"),
    /** A provider was built against a newer minor version of the api than the host's; it was skipped. */
    SPI_API_TOO_OLD("a provider was built against a newer minor api version than the host carries; it was skipped"),
    /** A provider was built against another major version of the api; it was skipped. */
    SPI_API_MAJOR_MISMATCH("a provider was built against another major api version; it was skipped");

    private final String meaning;

    SpiCode(String meaning) {
        this.meaning = meaning;
    }

    @Override
    public String code() {
        return name();
    }

    @Override
    public Severity severity() {
        return Severity.WARNING;
    }

    @Override
    public String meaning() {
        return meaning;
    }

    @Override
    public String source() {
        return "Hobwright SPI, api version rule (api/COMPATIBILITY.md)";
    }
}
