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
}
