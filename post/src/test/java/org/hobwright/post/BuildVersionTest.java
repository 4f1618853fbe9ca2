package org.hobwright.post;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

/** The build version the writers state is the Maven project version. */
class BuildVersionTest {
    @Test
    void writersStateTheProjectVersion() {
        assertEquals(System.getProperty("hobwright.project.version"), PostFindings.BUILD_VERSION);
    }
}
