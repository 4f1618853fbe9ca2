package org.hobwright.api.spi;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.time.DateTimeException;
import java.time.LocalDate;
import java.util.Map;
import org.hobwright.api.job.HobJob;
import org.hobwright.api.testkit.SampleJobs;
import org.junit.jupiter.api.Test;

/** The date of a write context is a calendar date {@code YYYY-MM-DD}, as the JDK's ISO date parser reads it. */
class WriteContextTest {
    private static final HobJob JOB = SampleJobs.spurMetric();

    private static boolean accepted(String date) {
        try {
            new WriteContext(JOB, date, "0", Map.of());
            return true;
        } catch (IllegalArgumentException e) {
            return false;
        }
    }

    private static boolean jdkReads(String date) {
        try {
            return LocalDate.parse(date).toString().equals(date);
        } catch (DateTimeException e) {
            return false;
        }
    }

    @Test
    void acceptsExactlyTheDatesTheJdkParserReads() {
        for (int y : new int[] {1900, 1999, 2000, 2024, 2026, 2100}) {
            for (int m = 0; m <= 13; m++) {
                for (int d = 0; d <= 32; d++) {
                    String date = String.format("%04d-%02d-%02d", y, m, d);
                    assertEquals(jdkReads(date), accepted(date), date);
                }
            }
        }
        for (String bad : new String[] {"2026-1-01", "2026/12/01", "26-12-01", "2026-12-01T00:00", " 2026-12-01",
            "2026-12-0a", "+2026-12-1", "2026-12-01 "}) {
            assertEquals(jdkReads(bad), accepted(bad), bad);
        }
        assertThrows(IllegalArgumentException.class, () -> new WriteContext(JOB, "2026-02-30", "0", Map.of()));
    }
}
