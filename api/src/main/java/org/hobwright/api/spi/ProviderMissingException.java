package org.hobwright.api.spi;

/** Thrown when a required kind of provider is not on the class path or module path. */
public final class ProviderMissingException extends IllegalStateException {
    private static final long serialVersionUID = 1L;

    /** @param message names the missing kind and what to add */
    public ProviderMissingException(String message) {
        super(message);
    }
}
