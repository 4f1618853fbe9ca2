package org.hobwright.post;

import static org.junit.jupiter.api.Assertions.assertTrue;

import org.hobwright.api.spi.Providers;
import org.junit.jupiter.api.Test;

class PostModuleTest {
    @Test
    void writersAreLoadableWithoutProblems() {
        Providers.Loaded<?> loaded = Providers.writers(PostModuleTest.class.getClassLoader());
        assertTrue(loaded.problems().isEmpty(), () -> "no broken providers: " + loaded.problems());
    }
}
