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

/** A host finds the factory with ServiceLoader and starts from the sample or from its own job. */
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
    void aSessionStartsBlankUnlessTheSampleIsAskedFor() {
        Wizard blank = factory().start(Map.of(WizardFactory.HOME, home.toString()));
        assertEquals(StepId.GEAR, blank.view().id());
        for (FieldSpec f : blank.view().fields()) {
            assertEquals("", f.defaultValue(), f.key() + " has no sample value");
        }
        assertEquals("", blank.value("gear.teeth"));
        assertFalse(blank.next(true).moved(), "a blank gear step cannot complete");
        Wizard sample = factory().start(Map.of(WizardFactory.HOME, home.toString(),
                WizardFactory.START, WizardFactory.START_SAMPLE));
        assertEquals("metering-pump-gear", sample.value("name"));
        assertEquals("varrow-sl16", sample.value("machine"));
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
