package org.hobwright.api.spi;

import org.hobwright.api.ApiStatus;

/** Versions of this SPI. Providers declare the api version they were built against. */
@ApiStatus(since = "1.0")
public final class Spi {
    /**
     * The api version of this jar, {@code major.minor} ({@link ApiVersion}). A provider returns
     * this constant from {@link Provider#apiVersion()}: the compiler copies its value into the
     * provider's class, so the provider keeps saying which api it was built against.
     */
    public static final String API_VERSION = "1.1";

    /**
     * The SPI generation of the first api, which providers still return from {@code spiVersion()}.
     * It is never raised again: {@link #API_VERSION} and {@link Provider#apiVersion()} carry the
     * version rule.
     */
    public static final int VERSION = 1;

    private Spi() {
    }
}
