package org.hobwright.api.internal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.OptionalDouble;
import java.util.OptionalInt;
import org.junit.jupiter.api.Test;

/** The optional forms of the checks: an absent value passes, a present one is checked like a plain value. */
class ChecksTest {

    @Test
    void absentValuesPassPresentOnesAreChecked() {
        assertEquals(OptionalDouble.empty(), Checks.positive("f", OptionalDouble.empty()));
        assertEquals(OptionalDouble.of(2), Checks.positive("f", OptionalDouble.of(2)));
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> Checks.positive("cycle.roughFeed", OptionalDouble.of(0)));
        assertEquals("cycle.roughFeed must be greater than 0, was 0.0", e.getMessage());
        assertThrows(IllegalArgumentException.class, () -> Checks.positive("f", OptionalDouble.of(Double.NaN)));

        assertEquals(OptionalDouble.of(45), Checks.range("hob.leadAngle", OptionalDouble.of(45), 0, 45));
        assertThrows(IllegalArgumentException.class, () -> Checks.range("f", OptionalDouble.of(45.1), 0, 45));

        assertEquals(OptionalInt.empty(), Checks.range("flankToleranceClass", OptionalInt.empty(), 1, 11));
        e = assertThrows(IllegalArgumentException.class,
                () -> Checks.range("flankToleranceClass", OptionalInt.of(12), 1, 11));
        assertEquals("flankToleranceClass must be between 1.0 and 11.0, was 12.0", e.getMessage());
        assertThrows(NullPointerException.class, () -> Checks.positive("f", (OptionalDouble) null));
    }
}
