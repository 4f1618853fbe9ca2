package org.hobwright.api.spi;

import java.util.List;
import org.hobwright.api.ApiStatus;
import org.hobwright.api.check.Finding;

/** Thrown when a required kind of provider is not on the class path or module path. */
@ApiStatus(since = "1.0")
public final class ProviderMissingException extends IllegalStateException {
    private static final long serialVersionUID = 2L;

    /** The providers that were skipped, one finding each (not serialised). */
    private final transient List<Finding> problems;

    /** @param message names the missing kind and what to add */
    public ProviderMissingException(String message) {
        this(message, List.of());
    }

    /**
     * @param message  names the missing kind and what to add
     * @param problems the providers that were found but skipped, and why
     */
    @ApiStatus(since = "1.1")
    public ProviderMissingException(String message, List<Finding> problems) {
        super(message);
        this.problems = List.copyOf(problems);
    }

    /**
     * The providers that were found but skipped, one finding each (e.g. {@code SPI_API_TOO_OLD}).
     *
     * @return the findings, empty after deserialisation
     */
    public List<Finding> problems() {
        return problems == null ? List.of() : problems;
    }
}
