package org.hobwright.api.spi;

import org.hobwright.api.ApiStatus;

/**
 * What every provider found through {@link java.util.ServiceLoader} says about itself, so that
 * {@link Providers} can refuse one that needs a newer api than the host carries.
 */
@ApiStatus(since = "1.1")
public interface Provider {

    /** {@return stable identifier of the provider; by default its class name} */
    default String id() {
        return getClass().getName();
    }

    /**
     * The api version the provider was built against, {@code major.minor}. Implementations
     * return {@link Spi#API_VERSION}, which the compiler copies into their class. A provider
     * built before this method existed was built against the first api, {@code 1.0}.
     *
     * @return the api version the provider was built against, {@code major.minor}. Implementations
     */
    default String apiVersion() {
        return ApiVersion.FIRST.toString();
    }

    /** {@return the provider's own build version, e.g. {@code 0.2.0}; {@code unknown} when it does not say} */
    default String buildVersion() {
        return "unknown";
    }
}
