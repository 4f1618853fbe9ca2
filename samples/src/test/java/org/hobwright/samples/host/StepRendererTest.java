package org.hobwright.samples.host;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.util.List;
import java.util.Map;
import org.hobwright.api.wizard.StepId;
import org.junit.jupiter.api.Test;

class StepRendererTest {

    private final StringWriter screen = new StringWriter();
    private final StepRenderer renderer = new StepRenderer(new PrintWriter(screen, true));

    private static AnswerSheet sheet(Map<String, String> answers, Map<String, String> host) {
        return new AnswerSheet(answers, host);
    }

    @Test
    void walksEveryStepInOrderAndGivesOnlyTheAnswersItHas() {
        FakeWizard w = new FakeWizard();
        WizardOutcome o = renderer.walk(w, sheet(Map.of(FakeWizard.keyOf(StepId.CUTTER), "32"), Map.of()));
        assertFalse(o.stopped());
        assertEquals(List.of(FakeWizard.keyOf(StepId.CUTTER)), w.answered());
        String text = screen.toString();
        int last = -1;
        for (StepId id : StepId.values()) {
            int at = text.indexOf("== " + id);
            assertTrue(at > last, "step " + id + " in order:\n" + text);
            last = at;
        }
        assertTrue(text.contains("CUTTER value = 32 mm"), text);
        assertTrue(text.contains("GEAR value = 20 mm   (default)"), text);
        assertTrue(text.contains("summary line"), text);
    }

    @Test
    void aRefusedAnswerStopsTheWalkWithItsFinding() {
        WizardOutcome o = renderer.walk(new FakeWizard(), sheet(Map.of(FakeWizard.keyOf(StepId.GEAR), "bad"), Map.of()));
        assertTrue(o.stopped());
        assertEquals("FAKE_BAD", o.findings().get(0).code());
        assertFalse(screen.toString().contains("== CUTTER"));
    }

    @Test
    void warningsBlockUnlessTheSheetAcceptsThem() {
        Map<String, String> few = Map.of(FakeWizard.keyOf(StepId.GEAR), "8");
        WizardOutcome blocked = renderer.walk(new FakeWizard(), sheet(few, Map.of()));
        assertTrue(blocked.stopped());
        assertEquals("FAKE_FEW", blocked.findings().get(0).code());
        WizardOutcome accepted = renderer.walk(new FakeWizard(), sheet(few, Map.of("acceptWarnings", "true")));
        assertFalse(accepted.stopped());
    }

    @Test
    void anAnswerThatMatchesNoFieldIsPointedOut() {
        renderer.walk(new FakeWizard(), sheet(Map.of("gear.teths", "30"), Map.of()));
        assertTrue(screen.toString().contains("\"gear.teths\" matched no field"), screen.toString());
    }
}
