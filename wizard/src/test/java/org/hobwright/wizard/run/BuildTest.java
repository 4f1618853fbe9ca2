package org.hobwright.wizard.run;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

/** The version printed in every output and stated by the providers is the Maven project version. */
class BuildTest {
    @Test
    void buildVersionIsTheProjectVersion() {
        assertEquals(System.getProperty("hobwright.project.version"), Build.VERSION);
    }
}
