package org.hobwright.api.spi;

/** Version of this SPI. Providers declare the version they were built for. */
public final class Spi {
    /** The SPI version of this api jar. Raised only when a provider must change to stay correct. */
    public static final int VERSION = 1;

    private Spi() {
    }
}
