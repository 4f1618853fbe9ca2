package org.hobwright.hosttest;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.net.URLClassLoader;
import java.nio.file.Path;
import java.util.List;
import org.hobwright.api.Hobwright;
import org.hobwright.api.cycle.SplineData;
import org.hobwright.api.host.Outcome;
import org.hobwright.api.host.PlannedJob;
import org.hobwright.api.host.Written;
import org.hobwright.api.job.HobJob;
import org.hobwright.api.wizard.FieldSpec;
import org.hobwright.api.wizard.Wizard;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * A host drives a spline job through the façade in the plugin jar: read, plan, write, and a wizard
 * session started from the job asks the spline's questions with the job's answers.
 */
class SplineHostTest {
    @TempDir
    Path work;

    @Test
    void aHostReadsPlansWritesAndEditsASplineJob() throws Exception {
        try (URLClassLoader plugins = Host.Arrangement.CHILD_FIRST.loader(Host.pluginJar());
             Hobwright hw = Hobwright.open(plugins, work.resolve("home"))) {
            Outcome<HobJob> read = hw.readJob(Host.samples().resolve("jobs/drive-shaft-spline-1605.json"));
            assertTrue(read.ok(), read::toString);
            HobJob job = read.orElseThrow();
            assertEquals("spline", job.part());
            assertEquals("iso4156", job.spline().orElseThrow().standard());
            assertEquals(0.2, job.hob().splineProfile().orElseThrow().tipRadiusMm(), 0);

            PlannedJob planned = hw.plan(job);
            assertFalse(planned.hasErrors(), planned::toString);
            SplineData s = planned.cycle().spline().orElseThrow();
            // ISO 4156-1:2005: pitch diameter D = m z, base diameter D_b = m z cos α_D (m 1, z 18, α_D 30°)
            assertEquals(18.0, s.pitchDiameterMm(), 1e-12);
            assertEquals(18 * Math.cos(Math.toRadians(30)), s.baseDiameterMm(), 1e-9);
            assertTrue(s.form().orElseThrow().formReached(), "the standard's hob reaches the form diameter");

            Written w = hw.write(planned, work.resolve("out"), Host.DATE);
            assertTrue(w.ok(), w::toString);
            JsonNode report = new ObjectMapper().readTree(work.resolve("out/drive-shaft-spline-1605.report.json")
                    .toFile());
            assertEquals(18.0, report.at("/spline/pitchDiameter").doubleValue(), 1e-9, "millimetres, the job's unit");
            assertTrue(report.at("/simulation/formReached").booleanValue());

            Wizard wizard = hw.wizard(job);
            List<String> keys = wizard.view().fields().stream().map(FieldSpec::key).toList();
            assertTrue(keys.contains("spline.teeth") && keys.stream().noneMatch(k -> k.startsWith("gear.")),
                    keys::toString);
            assertEquals("spline", wizard.value("part"));
            assertEquals("18", wizard.value("spline.teeth"));
            assertEquals("flat", wizard.value("hob.root"));
        }
    }
}
