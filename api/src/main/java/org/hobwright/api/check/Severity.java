package org.hobwright.api.check;

import org.hobwright.api.ApiStatus;

/** How much a finding matters. */
@ApiStatus(since = "1.0")
public enum Severity {
    /** The job cannot be cut as entered; nothing is written. */
    ERROR,
    /** The job can be cut, but someone should look at this first. */
    WARNING,
    /** Worth knowing; no action needed. */
    INFO;

    /** {@return lower-case word used in reports: {@code error}, {@code warning}, {@code info}} */
    public String word() {
        return name().toLowerCase(java.util.Locale.ROOT);
    }
}
