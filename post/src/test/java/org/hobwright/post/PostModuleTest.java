package org.hobwright.post;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.hobwright.api.spi.CycleWriter;
import org.hobwright.api.spi.Providers;
import org.hobwright.text.Decimal;
import org.junit.jupiter.api.Test;

class PostModuleTest {
    @Test
    void writersAreLoadableWithoutProblems() {
        Providers.Loaded<CycleWriter> loaded = Providers.writers(PostModuleTest.class.getClassLoader());
        assertTrue(loaded.problems().isEmpty(), () -> "no broken providers: " + loaded.problems());
        assertEquals(List.of("nc", "csv", "report", "sheet"), loaded.providers().stream().map(CycleWriter::id).toList());
    }

    @Test
    void decimalsIgnoreTheDefaultLocaleAndNeverWriteNegativeZero() {
        java.util.Locale before = java.util.Locale.getDefault();
        try {
            java.util.Locale.setDefault(java.util.Locale.GERMANY);
            assertEquals("1.500", Decimal.fixed(1.5, 3));
            assertEquals("0.000", Decimal.fixed(-0.0001, 3));
            assertEquals("24.", Decimal.fixed(24.0004, 3, false));
            assertEquals("27.771", Decimal.fixed(27.7705, 3), "half-up on the decimal a person reads");
            assertEquals("0.0001", Decimal.exact(1e-4));
            assertEquals("1200", Decimal.exact(1.2e3));
        } finally {
            java.util.Locale.setDefault(before);
        }
    }
}
