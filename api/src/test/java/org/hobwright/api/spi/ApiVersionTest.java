package org.hobwright.api.spi;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

/** The version the compatibility check names (api/pom.xml) is the one providers are told. */
class ApiVersionTest {
    @Test
    void theBuildsApiVersionIsTheConstant() {
        assertEquals(System.getProperty("hobwright.api.version"), Spi.API_VERSION);
        assertEquals(ApiVersion.parse(System.getProperty("hobwright.api.version")), ApiVersion.CURRENT);
    }
}
