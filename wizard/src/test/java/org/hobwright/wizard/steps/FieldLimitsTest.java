package org.hobwright.wizard.steps;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.math.BigDecimal;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.OptionalDouble;
import java.util.ServiceLoader;
import org.hobwright.api.check.Finding;
import org.hobwright.api.wizard.FieldSpec;
import org.hobwright.api.wizard.FieldType;
import org.hobwright.api.wizard.StepId;
import org.hobwright.api.wizard.Wizard;
import org.hobwright.api.wizard.WizardFactory;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The limits a field shows a host ({@link FieldSpec#min()}, {@link FieldSpec#minExclusive()},
 * {@link FieldSpec#max()}) are the limits the wizard enforces: typing a limit itself is refused
 * exactly when {@link FieldSpec#allows(double)} says so, on every numeric field of every step.
 */
class FieldLimitsTest {
    @TempDir
    Path home;

    @Test
    void everyShownLimitIsTheEnforcedLimit() {
        Wizard w = ServiceLoader.load(WizardFactory.class).findFirst().orElseThrow()
                .start(Map.of(WizardFactory.HOME, home.toString(), WizardFactory.START, WizardFactory.START_SAMPLE));
        int checked = 0;
        int exclusive = 0;
        while (w.view().id() != StepId.REVIEW) {
            for (FieldSpec f : w.view().fields()) {
                if (f.type() != FieldType.NUMBER && f.type() != FieldType.INTEGER && f.type() != FieldType.ANGLE) {
                    continue;
                }
                String before = w.value(f.key());
                checked += limit(w, f, f.min()) + limit(w, f, f.max());
                exclusive += f.minExclusive() ? 1 : 0;
                assertTrue(w.answer(f.key(), before).isEmpty(), () -> f.key() + ": the sample value again");
            }
            StepId step = w.view().id();
            assertTrue(w.next(true).moved(), () -> step + " completes with the sample's values");
        }
        assertTrue(checked >= 20, "limits checked: " + checked);
        assertTrue(exclusive >= 5, "fields that must be greater than their minimum (module, diameters...): "
                + exclusive);
    }

    @Test
    void aLengthMustBeGreaterThanZero() {
        Wizard w = ServiceLoader.load(WizardFactory.class).findFirst().orElseThrow()
                .start(Map.of(WizardFactory.HOME, home.toString()));
        FieldSpec width = w.view().fields().stream().filter(f -> f.key().equals("gear.faceWidth")).findFirst()
                .orElseThrow();
        assertEquals(OptionalDouble.of(0), width.min());
        assertTrue(width.minExclusive(), "a face width of 0 is no gear");
        assertTrue(Finding.anyError(w.answer("gear.faceWidth", "0")), "0 is refused");
        assertTrue(w.answer("gear.faceWidth", "0.1").isEmpty(), "a thin wheel is taken");
    }

    /** Answers a limit itself; returns 1 when the field has that limit. */
    private static int limit(Wizard w, FieldSpec f, OptionalDouble limit) {
        if (limit.isEmpty()) {
            return 0;
        }
        double value = limit.getAsDouble();
        String text = BigDecimal.valueOf(value).stripTrailingZeros().toPlainString();
        List<Finding> found = w.answer(f.key(), text);
        assertEquals(!f.allows(value), Finding.anyError(found),
                () -> f.key() + " = " + text + ": shown min " + f.min() + (f.minExclusive() ? " (exclusive)" : "")
                        + ", max " + f.max() + "; the wizard said " + found);
        return 1;
    }
}
