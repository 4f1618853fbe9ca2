package org.hobwright.api.check;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Optional;
import java.util.Set;
import org.junit.jupiter.api.Test;

/** A finding built from a code carries the code's severity and source unless the case names its own. */
class FindingCodeTest {

    private enum Sample implements FindingCode {
        ONE_SEVERITY, TWO_SEVERITIES;

        @Override
        public String code() {
            return "SAMPLE_" + name();
        }

        @Override
        public Severity severity() {
            return Severity.WARNING;
        }

        @Override
        public Set<Severity> severities() {
            return this == ONE_SEVERITY ? Set.of(Severity.WARNING) : Set.of(Severity.WARNING, Severity.INFO);
        }

        @Override
        public String meaning() {
            return "a sample";
        }

        @Override
        public String source() {
            return "the sample rule";
        }
    }

    @Test
    void aFindingTakesTheCodesSeverityAndSource() {
        Finding f = Sample.ONE_SEVERITY.at("gear.teeth", "too few", "add teeth");
        assertEquals(new Finding(Severity.WARNING, "SAMPLE_ONE_SEVERITY", "gear.teeth", "too few",
                Optional.of("add teeth"), "the sample rule"), f);
        assertTrue(Sample.ONE_SEVERITY.at("job", "no fix", null).fix().isEmpty());
    }

    @Test
    void aCaseMayTakeAnotherAllowedSeverityAndSource() {
        Finding f = Sample.TWO_SEVERITIES.at(Severity.INFO, "cycle.cuttingSpeed", "lowered", null, "machine profile");
        assertEquals(Severity.INFO, f.severity());
        assertEquals("machine profile", f.source());
        assertThrows(IllegalArgumentException.class,
                () -> Sample.ONE_SEVERITY.at(Severity.ERROR, "job", "m", null, "s"));
        assertEquals(Set.of(Severity.WARNING), new FindingCode() {
            @Override
            public String code() {
                return "X";
            }

            @Override
            public Severity severity() {
                return Severity.WARNING;
            }

            @Override
            public String meaning() {
                return "m";
            }

            @Override
            public String source() {
                return "s";
            }
        }.severities(), "one severity unless the code says otherwise");
    }
}
