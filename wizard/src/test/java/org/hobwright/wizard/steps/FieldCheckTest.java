package org.hobwright.wizard.steps;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Optional;
import org.hobwright.api.check.Finding;
import org.hobwright.api.job.FieldDef;
import org.hobwright.api.job.Units;
import org.hobwright.api.wizard.StepId;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

class FieldCheckTest {
    private static FieldDef field(String key) {
        return StepFields.find(key).orElseThrow();
    }

    private static Optional<String> code(String key, String text) {
        FieldDef f = field(key);
        return FieldCheck.check(f, text, f.choices(), Units.MM).map(Finding::code);
    }

    @ParameterizedTest(name = "{0} = \"{1}\" -> {2}")
    @CsvSource(nullValues = "ok", value = {
        "gear.teeth, 24, ok",
        "gear.teeth, 24.5, WIZARD_NOT_A_WHOLE_NUMBER",
        "gear.teeth, 0, WIZARD_OUT_OF_RANGE",
        "gear.faceWidth, '1,5', WIZARD_NOT_A_NUMBER",
        "gear.faceWidth, 0, WIZARD_OUT_OF_RANGE",
        "gear.faceWidth, 1.5, ok",
        "gear.helixAngle, '13°14''12\"', ok",
        "gear.helixAngle, 13 14 12, ok",
        "gear.helixAngle, 13°75', WIZARD_NOT_AN_ANGLE",
        "gear.helixAngle, 61, WIZARD_OUT_OF_RANGE",
        "gear.hand, up, WIZARD_NOT_A_CHOICE",
        "gear.toothSystem, agma-fine, ok",
        "cycle.coolant, maybe, WIZARD_NOT_YES_OR_NO",
        "cycle.coolant, Y, ok",
        "cycle.finishStock, 0, ok",
        "cycle.finishStock, -0.1, WIZARD_OUT_OF_RANGE",
        "gear.teeth, '', WIZARD_VALUE_MISSING",
        "gear.blankDiameter, '', ok"})
    void answersAreCheckedByTypeAndRange(String key, String text, String expected) {
        assertEquals(Optional.ofNullable(expected), code(key, text));
    }

    @Test
    void anOutOfRangeMessageNamesTheLimits() {
        Finding f = FieldCheck.check(field("gear.pressureAngle"), "50", List.of(), Units.MM).orElseThrow();
        assertEquals("gear.pressureAngle", f.field());
        assertTrue(f.message().contains("between 10 and 45°"), f.message());
    }

    @Test
    void everyFieldKeyBelongsToItsOwnStep() {
        for (StepId step : StepId.values()) {
            StepFields.of(step).forEach(f -> assertEquals(step, StepFields.stepOf(f.key()), f.key()));
        }
    }
}
