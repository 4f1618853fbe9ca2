package org.hobwright.wizard.steps;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.ServiceLoader;
import org.hobwright.api.spi.Spi;
import org.hobwright.api.testkit.SampleJobs;
import org.hobwright.api.wizard.FieldSpec;
import org.hobwright.api.wizard.StepId;
import org.hobwright.api.wizard.Wizard;
import org.hobwright.api.wizard.WizardFactory;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** A host finds the factory with ServiceLoader and starts blank or from its own job. */
class StepWizardFactoryTest {
    @TempDir
    Path home;

    private static WizardFactory factory() {
        List<WizardFactory> found = ServiceLoader.load(WizardFactory.class).stream().map(ServiceLoader.Provider::get)
                .toList();
        assertEquals(1, found.size(), found::toString);
        assertEquals(Spi.API_VERSION, found.get(0).apiVersion());
        return found.get(0);
    }

    @Test
    void aSessionStartsBlankOnGear() {
        Wizard w = factory().start(Map.of(WizardFactory.HOME, home.toString()));
        assertEquals(StepId.GEAR, w.view().id());
        assertEquals("", w.value("name"), "no sample part name on a real program");
        assertEquals("", w.value("gear.teeth"));
        assertEquals("", w.value("machine"));
        assertEquals("20", w.value("gear.pressureAngle"));
        FieldSpec pressure = w.view().fields().stream().filter(f -> f.key().equals("gear.pressureAngle"))
                .findFirst().orElseThrow();
        assertTrue(pressure.help().contains("ISO 53:1998"), "says where the default comes from: " + pressure.help());
        assertTrue(w.answer("gear.module", "2").isEmpty());
        assertEquals("iso53-a", w.value("gear.toothSystem"), "the tooth system of a module gear");
        assertEquals("2", w.value("hob.module"), "the hob follows the gear's pitch");
        assertTrue(w.answer("gear.module", "").isEmpty());
        assertTrue(w.answer("gear.diametralPitch", "32").isEmpty());
        assertEquals("agma-fine", w.value("gear.toothSystem"), "fine pitch from 20 diametral pitch");
        assertTrue(w.answer("gear.toothSystem", "iso53-c").isEmpty());
        assertTrue(w.answer("gear.diametralPitch", "10").isEmpty());
        assertEquals("iso53-c", w.value("gear.toothSystem"), "a tooth system answered is kept");
    }

    @Test
    void aSessionStartsBlankUnlessTheSampleIsAskedFor() {
        Wizard blank = factory().start(Map.of(WizardFactory.HOME, home.toString()));
        assertEquals(StepId.GEAR, blank.view().id());
        for (FieldSpec f : blank.view().fields()) {
            assertTrue(f.defaultValue().isEmpty() || f.help().contains("Default: standard")
                    || f.help().contains("Default: trade convention"), f.key() + " has no sample value");
        }
        assertEquals("", blank.value("gear.teeth"));
        assertFalse(blank.next(true).moved(), "a blank gear step cannot complete");
        Wizard sample = factory().start(Map.of(WizardFactory.HOME, home.toString(),
                WizardFactory.START, WizardFactory.START_SAMPLE));
        assertEquals("metering-pump-gear", sample.value("name"));
        assertEquals("varrow-1605", sample.value("machine"));
    }

    @Test
    void aSessionStartsFromAHostsJobWithItsOwnMachineInline() {
        // SampleJobs.helicalMetric: m_n 2, z 30, β 15° RH, x 0.2 on an invented test machine
        Wizard w = factory().start(SampleJobs.helicalMetric(), Map.of("home", home.toString()));
        assertEquals("30", w.value("gear.teeth"));
        assertEquals("15", w.value("gear.helixAngle"));
        assertEquals("test-machine", w.value("machine"));
        for (int i = 0; i < 4; i++) {
            assertTrue(w.next(true).moved(), () -> w.view().toString());
        }
        assertEquals(StepId.REVIEW, w.view().id());
        assertEquals(SampleJobs.helicalMetric().machine(), w.job().orElseThrow().machine());
        assertEquals(SampleJobs.helicalMetric().gear(), w.job().orElseThrow().gear());
        assertTrue(w.cycle().isPresent());
    }
    /** The keys of the fields a step shows. */
    private static List<String> keys(Wizard w) {
        return w.view().fields().stream().map(FieldSpec::key).toList();
    }

    @Test
    void aSplineAnswerAsksTheSplinesQuestionsAndEndsInASplineJob() {
        Wizard w = factory().start(Map.of(WizardFactory.HOME, home.toString()));
        assertTrue(keys(w).contains("gear.teeth"));
        assertFalse(keys(w).contains("spline.teeth"), "a gear job has no spline questions");
        assertTrue(w.answer("part", "spline").isEmpty());
        assertTrue(keys(w).containsAll(List.of("spline.standard", "spline.teeth", "spline.module",
                "spline.diametralPitch", "spline.pressureAngle", "spline.root", "spline.toleranceClass",
                "spline.fitClass", "spline.faceWidth")), () -> keys(w).toString());
        assertTrue(keys(w).stream().noneMatch(k -> k.startsWith("gear.")), "the spline's questions replace the gear's");
        assertEquals("30", w.value("spline.pressureAngle"), "the standards' 30°");
        // the metric sample spline: ISO 4156 18 teeth module 1, 30° flat root, class 5h
        for (String[] a : new String[][] {{"name", "wizard-spline"}, {"spline.standard", "iso4156"},
            {"spline.teeth", "18"}, {"spline.module", "1"}, {"spline.root", "flat"}, {"spline.faceWidth", "16"},
            {"spline.blankDiameter", "18.95"}}) {
            assertEquals(List.of(), w.answer(a[0], a[1]), a[0]);
        }
        assertEquals("1", w.value("hob.module"), "the hob follows the spline's module");
        assertEquals("30", w.value("hob.pressureAngle"));
        assertEquals("flat", w.value("hob.root"), "and its root form");
        assertTrue(w.next(true).moved(), () -> w.view().toString());
        assertEquals(StepId.CUTTER, w.view().id());
        assertTrue(keys(w).containsAll(List.of("hob.root", "hob.tipRadius", "hob.addendum")), () -> keys(w).toString());
        for (String[] a : new String[][] {{"hob.tipRadius", "0.2"}, {"hob.hand", "right"}, {"hob.outsideDiameter", "32"},
            {"hob.gashes", "12"}, {"hob.length", "25"}, {"hob.material", "hss-coated"}}) {
            assertEquals(List.of(), w.answer(a[0], a[1]), a[0]);
        }
        assertTrue(w.next(true).moved(), () -> w.view().toString());
        assertEquals(List.of(), w.answer("machine", "varrow-1605"));
        for (int i = 0; i < 4 && w.view().id() != StepId.REVIEW; i++) {
            if (w.view().id() == StepId.CYCLE) {
                w.answer("cycle.workMaterial", "steel-free-machining");
            }
            assertTrue(w.next(true).moved(), () -> w.view().toString());
        }
        assertEquals(StepId.REVIEW, w.view().id());
        var job = w.job().orElseThrow();
        assertEquals("spline", job.part());
        assertEquals("iso4156", job.spline().orElseThrow().standard());
        assertEquals("flat", job.hob().splineProfile().orElseThrow().root());
        var cycle = w.cycle().orElseThrow();
        assertFalse(cycle.hasErrors(), () -> cycle.findings().toString());
        // the pitch diameter D = m z of ISO 4156-1:2005: 1 mm × 18
        assertEquals(18.0, cycle.spline().orElseThrow().pitchDiameterMm(), 1e-12);
    }
}
