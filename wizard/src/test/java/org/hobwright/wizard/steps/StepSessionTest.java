package org.hobwright.wizard.steps;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.mockito.ArgumentMatchers.any;
import static org.mockito.ArgumentMatchers.argThat;
import static org.mockito.Mockito.doReturn;
import static org.mockito.Mockito.inOrder;
import static org.mockito.Mockito.mock;
import static org.mockito.Mockito.spy;
import static org.mockito.Mockito.when;

import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.hobwright.api.check.Finding;
import org.hobwright.api.cycle.HobCycle;
import org.hobwright.api.wizard.StepId;
import org.hobwright.api.wizard.StepView;
import org.hobwright.api.wizard.Transition;
import org.hobwright.api.wizard.Wizard;
import org.hobwright.wizard.store.Library;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.mockito.InOrder;

/** A mocked host renderer drives the step model over the real job reader and library. */
class StepSessionTest {
    private static final Finding PLAN_WARNING = Finding.warning("TEST_PLAN_WARNING", "cycle.roughFeed",
            "a warning the planner gave", "lower the feed", "common practice, no source");
    private static final Finding PLAN_INFO = Finding.info("TEST_PLAN_INFO", "job", "a remark of the planner",
            "common practice, no source");

    @TempDir
    Path home;

    private StepServices services;
    private HostRenderer host;

    @BeforeEach
    void setUp() {
        LibraryServices real = new LibraryServices(Library.open(Optional.of(home), Map.of(), home),
                getClass().getClassLoader());
        services = spy(real);
        HobCycle planned = new HobCycle(Optional.empty(), Optional.empty(), Optional.empty(), Optional.empty(),
                List.of(), Optional.empty(), Optional.empty(), List.of(PLAN_WARNING, PLAN_INFO));
        doReturn(planned).when(services).plan(any());
        host = mock(HostRenderer.class);
        when(host.answer(any())).thenReturn(Optional.empty());
        when(host.acceptWarnings(any())).thenReturn(true);
    }

    private Wizard session() {
        return new StepSession(services, StepWizardFactory.sampleAnswers());
    }

    /** What a host does: render, answer each field, complete the step, accept warnings when the user does. */
    private void drive(Wizard w) {
        for (int i = 0; i < 20 && w.view().id() != StepId.REVIEW; i++) {
            StepView v = w.view();
            host.render(v);
            if (host.back(v)) {
                w.back();
                continue;
            }
            v.fields().forEach(f -> host.answer(f).ifPresent(a -> w.answer(f.key(), a)));
            Transition t = w.next(false);
            if (!t.moved() && !Finding.anyError(t.findings()) && host.acceptWarnings(t.findings())) {
                w.next(true);
            }
        }
        host.render(w.view());
    }

    @Test
    void stepsAreShownInOrderFromGearToReview() {
        drive(session());
        InOrder order = inOrder(host);
        for (StepId id : StepId.values()) {
            order.verify(host).render(argThat(v -> v != null && v.id() == id));
        }
    }

    private static org.mockito.ArgumentMatcher<StepView> on(StepId id) {
        return v -> v != null && v.id() == id;
    }

    @Test
    void anErrorBlocksNextWhileTheHostRendersTheStepAgain() {
        // first GEAR visit: module and diametral pitch both given (job file format: exactly one)
        when(host.answer(argThat(f -> f != null && f.key().equals("gear.diametralPitch"))))
                .thenReturn(Optional.of("25.4")).thenReturn(Optional.of(""));
        drive(session());
        InOrder order = inOrder(host);
        order.verify(host).render(argThat(on(StepId.GEAR)));
        order.verify(host).render(argThat(v -> v != null && v.id() == StepId.GEAR
                && v.findings().stream().anyMatch(f -> f.isError() && f.field().startsWith("gear."))));
        order.verify(host).render(argThat(on(StepId.CUTTER)));
        order.verify(host).render(argThat(on(StepId.REVIEW)));
    }

    @Test
    void backFromTheHostKeepsAnswersAndChecksTheStepAgain() {
        when(host.back(argThat(on(StepId.CUTTER)))).thenReturn(true, false);
        when(host.answer(argThat(f -> f != null && f.key().equals("hob.gashes")))).thenReturn(Optional.of("14"));
        // after going back, the host enters a pitch that conflicts: completing GEAR again finds it
        when(host.answer(argThat(f -> f != null && f.key().equals("gear.diametralPitch"))))
                .thenReturn(Optional.empty()).thenReturn(Optional.of("25.4")).thenReturn(Optional.of(""));
        Wizard w = session();
        drive(w);
        InOrder order = inOrder(host);
        order.verify(host).render(argThat(on(StepId.GEAR)));
        order.verify(host).render(argThat(on(StepId.CUTTER)));
        order.verify(host).render(argThat(on(StepId.GEAR)));
        order.verify(host).render(argThat(v -> v != null && v.id() == StepId.GEAR && Finding.anyError(v.findings())));
        order.verify(host).render(argThat(on(StepId.CUTTER)));
        order.verify(host).render(argThat(on(StepId.REVIEW)));
        assertEquals("14", w.value("hob.gashes"));
    }

    @Test
    void theSampleFillsEveryRequiredFieldWithAUnit() {
        StepView gear = session().view();
        assertEquals(StepId.GEAR, gear.id());
        var teeth = gear.fields().stream().filter(f -> f.key().equals("gear.teeth")).findFirst().orElseThrow();
        assertEquals("24", teeth.defaultValue());           // samples/scenario/jobs/metering-pump-gear.json
        var face = gear.fields().stream().filter(f -> f.key().equals("gear.faceWidth")).findFirst().orElseThrow();
        assertEquals("mm", face.unit());
        gear.fields().stream().filter(f -> f.required())
                .forEach(f -> assertFalse(f.defaultValue().isEmpty(), f.key() + " has no default"));
    }

    @Test
    void aBadAnswerIsRefusedAtOnceAndKeepsTheOldValue() {
        Wizard w = session();
        List<Finding> f = w.answer("gear.teeth", "twenty");
        assertEquals("WIZARD_NOT_A_WHOLE_NUMBER", f.get(0).code());
        assertEquals("24", w.value("gear.teeth"));
        assertEquals("WIZARD_OUT_OF_RANGE", w.answer("gear.pressureAngle", "50").get(0).code());
        assertTrue(w.answer("gear.pressureAngle", "14°30'").isEmpty());
        assertEquals("14°30'", w.value("gear.pressureAngle"));
    }

    @Test
    void theHobFollowsTheGearsPitchAndPressureAngleUntilAnsweredOtherwise() {
        Wizard w = session();
        assertTrue(w.answer("gear.module", "0.8").isEmpty());
        assertEquals("0.8", w.value("hob.module"), "a hob must match the gear's normal module");
        assertTrue(w.answer("gear.pressureAngle", "14.5").isEmpty());
        assertEquals("14.5", w.value("hob.pressureAngle"));
        assertTrue(w.answer("gear.pressureAngle", "20").isEmpty());
        assertEquals("20", w.value("hob.pressureAngle"));
        assertTrue(w.answer("gear.blankDiameter", "20.8").isEmpty());   // tip of 24 teeth, module 0.8
        Transition t = w.next(true);
        assertTrue(t.moved(), t::toString);
        assertTrue(w.answer("hob.module", "1.0").isEmpty());   // a deliberate mismatch stays
        assertTrue(w.back().moved());
        assertTrue(w.answer("gear.module", "0.5").isEmpty());
        assertEquals("1.0", w.value("hob.module"));
    }

    @Test
    void anErrorOfTheJobBlocksNext() {
        Wizard w = session();
        // module and diametral pitch both given: exactly one gives the pitch (job file format, version 1)
        assertTrue(w.answer("gear.diametralPitch", "25.4").isEmpty());
        Transition t = w.next(true);
        assertFalse(t.moved());
        assertEquals(StepId.GEAR, t.current());
        assertTrue(t.findings().stream().anyMatch(f -> f.isError() && f.field().startsWith("gear.")), t::toString);
        assertTrue(w.answer("gear.diametralPitch", "").isEmpty());
        assertTrue(w.next(false).moved());
    }

    @Test
    void backKeepsLaterAnswersAndChecksAgain() {
        Wizard w = session();
        assertTrue(w.next(true).moved());
        assertTrue(w.answer("hob.gashes", "14").isEmpty());
        assertTrue(w.next(true).moved());
        assertEquals(StepId.MACHINE, w.view().id());
        assertTrue(w.back().moved());
        assertTrue(w.back().moved());
        assertEquals(StepId.GEAR, w.view().id());
        assertEquals("14", w.value("hob.gashes"));
        // a change made after going back is checked when the step is completed again
        assertTrue(w.answer("gear.diametralPitch", "25.4").isEmpty());
        assertFalse(w.next(true).moved());
        assertTrue(w.answer("gear.module", "").isEmpty());
        Transition t = w.next(true);
        assertTrue(t.moved(), t::toString);
        assertEquals("14", w.view().fields().stream().filter(f -> f.key().equals("hob.gashes")).findFirst()
                .orElseThrow().defaultValue());
    }

    @Test
    void reviewListsEveryOpenFinding() {
        Wizard w = session();
        drive(w);
        StepView review = w.view();
        assertEquals(StepId.REVIEW, review.id());
        assertTrue(review.findings().contains(PLAN_WARNING), review::toString);
        assertTrue(review.findings().contains(PLAN_INFO), review::toString);
        assertTrue(w.job().isPresent());
        assertEquals("metering-pump-gear", w.job().get().name());
        assertTrue(w.cycle().isPresent());
    }

    @Test
    void warningsBlockUnlessAccepted() {
        Finding warning = Finding.warning("TEST_HOB_WARNING", "hob.length", "a warning on the hob", "a fix",
                "common practice, no source");
        doReturn(List.of(warning)).when(services).check(any());
        Wizard w = session();
        assertTrue(w.next(false).moved());                  // no GEAR warning
        Transition blocked = w.next(false);
        assertFalse(blocked.moved());
        assertEquals(List.of(warning), blocked.findings());
        Transition accepted = w.next(true);
        assertTrue(accepted.moved());
        assertEquals(StepId.MACHINE, accepted.current());
    }

    @Test
    void aMachineCheckWaitsForTheMachineStep() {
        Wizard w = session();
        assertTrue(w.answer("gear.helixAngle", "15").isEmpty());
        assertTrue(w.answer("gear.hand", "right").isEmpty());
        assertTrue(w.answer("gear.blankDiameter", "").isEmpty());
        Transition gear = w.next(true);
        assertTrue(gear.moved(), gear::toString);
        assertTrue(w.next(true).moved());
        // the sample's machine, varrow-1605, cannot follow a helix (samples/scenario/machines/varrow-1605.json)
        Transition machine = w.next(true);
        assertFalse(machine.moved());
        assertTrue(machine.findings().stream().anyMatch(f -> f.code().equals("MACHINE_NO_HELIX")), machine::toString);
        assertTrue(w.answer(StepFields.MACHINE, "ottmere-4008").isEmpty());
        Transition other = w.next(true);
        assertTrue(other.moved(), other::toString);
    }

    @Test
    void machineChoicesComeFromTheLibrary() {
        Wizard w = session();
        w.next(true);
        w.next(true);
        var machine = w.view().fields().get(0);
        assertEquals(StepFields.MACHINE, machine.key());
        assertTrue(machine.choices().containsAll(List.of("varrow-1605", "ottmere-4008")), machine::toString);
        assertEquals("WIZARD_NOT_A_CHOICE", w.answer(StepFields.MACHINE, "no-such-machine").get(0).code());
    }

    /**
     * Changing the unit keeps lengths, feeds and cutting speeds meaning the same (1 in = 25.4 mm and
     * 1 ft = 0.3048 m exactly, by the international definition of 1959), and switching back restores
     * the answers as typed.
     */
    @Test
    void changingTheUnitConvertsLengthFeedAndSpeedAnswers() {
        Answers start = StepWizardFactory.sampleAnswers();
        start.put("cycle.cuttingSpeed", "30.48");                 // answers of later steps, from a job file
        start.put("cycle.finishFeed", "0.5");
        StepSession w = new StepSession(services, start);
        assertEquals(List.of(), w.answer("units", "mm"));
        assertEquals(List.of(), w.answer("gear.faceWidth", "25.4"));
        assertEquals(List.of(), w.answer("gear.teeth", "24"));
        String hobDiameter = w.value("hob.outsideDiameter");

        List<Finding> said = w.answer("units", "in");
        assertEquals(1, said.size());
        assertEquals(WizardCode.WIZARD_UNITS_CONVERTED.code(), said.get(0).code());
        assertFalse(said.get(0).isError(), "the answer is taken");
        assertEquals("in", w.value("units"));
        assertEquals("1", w.value("gear.faceWidth"));
        assertEquals("100", w.value("cycle.cuttingSpeed"));
        assertEquals("0.01968503937", w.value("cycle.finishFeed"));   // 0.5 / 25.4 to 10 significant digits
        assertEquals("24", w.value("gear.teeth"), "counts keep their value");
        assertEquals(Double.parseDouble(hobDiameter) / 25.4, Double.parseDouble(w.value("hob.outsideDiameter")), 1e-9);

        w.answer("units", "mm");
        assertEquals("25.4", w.value("gear.faceWidth"));
        assertEquals("30.48", w.value("cycle.cuttingSpeed"));
        assertEquals("0.5", w.value("cycle.finishFeed"));
        assertEquals(hobDiameter, w.value("hob.outsideDiameter"));
        assertEquals(List.of(), w.answer("units", "mm"), "no change, no remark");
    }
}
