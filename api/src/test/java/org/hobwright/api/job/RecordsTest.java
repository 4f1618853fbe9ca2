package org.hobwright.api.job;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Optional;
import java.util.OptionalDouble;
import java.util.OptionalInt;
import org.hobwright.api.cycle.CycleStep;
import org.hobwright.api.testkit.SampleJobs;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

class RecordsTest {

    private static GearSpec gear(int teeth, double module, double alpha) {
        return new GearSpec("p", teeth, new Pitch.Module(module), alpha, 0, Hand.RIGHT, 10, 0, 0, "iso53-a",
                Optional.empty(), OptionalDouble.empty(), OptionalDouble.empty(), OptionalInt.empty(),
                DrawingValues.NONE);
    }

    @Test
    void inchIsExactly25point4Millimetres() {
        // International yard and pound agreement (1959): 1 in = 25.4 mm exactly.
        assertEquals(25.4, Units.IN.toMm(1.0), 0.0);
        assertEquals(1.0, Units.IN.fromMm(25.4), 0.0);
        assertEquals(Units.IN, Units.fromSymbol("in"));
    }

    @Test
    void diametralPitchAndModuleConvert() {
        // m = 25.4 / P: P 12 -> 2.11667 mm; P 10 -> 2.54 mm (definition of diametral pitch)
        assertEquals(2.116666667, new Pitch.Diametral(12).moduleMm(), 1e-9);
        assertEquals(2.54, new Pitch.Diametral(10).moduleMm(), 1e-12);
        assertEquals(10.16, new Pitch.Module(2.5).diametralPitch(), 1e-12);
    }

    @ParameterizedTest
    @ValueSource(doubles = {0, -1, Double.NaN, Double.POSITIVE_INFINITY})
    void impossibleModuleIsRejectedNamingTheField(double m) {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> new Pitch.Module(m));
        assertTrue(e.getMessage().startsWith("module"), e.getMessage());
        assertTrue(e.getMessage().contains(String.valueOf(m)), e.getMessage());
    }

    @Test
    void zeroTeethAndAbsurdPressureAngleAreRejected() {
        assertTrue(assertThrows(IllegalArgumentException.class, () -> gear(0, 2, 20)).getMessage()
                .contains("teeth"));
        assertTrue(assertThrows(IllegalArgumentException.class, () -> gear(20, 2, 89)).getMessage()
                .contains("pressureAngle"));
    }

    @Test
    void customToothSystemNeedsItsProportions() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> new GearSpec("p", 20, new Pitch.Module(1), 20, 0, Hand.RIGHT, 10, 0, 0, "custom",
                        Optional.empty(), OptionalDouble.empty(), OptionalDouble.empty(), OptionalInt.empty(),
                        DrawingValues.NONE));
        assertTrue(e.getMessage().contains("customProportions"), e.getMessage());
    }

    @Test
    void signedHelixFollowsHand() {
        assertEquals(15, SampleJobs.gear(30, 2, 15, Hand.RIGHT, 0).signedHelixAngleDeg());
        assertEquals(-15, SampleJobs.gear(30, 2, 15, Hand.LEFT, 0).signedHelixAngleDeg());
        assertEquals(0, SampleJobs.gear(30, 2, 0, Hand.LEFT, 0).signedHelixAngleDeg());
    }

    @Test
    void machineLimitsMustBeOrdered() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> new MachineProfile("m", "d", 100, 50, 0, 10, 1, false, SampleJobs.machine(true).swivel(),
                        0, 10, 0, 10, OptionalDouble.empty(), 1, 1, 0, 1));
        assertTrue(e.getMessage().contains("workMinRpm"), e.getMessage());
    }

    @Test
    void commentStepIsOneLine() {
        assertThrows(IllegalArgumentException.class, () -> new CycleStep.Comment("a\nb"));
        assertEquals("comment", new CycleStep.Comment("ok").kind());
    }
}
